package org.qchain.exact.model;

import java.util.ArrayDeque;

/**
 * Prints {@link Expr} trees in the model file's syntax with minimal parentheses. The walk keeps its own stack of
 * pieces still to write, so a tree of any depth prints in time linear in the output.
 */
final class ExprPrinter {
    /** A subtree to write in a context of the given precedence. */
    private record Pending(Expr node, int ctx) {
    }

    private ExprPrinter() {
    }

    static String print(Expr e) {
        StringBuilder out = new StringBuilder();
        ArrayDeque<Object> work = new ArrayDeque<>();
        work.push(new Pending(e, 0));
        while (!work.isEmpty()) {
            Object w = work.pop();
            if (w instanceof String s) {
                out.append(s);
            } else {
                expand((Pending) w, work, out);
            }
        }
        return out.toString();
    }

    // precedence: 1 additive, 2 multiplicative, 3 unary minus, 4 power, 5 atom
    private static int prec(Expr e) {
        if (e instanceof Expr.Num n) {
            return n.value().signum() < 0 ? 3 : (n.value().isInteger() ? 5 : 2);
        }
        if (e instanceof Expr.Var) {
            return 5;
        }
        if (e instanceof Expr.Neg) {
            return 3;
        }
        if (e instanceof Expr.Bin b) {
            return (b.op() == Expr.Op.ADD || b.op() == Expr.Op.SUB) ? 1 : 2;
        }
        return 4;
    }

    /** Writes leaves at once; pushes the pieces of an inner node in reverse order of writing. */
    private static void expand(Pending p, ArrayDeque<Object> work, StringBuilder out) {
        Expr e = p.node();
        boolean paren = prec(e) < p.ctx();
        if (e instanceof Expr.Num n) {
            out.append(paren ? "(" + n.value() + ")" : n.value().toString());
            return;
        }
        if (e instanceof Expr.Var v) {
            out.append(v.name());
            return;
        }
        if (paren) {
            out.append('(');
            work.push(")");
        }
        if (e instanceof Expr.Neg g) {
            // "--p" reads back as -(-p): no brackets for a run of signs, which would nest as deep as the run
            work.push(new Pending(g.operand(), g.operand() instanceof Expr.Neg ? 3 : 4));
            out.append('-');
        } else if (e instanceof Expr.Bin b) {
            int q = prec(b);
            // left-associative: the right operand of - and / needs brackets at equal precedence
            int right = (b.op() == Expr.Op.SUB || b.op() == Expr.Op.DIV) ? q + 1 : q;
            if ((b.op() == Expr.Op.MUL || b.op() == Expr.Op.DIV) && b.right() instanceof Expr.Num n
                && (n.value().signum() < 0 || !n.value().isInteger())) {
                // "a * -1/2" would read back as (a * -1) / 2 and "a / -1/2" as (a / -1) / 2: always bracket
                right = 6;
            }
            work.push(new Pending(b.right(), right));
            work.push(" " + b.op().symbol() + " ");
            work.push(new Pending(b.left(), q));
        } else {
            Expr.Pow w = (Expr.Pow) e;
            work.push("^" + (w.exponent() < 0 ? "(" + w.exponent() + ")" : String.valueOf(w.exponent())));
            work.push(new Pending(w.base(), 5));
        }
    }
}
