package org.qchain.cli.format;

import org.qchain.cli.result.StepResult;

/**
 * Lays out a result as text of one format. Formatters never compute: everything they print is in the result value.
 */
public interface Formatter {

    /**
     * The full text for stdout or an output file, ending with a line break.
     *
     * @param result what to print
     * @return the formatted text
     */
    default String format(StepResult result) {
        if (result instanceof StepResult.Matrix m) {
            return matrix(m);
        }
        if (result instanceof StepResult.Row r) {
            return row(r);
        }
        return single((StepResult.Single) result);
    }

    /** The full matrix. */
    String matrix(StepResult.Matrix m);

    /** One row. */
    String row(StepResult.Row r);

    /** One entry, with its paths if present. */
    String single(StepResult.Single s);
}
