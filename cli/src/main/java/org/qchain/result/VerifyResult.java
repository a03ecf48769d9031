package org.qchain.result;

import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import org.qchain.exact.reference.Target;
import org.qchain.exact.reference.VerifyReport;

/**
 * The check of a file of floating-point results against the exact values ({@code verify}). The report's errors were
 * computed exactly; they are binary64 values only because an error is shown, never reused (issue 11: "only the
 * error is rounded for display"), and the exact values themselves are kept as {@code Rational}s.
 *
 * @param source   the model file name as the user gave it
 * @param against  the checked file's name as the user gave it
 * @param what     the quantity ({@code matrix}, {@code row}, {@code entry}, ...)
 * @param n        the number of steps, for powers
 * @param from     the starting state of a row or an entry
 * @param to       the final state of an entry
 * @param target   the shape checked, with its state names
 * @param report   counts, the worst entries and the tolerance
 * @param warnings warnings for the user
 * @param t        the time, for P(t) of a continuous chain
 */
public record VerifyResult(String source, String against, String what, OptionalLong n, Optional<String> from,
                           Optional<String> to, Target target, VerifyReport report, List<String> warnings,
                           Optional<org.qchain.exact.Rational> t)
    implements Result {
    /** Copies the warnings. */
    public VerifyResult {
        warnings = List.copyOf(warnings);
    }

    /** A result without a time (P^n or a long-run figure). */
    public VerifyResult(String source, String against, String what, OptionalLong n, Optional<String> from,
                        Optional<String> to, Target target, VerifyReport report, List<String> warnings) {
        this(source, against, what, n, from, to, target, report, warnings, Optional.empty());
    }

    /** Whether every value checked meets the tolerance. */
    public boolean passed() {
        return report.passed();
    }
}
