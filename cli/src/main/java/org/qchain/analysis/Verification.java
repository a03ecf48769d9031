package org.qchain.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.certified.CertifiedTransient;
import org.qchain.exact.certified.Enclosure;
import org.qchain.exact.ctmc.Availability;
import org.qchain.exact.longrun.Arithmetic;
import org.qchain.exact.longrun.ChainEngine;
import org.qchain.exact.reference.PowerRows;
import org.qchain.exact.reference.ReferenceReader;
import org.qchain.exact.reference.Target;
import org.qchain.exact.reference.Verifier;
import org.qchain.exact.reference.VerifyReport;
import org.qchain.result.VerifyResult;

/**
 * The check of a float file against the exact values: the size guard, the exact values (computed before the file
 * is read for a row or an entry; row by row as the file asks for them for a whole matrix), and the streaming
 * comparison of the exact module ({@link Verifier}). Numeric only: references no symbolic class.
 */
final class Verification {
    private Verification() {
    }

    static VerifyResult run(LoadedModel model, VerifyQuery q, Progress progress) {
        if (q.t().isPresent()) {
            return transientCheck(model, q, progress);
        }
        if (isPower(q.what())) {
            return powerCheck(model, q, progress);
        }
        List<String> states = model.states();
        String has = "the model has " + states.size() + " states";
        Target target;
        Verifier.Truth truth;
        switch (q.what()) {
            case STATIONARY -> {
                Rational[] pi = stationary(model, q.maxDigits());
                target = Target.vector(states, has);
                truth = (i, j) -> pi[j];
            }
            case ABSORPTION, EXPECTED_STEPS -> {
                model.requireDiscrete("qchain verify --what " + q.what().word() + " needs a discrete chain");
                NumericEngine.guardSolve(model, q.maxDigits());
                ChainEngine.Absorption<Rational> a = ChainEngine.absorb(Arithmetic.RATIONAL,
                    NumericEngine.rows(model), states, Set.of());
                List<String> tr = names(states, a.transientStates());
                String trAre = "the model has " + tr.size() + " transient states";
                if (q.what() == VerifyQuery.What.EXPECTED_STEPS) {
                    target = Target.vector(tr, trAre);
                    truth = (i, j) -> a.expectedSteps().get(j);
                } else {
                    List<String> ab = names(states, a.absorbingStates());
                    target = Target.matrix(tr, ab, trAre, "the model has " + ab.size() + " absorbing states");
                    truth = (i, j) -> a.probabilities().get(i).get(j);
                }
            }
            case AVAILABILITY, MTTF -> {
                RationalMatrix g = model.generator("qchain verify --what " + q.what().word());
                List<Integer> up = model.model().upStates().orElseThrow(() ->
                    new QchainException(ErrorKey.NO_UP_STATES, "qchain verify --what " + q.what().word()));
                Availability.Figures<Rational> f = Availability.of(g, up, Availability.HOURS_PER_YEAR);
                if (q.what() == VerifyQuery.What.AVAILABILITY) {
                    target = Target.scalar("steady-state availability");
                    Rational av = f.availability();
                    truth = (i, j) -> av;
                } else {
                    List<Rational> mttf = new ArrayList<>();
                    for (int i : up) {
                        mttf.add(f.mttf().get(i).orElseThrow(() -> new QchainException(ErrorKey.NOT_APPLICABLE,
                            "MTTF from " + states.get(i), "the chain may never fail from there (infinite)")));
                    }
                    List<String> upNames = names(states, up);
                    target = Target.vector(upNames, "the model has " + upNames.size() + " up states");
                    truth = (i, j) -> mttf.get(j);
                }
            }
            default -> throw new IllegalStateException(q.what().word());
        }
        return compare(model, q, target, truth, new ArrayList<>(), progress);
    }

    private static boolean isPower(VerifyQuery.What w) {
        return w == VerifyQuery.What.MATRIX || w == VerifyQuery.What.ROW || w == VerifyQuery.What.ENTRY;
    }

    /** The shape of P^n or P(t), its row or its entry, as the query names it. */
    private static Target powerTarget(VerifyQuery q, List<String> states) {
        String has = "the model has " + states.size() + " states";
        return switch (q.what()) {
            case MATRIX -> Target.matrix(states, states, has, has);
            case ROW -> Target.vector(states, has);
            default -> Target.scalar(q.from().get() + " -> " + q.to().get());
        };
    }

