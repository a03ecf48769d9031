package org.qchain.symbolic.closed;

import java.util.List;

/**
 * A factor of the characteristic polynomial of degree 3 or more, named in formulas ({@code rootsum(k, f1)} is the
 * sum of r^k over its roots r), with its roots numerically at a parameter point.
 *
 * @param name       the name used in formulas, {@code f1}, {@code f2}, ...
 * @param polynomial the monic factor in x, plain syntax (with the parameters symbolic)
 * @param latex      the same in LaTeX
 * @param roots      its roots at the point, to the requested significant digits: real ones as {@code 0.25},
 *                   complex ones as {@code 0.1 + 0.2*i}
 */
public record RootPolynomial(String name, String polynomial, String latex, List<String> roots) {
    /** Copies the list. */
    public RootPolynomial {
        roots = List.copyOf(roots);
    }
}
