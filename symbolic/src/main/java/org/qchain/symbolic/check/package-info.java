/**
 * Validation of chains with parameters: rows that sum to 1 identically, entries that stay in [0, 1] over the
 * parameter domains (exact for multilinear entries over bounded boxes, sound interval branch and bound otherwise,
 * honest "undecided" when neither proves nor refutes), and user parameter points checked against their domains.
 * See {@link org.qchain.symbolic.check.ParameterCheck} for the method and its limits.
 *
 * <p>A {@code param} without a declared domain has the default domain of its chain's kind: (0, 1) in a discrete
 * chain (a probability) and (0, infinity) in a continuous one (a rate).
 */
package org.qchain.symbolic.check;
