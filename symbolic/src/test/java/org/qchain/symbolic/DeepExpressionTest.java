package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Expr;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;

/**
 * The symbolic map of a model's expressions goes through the exact module's iterative fold, so deep trees (a run of
 * minus signs, a long flat sum) map without a stack overflow, and the result evaluated at a rational point equals
 * the exact evaluation of the same tree (the identity is common practice, no source).
 */
class DeepExpressionTest {

    @Test
    void aLongRunOfMinusSignsAndAFlatSumMapIntoTheRing() {
        StringBuilder sum = new StringBuilder("p/20000");
        for (int k = 1; k < 10_000; k++) {
            sum.append(" + p/20000");
        }
        Model m = ModelParser.parse("m.chain", "param p\nparam r\nstates A B\nA B " + "-".repeat(50_000) + "r\nB A "
            + sum + "\n");
        ParamRing ring = ParamRing.of(m);
        Map<String, Rational> at = Map.of("p", Rational.of(1, 3), "r", Rational.of(2, 7));
        for (int k = 0; k < 2; k++) {
            Expr e = m.transitions().get(k).expr();
            // 50,000 nested nodes: a recursive walk would overflow the default stack
            RatFun f = ring.fromExpr(e);
            assertEquals(e.evaluate(at::get), f.evaluate(at));
        }
        assertEquals(Rational.of(1, 6), ring.fromExpr(m.transitions().get(1).expr()).evaluate(at));
    }
}
