package org.qchain.exact.certified;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SparseRationalMatrix;

/** The usage example in package-info.java does what its comments say. */
class PackageExampleTest {

    // J. R. Norris, Markov Chains, ch. 1.1 (two-state chain, from memory): P^n(0,1) = a/(a+b) - (1-a-b)^n a/(a+b);
    // with a = 1/10, b = 1/2 and n = 10^6 that is 1/6 minus (2/5)^1000000 / 6, far below the 12th digit
    @Test
    void exampleValues() {
        SparseRationalMatrix p = SparseRationalMatrix.of(RationalMatrix.of(new Rational[][] {
            {Rational.parse("0.9"), Rational.parse("0.1")},
            {Rational.parse("1/2"), Rational.parse("1/2")}}));
        CertifiedDecimal[] row = CertifiedPowers.row(p, 0, 1_000_000, CertifiedPowers.Settings.of(12), Progress.NONE);
        assertEquals("0.166666666667", row[1].text());
        assertEquals("0.833333333333", row[0].text());
        assertEquals(CertifiedDecimal.Status.CERTIFIED, row[1].status());
        assertTrue(row[1].enclosure().width().compareTo(Rational.parse("1e-20")) < 0);
    }
}
