package org.qchain.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.certified.CertifiedComplex;
import org.qchain.exact.certified.CertifiedReal;
import org.qchain.result.ClosedResult;
import org.qchain.result.Formula;
import org.qchain.result.Point;

/** Phrases shared by every format's layout of closed forms. */
final class Closed {
    private Closed() {
    }

    /** What a cell is: {@code P^n(A -> B)} or {@code G(A -> B; z)}, in the result's own symbols. */
    static String label(ClosedResult r, String from, String to) {
        String arrow = from + " -> " + to;
        return r.form() == ClosedResult.Form.GF ? "G(" + arrow + "; " + r.names().series() + ")" : pn(r) + "(" + arrow + ")";
    }

    /** {@code P^n} with the step symbol. */
    static String pn(ClosedResult r) {
        return "P^" + r.names().step();
    }

    static String what(ClosedResult r) {
        ClosedResult.Names s = r.names();
        switch (r.form()) {
            case GF:
                return "generating functions G(" + s.series() + ") = sum over " + s.step() + " of " + pn(r) + " "
                    + s.series() + "^" + s.step();
            case RECURRENCE:
                return "linear recurrences in " + s.step() + ", " + s.sequence() + "(" + s.step() + ") = " + pn(r)
                    + "(from -> to)";
            default:
                return "closed form in " + s.step();
        }
    }

    /**
     * The symbols, when a parameter's name moved one of them away from the usual letter; empty otherwise.
     */
    static String symbolsNote(ClosedResult r) {
        ClosedResult.Names s = r.names();
        List<String> moved = new ArrayList<>();
        for (ClosedResult.Where w : r.where()) {
            if (!w.name().matches(w.eigenvalue() ? "l[0-9]+" : "s[0-9]*")) {
                moved.add(w.eigenvalue() ? w.name() + " (" + w.symbol() + ") an eigenvalue" : w.name() + " a square root");
            }
        }
        if (s.usual() && moved.isEmpty()) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        parts.add(s.step() + " is the step count");
        if (!r.isSeries()) {
            parts.add(s.variable() + " the variable of det(" + s.variable() + "I - P)");
        }
        if (r.form() == ClosedResult.Form.GF) {
            parts.add(s.series() + " the variable of the generating functions");
        }
        if (r.form() == ClosedResult.Form.RECURRENCE) {
            parts.add(s.sequence() + " the sequence");
        }
        parts.addAll(moved);
        return "Symbols (chosen apart from the parameter names): " + String.join(", ", parts) + ".";
    }

    /** The heading of the long run, without the final colon. */
    static String longRunHeading(ClosedResult r, ClosedResult.LongRun lr) {
        String n = r.names().step();
        String m = r.names().period();
        String where = lr.conditions().isEmpty() ? "" : " where " + conditions(lr.conditions());
        if (!lr.periodic()) {
            return pn(r) + " converges as " + n + " grows" + where + "; the limit";
        }
        return "periodic with period " + lr.period() + " (the eigenvalues of modulus 1 are roots of unity of orders"
            + " dividing " + lr.period() + ")" + where + "; the limits of P^(" + lr.period() + m + " + r) as " + m
            + " grows, r = 0 .. " + (lr.period() - 1);
    }

    /** The label of the k-th subsequence of a periodic chain: {@code n = 3m + 1}. */
    static String subsequence(ClosedResult r, ClosedResult.LongRun lr, int k) {
        return r.names().step() + " = " + subsequenceIndex(r, lr, k);
    }

    /** {@code 3m + 1}. */
    static String subsequenceIndex(ClosedResult r, ClosedResult.LongRun lr, int k) {
        return lr.period() + r.names().period() + " + " + k;
    }

    /** The sentences on conditions not shown and on special corners of the domains; empty if there are none. */
    static String longRunNote(ClosedResult.LongRun lr) {
        StringBuilder sb = new StringBuilder();
        if (!lr.conditions().isEmpty() && lr.notProved().isEmpty()) {
            sb.append(lr.conditions().size() == 1 ? "It always holds" : "They always hold")
                .append(" inside the parameters' domains.");
        }
        if (!lr.notProved().isEmpty()) {
            sb.append("Not shown to hold throughout the parameters' domains: ").append(conditions(lr.notProved()))
                .append('.');
        }
        if (!lr.special().isEmpty()) {
            List<String> pts = new ArrayList<>();
            for (Point p : lr.special()) {
                pts.add(p.text());
            }
            sb.append(sb.length() > 0 ? " " : "").append("Special points (corners of the domains where a condition fails;"
                + " there the chain may be periodic, or its limit or formulas differ): ").append(String.join("; ", pts))
                .append('.');
        }
        return sb.toString();
    }

