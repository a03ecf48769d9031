package org.qchain.format;

import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.qchain.exact.Decimals;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.Formula;
import org.qchain.result.SymbolicAvailabilityResult;
import org.qchain.result.RateSensResult;
import org.qchain.result.TransientResult;

/** Phrases and tables shared by every format's layout of continuous-chain results. */
final class Continuous {
    /** What the hours-per-year figure says about its year. */
    static final String YEAR_NOTE = "hours per year";

    private Continuous() {
    }

    /** A bound, rounded up to 2 significant digits (it stays a bound). */
    static String bound(Rational b) {
        return b.isZero() ? "0" : Decimals.format(b, 2, RoundingMode.CEILING);
    }

    /** A certified value for the "matrix" of the JSON: the exact value where it is known, else its decimal. */
    static String value(CertifiedDecimal d) {
        return d.status() == CertifiedDecimal.Status.EXACT ? d.enclosure().lo().toString() : d.text();
    }

    /** The names of the rows shown. */
    static List<String> rowNames(TransientResult r) {
        return r.from().map(List::of).orElse(r.states());
    }

    /** {@code P(t)} as a grid of decimals, the first row a header. */
    static List<List<String>> grid(TransientResult r, TransientResult.AtTime at) {
        List<List<String>> out = new ArrayList<>();
        List<String> head = new ArrayList<>();
        head.add("from\\to");
        head.addAll(r.states());
        out.add(head);
        List<String> names = rowNames(r);
        for (int i = 0; i < at.rows().size(); i++) {
            List<String> line = new ArrayList<>();
            line.add(names.get(i));
            at.rows().get(i).forEach(d -> line.add(d.text()));
            out.add(line);
        }
        return out;
    }

    /** The sentence about the bound of one time. */
    static String boundSentence(TransientResult.AtTime at) {
        return "every digit shown is proven; each value's enclosure is at most " + bound(at.bound())
            + " wide (uniformization rate " + at.uniformizationRate() + ")";
    }

    /** An exact figure that may be infinite or undefined. */
    static String exact(Optional<Rational> v, String none) {
        return v.map(Rational::toString).orElse(none);
    }

    static String decimal(Optional<Rational> v, String none, int digits) {
        return v.map(x -> Text.decimal(x, digits)).orElse(none);
    }

    /**
     * The figures of an availability result, one row each: name, exact value, decimal.
     *
     * @param r      the result
     * @param digits significant digits of the decimals
     * @return the rows
     */
    static List<List<String>> figures(AvailabilityResult r, int digits) {
        List<List<String>> out = new ArrayList<>();
        out.add(List.of(AVAILABILITY, r.availability().toString(), Text.decimal(r.availability(), digits)));
        out.add(List.of(UNAVAILABILITY, r.unavailability().toString(), Text.decimal(r.unavailability(), digits)));
        out.add(List.of(downTime(r.hoursPerYear()), r.downHoursPerYear().toString(),
            Text.decimal(r.downHoursPerYear(), digits)));
        out.add(List.of(FREQUENCY, r.failureFrequency().toString(), Text.decimal(r.failureFrequency(), digits)));
        out.add(List.of(MEAN_UP, exact(r.meanUpTime(), NEVER_FAILS), decimal(r.meanUpTime(), "undefined", digits)));
        out.add(List.of(MEAN_DOWN, exact(r.meanDownTime(), NEVER_FAILS),
            decimal(r.meanDownTime(), "undefined", digits)));
        r.mttf().forEach((s, v) -> out.add(List.of(mttf(s), exact(v, "inf"), decimal(v, "inf", digits))));
        r.stationary().forEach((s, v) -> out.add(List.of(share(s), v.toString(), Text.decimal(v, digits))));
        return out;
    }

    /** The figures' names, the same in every format and on both routes. */
    static final String AVAILABILITY = "steady-state availability";
    static final String UNAVAILABILITY = "steady-state unavailability";
    static final String FREQUENCY = "failure frequency";
    static final String MEAN_UP = "mean up time per cycle";
    static final String MEAN_DOWN = "mean down time per cycle";
    static final String NEVER_FAILS = "undefined (never fails)";

    static String downTime(Rational hoursPerYear) {
        return "down time per year (" + hoursPerYear + " " + YEAR_NOTE + ")";
    }

    static String mttf(String state) {
        return "MTTF from " + state;
    }

