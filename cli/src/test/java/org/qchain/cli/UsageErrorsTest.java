package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Usage errors exit 2 with a message naming the option at fault, and never print a stack trace. Exit codes and
 * message layout: common practice, no source.
 */
class UsageErrorsTest {
    private static final String MODEL = Cli.model("plant.chain");

    private static void assertUsageError(Cli.Result r, String firstLine, String command) {
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out(), r::toString);
        String[] lines = r.errLines();
        assertEquals(firstLine, lines[0], r::toString);
        assertEquals("Try '" + command + " --help' for more information.", lines[lines.length - 2], r::toString);
        assertFalse(r.err().contains("Exception"), r::toString);
        assertFalse(r.err().contains("\tat "), r::toString);
    }

    @Test
    void bareCommandPrintsUsageOnStderrAndExits2() {
        Cli.Result r = Cli.run();
        assertEquals(2, r.code());
        assertEquals("", r.out());
        assertEquals("qchain: no command given; the commands are: " + COMMANDS, r.errLines()[0], r::toString);
        assertEquals("Usage: qchain [-hV] [COMMAND]", r.errLines()[1], r::toString);
    }

    /** The commands in the order of the help. */
    private static final String COMMANDS = String.join(", ",
        QchainCommand.newCommandLine(false).getSubcommands().keySet());

    @Test
    void unknownCommandListsTheCommands() {
        for (String word : new String[]{"stpe", "stationary"}) {
            Cli.Result r = Cli.run(word, MODEL);
            assertEquals(2, r.code(), r::toString);
            assertEquals("qchain: unknown command '" + word + "'; the commands are: " + COMMANDS, r.errLines()[0],
                r::toString);
            assertEquals("Try 'qchain --help' for more information.", r.errLines()[1], r::toString);
        }
        assertTrue(COMMANDS.startsWith("step, sens, closed, check"), COMMANDS);
    }

    @Test
    void stepsInOtherScriptsAreNoNumber() {
        // U+0663 ARABIC-INDIC DIGIT THREE and U+FF13 FULLWIDTH DIGIT THREE are digits to Java, not to qchain
        for (String n : new String[]{"\u0663", "\uff13"}) {
            assertUsageError(Cli.run("step", MODEL, "-n", n),
                "qchain: Invalid value for option '--steps': '" + n + "' is not a whole number of steps", "qchain step");
        }
    }

    @Test
    void tooManyStepsSaysTooLarge() {
        assertUsageError(Cli.run("step", MODEL, "-n", "99999999999999999999"),
            "qchain: Invalid value for option '--steps': '99999999999999999999' is too large: at most"
                + " 9223372036854775807", "qchain step");
    }

    @Test
    void missingStepsNamesTheOption() {
        assertUsageError(Cli.run("step", MODEL),
            "qchain: give the number of steps -n N (discrete chain) or the time -t T (continuous chain)", "qchain step");
    }

    @Test
    void missingModelNamesTheParameter() {
        assertUsageError(Cli.run("step", "-n", "3"), "qchain: Missing required parameter: 'MODEL'", "qchain step");
    }

    @Test
    void nonNumericStepsShowsTheValue() {
        assertUsageError(Cli.run("step", MODEL, "-n", "ten"),
            "qchain: Invalid value for option '--steps': 'ten' is not a whole number of steps", "qchain step");
    }

    @Test
    void stepsAreReadWithTheModelFilesNumberGrammar() {
        // one number reader for the model file and every option (exact's Rational.parse): exact integers in any
        // of its forms are accepted, fractions that are not whole and digits outside ASCII are not
        Cli.Result r = Cli.run("step", MODEL, "-n", "4", "--from", "Up", "--to", "Down", "--format", "csv");
        assertEquals(r.out(), Cli.run("step", MODEL, "-n", "8/2", "--from", "Up", "--to", "Down", "--format", "csv")
            .out());
        assertEquals(r.out(), Cli.run("step", MODEL, "-n", "4e0", "--from", "Up", "--to", "Down", "--format",
            "csv").out());
        assertUsageError(Cli.run("step", MODEL, "-n", "7/2"),
            "qchain: Invalid value for option '--steps': '7/2' is not a whole number of steps", "qchain step");
        assertUsageError(Cli.run("step", MODEL, "-n", "\u0663"),
            "qchain: Invalid value for option '--steps': '\u0663' is not a whole number of steps", "qchain step");
        Cli.Result hugeExponent = Cli.run("step", MODEL, "-n", "1e99999999999");
        assertEquals(2, hugeExponent.code(), hugeExponent::toString);
        assertTrue(hugeExponent.err().startsWith("qchain: Invalid value for option '--steps': '1e99999999999' is"
            + " not a whole number of steps ("), hugeExponent::toString);
        assertUsageError(Cli.run("step", MODEL, "-n", "99999999999999999999"),
            "qchain: Invalid value for option '--steps': '99999999999999999999' is too large: at most "
                + Long.MAX_VALUE, "qchain step");
    }

    @Test
    void negativeStepsIsRefused() {
        assertUsageError(Cli.run("step", MODEL, "-n", "-1"),
            "qchain: Invalid value for option '--steps': '-1' is negative; the number of steps must be 0 or more",
            "qchain step");
    }

    @Test
    void unknownFormatListsTheFormats() {
        assertUsageError(Cli.run("step", MODEL, "-n", "2", "--format", "xml"),
            "qchain: Invalid value for option '--format': unknown format 'xml' (expected one of: text, json, csv,"
                + " markdown, latex)", "qchain step");
    }

    @Test
    void zeroDigitsIsRefused() {
        assertUsageError(Cli.run("step", MODEL, "-n", "2", "--digits", "0"),
            "qchain: Invalid value for option '--digits': '0' must be from 1 to 100000", "qchain step");
    }

    @Test
    void zeroMaxDigitsIsRefused() {
        assertUsageError(Cli.run("step", MODEL, "-n", "2", "--max-digits", "0"),
            "qchain: Invalid value for option '--max-digits': '0' must be at least 1", "qchain step");
    }

    @Test
    void zeroPathsIsRefused() {
        assertUsageError(Cli.run("step", MODEL, "-n", "2", "--from", "Up", "--to", "Down", "--paths", "0"),
            "qchain: Invalid value for option '--paths': '0' must be from 1 to 10000", "qchain step");
    }

    @Test
    void toWithoutFromIsRefused() {
        assertUsageError(Cli.run("step", MODEL, "-n", "2", "--to", "Down"),
            "qchain: --to needs --from (the starting state) or --start (the initial state or distribution)", "qchain step");
    }

    @Test
    void pathsWithoutToIsRefused() {
        assertUsageError(Cli.run("step", MODEL, "-n", "2", "--from", "Up", "--paths", "3"),
            "qchain: --paths needs both --from and --to", "qchain step");
    }

    @Test
    void misspelledOptionSuggestsTheRightOne() {
        Cli.Result r = Cli.run("step", MODEL, "-n", "2", "--frm", "Up");
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: Unknown options: '--frm', 'Up'", r.errLines()[0], r::toString);
        assertTrue(r.err().contains("--from"), r::toString);
    }
}
