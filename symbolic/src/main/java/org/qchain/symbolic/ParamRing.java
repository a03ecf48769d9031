package org.qchain.symbolic;

import edu.jas.arith.BigInteger;
import edu.jas.arith.BigRational;
import edu.jas.poly.GenPolynomial;
import edu.jas.poly.GenPolynomialRing;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Expr;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ParamDecl;

/**
 * The ring Q[x1, ..., xk] of polynomials with rational coefficients in named variables (the parameters of a model),
 * and the field of rational functions over it, made once per model. Every {@link Poly}, {@link RatFun} and
 * {@link RatFunMatrix} belongs to one ring; values from different rings never mix (an
 * {@link IllegalArgumentException} says so).
 *
 * <p>Variables keep the order they were given in (for a model: the order of its {@code param} lines). That order
 * fixes the printed order of terms. Two rings are equal when their variable lists are equal.
 *
 * <p>Immutable and thread-safe.
 */
public final class ParamRing {
    static {
        JasRuntime.init();
    }

    private final List<String> names;
    private final Map<String, Integer> index;
    final GenPolynomialRing<BigRational> jas;
    final GenPolynomialRing<BigInteger> jasZ;
    private final Poly zero;
    private final Poly one;

    private ParamRing(List<String> names) {
        this.names = List.copyOf(names);
        this.index = new HashMap<>();
        for (int i = 0; i < names.size(); i++) {
            String n = names.get(i);
            if (!isName(n)) {
                throw new IllegalArgumentException("not a parameter name: '" + n + "'");
            }
            if (index.put(n, i) != null) {
                throw new IllegalArgumentException("parameter '" + n + "' given twice");
            }
        }
        this.jas = new GenPolynomialRing<>(BigRational.ZERO, names.toArray(new String[0]));
        this.jasZ = new GenPolynomialRing<>(BigInteger.ZERO, jas);
        this.zero = new Poly(this, jas.getZERO());
        this.one = new Poly(this, jas.getONE());
    }

    private static boolean isName(String s) {
        if (s == null || s.isEmpty() || !(Character.isLetter(s.charAt(0)) || s.charAt(0) == '_')) {
            return false;
        }
        for (int i = 1; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!(Character.isLetterOrDigit(c) || c == '_')) {
                return false;
            }
        }
        return true;
    }

    /**
     * The ring in the given variables.
     *
     * @param names distinct identifiers (letter or underscore, then letters, digits, underscores); may be empty
     * @return the ring
     * @throws IllegalArgumentException if a name is repeated or not an identifier
     */
    public static ParamRing of(List<String> names) {
        return new ParamRing(names);
    }

    /**
     * The ring in all parameters a model declares (with or without a nominal value), in declaration order.
     *
     * @param model the model
     * @return the ring
     */
    public static ParamRing of(Model model) {
        List<String> n = new ArrayList<>();
        for (ParamDecl p : model.params()) {
            n.add(p.name());
        }
        return new ParamRing(n);
    }

    /**
     * This ring with one more variable appended (for example {@code x} for characteristic polynomials or {@code z}
     * for generating functions).
     *
     * @param name a new identifier
     * @return the larger ring
     * @throws IllegalArgumentException if the name is already a variable
     */
    public ParamRing withVariable(String name) {
        List<String> n = new ArrayList<>(names);
        n.add(name);
        return new ParamRing(n);
    }

    /** The variable names, in order. */
    public List<String> variables() {
        return names;
    }

    /** The position of a variable, if it is one. */
    public Optional<Integer> indexOf(String name) {
        return Optional.ofNullable(index.get(name));
    }

    int requireIndex(String name) {
        Integer i = index.get(name);
        if (i == null) {
            throw new QchainException(ErrorKey.UNKNOWN_PARAMETER, name);
        }
        return i;
    }

    /** The number of variables. */
    public int size() {
        return names.size();
    }

    /** The polynomial 0. */
    public Poly zero() {
        return zero;
    }

    /** The polynomial 1. */
    public Poly one() {
        return one;
    }

    /**
     * A constant polynomial.
     *
     * @param c the value
     * @return {@code c} as a polynomial
     */
    public Poly constant(Rational c) {
        return new Poly(this, jas.valueOf(Convert.toJas(c)));
    }

    /**
     * The polynomial consisting of one variable.
     *
     * @param name a variable of this ring
     * @return the variable
     * @throws QchainException with {@link ErrorKey#UNKNOWN_PARAMETER} if it is not a variable of this ring
     */
    public Poly variable(String name) {
        requireIndex(name);
        return new Poly(this, jas.univariate(name));
    }

    /**
     * Maps a model expression into this ring's field of rational functions, exactly.
     *
     * @param e the expression
     * @return its value as a canonical rational function
     * @throws QchainException {@link ErrorKey#UNKNOWN_PARAMETER} at the name's position for a name that is not a
     *                         variable of this ring, {@link ErrorKey#DIVISION_BY_ZERO} at the operator for a division by
     *                         an expression that is identically zero
     */
    public RatFun fromExpr(Expr e) {
        return e.fold(new Expr.Folder<RatFun>() {
            @Override
            public RatFun num(Expr.Num n) {
                return RatFun.of(constant(n.value()));
            }

            @Override
            public RatFun var(Expr.Var v) {
                if (!index.containsKey(v.name())) {
                    throw new QchainException(v.pos(), ErrorKey.UNKNOWN_PARAMETER, v.name());
                }
                return RatFun.of(variable(v.name()));
            }

            @Override
            public RatFun neg(Expr.Neg g, RatFun operand) {
                return operand.negate();
            }

            @Override
            public RatFun bin(Expr.Bin b, RatFun l, RatFun r) {
                switch (b.op()) {
                    case ADD:
                        return l.add(r);
                    case SUB:
                        return l.subtract(r);
                    case MUL:
                        return l.multiply(r);
                    default:
                        if (r.isZero()) {
                            throw new QchainException(b.pos(), ErrorKey.DIVISION_BY_ZERO,
                                " in '" + Expr.toPlain(b) + "' (the divisor is identically 0)");
                        }
                        return l.divide(r);
                }
            }

            @Override
            public RatFun pow(Expr.Pow p, RatFun base) {
                if (base.isZero() && p.exponent() < 0) {
                    throw new QchainException(p.pos(), ErrorKey.DIVISION_BY_ZERO,
                        " in '" + Expr.toPlain(p) + "' (the base is identically 0)");
                }
                long degree = Math.abs((long) p.exponent())
                    * Math.max(base.numerator().totalDegree(), base.denominator().totalDegree());
                if (degree > MAX_EXPR_DEGREE) {
                    throw new QchainException(p.pos(), ErrorKey.SYMBOLIC_POWER_TOO_LARGE, Expr.toPlain(p), degree,
                        MAX_EXPR_DEGREE);
                }
                return base.pow(p.exponent());
            }
        });
    }

    /** The largest total degree a power written in a model expression may reach, checked before expanding it. */
    public static final int MAX_EXPR_DEGREE = 10_000;

    void check(ParamRing other) {
        if (other != this && !other.names.equals(names)) {
            throw new IllegalArgumentException("values from different parameter rings: " + names + " and " + other.names);
        }
    }

    Poly wrap(GenPolynomial<BigRational> p) {
        return new Poly(this, p);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ParamRing r && r.names.equals(names);
    }

    @Override
    public int hashCode() {
        return names.hashCode();
    }

    /** {@code Q[a, b]}. */
    @Override
    public String toString() {
        return "Q" + names.toString();
    }
}
