package org.qchain.analysis;

/**
 * A model's one-step matrix after validation.
 *
 * @param symbolic keep the parameters symbolic (formulas, identities and range conditions) even where every
 *                 parameter has a value
 */
public record CheckQuery(boolean symbolic) implements Query {
}
