package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Regression (issue 8): each warning once, not once per entry, and not again on stdout. The model has the same
 * entry {@code 1 - p - r} on two rows (lines 7 and 9), which needs {@code p + r <= 1} on the parameter domains.
 * Expected text: the documented warning format in docs/commands.md (our own interface), no outside source. The
 * condition by hand: 1 - p - r >= 0 exactly when p + r <= 1; at p = r = 1 it is -1 (fails), at p = 1/10, r = 1/4 it is
 * 13/20 (holds), at p = 1/5, r = 1/3 it is 7/15 and at p = 1/10, r = 1/3 it is 17/30 (common practice, no source).
 */
class WarningsOnceTest {
    private static final String MODEL = Cli.model("twin-wear.chain");
    private static final String WARNING = "qchain: warning: " + MODEL + ":7:1: LineA->LineA is 1 - p - r: needs"
        + " p + r <= 1; fails near p=1, r=1 (a corner of the domain); holds at p=1/10, r=1/4 (nominal values);"
        + " the same for LineB->LineB (" + MODEL + ":9:1)";

    private static long count(String text, String part) {
        return Arrays.stream(text.split("\n", -1)).filter(l -> l.contains(part)).count();
    }

    @Test
    void symbolicCommandsWarnOnceForEntriesThatShareACondition() {
        for (String[] args : new String[][] {
            {"step", MODEL, "-n", "2", "--symbolic"},
            {"step", MODEL, "-n", "2", "--symbolic", "--format", "csv"},
            {"sens", MODEL, "-n", "2", "--from", "LineA", "--to", "LineB", "--wrt", "p"}}) {
            Cli.Result r = Cli.run(args);
            assertEquals(0, r.code(), r::toString);
            assertEquals(WARNING + "\n", r.err(), String.join(" ", args));
            assertEquals(0, count(r.out(), "needs p + r <= 1"), "not again on stdout: " + String.join(" ", args));
        }
    }

    // regression (issue 8): values given with --at were called "the nominal values" in the warning
    @Test
    void theWarningNamesWhereTheValuesCameFrom() {
        Cli.Result at = Cli.run("step", MODEL, "-n", "2", "--symbolic", "--at", "p=1/5", "--at", "r=1/3");
        assertEquals(0, at.code(), at::toString);
        assertEquals(WARNING.replace("p=1/10, r=1/4 (nominal values)", "p=1/5, r=1/3 (given with --at)") + "\n",
            at.err());
        Cli.Result mixed = Cli.run("step", MODEL, "-n", "2", "--symbolic", "--at", "r=1/3");
        assertEquals(WARNING.replace("p=1/10, r=1/4 (nominal values)", "p=1/10, r=1/3 (r given with --at, p nominal)")
            + "\n", mixed.err());
        // closed states the same range condition (the closed form assumes a stochastic matrix)
        Cli.Result closed = Cli.run("closed", MODEL, "--at", "r=1/3", "--from", "LineA", "--to", "LineB");
        assertEquals(0, closed.code(), closed::toString);
        assertEquals(WARNING.replace("p=1/10, r=1/4 (nominal values)", "p=1/10, r=1/3 (r given with --at, p nominal)")
            + "\n", closed.err());
    }

    @Test
    void manyAlikeEntriesAreNamedUpToFiveThenCounted() {
        // eight lines L1..L8, each L_i -> L_i = 1 - p - r (lines 7, 9, ..., 21 of the model)
        String model = Cli.model("eight-lines.chain");
        Cli.Result r = Cli.run("step", model, "-n", "1", "--symbolic");
        assertEquals(0, r.code(), r::toString);
        assertEquals("qchain: warning: " + model + ":7:1: L1->L1 is 1 - p - r: needs p + r <= 1; fails near p=1, r=1"
            + " (a corner of the domain); holds at p=1/10, r=1/4 (nominal values); the same for L2->L2 (" + model
            + ":9:1), L3->L3 (" + model + ":11:1), L4->L4 (" + model + ":13:1), L5->L5 (" + model + ":15:1), L6->L6 ("
            + model + ":17:1) and 2 more entries\n", r.err());
    }

    @Test
    void jsonListsTheWarningOnce() {
        Cli.Result r = Cli.run("step", MODEL, "-n", "2", "--symbolic", "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertEquals(WARNING + "\n", r.err());
        // the JSON "warnings" array is part of the output's shape: one element
        String warnings = r.out().substring(r.out().indexOf("\"warnings\":["));
        assertEquals(1, warnings.split("needs p \\+ r <= 1", -1).length - 1, r.out());
    }

    @Test
    void checkPrintsItsConditionsOnceInItsReport() {
        Cli.Result r = Cli.run("check", MODEL, "--symbolic");
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err(), "the conditions are the report, not again on stderr");
        assertEquals(1, count(r.out(), "needs p + r <= 1"), r.out());
        assertTrue(r.out().contains("\n  " + WARNING.substring("qchain: warning: ".length()) + "\n"), r.out());
        assertTrue(r.out().endsWith("rows sum to 1 identically; 1 condition on the parameters (above)\n"), r.out());
    }
}
