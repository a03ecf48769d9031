package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;

/** Plain, factored, LaTeX and markdown output; plain text reads back to the same function. */
class FormatTest {
    private final ParamRing ring = ParamRing.of(List.of("a", "b"));

    private RatFun f(String s) {
        return ring.fromExpr(TestChains.expr(s));
    }

    @Test
    void canonicalFormIsReducedWithAPrimitiveDenominator() {
        // common practice, no source: (a^2 - b^2)/(2a - 2b) = (a + b)/2
        assertEquals("1/2*a + 1/2*b", f("(a^2 - b^2)/(2*a - 2*b)").toString());
        assertEquals("1/2*a/(a + b)", f("a/(2*a + 2*b)").toString());
        assertEquals("-a/(1 - b)", f("a/(b - 1)").toString());
        assertEquals("(1 - a)/(1 + a*b)", f("(2 - 2*a)/(2 + 2*a*b)").toString());
        assertEquals("1/a^2", f("a^(-2)").toString());
        assertEquals("0", f("a - a").toString());
    }

    @Test
    void factoredForm() {
        RatFun g = f("3*(1 - a)^2*(a + b)/(4*(1 + b)*a)");
        assertEquals("3*(1 - a)^2*(a + b)/(4*a*(1 + b))", g.factor().toString());
        assertEquals("3/4*(1 - a)^2", f("3/4*(1 - a)^2").factor().toString());
        assertEquals("-a*(1 - a)", f("a^2 - a").factor().toString());
        assertEquals("1 + a + b", f("1 + a + b").factor().toString());
        assertEquals("1/(2*(1 + a))", f("1/(2 + 2*a)").factor().toString());
    }

    @Test
    void latex() {
        assertEquals("\\frac{1 - 2 a + a^{2}}{a + b}", Formulas.latex(f("(1 - a)^2/(a + b)")));
        assertEquals("\\frac{3}{4} a b^{2}", Formulas.latex(f("3/4*a*b^2")));
        assertEquals("\\frac{3 \\left(1 - a\\right)^{2}}{4 a}", Formulas.latex(f("3*(1 - a)^2/(4*a)").factor()));
        ParamRing r2 = ParamRing.of(List.of("p1", "mu"));
        assertEquals("p_{1} + \\mathit{mu}", Formulas.latex(r2.fromExpr(TestChains.expr("p1 + mu"))));
    }

    @Test
    void markdownTable() {
        Model m = TestChains.discrete(List.of("a", "b"), new String[][] {{"*", "a"}, {"b", "*"}});
        RatFunMatrix p = RatFunMatrix.fromModel(m);
        assertEquals("| from \\ to | S0 | S1 |\n|---|---|---|\n| S0 | `1 - a` | `a` |\n| S1 | `b` | `1 - b` |\n",
            Formulas.markdownTable(m.states(), p, false));
        assertEquals("\\begin{pmatrix}\n1 - a & a \\\\\nb & 1 - b\n\\end{pmatrix}", Formulas.latexMatrix(p, false));
    }

    /** Reads text with the model parser's own expression grammar (not the test reader). */
    private RatFun parsed(String text) {
        return ring.fromExpr(ModelParser.parseExpression("<round-trip>", text));
    }

    @Test
    void plainTextReadsBackToTheSameFunction() {
        // common practice, no source: printing then parsing with our model parser is the identity on canonical
        // forms (random inputs, fixed seed)
        Random rnd = new Random(7);
        String[] atoms = {"a", "b", "1/3", "2", "(1 - a)", "(a + b)", "(1 + 2*b)"};
        for (int t = 0; t < 200; t++) {
            StringBuilder sb = new StringBuilder();
            int k = 1 + rnd.nextInt(4);
            for (int i = 0; i < k; i++) {
                if (i > 0) {
                    sb.append(rnd.nextBoolean() ? " + " : (rnd.nextBoolean() ? " * " : " / "));
                }
                sb.append(atoms[rnd.nextInt(atoms.length)]);
                if (rnd.nextInt(4) == 0) {
                    sb.append('^').append(1 + rnd.nextInt(3));
                }
            }
            RatFun g = f(sb.toString());
            assertEquals(g, parsed(g.toString()), sb + " printed as " + g);
            assertEquals(g, parsed(g.factor().toString()), sb + " factored as " + g.factor());
        }
    }
}
