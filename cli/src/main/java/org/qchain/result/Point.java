package org.qchain.result;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.LinkedHashMap;
import java.util.Map;
import org.qchain.exact.Rational;

/**
 * Exact parameter values, in declaration order, and which of them were given explicitly (the others are nominal
 * values from the model).
 *
 * @param values the values by parameter name
 * @param given  the names whose values were given explicitly ({@code --at}); a subset of the names of {@code values}
 */
public record Point(Map<String, Rational> values, Set<String> given) {
    /** Copies the map, keeping its order, and keeps only the given names that have a value here. */
    public Point {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
        Set<String> g = new LinkedHashSet<>();
        for (String name : values.keySet()) {
            if (given.contains(name)) {
                g.add(name);
            }
        }
        given = Collections.unmodifiableSet(g);
    }

    /**
     * Nominal values only.
     *
     * @param values the values by parameter name
     */
    public Point(Map<String, Rational> values) {
        this(values, Set.of());
    }

    /**
     * Where the values come from, for a label: {@code nominal values}, {@code given with --at}, or
     * {@code p given with --at, r nominal}.
     */
    public String origin() {
        return org.qchain.exact.model.ValueOrigin.of(values.keySet(), given);
    }

    /** Whether no parameter has a value here. */
    public boolean isEmpty() {
        return values.isEmpty();
    }

    /** {@code p=1/20, r=1/4}. */
    public String text() {
        StringBuilder sb = new StringBuilder();
        for (Map.Entry<String, Rational> e : values.entrySet()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(e.getKey()).append('=').append(e.getValue());
        }
        return sb.toString();
    }
}
