package org.qchain.exact.ctmc;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.linear.LinearSolver;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Expr;
import org.qchain.exact.model.Model;

/**
 * Exact derivatives of the figures of merit of a continuous chain with respect to one parameter (a failure or repair
 * rate), at a rational point: "how much does the MTTF gain per unit of repair rate".
 *
 * <p>Method: implicit differentiation of the defining linear systems, exactly. With {@code Q' = dQ/dθ} (each rate
 * differentiated as an expression at the point; the diagonal is minus the row's sum): the stationary law solves
 * {@code π A = e_n}, where {@code A} is {@code Q} with its last column replaced by ones, so
 * {@code π' A = -π A'} ({@code A'} is {@code Q'} with its last column zero); the MTTF solves {@code M m = 1} with
 * {@code M = -Q} on the up states that fail for sure, so {@code M m' = Q'_FF m}; the availability and the failure
 * frequency follow by the product rule (common practice, no source: the derivative of a solution of a linear system).
 */
public final class RateSensitivity {
    private RateSensitivity() {
    }

    /** The figures that can be differentiated. */
    public enum Figure {
        /** Steady-state availability. */
        AVAILABILITY,
        /** Steady-state unavailability. */
        UNAVAILABILITY,
        /** Mean time to failure from a given up state. */
        MTTF,
        /** Failure frequency ω. */
        FAILURE_FREQUENCY
    }

    /**
     * A figure, its derivative and its elasticity at the point.
     *
     * @param value      the figure
     * @param derivative d(figure)/d(parameter)
     * @param elasticity (parameter / figure) × derivative; empty when the figure is 0
     */
    public record Derivative(Rational value, Rational derivative, Optional<Rational> elasticity) {
    }

    /**
     * Differentiates one figure.
     *
     * @param model  a continuous model with operating states
     * @param values the point: a value for every used parameter (nominal values fill in)
     * @param param  the parameter differentiated by
     * @param figure which figure
     * @param from   the start, for {@link Figure#MTTF} (an up state's index); ignored otherwise
     * @return the derivative
     * @throws QchainException NO_UP_STATES without an {@code up} line; WRONG_KIND for a discrete chain;
     *                         BAD_ARGUMENT for an unknown parameter or an MTTF that is infinite or from a down state;
     *                         DEGENERATE_AVAILABILITY as {@link Availability#of}
     */
    public static Derivative of(Model model, Map<String, Rational> values, String param, Figure figure, int from) {
        if (model.kind() != ChainKind.CONTINUOUS) {
            throw new QchainException(ErrorKey.WRONG_KIND, model.kind().word(), "rate sensitivities need a continuous chain");
        }
        if (model.param(param).isEmpty()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--wrt", param, "the model declares no such parameter");
        }
        List<Integer> up = model.upStates().orElseThrow(() ->
            new QchainException(ErrorKey.NO_UP_STATES, "the sensitivity of " + figure.name().toLowerCase(java.util.Locale.ROOT)));
        Map<String, Rational> env = Chains.effectiveValues(model, values);
        RationalMatrix q = Chains.transitionMatrix(model, values);
        RationalMatrix dq = derivative(model, env, param);
        Rational theta = env.getOrDefault(param, Rational.ZERO);
        Rational v;
        Rational d;
        if (figure == Figure.MTTF) {
            Rational[] vd = mttf(q, dq, up, from, model);
            v = vd[0];
            d = vd[1];
        } else {
            Rational[] pi = Availability.stationary(q);
            Rational[] dpi = stationaryDerivative(q, dq, pi);
            boolean[] isUp = new boolean[q.rows()];
            up.forEach(i -> isUp[i] = true);
            Rational a = Rational.ZERO;
            Rational da = Rational.ZERO;
            Rational w = Rational.ZERO;
            Rational dw = Rational.ZERO;
            for (int i = 0; i < q.rows(); i++) {
                if (!isUp[i]) {
                    continue;
                }
                a = a.add(pi[i]);
                da = da.add(dpi[i]);
                for (int j = 0; j < q.rows(); j++) {
                    if (!isUp[j]) {
                        w = w.add(pi[i].multiply(q.get(i, j)));
                        dw = dw.add(dpi[i].multiply(q.get(i, j))).add(pi[i].multiply(dq.get(i, j)));
                    }
                }
            }
            switch (figure) {
                case AVAILABILITY:
                    v = a;
                    d = da;
                    break;
                case UNAVAILABILITY:
                    v = Rational.ONE.subtract(a);
                    d = da.negate();
                    break;
                default:
                    v = w;
                    d = dw;
            }
        }
        Optional<Rational> e = v.isZero() ? Optional.empty() : Optional.of(theta.divide(v).multiply(d));
        return new Derivative(v, d, e);
    }

