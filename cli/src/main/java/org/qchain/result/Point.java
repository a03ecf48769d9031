package org.qchain.result;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.qchain.exact.Rational;

/**
 * Exact parameter values, in declaration order.
 *
 * @param values the values by parameter name
 */
public record Point(Map<String, Rational> values) {
    /** Copies the map, keeping its order. */
    public Point {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
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
