package org.qchain.symbolic.closed;

import java.util.List;

/**
 * One irreducible factor of the characteristic polynomial {@code det(xI - P)} over Q(parameters) and the
 * eigenvalues it stands for.
 *
 * @param factor       the monic irreducible factor in x, plain syntax
 * @param factorLatex  the same in LaTeX
 * @param degree       its degree in x
 * @param multiplicity its multiplicity in the characteristic polynomial
 * @param jordanIndex  the size of the largest Jordan block of each of the factor's eigenvalues (1 = no block; the
 *                     same for every root of an irreducible factor)
 * @param kind         {@code rational} (one eigenvalue in Q(parameters)), {@code quadratic} (a conjugate pair with
 *                     a square root) or {@code roots} (the roots of the named factor)
 * @param values       the eigenvalues as formulas: one, two (with {@code sqrt}), or {@code "roots of NAME"}
 * @param name         the factor's name in formulas ({@code f1}, ...) for kind {@code roots}; empty otherwise
 * @param unitOrder    k if the eigenvalues are k-th roots of unity (they then drive periodicity), else 0
 * @param valuesLatex  the eigenvalues in LaTeX, as {@code values}
 * @param valueNames   the names of the eigenvalues in {@link ClosedForm#namedFormula} ({@code l1}, {@code l2}) for
 *                     a quadratic factor; empty otherwise
 */
public record Eigenvalue(String factor, String factorLatex, int degree, int multiplicity, int jordanIndex,
                         String kind, List<String> values, String name, int unitOrder, List<String> valuesLatex,
                         List<String> valueNames) {
    /** Copies the lists. */
    public Eigenvalue {
        values = List.copyOf(values);
        valuesLatex = List.copyOf(valuesLatex);
        valueNames = List.copyOf(valueNames);
    }
}
