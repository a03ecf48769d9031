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
    void checkWritesJsonInTheStepMatrixShape() {
        // the one-step matrix of plant.chain at w = 1/20, read off the model file; P^1 in step's JSON shape
        Cli.Result r = Cli.run("check", Cli.model("plant.chain"), "--format", "json", "--digits", "3");
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err());
        assertEquals("{\"kind\":\"discrete\",\"n\":1,\"states\":[\"Up\",\"Worn\",\"Down\"],"
            + "\"matrix\":[[\"19/20\",\"1/20\",\"0\"],[\"1/4\",\"18/25\",\"3/100\"],[\"1/2\",\"0\",\"1/2\"]],"
            + "\"decimals\":[[\"0.950\",\"0.0500\",\"0\"],[\"0.250\",\"0.720\",\"0.0300\"],[\"0.500\",\"0\",\"0.500\"]],"
            + "\"at\":{\"w\":\"1/20\"},\"digits\":3,\"model\":\"src/test/resources/models/plant.chain\","
            + "\"warnings\":[]}\n", r.out());
    }

    @Test
    void checkWritesCsvThatReadsBackAsAModel(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("p1.csv");
        Cli.Result r = Cli.run("check", Cli.model("plant.chain"), "--format", "csv", "-o", out.toString());
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.out());
        assertEquals("", r.err());
        assertEquals("Up,Worn,Down\r\n19/20,1/20,0\r\n1/4,18/25,3/100\r\n1/2,0,1/2\r\n", Files.readString(out));
        // the written matrix is a model again, with the same one-step matrix
        Cli.Result again = Cli.run("check", out.toString(), "--format", "csv");
        assertEquals(0, again.code(), again::toString);
        assertEquals(Files.readString(out), again.out());
    }

    @Test
    void checkMarkdownAndLatexStartWithTheOneStepMatrix() {
        Cli.Result md = Cli.run("check", Cli.model("plant.chain"), "--format", "markdown");
        assertEquals(0, md.code(), md::toString);
        assertTrue(md.out().startsWith("**P^1** for `src/test/resources/models/plant.chain` (discrete chain): row ="
            + " state at the start, column = state after 1 step.\n\nParameters at w=1/20 (nominal values).\n\nExact:\n\n| from \\ to | Up | Worn | Down |\n"
            + "| --- | --- | --- | --- |\n| **Up** | 19/20 | 1/20 | 0 |\n"), md::toString);
        Cli.Result tex = Cli.run("check", Cli.model("plant.chain"), "--format", "latex");
        assertEquals(0, tex.code(), tex::toString);
        assertTrue(tex.out().contains("Worn & $\\frac{1}{4}$ & $\\frac{18}{25}$ & $\\frac{3}{100}$ \\\\\n"),
            tex::toString);
    }

    @Test
    void checkOfASymbolicModelHasEveryFormat() {
        Cli.Result r = Cli.run("check", Cli.model("free.chain"), "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertEquals("{\"kind\":\"discrete\",\"states\":[\"On\",\"Off\"],\"parameters\":[\"p\"],"
            + "\"matrix\":[[\"1 - p\",\"p\"],[\"1/3\",\"2/3\"]],\"conditions\":[],"
            + "\"model\":\"src/test/resources/models/free.chain\",\"warnings\":[]}\n", r.out());
        Cli.Result csv = Cli.run("check", Cli.model("free.chain"), "--format", "csv");
        assertEquals(0, csv.code(), csv::toString);
        assertEquals("from,to,formula\r\nOn,On,1 - p\r\nOn,Off,p\r\nOff,On,1/3\r\nOff,Off,2/3\r\n", csv.out());
    }

    @Test
    void checkNeverWritesOverTheModel(@TempDir Path dir) throws IOException {
        Path model = dir.resolve("plant.chain");
        Files.copy(Path.of(Cli.model("plant.chain")), model);
        String before = Files.readString(model);
        Cli.Result r = Cli.run("check", model.toString(), "-o", model.toString());
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out());
        assertEquals("qchain: invalid --output '" + model + "': it is the input model; choose another file\n", r.err());
        assertEquals(before, Files.readString(model));
    }

    @Test
    void checkRefusesAnUnknownFormat() {
        Cli.Result r = Cli.run("check", Cli.model("plant.chain"), "--format", "xml");
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out());
        assertTrue(r.err().startsWith("qchain: Invalid value for option '--format': unknown format 'xml' (expected"
            + " one of: text, json, csv, markdown, latex)\n"), r::toString);
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
