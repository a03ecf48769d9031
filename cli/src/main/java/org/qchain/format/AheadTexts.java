package org.qchain.format;

import java.math.BigInteger;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Semaphore;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;
import org.qchain.exact.DecimalText;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * The texts of many values, converted in order on helper threads a bounded window ahead of the caller, so that a
 * formatter writes the first entries while later ones are still being converted (the exact entries of a large power
 * have thousands of digits each). The caller converts an entry itself when no helper has taken it yet, so one core is
 * enough; at most {@link #WINDOW} finished texts wait to be written, so memory stays that of a few entries.
 *
 * <p>The texts are those of numbers (digits, sign, {@code /}, {@code .}, exponent): writers copy them without
 * escaping.
 *
 * <p>Use once, in order ({@link #get} with 0, 1, 2, ...), then {@link #close} (also after a failure): helpers stop.
 * A failure of a conversion is thrown by {@link #get} of its entry; an interrupt of the caller while it waits is a
 * {@link QchainException} with {@link ErrorKey#INTERRUPTED}.
 */
final class AheadTexts implements AutoCloseable {
    /** Texts converted ahead of the one being written, at most. */
    static final int WINDOW = 32;
    /** Fewer entries than this are converted by the caller alone (no helper thread is worth starting). */
    static final int MIN_FOR_HELPERS = 4;

    private final List<Rational> values;
    private final Function<Rational, String> convert;
    private final CompletableFuture<String>[] texts;
    private final AtomicInteger next = new AtomicInteger();
    private final Semaphore room = new Semaphore(WINDOW);
    private volatile boolean closed;

    @SuppressWarnings("unchecked")
    private AheadTexts(List<Rational> values, Function<Rational, String> convert) {
        this.values = values;
        this.convert = convert;
        this.texts = new CompletableFuture[values.size()];
        for (int i = 0; i < texts.length; i++) {
            texts[i] = new CompletableFuture<>();
        }
    }

    /**
     * The exact texts ({@code p/q}, or {@code p}) of {@code values}, equal to {@link Rational#toString()}; a
     * denominator shared by several entries is converted once, and denominators that are small multiples of one
     * large divisor (common in powers: the reduced denominators are divisors of one {@code d^n}) are written from
     * that divisor's digits ({@link DecimalText.SharedFactor}).
     *
     * @param values the values, in the order they will be written
     * @return the texts, being converted
     */
    static AheadTexts exact(List<Rational> values) {
        Map<BigInteger, String> denominators = new ConcurrentHashMap<>();
        // the reduced denominators of a power are small multiples of one large divisor: written from its digits
        DecimalText.SharedFactor shared = DecimalText.SharedFactor.of(values.stream().filter(r -> !r.isInteger())
            .map(Rational::denominator).limit(4L * DecimalText.SharedFactor.MAX_SAMPLE).toList());
        return start(values, r -> {
            String p = DecimalText.toString(r.numerator());
            if (r.isInteger()) {
                return p;
            }
            return p + '/' + denominators.computeIfAbsent(r.denominator(), shared::toString);
        });
    }

    /**
     * The texts of {@code values} by {@code convert}, converted ahead.
     *
     * @param values  the values, in the order they will be written
     * @param convert the text of one value; called on helper threads, so it must be thread-safe
     * @return the texts, being converted
     */
    static AheadTexts start(List<Rational> values, Function<Rational, String> convert) {
        AheadTexts t = new AheadTexts(values, convert);
        int helpers = Math.min(Runtime.getRuntime().availableProcessors() - 1, values.size() / MIN_FOR_HELPERS);
        for (int h = 0; h < helpers; h++) {
            Thread th = new Thread(t::help, "qchain-text-" + h);
            th.setDaemon(true);
            th.start();
        }
        return t;
    }

    /** A helper: takes the next entry while the window has room. */
    private void help() {
        try {
            while (!closed) {
                room.acquire();
                if (closed || !convertNext()) {
                    return;
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** Takes the next unclaimed entry and converts it; false when none is left. */
    private boolean convertNext() {
        int i = next.getAndIncrement();
        if (i >= texts.length) {
            return false;
        }
        try {
            texts[i].complete(convert.apply(values.get(i)));
        } catch (RuntimeException | Error e) {
            texts[i].completeExceptionally(e);
        }
        return true;
    }

    /**
     * The text of entry {@code i}: the caller converts entries itself until {@code i} is taken, then waits for it.
     *
     * @param i the entry, the next one in order
     * @return its text
     * @throws QchainException {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    String get(int i) {
        if (Thread.currentThread().isInterrupted()) {
            // Ctrl-C: stop between entries, also when the caller converts them itself
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
        while (next.get() <= i) {
            convertNext();
        }
        try {
            String s = texts[i].get();
            texts[i] = null;
            room.release();
            return s;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new QchainException(ErrorKey.INTERRUPTED);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(e.getCause());
        }
    }

    /** Stops the helpers (entries not yet taken are not converted). */
    @Override
    public void close() {
        closed = true;
        next.set(texts.length);
        room.release(WINDOW + Runtime.getRuntime().availableProcessors());
    }
}
