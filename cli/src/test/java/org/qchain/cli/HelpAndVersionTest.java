package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * Every help lists the exit codes and ends with the safety caution; {@code --version} prints the build version. The
 * texts are the project's own (common practice, no source).
 */
class HelpAndVersionTest {
    /** The caution as picocli wraps it at 80 columns. */
    private static final String CAUTION_WRAPPED = "Caution: results are only as good as the model; safety-critical"
        + " use follows the\napplicable standards, local codes and licensed engineering review.\n";

    private static final String EXIT_CODES = "Exit codes:\n"
        + "   0    success\n"
        + "   1    internal error (set QCHAIN_DEBUG=1 for a stack trace)\n"
        + "   2    bad input or usage: the message names file:line:col or the bad option\n"
        + "   3    verify: a value is outside the tolerance\n"
        + "  130   interrupted (Ctrl-C); no partial output file is left\n";

    @ParameterizedTest
    @ValueSource(strings = {"", "step", "check", "verify", "demo", "completion"})
    void helpListsExitCodesAndEndsWithTheCaution(String command) {
        Cli.Result r = command.isEmpty() ? Cli.run("--help") : Cli.run(command, "--help");
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err());
        assertTrue(r.out().contains(EXIT_CODES), r::toString);
        assertTrue(r.out().endsWith("\n" + CAUTION_WRAPPED), r::toString);
    }

    @Test
    void helpCommandShowsTheSubcommandsHelp() {
        Cli.Result r = Cli.run("help", "step");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().startsWith("Usage: qchain step "), r::toString);
        assertTrue(r.out().endsWith(CAUTION_WRAPPED), r::toString);
    }

    @Test
    void versionPrintsTheProjectVersion() {
        // the expected version comes from the pom (surefire system property), so a release bump cannot go unseen
        String expected = System.getProperty("qchain.expectedVersion");
        Cli.Result r = Cli.run("--version");
        assertEquals(0, r.code());
        assertEquals("qchain " + expected + "\n", r.out());
        assertEquals("", r.err());
    }

    @Test
    void subcommandVersionIsTheSame() {
        assertEquals(Cli.run("--version").out(), Cli.run("step", "--version").out());
    }

    @Test
    void theProcessBuildsOnlyTheCommandsItsArgumentsNeed() {
        // start-up: --version alone needs no subcommand, a command only itself, help and the demo the whole tree
        assertEquals(java.util.Set.of(), QchainCommand.newCommandLine(false, new Errors(), new String[] {"--version"})
            .getSubcommands().keySet());
        assertEquals(java.util.Set.of("step"), QchainCommand.newCommandLine(false, new Errors(),
            new String[] {"step", "x.chain", "-n", "2"}).getSubcommands().keySet());
        assertEquals(QchainCommand.SUBCOMMANDS.size(), QchainCommand.newCommandLine(false, new Errors(),
            new String[] {"help", "step"}).getSubcommands().size());
        assertEquals(QchainCommand.SUBCOMMANDS.size(), QchainCommand.newCommandLine(false, new Errors(),
            new String[] {"--version", "step"}).getSubcommands().size());
        java.io.StringWriter out = new java.io.StringWriter();
        picocli.CommandLine cl = QchainCommand.newCommandLine(false, new Errors(), new String[] {"--version"});
        cl.setOut(new java.io.PrintWriter(out, true));
        assertEquals(0, cl.execute("--version"));
        assertEquals(Cli.run("--version").out(), out.toString());
    }
}
