package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * Expressions: precedence as in ordinary mathematics (common practice, no source) and the round trip
 * text -> tree -> {@link Expr#toPlain} -> tree at random rational points with fixed seeds.
 */
class ExprRoundTripTest {
    private static final List<String> VARS = List.of("a", "b", "c");

    static Rational value(String text, Map<String, Rational> at) {
        return ModelParser.parseExpression("<expr>", text).evaluate(at::get);
    }

    @Test
    void precedenceAndAssociativityFollowOrdinaryMathematics() {
        // common practice, no source: * / before + -, both left-associative; ^ binds tighter than unary minus
        Map<String, Rational> at = Map.of("p", Rational.of(1, 3));
        assertEquals(Rational.of(7), value("1 + 2 * 3", at));
        assertEquals(Rational.of(1, 8), value("1/2/4", at));
        assertEquals(Rational.of(1), value("2 / 1/2", at));
        assertEquals(Rational.of(-1, 9), value("-p^2", at));
        assertEquals(Rational.of(9), value("p^-2", at));
        assertEquals(Rational.of(9), value("p^(-2)", at));
        assertEquals(Rational.of(-4), value("-1/2^2 * 16", at));
        assertEquals(Rational.of(1, 4), value("(1/2)^2", at));
        assertEquals(Rational.of(2, 3), value("1 - p", at));
        assertEquals(Rational.of(4, 3), value("1 - -p", at));
        assertEquals(Rational.of(1, 1000), value("1e-3", at));
        assertEquals(Rational.of(1, 2), value("+.5", at));
        assertEquals(Rational.of(-1, 6), value("p * -1/2", at));
        assertEquals(Rational.of(-1, 6), value("p / -1/2", at)); // (p / -1) / 2
    }

    @Test
    void constantQuotientsBecomeOneNode() {
        // common practice, no source: a written fraction is a number; the printer shows it unchanged
        assertEquals(new Expr.Num(Rational.of(1, 20), null).value(),
            ((Expr.Num) ModelParser.parseExpression("e", "1/20")).value());
        assertEquals(Rational.of(-3, 4), ((Expr.Num) ModelParser.parseExpression("e", "-3/4")).value());
        assertEquals("1 - (1/20 + 3/100)", Expr.toPlain(Expr.sub(Expr.num(Rational.ONE),
            Expr.add(ModelParser.parseExpression("e", "1/20"), ModelParser.parseExpression("e", "0.03")))));
    }

    @Test
    void expressionErrorsHaveColumns() {
        QchainException e = assertThrows(QchainException.class, () -> ModelParser.parseExpression("x", "1 +\n2"));
        assertEquals(ErrorKey.SYNTAX, e.key());
        e = assertThrows(QchainException.class, () -> ModelParser.parseExpression("x", "p + log(p)"));
        assertEquals(ErrorKey.FUNCTION_NOT_SUPPORTED, e.key());
        assertEquals("x:1:5: functions are not supported: log (expressions use numbers, parameters, + - * / ^ and parentheses)",
            e.getMessage());
        Expr pq = ModelParser.parseExpression("x", "p + q");
        e = assertThrows(QchainException.class, () -> pq.evaluate(Map.of("p", Rational.ONE)::get));
        assertEquals(ErrorKey.FREE_PARAMETERS, e.key());
        assertEquals("x:1:5: parameters without a value: q",
            e.getMessage());
        Expr huge = ModelParser.parseExpression("x", "(3^1000)^1000000");
        e = assertThrows(QchainException.class, () -> huge.evaluate(n -> null));
        assertEquals(ErrorKey.POWER_TOO_LARGE, e.key());
        assertEquals(1, e.pos().orElseThrow().line());
        assertEquals(9, e.pos().orElseThrow().column());
        e = assertThrows(QchainException.class, () -> ModelParser.parseExpression("x", "p^1000001"));
        assertEquals(ErrorKey.SYNTAX, e.key());
        e = assertThrows(QchainException.class, () -> ModelParser.parseExpression("x", "1e99999"));
        assertEquals(ErrorKey.SYNTAX, e.key());
    }

    @Test
    void printedRandomTreesReadBackToTheSameValue() {
        // property (fixed seed): value(parse(toPlain(e))) = value(e), and printing is stable after one pass
        Random rnd = new Random(20261201L);
        for (int k = 0; k < 2000; k++) {
            Expr e = randomTree(rnd, 5);
            String plain = Expr.toPlain(e);
            Expr back = ModelParser.parseExpression("<plain>", plain);
            String again = Expr.toPlain(back);
            assertEquals(again, Expr.toPlain(ModelParser.parseExpression("<again>", again)), plain);
            for (int t = 0; t < 3; t++) {
                Map<String, Rational> at = randomPoint(rnd);
                assertSameValue(e, back, at, plain);
            }
        }
    }

    @Test
    void parsedRandomTextPrintsAndReadsBackToTheSameValue() {
        // property (fixed seed): the brief's round trip, text -> tree -> toPlain -> tree, same value at points
        Random rnd = new Random(7L);
        for (int k = 0; k < 2000; k++) {
            String text = randomText(rnd, 4);
            Expr e = ModelParser.parseExpression("<text>", text);
            Expr back = ModelParser.parseExpression("<plain>", Expr.toPlain(e));
            for (int t = 0; t < 3; t++) {
                assertSameValue(e, back, randomPoint(rnd), text + "  =>  " + Expr.toPlain(e));
            }
        }
    }

    @Test
    void foldAgreesWithEvaluateAndVariables() {
        // property (fixed seed): a fold that evaluates gives evaluate's value; a fold that counts names finds them
        Random rnd = new Random(99L);
        for (int k = 0; k < 500; k++) {
            Expr e = randomTree(rnd, 5);
            Map<String, Rational> at = randomPoint(rnd);
            Rational direct;
            try {
                direct = e.evaluate(at::get);
            } catch (QchainException ex) {
                continue; // division by zero at this point
            }
            Rational folded = e.fold(new Expr.Folder<Rational>() {
                public Rational num(Expr.Num node) {
                    return node.value();
                }

                public Rational var(Expr.Var node) {
                    return at.get(node.name());
                }

                public Rational neg(Expr.Neg node, Rational x) {
                    return x.negate();
                }

                public Rational bin(Expr.Bin node, Rational l, Rational r) {
                    switch (node.op()) {
                        case ADD:
                            return l.add(r);
                        case SUB:
                            return l.subtract(r);
                        case MUL:
                            return l.multiply(r);
                        default:
                            return l.divide(r);
                    }
                }

                public Rational pow(Expr.Pow node, Rational b) {
                    return b.pow(node.exponent());
                }
            });
            assertEquals(direct, folded, Expr.toPlain(e));
        }
    }

    private static void assertSameValue(Expr a, Expr b, Map<String, Rational> at, String msg) {
        Rational va;
        try {
            va = a.evaluate(at::get);
        } catch (QchainException ex) {
            assertEquals(ErrorKey.DIVISION_BY_ZERO, ex.key());
            QchainException eb = assertThrows(QchainException.class, () -> b.evaluate(at::get), msg);
            assertEquals(ErrorKey.DIVISION_BY_ZERO, eb.key());
            return;
        }
        assertEquals(va, b.evaluate(at::get), msg + " at " + at);
    }

    private static Map<String, Rational> randomPoint(Random rnd) {
        Map<String, Rational> at = new HashMap<>();
        for (String v : VARS) {
            at.put(v, Rational.of(rnd.nextInt(21) - 10, 1 + rnd.nextInt(9)));
        }
        return at;
    }

    private static Rational randomRational(Random rnd) {
        return Rational.of(rnd.nextInt(41) - 20, 1 + rnd.nextInt(rnd.nextBoolean() ? 1 : 12));
    }

    static Expr randomTree(Random rnd, int depth) {
        int pick = depth <= 0 ? rnd.nextInt(2) : rnd.nextInt(7);
        switch (pick) {
            case 0:
                return Expr.num(randomRational(rnd));
            case 1:
                return new Expr.Var(VARS.get(rnd.nextInt(VARS.size())), null);
            case 2:
                return new Expr.Neg(randomTree(rnd, depth - 1), null);
            case 3:
                return new Expr.Pow(randomTree(rnd, depth - 2), rnd.nextInt(7) - 3, null);
            default:
                Expr.Op op = Expr.Op.values()[rnd.nextInt(4)];
                return new Expr.Bin(op, randomTree(rnd, depth - 1), randomTree(rnd, depth - 1), null);
        }
    }

    /** Random text in the grammar, with random spacing, decimals, signs and both forms of negative exponents. */
    static String randomText(Random rnd, int depth) {
        String sp = rnd.nextInt(3) == 0 ? " " : "";
        int pick = depth <= 0 ? rnd.nextInt(3) : rnd.nextInt(9);
        switch (pick) {
            case 0:
                return String.valueOf(rnd.nextInt(30));
            case 1:
                return VARS.get(rnd.nextInt(VARS.size()));
            case 2:
                String[] decimals = {"0.25", ".5", "1.125", "2e-2", "3E1", "0.1", "10.0"};
                return decimals[rnd.nextInt(decimals.length)];
            case 3:
                return "-" + sp + randomText(rnd, depth - 1);
            case 4:
                return "(" + sp + randomText(rnd, depth - 1) + sp + ")";
            case 5:
                int k = rnd.nextInt(7) - 3;
                String ex = k < 0 && rnd.nextBoolean() ? String.valueOf(k) : (k < 0 ? "(" + k + ")" : String.valueOf(k));
                return "(" + randomText(rnd, depth - 1) + ")" + sp + "^" + sp + ex;
            default:
                String op = "+-*/".substring(rnd.nextInt(4)).substring(0, 1);
                return randomText(rnd, depth - 1) + sp + op + sp + randomText(rnd, depth - 1);
        }
    }
}
