package org.qchain.symbolic.closed;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The names the closed form of a continuous chain's P(t) = exp(Qt) uses for its own quantities, none of them a
 * parameter's name: the time ({@code t}, else {@code tau}, {@code T}, {@code time}), the variable of the Laplace
 * transform ({@code s}, else {@code p}, {@code S}, {@code sigma}), and the symbols shared with the discrete closed
 * forms (characteristic-polynomial variable, factor and eigenvalue names, the name of a square root), chosen after
 * these two, so a square root is never called {@code s} beside the transform's {@code s}.
 *
 * @param time      the time in P(t), normally {@code t}
 * @param transform the variable of the Laplace transform {@code (sI - Q)^-1}, normally {@code s}
 * @param others    the remaining symbols ({@link Symbols#variable()}, {@link Symbols#factorPrefix()},
 *                  {@link Symbols#root()}, {@link Symbols#eigenPrefix()}); its step and series symbols are unused
 */
public record TimeSymbols(String time, String transform, Symbols others) {
    /** The symbols when no parameter is in the way. */
    public static final TimeSymbols DEFAULT = avoiding(List.of());

    /**
     * Symbols that differ from every given name and from each other.
     *
     * @param names the parameter names
     * @return the symbols
     */
    public static TimeSymbols avoiding(Collection<String> names) {
        Set<String> taken = new HashSet<>(names);
        taken.addAll(Symbols.FUNCTIONS);
        String time = pick(taken, "t", "tau", "T", "time");
        String transform = pick(taken, "s", "p", "S", "sigma");
        List<String> all = new ArrayList<>(names);
        all.add(time);
        all.add(transform);
        return new TimeSymbols(time, transform, Symbols.avoiding(all));
    }

    private static String pick(Set<String> taken, String... candidates) {
        for (String c : candidates) {
            if (taken.add(c)) {
                return c;
            }
        }
        for (int k = 1; ; k++) {
            String c = candidates[0] + "_" + k;
            if (taken.add(c)) {
                return c;
            }
        }
    }
}
