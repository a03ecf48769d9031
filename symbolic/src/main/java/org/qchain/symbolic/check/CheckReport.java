package org.qchain.symbolic.check;

import java.util.List;
import org.qchain.exact.QchainException;

/**
 * The findings of {@link ParameterCheck} for one model, in row-major order of entries.
 *
 * @param findings all findings, errors and warnings
 */
public record CheckReport(List<Finding> findings) {
    /** Copies the list. */
    public CheckReport {
        findings = List.copyOf(findings);
    }

    /** The errors. */
    public List<Finding> errors() {
        return findings.stream().filter(f -> f.severity() == Finding.Severity.ERROR).toList();
    }

    /** The warnings. */
    public List<Finding> warnings() {
        return findings.stream().filter(f -> f.severity() == Finding.Severity.WARNING).toList();
    }

    /**
     * Throws the first error, if any.
     *
     * @throws QchainException with the finding's key, position and message
     */
    public void throwIfErrors() {
        for (Finding f : findings) {
            if (f.severity() == Finding.Severity.ERROR) {
                throw ParameterCheck.toException(f);
            }
        }
    }
}
