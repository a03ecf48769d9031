package org.qchain.analysis;

import java.util.List;

/**
 * The outcome of checking a model with its parameters symbolic (rows sum to 1 identically, entries in [0, 1] over the
 * parameter domains). An interface of our own, so that {@link LoadedModel} names no symbolic type and numeric runs
 * load no JAS or Symja class; the implementation lives in the symbolic engine.
 */
interface SymbolicValidation {

    /** The range conditions that may fail inside the domains, each located ({@code file:line:col: ...}). */
    List<String> warnings();
}
