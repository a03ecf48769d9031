package org.qchain.cli.format;

/** The safety caution that every help text and every report carries. */
public final class Caution {
    /** One sentence, no line break. */
    public static final String TEXT = "Caution: results are only as good as the model; safety-critical use follows"
        + " the applicable standards, local codes and licensed engineering review.";

    private Caution() {
    }
}
