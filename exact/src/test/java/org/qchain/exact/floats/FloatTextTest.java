package org.qchain.exact.floats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;

/** Shortest round-trip decimals and hexadecimal floats. */
class FloatTextTest {

    // reference library behaviour: ECMA-262 Number::toString as implemented by node v20 (V8), which gives the
    // shortest round-trip digits, the nearest of those, in ECMAScript's layout; the table was produced by
    // shortest-reference.js beside the CSV (8,500 doubles: random bits, probabilities, subnormals, powers of two)
    @Test
    void sameAsEcmaScriptNumberToString() throws IOException {
        int n = 0;
        try (BufferedReader in = new BufferedReader(new InputStreamReader(
                getClass().getResourceAsStream("shortest-reference.csv"), StandardCharsets.UTF_8))) {
            in.readLine();
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                String[] f = line.split(",");
                double d = Double.longBitsToDouble(Long.parseUnsignedLong(f[0], 16));
                assertEquals(f[1], FloatText.shortest(d), f[0]);
                n++;
            }
        }
        assertTrue(n > 8000);
    }

    // reference library behaviour: Java 17's Double.toString gives 18 digits for this double (JDK bug 4511638,
    // from memory); the shortest form has 15 and reads back as the same double
    @Test
    void shorterThanJava17DoubleToStringWhereThatIsNotShortest() {
        double d = 2.82879384806159E17;
        assertEquals("282879384806159000", FloatText.shortest(d));
        assertEquals(d, Double.parseDouble(FloatText.shortest(d)));
        assertTrue(Double.toString(d).replaceAll("[^0-9]", "").replaceAll("^0+|0+$", "").length() >= 15);
    }

    // common practice, no source: the shortest decimal reads back as the same double and never has more
    // significant digits than Double.toString's (which also reads back)
    @Test
    void roundTripsAndIsNeverLongerThanDoubleToString() {
        Random rnd = new Random(8);
        for (int k = 0; k < 5_000; k++) {
            double d = Double.longBitsToDouble(rnd.nextLong());
            if (!Double.isFinite(d)) {
                continue;
            }
            String s = FloatText.shortest(d);
            assertEquals(d, Double.parseDouble(s), s);
            assertTrue(significantDigits(s) <= significantDigits(Double.toString(d)), s + " vs " + d);
        }
    }

    private static int significantDigits(String s) {
        String m = s.toLowerCase().split("e")[0].replaceAll("[^0-9]", "").replaceAll("^0+", "").replaceAll("0+$", "");
        return Math.max(1, m.length());
    }

    // ECMA-262 Number::toString layout (from memory): zeros and non-finite values
    @Test
    void specialValues() {
        assertEquals("0", FloatText.shortest(0.0));
        assertEquals("-0", FloatText.shortest(-0.0));
        assertEquals("NaN", FloatText.shortest(Double.NaN));
        assertEquals("-Infinity", FloatText.shortest(Double.NEGATIVE_INFINITY));
        assertEquals("0.1", FloatText.shortest(Binary64.round(Rational.of(1, 10))));
        assertEquals("5e-324", FloatText.shortest(Double.MIN_VALUE));
        assertEquals("1e+23", FloatText.shortest(1e23));
    }

    // Java Language Specification, §3.10.2 (floating-point literals): the largest double is 0x1.f_ffff_ffff_ffffP+1023
    // and the smallest 0x0.0_0000_0000_0001P-1022 (from memory; written here without the digit separators)
    @Test
    void hexFloatsOfTheLanguageSpecification() {
        assertEquals(Binary64.exact(Double.MAX_VALUE), FloatText.parseHex("0x1.fffffffffffffP+1023"));
        assertEquals(Binary64.exact(Double.MIN_VALUE), FloatText.parseHex("0x0.0000000000001P-1022"));
        assertEquals(Binary64.exact(Double.MIN_VALUE), FloatText.parseHex("0x1.0p-1074"));
        assertEquals(Rational.of(3, 16), FloatText.parseHex("0x1.8p-3"));
        assertEquals(Rational.of(-3), FloatText.parseHex("-0X.Cp2"));
        assertEquals(Rational.of(10), FloatText.parseHex("0xAp0"));
        assertEquals("0x1.8p-3", FloatText.hex(0.1875));
        assertEquals("0x0.0000000000001p-1022", FloatText.hex(Double.MIN_VALUE));
        assertEquals("-0x1.0p0", FloatText.hex(-1.0));
    }

    // JLS §3.10.2: a binary exponent is required in a hexadecimal floating-point literal
    @Test
    void hexNeedsDigitsAndAnExponent() {
        assertFalse(FloatText.isHex("0x1.8"));
        assertFalse(FloatText.isHex("0x.p1"));
        assertFalse(FloatText.isHex("1.8p3"));
        assertThrows(NumberFormatException.class, () -> FloatText.parseHex("0x1p"));
        assertThrows(NumberFormatException.class, () -> FloatText.parseHex("0x1p99999999"));
    }

    // reference library behaviour: Double.parseDouble reads hexadecimal floats and rounds them correctly; our exact
    // reading, rounded, must agree, including a significand longer than a double's (a tie at 1 + 2^-53)
    @Test
    void hexReadsExactlyAndRoundsAsParseDouble() {
        Random rnd = new Random(13);
        for (int k = 0; k < 3_000; k++) {
            double d = Double.longBitsToDouble(rnd.nextLong());
            if (!Double.isFinite(d)) {
                continue;
            }
            String h = FloatText.hex(d);
            assertEquals(Binary64.exact(d), FloatText.parseHex(h), h);
        }
        for (String s : new String[] {"0x1.00000000000008p0", "0x1.00000000000018p0", "0x1.000000000000081p0",
            "0x3.ffffffffffffffffp-1024", "0x1.fffffffffffff8p1023"}) {
            assertEquals(Double.parseDouble(s), Binary64.round(FloatText.parseHex(s)), s);
        }
        assertEquals(1.0, Binary64.round(FloatText.parseHex("0x1.00000000000008p0")), "tie to even");
    }
}
