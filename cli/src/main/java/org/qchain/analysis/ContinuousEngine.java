package org.qchain.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.certified.CertifiedTransient;
import org.qchain.exact.certified.Enclosure;
import org.qchain.exact.certified.Ziv;
import org.qchain.exact.ctmc.Availability;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.TransientResult;

/** The numeric engine calls for continuous chains (exact and certified; no symbolic types). */
final class ContinuousEngine {
    private ContinuousEngine() {
    }

    static TransientResult transientProbabilities(LoadedModel model, TransientQuery q, Progress progress) {
        RationalMatrix g = model.generator("qchain step -t");
        guardWork(g, q);
        OptionalRow row = OptionalRow.of(model, q.from());
        List<TransientResult.AtTime> out = new ArrayList<>();
        CertifiedDecimal[][][] all = CertifiedTransient.decimals(g, q.times(), q.digits(), q.maxBits(), progress);
        for (int k = 0; k < q.times().size(); k++) {
            Rational t = q.times().get(k);
            CertifiedTransient plan = CertifiedTransient.of(g, t);
            CertifiedDecimal[][] d = all[k];
            List<List<CertifiedDecimal>> rows = new ArrayList<>();
            for (int i = 0; i < d.length; i++) {
                if (row.index < 0 || row.index == i) {
                    rows.add(Arrays.asList(d[i]));
                }
            }
            out.add(new TransientResult.AtTime(t, rows, CertifiedTransient.widest(d), plan.rate()));
        }
        return new TransientResult(model.source(), model.states(), q.from(), out, q.digits(), List.of());
    }

    static AvailabilityResult availability(LoadedModel model, AvailabilityQuery q, Progress progress) {
        RationalMatrix g = model.generator("qchain avail");
        List<Integer> up = model.model().upStates().orElseThrow(() ->
            new QchainException(ErrorKey.NO_UP_STATES, "qchain avail"));
        Availability.Figures<Rational> f = Availability.of(g, up, q.hoursPerYear());
        List<String> states = model.states();
        Map<String, Rational> pi = new LinkedHashMap<>();
        for (int i = 0; i < states.size(); i++) {
            pi.put(states.get(i), f.stationary().get(i));
        }
        Map<String, Optional<Rational>> mttf = new LinkedHashMap<>();
        List<String> upNames = new ArrayList<>();
        for (int i : f.up()) {
            upNames.add(states.get(i));
            mttf.put(states.get(i), f.mttf().get(i));
        }
        String from = q.from().orElse(states.get(up.get(0)));
        int start = model.state("--from", from);
        List<AvailabilityResult.PointAvailability> point = new ArrayList<>();
        List<AvailabilityResult.PointAvailability> reliability = new ArrayList<>();
        if (!q.times().isEmpty()) {
            // A(t) and R(t): two transient solves per time, each bounded by the estimate for the generator itself
            List<Rational> twice = new ArrayList<>(q.times());
            twice.addAll(q.times());
            guardWork(g, twice, q.digits(), q.maxWork());
        }
        RationalMatrix absorbing = q.times().isEmpty() ? g : downAbsorbing(g, up);
        for (int k = 0; k < q.times().size(); k++) {
            Rational t = q.times().get(k);
            point.add(new AvailabilityResult.PointAvailability(t, upProbability(g, start, up, t, q)));
            reliability.add(new AvailabilityResult.PointAvailability(t, upProbability(absorbing, start, up, t, q)));
            progress.update("times", k + 1, q.times().size());
        }
        return new AvailabilityResult(model.source(), upNames, states, pi, f.availability(), f.unavailability(),
            mttf, f.meanUpTime(), f.meanDownTime(), f.failureFrequency(), f.hoursPerYear(), f.downHoursPerYear(),
            from, point, q.digits(), List.of(), model.point().filter(p -> !p.isEmpty()), reliability);
    }

    /**
     * The probability of being in an up state at time t from {@code start}, as certified decimals: with the
     * generator itself the point availability A(t); with the down states absorbing the reliability R(t).
     */
    private static CertifiedDecimal upProbability(RationalMatrix g, int start, List<Integer> up, Rational t,
                                                  AvailabilityQuery q) {
        CertifiedTransient plan = CertifiedTransient.of(g, t);
        // the sum of the enclosures of P(start, j)(t) over the up states encloses the sum
        CertifiedDecimal[] a = Ziv.round(bits -> {
            Enclosure[] row = plan.enclose(bits, Progress.NONE)[start];
            Rational lo = Rational.ZERO;
            Rational hi = Rational.ZERO;
            for (int j : up) {
                lo = lo.add(row[j].lo());
                hi = hi.add(row[j].hi());
            }
            return new Enclosure[] {Enclosure.of(lo, hi.min(Rational.ONE).max(lo))};
        }, q.digits(), CertifiedTransient.startBits(q.digits()),
            Math.max(CertifiedTransient.startBits(q.digits()), q.maxBits()), Optional::empty);
        return a[0];
    }

    /** The generator with the rows of the down states set to zero: the down states absorbing (for R(t)). */
    static RationalMatrix downAbsorbing(RationalMatrix g, List<Integer> up) {
        int n = g.rows();
        Rational[][] e = new Rational[n][n];
        java.util.Set<Integer> upSet = new java.util.HashSet<>(up);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                e[i][j] = upSet.contains(i) ? g.get(i, j) : Rational.ZERO;
            }
        }
        return RationalMatrix.of(e);
    }

    /** Refuses, before any work, a P(t) whose estimated multiplications pass the query's limit. */
    static void guardWork(RationalMatrix g, TransientQuery q) {
        guardWork(g, q.times(), q.digits(), q.maxWork());
    }

    /** Refuses, before any work, a P(t) at these times whose estimated multiplications pass {@code maxWork}. */
    static void guardWork(RationalMatrix g, List<Rational> times, int digits, long maxWork) {
        CertifiedTransient.WorkEstimate e = CertifiedTransient.estimate(g, times, digits);
        if (e.multiplications() > maxWork) {
            throw new QchainException(ErrorKey.TRANSIENT_TOO_LARGE,
                CertifiedTransient.WorkEstimate.roughly(e.multiplications()), e.bits(), e.states(), e.rates(),
                e.times(), CertifiedTransient.WorkEstimate.roughly(e.largestRateTime()), maxWork,
                NumericEngine.MAX_WORK_OPTION);
        }
    }

    /** The row asked for, or -1 for all. */
    private record OptionalRow(int index) {
        static OptionalRow of(LoadedModel model, Optional<String> from) {
            return new OptionalRow(from.map(f -> model.state("--from", f)).orElse(-1));
        }
    }
}
