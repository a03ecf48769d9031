package org.qchain.exact.model;

import org.qchain.exact.SourcePos;

/**
 * One {@code FROM TO EXPRESSION} line of a model file.
 *
 * @param from index of the source state
 * @param to   index of the target state
 * @param expr the probability (discrete) or rate (continuous)
 * @param pos  where the line starts (the FROM name)
 */
public record Transition(int from, int to, Expr expr, SourcePos pos) {
}