    static String share(String state) {
        return "long-run share of " + state;
    }

    /**
     * One figure as a formula.
     *
     * @param name    the figure's name
     * @param formula the formula; empty when the figure is infinite or undefined
     * @param none    what to print instead
     */
    record FormulaRow(String name, Optional<Formula> formula, String none) {
        String plain() {
            return formula.map(Formula::plain).orElse(none);
        }

        String latex() {
            return formula.map(Formula::latex).orElse("\\text{" + Text.latex(none) + "}");
        }
    }

    /** The figures of a symbolic availability result, in the order of {@link #figures}. */
    static List<FormulaRow> formulas(SymbolicAvailabilityResult r) {
        List<FormulaRow> out = new ArrayList<>();
        out.add(new FormulaRow(AVAILABILITY, Optional.of(r.availability()), ""));
        out.add(new FormulaRow(UNAVAILABILITY, Optional.of(r.unavailability()), ""));
        out.add(new FormulaRow(downTime(r.hoursPerYear()), Optional.of(r.downHoursPerYear()), ""));
        out.add(new FormulaRow(FREQUENCY, Optional.of(r.failureFrequency()), ""));
        out.add(new FormulaRow(MEAN_UP, r.meanUpTime(), NEVER_FAILS));
        out.add(new FormulaRow(MEAN_DOWN, r.meanDownTime(), NEVER_FAILS));
        r.mttf().forEach((s, v) -> out.add(new FormulaRow(mttf(s), v, "inf")));
        r.stationary().forEach((s, v) -> out.add(new FormulaRow(share(s), Optional.of(v), "")));
        r.inTime().ifPresent(t -> {
            out.add(new FormulaRow(pointAvailability(t), Optional.of(t.pointAvailability()), ""));
            t.availabilityWhere().forEach((name, f) -> out.add(new FormulaRow(where(name, "A"), Optional.of(f), "")));
            out.add(new FormulaRow(reliability(t), Optional.of(t.reliability()), ""));
            t.reliabilityWhere().forEach((name, f) -> out.add(new FormulaRow(where(name, "R"), Optional.of(f), "")));
        });
        return out;
    }

    /** The name of the A(t) row, e.g. {@code point availability A(t) from Up}. */
    static String pointAvailability(SymbolicAvailabilityResult.InTime t) {
        return "point availability A(" + t.time() + ") from " + t.from();
    }

    /** The name of the R(t) row, e.g. {@code reliability R(t) from Up}. */
    static String reliability(SymbolicAvailabilityResult.InTime t) {
        return "reliability R(" + t.time() + ") from " + t.from();
    }

    /** The name of a factor's row: its eigenvalues are the roots of the factor named in that formula. */
    static String where(String name, String figure) {
        return "  where " + name + " in " + figure + " (roots of)";
    }

    /** The title line's words about a symbolic availability result. */
    static String symbolicTitle(SymbolicAvailabilityResult r) {
        return "Availability of " + r.source() + " (continuous chain; up: " + String.join(", ", r.up())
            + "; every other state is down; formulas in " + (r.parameters().isEmpty() ? "no parameter"
            : String.join(", ", r.parameters())) + ")";
    }

    /** The sentence before the conditions. */
    static final String CONDITIONS = "Conditions: the formulas hold where none of these vanishes (factors of the"
        + " denominators and of the rates):";

    /** What a condition's check found. */
    static String proof(org.qchain.result.Condition c) {
        return c.proved() ? "holds throughout the parameters' domains (proved)"
            : "not proved throughout the domains: the formulas hold only where it does";
    }

    /** The closing sentence about units. */
    static final String UNITS = "Times are in the unit of the model's rates; failure frequency is per that unit.";

    /** The title of a generator check. */
    static String generatorTitle(org.qchain.result.CheckResult.Generator g) {
        int n = g.states().size();
        return "Generator Q of " + g.source() + " (continuous chain, " + n + (n == 1 ? " state)" : " states)")
            + (g.symbolic() ? " as exact rational functions of " + (g.parameters().isEmpty() ? "(no parameters)"
            : String.join(", ", g.parameters())) : "");
    }

    /** What a generator's entries are. */
    static final String GENERATOR_NOTE = "Row i, column j: rate from state i to state j (per unit of time); diagonal:"
        + " minus the total rate out of state i.";

    /** What an unbounded holding time prints as. */
    static final String NEVER_LEFT = "inf (never left)";

