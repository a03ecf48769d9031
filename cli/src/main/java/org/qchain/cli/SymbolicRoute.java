package org.qchain.cli;

import org.qchain.exact.model.Model;

/**
 * The door to the symbolic path, free of symbolic types: {@link StepCommand} calls it, and only
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

    /** Runs {@code step} on the symbolic path. */
    static int step(StepCommand c, Model m) {
        return SymbolicStep.run(c, m);
    }
}
