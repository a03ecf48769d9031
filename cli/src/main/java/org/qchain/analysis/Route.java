package org.qchain.analysis;

/** How a query is computed on a model. */
public enum Route {
    /** With exact rational numbers at the parameter point (the exact module only). */
    NUMERIC,
    /** With the parameters kept as symbols (the symbolic module: JAS arithmetic, Symja for printing). */
    SYMBOLIC
}
