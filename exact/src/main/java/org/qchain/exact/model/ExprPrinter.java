package org.qchain.exact.model;

/** Prints {@link Expr} trees in the model file's syntax with minimal parentheses. */
final class ExprPrinter {
    private ExprPrinter() {
    }

    static String print(Expr e) {
        return print(e, 0);
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

    private static String print(Expr e, int ctx) {
        String s;
        if (e instanceof Expr.Num n) {
            s = n.value().toString();
        } else if (e instanceof Expr.Var v) {
            s = v.name();
        } else if (e instanceof Expr.Neg g) {
            s = "-" + print(g.operand(), 4);
        } else if (e instanceof Expr.Bin b) {
            int p = prec(b);
            // left-associative: the right operand of - and / needs brackets at equal precedence
            String l = print(b.left(), p);
            String r = print(b.right(), (b.op() == Expr.Op.SUB || b.op() == Expr.Op.DIV) ? p + 1 : p);
            if ((b.op() == Expr.Op.MUL || b.op() == Expr.Op.DIV) && b.right() instanceof Expr.Num n
                && (n.value().signum() < 0 || !n.value().isInteger()) && !r.startsWith("(")) {
                // "a * -1/2" would read back as (a * -1) / 2 and "a / -1/2" as (a / -1) / 2
                r = "(" + r + ")";
            }
            s = l + " " + b.op().symbol() + " " + r;
        } else {
            Expr.Pow p = (Expr.Pow) e;
            s = print(p.base(), 5) + "^" + (p.exponent() < 0 ? "(" + p.exponent() + ")" : String.valueOf(p.exponent()));
        }
        return prec(e) < ctx ? "(" + s + ")" : s;
    }
}
