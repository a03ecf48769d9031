package org.qchain.exact.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.floats.Binary64;

/**
 * Reading one given number exactly, and the double it stands for. References: IEEE 754-2019 (rounding, special
 * values) and Java SE's Double.parseDouble and double division, both correctly rounded by their API specification.
 */
class GivenValueTest {

    // IEEE 754-2019 roundTiesToEven: the double a text stands for is the correctly rounded double of its exact value,
    // whichever way it is found (Double.parseDouble for decimals; exact rounding for fractions and hex floats).
    // Reference: Java SE Double.parseDouble (correctly rounded, Double.valueOf(String) API docs), which gives
    // asDouble() for decimals, against Binary64.round of the exact Rational this class read
    @Test
    void doubleIsTheCorrectlyRoundedExactValue() {
        Random rnd = new Random(99);
        for (int k = 0; k < 5000; k++) {
            String s = (rnd.nextBoolean() ? "-" : "") + rnd.nextInt(1000) + "." + Math.abs(rnd.nextLong())
                + (rnd.nextBoolean() ? "e" + (rnd.nextInt(700) - 350) : "");
            GivenValue.Finite f = (GivenValue.Finite) GivenValue.parse(s);
            assertEquals(Binary64.round(f.value()), f.asDouble(), s);
        }
        GivenValue.Finite third = (GivenValue.Finite) GivenValue.parse("1/3");
        // reference: Java SE double division, the correctly rounded IEEE 754 quotient (JLS §15.17.2)
        assertEquals(1.0 / 3, third.asDouble());
        assertEquals(Rational.of(1, 3), third.value());
    }

    // IEEE 754-2019 clause 6 (infinity and NaN), in the spellings C, Python, JavaScript and JSON writers use
    // (common practice, no source); which other spellings are refused is our own grammar (docs/reference-files.md)
    @Test
    void nonFiniteSpellings() {
        for (String s : new String[] {"inf", "+inf", "-INF", "Infinity", "-Infinity", "nan", "NaN", "-nan", "null"}) {
            GivenValue v = GivenValue.parse(s);
            assertFalse(v.isFinite(), s);
        }
        assertEquals(Double.NEGATIVE_INFINITY, GivenValue.parse("-inf").asDouble());
        assertTrue(Double.isNaN(GivenValue.parse("null").asDouble()));
        assertThrows(NumberFormatException.class, () -> GivenValue.parse("-null"));
        assertThrows(NumberFormatException.class, () -> GivenValue.parse("infinite"));
        assertThrows(NumberFormatException.class, () -> GivenValue.parse("1,5"));
        assertThrows(NumberFormatException.class, () -> GivenValue.parse("0x1.8"));
    }
}
