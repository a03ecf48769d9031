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
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.ParamDecl;
import org.qchain.exact.model.Transition;

/**
 * Builds models in tests from matrices of expression strings (read by the model parser's expression grammar). Test
 * input only; holds no reference values.
 */
public final class TestChains {
    private TestChains() {
    }

    /** Reads an expression with the model parser's grammar. */
    public static Expr expr(String s) {
        return ModelParser.parseExpression("<test>", s);
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