    /** P^n, its row or its entry: guarded by the digit estimate before any power is computed. */
    private static VerifyResult powerCheck(LoadedModel model, VerifyQuery q, Progress progress) {
        model.requireDiscrete("qchain verify -n checks P^n of a discrete chain");
        RationalMatrix p = model.matrix();
        long n = q.n().orElseThrow();
        Verifier.Truth truth;
        if (q.what() == VerifyQuery.What.MATRIX) {
            SizeEstimate.requireWithin(SizeEstimate.digitsOfPower(p, n), q.maxDigits(),
                NumericEngine.MAX_DIGITS_OPTION);
            truth = new PowerRows(p, n, progress);
        } else {
            int from = model.state("--from", q.from().get());
            int to = q.to().map(t -> model.state("--to", t)).orElse(-1);
            // one entry is computed through its whole row, so the row's size bounds both
            SizeEstimate.requireWithin(SizeEstimate.digitsOfRow(p, from, n), q.maxDigits(),
                NumericEngine.MAX_DIGITS_OPTION);
            if (q.what() == VerifyQuery.What.ROW) {
                Rational[] row = MatrixPowers.rowOfPower(p, from, n, progress);
                truth = (i, j) -> row[j];
            } else {
                Rational value = MatrixPowers.entryOfPower(p, from, to, n, progress);
                truth = (i, j) -> value;
            }
        }
        return compare(model, q, powerTarget(q, model.states()), truth, new ArrayList<>(), progress);
    }

    /** Working precision of the enclosures of P(t), in bits: far below any binary64 difference. */
    static final int TRANSIENT_BITS = 256;

    /**
     * P(t) is not rational: each entry is compared with the midpoint of a certified enclosure (uniformization with
     * a proven bound), and the result says how wide the enclosures are, so every error shown is exact to within it.
     */
    private static VerifyResult transientCheck(LoadedModel model, VerifyQuery q, Progress progress) {
        RationalMatrix g = model.generator("qchain verify -t");
        // the work of P(t) at the working precision (77 digits = 256 bits), refused past the default limit
        ContinuousEngine.guardWork(g, List.of(q.t().get()), 77, org.qchain.exact.certified.CertifiedPowers.DEFAULT_MAX_WORK);
        if (!isPower(q.what())) {
            throw new QchainException(ErrorKey.NOT_APPLICABLE, "verify -t",
                "-t checks P(t), its rows or entries (--what matrix, row or entry), not " + q.what().word());
        }
        Enclosure[][] e = CertifiedTransient.of(g, q.t().get()).enclose(TRANSIENT_BITS, progress);
        Rational widest = Rational.ZERO;
        Rational[][] mid = new Rational[e.length][e.length];
        for (int i = 0; i < e.length; i++) {
            for (int j = 0; j < e.length; j++) {
                mid[i][j] = e[i][j].lo().add(e[i][j].hi()).divide(Rational.of(2));
                widest = widest.compareTo(e[i][j].width()) < 0 ? e[i][j].width() : widest;
            }
        }
        int from = q.from().map(f -> model.state("--from", f)).orElse(-1);
        int to = q.to().map(t -> model.state("--to", t)).orElse(-1);
        Verifier.Truth truth = (i, j) -> mid[from < 0 ? i : from][to < 0 ? j : to];
        List<String> warnings = new ArrayList<>();
        warnings.add("P(t) is not rational: each value was compared with the midpoint of a certified enclosure no"
            + " wider than " + org.qchain.exact.Decimals.format(widest, 3) + ", so every error shown is exact to"
            + " within that width");
        return compare(model, q, powerTarget(q, model.states()), truth, warnings, progress);
    }

    private static VerifyResult compare(LoadedModel model, VerifyQuery q, Target target, Verifier.Truth truth,
                                        List<String> warnings, Progress progress) {
        Verifier v = new Verifier(target, truth, q.tolerance(), q.show(), progress);
        VerifyReport report = v.report(ReferenceReader.read(q.against(), q.againstName(), target, v));
        if (report.checked() < report.expected()) {
            warnings.add(q.againstName() + " gives " + report.checked() + " of the " + report.expected()
                + " values; only those were checked");
        }
        return new VerifyResult(model.source(), q.againstName(), q.what().word(), q.n(), q.from(), q.to(), target,
            report, warnings, q.t());
    }

    /** The stationary law: of the one closed class of a discrete chain (zero on transient states), or from πQ = 0. */
    private static Rational[] stationary(LoadedModel model, long maxDigits) {
        if (model.model().kind() == org.qchain.exact.model.ChainKind.CONTINUOUS) {
            return Availability.stationary(model.generator("qchain verify --what stationary"));
        }
        NumericEngine.guardSolve(model, maxDigits);
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRun(Arithmetic.RATIONAL, NumericEngine.rows(model),
            model.states(), false);
        List<ChainEngine.ClassLaw<Rational>> closed = lr.classes().stream().filter(ChainEngine.ClassLaw::closed)
            .toList();
        if (closed.size() != 1) {
            throw new QchainException(ErrorKey.NOT_APPLICABLE, "verify --what stationary", "the chain has "
                + closed.size() + " closed classes, so its stationary law is not unique (see qchain longrun)");
        }
        Rational[] pi = new Rational[model.states().size()];
        java.util.Arrays.fill(pi, Rational.ZERO);
        ChainEngine.ClassLaw<Rational> c = closed.get(0);
        for (int k = 0; k < c.states().size(); k++) {
            pi[c.states().get(k)] = c.stationary().get(k);
        }
        return pi;
    }

    private static List<String> names(List<String> states, List<Integer> idx) {
        return idx.stream().map(states::get).toList();
    }
}
