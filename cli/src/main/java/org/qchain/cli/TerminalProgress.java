package org.qchain.cli;

import java.io.PrintWriter;
import java.util.function.LongSupplier;
import org.qchain.exact.Progress;

/**
 * Progress of long work on one stderr line ({@code \r}-updated), shown only after {@link #DELAY_NANOS} and refreshed
 * at most every {@link #PERIOD_NANOS}, so short runs print nothing. It never throws: stopping on Ctrl-C is the
 * engine's job (it checks the thread's interrupt flag).
 */
final class TerminalProgress implements Progress {
    static final long DELAY_NANOS = 1_000_000_000L;
    static final long PERIOD_NANOS = 200_000_000L;

    private final PrintWriter err;
    private final boolean show;
    private final LongSupplier clock;
    private final long start;
    private long last = Long.MIN_VALUE;
    private int shownWidth;

    /**
     * @param err  where to print
     * @param show whether to print at all (stderr is a terminal)
     */
    TerminalProgress(PrintWriter err, boolean show) {
        this(err, show, System::nanoTime);
    }

    /** With a clock in nanoseconds, for tests. */
    TerminalProgress(PrintWriter err, boolean show, LongSupplier clock) {
        this.err = err;
        this.show = show;
        this.clock = clock;
        this.start = clock.getAsLong();
    }

    @Override
    public synchronized void update(String phase, long done, long total) {
        if (!show) {
            return;
        }
        long now = clock.getAsLong();
        if (now - start < DELAY_NANOS || (last != Long.MIN_VALUE && now - last < PERIOD_NANOS)) {
            return;
        }
        last = now;
        String text = phase + " " + done + "/" + total;
        err.print("\r" + text + " ".repeat(Math.max(0, shownWidth - text.length())));
        err.flush();
        shownWidth = text.length();
    }

    /** Clears the progress line if one is shown. */
    synchronized void clear() {
        if (shownWidth > 0) {
            err.print("\r" + " ".repeat(shownWidth) + "\r");
            err.flush();
            shownWidth = 0;
        }
    }
}
