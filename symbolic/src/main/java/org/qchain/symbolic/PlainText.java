package org.qchain.symbolic;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.Rational;

/**
 * Plain one-line syntax of model files ({@code + - * / ^}, parentheses, rationals {@code p/q}, parameter names), and
 * the LaTeX form of the same structure. Both printers walk the same term lists, so they always agree in order.
 */
final class PlainText {
    private PlainText() {
    }

    // ------------------------------------------------------------------------------------------------- plain
    static String poly(Poly p) {
        return terms(p, false);
    }

    /** The expanded polynomial: plain ({@code 3/4*a*b^2}) or LaTeX ({@code \frac{3}{4} a b^{2}}), same term order. */
    private static String terms(Poly p, boolean latex) {
        if (p.isZero()) {
            return "0";
        }
        List<String> vars = p.ring().variables();
        StringBuilder sb = new StringBuilder();
        boolean first = true;
        for (Poly.Term t : p.terms()) {
            Rational c = t.coefficient();
            String times = latex ? " " : "*";
            Rational a = c.abs();
            org.qchain.exact.model.TermText.append(sb, first, c, monomial(vars, t.exponents(), times, latex),
                latex ? latexRational(a) : a.toString(), times);
            first = false;
        }
        return sb.toString();
    }

    static String monomial(List<String> vars, List<Integer> exps, String times, boolean latex) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < exps.size(); i++) {
            int e = exps.get(i);
            if (e == 0) {
                continue;
            }
            String v = latex ? latexName(vars.get(i)) : vars.get(i);
            parts.add(e == 1 ? v : (latex ? v + "^{" + e + "}" : v + "^" + e));
        }
        return String.join(times, parts);
    }

    /** Whether a polynomial prints as one factor that needs no brackets before {@code ^} or after {@code /}. */
    private static boolean isAtom(Poly p) {
        if (p.termCount() != 1) {
            return false;
        }
        Poly.Term t = p.terms().get(0);
        if (!t.coefficient().isOne()) {
            return false;
        }
        int vars = 0;
        for (int e : t.exponents()) {
            if (e > 1) {
                return false;
            }
            vars += e;
        }
        return vars == 1;
    }

    static String ratFun(RatFun f) {
        String n = poly(f.numerator());
        if (f.isPolynomial()) {
            return n;
        }
        Poly num = f.numerator();
        boolean bracketNum = num.termCount() > 1;
        Poly den = f.denominator();
        boolean bracketDen = !(isAtom(den) || (den.termCount() == 1 && singleVariablePower(den)));
        return (bracketNum ? "(" + n + ")" : n) + "/" + (bracketDen ? "(" + poly(den) + ")" : poly(den));
    }

    private static boolean singleVariablePower(Poly p) {
        Poly.Term t = p.terms().get(0);
        if (!t.coefficient().isOne()) {
            return false;
        }
        int nonZero = 0;
        for (int e : t.exponents()) {
            if (e != 0) {
                nonZero++;
            }
        }
        return nonZero == 1;
    }

    private static String factorPlain(Poly.Factor f) {
        String b = isAtom(f.base()) ? poly(f.base()) : "(" + poly(f.base()) + ")";
        return f.exponent() == 1 ? b : b + "^" + f.exponent();
    }

    static String factored(RatFun.Factored f) {
        Rational c = f.constant();
        if (c.isZero()) {
            return "0";
        }
        BigInteger u = c.numerator().abs();
        BigInteger v = c.denominator();
        String sign = c.signum() < 0 ? "-" : "";
        List<String> top = new ArrayList<>();
        for (Poly.Factor x : f.numerator()) {
            top.add(factorPlain(x));
        }
        List<String> bottom = new ArrayList<>();
        for (Poly.Factor x : f.denominator()) {
            bottom.add(factorPlain(x));
        }
        if (bottom.isEmpty()) {
            String k = c.abs().toString();
            if (top.isEmpty()) {
                return sign + k;
            }
            if (c.isOne() && f.numerator().size() == 1 && f.numerator().get(0).exponent() == 1) {
                return poly(f.numerator().get(0).base());
            }
            return sign + (c.abs().isOne() ? "" : k + "*") + String.join("*", top);
        }
        if (!u.equals(BigInteger.ONE) || top.isEmpty()) {
            top.add(0, u.toString());
        }
        if (!v.equals(BigInteger.ONE)) {
            bottom.add(0, v.toString());
        }
        String t = String.join("*", top);
        String b = String.join("*", bottom);
        boolean bracketB = bottom.size() > 1;
        return sign + t + "/" + (bracketB ? "(" + b + ")" : b);
    }

    // ------------------------------------------------------------------------------------------------- LaTeX
    static String latexName(String v) {
        // a_1 style names: letters then digits become a subscript; underscores are escaped
        int k = v.length();
        while (k > 0 && Character.isDigit(v.charAt(k - 1))) {
            k--;
        }
        String head = v.substring(0, k).replace("_", "\\_");
        String tail = v.substring(k);
        if (head.length() > 1) {
            head = "\\mathit{" + head + "}";
        }
        return tail.isEmpty() || k == 0 ? head + tail : head + "_{" + tail + "}";
    }

    static String latexRational(Rational a) {
        return a.isInteger() ? a.toString() : "\\frac{" + a.numerator() + "}{" + a.denominator() + "}";
    }

    static String latexPoly(Poly p) {
        return terms(p, true);
    }

    static String latexRatFun(RatFun f) {
        if (f.isPolynomial()) {
            return latexPoly(f.numerator());
        }
        return "\\frac{" + latexPoly(f.numerator()) + "}{" + latexPoly(f.denominator()) + "}";
    }

    private static String factorLatex(Poly.Factor f) {
        String b = isAtom(f.base()) ? latexPoly(f.base()) : "\\left(" + latexPoly(f.base()) + "\\right)";
        return f.exponent() == 1 ? b : b + "^{" + f.exponent() + "}";
    }

    static String latexFactored(RatFun.Factored f) {
        Rational c = f.constant();
        if (c.isZero()) {
            return "0";
        }
        String sign = c.signum() < 0 ? "-" : "";
        List<String> top = new ArrayList<>();
        for (Poly.Factor x : f.numerator()) {
            top.add(factorLatex(x));
        }
        List<String> bottom = new ArrayList<>();
        for (Poly.Factor x : f.denominator()) {
            bottom.add(factorLatex(x));
        }
        BigInteger u = c.numerator().abs();
        BigInteger v = c.denominator();
        // a lone factor of exponent 1 over a constant needs no brackets: \frac{1 - 2 a}{4}
        if (u.equals(BigInteger.ONE) && top.size() == 1 && f.numerator().get(0).exponent() == 1) {
            top.set(0, latexPoly(f.numerator().get(0).base()));
        }
        if (v.equals(BigInteger.ONE) && bottom.size() == 1 && f.denominator().get(0).exponent() == 1) {
            bottom.set(0, latexPoly(f.denominator().get(0).base()));
        }
        if (!u.equals(BigInteger.ONE) || top.isEmpty()) {
            top.add(0, u.toString());
        }
        if (!v.equals(BigInteger.ONE)) {
            bottom.add(0, v.toString());
        }
        String t = String.join(" ", top);
        return bottom.isEmpty() ? sign + t : sign + "\\frac{" + t + "}{" + String.join(" ", bottom) + "}";
    }
}
