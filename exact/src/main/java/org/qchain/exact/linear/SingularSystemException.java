package org.qchain.exact.linear;

import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;

/**
 * A linear system whose matrix is singular. Carries the index of the first unknown (column) for which elimination
 * found no pivot, so callers can name the state behind it.
 */
public final class SingularSystemException extends QchainException {
    private static final long serialVersionUID = 1L;

    private final int index;

    SingularSystemException(int index, String detail) {
        super(ErrorKey.SINGULAR_SYSTEM, detail);
        this.index = index;
    }

    /** The 0-based index of the unknown for which no pivot was found. */
    public int index() {
        return index;
    }
}
