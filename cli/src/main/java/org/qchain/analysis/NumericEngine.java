package org.qchain.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.TopPaths;
import org.qchain.exact.WeightedPath;
import org.qchain.exact.SparseRationalMatrix;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.certified.CertifiedPowers;
import org.qchain.result.CertifiedStepResult;
import org.qchain.result.CheckResult;
import org.qchain.result.StepResult;

/** The numeric route: the exact module's engines on the evaluated matrix. References no symbolic class. */
final class NumericEngine {
    /** The option that raises the size limit, named in the refusal. */
    static final String MAX_DIGITS_OPTION = "--max-digits";
    /** The option that raises the limit on the work of a path search. */
    static final String MAX_PATH_DIGITS_OPTION = "--max-path-digits";
    /**
     * What the size refusal of an exact result names: the limit, and the way to decimals without the exact
     * fraction.
     */
    static final String MAX_DIGITS_OR_CERTIFIED = MAX_DIGITS_OPTION
        + ", or ask for certified decimals without the exact fractions with --certified";
    /** The option that raises the limit on the work of a certified result. */
    static final String MAX_WORK_OPTION = "--max-work";

    private NumericEngine() {
    }

    /** The size guard of a numeric step query: every estimate checked before any engine runs. */
    static void guard(LoadedModel model, StepQuery q) {
        RationalMatrix p = model.matrix();
        if (q.from().isEmpty()) {
            SizeEstimate.requireWithin(SizeEstimate.digitsOfPower(p, q.n()), q.maxDigits(), MAX_DIGITS_OR_CERTIFIED);
            return;
        }
        int from = model.state("--from", q.from().get());
        q.to().ifPresent(t -> model.state("--to", t));
        // one entry is computed through its whole row, so the row's size bounds both
        SizeEstimate.requireWithin(SizeEstimate.digitsOfRow(p, from, q.n()), q.maxDigits(),
            q.paths().isPresent() ? MAX_DIGITS_OPTION : MAX_DIGITS_OR_CERTIFIED);
        if (q.paths().isPresent()) {
            if (q.n() > Integer.MAX_VALUE) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "-n", q.n(),
                    "--paths needs n at most " + Integer.MAX_VALUE);
            }
            long work = SizeEstimate.digitsOfPathSearch(p, q.n(), q.paths().getAsInt());
            if (work > q.maxPathDigits()) {
                throw new QchainException(ErrorKey.PATH_SEARCH_TOO_LARGE, work, q.maxPathDigits(),
                    MAX_PATH_DIGITS_OPTION);
            }
        }
    }

    /** An exact step; {@link SizeGuard} has checked the query's estimates. */
    static StepResult step(LoadedModel model, StepQuery q, Progress progress) {
        RationalMatrix p = model.matrix();
        StepResult.Header header = header(model, q.n(), List.of());
        if (q.from().isEmpty()) {
            RationalMatrix pn = MatrixPowers.power(p, q.n(), progress);
            List<List<Rational>> rows = new ArrayList<>();
            for (int i = 0; i < pn.rows(); i++) {
                rows.add(List.of(pn.row(i)));
            }
            return new StepResult.Matrix(header, model.states(), rows);
        }
        int from = model.state("--from", q.from().get());
        if (q.to().isEmpty()) {
            return new StepResult.Row(header, q.from().get(), model.states(),
                List.of(MatrixPowers.rowOfPower(p, from, q.n(), progress)));
        }
        int to = model.state("--to", q.to().get());
        Rational total = MatrixPowers.entryOfPower(p, from, to, q.n(), progress);
        List<String> warnings = new ArrayList<>();
        Optional<List<StepResult.PathLine>> paths = Optional.empty();
        if (q.paths().isPresent()) {
            paths = Optional.of(paths(model, from, to, total, q, warnings, progress));
        }
        // the path search may add warnings
        return new StepResult.Single(header(model, q.n(), warnings), q.from().get(), q.to().get(), total, paths);
    }

    private static StepResult.Header header(LoadedModel model, long n, List<String> warnings) {
        return new StepResult.Header(model.source(), model.model().kind().word(), n, warnings,
            model.point().filter(p -> !p.isEmpty()));
    }

    /**
     * Certified decimals of P^n, a row or an entry, on the sparse matrix (a row or an entry never needs the dense
     * one). The work is estimated before it starts and refused past {@link StepQuery#maxWork()}.
     */
    static CertifiedStepResult certifiedStep(LoadedModel model, StepQuery q, Progress progress) {
        SparseRationalMatrix p = model.sparseMatrix();
        CertifiedPowers.Settings settings = new CertifiedPowers.Settings(q.digits(), CertifiedPowers.DEFAULT_MAX_BITS,
            q.maxDigits(), q.maxWork(), MAX_WORK_OPTION);
        StepResult.Header header = new StepResult.Header(model.source(), model.model().kind().word(), q.n(),
            List.of());
        List<String> states = model.states();
        if (q.from().isEmpty()) {
            CertifiedDecimal[][] all = CertifiedPowers.power(p, q.n(), settings, progress);
            List<List<CertifiedDecimal>> rows = new ArrayList<>();
            for (CertifiedDecimal[] row : all) {
                rows.add(List.of(row));
            }
            return new CertifiedStepResult(header, Optional.empty(), Optional.empty(), states, states, rows,
                q.digits());
        }
        int from = model.state("--from", q.from().get());
        if (q.to().isEmpty()) {
            CertifiedDecimal[] row = CertifiedPowers.row(p, from, q.n(), settings, progress);
            return new CertifiedStepResult(header, q.from(), Optional.empty(), List.of(q.from().get()), states,
                List.of(List.of(row)), q.digits());
        }
        int to = model.state("--to", q.to().get());
        CertifiedDecimal d = CertifiedPowers.entry(p, from, to, q.n(), settings, progress);
        return new CertifiedStepResult(header, q.from(), q.to(), List.of(q.from().get()), List.of(q.to().get()),
            List.of(List.of(d)), q.digits());
    }

    private static List<StepResult.PathLine> paths(LoadedModel model, int from, int to, Rational total, StepQuery q,
                                                   List<String> warnings, Progress progress) {
        int k = q.paths().getAsInt();
        List<StepResult.PathLine> out = new ArrayList<>();
        String fromName = q.from().get();
        String toName = q.to().get();
        if (total.isZero()) {
            warnings.add("no path of " + q.n() + " steps leads from " + fromName + " to " + toName);
            return out;
        }
        List<WeightedPath> top = TopPaths.mostProbable(model.matrix(), from, to, (int) q.n(), k, progress);
        for (WeightedPath w : top) {
            List<String> names = new ArrayList<>();
            for (int s : w.states()) {
                names.add(model.states().get(s));
            }
            out.add(new StepResult.PathLine(names, w.probability(), w.probability().divide(total)));
        }
        if (top.size() < k) {
            warnings.add("only " + top.size() + (top.size() == 1 ? " path" : " paths") + " of " + q.n()
                + " steps " + (top.size() == 1 ? "leads" : "lead") + " from " + fromName + " to " + toName
                + "; --paths asked for " + k);
        }
        return out;
    }

    /** The one-step matrix, looked at a second, independent time: entries in [0, 1], rows summing to exactly 1. */
    static CheckResult check(LoadedModel model) {
        RationalMatrix p = model.matrix();
        List<String> states = model.states();
        for (int i = 0; i < p.rows(); i++) {
            Rational sum = Rational.ZERO;
            for (int j = 0; j < p.cols(); j++) {
                Rational x = p.get(i, j);
                if (x.signum() < 0 || x.compareTo(Rational.ONE) > 0) {
                    throw new QchainException(ErrorKey.PROBABILITY_RANGE, states.get(i), states.get(j), x);
                }
                sum = sum.add(x);
            }
            if (!sum.isOne()) {
                throw new QchainException(ErrorKey.ROW_SUM, states.get(i), sum);
            }
        }
        List<List<Rational>> rows = new ArrayList<>();
        for (int i = 0; i < p.rows(); i++) {
            rows.add(List.of(p.row(i)));
        }
        return new CheckResult.Numeric(new StepResult.Matrix(header(model, 1, List.of()), states, rows));
    }

    /**
     * The generator of a continuous chain at the point (validated at load: no negative rate, rows summing to 0 by
     * construction), with each state's total rate out and mean holding time.
     */
    static CheckResult generatorCheck(LoadedModel model) {
        RationalMatrix g = model.generator("qchain check");
        List<List<org.qchain.result.Formula>> rows = new ArrayList<>();
        List<org.qchain.result.Formula> out = new ArrayList<>();
        List<java.util.Optional<org.qchain.result.Formula>> holding = new ArrayList<>();
        for (int i = 0; i < g.rows(); i++) {
            List<org.qchain.result.Formula> row = new ArrayList<>();
            Rational sum = Rational.ZERO;
            for (int j = 0; j < g.cols(); j++) {
                row.add(new org.qchain.result.ExactValue(g.get(i, j)));
                sum = sum.add(g.get(i, j));
            }
            if (!sum.isZero()) {
                throw new QchainException(ErrorKey.INTERNAL, "row " + model.states().get(i) + " of the generator sums"
                    + " to " + sum + ", not 0");
            }
            rows.add(row);
            Rational q = g.get(i, i).negate();
            out.add(new org.qchain.result.ExactValue(q));
            holding.add(q.isZero() ? java.util.Optional.empty()
                : java.util.Optional.of(new org.qchain.result.ExactValue(q.reciprocal())));
        }
        return new CheckResult.Generator(model.source(), model.states(), List.of(), false, rows, out, holding,
            upNames(model), model.point().filter(p -> !p.isEmpty()), List.of());
    }

    /** The names on the model's {@code up} line, if it has one. */
    static java.util.Optional<List<String>> upNames(LoadedModel model) {
        return model.model().upStates().map(ix -> ix.stream().map(i -> model.states().get(i)).toList());
    }

    // --- classes, longrun, absorb --------------------------------------------------------------------------------

    /**
     * The size guard of the exact solves: Hadamard's bound gives the digits of the common denominator (at most the
     * sum over rows of log10(row denominator * row length)); each of the up to n^2 result entries has at most about
     * twice that many digits.
     */
    static void guardSolve(LoadedModel model, long maxDigits) {
        RationalMatrix p = chainMatrix(model);
        guardSolve(p, maxDigits, (double) p.rows() * p.rows());
    }

    /**
     * {@link #guardSolve(LoadedModel, long)} for a result of {@code values} entries (each about twice the digits of
     * the common denominator): with {@code --brief} the n x n tables are left out, and the result is a few vectors.
     */
    static void guardSolve(RationalMatrix p, long maxDigits, double values) {
        int n = p.rows();
        double det = 0;
        for (int i = 0; i < n; i++) {
            java.math.BigInteger l = java.math.BigInteger.ONE;
            int nz = 0;
            for (int j = 0; j < n; j++) {
                Rational x = p.get(i, j);
                if (!x.isZero()) {
                    nz++;
                    java.math.BigInteger d = x.denominator();
                    l = l.divide(l.gcd(d)).multiply(d);
                }
            }
            det += l.bitLength() * Math.log10(2) + Math.log10(Math.max(2, nz + 1));
        }
        long digits = (long) Math.min(Long.MAX_VALUE / 4.0, 2.0 * det * values);
        if (digits > maxDigits) {
            throw new QchainException(ErrorKey.SOLVE_TOO_LARGE, n, digits, maxDigits, MAX_DIGITS_OPTION);
        }
    }

    /** The one-step matrix, or a continuous chain's generator: the long-run engine takes either. */
    private static RationalMatrix chainMatrix(LoadedModel model) {
        return ChainResults.continuous(model) ? model.generator("this analysis") : model.matrix();
    }

    static List<List<Rational>> rows(LoadedModel model) {
        RationalMatrix p = chainMatrix(model);
        List<List<Rational>> out = new ArrayList<>();
        for (int i = 0; i < p.rows(); i++) {
            out.add(List.of(p.row(i)));
        }
        return out;
    }

    static org.qchain.result.ClassesResult classes(LoadedModel model, boolean brief) {
        return ChainResults.classes(model, org.qchain.exact.longrun.Arithmetic.RATIONAL, rows(model),
            org.qchain.result.ExactValue::new, List.of(), List.of(), List.of(), brief);
    }

    static org.qchain.result.LongRunResult longRun(LoadedModel model, LongRunQuery q, Progress progress) {
        RationalMatrix p = chainMatrix(model);
        int n = p.rows();
        if (q.brief() && !q.passage()) {
            // the stationary laws and mean recurrence times (2n values) and the absorption of each transient state
            // into each closed class
            long closed = org.qchain.exact.longrun.Structure.of(ChainResults.graph(model,
                org.qchain.exact.longrun.Arithmetic.RATIONAL, rows(model))).closedClasses().size();
            guardSolve(p, q.maxDigits(), (double) n * (2 + closed));
        } else {
            guardSolve(p, q.maxDigits(), (double) n * n);
        }
        return ChainResults.longRun(model, q, org.qchain.exact.longrun.Arithmetic.rational(progress), rows(model),
            org.qchain.result.ExactValue::new, List.of(), List.of());
    }

    static org.qchain.result.AbsorbResult absorb(LoadedModel model, AbsorbQuery q, Progress progress) {
        RationalMatrix p = chainMatrix(model);
        int n = p.rows();
        if (q.limits().brief() && q.rewards().isEmpty()) {
            // without N (and without rewards, whose long-run average needs the limit of P^n): t, its variance (twice
            // the digits) and one absorption probability per absorbing state, for each state
            long absorbing = q.absorbing().size();
            for (int i = 0; i < n; i++) {
                boolean leaves = false;
                for (int j = 0; j < n && !leaves; j++) {
                    leaves = j != i && !p.get(i, j).isZero();
                }
                absorbing += leaves ? 0 : 1;
            }
            guardSolve(p, q.limits().maxDigits(), (double) n * (3 + Math.min(n, absorbing)));
        } else {
            guardSolve(p, q.limits().maxDigits(), (double) n * n);
        }
        return ChainResults.absorb(model, q, org.qchain.exact.longrun.Arithmetic.rational(progress), rows(model),
            org.qchain.result.ExactValue::new, List.of(), List.of());
    }
}
