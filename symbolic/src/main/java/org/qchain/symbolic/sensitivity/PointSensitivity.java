package org.qchain.symbolic.sensitivity;

import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * An n-step probability and its sensitivity at one parameter point, exactly.
 *
 * @param point       the parameter values used
 * @param probability {@code P^n_ij} there
 * @param derivative  {@code dP^n_ij / dp} there
 * @param elasticity  {@code (p / P) dP/dp}, the relative change of P per relative change of p; empty where
 *                    {@code P = 0}
 */
public record PointSensitivity(Map<String, Rational> point, Rational probability, Rational derivative,
                               Optional<Rational> elasticity) {
    /** Copies the point. */
    public PointSensitivity {
        point = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(point));
    }
}
