package org.qchain.cli;

import java.io.PrintWriter;
import java.util.concurrent.atomic.AtomicBoolean;
import org.qchain.analysis.Interrupts;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;
import picocli.CommandLine.UnmatchedArgumentException;

/**
 * Turns every failure into one short message on stderr and an exit code: input errors (their message already starts
 * with {@code file:line:col} when they have a position) exit 2, usage errors exit 2 naming the option, anything else
 * exits 1 as an internal error. A stack trace is printed only when the environment variable {@code QCHAIN_DEBUG} is
 * {@code 1}.
 */
final class Errors implements IExecutionExceptionHandler, IParameterExceptionHandler {
    /** Set once "interrupted" has been printed, by the shutdown hook or by the handler, whichever comes first. */
    private final AtomicBoolean interruptReported = new AtomicBoolean();

    @Override
    public int handleExecutionException(Exception ex, CommandLine commandLine, ParseResult parseResult) {
        return report(ex, commandLine.getErr());
    }

    /**
     * Prints the message for {@code t} and returns the exit code.
     *
     * @param t   what went wrong
     * @param err where to print
     * @return {@link ExitCodes#INPUT}, {@link ExitCodes#INTERNAL} or {@link ExitCodes#INTERRUPTED}
     */
    int report(Throwable t, PrintWriter err) {
        if (Interrupts.isInterruption(t)) {
            // Ctrl-C: ours, Java's or JAS's way of saying so, reported once
            reportInterrupt(err);
            return ExitCodes.INTERRUPTED;
        }
        if (t instanceof QchainException q && q.isInputError()) {
            err.println("qchain: " + oneLine(q.getMessage()) + hint(q));
            err.flush();
            return ExitCodes.INPUT;
        }
        if (t instanceof QchainException q) {
            // key INTERNAL: the message already reads "internal error: ..."
            err.println("qchain: " + oneLine(q.getMessage()));
        } else {
            err.println("qchain: internal error: " + shortMessage(t));
        }
        if ("1".equals(System.getenv("QCHAIN_DEBUG"))) {
            t.printStackTrace(err);
        }
        err.flush();
        return ExitCodes.INTERNAL;
    }

    /**
     * What the command line adds to a message whose key (of a module below it) cannot name options: the option that
     * helps.
     */
    static String hint(QchainException q) {
        if (q.key() == ErrorKey.FREE_PARAMETERS) {
            return " (give values with --at, or use a symbolic command)";
        }
        if (q.key() == ErrorKey.NUMBER_TOO_LONG) {
            return "; raise it with --max-input-digits";
        }
        if (q.key() == ErrorKey.DENSE_TOO_LARGE) {
            return "; raise it with --max-dense-states";
        }
        return "";
    }

    /** Prints {@code qchain: interrupted} unless it was printed already in this process. */
    void reportInterrupt(PrintWriter err) {
        if (interruptReported.compareAndSet(false, true)) {
            err.println("qchain: interrupted");
            err.flush();
        }
    }

    private static String shortMessage(Throwable t) {
        if (t instanceof OutOfMemoryError) {
            return "out of memory (ask for a single row or entry with --from/--to, a smaller n, or give Java more"
                + " memory with JAVA_OPTS=-Xmx...)";
        }
        if (t instanceof StackOverflowError) {
            return "stack overflow";
        }
        String m = t.getMessage();
        return t.getClass().getSimpleName() + (m == null || m.isBlank() ? "" : ": " + oneLine(m))
            + " (set QCHAIN_DEBUG=1 for details)";
    }

    private static String oneLine(String s) {
        return s == null ? "" : s.replace('\n', ' ').replace('\r', ' ');
    }

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine cl = ex.getCommandLine();
        PrintWriter err = cl.getErr();
        if (ex instanceof UnmatchedArgumentException u && cl.getCommandSpec().parent() == null
            && !u.getUnmatched().isEmpty() && !u.getUnmatched().get(0).startsWith("-")) {
            // a word where a command belongs: list every command rather than guess two
            err.println("qchain: unknown command '" + u.getUnmatched().get(0) + "'; the commands are: "
                + QchainCommand.commandNames(cl));
        } else {
            err.println("qchain: " + oneLine(ex.getMessage()));
            UnmatchedArgumentException.printSuggestions(ex, err);
        }
        err.println("Try '" + cl.getCommandSpec().qualifiedName() + " --help' for more information.");
        err.flush();
        return ExitCodes.INPUT;
    }
}
