package org.qchain.symbolic.linear;

import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.Rational;
import org.qchain.exact.longrun.Arithmetic;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFun;

/**
 * Rational functions of a model's parameters with {@link SymbolicSolver}, so the long-run and absorption engine of
 * the exact module gives formulas (valid for generic parameter values: wherever no returned denominator vanishes).
 */
public final class RatFunArithmetic implements Arithmetic<RatFun> {
    private final ParamRing ring;
    private final RatFun zero;
    private final RatFun one;

    private RatFunArithmetic(ParamRing ring) {
        this.ring = ring;
        this.zero = RatFun.of(ring.zero());
        this.one = RatFun.of(ring.one());
    }

    /** The arithmetic of a ring's rational functions. */
    public static RatFunArithmetic of(ParamRing ring) {
        return new RatFunArithmetic(ring);
    }

    @Override
    public RatFun zero() {
        return zero;
    }

    @Override
    public RatFun one() {
        return one;
    }

    @Override
    public RatFun of(Rational r) {
        return RatFun.of(ring.constant(r));
    }

    @Override
    public RatFun add(RatFun a, RatFun b) {
        return a.add(b);
    }

    @Override
    public RatFun subtract(RatFun a, RatFun b) {
        return a.subtract(b);
    }

    @Override
    public RatFun multiply(RatFun a, RatFun b) {
        return a.multiply(b);
    }

    @Override
    public RatFun divide(RatFun a, RatFun b) {
        return a.divide(b);
    }

    @Override
    public boolean isZero(RatFun a) {
        return a.isZero();
    }

    @Override
    public List<List<RatFun>> solve(List<List<RatFun>> a, List<List<RatFun>> b) {
        RatFun[][] x = SymbolicSolver.solve(array(a), array(b));
        List<List<RatFun>> out = new ArrayList<>();
        for (RatFun[] row : x) {
            out.add(List.of(row));
        }
        return out;
    }

    @Override
    public List<RatFun> leftNullVector(List<List<RatFun>> a) {
        return List.of(SymbolicSolver.leftNullVector(array(a)));
    }

    private static RatFun[][] array(List<List<RatFun>> a) {
        RatFun[][] e = new RatFun[a.size()][];
        for (int i = 0; i < e.length; i++) {
            e[i] = a.get(i).toArray(new RatFun[0]);
        }
        return e;
    }
}
