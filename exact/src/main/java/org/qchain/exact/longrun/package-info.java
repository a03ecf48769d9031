/**
 * Structure, long run and absorption of discrete-time chains: communicating classes, closed and transient states,
 * periods ({@link org.qchain.exact.longrun.Structure}); stationary laws per closed class, absorption into closed
 * classes, the (Cesàro) limit of P^n, mean recurrence and first-passage times; the fundamental matrix N, expected
 * steps, their variance and absorption probabilities; rewards (accumulated, long-run average, discounted) and the
 * first-passage time distribution ({@link org.qchain.exact.longrun.ChainEngine}).
 *
 * <p>The engine is written once over an {@link org.qchain.exact.longrun.Arithmetic}: exact rationals here with
 * {@link org.qchain.exact.linear.LinearSolver}, rational functions of the parameters in the symbolic module.
 */
package org.qchain.exact.longrun;
