package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigInteger;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

/** Algebraic identities of matrix powers on random chains (fixed seeds). */
class MatrixPowersIdentityTest {

    // common practice, no source: each row of a stochastic matrix's power is a probability distribution
    @Property(seed = "20261201", tries = 40)
    void rowsOfPowerSumToExactlyOne(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 9) int size, @ForAll @IntRange(min = 0, max = 70) int n) {
        RationalMatrix p = RandomChains.stochastic(new Random(seed), size, 60, 0.4);
        RationalMatrix pn = MatrixPowers.power(p, n);
        for (int i = 0; i < size; i++) {
            Rational sum = Rational.ZERO;
            for (int j = 0; j < size; j++) {
                sum = sum.add(pn.get(i, j));
            }
            assertEquals(Rational.ONE, sum, "row " + i);
        }
    }

    // common practice, no source: P^(n+m) = P^n P^m (associativity of the matrix product); signed matrices too
    @Property(seed = "7", tries = 40)
    void powersAdd(@ForAll @LongRange(min = 0, max = 1_000_000) long seed, @ForAll @IntRange(min = 1, max = 7) int size,
            @ForAll @IntRange(min = 0, max = 25) int n, @ForAll @IntRange(min = 0, max = 25) int m,
            @ForAll boolean signed) {
        Random rnd = new Random(seed);
        RationalMatrix p = signed ? RandomChains.signed(rnd, size, 5, 12) : RandomChains.stochastic(rnd, size, 50, 0.3);
        assertEquals(MatrixPowers.power(p, n + m), MatrixPowers.power(p, n).multiply(MatrixPowers.power(p, m)));
    }

    // common practice, no source: the definition P^n = P * ... * P, against plain multiplication
    @Property(seed = "11", tries = 30)
    void powerEqualsRepeatedProduct(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 6) int size, @ForAll @IntRange(min = 0, max = 12) int n,
            @ForAll boolean signed) {
        Random rnd = new Random(seed);
        RationalMatrix p = signed ? RandomChains.signed(rnd, size, 4, 9) : RandomChains.stochastic(rnd, size, 30, 0.5);
        assertEquals(RandomChains.naivePower(p, n), MatrixPowers.power(p, n));
    }

    // common practice, no source: a row (entry) of P^n is the sum over paths, e_i P^n; it must equal the full power
    @Property(seed = "99", tries = 40)
    void pathSumsAgreeWithPower(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 8) int size, @ForAll @IntRange(min = 0, max = 60) int n,
            @ForAll boolean signed) {
        Random rnd = new Random(seed);
        RationalMatrix p = signed ? RandomChains.signed(rnd, size, 5, 10) : RandomChains.stochastic(rnd, size, 80, 0.6);
        RationalMatrix pn = MatrixPowers.power(p, n);
        int from = rnd.nextInt(size);
        int to = rnd.nextInt(size);
        assertArrayEquals(pn.row(from), MatrixPowers.rowOfPower(p, from, n));
        assertEquals(pn.get(from, to), MatrixPowers.entryOfPower(p, from, to, n));
    }

    // common practice, no source: both internal routes for a row (vector steps, squaring) give the same integers
    @Property(seed = "5", tries = 20)
    void vectorStepsEqualSquaring(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 8) int size, @ForAll @IntRange(min = 1, max = 80) int n) {
        Random rnd = new Random(seed);
        CommonDenominatorForm f = CommonDenominatorForm.of(RandomChains.stochastic(rnd, size, 40, 0.5));
        int from = rnd.nextInt(size);
        BigInteger[] bySquaring = MatrixPowers.integerPower(f.a, n, Progress.NONE).e[from];
        assertArrayEquals(bySquaring, MatrixPowers.vectorSteps(f.a, from, n, Progress.NONE));
        assertArrayEquals(bySquaring, MatrixPowers.vectorStepsBig(f.a, from, n, Progress.NONE, Thread.currentThread()));
    }

    // common practice, no source: P^0 = I, P^1 = P
    @Test
    void zerothPowerIsIdentityAndFirstIsP() {
        RationalMatrix p = RandomChains.stochastic(new Random(3), 5, 20, 0.2);
        assertEquals(RationalMatrix.identity(5), MatrixPowers.power(p, 0));
        assertEquals(p, MatrixPowers.power(p, 1));
        assertArrayEquals(RationalMatrix.identity(5).row(2), MatrixPowers.rowOfPower(p, 2, 0));
        assertEquals(Rational.ONE, MatrixPowers.entryOfPower(p, 4, 4, 0));
    }

    // common practice, no source: exponents past the int range work when entries cannot grow (a permutation)
    @Test
    void permutationToAHugePower() {
        RationalMatrix swap = RationalMatrix.of(new Rational[][] {
            {Rational.ZERO, Rational.ONE, Rational.ZERO},
            {Rational.ZERO, Rational.ZERO, Rational.ONE},
            {Rational.ONE, Rational.ZERO, Rational.ZERO}});
        long n = 3L * 1_000_000_000_000L + 1;
        assertEquals(swap, MatrixPowers.power(swap, n));
        assertEquals(Rational.ONE, MatrixPowers.entryOfPower(swap, 0, 1, n));
    }

    // common practice, no source: the generic squaring route and the two-state closed form agree
    @Property(seed = "2", tries = 40)
    void twoStateClosedFormEqualsSquaring(@ForAll @IntRange(min = 0, max = 40) int a1,
            @ForAll @IntRange(min = 0, max = 40) int b1, @ForAll @IntRange(min = 1, max = 40) int den,
            @ForAll @IntRange(min = 2, max = 90) int n) {
        Rational a = Rational.of(a1 % (den + 1), den);
        Rational b = Rational.of(b1 % (den + 1), den + 3);
        RationalMatrix p = RationalMatrix.of(new Rational[][] {
            {Rational.ONE.subtract(a), a}, {b, Rational.ONE.subtract(b)}});
        CommonDenominatorForm f = CommonDenominatorForm.of(p);
        IntMatrix an = MatrixPowers.integerPower(f.a, n, Progress.NONE);
        KnownDenominator kd = KnownDenominator.power(f.d, n);
        RationalMatrix pn = MatrixPowers.power(p, n);
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                assertEquals(kd.reduce(an.e[i][j]), pn.get(i, j));
            }
        }
    }

    // common practice, no source: preconditions are checked first
    @Test
    void rejectsBadArguments() {
        RationalMatrix rect = RationalMatrix.of(new Rational[][] {{Rational.ONE, Rational.ZERO}});
        RationalMatrix p = RandomChains.stochastic(new Random(1), 3, 5, 0);
        assertThrows(IllegalArgumentException.class, () -> MatrixPowers.power(rect, 2));
        assertThrows(IllegalArgumentException.class, () -> MatrixPowers.power(p, -1));
        assertThrows(IllegalArgumentException.class, () -> MatrixPowers.rowOfPower(p, 0, -1));
        assertThrows(IndexOutOfBoundsException.class, () -> MatrixPowers.rowOfPower(p, 3, 2));
        assertThrows(IndexOutOfBoundsException.class, () -> MatrixPowers.entryOfPower(p, 0, -1, 2));
    }

    // common practice, no source: an interrupted thread stops with the INTERRUPTED key
    @Test
    void interruptStopsWithKey() {
        RationalMatrix p = RandomChains.stochastic(new Random(4), 6, 50, 0.1);
        Thread.currentThread().interrupt();
        try {
            QchainException e = assertThrows(QchainException.class, () -> MatrixPowers.power(p, 40));
            assertEquals(ErrorKey.INTERRUPTED, e.key());
            assertThrows(QchainException.class, () -> MatrixPowers.rowOfPower(p, 0, 40));
        } finally {
            Thread.interrupted();
        }
    }
}
