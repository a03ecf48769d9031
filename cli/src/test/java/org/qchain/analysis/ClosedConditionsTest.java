package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.linear.LinearSolver;
import org.qchain.exact.model.Domain;
import org.qchain.result.ClosedResult;
import org.qchain.result.Condition;
import org.qchain.symbolic.closed.ClosedForm;
import org.qchain.symbolic.closed.ClosedForms;

/**
 * The conditions of {@code closed} as typed values: they print the strings the engine wrote before they were typed
 * (and that the golden files hold), and their formulas, evaluated exactly at rational points, agree with the closed
 * form engine (common practice, no source).
 */
class ClosedConditionsTest {
    private static final Path MODELS = Path.of("src/test/resources/models");
    private static final List<String> NAMES = List.of("closed-stages.chain", "two-state-symbolic.chain",
        "pump-params.chain", "closed-periodic.chain", "closed-jordan.chain", "closed-cubic.chain");

    private static ClosedResult closed(LoadedModel m) {
        return Analysis.closed(m, ClosedQuery.matrix(), Progress.NONE);
    }

    private static Map<String, Domain> domains(LoadedModel m, List<String> params) {
        Map<String, Domain> out = new LinkedHashMap<>();
        for (String p : params) {
            m.model().param(p).ifPresent(d -> out.put(p, d.domain()));
        }
        return out;
    }

    @Test
    void typedConditionsPrintTheEnginesStrings() {
        for (String name : NAMES) {
            LoadedModel m = LoadedModel.load(MODELS.resolve(name), Map.of());
            ClosedResult r = closed(m);
            ClosedForm cf = ClosedForms.of(m.model(), Map.of());
            Map<String, Domain> d = domains(m, cf.parameters());
            assertEquals(cf.conditions(), Condition.plain(r.conditions()), name);
            assertEquals(cf.conditionsNotProved(d), Condition.plain(r.notProved()), name);
            ClosedResult.LongRun lr = r.longRun().orElseThrow();
            assertEquals(cf.longRun().conditions(), Condition.plain(lr.conditions()), name);
            assertEquals(cf.longRunNotProved(d), Condition.plain(lr.notProved()), name);
        }
    }

    @Test
    void theStagesConditionsInEveryNotation() {
        // the strings of golden/closed/quadratic.json, written by the engine before conditions were typed
        ClosedResult r = closed(LoadedModel.load(MODELS.resolve("closed-stages.chain"), Map.of()));
        assertEquals(List.of("1 + 4*a != 0", "2 - a != 0", "a != 0"), Condition.plain(r.conditions()));
        assertEquals(List.of(), r.notProved());
        assertTrue(r.conditions().stream().allMatch(Condition::proved));
        assertEquals(List.of("9 - 4*a != 0", "49 - 52*a + 16*a^2 != 0"),
            Condition.plain(r.longRun().orElseThrow().conditions()));
        Condition first = r.conditions().get(0);
        assertEquals(Condition.Relation.NOT_EQUAL, first.relation());
        assertEquals(Rational.ZERO, first.right());
        assertEquals("1 + 4 a \\neq 0", first.latex());
        assertEquals("<math xmlns=\"http://www.w3.org/1998/Math/MathML\"><mrow><mi>a</mi><mo>&#x2260;</mo><mn>0</mn>"
            + "</mrow></math>", r.conditions().get(2).mathml());
    }

    @Test
    void aConditionFailsExactlyWhereTheEngineRefuses() {
        LoadedModel m = LoadedModel.load(MODELS.resolve("closed-stages.chain"), Map.of());
        ClosedResult r = closed(m);
        ClosedForm cf = ClosedForms.of(m.model(), Map.of());
        // the zeros of the three linear conditions 1 + 4a, 2 - a, a
        List<Rational> zeros = List.of(Rational.of(-1, 4), Rational.of(2), Rational.ZERO);
        for (int k = 0; k < zeros.size(); k++) {
            Map<String, Rational> at = Map.of("a", zeros.get(k));
            Condition c = r.conditions().get(k);
            assertEquals(Optional.of(false), c.holdsAt(at), c.plain());
            QchainException e = assertThrows(QchainException.class, () -> cf.evaluate(3, at));
            assertEquals(ErrorKey.CLOSED_FORM_CONDITION, e.key());
            assertEquals(c.plain(), e.args().get(0));
        }
        Random rnd = new Random(20261203L);
        for (int t = 0; t < 100; t++) {
            Map<String, Rational> at = Map.of("a", Rational.of(rnd.nextInt(41) - 20, 1 + rnd.nextInt(12)));
            boolean all = r.conditions().stream().allMatch(c -> c.holdsAt(at).orElseThrow());
            boolean refused;
            try {
                cf.evaluate(3, at);
                refused = false;
            } catch (QchainException e) {
                assertEquals(ErrorKey.CLOSED_FORM_CONDITION, e.key());
                refused = true;
            }
            assertEquals(!all, refused, at.toString());
        }
    }

    @Test
    void anEigenvalueConditionsLeftSideIsAnEigenvalueAtEveryPoint() {
        // the long run of the two-state chain needs 1 - p - r != -1: its left side is the second eigenvalue of P, so
        // det(P - (1 - p - r) I) = 0 exactly at every point (common practice, no source)
        LoadedModel m = LoadedModel.load(MODELS.resolve("two-state-symbolic.chain"), Map.of());
        Condition c = closed(m).longRun().orElseThrow().conditions().get(0);
        assertEquals("1 - p - r != -1", c.plain());
        assertEquals(Rational.of(-1), c.right());
        // (0, 1) is open: p = r = 1 is outside, so the condition is shown to hold throughout
        assertTrue(c.proved());
        ClosedForm cf = ClosedForms.of(m.model(), Map.of());
        Random rnd = new Random(7L);
        for (int t = 0; t < 30; t++) {
            Map<String, Rational> at = Map.of("p", Rational.of(1 + rnd.nextInt(9), 10),
                "r", Rational.of(1 + rnd.nextInt(7), 8));
            RationalMatrix p = cf.evaluate(1, at);
            Rational v = org.qchain.result.FormulaTree.parse(c.left().plain()).evaluate(at).orElseThrow();
            Rational[][] shifted = p.toArray();
            for (int i = 0; i < shifted.length; i++) {
                shifted[i][i] = shifted[i][i].subtract(v);
            }
            assertEquals(Rational.ZERO, LinearSolver.determinant(RationalMatrix.of(shifted)), at.toString());
            assertEquals(Optional.of(true), c.holdsAt(at));
        }
        // at p = r = 1 the eigenvalue is -1 and the chain swaps its states: the condition fails there
        assertEquals(Optional.of(false), c.holdsAt(Map.of("p", Rational.ONE, "r", Rational.ONE)));
    }
}
