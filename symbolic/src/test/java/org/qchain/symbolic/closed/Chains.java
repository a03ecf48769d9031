package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import edu.jas.arith.BigRational;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Expr;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ParamDecl;
import org.qchain.exact.model.Transition;

/** Test helpers: chains from matrices of expression text, and the check every closed form must pass. */
final class Chains {
    private Chains() {
    }

    /** A discrete model whose entries are given as expression text (parameters: single names). */
    static Model model(List<String> params, String[][] rows) {
        List<String> states = new ArrayList<>();
        for (int i = 0; i < rows.length; i++) {
            states.add("S" + (i + 1));
        }
        List<ParamDecl> decls = new ArrayList<>();
        for (String p : params) {
            decls.add(new ParamDecl(p, Domain.probability(), Optional.empty(), null));
        }
        List<Transition> ts = new ArrayList<>();
        for (int i = 0; i < rows.length; i++) {
            for (int j = 0; j < rows.length; j++) {
                if (i == j || !rows[i][j].strip().equals("0")) {
                    ts.add(new Transition(i, j, new MiniParser(rows[i][j]).parse(), null));
                }
            }
        }
        return Model.of("test", ChainKind.DISCRETE, decls, states, ts);
    }

    /** P with parameters substituted, as an exact matrix. */
    static RationalMatrix matrix(Model m, Map<String, Rational> at) {
        int s = m.size();
        Rational[][] r = new Rational[s][s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                r[i][j] = m.entry(i, j).evaluate(at::get);
            }
        }
        return RationalMatrix.of(r);
    }

    /** Exact P^0 .. P^k by repeated multiplication (common practice, no source: the definition of P^n). */
    static List<RationalMatrix> powers(RationalMatrix p, int k) {
        List<RationalMatrix> out = new ArrayList<>();
        out.add(RationalMatrix.identity(p.rows()));
        for (int i = 1; i <= k; i++) {
            out.add(out.get(i - 1).multiply(p));
        }
        return out;
    }

    /**
     * The check every closed form in the tests passes: for n = 0 .. 2s (and up to {@code extra} more), the
     * formula part (n >= validFrom) with free parameters equals the repeated product of the symbolic matrix, as
     * rational functions; and at each point, {@link ClosedForm#evaluate} equals the exact power of the
     * substituted chain.
     */
    static void assertMatchesPowers(ClosedForm cf, Model m, List<Map<String, Rational>> points, int upTo) {
        int s = m.size();
        int last = Math.max(2 * s, upTo);
        ParamField f = cf.field();
        Quotient<BigRational>[][] p = cf.spectral().matrix;
        Quotient<BigRational>[][] pn = Mat.identity(f, s);
        for (int n = 0; n <= last; n++) {
            if (n >= cf.validFrom()) {
                Quotient<BigRational>[][] got = cf.evaluateSymbolic(n);
                assertTrue(Mat.equal(got, pn), "symbolic P^" + n + " differs");
            }
            pn = Mat.multiply(f, pn, p);
        }
        for (Map<String, Rational> at : points) {
            List<RationalMatrix> exact = powers(matrix(m, at), last);
            for (int n = 0; n <= last; n++) {
                assertEquals(exact.get(n), cf.evaluate(n, at), "P^" + n + " at " + at);
            }
        }
    }

    static Map<String, Rational> at(Object... kv) {
        Map<String, Rational> m = new HashMap<>();
        for (int i = 0; i < kv.length; i += 2) {
            m.put((String) kv[i], Rational.parse((String) kv[i + 1]));
        }
        return m;
    }

    /** A tiny reader for entry text: numbers, names, + - * / ^ (integer exponents) and brackets. */
    static final class MiniParser {
        private final String s;
        private int i;

        MiniParser(String s) {
            this.s = s.replace(" ", "");
        }

        Expr parse() {
            Expr e = sum();
            if (i != s.length()) {
                throw new IllegalArgumentException("junk at " + i + " in " + s);
            }
            return e;
        }

        private Expr sum() {
            Expr e = product();
            while (i < s.length() && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                char op = s.charAt(i++);
                Expr r = product();
                e = new Expr.Bin(op == '+' ? Expr.Op.ADD : Expr.Op.SUB, e, r, null);
            }
            return e;
        }

        private Expr product() {
            Expr e = unary();
            while (i < s.length() && (s.charAt(i) == '*' || s.charAt(i) == '/')) {
                char op = s.charAt(i++);
                Expr r = unary();
                e = new Expr.Bin(op == '*' ? Expr.Op.MUL : Expr.Op.DIV, e, r, null);
            }
            return e;
        }

        private Expr unary() {
            if (s.charAt(i) == '-') {
                i++;
                return new Expr.Neg(unary(), null);
            }
            Expr a = atom();
            if (i < s.length() && s.charAt(i) == '^') {
                i++;
                int st = i;
                while (i < s.length() && Character.isDigit(s.charAt(i))) {
                    i++;
                }
                a = new Expr.Pow(a, Integer.parseInt(s.substring(st, i)), null);
            }
            return a;
        }

        private Expr atom() {
            char c = s.charAt(i);
            if (c == '(') {
                i++;
                Expr e = sum();
                i++;
                return e;
            }
            int st = i;
            if (Character.isDigit(c) || c == '.') {
                while (i < s.length() && (Character.isDigit(s.charAt(i)) || s.charAt(i) == '.')) {
                    i++;
                }
                return Expr.num(Rational.parse(s.substring(st, i)));
            }
            while (i < s.length() && Character.isLetterOrDigit(s.charAt(i))) {
                i++;
            }
            return new Expr.Var(s.substring(st, i), null);
        }
    }
}
