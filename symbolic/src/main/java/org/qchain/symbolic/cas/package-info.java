/**
 * A text-only bridge to Symja ({@link org.qchain.symbolic.cas.SymjaSession}), set up as the library notes prescribe.
 * qchain's own arithmetic and printing never go through it; it is a general-purpose reference for tests and the
 * baseline for benchmarks. Loading it costs about a second, so nothing on a numeric path may touch this package.
 */
package org.qchain.symbolic.cas;
