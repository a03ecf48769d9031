package org.qchain.exact.model;

import java.util.LinkedHashSet;
import java.util.Set;
import java.util.function.Function;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * A small expression tree as written in a model file: rational constants, parameter names, {@code + - * /},
 * unary minus, and integer powers. Every node keeps the position of its text, so errors found later (division by
 * zero, a value out of range) can point at it.
 *
 * <p>The tree belongs to {@code exact} so that the exact engine can evaluate it with rational values and the symbolic
 * module can map it into its own ring; neither needs the other's types.
 */
public sealed interface Expr {

    /** Largest numerator or denominator, in bits, that evaluating one power may produce (about 10 million digits). */
    long MAX_POWER_BITS = 1L << 25;

    /** log10(2), to turn bits into decimal digits. */
    double LOG10_2 = 0.30102999566398120;

    /** Where the text of this node starts; may be {@code null} for nodes built in code. */
    SourcePos pos();

    /** A rational constant. */
    record Num(Rational value, SourcePos pos) implements Expr {
    }

    /** A parameter name. */
    record Var(String name, SourcePos pos) implements Expr {
    }

    /** Unary minus. */
    record Neg(Expr operand, SourcePos pos) implements Expr {
    }

    /** The binary operators. */
    enum Op {
        /** Addition. */ ADD("+"),
        /** Subtraction. */ SUB("-"),
        /** Multiplication. */ MUL("*"),
        /** Division. */ DIV("/");

        private final String symbol;

        Op(String symbol) {
            this.symbol = symbol;
        }

        /** The operator as written. */
        public String symbol() {
            return symbol;
        }
    }

    /** A binary operation; {@code pos} is the operator's position. */
    record Bin(Op op, Expr left, Expr right, SourcePos pos) implements Expr {
    }

    /** {@code base ^ exponent} with an integer exponent (possibly negative). */
    record Pow(Expr base, int exponent, SourcePos pos) implements Expr {
    }

    /** A constant node without position. */
    static Expr num(Rational r) {
        return new Num(r, null);
    }

    /** {@code a - b} without position. */
    static Expr sub(Expr a, Expr b) {
        return new Bin(Op.SUB, a, b, null);
    }

    /** {@code a + b} without position. */
    static Expr add(Expr a, Expr b) {
        return new Bin(Op.ADD, a, b, null);
    }

    /**
     * Evaluates with rational values for the parameters.
     *
     * @param values the value of each parameter name; it may throw, or return {@code null}, for a name it does not
     *               know
     * @return the exact value
     * @throws QchainException with {@link ErrorKey#DIVISION_BY_ZERO} at the division's position, or
     *                         {@link ErrorKey#FREE_PARAMETERS} at a name whose value is {@code null}
     */
    default Rational evaluate(Function<String, Rational> values) {
        return fold(new RationalFolder(values));
    }

    /**
     * A bottom-up fold over a tree: each method receives its node (for the node's position in error messages) and
     * the already folded operands. {@link #evaluate}, the symbolic module and the formatters map trees into their own
     * values with it, without instanceof chains of their own.
     *
     * @param <T> the result type
     */
    interface Folder<T> {
        /** A constant. */
        T num(Num node);

        /** A parameter name. */
        T var(Var node);

        /** Unary minus of the folded operand. */
        T neg(Neg node, T operand);

        /** A binary operation on the folded operands. */
        T bin(Bin node, T left, T right);

        /** The folded base to the node's integer power (possibly negative). */
        T pow(Pow node, T base);
    }

    /**
     * Folds this tree bottom-up, left operand before right, in linear time and without recursion (a tree of any
     * depth folds).
     *
     * @param f   what each kind of node becomes
     * @param <T> the result type
     * @return the folded value of the root
     */
    default <T> T fold(Folder<T> f) {
        return Folding.fold(this, f);
    }

    /** The parameter names used, in order of first appearance. */
    default Set<String> variables() {
        Set<String> out = new LinkedHashSet<>();
        for (Var v : Folding.varNodes(this)) {
            out.add(v.name());
        }
        return out;
    }

    /** Plain syntax that the model parser reads back to an equal value, with minimal parentheses. */
    static String toPlain(Expr e) {
        return ExprPrinter.print(e);
    }
}