    /** The limits at the point as decimals, shaped like the limits; empty without a point. */
    static List<List<List<String>>> limitDecimals(ClosedResult r, ClosedResult.LongRun lr) {
        List<List<List<String>>> out = new ArrayList<>();
        for (List<List<org.qchain.exact.Rational>> grid : lr.values()) {
            List<List<String>> g = new ArrayList<>();
            for (List<org.qchain.exact.Rational> row : grid) {
                List<String> rr = new ArrayList<>();
                for (org.qchain.exact.Rational v : row) {
                    rr.add(Text.decimal(v, r.digits()));
                }
                g.add(rr);
            }
            out.add(g);
        }
        return out;
    }

    /** The eigenvalues' decimals when they add something to the exact values; empty otherwise. */
    static String eigenDecimals(ClosedResult r, ClosedResult.Eigen e) {
        List<String> d = decimals(e.atPoint(), r.digits());
        if (d.isEmpty() || d.equals(plain(e.values()))) {
            return "";
        }
        return String.join(", ", d);
    }

    /** The eigenvalues at the point as decimals (complex ones {@code a + b*i}); empty without a point. */
    static List<String> eigenDecimalList(ClosedResult r, ClosedResult.Eigen e) {
        return decimals(e.atPoint(), r.digits());
    }

    /** Each value correctly rounded to {@code digits}: {@code re}, {@code re + im*i} or {@code re - im*i}. */
    static List<String> decimals(List<CertifiedComplex> values, int digits) {
        List<String> out = new ArrayList<>();
        for (CertifiedComplex z : values) {
            out.add(complex(z, digits));
        }
        return out;
    }

    /** One value correctly rounded to {@code digits}: {@code re}, {@code re + im*i} or {@code re - im*i}. */
    static String complex(CertifiedComplex z, int digits) {
        String re = z.re().decimal(digits).text();
        if (z.isReal()) {
            return re;
        }
        int sign = z.im().signum();
        return re + (sign < 0 ? " - " : " + ") + z.im().abs().decimal(digits).text() + "*i";
    }

    /** The value at the requested digits. */
    static String real(ClosedResult r, CertifiedReal x) {
        return x.decimal(r.digits()).text();
    }

    /**
     * A plain formula as text and Markdown print it: each eigenvalue's name ({@code l1}) as its symbol
     * ({@code λ1}; the output of these formats is always UTF-8).
     */
    static String shown(ClosedResult r, String plain) {
        String out = plain;
        for (ClosedResult.Where w : r.where()) {
            if (!w.symbol().equals(w.name())) {
                out = out.replaceAll("\\b" + java.util.regex.Pattern.quote(w.name()) + "\\b",
                    java.util.regex.Matcher.quoteReplacement(w.symbol()));
            }
        }
        return out;
    }

    /** {@code where s = sqrt(...), λ1 = ..., λ2 = ...} in text syntax; empty when nothing is named. */
    static String whereLine(ClosedResult r) {
        if (r.where().isEmpty()) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        for (ClosedResult.Where w : r.where()) {
            parts.add(w.symbol() + " = " + shown(r, w.value().plain()));
        }
        return "where " + String.join(", ", parts);
    }

    /** The eigenvalues of a factor as printed: their names when named, else their formulas. */
    static String eigenValues(ClosedResult r, ClosedResult.Eigen e) {
        if (e.names().isEmpty()) {
            return String.join(", ", plain(e.values()));
        }
        List<String> out = new ArrayList<>();
        for (String n : e.names()) {
            out.add(shown(r, n));
        }
        return String.join(", ", out);
    }

    /** The rate formula, with named eigenvalues by name ({@code max(abs(λ1), abs(λ2))}). */
    static String rate(ClosedResult r, ClosedResult.LongRun lr, boolean symbols) {
        String s = lr.rate().plain();
        for (ClosedResult.Eigen e : r.eigenvalues()) {
            for (int k = 0; k < e.names().size(); k++) {
                s = s.replace("abs(" + e.values().get(k).plain() + ")", "abs(" + e.names().get(k) + ")");
            }
        }
        return symbols ? shown(r, s) : s;
    }

