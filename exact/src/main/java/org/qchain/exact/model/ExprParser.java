package org.qchain.exact.model;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;
import org.qchain.exact.model.Lexer.Kind;
import org.qchain.exact.model.Lexer.Token;

/**
 * Recursive-descent parser of one expression over a token list.
 *
 * <pre>
 * expr     := term (('+' | '-') term)*
 * term     := unary (('*' | '/') unary)*
 * unary    := ('-' | '+')* power
 * power    := atom ('^' exponent)?
 * exponent := ['-' | '+'] INTEGER | '(' ['-' | '+'] INTEGER ')'
 * atom     := NUMBER | NAME | '(' expr ')'
 * </pre>
 *
 * As in mathematics, {@code -p^2} is {@code -(p^2)}; {@code a^2^3} is refused (write {@code (a^2)^3}). A constant
 * such as {@code 1/20} or {@code -3/4} at the start of a term becomes one constant node. Sums, products and signs
 * are loops; only parentheses recurse, at most {@link #MAX_NESTING} deep.
 */
final class ExprParser {
    /** Largest exponent magnitude accepted in {@code x^k}. */
    static final int MAX_EXPONENT = 1_000_000;

    /**
     * Deepest nesting of parentheses. Each level costs five frames of the recursive descent, about 1.1 KB of stack
     * before the JIT compiles them (measured: 400 levels fit a 512 KB thread stack, 900 the default 1 MB); 200 stays
     * at half of that on a 512 KB stack (a test parses them there), and no hand-written model comes near.
     */
    static final int MAX_NESTING = 200;

    private final List<Token> toks;
    private int i;
    private int depth;

    ExprParser(List<Token> toks, int start) {
        this.toks = toks;
        this.i = start;
    }

    /** The index of the next unread token. */
    int position() {
        return i;
    }

    Token peek() {
        return toks.get(i);
    }

    /** The token {@code k} places after the next one (END past the end). */
    Token peekAhead(int k) {
        return toks.get(Math.min(i + k, toks.size() - 1));
    }

    Token next() {
        Token t = toks.get(i);
        if (t.kind() != Kind.END) {
            i++;
        }
        return t;
    }

    /** Parses one expression and requires that nothing follows it. */
    Expr parseAll() {
        if (peek().kind() == Kind.END) {
            throw new QchainException(peek().pos(), ErrorKey.SYNTAX, "missing expression");
        }
        Expr e = parseExpr();
        expectEnd("the expression");
        return e;
    }

    /** Fails with UNEXPECTED_TEXT unless the next token is the end of the line. */
    void expectEnd(String after) {
        Token t = peek();
        if (t.kind() == Kind.END) {
            return;
        }
        String hint = "";
        if (!after.equals("the expression")) {
            hint = "";
        } else if (t.kind() == Kind.NAME || t.kind() == Kind.NUMBER || t.is("(")) {
            hint = " (write '*' for a product)";
        } else if (t.is(")")) {
            hint = " (no '(' to match it)";
        }
        throw new QchainException(t.pos(), ErrorKey.UNEXPECTED_TEXT, t.text(), after + hint);
    }

    Expr parseExpr() {
        Expr left = term();
        while (peek().is("+") || peek().is("-")) {
            Token op = next();
            Expr right = term();
            left = new Expr.Bin(op.is("+") ? Expr.Op.ADD : Expr.Op.SUB, left, right, op.pos());
        }
        return left;
    }

    private Expr term() {
        Expr left = foldedConstant();
        if (left == null) {
            left = unary();
        }
        while (peek().is("*") || peek().is("/")) {
            Token op = next();
            Expr right = unary();
            left = new Expr.Bin(op.is("*") ? Expr.Op.MUL : Expr.Op.DIV, left, right, op.pos());
        }
        return left;
    }

