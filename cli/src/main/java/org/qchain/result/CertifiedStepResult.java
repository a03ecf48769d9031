package org.qchain.result;

import java.math.RoundingMode;
import java.util.List;
import java.util.Optional;
import org.qchain.exact.Decimals;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;

/**
 * Certified n-step transition probabilities ({@code step --certified}): correctly rounded decimals whose every
 * digit is proven by an enclosure of the exact value, without the exact fraction. The whole matrix (no
 * {@code from}), one row ({@code from}) or one entry ({@code from} and {@code to}).
 *
 * <p>Unlike the exact results, the values are decimals already: the certification proves the digits of one
 * rounding, so the digits are part of the result ({@link CertifiedDecimal} keeps the enclosure that proved them).
 *
 * @param header  the common part (source, kind, n, warnings)
 * @param from    the starting state of a row or entry
 * @param to      the final state of an entry
 * @param rows    the row states: every state for the matrix, {@code from} otherwise
 * @param columns the column states: every state for a matrix or row, {@code to} for an entry
 * @param values  {@code values.get(i).get(j)} for row {@code rows.get(i)}, column {@code columns.get(j)}
 * @param digits  the significant digits proven
 */
public record CertifiedStepResult(StepResult.Header header, Optional<String> from, Optional<String> to,
                                  List<String> rows, List<String> columns, List<List<CertifiedDecimal>> values,
                                  int digits) implements Result {
    /** Copies the lists. */
    public CertifiedStepResult {
        rows = List.copyOf(rows);
        columns = List.copyOf(columns);
        values = values.stream().map(List::copyOf).toList();
    }

    @Override
    public String source() {
        return header.source();
    }

    @Override
    public List<String> warnings() {
        return header.warnings();
    }

    /** The widest enclosure of all the values (zero when every value is exact). */
    public Rational maxWidth() {
        Rational w = Rational.ZERO;
        for (List<CertifiedDecimal> row : values) {
            for (CertifiedDecimal d : row) {
                w = w.max(d.enclosure().width());
            }
        }
        return w;
    }

    /** Whether some value could not be certified (its text is an interval). */
    public boolean anyUnresolved() {
        return values.stream().flatMap(List::stream).anyMatch(d -> !d.isProven());
    }

    /**
     * An enclosure width for display: rounded up to two significant digits, so it stays an upper bound; {@code 0}
     * for an exact value.
     *
     * @param width a width
     * @return its text
     */
    public static String widthText(Rational width) {
        return Decimals.format(width, 2, RoundingMode.CEILING);
    }

    /**
     * The word for a value's status: {@code certified}, {@code exact} or {@code not resolved}.
     *
     * @param d a value
     * @return the word
     */
    public static String statusWord(CertifiedDecimal d) {
        switch (d.status()) {
            case CERTIFIED:
                return "certified";
            case EXACT:
                return "exact";
            default:
                return "not resolved";
        }
    }
}