    /**
     * {@code det(xI - P)} as the product of its irreducible factors with their multiplicities, plain syntax:
     * {@code (x - 1)*(x^2 - 3/4*x + 1/16)^2}.
     */
    static String characteristicPolynomial(ClosedResult r) {
        List<String> parts = new ArrayList<>();
        for (ClosedResult.Eigen e : r.eigenvalues()) {
            String f = e.factor().plain();
            boolean atom = f.chars().allMatch(Character::isLetterOrDigit);
            String b = atom ? f : "(" + f + ")";
            parts.add(e.multiplicity() == 1 ? b : b + "^" + e.multiplicity());
        }
        return String.join("*", parts);
    }

    /**
     * What a start distribution and a set of final states mean in the cells; empty for rows and entries:
     * {@code The start is the distribution Up=1/2, Worn=1/2 (each formula is the weighted sum of those rows of P^n);
     * {Worn, Down} is the probability of being in one of these states (the sum of their entries).}
     */
    static String combinationNote(ClosedResult r) {
        List<String> parts = new ArrayList<>();
        if (r.startsFromDistribution()) {
            parts.add("the start is the distribution " + r.rows().get(0) + " (each formula is the weighted sum of those"
                + " rows of " + pn(r) + ")");
        }
        if (r.toStates().size() > 1) {
            parts.add(r.cols().get(0) + " is the probability of being in one of these states (the sum of their"
                + " entries)");
        }
        if (parts.isEmpty()) {
            return "";
        }
        String text = String.join("; ", parts) + ".";
        return Character.toUpperCase(text.charAt(0)) + text.substring(1);
    }

    /** The note of {@code --factor}; empty without it. */
    static String factoredNote(ClosedResult r) {
        return r.factored() ? "Coefficients and limits: numerator and denominator factored over the rationals." : "";
    }

    /** The plain forms of a grid. */
    static List<List<String>> plainGrid(List<List<Formula>> grid) {
        List<List<String>> out = new ArrayList<>();
        for (List<Formula> row : grid) {
            out.add(plain(row));
        }
        return out;
    }

    /** The plain forms. */
    static List<String> plain(List<Formula> fs) {
        List<String> out = new ArrayList<>();
        for (Formula f : fs) {
            out.add(f.plain());
        }
        return out;
    }

    /** Where the decimals are taken: {@code " at p=1/20, r=1/4"} or empty for a chain without parameters. */
    static String pointNote(ClosedResult r) {
        return r.point().map(p -> " at " + p.text() + " (" + p.origin() + ")").orElse("");
    }

    /** The rate sentence: what the number means, or that the long run is reached exactly. */
    static String rateLine(ClosedResult r, ClosedResult.LongRun lr) {
        String n = r.names().step();
        if (lr.exact()) {
            return lr.periodic()
                ? "Exact from " + n + " = " + lr.exactFrom() + ": P^(" + n + " + " + lr.period() + ") = " + pn(r)
                    + " (no eigenvalue other than roots of unity and 0)"
                : "Exact from " + n + " = " + lr.exactFrom() + ": " + pn(r)
                    + " equals its limit (no eigenvalue other than 1 and 0)";
        }
        return lr.periodic()
            ? "Convergence rate of each subsequence (largest modulus of the eigenvalues that are not roots of unity): "
                + rate(r, lr, true)
            : "Convergence rate (second-largest eigenvalue modulus): " + rate(r, lr, true);
    }

    /** Whether the conditions are known to hold inside the parameters' domains; empty without conditions. */
    static String domainNote(ClosedResult r) {
        if (r.conditions().isEmpty()) {
            return "";
        }
        if (r.notProved().isEmpty()) {
            return (r.conditions().size() == 1 ? " It" : " They") + " always hold"
                + (r.conditions().size() == 1 ? "s" : "") + " inside the parameters' domains.";
        }
        return " Not shown to hold throughout the parameters' domains: " + conditions(r.notProved()) + ".";
    }

    /** Conditions in plain syntax, comma-separated: {@code 1 + 4*a != 0, a != 0}. */
    static String conditions(List<org.qchain.result.Condition> cs) {
        return String.join(", ", org.qchain.result.Condition.plain(cs));
    }
}
