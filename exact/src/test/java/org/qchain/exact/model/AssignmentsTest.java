package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/** {@code --at} style parameter values (the project's own syntax; common practice, no source). */
class AssignmentsTest {
    static final Model M = ModelParser.parse("m.chain",
        "param p in (0, 1) = 1/20\nparam r\nparam lam in [0, inf)\nstates A B\nA B p\nB A r\n");

    static QchainException fails(ErrorKey key, String text) {
        QchainException e = assertThrows(QchainException.class, () -> Chains.parseAssignments(M, text));
        assertEquals(key, e.key(), e.getMessage());
        return e;
    }

    @Test
    void readsNamesAndExactValuesWithSpaces() {
        Map<String, Rational> v = Chains.parseAssignments(M, " p = 1/10 ,r=0.25,lam=1e3 ");
        assertEquals(List.of("p", "r", "lam"), List.copyOf(v.keySet()));
        assertEquals(Rational.of(1, 10), v.get("p"));
        assertEquals(Rational.of(1, 4), v.get("r"));
        assertEquals(Rational.of(1000), v.get("lam"));
        assertEquals(Rational.ZERO, Chains.parseAssignments(M, "lam=0").get("lam"));
    }

    @Test
    void unknownNameIsABadArgumentNamingTheItem() {
        QchainException e = fails(ErrorKey.BAD_ARGUMENT, "p=1/2, q=1/3");
        assertEquals("invalid parameter value 'q=1/3': the model has no parameter 'q' (parameters: p, r, lam)",
            e.getMessage());
    }

    @Test
    void malformedItemsAreBadArguments() {
        assertTrue(fails(ErrorKey.BAD_ARGUMENT, "p=1/2x").getMessage().contains("'p=1/2x'"));
        fails(ErrorKey.BAD_ARGUMENT, "p");
        fails(ErrorKey.BAD_ARGUMENT, "p=");
        fails(ErrorKey.BAD_ARGUMENT, "=1/2");
        fails(ErrorKey.BAD_ARGUMENT, "p=1/2,");
        fails(ErrorKey.BAD_ARGUMENT, "");
        fails(ErrorKey.BAD_ARGUMENT, "p=1/0");
        fails(ErrorKey.BAD_ARGUMENT, "p=1/2,p=1/3");
    }

    @Test
    void valueOutsideTheDomainNamesTheTextGiven() {
        QchainException e = fails(ErrorKey.VALUE_OUTSIDE_DOMAIN, "p=1.5");
        assertEquals("value 1.5 of parameter 'p' is outside its domain (0, 1)", e.getMessage());
        fails(ErrorKey.VALUE_OUTSIDE_DOMAIN, "r=1");
        fails(ErrorKey.VALUE_OUTSIDE_DOMAIN, "lam=-1/2");
    }
}
