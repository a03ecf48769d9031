package org.qchain.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.result.AbsorbResult;
import org.qchain.result.ClassesResult;
import org.qchain.result.ExactValue;
import org.qchain.result.Formula;
import org.qchain.result.LongRunResult;

/**
 * The tables of the {@code classes}, {@code longrun} and {@code absorb} results, laid out once; the text, Markdown,
 * LaTeX and CSV formatters each render them in their own syntax.
 */
final class Sections {
    private Sections() {
    }

    /**
     * One titled table.
     *
     * @param title  the table's title
     * @param header column headings
     * @param rows   rows of cells; a cell is a formula or a word ({@link #word})
     */
    record Table(String title, List<String> header, List<List<Formula>> rows) {
    }

    /** A document: a heading line and its tables. */
    record Doc(String heading, List<Table> tables, List<String> notes) {
    }

    static Formula word(String s) {
        return Formula.of(s, "\\text{" + Text.latex(s) + "}");
    }

    static Doc of(ClassesResult r) {
        List<Table> t = new ArrayList<>();
        List<List<Formula>> rows = new ArrayList<>();
        for (int c = 0; c < r.classes().size(); c++) {
            ClassesResult.ChainClass k = r.classes().get(c);
            List<Formula> row = new ArrayList<>(List.of(word(String.valueOf(c)), word(String.join(" ", k.states())),
                word(k.closed() ? "closed" : "transient")));
            if (!r.continuous()) {
                // a continuous chain has no period (the JSON says 1)
                row.add(word(k.period() == 0 ? "-" : String.valueOf(k.period())));
            }
            rows.add(row);
        }
        t.add(new Table("Communicating classes", r.continuous() ? List.of("class", "states", "kind")
            : List.of("class", "states", "kind", "period"), rows));
        if (!r.brief()) {
            t.add(matrix(r.continuous() ? "Rates (entry from row to column; blank: no transition; diagonal: minus"
                + " the total rate out)" : "One-step graph (entry from row to column; blank: no transition)",
                r.states(), r.states(), blankZeros(r.graph())));
        }
        if (!r.specialValues().isEmpty()) {
            List<List<Formula>> sv = new ArrayList<>();
            for (ClassesResult.SpecialValue v : r.specialValues()) {
                sv.add(List.of(word(specialCondition(v)), word(effect(v.effect()))));
            }
            t.add(new Table("Parameter values that change the structure", List.of("condition", "effect"), sv));
        }
        List<String> notes = new ArrayList<>();
        notes.add("absorbing: " + (r.absorbing().isEmpty() ? "(none)" : String.join(", ", r.absorbing())));
        notes.add("transient: " + (r.transients().isEmpty() ? "(none)" : String.join(", ", r.transients())));
        if (r.brief()) {
            notes.add("left out (--brief): the " + (r.continuous() ? "rate table" : "one-step graph"));
        }
        return new Doc("Structure of " + r.source() + params(r.parameters()) + at(r.at()), t, notes);
    }

    /**
     * Where a special value lies, as every format prints it: {@code p = 0}, or {@code p - r = 0 (if it vanishes
     * inside the domains: not decided)} when its zeros inside the domains were not decided.
     */
    static String specialCondition(ClassesResult.SpecialValue v) {
        return v.condition().plain() + (v.condition().proved() ? "" : " (if it vanishes inside the domains: not decided)");
    }

    /**
     * What changes at a special value, in words: {@code Worn can no longer leave}, {@code classes become {A, B}
     * closed period 2, {C}}, or both separated by {@code ; }.
     */
    static String effect(ClassesResult.Effect e) {
        List<String> parts = new ArrayList<>();
        for (String a : e.absorbing()) {
            parts.add(a + " can no longer leave");
        }
        e.classes().ifPresent(classes -> {
            List<String> cls = new ArrayList<>();
            for (ClassesResult.ChainClass c : classes) {
                cls.add("{" + String.join(", ", c.states()) + "}" + (c.closed() ? " closed" : "")
                    + (c.closed() && c.period() > 1 ? " period " + c.period() : ""));
            }
            parts.add("classes become " + String.join(", ", cls));
        });
        return String.join("; ", parts);
    }

    static Doc of(LongRunResult r) {
        List<Table> t = new ArrayList<>();
        for (int c = 0; c < r.classes().size(); c++) {
            LongRunResult.ClassLaw k = r.classes().get(c);
            if (!k.closed()) {
                continue;
            }
            List<List<Formula>> rows = new ArrayList<>();
            for (int i = 0; i < k.states().size(); i++) {
                rows.add(List.of(word(k.states().get(i)), k.stationary().get(i),
                    i < k.meanRecurrence().size() ? k.meanRecurrence().get(i) : word("- (never left)")));
            }
            t.add(new Table("Closed class " + c + (r.continuous() ? "" : " (period " + k.period() + ")")
                + ": stationary law", List.of("state", "stationary", r.continuous() ? "mean return time"
                : "mean recurrence"), rows));
        }
        if (!r.absorption().isEmpty()) {
            List<String> head = new ArrayList<>(List.of("from"));
            for (int c : r.absorption().get(0).classes()) {
                head.add("class " + c);
            }
            List<List<Formula>> rows = new ArrayList<>();
            for (LongRunResult.Absorption a : r.absorption()) {
                List<Formula> row = new ArrayList<>(List.of(word(a.state())));
                row.addAll(a.probabilities());
                rows.add(row);
            }
            t.add(new Table("Probability of ending in each closed class", head, rows));
        }
        if (!r.brief()) {
            t.add(matrix(r.continuous() ? "Limit of P(t) as t grows" : r.cesaro()
                ? "Limit of the averages (P + ... + P^n)/n" : "Limit of P^n", r.states(), r.states(), r.limit()));
        }
        r.passage().ifPresent(m -> t.add(matrix(r.continuous()
            ? "Mean first-passage times (diagonal: mean return time)"
            : "Mean first-passage times (diagonal: mean recurrence)", r.states(), r.states(), m)));
        return new Doc("Long run of " + r.source() + params(r.parameters()) + at(r.at()), t, r.brief()
            ? List.of("left out (--brief): the limit matrix (each row is the probability of ending in each closed"
                + " class times its stationary law)") : List.of());
    }

