package org.qchain.analysis;

import java.io.InterruptedIOException;
import java.nio.channels.ClosedByInterruptException;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;

/**
 * Recognises an interruption however a library reports it: our {@link ErrorKey#INTERRUPTED}, Java's
 * {@link InterruptedException} and interruptible I/O, and JAS's {@code edu.jas.kern.PreemptingException} (named by
 * its class name, so that this class loads no JAS class).
 */
public final class Interrupts {
    /** JAS's unchecked exception for a preempted (interrupted) computation. */
    static final String JAS_PREEMPTION = "edu.jas.kern.PreemptingException";

    private Interrupts() {
    }

    /**
     * Whether {@code t}, or one of its causes, reports an interruption.
     *
     * @param t what was thrown
     * @return true for an interruption
     */
    public static boolean isInterruption(Throwable t) {
        for (Throwable c = t; c != null; c = c.getCause() == c ? null : c.getCause()) {
            if (c instanceof QchainException q && q.key() == ErrorKey.INTERRUPTED
                || c instanceof InterruptedException || c instanceof InterruptedIOException
                || c instanceof ClosedByInterruptException || c.getClass().getName().equals(JAS_PREEMPTION)) {
                return true;
            }
        }
        return false;
    }

    /** Work that may be interrupted. */
    interface Work<T> {
        T run();
    }

    /**
     * Runs work and turns any interruption it reports into {@link ErrorKey#INTERRUPTED}.
     *
     * @param work the work
     * @return its value
     * @throws QchainException {@link ErrorKey#INTERRUPTED} if the work was interrupted
     */
    static <T> T guarded(Work<T> work) {
        try {
            return work.run();
        } catch (RuntimeException e) {
            if (isInterruption(e) && !(e instanceof QchainException)) {
                throw new QchainException(ErrorKey.INTERRUPTED);
            }
            throw e;
        }
    }
}
