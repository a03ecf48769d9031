package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.format.OutputFormat;
import org.qchain.result.ClassesResult;
import org.qchain.result.Condition;
import org.qchain.result.Formula;

/**
 * The special values of {@code classes} as typed values: a condition {@code formula = number} and the structure that
 * changes there. Their formulas, evaluated exactly at a point, agree with the engine: where the condition holds, the
 * numeric structure at that point is the one the effect states (common practice, no source).
 */
class SpecialValuesTypedTest {
    private static final Path WARD = Path.of("src/test/resources/models/ward-curve.chain");

    private static ClassesResult symbolic() {
        LongRunQuery q = new LongRunQuery(false, true, LongRunQuery.DEFAULT_MAX_DIGITS, LongRunQuery.DEFAULT_MAX_STATES);
        return Analysis.classes(LoadedModel.load(WARD, Map.of()), q);
    }

    @Test
    void specialValuesAreConditionsAndStructures() {
        List<ClassesResult.SpecialValue> sv = symbolic().specialValues();
        assertEquals(List.of("p = 0", "p - r = 0"), sv.stream().map(v -> v.condition().plain()).toList());
        for (ClassesResult.SpecialValue v : sv) {
            assertEquals(Condition.Relation.EQUAL, v.condition().relation());
            assertEquals(Rational.ZERO, v.condition().right());
            assertTrue(v.condition().proved(), "both are met inside the box [0, 1/4]^2");
        }
        assertEquals(List.of("A"), sv.get(0).effect().absorbing());
        assertEquals(List.of(), sv.get(1).effect().absorbing());
        assertEquals("p - r = 0", sv.get(1).condition().plain());
        assertEquals("p - r = 0", sv.get(1).condition().latex());
    }

    @Test
    void whereTheConditionHoldsTheNumericStructureIsTheStatedOne() {
        List<ClassesResult.SpecialValue> sv = symbolic().specialValues();
        // on the line p = r (away from p = 0), and at p = 0 (r off the line)
        List<Map<String, Rational>> points = List.of(Map.of("p", Rational.of(1, 8), "r", Rational.of(1, 8)),
            Map.of("p", Rational.ZERO, "r", Rational.of(1, 5)));
        for (int k = 0; k < sv.size(); k++) {
            ClassesResult.SpecialValue v = sv.get(k);
            Map<String, Rational> at = points.get(1 - k);
            assertEquals(Optional.of(true), v.condition().holdsAt(at), v.condition().plain());
            assertEquals(Optional.of(false), sv.get(k == 0 ? 1 : 0).condition().holdsAt(at));
            ClassesResult numeric = Analysis.classes(LoadedModel.load(WARD, at), LongRunQuery.plain());
            assertEquals(v.effect().classes().orElseThrow(), numeric.classes(), at.toString());
            assertTrue(numeric.absorbing().containsAll(v.effect().absorbing()), at.toString());
        }
    }

    @Test
    void anUndecidedZeroSetIsSaidSoInEveryFormat() {
        ClassesResult.SpecialValue v = new ClassesResult.SpecialValue(
            Condition.equal(Formula.of("p*r - 1/20", "p r - \\frac{1}{20}"), Rational.ZERO, false),
            new ClassesResult.Effect(List.of("B"), Optional.empty()));
        ClassesResult r = new ClassesResult("m.chain", List.of("A", "B"), List.of("p", "r"),
            List.of(new ClassesResult.ChainClass(List.of("A", "B"), true, 1)), List.of(), List.of(), List.of(v),
            List.of(List.of(Formula.of("1 - p", "1 - p"), Formula.of("p", "p")),
                List.of(Formula.of("p*r", "p r"), Formula.of("1 - p*r", "1 - p r"))), List.of());
        String json = OutputFormat.JSON.formatter(4).format(r);
        assertTrue(json.contains("{\"condition\":\"p*r - 1/20 = 0 (if it vanishes inside the domains: not decided)\","
            + "\"effect\":\"B can no longer leave\"}"), json);
        String text = OutputFormat.TEXT.formatter(4).format(r);
        assertTrue(text.contains("p*r - 1/20 = 0 (if it vanishes inside the domains: not decided)"), text);
    }
}
