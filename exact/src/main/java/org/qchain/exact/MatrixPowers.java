package org.qchain.exact;

/**
 * Exact powers of rational matrices. (Skeleton: the engine is being written; see the foundation issue.)
 */
public final class MatrixPowers {
    private MatrixPowers() {
    }
}
