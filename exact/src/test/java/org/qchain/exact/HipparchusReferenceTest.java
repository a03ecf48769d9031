package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.hipparchus.fraction.BigFraction;
import org.hipparchus.fraction.BigFractionField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.FieldMatrix;

/**
 * Reference library: Hipparchus 3.0, {@code Array2DRowFieldMatrix<BigFraction>.power(int)} (exact fractions, a gcd
 * after every operation) must give the same exact {@code P^n}.
 */
class HipparchusReferenceTest {

    // source: reference library Hipparchus 3.0, org.hipparchus.linear.AbstractFieldMatrix#power over BigFractionField
    @Property(seed = "314159", tries = 30)
    void sameExactPowerAsHipparchus(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 8) int size, @ForAll @IntRange(min = 0, max = 40) int n,
            @ForAll boolean signed) {
        Random rnd = new Random(seed);
        RationalMatrix p = signed ? RandomChains.signed(rnd, size, 6, 15) : RandomChains.stochastic(rnd, size, 120, 0.4);
        FieldMatrix<BigFraction> ref = toHipparchus(p).power(n);
        RationalMatrix ours = MatrixPowers.power(p, n);
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                BigFraction x = ref.getEntry(i, j);
                assertEquals(Rational.of(x.getNumerator(), x.getDenominator()), ours.get(i, j), "(" + i + "," + j + ")");
            }
        }
    }

    // reference library: Hipparchus, as above, on the two-state closed-form route and a larger exponent
    @Property(seed = "27", tries = 15)
    void twoStateAgreesWithHipparchus(@ForAll @IntRange(min = 0, max = 30) int a1,
            @ForAll @IntRange(min = 0, max = 30) int b1, @ForAll @IntRange(min = 100, max = 300) int n) {
        Rational a = Rational.of(a1, 30);
        Rational b = Rational.of(b1, 45);
        RationalMatrix p = RationalMatrix.of(new Rational[][] {
            {Rational.ONE.subtract(a), a}, {b, Rational.ONE.subtract(b)}});
        FieldMatrix<BigFraction> ref = toHipparchus(p).power(n);
        RationalMatrix ours = MatrixPowers.power(p, n);
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                BigFraction x = ref.getEntry(i, j);
                assertEquals(Rational.of(x.getNumerator(), x.getDenominator()), ours.get(i, j));
            }
        }
    }

    static FieldMatrix<BigFraction> toHipparchus(RationalMatrix p) {
        BigFraction[][] e = new BigFraction[p.rows()][p.cols()];
        for (int i = 0; i < p.rows(); i++) {
            for (int j = 0; j < p.cols(); j++) {
                e[i][j] = new BigFraction(p.get(i, j).numerator(), p.get(i, j).denominator());
            }
        }
        return new Array2DRowFieldMatrix<>(BigFractionField.getInstance(), e);
    }
}
