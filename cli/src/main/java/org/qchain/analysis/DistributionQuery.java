package org.qchain.analysis;

import java.util.List;
import org.qchain.exact.SizeEstimate;

/**
 * Where the chain is after n steps from a start (one state or a distribution): the whole distribution
 * {@code start · P^n}, or the probability of a set of states (the sum of their entries), for one n or a series of n
 * laid out as one table.
 *
 * @param ns        the step counts, each {@code >= 0}, strictly increasing, at least one
 * @param series    whether the step counts were asked as a list or a range (one table over n), even of one value
 * @param start     the start
 * @param to        the states whose total probability is asked for; empty for the whole distribution
 * @param maxDigits refuse a result whose whole series is estimated to have more digits in total
 * @param factor    formulas (a parameter without a value, one n): factored
 * @param maxTerms  formulas: refuse powers estimated to need more polynomial terms
 */
public record DistributionQuery(List<Long> ns, boolean series, Start start, List<String> to, long maxDigits,
                                boolean factor, long maxTerms) implements Query {
    /**
     * Copies the lists and checks them.
     *
     * @throws IllegalArgumentException for no step count, a negative one or one out of order, a state twice in
     *                                  {@code to}
     */
    public DistributionQuery {
        ns = List.copyOf(ns);
        to = List.copyOf(to);
        if (ns.isEmpty()) {
            throw new IllegalArgumentException("need at least one step count");
        }
        for (int k = 0; k < ns.size(); k++) {
            if (ns.get(k) < 0 || k > 0 && ns.get(k) <= ns.get(k - 1)) {
                throw new IllegalArgumentException("step counts must be 0 or more and increasing: " + ns);
            }
        }
        if (to.stream().distinct().count() != to.size()) {
            throw new IllegalArgumentException("a state twice in the set: " + to);
        }
    }

    /**
     * A query with expanded formulas and the default term limit.
     *
     * @param ns        the step counts
     * @param series    whether they were asked as a list or range
     * @param start     the start
     * @param to        the states whose total probability is asked for
     * @param maxDigits the digit limit
     */
    public DistributionQuery(List<Long> ns, boolean series, Start start, List<String> to, long maxDigits) {
        this(ns, series, start, to, maxDigits, false, StepQuery.DEFAULT_MAX_TERMS);
    }

    /** The distribution after {@code n} steps from {@code start}, with the default limit. */
    public static DistributionQuery of(long n, Start start) {
        return new DistributionQuery(List.of(n), false, start, List.of(), SizeEstimate.DEFAULT_MAX_DIGITS);
    }
}
