package org.qchain.exact.model;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;

/**
 * The walk behind {@link Expr#fold}: post-order with an explicit stack, so a tree of any depth (a flat sum of
 * 100,000 terms is a left-deep tree that deep, as is a run of unary minus signs) folds in linear time and constant
 * call-stack depth. Operands are folded left before right and a node after its operands, exactly as the recursive
 * definition would, so errors surface at the same node.
 */
final class Folding {
    /** A node whose operands are folded and which now combines them. */
    private record Combine(Expr node) {
    }

    private Folding() {
    }

    static <T> T fold(Expr root, Expr.Folder<T> f) {
        ArrayDeque<Object> work = new ArrayDeque<>();
        List<T> values = new ArrayList<>();
        work.push(root);
        while (!work.isEmpty()) {
            Object w = work.pop();
            if (w instanceof Combine c) {
                Expr e = c.node();
                if (e instanceof Expr.Bin b) {
                    T r = values.remove(values.size() - 1);
                    T l = values.remove(values.size() - 1);
                    values.add(f.bin(b, l, r));
                } else if (e instanceof Expr.Neg g) {
                    values.add(f.neg(g, values.remove(values.size() - 1)));
                } else {
                    values.add(f.pow((Expr.Pow) e, values.remove(values.size() - 1)));
                }
            } else if (w instanceof Expr.Num n) {
                values.add(f.num(n));
            } else if (w instanceof Expr.Var v) {
                values.add(f.var(v));
            } else {
                work.push(new Combine((Expr) w));
                if (w instanceof Expr.Bin b) {
                    work.push(b.right());
                    work.push(b.left());
                } else if (w instanceof Expr.Neg g) {
                    work.push(g.operand());
                } else {
                    work.push(((Expr.Pow) w).base());
                }
            }
        }
        return values.get(0);
    }

    /** The parameter-name nodes of a tree, left to right. */
    static List<Expr.Var> varNodes(Expr e) {
        List<Expr.Var> out = new ArrayList<>();
        fold(e, new Expr.Folder<Void>() {
            @Override
            public Void num(Expr.Num node) {
                return null;
            }

            @Override
            public Void var(Expr.Var node) {
                out.add(node);
                return null;
            }

            @Override
            public Void neg(Expr.Neg node, Void operand) {
                return null;
            }

            @Override
            public Void bin(Expr.Bin node, Void left, Void right) {
                return null;
            }

            @Override
            public Void pow(Expr.Pow node, Void base) {
                return null;
            }
        });
        return out;
    }
}