    /**
     * An estimate, before any solve, of the decimal digits of the figure, its derivative and its elasticity at one
     * point (numerators and denominators together). Each row of the generator is scaled to integers by its common
     * denominator {@code d_i}; Hadamard's inequality bounds every determinant of Cramer's rule for the figure's
     * system (the generator with one column replaced by a right-hand side of at most {@code d_i} in row {@code i})
     * by {@code H = prod_i sqrt(|row_i|^2 + d_i^2)} (common practice, no source). The figure is a ratio of two such
     * determinants ({@code 2 log H}); the derivative's system has the same matrix and a right-hand side built from
     * {@code Q'} and the figure, so about {@code 4 log H} plus twice the digits of {@code Q'}; the elasticity is their
     * ratio times the parameter.
     *
     * @param model  a continuous model
     * @param values the point
     * @param param  the parameter differentiated by
     * @return the estimated digits
     */
    public static long digitEstimate(Model model, Map<String, Rational> values, String param) {
        Map<String, Rational> env = Chains.effectiveValues(model, values);
        RationalMatrix q = Chains.transitionMatrix(model, values);
        RationalMatrix dq = derivative(model, env, param);
        double logH = 0;
        long dqDigits = 0;
        for (int i = 0; i < q.rows(); i++) {
            java.math.BigInteger den = java.math.BigInteger.ONE;
            for (int j = 0; j < q.cols(); j++) {
                java.math.BigInteger d = q.get(i, j).denominator();
                den = den.divide(den.gcd(d)).multiply(d);
                dqDigits = Math.max(dqDigits, digits(dq.get(i, j)));
            }
            java.math.BigInteger sq = den.multiply(den);
            for (int j = 0; j < q.cols(); j++) {
                java.math.BigInteger e = q.get(i, j).numerator().multiply(den.divide(q.get(i, j).denominator()));
                sq = sq.add(e.multiply(e));
            }
            logH += (sq.bitLength() * Math.log10(2)) / 2;
        }
        long h = (long) Math.ceil(logH) + 1;
        long value = 2 * h;
        long derivative = 4 * h + 2 * dqDigits;
        long theta = digits(env.getOrDefault(param, Rational.ZERO));
        return value + derivative + value + derivative + theta;
    }

    private static long digits(Rational r) {
        return (long) Math.ceil((r.numerator().bitLength() + r.denominator().bitLength()) * Math.log10(2)) + 1;
    }

    /** {@code π'} from {@code π' A = -π A'}. */
    private static Rational[] stationaryDerivative(RationalMatrix q, RationalMatrix dq, Rational[] pi) {
        int n = q.rows();
        Rational[][] a = q.toArray();
        Rational[][] rhs = new Rational[1][n];
        for (int j = 0; j < n; j++) {
            Rational s = Rational.ZERO;
            if (j < n - 1) {
                for (int i = 0; i < n; i++) {
                    s = s.add(pi[i].multiply(dq.get(i, j)));
                }
            }
            rhs[0][j] = s.negate();
        }
        for (int i = 0; i < n; i++) {
            a[i][n - 1] = Rational.ONE;
        }
        return LinearSolver.solveLeft(RationalMatrix.of(a), RationalMatrix.of(rhs)).row(0);
    }

