package org.qchain.symbolic.sensitivity;

import org.qchain.exact.Rational;

/**
 * One line of a sweep table.
 *
 * @param value       the swept parameter's value
 * @param probability {@code P^n_ij} there (other parameters at the base point)
 * @param derivative  {@code dP^n_ij / dp} there
 */
public record SweepRow(Rational value, Rational probability, Rational derivative) {
}
