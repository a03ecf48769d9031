package org.qchain.symbolic;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SourcePos;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Expr;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ParamDecl;
import org.qchain.exact.model.Transition;

/** Builds models in tests without the model parser: a tiny reader for expressions and a chain builder. */
public final class TestChains {
    private TestChains() {
    }

    /** Reads {@code + - * / ^ ( )}, rationals and names; enough for test input. */
    public static Expr expr(String s) {
        return new Reader(s).parse();
    }

    private static final class Reader {
        private final String s;
        private int i;

        Reader(String s) {
            this.s = s;
        }

        Expr parse() {
            Expr e = sum();
            skip();
            if (i != s.length()) {
                throw new IllegalArgumentException("junk at " + i + " in " + s);
            }
            return e;
        }

        private void skip() {
            while (i < s.length() && s.charAt(i) == ' ') {
                i++;
            }
        }

        private boolean eat(char c) {
            skip();
            if (i < s.length() && s.charAt(i) == c) {
                i++;
                return true;
            }
            return false;
        }

        private Expr sum() {
            Expr e = product();
            while (true) {
                if (eat('+')) {
                    e = new Expr.Bin(Expr.Op.ADD, e, product(), null);
                } else if (eat('-')) {
                    e = new Expr.Bin(Expr.Op.SUB, e, product(), null);
                } else {
                    return e;
                }
            }
        }

        private Expr product() {
            Expr e = unary();
            while (true) {
                if (eat('*')) {
                    e = new Expr.Bin(Expr.Op.MUL, e, unary(), null);
                } else if (eat('/')) {
                    e = new Expr.Bin(Expr.Op.DIV, e, unary(), null);
                } else {
                    return e;
                }
            }
        }

        private Expr unary() {
            if (eat('-')) {
                return new Expr.Neg(unary(), null);
            }
            return power();
        }

        private Expr power() {
            Expr b = atom();
            if (eat('^')) {
                boolean paren = eat('(');
                boolean neg = eat('-');
                skip();
                int st = i;
                while (i < s.length() && Character.isDigit(s.charAt(i))) {
                    i++;
                }
                int e = Integer.parseInt(s.substring(st, i));
                if (paren && !eat(')')) {
                    throw new IllegalArgumentException("missing ) in " + s);
                }
                return new Expr.Pow(b, neg ? -e : e, null);
            }
            return b;
        }

        private Expr atom() {
            skip();
            if (eat('(')) {
                Expr e = sum();
                if (!eat(')')) {
                    throw new IllegalArgumentException("missing ) in " + s);
                }
                return e;
            }
            int st = i;
            if (i < s.length() && Character.isDigit(s.charAt(i))) {
                while (i < s.length() && (Character.isDigit(s.charAt(i)) || s.charAt(i) == '.')) {
                    i++;
                }
                return new Expr.Num(Rational.parse(s.substring(st, i)), null);
            }
            while (i < s.length() && (Character.isLetterOrDigit(s.charAt(i)) || s.charAt(i) == '_')) {
                i++;
            }
            if (st == i) {
                throw new IllegalArgumentException("expected a term at " + i + " in " + s);
            }
            return new Expr.Var(s.substring(st, i), new SourcePos("<test>", 1, st + 1));
        }
    }

    /**
     * A discrete chain from a full matrix of expression strings ("" or "0" for no transition); the diagonal is
     * listed explicitly unless it is "*", which means the remainder.
     */
    public static Model discrete(List<String> params, String[][] rows) {
        List<ParamDecl> ps = new ArrayList<>();
        for (String p : params) {
            ps.add(new ParamDecl(p, Domain.probability(), Optional.empty(), new SourcePos("<test>", 1, 1)));
        }
        return discrete(ps, rows, true);
    }

    public static Model discrete(List<ParamDecl> ps, String[][] rows, boolean unused) {
        List<String> states = new ArrayList<>();
        for (int i = 0; i < rows.length; i++) {
            states.add("S" + i);
        }
        List<Transition> ts = new ArrayList<>();
        for (int i = 0; i < rows.length; i++) {
            for (int j = 0; j < rows.length; j++) {
                String t = rows[i][j].strip();
                if (t.isEmpty() || t.equals("0") || t.equals("*")) {
                    continue;
                }
                ts.add(new Transition(i, j, expr(t), new SourcePos("<test>", i + 2, 1)));
            }
        }
        return Model.of("<test>", ChainKind.DISCRETE, ps, states, ts);
    }

    public static ParamDecl param(String name, Domain d, Rational nominal) {
        return new ParamDecl(name, d, Optional.ofNullable(nominal), new SourcePos("<test>", 1, 7));
    }

    /** {@code p^n} by the exact module's engine. */
    public static RationalMatrix exactPower(RationalMatrix p, int n) {
        return MatrixPowers.power(p, n);
    }

    /** The model's one-step matrix at a point, built and validated by the exact module. */
    public static RationalMatrix exactMatrix(Model m, java.util.Map<String, Rational> point) {
        return Chains.transitionMatrix(m, point);
    }
}
