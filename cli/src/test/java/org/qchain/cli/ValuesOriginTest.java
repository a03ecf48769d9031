package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Every command that computes at parameter values says which values and where they came from, in the same words:
 * {@code p=1/10, r=1/4 (p given with --at, r nominal)}, {@code (nominal values)} or {@code (given with --at)}.
 * Expected text: the documented formats in docs/commands.md (our own interface; JSON per RFC 8259), no outside
 * source; the nominal values are those written in the models.
 */
class ValuesOriginTest {
    private static final String PUMP = Cli.model("pump-params.chain");
    /** The same chain with nominal values for both parameters. */
    private static final String NOMINAL = "../docs/examples/pump-station-params.chain";
    private static final String MIXED = "p=1/10, r=1/4 (p given with --at, r nominal)";

    private static String out(String... args) {
        Cli.Result r = Cli.run(args);
        assertEquals(0, r.code(), r::toString);
        return r.out();
    }

    @Test
    void stepSaysWhereTheValuesCameFrom() {
        // p has no nominal value in PUMP: symbolic output, evaluated at the point
        String row = out("step", PUMP, "-n", "2", "--from", "Up", "--at", "p=1/10");
        assertTrue(row.contains("\nAt " + MIXED + ":\n"), row);
        String numeric = out("step", NOMINAL, "-n", "2", "--from", "Up", "--at", "p=1/10");
        assertTrue(numeric.contains("\nParameters at " + MIXED + ".\n"), numeric);
        String entry = out("step", NOMINAL, "-n", "2", "--from", "Up", "--to", "Down", "--at", "p=1/10", "--at",
            "r=1/5");
        assertTrue(entry.contains("\nParameters at p=1/10, r=1/5 (given with --at).\n"), entry);
        String json = out("step", NOMINAL, "-n", "2", "--from", "Up", "--to", "Down", "--at", "p=1/10", "--format",
            "json");
        assertTrue(json.contains(",\"kind\":\"discrete\",\"at\":{\"p\":\"1/10\",\"r\":\"1/4\"},\"digits\":12,"), json);
        String start = out("step", NOMINAL, "-n", "2", "--start", "Up", "--at", "p=1/10");
        assertTrue(start.contains("\nParameters at " + MIXED + ".\n"), start);
        String symbolicStart = out("step", PUMP, "-n", "2", "--start", "Up", "--at", "p=1/10");
        assertTrue(symbolicStart.contains("\nAt " + MIXED + ":\n"), symbolicStart);
    }

    @Test
    void checkSaysWhereTheValuesCameFrom() {
        String text = out("check", PUMP, "--at", "p=1/10");
        assertTrue(text.contains("\nParameters at " + MIXED + ".\n"), text);
    }

    @Test
    void sensSaysWhereTheValuesCameFromInEveryLayout() {
        String text = out("sens", PUMP, "-n", "2", "--from", "Up", "--to", "Down", "--wrt", "p", "--at", "p=1/10");
        assertTrue(text.contains("\nAt " + MIXED + ":\n"), text);
        String md = out("sens", PUMP, "-n", "2", "--from", "Up", "--to", "Down", "--wrt", "p", "--at", "p=1/10",
            "--format", "markdown");
        assertTrue(md.contains("\nAt " + MIXED + ":\n"), md);
        String tex = out("sens", PUMP, "-n", "2", "--from", "Up", "--to", "Down", "--wrt", "p", "--at", "p=1/10",
            "--format", "latex");
        assertTrue(tex.contains("; values at " + MIXED + "\n"), tex);
    }

    @Test
    void closedSaysWhereTheValuesOfItsDecimalsCameFrom() {
        // p is substituted by --at; r stays symbolic and its decimals are taken at its nominal value
        String text = out("closed", PUMP, "--from", "Up", "--to", "Down", "--at", "p=1/10");
        assertTrue(text.contains("(≈: decimals at r=1/4 (nominal values), 12 significant digits)\n"), text);
    }

    @Test
    void longRunAbsorbAndClassesSayWhereTheValuesCameFrom() {
        assertTrue(out("longrun", PUMP, "--at", "p=1/10").startsWith("Long run of " + PUMP + "; parameters at "
            + MIXED + "\n"));
        assertTrue(out("absorb", PUMP, "--at", "p=1/10", "--absorbing", "Down").startsWith("Absorption in " + PUMP
            + "; parameters at " + MIXED + "\n"));
        assertTrue(out("classes", PUMP, "--at", "p=1/10").startsWith("Structure of " + PUMP + "; parameters at "
            + MIXED + "\n"));
        String json = out("longrun", PUMP, "--at", "p=1/10", "--format", "json");
        assertTrue(json.contains(",\"at\":{\"p\":\"1/10\",\"r\":\"1/4\"},\"warnings\":"), json);
    }

    @Test
    void availSaysWhereTheValuesCameFrom() {
        String text = out("avail", Cli.model("generator-set.chain"), "--at", "lam=1/400");
        assertTrue(text.contains(")\nParameters at lam=1/400, mu=1/12 (lam given with --at, mu nominal).\n"), text);
    }

    @Test
    void aModelWithoutParametersSaysNothing() {
        String text = out("step", Cli.model("two-state.chain"), "-n", "2", "--from", "Working");
        assertTrue(!text.contains("Parameters at"), text);
    }
}