    /** The MTTF from {@code from} and its derivative, from {@code M m = 1} and {@code M m' = Q'_FF m}. */
    private static Rational[] mttf(RationalMatrix q, RationalMatrix dq, List<Integer> up, int from, Model model) {
        List<Optional<Rational>> all = Availability.mttf(q, up);
        String name = model.states().get(from);
        if (!up.contains(from)) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--from", name, "the MTTF starts in an up state");
        }
        if (all.get(from).isEmpty()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--from", name,
                "the mean time to failure from this state is infinite (it may never fail)");
        }
        List<Integer> f = new ArrayList<>();
        for (int i : up) {
            if (all.get(i).isPresent()) {
                f.add(i);
            }
        }
        java.util.Collections.sort(f);
        int m = f.size();
        Rational[][] a = new Rational[m][m];
        Rational[][] b = new Rational[m][1];
        for (int r = 0; r < m; r++) {
            Rational s = Rational.ZERO;
            for (int c = 0; c < m; c++) {
                a[r][c] = q.get(f.get(r), f.get(c)).negate();
                s = s.add(dq.get(f.get(r), f.get(c)).multiply(all.get(f.get(c)).orElseThrow()));
            }
            b[r][0] = s;
        }
        RationalMatrix x = LinearSolver.solve(RationalMatrix.of(a), RationalMatrix.of(b));
        return new Rational[] {all.get(from).orElseThrow(), x.get(f.indexOf(from), 0)};
    }

    /**
     * {@code dQ/dθ} at the point: every listed rate differentiated; the diagonal is minus the row's sum.
     *
     * @param model the model
     * @param env   values of every used parameter
     * @param param the parameter
     * @return the derivative of the generator
     */
    static RationalMatrix derivative(Model model, Map<String, Rational> env, String param) {
        int n = model.size();
        Rational[][] d = new Rational[n][n];
        for (Rational[] row : d) {
            java.util.Arrays.fill(row, Rational.ZERO);
        }
        for (org.qchain.exact.model.Transition t : model.transitions()) {
            d[t.from()][t.to()] = t.expr().fold(new Dual.Folder(env, param)).d();
        }
        for (int i = 0; i < n; i++) {
            Rational s = Rational.ZERO;
            for (int j = 0; j < n; j++) {
                if (j != i) {
                    s = s.add(d[i][j]);
                }
            }
            d[i][i] = s.negate();
        }
        return RationalMatrix.of(d);
    }

    /** A value and its derivative (forward-mode differentiation, exactly). */
    record Dual(Rational v, Rational d) {
        /** Folds an expression into its value and derivative with respect to one parameter. */
        record Folder(Map<String, Rational> env, String param) implements Expr.Folder<Dual> {
            @Override
            public Dual num(Expr.Num node) {
                return new Dual(node.value(), Rational.ZERO);
            }

            @Override
            public Dual var(Expr.Var node) {
                Rational v = env.get(node.name());
                if (v == null) {
                    throw new QchainException(node.pos(), ErrorKey.FREE_PARAMETERS, node.name());
                }
                return new Dual(v, node.name().equals(param) ? Rational.ONE : Rational.ZERO);
            }

            @Override
            public Dual neg(Expr.Neg node, Dual x) {
                return new Dual(x.v.negate(), x.d.negate());
            }

            @Override
            public Dual bin(Expr.Bin node, Dual l, Dual r) {
                switch (node.op()) {
                    case ADD:
                        return new Dual(l.v.add(r.v), l.d.add(r.d));
                    case SUB:
                        return new Dual(l.v.subtract(r.v), l.d.subtract(r.d));
                    case MUL:
                        return new Dual(l.v.multiply(r.v), l.d.multiply(r.v).add(l.v.multiply(r.d)));
                    default:
                        if (r.v.isZero()) {
                            throw new QchainException(node.pos(), ErrorKey.DIVISION_BY_ZERO, " in '" + Expr.toPlain(node) + "'");
                        }
                        return new Dual(l.v.divide(r.v),
                            l.d.multiply(r.v).subtract(l.v.multiply(r.d)).divide(r.v.multiply(r.v)));
                }
            }

            @Override
            public Dual pow(Expr.Pow node, Dual b) {
                int k = node.exponent();
                if (k == 0) {
                    return new Dual(Rational.ONE, Rational.ZERO);
                }
                if (b.v.isZero() && k < 0) {
                    throw new QchainException(node.pos(), ErrorKey.DIVISION_BY_ZERO, " in '" + Expr.toPlain(node) + "'");
                }
                Rational km1 = b.v.pow(k - 1);
                return new Dual(km1.multiply(b.v), Rational.of(k).multiply(km1).multiply(b.d));
            }
        }
    }
}
