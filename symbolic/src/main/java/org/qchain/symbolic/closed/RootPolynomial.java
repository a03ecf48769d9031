package org.qchain.symbolic.closed;

import java.util.List;
import org.qchain.exact.certified.CertifiedComplex;

/**
 * A factor of the characteristic polynomial of degree 3 or more, named in formulas ({@code rootsum(k, f1)} is the
 * sum of r^k over its roots r), with its roots numerically at a parameter point.
 *
 * @param name       the name used in formulas, {@code f1}, {@code f2}, ...
 * @param polynomial the monic factor in x, plain syntax (with the parameters symbolic)
 * @param latex      the same in LaTeX
 * @param roots      its roots at the point, each once, as certified numbers (real ones first, by value; then
 *                   complex ones by real part, positive imaginary part first)
 */
public record RootPolynomial(String name, String polynomial, String latex, List<CertifiedComplex> roots) {
    /** Copies the list. */
    public RootPolynomial {
        roots = List.copyOf(roots);
    }
}
