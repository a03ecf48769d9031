package org.qchain.exact.model;

import org.qchain.exact.SourcePos;

/**
 * One {@code FROM TO EXPRESSION} line of a model file (or one non-zero cell of a CSV matrix).
 *
 * @param from    index of the source state
 * @param to      index of the target state
 * @param expr    the probability (discrete) or rate (continuous)
 * @param pos     where the line starts (the FROM name; for CSV, the cell)
 * @param exprPos where the expression's text starts (errors about its value point here)
 */
public record Transition(int from, int to, Expr expr, SourcePos pos, SourcePos exprPos) {

    /**
     * A transition whose expression position is the expression's own position.
     *
     * @param from index of the source state
     * @param to   index of the target state
     * @param expr the probability or rate
     * @param pos  where the line starts
     */
    public Transition(int from, int to, Expr expr, SourcePos pos) {
        this(from, to, expr, pos, expr.pos() != null ? expr.pos() : pos);
    }
}
