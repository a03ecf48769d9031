package org.qchain.symbolic.check;

import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * One result of {@link ParameterCheck}: an entry whose formula can leave [0, 1] inside the parameter domains, or a
 * row that does not sum to 1 identically.
 *
 * @param severity  error (the nominal values break the condition, or a row sum) or warning
 * @param key       {@link ErrorKey#SYMBOLIC_RANGE} or {@link ErrorKey#SYMBOLIC_ROW_SUM}
 * @param from      row index
 * @param to        column index (the last listed column for a row sum)
 * @param entry     the entry's label, {@code From->To}
 * @param formula   the entry's formula (or the row sum) in plain syntax
 * @param condition what the parameters must satisfy, e.g. {@code p + r <= 1}; empty for a row sum
 * @param decided   true if it is proven that the entry leaves [0, 1] somewhere in the domain (a witness is known);
 *                  false if the check could neither prove nor refute it
 * @param witness   a point of the (closed) domain where the condition fails, if one was found
 * @param pos       the line of the transition in the model file, if known
 * @param detail    the explanation after the condition (where it fails, nominal values); empty for a row sum
 * @param message   the full one-line message (without position)
 */
public record Finding(Severity severity, ErrorKey key, int from, int to, String entry, String formula, String condition,
                      boolean decided, Optional<Map<String, Rational>> witness, Optional<SourcePos> pos,
                      String detail, String message) {
    /** How serious a finding is. */
    public enum Severity {
        /** The model is usable under the stated condition. */
        WARNING,
        /** The model is wrong at its nominal values (or a row does not sum to 1). */
        ERROR
    }

    /** The message with the position prefix {@code file:line:col: } when the position is known. */
    public String located() {
        return pos.map(p -> p + ": ").orElse("") + message;
    }
}
