package org.qchain.symbolic.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Expr;
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.RowSums;
import org.qchain.symbolic.Formulas;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFun;

/**
 * The exact module's JAS-free row-sum check ({@link RowSums}: unreduced fractions of sparse polynomials, equality by
 * cross products) against JAS's reduced rational functions as the reference (JAS, the Java Algebra System, used
 * here through {@link ParamRing#fromExpr}): on random expressions (fixed seeds) both decide the same identities, and
 * where every divisor is irreducible (linear) both print the same lowest-terms text. Source: reference library JAS
 * (Kredel, the Java Algebra System: GenPolynomial over BigRational, quotients reduced by its multivariate gcd).
 */
class RowSumsAgainstJasTest {
    private static final List<String> VARS = List.of("a", "b", "c");
    private static final ParamRing RING = ParamRing.of(VARS);

    private static Expr parse(String text) {
        return ModelParser.parse("t.chain", "chain discrete\nparam a\nparam b\nparam c\nstates X Y\nX Y " + text
            + "\n").transitions().get(0).expr();
    }

    private static Expr num(Random r) {
        return Expr.num(Rational.of(r.nextInt(7) - 3, 1 + r.nextInt(4)));
    }

    private static Expr var(Random r) {
        return new Expr.Var(VARS.get(r.nextInt(VARS.size())), null);
    }

    /** A linear polynomial with a non-zero variable coefficient: irreducible, never zero. */
    private static Expr linear(Random r) {
        Expr e = new Expr.Bin(Expr.Op.MUL, Expr.num(Rational.of(1 + r.nextInt(3), 1 + r.nextInt(2))), var(r), null);
        return r.nextBoolean() ? Expr.add(e, num(r)) : Expr.sub(num(r), e);
    }

    /** A random expression; with {@code quotients}, divisions and negative powers of linear polynomials. */
    private static Expr random(Random r, int depth, boolean quotients) {
        if (depth == 0 || r.nextInt(5) == 0) {
            return r.nextBoolean() ? num(r) : var(r);
        }
        int k = r.nextInt(quotients ? 7 : 5);
        Expr a = random(r, depth - 1, quotients);
        return switch (k) {
            case 0 -> Expr.add(a, random(r, depth - 1, quotients));
            case 1 -> Expr.sub(a, random(r, depth - 1, quotients));
            case 2 -> new Expr.Bin(Expr.Op.MUL, a, random(r, depth - 1, quotients), null);
            case 3 -> new Expr.Pow(a, r.nextInt(4), null);
            case 4 -> new Expr.Neg(a, null);
            case 5 -> new Expr.Bin(Expr.Op.DIV, a, linear(r), null);
            default -> new Expr.Bin(Expr.Op.MUL, a, new Expr.Pow(linear(r), -1 - r.nextInt(2), null), null);
        };
    }

    private static boolean jasEqual(Expr x, Expr y) {
        return RING.fromExpr(x).equals(RING.fromExpr(y));
    }

    private static boolean rowSumsEqual(Expr x, Expr y) {
        // x = y exactly when 1 + x - y is identically 1
        return RowSums.isIdenticallyOne(Expr.sub(Expr.add(Expr.num(Rational.ONE), x), y), VARS);
    }

    @Test
    void polynomialsPrintAsJasPrintsThem() {
        // reference: JAS's expanded polynomial (GenPolynomial arithmetic), printed by the symbolic module's printer
        Random r = new Random(20_261_203L);
        for (int i = 0; i < 400; i++) {
            Expr e = random(r, 4, false);
            assertEquals(Formulas.plain(RING.fromExpr(e)), RowSums.plain(e, VARS), Expr.toPlain(e));
        }
    }

    @Test
    void quotientsByIrreducibleDivisorsPrintAsJasPrintsThem() {
        // reference: JAS's quotient in lowest terms (its gcd cancels common factors), printed as above
        Random r = new Random(7_041_993L);
        for (int i = 0; i < 400; i++) {
            Expr e = random(r, 4, true);
            assertEquals(Formulas.plain(RING.fromExpr(e)), RowSums.plain(e, VARS), Expr.toPlain(e));
        }
    }

    @Test
    void identitiesAreDecidedAsJasDecidesThem() {
        // reference: JAS decides x = y by equality of the two reduced quotients
        Random r = new Random(314_159L);
        int equal = 0;
        for (int i = 0; i < 300; i++) {
            Expr x = random(r, 4, true);
            Expr y = switch (i % 4) {
                case 0 -> parse(Formulas.plain(RING.fromExpr(x)));          // the canonical form, written again
                case 1 -> new Expr.Bin(Expr.Op.DIV, new Expr.Bin(Expr.Op.MUL, x, linear(r), null), linear(r), null);
                case 2 -> Expr.add(x, new Expr.Bin(Expr.Op.MUL, num(r), new Expr.Pow(var(r), r.nextInt(3), null),
                    null));
                default -> random(r, 4, true);
            };
            boolean jas = jasEqual(x, y);
            assertEquals(jas, rowSumsEqual(x, y), Expr.toPlain(x) + " = " + Expr.toPlain(y));
            equal += jas ? 1 : 0;
        }
        // both outcomes occur often, so the comparison tests something
        assertTrue(equal > 75 && equal < 250, "equal in " + equal + " of 300");
    }

    @Test
    void writtenRewritesOfOneAreIdentities() {
        Random r = new Random(2_718L);
        for (int i = 0; i < 200; i++) {
            Expr x = random(r, 3, true);
            Expr q = linear(r);
            // (x*q + q)/q - x = 1 for q != 0 (by hand, common practice, no source); adding q^2, not identically 0,
            // leaves a non-constant function, so not 1; JAS's quotient agrees on the first
            Expr e = Expr.sub(new Expr.Bin(Expr.Op.DIV, Expr.add(new Expr.Bin(Expr.Op.MUL, x, q, null), q), q, null),
                x);
            assertTrue(RING.fromExpr(e).isOne(), Expr.toPlain(e));
            assertTrue(RowSums.isIdenticallyOne(e, VARS), Expr.toPlain(e));
            assertFalse(RowSums.isIdenticallyOne(Expr.add(e, new Expr.Pow(q, 2, null)), VARS), Expr.toPlain(e));
        }
    }
}