    /** The generator's closing verdict, as the discrete check's {@code OK:} line. */
    static String generatorVerdict(org.qchain.result.CheckResult.Generator g) {
        int n = g.states().size();
        String head = "OK: " + n + (n == 1 ? " state" : " states") + ", continuous, rows sum to 0";
        if (!g.symbolic()) {
            return head + ", off-diagonal rates >= 0";
        }
        return head + " identically; " + (g.warnings().isEmpty()
            ? "off-diagonal rates >= 0 on the whole parameter domain"
            : g.warnings().size() + (g.warnings().size() == 1 ? " condition" : " conditions")
                + " on the parameters (above)");
    }

    /** The sentence before a generator's located conditions. */
    static final String RATE_CONDITIONS = "Conditions (each off-diagonal rate must be at least 0 for Q to be a"
        + " generator):";

    /** The operating and down states, as a sentence; empty without an {@code up} line. */
    static Optional<String> upDown(org.qchain.result.CheckResult.Generator g) {
        return g.up().map(u -> "Up (operating) states: " + String.join(", ", u) + "; down: "
            + (g.down().isEmpty() ? "(none)" : String.join(", ", g.down())) + ".");
    }

    /**
     * Per state: name, total rate out, mean holding time; exact values add a decimal after each ({@code 1/250
     * (0.004)} style is the caller's: the cells here are the exact text and the decimal, or the formula and "").
     */
    static List<List<String>> stateRows(org.qchain.result.CheckResult.Generator g, int digits) {
        List<List<String>> out = new ArrayList<>();
        for (int i = 0; i < g.states().size(); i++) {
            Formula q = g.exitRates().get(i);
            Optional<Formula> h = g.holding().get(i);
            out.add(List.of(g.states().get(i), q.plain(), decimalOf(q, digits),
                h.map(Formula::plain).orElse(NEVER_LEFT), h.map(x -> decimalOf(x, digits)).orElse(g.symbolic() ? ""
                    : "inf")));
        }
        return out;
    }

    /** The decimal of an exact value, or "" for a formula. */
    static String decimalOf(Formula f, int digits) {
        return Sections.exact(f).map(r -> Text.decimal(r, digits)).orElse("");
    }

    /**
     * The point availabilities, then the reliabilities, one row each: {@code A(t)} or {@code R(t)} label, decimal
     * (certified), enclosure width.
     */
    static List<List<String>> points(AvailabilityResult r) {
        List<List<String>> out = new ArrayList<>();
        for (AvailabilityResult.PointAvailability p : r.point()) {
            out.add(List.of("A(" + p.t() + ") from " + r.from(), p.value().text(), bound(p.value().enclosure().width())));
        }
        for (AvailabilityResult.PointAvailability p : r.reliability()) {
            out.add(List.of("R(" + p.t() + ") from " + r.from(), p.value().text(), bound(p.value().enclosure().width())));
        }
        return out;
    }

    /** The heading of the certified table: what its rows are. */
    static String pointsHeading(AvailabilityResult r) {
        return r.reliability().isEmpty() ? "Point availability" : "Point availability A(t) and reliability R(t)";
    }

    /** What a rate sensitivity is about, e.g. {@code MTTF from Both}. */
    static String figureName(RateSensResult r) {
        return r.figure() + r.from().map(f -> " from " + f).orElse("");
    }

    /** The title of a P(t) entry's sensitivity. */
    static String transientSensTitle(org.qchain.result.TransientSensResult r) {
        return "Sensitivity of P(t)(" + r.from() + " -> " + r.to() + ") to " + r.wrt() + " in " + r.source() + " at "
            + r.point().text() + " (certified decimals, " + Text.digits(r.digits()) + "; uniformization rate "
            + r.rate() + ")";
    }

    /** The rows of a P(t) entry's sensitivity: t, quantity, decimal, enclosure width, status; three per time. */
    static List<List<String>> transientSensRows(org.qchain.result.TransientSensResult r) {
        List<List<String>> out = new ArrayList<>();
        for (org.qchain.result.TransientSensResult.Row row : r.rows()) {
            String t = row.t().toString();
            out.add(cells(t, "P", row.value()));
            out.add(cells(t, "dP/d" + r.wrt(), row.derivative()));
            out.add(row.elasticity().map(e -> cells(t, "elasticity", e))
                .orElse(List.of(t, "elasticity", "undefined (P = 0)", "", "")));
        }
        return out;
    }

