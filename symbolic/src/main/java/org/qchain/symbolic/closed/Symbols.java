package org.qchain.symbolic.closed;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The names a closed form uses for its own quantities, chosen so that none is also the name of a parameter: a
 * formula printed with them reads back (with numbers put in for the step count) to the right value whatever the
 * parameters are called. The usual letters come first ({@code n}, {@code x}, {@code z}, {@code u}, {@code f},
 * {@code s}); a parameter of the same name moves the symbol to the next candidate.
 *
 * @param step         the step count in {@code P^n} and every formula, normally {@code n}
 * @param period       the index of the subsequences {@code P^(d m + r)} of a periodic chain, normally {@code m}
 * @param variable     the variable of the characteristic polynomial {@code det(xI - P)}, normally {@code x}
 * @param series       the variable of the generating functions, normally {@code z}
 * @param sequence     the sequence name in recurrences {@code u(n) = ...}, normally {@code u}
 * @param factorPrefix the prefix of named polynomial factors ({@code f1}, {@code f2}, ...), normally {@code f}
 * @param root         the name of a shared square root ({@code where s = sqrt(...)}), normally {@code s}
 */
public record Symbols(String step, String period, String variable, String series, String sequence,
                      String factorPrefix, String root, String eigenPrefix) {
    /** The names of the functions formulas call (discrete and continuous), never a symbol. */
    static final List<String> FUNCTIONS = List.of("sqrt", "binomial", "rootsum", "abs", "max", "maxabsroot", "exp",
        "rootsumexp", "re", "maxre");

    /** The symbols when no parameter is in the way. */
    public static final Symbols DEFAULT = avoiding(List.of());

    /**
     * Symbols that differ from every given name and from each other.
     *
     * @param names the parameter names (and any other names in use)
     * @return the symbols
     */
    public static Symbols avoiding(Collection<String> names) {
        Set<String> taken = new HashSet<>(names);
        // names of functions the formulas call are taken as well
        taken.addAll(FUNCTIONS);
        String step = pick(taken, "n", "k", "t", "N", "steps");
        String period = pick(taken, "m", "j", "M", "q", "cycles");
        String variable = pick(taken, "x", "y", "w", "X", "lambda");
        String series = pick(taken, "z", "w", "v", "Z", "zeta");
        String sequence = pick(taken, "u", "v", "w", "U", "seq");
        String root = pick(taken, "s", "R", "S", "sr", "sroot");
        String factor = "f";
        for (String c : List.of("f", "g", "h", "F", "poly")) {
            if (!clashesWithFactor(names, c)) {
                factor = c;
                break;
            }
            factor = null;
        }
        if (factor == null) {
            factor = pick(taken, "fac");
        }
        String eigen = null;
        for (String c : List.of("l", "L", "ev", "eig")) {
            if (!clashesWithFactor(names, c) && !c.equals(factor)) {
                eigen = c;
                break;
            }
        }
        if (eigen == null) {
            eigen = pick(taken, "eigen");
        }
        return new Symbols(step, period, variable, series, sequence, factor, root, eigen);
    }

    /** The name of the k-th named factor (from 1). */
    /** The k-th named eigenvalue, {@code l1}, {@code l2}, ... (printed λ1, λ2 where the output allows). */
    public String eigenvalue(int k) {
        return eigenPrefix + k;
    }

    public String factor(int k) {
        return factorPrefix + k;
    }

    /** Every symbol in use, as shown to readers. */
    public List<String> all() {
        return List.of(step, period, variable, series, sequence, factorPrefix + "1", root, eigenPrefix + "1");
    }

    private static boolean clashesWithFactor(Collection<String> names, String prefix) {
        for (String n : names) {
            if (n.startsWith(prefix) && n.length() > prefix.length() && n.substring(prefix.length()).chars().allMatch(Character::isDigit)) {
                return true;
            }
        }
        return false;
    }

    /** The first candidate not taken, marked as taken; with all taken, the first one with the least free suffix. */
    private static String pick(Set<String> taken, String... candidates) {
        for (String c : candidates) {
            if (taken.add(c)) {
                return c;
            }
        }
        List<String> tried = new ArrayList<>(List.of(candidates));
        for (int k = 1; ; k++) {
            String c = tried.get(0) + "_" + k;
            if (taken.add(c)) {
                return c;
            }
        }
    }
}
