package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

/** Correctly rounded decimal display, against Java SE's BigDecimal as the reference. */
class DecimalsTest {

    /** The reference: BigDecimal division rounded half-even to the given precision (Java SE, java.math.BigDecimal). */
    private static BigDecimal reference(Rational r, int digits) {
        return new BigDecimal(r.numerator()).divide(new BigDecimal(r.denominator()),
                new MathContext(digits, RoundingMode.HALF_EVEN));
    }

    private static void assertMatchesReference(Rational r, int digits) {
        String s = Decimals.format(r, digits);
        BigDecimal ours = new BigDecimal(s);
        assertEquals(0, ours.compareTo(reference(r, digits)), r + " at " + digits + ": " + s);
        if (!(r.isInteger() && s.equals(r.toString()))) {
            assertEquals(digits, ours.precision(), "significant digits of " + s);
        }
    }

    // reference library: Java SE BigDecimal with MathContext(12, HALF_EVEN); 1/4 keeps its 12 significant digits
    @Test
    void moderateValuesInPlainNotation() {
        assertEquals("0.250000000000", Decimals.format(Rational.of(1, 4), 12));
        assertEquals("0.333333333333", Decimals.format(Rational.of(1, 3), 12));
        assertEquals("0.666666666667", Decimals.format(Rational.of(2, 3), 12));
        assertEquals("-0.142857142857", Decimals.format(Rational.of(-1, 7), 12));
        assertEquals("3.14159292035", Decimals.format(Rational.of(355, 113), 12));
        assertEquals("0.00000100000000000", Decimals.format(Rational.of(1, 1_000_000), 12));
        assertMatchesReference(Rational.of(355, 113), 12);
    }

    // common practice, no source: exact values print exactly
    @Test
    void zeroAndSmallIntegersAreExact() {
        assertEquals("0", Decimals.format(Rational.ZERO, 12));
        assertEquals("1", Decimals.format(Rational.ONE, 12));
        assertEquals("-42", Decimals.format(Rational.of(-42), 12));
        assertEquals("123456789012", Decimals.format(Rational.of(123456789012L), 12));
        assertEquals("1.23456789012e12", Decimals.format(Rational.of(1234567890123L), 12));
    }

    // IEEE 754-2008, section 4.3.1 roundTiesToEven (from memory), as java.math.RoundingMode.HALF_EVEN
    @Test
    void tiesGoToEven() {
        assertEquals("0.12", Decimals.format(Rational.of(1, 8), 2));
        assertEquals("0.38", Decimals.format(Rational.of(3, 8), 2));
        assertEquals("0.62", Decimals.format(Rational.of(5, 8), 2));
        assertEquals("2", Decimals.format(Rational.of(5, 2), 1));
        assertEquals("4", Decimals.format(Rational.of(7, 2), 1));
        // just above a tie rounds up, just below rounds down
        assertEquals("0.13", Decimals.format(Rational.of(125_001, 1_000_000), 2));
        assertEquals("0.12", Decimals.format(Rational.of(124_999, 1_000_000), 2));
        for (Rational r : new Rational[] {Rational.of(1, 8), Rational.of(3, 8), Rational.of(5, 2), Rational.of(7, 2)}) {
            assertMatchesReference(r, r.isInteger() ? 1 : 2);
        }
    }

    // reference library: Java SE BigDecimal; 0.999... carries into a new leading digit
    @Test
    void ninesRoundUpToAPowerOfTen() {
        assertEquals("1.00", Decimals.format(Rational.of(999_999, 1_000_000), 3));
        assertEquals("1.00000000000e-7", Decimals.format(Rational.parse("0.0000000999999999999999"), 12));
        assertEquals("10.0", Decimals.format(Rational.of(99_999, 10_000), 3));
        assertMatchesReference(Rational.of(999_999, 1_000_000), 3);
        Rational almostOne = Rational.ONE.subtract(Rational.of(BigInteger.ONE, BigInteger.TEN.pow(40)));
        assertEquals("1.00000000000", Decimals.format(almostOne, 12));
        assertMatchesReference(almostOne, 12);
    }

    // reference library: Java SE BigDecimal; 1/3^1000 is about 7.6e-478 (log10 3 = 0.47712..., common practice)
    @Test
    void tinyAndHugeValuesUseENotation() {
        Rational tiny = Rational.of(BigInteger.ONE, BigInteger.valueOf(3).pow(1000));
        String s = Decimals.format(tiny, 12);
        assertEquals("e-478", s.substring(s.indexOf('e')));
        assertMatchesReference(tiny, 12);
        Rational huge = Rational.of(BigInteger.valueOf(3).pow(1000), BigInteger.valueOf(7));
        assertMatchesReference(huge, 12);
        assertEquals("e476", Decimals.format(huge, 12).substring(Decimals.format(huge, 12).indexOf('e')));
        Rational bothHuge = Rational.of(BigInteger.valueOf(7).pow(5000).add(BigInteger.ONE), BigInteger.valueOf(3).pow(8000));
        assertMatchesReference(bothHuge, 30);
    }

