package org.qchain.exact.reference;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalLong;
import java.util.PriorityQueue;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;
import org.qchain.exact.floats.Binary64;

/**
 * Compares given values with exact ones as they are read, and keeps only counts and the worst entries, so a file of
 * a million values needs memory for the worst few only.
 *
 * <p>For a given {@code x = a/b} and the truth {@code t = p/q} the difference is {@code D/(bq)} with
 * {@code D = aq - pb}, formed without a gcd. The tolerance tests are exact cross-multiplications:
 * {@code |x - t| <= r|t|} is {@code |D| r_den <= r_num |p| b}, and {@code |x - t| <= e} is
 * {@code |D| e_den <= e_num b q}. Only the reported errors are rounded, by {@link Binary64#round(BigInteger,
 * BigInteger)}: {@code x - t = D/(bq)} and {@code (x - t)/|t| = D/(b|p|)}. Ulps are counted between the double the
 * given text stands for and the correctly rounded double of the truth (IEEE 754-2019 binary64).
 *
 * <h2>Example</h2>
 * <pre>{@code
 * Target target = Target.vector(List.of("Up", "Down"), "the model has 2 states");
 * Verifier v = new Verifier(target, (i, j) -> row[j], Tolerance.orDefault(rel, abs, ulps), 10);
 * ReferenceReader.Summary s = ReferenceReader.read(path, "row.csv", target, v);
 * VerifyReport report = v.report(s);
 * }</pre>
 */
public final class Verifier implements ReferenceReader.Sink {
    /** The exact values of the target. */
    @FunctionalInterface
    public interface Truth {
        /**
         * The exact value of one entry.
         *
         * @param row target row index
         * @param col target column index
         * @return its exact value
         */
        Rational get(int row, int col);
    }

    private final Target target;
    private final Truth truth;
    private final Tolerance tolerance;
    private final int keep;
    private final PriorityQueue<EntryCheck> worst;
    private final Progress progress;
    private final Thread caller = Thread.currentThread();
    private long checked;
    private long over;
    private long nonFinite;
    private long correctlyRounded;
    private double worstRelative;
    private long worstUlps = -1;

    /**
     * A verifier.
     *
     * @param target    what the file holds
     * @param truth     the exact values
     * @param tolerance when a value passes
     * @param keep      how many of the worst entries to keep for the report, {@code >= 0}
     * @throws IllegalArgumentException if {@code keep < 0}
     */
    public Verifier(Target target, Truth truth, Tolerance tolerance, int keep) {
        this(target, truth, tolerance, keep, Progress.NONE);
    }

    /**
     * A verifier that reports progress (phase {@code "checking"}, every 4,096 values, out of the target's size) and
     * stops when the calling thread is interrupted.
     *
     * @param target    what the file holds
     * @param truth     the exact values
     * @param tolerance when a value passes
     * @param keep      how many of the worst entries to keep for the report, {@code >= 0}
     * @param progress  receives progress reports
     * @throws IllegalArgumentException if {@code keep < 0}
     */
    public Verifier(Target target, Truth truth, Tolerance tolerance, int keep, Progress progress) {
        this.progress = progress;
        if (keep < 0) {
            throw new IllegalArgumentException("keep must not be negative: " + keep);
        }
        this.target = target;
        this.truth = truth;
        this.tolerance = tolerance;
        this.keep = keep;
        // a max-heap of the kept entries' "goodness": its head is the least bad one, dropped first
        this.worst = new PriorityQueue<>(Math.max(1, Math.min(keep, 1024)), EntryCheck.WORST_FIRST.reversed());
    }

    @Override
    public void accept(int row, int col, GivenValue value, SourcePos pos) {
        EntryCheck c = check(row, col, value, pos);
        checked++;
        if ((checked & 4095) == 0) {
            if (caller.isInterrupted()) {
                throw new QchainException(ErrorKey.INTERRUPTED);
            }
            progress.update("checking", Math.min(checked, target.size()), target.size());
        }
        if (!c.pass()) {
            over++;
        }
        if (c.isFinite()) {
            worstRelative = Math.max(worstRelative, Math.abs(c.relativeError()));
            worstUlps = Math.max(worstUlps, c.ulps().getAsLong());
            if (c.isCorrectlyRounded()) {
                correctlyRounded++;
            }
        } else {
            nonFinite++;
        }
        if (keep > 0) {
            if (worst.size() < keep) {
                worst.add(c);
            } else if (EntryCheck.WORST_FIRST.compare(c, worst.peek()) < 0) {
                worst.poll();
                worst.add(c);
            }
        }
    }

    /**
     * Checks one value without recording it.
     *
     * @param row   target row index
     * @param col   target column index
     * @param value the given value
     * @param pos   where it is
     * @return the check
     */
    public EntryCheck check(int row, int col, GivenValue value, SourcePos pos) {
        Rational t = truth.get(row, col);
        double td = Binary64.round(t);
        String label = target.label(row, col);
        if (!(value instanceof GivenValue.Finite f)) {
            double e = value.asDouble();
            return new EntryCheck(row, col, label, pos, value.text(), t, e, td, e, e,
                OptionalLong.empty(), false);
        }
        Rational x = f.value();
        BigInteger a = x.numerator();
        BigInteger b = x.denominator();
        BigInteger p = t.numerator();
        BigInteger q = t.denominator();
        BigInteger d = a.multiply(q).subtract(p.multiply(b));
        BigInteger absD = d.abs();
        double error = d.signum() == 0 ? 0.0 : Binary64.round(d, b.multiply(q));
        double rel;
        if (d.signum() == 0) {
            rel = 0.0;
        } else if (p.signum() == 0) {
            rel = d.signum() > 0 ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
        } else {
            rel = Binary64.round(d, b.multiply(p.abs()));
        }
        long ulps = Binary64.ulpDistance(f.asDouble(), td);
        boolean pass = false;
        if (tolerance.relative().isPresent()) {
            Rational r = tolerance.relative().get();
            pass = absD.multiply(r.denominator()).compareTo(r.numerator().multiply(p.abs()).multiply(b)) <= 0;
        }
        if (!pass && tolerance.absolute().isPresent()) {
            Rational e = tolerance.absolute().get();
            pass = absD.multiply(e.denominator()).compareTo(e.numerator().multiply(b).multiply(q)) <= 0;
        }
        if (!pass && tolerance.ulps().isPresent()) {
            pass = ulps <= tolerance.ulps().getAsLong();
        }
        return new EntryCheck(row, col, label, pos, value.text(), t, f.asDouble(), td, error, rel,
            OptionalLong.of(ulps), pass);
    }

    /**
     * The report so far.
     *
     * @param summary what the reader read
     * @return the report, worst entries first
     */
    public VerifyReport report(ReferenceReader.Summary summary) {
        List<EntryCheck> list = new ArrayList<>(worst);
        list.sort(EntryCheck.WORST_FIRST);
        return new VerifyReport(summary.form(), tolerance, target.size(), checked, over, nonFinite, correctlyRounded,
            worstRelative, worstUlps < 0 ? OptionalLong.empty() : OptionalLong.of(worstUlps), list);
    }
}
