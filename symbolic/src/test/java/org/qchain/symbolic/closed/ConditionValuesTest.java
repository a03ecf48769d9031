package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;

/**
 * The conditions of a closed form as values ({@link Condition}): the same text as the string lists, their LaTeX, and
 * the domain fact of {@code conditionsNotProved} and {@code longRunNotProved} as a flag.
 */
class ConditionValuesTest {
    private static final Domain OPEN = Domain.probability();
    private static final Domain CLOSED = new Domain(Rational.ZERO, true, Optional.of(Rational.ONE), true);

    /** The standard two-state chain (Grinstead and Snell, Introduction to Probability, ch. 11, from memory). */
    private static final Model TWO = Chains.model(List.of("p", "r"), new String[][] {{"1-p", "p"}, {"r", "1-r"}});

    @Test
    void theFormulasConditionIsAPolynomialThatMustNotVanish() {
        ClosedForm cf = ClosedForms.of(TWO);
        List<Condition> cs = cf.conditions(Map.of("p", OPEN, "r", OPEN));
        assertEquals(List.of(new Condition("p + r", "p + r", Rational.ZERO, true)), cs);
        assertEquals(cf.conditions(), cs.stream().map(Condition::text).toList());
        // on [0, 1]^2, p + r = 0 at the corner p = r = 0: not shown to hold
        List<Condition> closed = cf.conditions(Map.of("p", CLOSED, "r", CLOSED));
        assertEquals(List.of(false), closed.stream().map(Condition::holdsThroughout).toList());
        assertEquals(cf.conditionsNotProved(Map.of("p", CLOSED, "r", CLOSED)),
            closed.stream().map(Condition::text).toList());
    }

    @Test
    void theLongRunConditionKeepsItsEigenvalueAndTheValueItMustAvoid() {
        ClosedForm cf = ClosedForms.of(TWO);
        List<Condition> open = cf.longRunConditions(Map.of("p", OPEN, "r", OPEN));
        assertEquals(List.of(new Condition("1 - p - r", "1 - p - r", Rational.of(-1), true)), open);
        assertEquals("1 - p - r != -1", open.get(0).toString());
        assertEquals(cf.longRun().conditions(), open.stream().map(Condition::text).toList());
        List<Condition> closed = cf.longRunConditions(Map.of("p", CLOSED, "r", CLOSED));
        assertEquals(List.of(false), closed.stream().map(Condition::holdsThroughout).toList());
        assertEquals(cf.longRunNotProved(Map.of("p", CLOSED, "r", CLOSED)),
            closed.stream().map(Condition::text).toList());
    }
}
