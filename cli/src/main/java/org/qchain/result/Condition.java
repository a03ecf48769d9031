package org.qchain.result;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * A condition on the parameters: {@code left RELATION right}, with {@code left} a formula in the parameters and
 * {@code right} an exact number, and one fact about the parameters' domains. It prints itself as plain text
 * ({@code 1 + 4*a != 0}), LaTeX ({@code 1 + 4 a \neq 0}) and MathML, and evaluates itself at rational values.
 *
 * <p>Two uses: a condition a result needs ({@link Relation#NOT_EQUAL}: the formulas of {@code closed} hold where
 * it holds), for which {@code proved} says whether it is shown to hold for every value inside the parameters'
 * domains; and a parameter value that changes a result ({@link Relation#EQUAL}: a special value of
 * {@code classes}), for which {@code proved} says whether it is shown to be met inside (or on the edge of) the
 * domains. {@code false} means "not shown", never "shown to fail".
 *
 * @param left     the formula in the parameters
 * @param relation how it compares with {@code right}
 * @param right    the number
 * @param proved   the domain fact, as above
 */
public record Condition(Formula left, Relation relation, Rational right, boolean proved) implements Formula {

    /** How the two sides compare. */
    public enum Relation {
        /** The sides differ. */
        NOT_EQUAL("!=", "\\neq"),
        /** The sides are equal. */
        EQUAL("=", "=");

        private final String plain;
        private final String latex;

        Relation(String plain, String latex) {
            this.plain = plain;
            this.latex = latex;
        }

        /** The relation in plain syntax: {@code !=} or {@code =}. */
        public String plain() {
            return plain;
        }

        /** The relation in LaTeX: {@code \neq} or {@code =}. */
        public String latex() {
            return latex;
        }

        /** Whether two values in this relation: {@code cmp} is the sign of left minus right. */
        boolean test(int cmp) {
            return this == EQUAL ? cmp == 0 : cmp != 0;
        }
    }

    /**
     * {@code left != right}.
     *
     * @param left   the formula
     * @param right  the number it must differ from
     * @param proved whether it is shown to hold throughout the parameters' domains
     * @return the condition
     */
    public static Condition notEqual(Formula left, Rational right, boolean proved) {
        return new Condition(left, Relation.NOT_EQUAL, right, proved);
    }

    /**
     * {@code left = right}.
     *
     * @param left   the formula
     * @param right  the number
     * @param proved whether it is shown to be met inside or on the edge of the parameters' domains
     * @return the condition
     */
    public static Condition equal(Formula left, Rational right, boolean proved) {
        return new Condition(left, Relation.EQUAL, right, proved);
    }

    /** {@code left RELATION right} in plain syntax, as our parsers read it back. */
    @Override
    public String plain() {
        return left.plain() + " " + relation.plain() + " " + right;
    }

    /** {@code left RELATION right} in LaTeX math mode. */
    @Override
    public String latex() {
        return left.latex() + " " + relation.latex() + " " + new ExactValue(right).latex();
    }

    /**
     * Whether the condition holds at the given values, evaluated exactly from the plain formula.
     *
     * @param values a value for every parameter the formula uses
     * @return whether it holds; empty where the left side has no rational value there (a name without a value, a
     *         division by zero)
     */
    public Optional<Boolean> holdsAt(Map<String, Rational> values) {
        return FormulaTree.parse(left.plain()).evaluate(values).map(v -> relation.test(v.compareTo(right)));
    }

    /**
     * The conditions in plain syntax.
     *
     * @param conditions the conditions
     * @return their {@link #plain()} forms, in order
     */
    public static List<String> plain(List<Condition> conditions) {
        return conditions.stream().map(Condition::plain).toList();
    }

    /**
     * Those conditions whose domain fact is not proved.
     *
     * @param conditions the conditions
     * @return the conditions with {@code proved} false, in order
     */
    public static List<Condition> notProved(List<Condition> conditions) {
        return conditions.stream().filter(c -> !c.proved()).toList();
    }
}
