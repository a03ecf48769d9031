/**
 * Checking another tool's floating-point numbers against the exact truth.
 *
 * <p>A {@link org.qchain.exact.reference.Target} says what a file must hold (a matrix, a vector or one number, with
 * state names); {@link org.qchain.exact.reference.ReferenceReader} reads CSV or JSON as a stream and hands each value,
 * read exactly as a {@link org.qchain.exact.reference.GivenValue}, to a sink; a
 * {@link org.qchain.exact.reference.Verifier} is such a sink: it subtracts exactly, decides the
 * {@link org.qchain.exact.reference.Tolerance} exactly, rounds only the errors for display, and keeps counts and the
 * worst entries ({@link org.qchain.exact.reference.EntryCheck}) for the
 * {@link org.qchain.exact.reference.VerifyReport}. Memory is proportional to the target, not to the file.
 * {@link org.qchain.exact.reference.PowerRows} supplies the exact {@code P^n} row by row as the file asks for it.
 *
 * <h2>Example</h2>
 * <pre>{@code
 * RationalMatrix p10 = MatrixPowers.power(p, 10);
 * Target target = Target.matrix(states, states, "the model has 3 states", "the model has 3 states");
 * Verifier v = new Verifier(target, p10::get, Tolerance.orDefault(Optional.empty(), Optional.empty(),
 *     OptionalLong.of(2)), 10);
 * VerifyReport r = v.report(ReferenceReader.read(Path.of("p10.csv"), "p10.csv", target, v));
 * boolean ok = r.passed();
 * }</pre>
 */
package org.qchain.exact.reference;
