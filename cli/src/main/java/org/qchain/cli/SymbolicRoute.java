package org.qchain.cli;

import org.qchain.exact.model.Model;

/**
 * The door to the symbolic path, free of symbolic types: {@link StepCommand} and {@link CheckCommand} call it, and only
 * {@link #step(StepCommand, Model)} reaches {@link SymbolicStep} (which loads JAS through the symbolic module). The
 * decision itself looks at the model only, so numeric runs load no symbolic class.
 */
final class SymbolicRoute {
    private SymbolicRoute() {
    }

    /**
     * Whether {@code step} takes the symbolic path: asked for with {@code --symbolic}, or the model uses a parameter
     * that has no nominal value (a free parameter; {@code --at} then gives the point where values are shown).
     */
    static boolean applies(Model m, boolean forced) {
        if (forced) {
            return true;
        }
        for (String name : m.usedParameters()) {
            if (m.param(name).flatMap(d -> d.nominal()).isEmpty()) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether {@code check} takes the symbolic path: asked for with {@code --symbolic}, or a used parameter has neither
     * a nominal value nor one in {@code --at} (a complete {@code --at} point is checked numerically there).
     */
    static boolean appliesToCheck(Model m, boolean forced, java.util.Optional<String> at) {
        if (forced) {
            return true;
        }
        java.util.Set<String> given = new java.util.HashSet<>();
        at.ifPresent(text -> {
            for (String item : text.split(",", -1)) {
                int eq = item.indexOf('=');
                given.add((eq < 0 ? item : item.substring(0, eq)).strip());
            }
        });
        for (String name : m.usedParameters()) {
            if (m.param(name).flatMap(d -> d.nominal()).isEmpty() && !given.contains(name)) {
                return true;
            }
        }
        return false;
    }

    /** Runs {@code check} on the symbolic path. */
    static int check(CheckCommand c, Model m) {
        return SymbolicCheck.run(c, m);
    }

    /** Runs {@code step} on the symbolic path. */
    static int step(StepCommand c, Model m) {
        return SymbolicStep.run(c, m);
    }
}
