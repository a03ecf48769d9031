package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The usage example in package-info.java does what its comments say. */
class PackageExampleTest {

    // J. R. Norris, Markov Chains, ch. 1.1 (two-state chain, from memory): P^n(0,0) = b/(a+b) + (1-a-b)^n a/(a+b);
    // with a = 1/10, b = 1/2 that is 5/6 + (2/5)^64 / 6, which shows as 0.833333333333
    @Test
    void exampleValues() {
        RationalMatrix p = RationalMatrix.of(new Rational[][] {
            {Rational.parse("0.9"), Rational.parse("0.1")},
            {Rational.parse("1/2"), Rational.parse("1/2")}});
        SizeEstimate.requireWithin(SizeEstimate.digitsOfPower(p, 64), SizeEstimate.DEFAULT_MAX_DIGITS, "--max-digits");
        RationalMatrix p64 = MatrixPowers.power(p, 64);
        Rational up = MatrixPowers.entryOfPower(p, 0, 0, 64);
        assertEquals(p64.get(0, 0), up);
        assertEquals(Rational.of(5, 6).add(Rational.of(2, 5).pow(64).divide(Rational.of(6))), up);
        assertEquals("0.833333333333", Decimals.format(up, 12));
        List<WeightedPath> top = TopPaths.mostProbable(p, 0, 1, 5, 3);
        assertEquals(3, top.size());
        // best 5-step path 0 -> 1: stay four times (0.9^4) then jump (0.1)
        assertEquals(new WeightedPath(List.of(0, 0, 0, 0, 0, 1), Rational.parse("0.9").pow(4).multiply(Rational.parse("0.1"))),
                top.get(0));
    }
}
