package org.qchain.result;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.w3c.dom.Document;

/** Formulas read back from their plain text: MathML, LaTeX and exact values. */
class FormulaTreeTest {
    private static Document xml(String s) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(s.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void fractionsPowersAndRootsBecomeMathmlElements() throws Exception {
        String m = FormulaTree.parse("p/(p + r)*(1 - (1 - p - r)^n)").mathml();
        assertEquals("<math xmlns=\"http://www.w3.org/1998/Math/MathML\"><mrow><mfrac><mrow><mi>p</mi></mrow><mrow>"
            + "<mrow><mi>p</mi><mo>+</mo><mi>r</mi></mrow></mrow></mfrac><mo>&#x2062;</mo><mrow><mo>(</mo><mrow><mn>1"
            + "</mn><mo>&#x2212;</mo><msup><mrow><mrow><mo>(</mo><mrow><mrow><mn>1</mn><mo>&#x2212;</mo><mi>p</mi>"
            + "</mrow><mo>&#x2212;</mo><mi>r</mi></mrow><mo>)</mo></mrow></mrow><mrow><mi>n</mi></mrow></msup></mrow>"
            + "<mo>)</mo></mrow></mrow></math>", m);
        Document d = xml(FormulaTree.parse("3/4 - 1/4*sqrt(1 - 8*p) + max(abs(p), 2)").mathml());
        assertEquals(1, d.getElementsByTagName("msqrt").getLength());
        assertEquals(2, d.getElementsByTagName("mfrac").getLength());
        assertEquals("max", d.getElementsByTagName("mi").item(1).getTextContent());
    }

    @Test
    void latexUsesFracSqrtAndBraces() {
        assertEquals("\\frac{p}{p + r} \\left(1 - \\left(1 - p - r\\right)^{n}\\right)",
            FormulaTree.parse("p/(p + r)*(1 - (1 - p - r)^n)").latex());
        assertEquals("2 \\cdot 3 - \\sqrt{1 - 8 p}", FormulaTree.parse("2*3 - sqrt(1 - 8*p)").latex());
        assertEquals("1 - 2 r \\neq 0", FormulaTree.parse("1 - 2*r != 0").latex());
    }

    @Test
    void relationsAndFunctionsAreRead() throws Exception {
        Document d = xml(FormulaTree.parse("6 - 6*p - 3*r + 2*p^2 != 0").mathml());
        assertEquals("≠", d.getElementsByTagName("mo").item(d.getElementsByTagName("mo").getLength() - 1)
            .getTextContent());
    }

    @Test
    void badTextIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> FormulaTree.parse("p + "));
        assertThrows(IllegalArgumentException.class, () -> FormulaTree.parse("(p"));
        assertThrows(IllegalArgumentException.class, () -> FormulaTree.parse("p # r"));
        assertThrows(IllegalArgumentException.class, () -> FormulaTree.parse("(".repeat(500) + "1" + ")".repeat(500)));
    }

    @Test
    void evaluatesExactly() {
        Map<String, Rational> at = Map.of("p", Rational.of(1, 20), "r", Rational.of(1, 4), "n", Rational.of(3));
        // P^3(A -> B) of the two-state chain = p/(p+r) (1 - (1-p-r)^3), by hand: (1/6)(1 - (7/10)^3) = 657/6000
        assertEquals(Optional.of(Rational.of(657, 6000)), FormulaTree.parse("p/(p + r)*(1 - (1 - p - r)^n)")
            .evaluate(at));
        assertEquals(Optional.of(Rational.of(1, 2)), FormulaTree.parse("sqrt(1/4)").evaluate(Map.of()));
        assertEquals(Optional.empty(), FormulaTree.parse("sqrt(2)").evaluate(Map.of()));
        assertEquals(Optional.empty(), FormulaTree.parse("1/(p - p)").evaluate(at));
        assertEquals(Optional.of(Rational.of(-8)), FormulaTree.parse("-2^3").evaluate(Map.of()));
        assertEquals(Optional.of(Rational.of(1, 8)), FormulaTree.parse("2^-3").evaluate(Map.of()));
    }

    /** Random formulas printed with every parenthesis, read back: the same value, and MathML that parses. */
    @Test
    void printedFormulasReadBackToTheSameValue() throws Exception {
        Random rnd = new Random(20261203L);
        Map<String, Rational> at = Map.of("p", Rational.of(2, 7), "r", Rational.of(-3, 5));
        for (int k = 0; k < 300; k++) {
            StringBuilder text = new StringBuilder();
            Rational v = random(rnd, 4, text, at);
            FormulaTree t = FormulaTree.parse(text.toString());
            if (v != null) {
                assertEquals(Optional.of(v), t.evaluate(at), text.toString());
            }
            xml(t.mathml());
            assertTrue(!t.latex().isEmpty());
        }
    }

    /** Appends a random formula; returns its value, or null if it divides by zero. */
    private static Rational random(Random rnd, int depth, StringBuilder out, Map<String, Rational> at) {
        if (depth == 0 || rnd.nextInt(4) == 0) {
            switch (rnd.nextInt(3)) {
                case 0 -> {
                    int k = rnd.nextInt(9) + 1;
                    out.append(k);
                    return Rational.of(k);
                }
                case 1 -> {
                    out.append('p');
                    return at.get("p");
                }
                default -> {
                    out.append('r');
                    return at.get("r");
                }
            }
        }
        int op = rnd.nextInt(6);
        if (op == 5) {
            out.append("-(");
            Rational x = random(rnd, depth - 1, out, at);
            out.append(')');
            return x == null ? null : x.negate();
        }
        out.append('(');
        Rational x = random(rnd, depth - 1, out, at);
        out.append(") ").append("+-*/^".charAt(op)).append(" (");
        if (op == 4) {
            int e = rnd.nextInt(4);
            out.append(e).append(')');
            return x == null ? null : x.pow(e);
        }
        Rational y = random(rnd, depth - 1, out, at);
        out.append(')');
        if (x == null || y == null) {
            return null;
        }
        return switch (op) {
            case 0 -> x.add(y);
            case 1 -> x.subtract(y);
            case 2 -> x.multiply(y);
            default -> y.isZero() ? null : x.divide(y);
        };
    }
}
