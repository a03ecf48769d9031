package org.qchain.exact.reference;

import java.util.List;
import java.util.OptionalLong;

/**
 * The outcome of checking a file of given values against the exact ones.
 *
 * @param form                what the file was read as
 * @param tolerance           the tolerance applied
 * @param expected            how many values the target has
 * @param checked             how many values the file gave (all of them for a complete form; any subset of a keyed
 *                            form)
 * @param overTolerance       how many failed the tolerance (non-finite values included)
 * @param nonFinite           how many were {@code inf} or {@code nan}
 * @param correctlyRounded    how many were the correctly rounded double of the truth (0 ulp)
 * @param worstRelativeError  the largest {@code |relative error|} among the finite values, rounded; 0 if none
 * @param worstUlps           the largest ulp distance among the finite values; empty if there are none
 * @param worst               the worst entries, worst first ({@link EntryCheck#WORST_FIRST}), at most as many as
 *                            asked for
 */
public record VerifyReport(ReferenceReader.Form form, Tolerance tolerance, long expected, long checked,
                           long overTolerance, long nonFinite, long correctlyRounded, double worstRelativeError,
                           OptionalLong worstUlps, List<EntryCheck> worst) {
    /** Copies the list. */
    public VerifyReport {
        worst = List.copyOf(worst);
    }

    /** Whether every value checked meets the tolerance (and at least one was checked). */
    public boolean passed() {
        return overTolerance == 0 && checked > 0;
    }

    /** Whether every value checked is the correctly rounded double of its truth. */
    public boolean allCorrectlyRounded() {
        return checked > 0 && correctlyRounded == checked;
    }
}
