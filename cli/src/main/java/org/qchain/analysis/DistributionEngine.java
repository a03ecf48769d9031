package org.qchain.analysis;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.DistributionPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SizeEstimate;
import org.qchain.result.DistributionResult;

/**
 * Distributions after n steps on the numeric route: the exact module's {@link DistributionPowers} on the evaluated
 * matrix, the whole series estimated before any work. References no symbolic class.
 */
final class DistributionEngine {
    private DistributionEngine() {
    }

    /**
     * The size guard of a distribution query: the estimated digits of the whole series (every requested n), refused
     * past the limit before any work. A distribution's entries have denominators dividing {@code e · d_i d^(n-1)}
     * over the starting states i ({@code e} the start's common denominator), so each n costs at most the largest
     * starting row's estimate plus the digits of {@code e} in every numerator and denominator.
     */
    static void guard(LoadedModel model, DistributionQuery q, Rational[] start) {
        RationalMatrix p = model.matrix();
        BigInteger e = BigInteger.ONE;
        for (Rational x : start) {
            e = e.divide(e.gcd(x.denominator())).multiply(x.denominator());
        }
        long extra = 2L * start.length * (e.toString().length());
        long total = 0;
        for (long n : q.ns()) {
            long row = 0;
            for (int i = 0; i < start.length; i++) {
                if (!start[i].isZero()) {
                    row = Math.max(row, SizeEstimate.digitsOfRow(p, i, n));
                }
            }
            total = saturatedAdd(total, saturatedAdd(row, extra));
        }
        SizeEstimate.requireWithin(total, q.maxDigits(), NumericEngine.MAX_DIGITS_OPTION);
    }

    private static long saturatedAdd(long a, long b) {
        long s = a + b;
        return s < 0 ? Long.MAX_VALUE : s;
    }

    /** The start as a row vector over the model's states. */
    static Rational[] startVector(LoadedModel model, DistributionQuery q) {
        Rational[] start = new Rational[model.states().size()];
        java.util.Arrays.fill(start, Rational.ZERO);
        for (Map.Entry<String, Rational> w : q.start().weights().entrySet()) {
            start[model.state(q.start().option(), w.getKey())] = w.getValue();
        }
        return start;
    }

    static DistributionResult run(LoadedModel model, DistributionQuery q, Progress progress) {
        List<String> states = model.states();
        Rational[] start = startVector(model, q);
        int[] to = new int[q.to().size()];
        for (int k = 0; k < to.length; k++) {
            to[k] = model.state("--to", q.to().get(k));
        }
        guard(model, q, start);
        long[] ns = q.ns().stream().mapToLong(Long::longValue).toArray();
        List<Rational[]> rows = DistributionPowers.series(model.matrix(), start, ns, progress);
        List<DistributionResult.Line> lines = new ArrayList<>();
        for (int k = 0; k < ns.length; k++) {
            Rational[] row = rows.get(k);
            Optional<Rational> total = Optional.empty();
            if (to.length > 0) {
                Rational sum = Rational.ZERO;
                for (int j : to) {
                    sum = sum.add(row[j]);
                }
                total = Optional.of(sum);
            }
            lines.add(new DistributionResult.Line(ns[k], List.of(row), total));
        }
        Optional<org.qchain.result.Point> point = model.point().filter(pt -> !pt.isEmpty());
        return new DistributionResult(model.source(), model.model().kind().word(), q.start().weights(),
            q.start().single(), states, q.to(), q.series(), lines, point, List.of());
    }
}
