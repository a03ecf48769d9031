package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Model;

/**
 * The one place that decides how a model is evaluated. Today every route is numeric: all parameters need a value
 * (nominal or from {@code --at}; declared but unused parameters need none), otherwise the model is refused with {@link ErrorKey#FREE_PARAMETERS}. Symbolic
 * output extends this: add a {@code Symbolic} record to {@link Route}, return it from {@link #decide} for free
 * parameters, and dispatch on it where {@code LoadedChain.evaluate} now takes the numeric route, calling the symbolic
 * code through a class of its own that only that branch references (the JVM loads classes lazily, so numeric runs
 * still never load Symja; {@code NoSymjaOnNumericPathTest} checks it).
 */
final class EvaluationRoute {
    private EvaluationRoute() {
    }

    /** How to evaluate a model. */
    sealed interface Route permits Numeric {
    }

    /**
     * Evaluate with rational numbers.
     *
     * @param values values that override the nominal ones (from {@code --at}); every parameter has a value
     */
    record Numeric(Map<String, Rational> values) implements Route {
        /** Copies the map. */
        Numeric {
            values = Map.copyOf(values);
        }
    }

    /**
     * Chooses the route for a model and the {@code --at} text.
     *
     * @param model the parsed model
     * @param at    the {@code --at} text, if given
     * @return the route
     * @throws QchainException {@link ErrorKey#FREE_PARAMETERS} if a parameter has no value; the parser's errors for a
     *                         malformed {@code --at}
     */
    static Route decide(Model model, Optional<String> at) {
        Map<String, Rational> values = at.map(text -> OptionValues.assignments(model, text)).orElse(Map.of());
        List<String> free = new ArrayList<>();
        for (String name : model.usedParameters()) {
            boolean nominal = model.param(name).flatMap(d -> d.nominal()).isPresent();
            if (!nominal && !values.containsKey(name)) {
                free.add(name);
            }
        }
        if (!free.isEmpty()) {
            throw new QchainException(ErrorKey.FREE_PARAMETERS, String.join(", ", free));
        }
        return new Numeric(values);
    }
}
