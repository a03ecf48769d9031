package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code step -t}, {@code avail} and {@code convert} on continuous chains: exact output against golden files
 * (layouts our own, common practice, no source; the numbers are checked against textbook formulas in the exact
 * module's tests), usage errors with exit code 2.
 */
class ContinuousCommandsTest {
    private static final Path GOLDEN = Path.of("src/test/resources/golden/continuous");
    private static final String GEN = Cli.model("generator-set.chain");

    record Case(String file, List<String> args) {
        @Override
        public String toString() {
            return file;
        }
    }

    static Stream<Case> cases() {
        List<Case> out = new ArrayList<>();
        for (String f : new String[] {"text", "json", "csv", "markdown", "latex"}) {
            String ext = f.equals("text") ? "txt" : f.equals("markdown") ? "md" : f.equals("latex") ? "tex" : f;
            out.add(new Case("avail." + ext, List.of("avail", GEN, "-t", "1,100", "--format", f)));
            out.add(new Case("step-t." + ext, List.of("step", GEN, "-t", "1/2,24", "--format", f)));
        }
        out.add(new Case("step-t-row.json", List.of("step", GEN, "-t", "0..2:1", "--from", "None", "--format", "json",
            "--digits", "20")));
        out.add(new Case("sens-mttf.txt", List.of("sens", GEN, "--of", "mttf", "--wrt", "mu")));
        out.add(new Case("sens-availability.json", List.of("sens", GEN, "--of", "availability", "--wrt", "lam",
            "--format", "json")));
        out.add(new Case("sens-failure-frequency.md", List.of("sens", GEN, "--of", "failure-frequency", "--wrt", "mu",
            "--format", "markdown")));
        out.add(new Case("sens-unavailability.tex", List.of("sens", GEN, "--of", "unavailability", "--wrt", "mu",
            "--format", "latex")));
        out.add(new Case("sens-mttf.csv", List.of("sens", GEN, "--of", "mttf", "--wrt", "lam", "--from", "One",
            "--format", "csv")));
        out.add(new Case("convert-jump.chain", List.of("convert", GEN, "--to", "jump")));
        out.add(new Case("convert-uniformized.chain", List.of("convert", GEN, "--to", "uniformized", "--rate", "1/10")));
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void outputMatchesGolden(Case c) throws IOException {
        Cli.Result r = Cli.run(c.args().toArray(new String[0]));
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err(), "stderr carries nothing on success");
        Cli.assertMatchesGolden(r, GOLDEN.resolve(c.file()));
    }

    @Test
    void everyOutputCarriesTheCaution() {
        for (String f : new String[] {"text", "json", "markdown", "latex"}) {
            assertTrue(Cli.run("avail", GEN, "--format", f).out().contains("licensed engineering review"), f);
            assertTrue(Cli.run("step", GEN, "-t", "1", "--format", f).out().contains("licensed engineering review"), f);
        }
        assertTrue(Cli.run("convert", GEN, "--to", "jump").out().contains("licensed engineering review"));
    }

    @Test
    void availabilityWithoutAnUpLineSaysHowToAddIt() {
        Cli.Result r = Cli.run("avail", Cli.model("continuous.chain"));
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: qchain avail needs the operating states: add a line 'up STATE STATE ...' after 'states'"
            + " (the other states are down)\n", r.err());
    }

    @Test
    void aTransientSolvePastTheWorkLimitIsRefusedWithItsEstimate() {
        // The estimate for generator-set.chain at t = 1/2, 24 (common divisor 1/2, so 48 = 110000b in binary): the
        // series of the base step plus 5 squarings and 1 product of 3 x 3 bound matrices; the exact count is the
        // engine's, the check is that it is refused before any work, names the option, and passes once raised.
        Cli.Result r = Cli.run("step", GEN, "-t", "1/2,24", "--max-work", "100");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().matches("qchain: P\\(t\\) would take about [0-9.]+e[0-9]+ multiplications of 64-bit numbers"
            + " \\(3 states, [0-9]+ rates, 2 times, uniformization rate times time up to 2\\.0e0\\), more than the limit"
            + " 100; raise it with --max-work, or ask for fewer digits or times\n"), r::toString);
        assertEquals(0, Cli.run("step", GEN, "-t", "1/2,24", "--max-work", "1000000").code());
    }

    @Test
    void continuousCommandsRefuseDiscreteChains() {
        Cli.Result r = Cli.run("avail", Cli.model("plant.chain"));
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: this is a discrete chain; qchain avail needs a continuous chain\n", r.err());
        assertEquals(2, Cli.run("step", Cli.model("plant.chain"), "-t", "1").code());
        assertEquals(2, Cli.run("convert", Cli.model("plant.chain"), "--to", "jump").code());
    }

    @Test
    void badTimesAndOptionCombinationsAreUsageErrors() {
        for (String[] args : new String[][] {
            {"step", GEN, "-t", "-1"}, {"step", GEN, "-t", "x"}, {"step", GEN, "-t", "2..1:1"}, {"step", GEN},
            {"step", GEN, "-t", "1", "-n", "2"}, {"step", GEN, "-t", "1", "--to", "One"},
            {"convert", GEN, "--to", "jump", "--rate", "2"}, {"convert", GEN, "--to", "uniformized", "--rate", "1/1000"},
            {"avail", GEN, "--hours-per-year", "0"}, {"sens", GEN, "--of", "speed", "--wrt", "mu"},
            {"sens", GEN, "--of", "mttf", "--wrt", "mu", "-n", "3"}, {"sens", GEN, "--of", "mttf", "--wrt", "nu"},
            {"sens", GEN, "--of", "mttf", "--wrt", "mu", "--from", "None"}, {"sens", GEN, "--wrt", "mu"}, {"avail", GEN, "--from", "Nowhere", "-t", "1"}}) {
            Cli.Result r = Cli.run(args);
            assertEquals(2, r.code(), r::toString);
            assertTrue(r.err().startsWith("qchain: ") && !r.err().contains("\tat "), r::toString);
        }
    }

    @Test
    void mttfGainPerUnitOfRepairRateIsOneOverTwoLambdaSquared() {
        // Two units in parallel, one crew: MTTF = (3 lam + mu)/(2 lam^2), so dMTTF/dmu = 1/(2 lam^2) = 125000 at
        // lam = 1/500 (R. Billinton and R. N. Allan, "Reliability Evaluation of Engineering Systems", ch. 9; from memory).
        Cli.Result r = Cli.run("sens", GEN, "--of", "mttf", "--wrt", "mu", "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("\"derivative\":\"125000\""), r.out());
    }

    @Test
    void convertedModelsAreReadByTheDiscreteCommands() throws IOException {
        Path tmp = java.nio.file.Files.createTempFile("qchain-uniformized", ".chain");
        try {
            java.nio.file.Files.writeString(tmp, Cli.run("convert", GEN, "--to", "uniformized").out());
            Cli.Result r = Cli.run("step", tmp.toString(), "-n", "3", "--from", "Both", "--format", "json");
            assertEquals(0, r.code(), r::toString);
        } finally {
            java.nio.file.Files.deleteIfExists(tmp);
        }
    }
}