    private static List<String> cells(String t, String what, CertifiedDecimal d) {
        return List.of(t, what, d.text(), bound(d.enclosure().width()), d.status().name().toLowerCase(java.util.Locale.ROOT));
    }

    /** The rows of a rate sensitivity: name, exact value, decimal. */
    static List<List<String>> sensRows(RateSensResult r, int digits) {
        List<List<String>> out = new ArrayList<>();
        String f = figureName(r);
        out.add(List.of(f, r.value().toString(), Text.decimal(r.value(), digits)));
        out.add(List.of("d(" + f + ")/d" + r.wrt(), r.derivative().toString(), Text.decimal(r.derivative(), digits)));
        out.add(List.of("elasticity (" + r.wrt() + "/figure) d/d" + r.wrt(), exact(r.elasticity(), "undefined"),
            decimal(r.elasticity(), "undefined", digits)));
        return out;
    }

    // --- P(t) with symbolic parameters -------------------------------------------------------------------------

    /** The heading of a symbolic P(t). */
    static String symbolicTitle(org.qchain.result.SymbolicTransientResult r) {
        String t = r.timeSymbol();
        return "P(" + t + ") for " + r.source() + " (continuous chain): closed form in " + t + ", P(" + t
            + ") = exp(Q*" + t + ")" + (r.parameters().isEmpty() ? ""
            : "; parameters symbolic: " + String.join(", ", r.parameters()));
    }

    /** {@code Valid for t >= 0 where ...} with what is known of the conditions inside the domains. */
    static String symbolicValidity(org.qchain.result.SymbolicTransientResult r) {
        StringBuilder sb = new StringBuilder("Valid for ").append(r.timeSymbol()).append(" >= 0");
        if (!r.conditions().isEmpty()) {
            sb.append(" where ").append(String.join(", ", r.conditions())).append('.');
            sb.append(r.notProved().isEmpty()
                ? (r.conditions().size() == 1 ? " It always holds" : " They always hold") + " inside the parameters'"
                    + " domains."
                : " Not shown to hold throughout the parameters' domains: " + String.join(", ", r.notProved()) + ".");
        } else {
            sb.append('.');
        }
        return sb.toString();
    }

    /** The label of an entry: {@code P(t)(Up -> Down)} with the time's symbol or value. */
    static String symbolicLabel(String time, String from, String to) {
        return "P(" + time + ")(" + from + " -> " + to + ")";
    }

    /** {@code where s = ...} in text syntax (eigenvalues as λ1, λ2); empty when nothing is named. */
    static String symbolicWhere(org.qchain.result.SymbolicTransientResult r, boolean symbols) {
        if (r.where().isEmpty()) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        for (org.qchain.result.ClosedResult.Where w : r.where()) {
            parts.add((symbols ? w.symbol() : w.name()) + " = " + symbolicShown(r, w.value().plain(), symbols));
        }
        return "where " + String.join(", ", parts);
    }

    /** A plain formula with each eigenvalue's name as its symbol (λ1) when {@code symbols}. */
    static String symbolicShown(org.qchain.result.SymbolicTransientResult r, String plain, boolean symbols) {
        String out = plain;
        if (symbols) {
            for (org.qchain.result.ClosedResult.Where w : r.where()) {
                if (!w.symbol().equals(w.name())) {
                    out = out.replaceAll("\\b" + java.util.regex.Pattern.quote(w.name()) + "\\b",
                        java.util.regex.Matcher.quoteReplacement(w.symbol()));
                }
            }
        }
        return out;
    }

    /** The certified decimals at time index k, shaped like the cells; empty without values. */
    static List<List<CertifiedDecimal>> symbolicDecimals(org.qchain.result.SymbolicTransientResult r, int k) {
        return r.values().map(v -> v.times().get(k).rows()).orElse(List.of());
    }

    /** The sentence on the decimals of time index k; empty without values. */
    static String symbolicDecimalNote(org.qchain.result.SymbolicTransientResult r, int k) {
        return r.values().map(v -> "≈: certified decimals at " + r.point().map(p -> p.text() + " (" + p.origin() + ")")
            .orElse("the model's values") + ", " + Text.digits(r.digits()) + "; " + boundSentence(v.times().get(k)))
            .orElse("");
    }
}