    /**
     * A constant written at the start of a term, as one node: {@code INT / INT} or {@code - INT / INT} (divisor not
     * zero, not followed by {@code ^}), or {@code - NUMBER} (not followed by {@code ^}); else {@code null}. Folding
     * only at a term's start keeps the value: {@code 2 / 1/2} is still {@code (2 / 1) / 2}.
     */
    private Expr foldedConstant() {
        int k = i;
        boolean minus = toks.get(k).is("-");
        if (minus) {
            k++;
        }
        Token a = toks.get(k);
        if (a.kind() != Kind.NUMBER) {
            return null;
        }
        Token slash = toks.get(Math.min(k + 1, toks.size() - 1));
        if (a.isIntegerLiteral() && slash.is("/") && k + 3 < toks.size()) {
            Token b = toks.get(k + 2);
            if (b.isIntegerLiteral() && !b.value().isZero() && !toks.get(k + 3).is("^")) {
                Rational v = a.value().divide(b.value());
                SourcePos at = toks.get(i).pos();
                i = k + 3;
                return new Expr.Num(minus ? v.negate() : v, at);
            }
        }
        if (minus && !slash.is("^") && !a.value().isZero()) {
            SourcePos at = toks.get(i).pos();
            i = k + 1;
            return new Expr.Num(a.value().negate(), at);
        }
        return null;
    }

    /** Signs before a power: a loop, not a recursion, so a run of 100,000 minus signs parses. */
    private Expr unary() {
        List<Token> minus = new ArrayList<>();
        while (peek().is("-") || peek().is("+")) {
            Token op = next();
            if (op.is("-")) {
                minus.add(op);
            }
        }
        Expr e = power();
        for (int k = minus.size() - 1; k >= 0; k--) {
            e = new Expr.Neg(e, minus.get(k).pos());
        }
        return e;
    }

    private Expr power() {
        Expr base = atom();
        if (!peek().is("^")) {
            return base;
        }
        Token caret = next();
        int k = exponent();
        if (peek().is("^")) {
            throw new QchainException(peek().pos(), ErrorKey.SYNTAX,
                "chained powers need parentheses: write (a^m)^k");
        }
        return new Expr.Pow(base, k, caret.pos());
    }

    private int exponent() {
        boolean paren = peek().is("(");
        if (paren) {
            next();
        }
        boolean negative = false;
        if (peek().is("-") || peek().is("+")) {
            negative = next().is("-");
        }
        Token t = next();
        if (!t.isIntegerLiteral()) {
            throw new QchainException(t.pos(), ErrorKey.SYNTAX,
                "the exponent must be an integer, e.g. p^2 or p^(-1); found " + t.describe());
        }
        BigInteger v = new BigInteger(t.text());
        if (v.compareTo(BigInteger.valueOf(MAX_EXPONENT)) > 0) {
            throw new QchainException(t.pos(), ErrorKey.SYNTAX,
                "the exponent " + t.text() + " is larger than " + MAX_EXPONENT);
        }
        if (paren) {
            Token close = next();
            if (!close.is(")")) {
                throw new QchainException(close.pos(), ErrorKey.SYNTAX,
                    "expected ')' after the exponent, found " + close.describe());
            }
        }
        return negative ? -v.intValue() : v.intValue();
    }

    private Expr atom() {
        Token t = next();
        if (t.kind() == Kind.NUMBER) {
            return new Expr.Num(t.value(), t.pos());
        }
        if (t.kind() == Kind.NAME) {
            if (peek().is("(")) {
                throw new QchainException(t.pos(), ErrorKey.FUNCTION_NOT_SUPPORTED, t.text());
            }
            return new Expr.Var(t.text(), t.pos());
        }
        if (t.is("(")) {
            if (depth >= MAX_NESTING) {
                throw new QchainException(t.pos(), ErrorKey.NESTING_TOO_DEEP, MAX_NESTING);
            }
            depth++;
            Expr inner = parseExpr();
            depth--;
            Token close = next();
            if (!close.is(")")) {
                throw new QchainException(close.pos(), ErrorKey.SYNTAX, "expected ')' to close the '(' at column "
                    + t.pos().column() + ", found " + close.describe());
            }
            return inner;
        }
        boolean doubleStar = t.is("*") && i >= 2 && toks.get(i - 2).is("*");
        throw new QchainException(t.pos(), ErrorKey.SYNTAX,
            "expected a number, a parameter name or '(', found " + t.describe()
                + (doubleStar ? " (write ^ for a power)" : ""));
    }

    /**
     * Evaluates an expression that must not use parameters (a nominal value, a domain end).
     *
     * @param what what the constant is, for the message ("a nominal value")
     * @throws QchainException SYNTAX at the first parameter name; DIVISION_BY_ZERO
     */
    static Rational constant(Expr e, String what) {
        for (Expr.Var v : ModelParser.varNodes(e)) {
            throw new QchainException(v.pos(), ErrorKey.SYNTAX, what + " must be a constant; found the parameter '"
                + v.name() + "'");
        }
        return e.evaluate(name -> {
            throw new IllegalStateException(name);
        });
    }
}
