package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * {@code qchain check} on continuous chains: the generator Q (rows sum to 0; the diagonal is minus the total rate
 * out), total rates out q_i and mean holding times 1/q_i (the holding time in a state is exponential with rate q_i:
 * J. R. Norris, "Markov Chains", ch. 2.6; from memory), exactly or as formulas; exact output against golden files
 * (layouts our own: common practice, no source).
 */
class ContinuousCheckTest {
    private static final Path GOLDEN = Path.of("src/test/resources/golden/continuous");
    private static final String GEN = Cli.model("generator-set.chain");

    private static String ext(String format) {
        return format.equals("text") ? "txt" : format.equals("markdown") ? "md" : format.equals("latex") ? "tex"
            : format;
    }

    /** The exact generator (generator-set) and the symbolic one (parallel-pair) in every format. */
    @ParameterizedTest
    @CsvSource({"generator-set.chain,check", "parallel-pair.chain,check-symbolic"})
    void generatorInEveryFormat(String model, String golden) throws IOException {
        for (String format : new String[] {"text", "json", "csv", "markdown", "latex"}) {
            Cli.Result r = Cli.run("check", Cli.model(model), "--format", format);
            assertEquals(0, r.code(), r::toString);
            assertEquals("", r.err());
            Cli.assertMatchesGolden(r, GOLDEN.resolve(golden + "." + ext(format)));
        }
    }

    @Test
    void exactValuesOfTheParallelPair() {
        // Q of two units, one crew at lam = 1/500, mu = 1/12: q_Both = 2 lam = 1/250, q_One = lam + mu = 32/375,
        // q_None = mu = 1/12 (derived by hand from the model's rates)
        Cli.Result r = Cli.run("check", GEN);
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("\nBoth   1/250               0.00400000000000  250                      250\n"
            + "One    32/375              0.0853333333333   375/32                   11.7187500000\n"
            + "None   1/12                0.0833333333333   12                       12\n"), r.out());
        assertTrue(r.out().endsWith("OK: 3 states, continuous, rows sum to 0, off-diagonal rates >= 0\n"), r.out());
    }

    @Test
    void conditionsOnTheRatesAreLocatedAndPrintedOnce() {
        String model = Cli.model("derated-unit.chain");
        Cli.Result r = Cli.run("check", model);
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err(), "the conditions are the report, not again on stderr");
        assertTrue(r.out().contains("\nConditions (each off-diagonal rate must be at least 0 for Q to be a"
            + " generator):\n  " + model + ":8:1: Up->Down is 1 - a: needs a <= 1; fails near a=2 (a corner of the"
            + " domain); results hold only where it does\n"), r.out());
        assertTrue(r.out().endsWith("OK: 2 states, continuous, rows sum to 0 identically; 1 condition on the"
            + " parameters (above)\n"), r.out());
        Cli.Result j = Cli.run("check", model, "--format", "json");
        assertTrue(j.out().contains("\"conditions\":[\"" + model + ":8:1: Up->Down is 1 - a: needs a <= 1;"), j.out());
    }

    @Test
    void aBrokenValueIsRefusedAtItsLine() {
        String model = Cli.model("derated-unit.chain");
        Cli.Result r = Cli.run("check", model, "--at", "a=3/2,mu=1");
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out());
        assertEquals("qchain: " + model + ":8:11: rate Up -> Down is -1/2, must not be negative\n", r.err());
    }

    @Test
    void sensWithStepsOnAContinuousChainSaysWhatWorks() {
        Cli.Result r = Cli.run("sens", GEN, "-n", "2", "--from", "Both", "--to", "None", "--wrt", "lam");
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: this is a continuous chain; qchain sens -n counts the steps of a discrete chain; for a"
            + " continuous chain give the time (qchain sens MODEL -t T --from A --to B --wrt P) or differentiate a"
            + " figure of merit (qchain sens MODEL --of availability|unavailability|mttf|failure-frequency --wrt P)\n",
            r.err());
    }
}
