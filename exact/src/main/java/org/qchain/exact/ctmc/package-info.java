/**
 * Continuous-time chains with failure and repair rates: exact figures of merit from a rational generator
 * {@code Q} and the operating ("up") states. {@link org.qchain.exact.ctmc.Availability} gives the stationary law
 * ({@code πQ = 0}, {@code Σπ = 1}), steady-state availability, mean time to failure from each up state (expected time
 * to first reach a down state), failure frequency {@code ω = Σ_{i up, j down} π_i q_ij}, mean up and down times
 * per cycle and unavailability in hours per year; {@link org.qchain.exact.ctmc.Generators} turns a generator into
 * its embedded jump chain or its uniformized chain (discrete transition matrices). Transient probabilities
 * {@code P(t) = exp(Qt)} as certified decimals are in {@link org.qchain.exact.certified.CertifiedTransient}.
 * {@link org.qchain.exact.ctmc.RateSensitivity} differentiates the figures exactly with respect to a rate parameter
 * (with a digit estimate for sweeps); {@link org.qchain.exact.ctmc.TransientSensitivity} gives one entry of
 * {@code P(t)} and its derivative with respect to a parameter as certified decimals.
 *
 * <pre>{@code
 * RationalMatrix q = Chains.transitionMatrix(model);           // the generator
 * Availability.Figures<Rational> f = Availability.of(q, model.upStates().orElseThrow(), Availability.HOURS_PER_YEAR);
 * f.availability();                                             // exact, e.g. 250/251
 * }</pre>
 */
package org.qchain.exact.ctmc;
