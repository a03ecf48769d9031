package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.SourcePos;

/** How failures become messages and exit codes (layout: common practice, no source). */
class ErrorsTest {
    private final StringWriter buf = new StringWriter();
    private final PrintWriter err = new PrintWriter(buf, true);

    @Test
    void inputErrorIsOneLineWithItsPositionAndExit2() {
        int code = new Errors().report(new QchainException(new SourcePos("m.chain", 4, 7), ErrorKey.UNKNOWN_STATE,
            "Dwn"), err);
        assertEquals(2, code);
        assertEquals("qchain: m.chain:4:7: unknown state 'Dwn'\n", buf.toString());
    }

    @Test
    void unexpectedExceptionIsAShortInternalErrorWithoutStackTrace() {
        int code = new Errors().report(new IllegalStateException("matrix not square"), err);
        assertEquals(1, code);
        assertEquals("qchain: internal error: IllegalStateException: matrix not square (set QCHAIN_DEBUG=1 for"
            + " details)\n", buf.toString());
    }

    @Test
    void internalKeyIsNotRepeated() {
        int code = new Errors().report(new QchainException(ErrorKey.INTERNAL, "resource missing"), err);
        assertEquals(1, code);
        assertEquals("qchain: internal error: resource missing\n", buf.toString());
    }

    @Test
    void outOfMemoryGivesAdviceAndExit1() {
        assertEquals(1, new Errors().report(new OutOfMemoryError("Java heap space"), err));
        assertEquals("qchain: internal error: out of memory (ask for a single row or entry with --from/--to, a"
            + " smaller n, or give Java more memory with JAVA_OPTS=-Xmx...)\n", buf.toString());
    }

    @Test
    void interruptionIsReportedOnceWithExit130() {
        Errors errors = new Errors();
        errors.reportInterrupt(err);
        // the shutdown hook printed it already; the handler must not print it again
        assertEquals(130, errors.report(new QchainException(ErrorKey.INTERRUPTED), err));
        assertEquals("qchain: interrupted\n", buf.toString());
    }

    @Test
    void theCommandLineAddsItsHintToAKeyThatCannotNameOptions() {
        // exact's FREE_PARAMETERS says what is missing; only the command line knows the option that gives it
        assertEquals(2, new Errors().report(new QchainException(ErrorKey.FREE_PARAMETERS, "p"), err));
        assertEquals("qchain: parameters without a value: p (give values with --at, or use a symbolic command)\n",
            buf.toString());
    }

    @Test
    void jasPreemptionAndJavaInterruptsAreInterruptionsToo() {
        // JAS stops a preempted computation with its own unchecked exception; a Ctrl-C during symbolic work must
        // still end as one "interrupted" line and exit 130, not as an internal error
        assertEquals(130, new Errors().report(new edu.jas.kern.PreemptingException(), err));
        assertEquals(130, new Errors().report(new IllegalStateException("wrapped",
            new InterruptedException("sleep")), err));
        assertEquals("qchain: interrupted\nqchain: interrupted\n", buf.toString());
    }

    @Test
    void interruptedSymbolicStepExits130WithOneMessage() {
        Thread.currentThread().interrupt();
        Cli.Result r;
        try {
            r = Cli.run("step", Cli.model("free.chain"), "-n", "200");
        } finally {
            Thread.interrupted();
        }
        assertEquals(130, r.code(), r::toString);
        assertEquals("", r.out());
        assertEquals("qchain: interrupted\n", r.err());
    }

    @Test
    void interruptedStepExits130WithOneMessageAndNoOutput() {
        // what the Ctrl-C hook does: interrupt the working thread; the engine then stops with INTERRUPTED
        Thread.currentThread().interrupt();
        Cli.Result r;
        try {
            r = Cli.run("step", Cli.model("plant.chain"), "-n", "100000", "--from", "Up");
        } finally {
            Thread.interrupted();
        }
        assertEquals(130, r.code(), r::toString);
        assertEquals("", r.out());
        assertEquals("qchain: interrupted\n", r.err());
    }

    @Test
    void progressIsSilentWhenOff() {
        TerminalProgress p = new TerminalProgress(err, false, () -> 5_000_000_000L);
        p.update("squaring", 1, 9);
        p.clear();
        assertEquals("", buf.toString());
    }

    @Test
    void progressStaysSilentDuringTheFirstSecond() {
        TerminalProgress p = new TerminalProgress(err, true);
        p.update("squaring", 1, 9);
        p.clear();
        assertEquals("", buf.toString());
    }

    @Test
    void progressAppearsAfterOneSecondAndRefreshesAtMostEvery200Ms() {
        long[] now = {0};
        TerminalProgress p = new TerminalProgress(err, true, () -> now[0]);
        p.update("squaring", 1, 9);
        now[0] = 1_000_000_000L;
        p.update("squaring", 2, 9);
        now[0] += 100_000_000L;
        p.update("squaring", 3, 9);
        now[0] += 100_000_000L;
        p.update("squaring", 10, 90);
        p.clear();
        assertEquals("\rsquaring 2/9\rsquaring 10/90\r" + " ".repeat(14) + "\r", buf.toString());
    }
}
