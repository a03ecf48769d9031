package org.qchain.exact.model;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Set;

/**
 * Where parameter values came from, as every message and label names it: {@code nominal values} (the model's),
 * {@code given with --at}, or mixed, {@code p given with --at, r nominal}. One wording for the "parameters at ..."
 * lines of the results and the range warnings of the symbolic check.
 */
public final class ValueOrigin {
    private ValueOrigin() {
    }

    /**
     * The origin of the values of {@code names}.
     *
     * @param names the parameters whose values are used, in the order to name them
     * @param given the names whose values were given with {@code --at} (others in it are ignored)
     * @return {@code nominal values}, {@code given with --at}, or {@code p given with --at, r nominal}
     */
    public static String of(Collection<String> names, Set<String> given) {
        List<String> fromAt = new ArrayList<>();
        List<String> nominal = new ArrayList<>();
        for (String name : names) {
            (given.contains(name) ? fromAt : nominal).add(name);
        }
        if (fromAt.isEmpty()) {
            return "nominal values";
        }
        if (nominal.isEmpty()) {
            return "given with --at";
        }
        return String.join(", ", fromAt) + " given with --at, " + String.join(", ", nominal) + " nominal";
    }
}
