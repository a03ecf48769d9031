/**
 * Sensitivity of n-step probabilities: the exact derivative {@code dP^n_ij/dp} as a formula, its value and the
 * elasticity {@code (p/P) dP/dp} at a point, and sweep tables over exact ranges {@code p=start:step:end}. Results are
 * immutable records; formatting is left to the caller. {@link org.qchain.symbolic.sensitivity.SweepEstimate} bounds
 * a sweep's digits from the one-step matrix, before any power, for a caller's size guard; the sweep's own check
 * from the formula stays as a second line.
 *
 * <pre>{@code
 * RatFunMatrix p = RatFunMatrix.fromModel(model);
 * EntrySensitivity s = Sensitivity.of(p, 10, up, down, "p", SymbolicLimits.DEFAULT, k -> { });
 * PointSensitivity at = s.at(ParamPoints.resolve(model, Map.of()));   // nominal values
 * List<SweepRow> table = s.sweep(SweepRange.parse("p=0:1/100:1/10"), at.point());
 * }</pre>
 */
package org.qchain.symbolic.sensitivity;