    // reference library: Java SE BigDecimal on random fractions of up to 60 digits, 1 to 40 significant digits
    @Property(seed = "1618", tries = 300)
    void agreesWithBigDecimal(@ForAll @LongRange(min = 0, max = Long.MAX_VALUE) long seed,
            @ForAll @IntRange(min = 1, max = 40) int digits) {
        Random rnd = new Random(seed);
        BigInteger p = new BigInteger(1 + rnd.nextInt(200), rnd).add(BigInteger.ONE);
        BigInteger q = new BigInteger(1 + rnd.nextInt(200), rnd).add(BigInteger.ONE);
        if (rnd.nextBoolean()) {
            p = p.negate();
        }
        // make exact ties and carries common: scale by powers of 2 and 5 and add a half unit sometimes
        if (rnd.nextInt(4) == 0) {
            q = BigInteger.TWO.pow(rnd.nextInt(30)).multiply(BigInteger.valueOf(5).pow(rnd.nextInt(30)));
        }
        assertMatchesReference(Rational.of(p, q), digits);
    }

    // reference library: Java SE BigDecimal with MathContext(digits, FLOOR / CEILING) on random signed fractions
    @Property(seed = "2718", tries = 300)
    void directedRoundingAgreesWithBigDecimal(@ForAll @LongRange(min = 0, max = Long.MAX_VALUE) long seed,
            @ForAll @IntRange(min = 1, max = 30) int digits) {
        Random rnd = new Random(seed);
        BigInteger p = new BigInteger(1 + rnd.nextInt(150), rnd).add(BigInteger.ONE);
        BigInteger q = rnd.nextInt(4) == 0 ? BigInteger.TEN.pow(rnd.nextInt(20))
            : new BigInteger(1 + rnd.nextInt(150), rnd).add(BigInteger.ONE);
        Rational r = Rational.of(rnd.nextBoolean() ? p.negate() : p, q);
        for (RoundingMode mode : new RoundingMode[] {RoundingMode.FLOOR, RoundingMode.CEILING}) {
            BigDecimal ref = new BigDecimal(r.numerator()).divide(new BigDecimal(r.denominator()),
                new MathContext(digits, mode));
            BigDecimal ours = new BigDecimal(Decimals.format(r, digits, mode));
            assertEquals(0, ours.compareTo(ref), r + " " + mode + " at " + digits);
        }
    }

    // common practice, no source: at least one significant digit
    @Test
    void rejectsNonPositiveDigits() {
        assertThrows(IllegalArgumentException.class, () -> Decimals.format(Rational.ONE, 0));
    }

    // reference library: Java SE BigDecimal (MathContext, HALF_EVEN) on long fractions, which take the route through
    // leading bits; and values constructed next to a halfway point (m + 1/2) 10^-k, just above, just below and on
    // it, where that route must give way to the exact one
    @Property(tries = 60, seed = "31337")
    void longOperandsAndNearHalfwayCases(@ForAll @LongRange(min = 0, max = Long.MAX_VALUE) long seed,
                                         @ForAll @IntRange(min = 1, max = 30) int digits) {
        Random rnd = new Random(seed);
        BigInteger q = new BigInteger(600 + rnd.nextInt(4000), rnd).setBit(599);
        BigInteger p = new BigInteger(q.bitLength() - rnd.nextInt(40), rnd).add(BigInteger.ONE);
        assertMatchesReference(Rational.of(p, q), digits);
        // m + 1/2 with m of `digits` digits, over 10^digits: a tie of the rounding, and its neighbours at 1/q
        BigInteger m = BigInteger.TEN.pow(digits - 1).add(new BigInteger(digits * 3, rnd).mod(BigInteger.TEN.pow(digits - 1)));
        Rational tie = Rational.of(m.shiftLeft(1).add(BigInteger.ONE), BigInteger.TWO.multiply(BigInteger.TEN.pow(digits)));
        Rational tiny = Rational.of(BigInteger.ONE, q);
        assertMatchesReference(tie, digits);
        assertMatchesReference(tie.add(tiny), digits);
        assertMatchesReference(tie.subtract(tiny), digits);
    }
}
