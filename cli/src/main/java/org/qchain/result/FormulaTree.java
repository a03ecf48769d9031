package org.qchain.result;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * A formula's plain text (the syntax of {@link Formula#plain()}: numbers, names, {@code + - * / ^}, parentheses,
 * function calls such as {@code sqrt(...)}, {@code abs(...)}, {@code max(..., ...)}, and one relation
 * {@code != <= >= < > =}) read back into a tree, which prints itself as MathML (presentation markup, W3C MathML 3)
 * and as LaTeX, and evaluates itself exactly at rational values. The report's HTML layout prints the result layer's
 * formulas through it; tests read formulas back through it.
 *
 * <p>Immutable. Reading is iterative in the operators of one level and recursive only in parentheses, whose depth is
 * bounded by {@link #MAX_DEPTH}.
 */
public final class FormulaTree {
    /** Deepest nesting of parentheses and calls read. */
    public static final int MAX_DEPTH = 200;

    private final Node root;

    private FormulaTree(Node root) {
        this.root = root;
    }

    /**
     * Reads plain formula text.
     *
     * @param plain the text
     * @return the tree
     * @throws IllegalArgumentException if the text is not in the plain syntax
     */
    public static FormulaTree parse(String plain) {
        Reader r = new Reader(plain);
        Node n = r.relation();
        r.skipSpace();
        if (r.pos != plain.length()) {
            throw new IllegalArgumentException("unexpected '" + plain.charAt(r.pos) + "' at " + r.pos + " in " + plain);
        }
        return new FormulaTree(n);
    }

    /** The formula as a MathML {@code <math>} element (inline). */
    public String mathml() {
        StringBuilder sb = new StringBuilder("<math xmlns=\"http://www.w3.org/1998/Math/MathML\">");
        mathml(root, sb);
        return sb.append("</math>").toString();
    }

    /** The formula as LaTeX math-mode text. */
    public String latex() {
        StringBuilder sb = new StringBuilder();
        latex(root, sb);
        return sb.toString();
    }

    /**
     * The exact value at the given values of the names.
     *
     * @param values a value for every name the formula uses
     * @return the value; empty where it is not rational (a square root of a non-square), a power has a non-integer
     *         or huge exponent, a division by zero, a name without a value, or for a relation
     */
    public Optional<Rational> evaluate(Map<String, Rational> values) {
        return eval(root, values);
    }

    // --- the tree -------------------------------------------------------------------------------------------------

    private sealed interface Node permits Num, Name, Neg, Bin, Call {
    }

    private record Num(String text) implements Node {
    }

    private record Name(String name) implements Node {
    }

    private record Neg(Node operand) implements Node {
    }

    private record Bin(String op, Node left, Node right) implements Node {
    }

    private record Call(String name, List<Node> args) implements Node {
    }

    private static int prec(Node n) {
        if (n instanceof Bin b) {
            return switch (b.op) {
                case "+", "-" -> 1;
                case "*", "/" -> 2;
                case "^" -> 4;
                default -> 0;
            };
        }
        if (n instanceof Neg) {
            return 3;
        }
        return 5;
    }

    private static final class Reader {
        private final String s;
        private int pos;
        private int depth;

        Reader(String s) {
            this.s = s;
        }

        void skipSpace() {
            while (pos < s.length() && s.charAt(pos) == ' ') {
                pos++;
            }
        }

        boolean eat(String t) {
            skipSpace();
            if (s.startsWith(t, pos)) {
                pos += t.length();
                return true;
            }
            return false;
        }

        IllegalArgumentException error(String what) {
            return new IllegalArgumentException(what + " at " + pos + " in " + s);
        }

        Node relation() {
            Node left = sum();
            for (String op : new String[] {"!=", "<=", ">=", "<", ">", "="}) {
                if (eat(op)) {
                    return new Bin(op, left, sum());
                }
            }
            return left;
        }

        Node sum() {
            Node left = product();
            while (true) {
                if (eat("+")) {
                    left = new Bin("+", left, product());
                } else if (peekMinus()) {
                    pos++;
                    left = new Bin("-", left, product());
                } else {
                    return left;
                }
            }
        }

        private boolean peekMinus() {
            skipSpace();
            return pos < s.length() && s.charAt(pos) == '-';
        }

        Node product() {
            Node left = unary();
            while (true) {
                if (eat("*")) {
                    left = new Bin("*", left, unary());
                } else if (eat("/")) {
                    left = new Bin("/", left, unary());
                } else {
                    return left;
                }
            }
        }

        Node unary() {
            if (peekMinus()) {
                pos++;
                return new Neg(unary());
            }
            Node base = atom();
            if (eat("^")) {
                // right-associative; the exponent may carry its own sign
                return new Bin("^", base, unary());
            }
            return base;
        }

        Node atom() {
            skipSpace();
            if (pos >= s.length()) {
                throw error("a number, a name or ( expected");
            }
            char c = s.charAt(pos);
            if (c == '(') {
                pos++;
                Node inner = nested();
                if (!eat(")")) {
                    throw error(") expected");
                }
                return inner;
            }
            int start = pos;
            if (Character.isDigit(c) || c == '.') {
                while (pos < s.length() && (Character.isDigit(s.charAt(pos)) || s.charAt(pos) == '.')) {
                    pos++;
                }
                return new Num(s.substring(start, pos));
            }
            if (Character.isLetter(c) || c == '_') {
                while (pos < s.length() && (Character.isLetterOrDigit(s.charAt(pos)) || s.charAt(pos) == '_'
                    || s.charAt(pos) == '\'')) {
                    pos++;
                }
                String name = s.substring(start, pos);
                if (pos < s.length() && s.charAt(pos) == '(') {
                    pos++;
                    List<Node> args = new ArrayList<>();
                    args.add(nested());
                    while (eat(",")) {
                        args.add(nested());
                    }
                    if (!eat(")")) {
                        throw error(") expected");
                    }
                    return new Call(name, List.copyOf(args));
                }
                return new Name(name);
            }
            throw error("unexpected '" + c + "'");
        }

        private Node nested() {
            if (++depth > MAX_DEPTH) {
                throw error("nested too deeply");
            }
            Node n = sum();
            depth--;
            return n;
        }
    }

    // --- MathML ---------------------------------------------------------------------------------------------------

    private static void mathml(Node n, StringBuilder sb) {
        if (n instanceof Num x) {
            sb.append("<mn>").append(x.text).append("</mn>");
        } else if (n instanceof Name x) {
            sb.append("<mi>").append(escape(x.name)).append("</mi>");
        } else if (n instanceof Neg x) {
            sb.append("<mrow><mo>&#x2212;</mo>");
            mathmlOperand(x.operand, prec(x.operand) <= 3 && !(x.operand instanceof Bin b && b.op.equals("/")), sb);
            sb.append("</mrow>");
        } else if (n instanceof Call c) {
            mathmlCall(c, sb);
        } else {
            Bin b = (Bin) n;
            switch (b.op) {
                case "/" -> {
                    sb.append("<mfrac><mrow>");
                    mathml(b.left, sb);
                    sb.append("</mrow><mrow>");
                    mathml(b.right, sb);
                    sb.append("</mrow></mfrac>");
                }
                case "^" -> {
                    sb.append("<msup><mrow>");
                    mathmlOperand(b.left, prec(b.left) <= 4, sb);
                    sb.append("</mrow><mrow>");
                    mathml(b.right, sb);
                    sb.append("</mrow></msup>");
                }
                case "*" -> {
                    sb.append("<mrow>");
                    mathmlOperand(b.left, prec(b.left) < 2, sb);
                    sb.append(numberFirst(b.right) ? "<mo>&#x22C5;</mo>" : "<mo>&#x2062;</mo>");
                    mathmlOperand(b.right, prec(b.right) <= 2 && !(b.right instanceof Bin r && r.op.equals("/")), sb);
                    sb.append("</mrow>");
                }
                case "+", "-" -> {
                    sb.append("<mrow>");
                    mathml(b.left, sb);
                    sb.append("<mo>").append(b.op.equals("-") ? "&#x2212;" : "+").append("</mo>");
                    mathmlOperand(b.right, b.op.equals("-") ? prec(b.right) <= 1 : prec(b.right) < 1, sb);
                    sb.append("</mrow>");
                }
                default -> {
                    sb.append("<mrow>");
                    mathml(b.left, sb);
                    sb.append("<mo>").append(relation(b.op, true)).append("</mo>");
                    mathml(b.right, sb);
                    sb.append("</mrow>");
                }
            }
        }
    }

    private static void mathmlOperand(Node n, boolean parens, StringBuilder sb) {
        if (parens) {
            sb.append("<mrow><mo>(</mo>");
            mathml(n, sb);
            sb.append("<mo>)</mo></mrow>");
        } else {
            mathml(n, sb);
        }
    }

    private static void mathmlCall(Call c, StringBuilder sb) {
        if (c.name.equals("sqrt") && c.args.size() == 1) {
            sb.append("<msqrt>");
            mathml(c.args.get(0), sb);
            sb.append("</msqrt>");
        } else if (c.name.equals("abs") && c.args.size() == 1) {
            sb.append("<mrow><mo>|</mo>");
            mathml(c.args.get(0), sb);
            sb.append("<mo>|</mo></mrow>");
        } else {
            sb.append("<mrow><mi>").append(escape(c.name)).append("</mi><mo>&#x2061;</mo><mrow><mo>(</mo>");
            for (int i = 0; i < c.args.size(); i++) {
                if (i > 0) {
                    sb.append("<mo>,</mo>");
                }
                mathml(c.args.get(i), sb);
            }
            sb.append("<mo>)</mo></mrow></mrow>");
        }
    }

    /** Whether the text of {@code n} starts with a digit (a product needs a visible dot before it). */
    private static boolean numberFirst(Node n) {
        Node x = n;
        while (true) {
            if (x instanceof Num) {
                return true;
            }
            if (x instanceof Bin b && !b.op.equals("/") && prec(b) > 2) {
                x = b.left;
            } else if (x instanceof Bin b && b.op.equals("*")) {
                x = b.left;
            } else {
                return false;
            }
        }
    }

    private static String relation(String op, boolean xml) {
        return switch (op) {
            case "!=" -> xml ? "&#x2260;" : "\\neq";
            case "<=" -> xml ? "&#x2264;" : "\\leq";
            case ">=" -> xml ? "&#x2265;" : "\\geq";
            case "<" -> xml ? "&lt;" : "<";
            case ">" -> xml ? "&gt;" : ">";
            default -> "=";
        };
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    // --- LaTeX ----------------------------------------------------------------------------------------------------

    private static void latex(Node n, StringBuilder sb) {
        if (n instanceof Num x) {
            sb.append(x.text);
        } else if (n instanceof Name x) {
            sb.append(x.name.length() == 1 ? x.name : "\\mathit{" + x.name.replace("_", "\\_") + "}");
        } else if (n instanceof Neg x) {
            sb.append('-');
            latexOperand(x.operand, prec(x.operand) <= 3 && !(x.operand instanceof Bin b && b.op.equals("/")), sb);
        } else if (n instanceof Call c) {
            if (c.name.equals("sqrt") && c.args.size() == 1) {
                sb.append("\\sqrt{");
                latex(c.args.get(0), sb);
                sb.append('}');
            } else if (c.name.equals("abs") && c.args.size() == 1) {
                sb.append("\\left|");
                latex(c.args.get(0), sb);
                sb.append("\\right|");
            } else {
                sb.append(c.name.equals("max") || c.name.equals("min") ? "\\" + c.name : "\\operatorname{" + c.name
                    + "}").append("\\left(");
                for (int i = 0; i < c.args.size(); i++) {
                    sb.append(i > 0 ? ", " : "");
                    latex(c.args.get(i), sb);
                }
                sb.append("\\right)");
            }
        } else {
            Bin b = (Bin) n;
            switch (b.op) {
                case "/" -> {
                    sb.append("\\frac{");
                    latex(b.left, sb);
                    sb.append("}{");
                    latex(b.right, sb);
                    sb.append('}');
                }
                case "^" -> {
                    latexOperand(b.left, prec(b.left) <= 4, sb);
                    sb.append("^{");
                    latex(b.right, sb);
                    sb.append('}');
                }
                case "*" -> {
                    latexOperand(b.left, prec(b.left) < 2, sb);
                    sb.append(numberFirst(b.right) ? " \\cdot " : " ");
                    latexOperand(b.right, prec(b.right) <= 2 && !(b.right instanceof Bin r && r.op.equals("/")), sb);
                }
                case "+", "-" -> {
                    latex(b.left, sb);
                    sb.append(' ').append(b.op).append(' ');
                    latexOperand(b.right, b.op.equals("-") ? prec(b.right) <= 1 : prec(b.right) < 1, sb);
                }
                default -> {
                    latex(b.left, sb);
                    sb.append(' ').append(relation(b.op, false)).append(' ');
                    latex(b.right, sb);
                }
            }
        }
    }

    private static void latexOperand(Node n, boolean parens, StringBuilder sb) {
        if (parens) {
            sb.append("\\left(");
            latex(n, sb);
            sb.append("\\right)");
        } else {
            latex(n, sb);
        }
    }

    // --- evaluation -----------------------------------------------------------------------------------------------

    private static Optional<Rational> eval(Node n, Map<String, Rational> values) {
        if (n instanceof Num x) {
            return Optional.of(Rational.parse(x.text));
        }
        if (n instanceof Name x) {
            return Optional.ofNullable(values.get(x.name));
        }
        if (n instanceof Neg x) {
            return eval(x.operand, values).map(Rational::negate);
        }
        if (n instanceof Call c) {
            List<Rational> args = new ArrayList<>();
            for (Node a : c.args) {
                Optional<Rational> v = eval(a, values);
                if (v.isEmpty()) {
                    return Optional.empty();
                }
                args.add(v.get());
            }
            return switch (c.name) {
                case "abs" -> Optional.of(args.get(0).abs());
                case "max" -> args.stream().reduce(Rational::max);
                case "min" -> args.stream().reduce(Rational::min);
                case "sqrt" -> sqrt(args.get(0));
                default -> Optional.empty();
            };
        }
        Bin b = (Bin) n;
        Optional<Rational> l = eval(b.left, values);
        Optional<Rational> r = eval(b.right, values);
        if (l.isEmpty() || r.isEmpty()) {
            return Optional.empty();
        }
        Rational x = l.get();
        Rational y = r.get();
        return switch (b.op) {
            case "+" -> Optional.of(x.add(y));
            case "-" -> Optional.of(x.subtract(y));
            case "*" -> Optional.of(x.multiply(y));
            case "/" -> y.isZero() ? Optional.empty() : Optional.of(x.divide(y));
            case "^" -> y.isInteger() && y.abs().compareTo(Rational.of(100_000)) <= 0 && !(x.isZero() && y.signum() < 0)
                ? Optional.of(x.pow(y.numerator().intValueExact())) : Optional.empty();
            default -> Optional.empty();
        };
    }

    private static Optional<Rational> sqrt(Rational x) {
        if (x.signum() < 0) {
            return Optional.empty();
        }
        BigInteger p = x.numerator().sqrt();
        BigInteger q = x.denominator().sqrt();
        if (p.multiply(p).equals(x.numerator()) && q.multiply(q).equals(x.denominator())) {
            return Optional.of(Rational.of(p, q));
        }
        return Optional.empty();
    }
}
