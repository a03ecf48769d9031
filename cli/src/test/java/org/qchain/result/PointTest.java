package org.qchain.result;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;

/** A point says where its values come from (the project's own labels; common practice, no source). */
class PointTest {
    private static Map<String, Rational> pr() {
        Map<String, Rational> m = new LinkedHashMap<>();
        m.put("p", Rational.of(1, 20));
        m.put("r", Rational.of(1, 4));
        return m;
    }

    @Test
    void theLabelNamesTheGivenAndTheNominalValues() {
        assertEquals("nominal values", new Point(pr()).origin());
        assertEquals("given with --at", new Point(pr(), Set.of("r", "p")).origin());
        assertEquals("r given with --at, p nominal", new Point(pr(), Set.of("r")).origin());
        // a given name without a value here is not reported
        assertEquals(Set.of(), new Point(pr(), Set.of("q")).given());
    }
}
