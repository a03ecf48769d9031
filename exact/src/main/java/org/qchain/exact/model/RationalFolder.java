package org.qchain.exact.model;

import java.util.function.Function;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/** {@link Expr#evaluate}: the fold of a tree into {@link Rational}, with errors at the offending node. */
final class RationalFolder implements Expr.Folder<Rational> {
    private final Function<String, Rational> values;

    RationalFolder(Function<String, Rational> values) {
        this.values = values;
    }

    @Override
    public Rational num(Expr.Num node) {
        return node.value();
    }

    @Override
    public Rational var(Expr.Var node) {
        Rational r = values.apply(node.name());
        if (r == null) {
            throw new QchainException(node.pos(), ErrorKey.FREE_PARAMETERS, node.name());
        }
        return r;
    }

    @Override
    public Rational neg(Expr.Neg node, Rational operand) {
        return operand.negate();
    }

    @Override
    public Rational bin(Expr.Bin node, Rational l, Rational r) {
        switch (node.op()) {
            case ADD:
                return l.add(r);
            case SUB:
                return l.subtract(r);
            case MUL:
                return l.multiply(r);
            default:
                if (r.isZero()) {
                    throw new QchainException(node.pos(), ErrorKey.DIVISION_BY_ZERO, " in '" + Expr.toPlain(node) + "'");
                }
                return l.divide(r);
        }
    }

    @Override
    public Rational pow(Expr.Pow node, Rational base) {
        if (base.isZero() && node.exponent() < 0) {
            throw new QchainException(node.pos(), ErrorKey.DIVISION_BY_ZERO, " in '" + Expr.toPlain(node) + "'");
        }
        // the numerator and denominator of b^k have about k times the bits of b's: refuse before computing
        long bits = (long) Math.max(base.numerator().bitLength(), base.denominator().bitLength())
            * Math.abs((long) node.exponent());
        if (bits > Expr.MAX_POWER_BITS) {
            throw new QchainException(node.pos(), ErrorKey.POWER_TOO_LARGE, Expr.toPlain(node),
                (long) (bits * Expr.LOG10_2), (long) (Expr.MAX_POWER_BITS * Expr.LOG10_2));
        }
        return base.pow(node.exponent());
    }
}
