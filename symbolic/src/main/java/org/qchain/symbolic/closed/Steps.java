package org.qchain.symbolic.closed;

import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;

/** Progress reports between steps of the closed-form work, each also a point where an interrupt stops it. */
final class Steps {
    private Steps() {
    }

    /**
     * Reports a step and stops if the thread was interrupted.
     *
     * @throws QchainException with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    static void report(Progress p, String phase, long done, long total) {
        if (Thread.currentThread().isInterrupted()) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
        p.update(phase, done, total);
    }
}
