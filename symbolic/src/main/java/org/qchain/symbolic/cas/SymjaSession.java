package org.qchain.symbolic.cas;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.apfloat.ApfloatContext;
import org.matheclipse.core.basic.Config;
import org.matheclipse.core.eval.ExprEvaluator;
import org.matheclipse.core.form.output.OutputFormFactory;
import org.matheclipse.core.interfaces.IExpr;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;

/**
 * A Symja evaluator for one thread, set up as the library notes prescribe, behind a text-only interface (no Symja
 * type appears here). qchain's arithmetic never goes through Symja; this class serves as a general-purpose
 * reference in tests and as the baseline in benchmarks, and for formatting where our own printers do not suffice.
 *
 * <p>Set-up, in this order: log4j's simple context (before any Symja or JAS class loads), {@code
 * Config.JAS_NO_THREADS = true} (no JAS pool that keeps the JVM alive for a minute), a fresh evaluator whose message
 * stream is captured (Symja prints its warnings on standard output otherwise), and the apfloat global context put
 * back as it was before Symja's static initialiser changed it (it disables disk storage).
 *
 * <p>Not thread-safe: use one session per thread. The first session in a JVM costs about a second (rule tables).
 */
public final class SymjaSession {
    private final ExprEvaluator evaluator;
    private final ByteArrayOutputStream messages = new ByteArrayOutputStream();
    private final OutputFormFactory plain;

    private SymjaSession() {
        if (System.getProperty("log4j2.loggerContextFactory") == null) {
            System.setProperty("log4j2.loggerContextFactory",
                "org.apache.logging.log4j.simple.SimpleLoggerContextFactory");
        }
        ApfloatContext global = ApfloatContext.getGlobalContext();
        ApfloatContext saved = (ApfloatContext) global.clone();
        Config.JAS_NO_THREADS = true;
        evaluator = new ExprEvaluator();
        restore(global, saved);
        PrintStream ps = new PrintStream(messages, true, StandardCharsets.UTF_8);
        evaluator.getEvalEngine().setErrorPrintStream(ps);
        evaluator.getEvalEngine().setOutPrintStream(ps);
        plain = OutputFormFactory.get(true, false);
        plain.setIgnoreNewLine(true);
    }

    private static void restore(ApfloatContext global, ApfloatContext saved) {
        global.setNumberOfProcessors(saved.getNumberOfProcessors());
        global.setMaxMemoryBlockSize(saved.getMaxMemoryBlockSize());
        global.setMemoryThreshold(saved.getMemoryThreshold());
        global.setSharedMemoryTreshold(saved.getSharedMemoryTreshold());
        global.setBlockSize(saved.getBlockSize());
        global.setCleanupAtExit(saved.getCleanupAtExit());
        global.setFilenameGenerator(saved.getFilenameGenerator());
    }

    /**
     * A new session (its own evaluator).
     *
     * @return the session
     */
    public static SymjaSession open() {
        return new SymjaSession();
    }

    /**
     * Evaluates an input in Symja's relaxed syntax and returns the result on one line.
     *
     * @param input for example {@code Together(D((1-a)^2/(1+a), a))}
     * @return the one-line output form
     * @throws QchainException with {@link ErrorKey#INTERNAL} if Symja throws
     */
    public String eval(String input) {
        try {
            IExpr r = evaluator.eval(input);
            return plain.toString(r);
        } catch (RuntimeException e) {
            throw new QchainException(ErrorKey.INTERNAL, "Symja failed on '" + input + "': " + e);
        }
    }

    /**
     * Symja's LaTeX form of an expression.
     *
     * @param input the expression in Symja syntax
     * @return the TeX text
     */
    public String texForm(String input) {
        return eval("TeXForm(" + input + ")");
    }

    /** Messages Symja printed so far (warnings such as a singular matrix), and clears them. */
    public String takeMessages() {
        String s = messages.toString(StandardCharsets.UTF_8);
        messages.reset();
        return s;
    }
}
