package org.qchain.format;

import java.util.List;
import org.qchain.result.Formula;
import org.qchain.result.SensResult;
import org.qchain.result.SymbolicStepResult;

/** Phrases and traversals shared by every format's layout of symbolic step and sensitivity results. */
final class Symbolic {
    private Symbolic() {
    }

    /** Called for each cell (i, j) of a symbolic step result. */
    interface Cell {
        void at(int i, int j);
    }

    static void forEachCell(SymbolicStepResult r, Cell c) {
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.columns().size(); j++) {
                c.at(i, j);
            }
        }
    }

    static String what(SymbolicStepResult r) {
        if (r.isSingle()) {
            return "P^" + r.n() + "(" + r.from().get() + " -> " + r.to().get() + ")";
        }
        if (!r.isMatrix() && r.from().get().contains("=")) {
            // step --start with a distribution: the start's weighted sum of rows
            return "Distribution after " + Text.steps(r.n()) + " from " + r.from().get();
        }
        return r.isMatrix() ? "P^" + r.n() : "Row " + r.from().get() + " of P^" + r.n();
    }

    static String functionsOf(SymbolicStepResult r) {
        String of = r.parameters().isEmpty() ? "(no parameters)" : String.join(", ", r.parameters());
        return (r.isSingle() ? "an exact rational function of " : "exact rational functions of ") + of;
    }

    static String formText(boolean factored) {
        return factored ? "factored over the rationals (irreducible factors and one constant)"
            : "in canonical form: numerator and denominator coprime, expanded";
    }

    static String entryName(SensResult s) {
        return "P^" + s.n() + "(" + s.from() + " -> " + s.toText() + ")";
    }

    /** The plain forms of a grid of formulas. */
    static List<List<String>> plain(List<List<Formula>> grid) {
        return grid.stream().map(row -> row.stream().map(Formula::plain).toList()).toList();
    }
}
