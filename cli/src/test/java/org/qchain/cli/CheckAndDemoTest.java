package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code check} and {@code demo}. Output layout: common practice, no source. */
class CheckAndDemoTest {
    private static final Path EXAMPLE = Path.of("../docs/examples/pump-station.chain");

    @Test
    void checkPrintsTheOneStepMatrixAndEndsWithOk() throws IOException {
        Cli.Result r = Cli.run("check", Cli.model("plant.chain"));
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err());
        String golden = Files.readString(Path.of("src/test/resources/golden/check.txt"), StandardCharsets.UTF_8);
        assertEquals(golden, r.out());
        assertTrue(r.out().endsWith("\nOK: 3 states, discrete, rows sum to 1\n"));
    }

    @Test
    void checkWithValuesUsesThem() {
        Cli.Result r = Cli.run("check", Cli.model("free.chain"), "--at", "p=2/5", "--digits", "3");
        assertEquals(0, r.code(), r::toString);
        // On -> On is the remainder 1 - p = 3/5
        assertTrue(r.out().contains("On    On   0.600    3/5\n"), r::toString);
        assertTrue(r.out().endsWith("OK: 2 states, discrete, rows sum to 1\n"), r::toString);
    }

    @Test
    void checkWithFreeParametersChecksSymbolically() {
        // a parameter without a value: the entries as formulas, rows summing to 1 identically (SymbolicCommandsTest
        // has the full output)
        Cli.Result r = Cli.run("check", Cli.model("free.chain"));
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("  On -> Off   p\n"), r::toString);
        assertTrue(r.out().endsWith("OK: 2 states, discrete, rows sum to 1 identically; entries in [0, 1] on the whole"
            + " parameter domain\n"), r::toString);
    }

    @Test
    void bundledExampleIsTheDocumentedOne() throws IOException {
        assertEquals(Files.readString(EXAMPLE, StandardCharsets.UTF_8),
            DemoCommand.resource("examples/" + DemoCommand.EXAMPLE));
    }

    @Test
    void demoShowsTheModelTheCommandsAndTheirResults() throws IOException {
        Cli.Result r = Cli.run("demo");
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err());
        assertTrue(r.out().startsWith("qchain demo: exact n-step probabilities of the bundled example model"
            + " pump-station.chain.\n"), r::toString);
        assertTrue(r.out().contains("  qchain demo --save-model my.chain\n"), r::toString);
        assertTrue(r.out().contains("\n$ qchain step pump-station.chain -n 12\n"), r::toString);
        assertTrue(r.out().contains("\n$ qchain step pump-station.chain -n 12 --from Up --to Down --paths 3\n"),
            r::toString);
        // the demo's numbers are what step prints for the documented file
        Cli.Result step = Cli.run("step", EXAMPLE.toString(), "-n", "12", "--from", "Up", "--to", "Down");
        String exactLine = step.out().lines().filter(l -> l.startsWith("  exact ")).findFirst().orElseThrow();
        assertTrue(r.out().contains(exactLine + "\n"), exactLine);
    }

    @Test
    void demoSavesTheModelForTheUserToEdit(@TempDir Path dir) throws IOException {
        Path copy = dir.resolve("my.chain");
        Cli.Result r = Cli.run("demo", "--save-model", copy.toString());
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.out());
        assertEquals("qchain: wrote the example model to " + copy + "\n", r.err());
        assertEquals(Files.readString(EXAMPLE), Files.readString(copy));
        assertEquals(0, Cli.run("check", copy.toString()).code());
    }

    @Test
    void demoNeverOverwritesAnExistingFile(@TempDir Path dir) throws IOException {
        Path mine = dir.resolve("mine.chain");
        Files.writeString(mine, "my edits\n");
        Cli.Result r = Cli.run("demo", "--save-model", mine.toString());
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: invalid --save-model '" + mine + "': the file exists; choose another name\n", r.err());
        assertEquals("my edits\n", Files.readString(mine));
    }
}