    static Doc of(AbsorbResult r) {
        List<Table> t = new ArrayList<>();
        List<String> rowsOf = r.from().map(List::of).orElse(r.transients());
        List<List<Formula>> steps = new ArrayList<>();
        List<String> head = new ArrayList<>(List.of("from", r.continuous() ? "expected time" : "expected steps",
            "variance"));
        for (String a : r.absorbing()) {
            head.add("P(end in " + a + ")");
        }
        for (String s : rowsOf) {
            int i = r.transients().indexOf(s);
            List<Formula> row = new ArrayList<>(List.of(word(s), r.expectedSteps().get(i), r.variance().get(i)));
            row.addAll(r.probabilities().get(i));
            steps.add(row);
        }
        t.add(new Table("Until absorption", head, steps));
        if (!r.brief()) {
            List<List<Formula>> nRows = new ArrayList<>();
            for (String s : rowsOf) {
                nRows.add(r.fundamental().get(r.transients().indexOf(s)));
            }
            t.add(matrix(r.continuous() ? "Expected time in each state N = (-Q)^-1"
                : "Expected visits N = (I - Q)^-1", rowsOf, r.transients(), nRows));
        }
        r.rewards().ifPresent(w -> {
            List<String> h = new ArrayList<>(List.of("state", r.continuous() ? "reward per unit time"
                : "reward per step", "accumulated until absorption",
                "long-run average"));
            if (w.discount().isPresent()) {
                h.add("discounted (v = " + w.discount().get().plain() + ")");
            }
            List<List<Formula>> rows = new ArrayList<>();
            for (int i = 0; i < w.states().size(); i++) {
                String s = w.states().get(i);
                if (r.from().isPresent() && !r.from().get().equals(s)) {
                    continue;
                }
                int k = r.transients().indexOf(s);
                List<Formula> row = new ArrayList<>(List.of(word(s), w.perStep().get(i),
                    k >= 0 ? w.accumulated().get(k) : word("-"), w.longRun().get(i)));
                if (w.discount().isPresent()) {
                    row.add(w.discounted().get(i));
                }
                rows.add(row);
            }
            t.add(new Table("Rewards", h, rows));
        });
        r.passage().ifPresent(p -> {
            List<String> h = new ArrayList<>(List.of("from", "n", "P(T = n)", "P(T <= n)"));
            List<List<Formula>> rows = new ArrayList<>();
            for (int i = 0; i < p.states().size(); i++) {
                String s = p.states().get(i);
                if (r.from().isPresent() ? !r.from().get().equals(s) : !r.transients().contains(s)) {
                    continue;
                }
                for (int k = 0; k < p.exactly().get(i).size(); k++) {
                    rows.add(List.of(word(s), word(String.valueOf(k + 1)), p.exactly().get(i).get(k),
                        p.within().get(i).get(k)));
                }
            }
            t.add(new Table("First passage into " + String.join(", ", r.absorbing()), h, rows));
        });
        List<String> notes = new ArrayList<>();
        if (!r.made().isEmpty()) {
            notes.add("made absorbing: " + String.join(", ", r.made()));
        }
        if (r.brief()) {
            notes.add("left out (--brief): the fundamental matrix N");
        }
        return new Doc("Absorption in " + r.source() + params(r.parameters()) + at(r.at()), t, notes);
    }

    /** {@code "; parameters at p=1/10 (given with --at)"}, or nothing: where the values came from. */
    private static String at(java.util.Optional<org.qchain.result.Point> point) {
        return point.map(p -> "; parameters at " + p.text() + " (" + p.origin() + ")").orElse("");
    }

    private static String params(List<String> p) {
        return p.isEmpty() ? "" : " (formulas in " + String.join(", ", p) + ")";
    }

    private static List<List<Formula>> blankZeros(List<List<Formula>> m) {
        return m.stream().map(row -> row.stream().map(f -> f.plain().equals("0") ? word("") : f).toList()).toList();
    }

    static Table matrix(String title, List<String> rowNames, List<String> colNames, List<List<Formula>> m) {
        List<String> head = new ArrayList<>(List.of(""));
        head.addAll(colNames);
        List<List<Formula>> rows = new ArrayList<>();
        for (int i = 0; i < rowNames.size(); i++) {
            List<Formula> row = new ArrayList<>(List.of(word(rowNames.get(i))));
            row.addAll(m.get(i));
            rows.add(row);
        }
        return new Table(title, head, rows);
    }

    /** The exact value, if the formula is a number. */
    static java.util.Optional<org.qchain.exact.Rational> exact(Formula f) {
        return f instanceof ExactValue e ? java.util.Optional.of(e.value()) : java.util.Optional.empty();
    }
}
