package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Expr;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.Transition;
import org.qchain.symbolic.check.ParamPoints;
import org.qchain.symbolic.sensitivity.SweepRange;

/** Bad input on the symbolic path gives one clear error with its key and position. Source: common practice, no source. */
class BadInputTest {
    private static final String PUMP = """
        chain discrete
        param p in (0, 1) = 1/20
        param r in (0, 1) = 1/4
        states Up Worn Down
        Up    Worn  p
        Worn  Down  p
        Worn  Up    r
        Down  Up    1/2
        """;

    @Test
    void parameterUsedButNotDeclaredInAFile() {
        QchainException e = assertThrows(QchainException.class,
            () -> ModelParser.parse("pump.chain", PUMP.replace("Worn  Up    r", "Worn  Up    q")));
        assertEquals(ErrorKey.UNKNOWN_PARAMETER, e.key());
        assertEquals("pump.chain:7:13", e.pos().orElseThrow().toString());
    }

    @Test
    void parameterUsedButNotDeclaredInAModelBuiltInCode() {
        SourcePos at = new SourcePos("code", 3, 9);
        Model m = Model.of("code", ChainKind.DISCRETE, List.of(), List.of("A", "B"),
            List.of(new Transition(0, 1, new Expr.Var("q", at), at)));
        QchainException e = assertThrows(QchainException.class, () -> RatFunMatrix.fromModel(m));
        assertEquals(ErrorKey.UNKNOWN_PARAMETER, e.key());
        assertEquals("code:3:9: unknown parameter 'q' (declare it with: param q)", e.getMessage());
    }

    @Test
    void valueOutsideItsDomain() {
        Model m = ModelParser.parse("pump.chain", PUMP);
        QchainException e = assertThrows(QchainException.class, () -> Chains.parseAssignments(m, "p=3/2"));
        assertEquals(ErrorKey.VALUE_OUTSIDE_DOMAIN, e.key());
        QchainException f = assertThrows(QchainException.class,
            () -> ParamPoints.resolve(m, Map.of("r", Rational.ONE)));
        assertEquals(ErrorKey.VALUE_OUTSIDE_DOMAIN, f.key());
        assertEquals("value 1 of parameter 'r' is outside its domain (0, 1)", f.getMessage());
    }

    @Test
    void sweepWithZeroStep() {
        QchainException e = assertThrows(QchainException.class, () -> SweepRange.parse("p in [0, 1/10] by 0"));
        assertEquals(ErrorKey.SWEEP, e.key());
        assertEquals("invalid sweep 'p in [0, 1/10] by 0': the step 0 must be positive", e.getMessage());
    }

    @Test
    void aFunctionIsNotARationalFunctionAndIsRejectedByTheParser() {
        QchainException e = assertThrows(QchainException.class,
            () -> ModelParser.parse("pump.chain", PUMP.replace("Worn  Up    r", "Worn  Up    sqrt(r)")));
        assertEquals(ErrorKey.FUNCTION_NOT_SUPPORTED, e.key());
        assertEquals(7, e.pos().orElseThrow().line());
    }

    @Test
    void aHugePowerInAModelIsRefusedBeforeExpanding() {
        Model m = ModelParser.parse("pump.chain", PUMP.replace("Worn  Up    r", "Worn  Up    r^20000"));
        QchainException e = assertThrows(QchainException.class, () -> RatFunMatrix.fromModel(m));
        assertEquals(ErrorKey.SYMBOLIC_POWER_TOO_LARGE, e.key());
    }

    @Test
    void divisionByAnIdenticallyZeroExpression() {
        Model m = ModelParser.parse("pump.chain", PUMP.replace("Worn  Up    r", "Worn  Up    r/(p - p)"));
        QchainException e = assertThrows(QchainException.class, () -> RatFunMatrix.fromModel(m));
        assertEquals(ErrorKey.DIVISION_BY_ZERO, e.key());
        assertEquals(7, e.pos().orElseThrow().line());
    }
}
