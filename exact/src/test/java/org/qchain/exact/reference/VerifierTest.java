package org.qchain.exact.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.Reader;
import java.io.StringReader;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.function.DoubleFunction;
import org.hipparchus.fraction.BigFraction;
import org.hipparchus.fraction.BigFractionField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.FieldLUDecomposition;
import org.hipparchus.linear.FieldMatrix;
import org.junit.jupiter.api.Test;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.floats.Binary64;
import org.qchain.exact.floats.FloatText;

/** Exact comparison of given floating-point values with the exact engine's results. */
class VerifierTest {
    private static final List<String> S3 = List.of("Up", "Worn", "Down");
    private static final Target M3 = Target.matrix(S3, S3, "the model has 3 states", "the model has 3 states");
    /** A pump that wears and is repaired (invented demo data). */
    private static final RationalMatrix PUMP = RationalMatrix.of(new Rational[][] {
        {r("9/10"), r("7/100"), r("3/100")}, {r("0"), r("4/5"), r("1/5")}, {r("2/3"), r("0"), r("1/3")}});

    private static Rational r(String s) {
        return Rational.parse(s);
    }

    private static Tolerance tol(String rel, String abs, Long ulps) {
        return new Tolerance(Optional.ofNullable(rel).map(Rational::parse), Optional.ofNullable(abs).map(Rational::parse),
            ulps == null ? OptionalLong.empty() : OptionalLong.of(ulps));
    }

    private static VerifyReport verify(Target t, Verifier.Truth truth, Tolerance tol, Reader in) {
        Verifier v = new Verifier(t, truth, tol, 5);
        return v.report(ReferenceReader.read("ref.csv", in, t, v));
    }

    /** The matrix written as CSV, each entry's correctly rounded double through {@code text}. */
    private static String csv(RationalMatrix m, DoubleFunction<String> text) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < m.rows(); i++) {
            for (int j = 0; j < m.cols(); j++) {
                sb.append(j == 0 ? "" : ",").append(text.apply(Binary64.round(m.get(i, j))));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    // IEEE 754-2019 binary64: the engine's exact P^20, rounded to doubles and written as shortest decimals or hex
    // floats, is correctly rounded everywhere (0 ulp) and passes a zero-ulp tolerance
    @Test
    void exactResultsRoundedToDoublePassWithZeroUlps() {
        RationalMatrix p20 = MatrixPowers.power(PUMP, 20);
        for (DoubleFunction<String> text : List.<DoubleFunction<String>>of(FloatText::shortest, FloatText::hex)) {
            VerifyReport rep = verify(M3, p20::get, tol(null, null, 0L), new StringReader(csv(p20, text)));
            assertTrue(rep.passed());
            assertTrue(rep.allCorrectlyRounded());
            assertEquals(9, rep.checked());
            assertEquals(0, rep.overTolerance());
            assertEquals(OptionalLong.of(0), rep.worstUlps());
        }
    }

    // IEEE 754-2019: the next double up is one ulp away; the relative error is (x - t)/|t| computed exactly here
    // with Rational arithmetic and rounded, and the entry is named by its states and its place in the file
    @Test
    void oneEntryOneUlpOffIsReportedAtItsPlace() {
        RationalMatrix p20 = MatrixPowers.power(PUMP, 20);
        String[] lines = csv(p20, FloatText::shortest).split("\n");
        String[] row = lines[1].split(",");
        double bumped = Math.nextUp(Binary64.round(p20.get(1, 2)));
        row[2] = FloatText.shortest(bumped);
        lines[1] = String.join(",", row);
        String text = String.join("\n", lines) + "\n";
        VerifyReport rep = verify(M3, p20::get, tol(null, null, 0L), new StringReader(text));
        assertFalse(rep.passed());
        assertEquals(1, rep.overTolerance());
        assertEquals(8, rep.correctlyRounded());
        EntryCheck worst = rep.worst().get(0);
        assertEquals("Worn -> Down", worst.label());
        assertEquals(2, worst.pos().line());
        assertEquals(lines[1].lastIndexOf(',') + 2, worst.pos().column());
        assertEquals(OptionalLong.of(1), worst.ulps());
        Rational t = p20.get(1, 2);
        Rational x = Rational.parse(row[2]);
        assertEquals(Binary64.round(x.subtract(t).divide(t.abs())), worst.relativeError());
        assertEquals(Binary64.round(x.subtract(t)), worst.error());
        assertFalse(worst.pass());
        assertTrue(rep.worst().get(1).pass());
        // the same file passes at one ulp, and at a relative 1e-15
        assertTrue(verify(M3, p20::get, tol(null, null, 1L), new StringReader(text)).passed());
        assertTrue(verify(M3, p20::get, tol("1e-15", null, null), new StringReader(text)).passed());
    }

    // common practice, no source: a value off by a relative 1e-6 fails 1e-9 and passes 1e-5; the worst comes first
    @Test
    void perturbedEntryFailsRelativeTolerance() {
        RationalMatrix p5 = MatrixPowers.power(PUMP, 5);
        Rational[][] e = p5.toArray();
        e[2][0] = e[2][0].multiply(r("1.000001"));
        e[0][1] = e[0][1].multiply(r("1.0000001"));
        String text = csv(RationalMatrix.of(e), FloatText::shortest);
        VerifyReport strict = verify(M3, p5::get, Tolerance.orDefault(Optional.empty(), Optional.empty(),
            OptionalLong.empty()), new StringReader(text));
        assertEquals(2, strict.overTolerance());
        assertEquals("Down -> Up", strict.worst().get(0).label());
        assertEquals("Up -> Worn", strict.worst().get(1).label());
        assertEquals(1e-6, strict.worst().get(0).relativeError(), 1e-15);
        assertEquals(1e-6, strict.worstRelativeError(), 1e-15);
        assertTrue(verify(M3, p5::get, tol("1e-5", null, null), new StringReader(text)).passed());
    }

    // common practice, no source: where the truth is 0 a relative bound demands exactly 0; an absolute bound
    // accepts a tiny value; a value passes when it meets any bound given
    @Test
    void zeroTruthNeedsAnAbsoluteBound() {
        Target t = Target.vector(S3, "the model has 3 states");
        Verifier.Truth truth = (i, j) -> j == 1 ? Rational.ZERO : Rational.of(1, 2);
        String text = "0.5,1e-18,0.5\n";
        VerifyReport rel = verify(t, truth, tol("1e-9", null, null), new StringReader(text));
        assertEquals(1, rel.overTolerance());
        assertEquals(Double.POSITIVE_INFINITY, rel.worst().get(0).relativeError());
        assertTrue(verify(t, truth, tol("1e-9", "1e-15", null), new StringReader(text)).passed());
        assertFalse(verify(t, truth, tol(null, "1e-19", null), new StringReader(text)).passed());
    }

    // IEEE 754-2019: infinities and NaN never pass, whatever the tolerance
    @Test
    void nonFiniteValuesAlwaysFail() {
        Target t = Target.vector(S3, "the model has 3 states");
        VerifyReport rep = verify(t, (i, j) -> Rational.of(1, 3), tol("1", "1", 1000L),
            new StringReader("0.3333333333333333,nan,-inf\n"));
        assertEquals(2, rep.overTolerance());
        assertEquals(2, rep.nonFinite());
        assertFalse(rep.worst().get(0).isFinite());
        assertFalse(rep.allCorrectlyRounded());
        assertEquals(1, rep.correctlyRounded());
    }

    // Grinstead and Snell, Introduction to Probability, ch. 11, Example 11.1: the weather chain's P^2 as the book
    // prints it to three decimals (.438 .188 .375 / .375 .250 .375 / .375 .188 .438, from memory) passes an
    // absolute tolerance of half a unit in the third decimal and fails a tighter one
    @Test
    void publishedThreeDecimalTablePassesAtItsDigits() {
        List<String> w = List.of("Rain", "Nice", "Snow");
        Target t = Target.matrix(w, w, "the model has 3 states", "the model has 3 states");
        RationalMatrix weather = RationalMatrix.of(new Rational[][] {
            {r("1/2"), r("1/4"), r("1/4")}, {r("1/2"), r("0"), r("1/2")}, {r("1/4"), r("1/4"), r("1/2")}});
        RationalMatrix p2 = MatrixPowers.power(weather, 2);
        String book = "Rain,Nice,Snow\n.438,.188,.375\n.375,.250,.375\n.375,.188,.438\n";
        VerifyReport ok = verify(t, p2::get, tol(null, "0.0005", null), new StringReader(book));
        assertTrue(ok.passed());
        assertEquals(9, ok.checked());
        VerifyReport tight = verify(t, p2::get, tol(null, "0.0001", null), new StringReader(book));
        assertEquals(4, tight.overTolerance());
    }

    // Grinstead and Snell, Introduction to Probability, ch. 11, section 11.2 (absorbing chains), the drunkard's walk
    // on corners 0..4 with steps of probability 1/2 and absorption at 0 and 4: the book shows the absorption
    // probabilities B = [.75 .25; .5 .5; .25 .75] and the expected steps t = (3, 4, 3) (from memory). The exact
    // values here come from the reference library Hipparchus 3.0 (FieldLUDecomposition over BigFraction,
    // B = (I - Q)^-1 R), not from qchain's own engine
    @Test
    void drunkardsWalkAbsorptionAtTheBooksDigits() {
        BigFraction h = new BigFraction(1, 2);
        BigFraction z = BigFraction.ZERO;
        FieldMatrix<BigFraction> q = new Array2DRowFieldMatrix<>(new BigFraction[][] {{z, h, z}, {h, z, h}, {z, h, z}});
        FieldMatrix<BigFraction> rr = new Array2DRowFieldMatrix<>(new BigFraction[][] {{h, z}, {z, z}, {z, h}});
        FieldMatrix<BigFraction> iq = new Array2DRowFieldMatrix<BigFraction>(BigFractionField.getInstance(), 3, 3)
            .scalarAdd(z);
        for (int i = 0; i < 3; i++) {
            iq.setEntry(i, i, BigFraction.ONE);
        }
        FieldMatrix<BigFraction> n = new FieldLUDecomposition<>(iq.subtract(q)).getSolver().getInverse();
        FieldMatrix<BigFraction> b = n.multiply(rr);
        Target t = Target.matrix(List.of("c1", "c2", "c3"), List.of("c0", "c4"),
            "the chain has 3 transient states", "the chain has 2 absorbing states");
        String book = ",c0,c4\nc1,.75,.25\nc2,.5,.5\nc3,.25,.75\n";
        VerifyReport rep = verify(t, (i, j) -> Rational.of(b.getEntry(i, j).getNumerator(),
            b.getEntry(i, j).getDenominator()), tol(null, null, 0L), new StringReader(book));
        assertTrue(rep.passed());
        assertTrue(rep.allCorrectlyRounded());
        assertEquals(6, rep.checked());
        Target steps = Target.vector(List.of("c1", "c2", "c3"), "the chain has 3 transient states");
        VerifyReport st = verify(steps, (i, j) -> {
            BigFraction s = n.getEntry(j, 0).add(n.getEntry(j, 1)).add(n.getEntry(j, 2));
            return Rational.of(s.getNumerator(), s.getDenominator());
        }, tol(null, null, 0L), new StringReader("3\n4\n3\n"));
        assertTrue(st.passed());
        assertFalse(verify(steps, (i, j) -> Rational.of(j == 1 ? 4 : 3), tol(null, null, 0L),
            new StringReader("3\n4.000000000000001\n3\n")).passed());
    }

    // common practice, no source: the reader never needs the whole text: 200 x 200 values generated on the fly
    @Test
    void readsAStreamThatIsNeverWhole() {
        int size = 200;
        List<String> names = java.util.stream.IntStream.range(0, size).mapToObj(i -> "S" + i).toList();
        Target t = Target.matrix(names, names, "the model has 200 states", "the model has 200 states");
        String other = FloatText.shortest(Binary64.round(Rational.of(1, 398)));
        Reader gen = new Reader() {
            private int row;
            private String pending = "";
            private int at;

            @Override
            public int read(char[] cbuf, int off, int len) {
                if (at == pending.length()) {
                    if (row == size) {
                        return -1;
                    }
                    StringBuilder sb = new StringBuilder();
                    for (int j = 0; j < size; j++) {
                        sb.append(j == 0 ? "" : ",").append(j == row ? "0.5" : other);
                    }
                    pending = sb.append("\r\n").toString();
                    at = 0;
                    row++;
                }
                int k = Math.min(len, pending.length() - at);
                pending.getChars(at, at + k, cbuf, off);
                at += k;
                return k;
            }

            @Override
            public void close() {
            }
        };
        long[] last = new long[2];
        Verifier v = new Verifier(t, (i, j) -> i == j ? Rational.of(1, 2) : Rational.of(1, 398), tol(null, null, 0L), 5,
            (phase, done, total) -> {
                last[0] = done;
                last[1] = total;
            });
        VerifyReport rep = v.report(ReferenceReader.read("gen.csv", gen, t, v));
        assertEquals(40_000, rep.checked());
        assertTrue(rep.passed(), () -> rep.worst().toString());
        assertEquals(40_000 / 4096 * 4096, last[0]);
        assertEquals(40_000, last[1]);
    }

    // common practice, no source: an interrupted check stops with the INTERRUPTED key (Ctrl-C in the CLI)
    @Test
    void interruptStopsTheCheck() {
        StringBuilder sb = new StringBuilder();
        for (int k = 0; k < 5000; k++) {
            sb.append("0.5\n");
        }
        List<String> names = java.util.stream.IntStream.range(0, 5000).mapToObj(i -> "S" + i).toList();
        Target t = Target.vector(names, "the model has 5000 states");
        Verifier v = new Verifier(t, (i, j) -> Rational.of(1, 2), tol(null, null, 0L), 5, (p, d, n) -> { });
        Thread.currentThread().interrupt();
        try {
            org.qchain.exact.QchainException e = org.junit.jupiter.api.Assertions.assertThrows(
                org.qchain.exact.QchainException.class, () -> ReferenceReader.read("x.csv", new StringReader(sb.toString()), t, v));
            assertEquals(org.qchain.exact.ErrorKey.INTERRUPTED, e.key());
        } finally {
            Thread.interrupted();
        }
    }

    // common practice, no source: P^n's rows computed on demand equal the whole power (MatrixPowers, itself checked
    // against Hipparchus), on a chain small enough for the whole power and one large enough for row by row
    @Test
    void powerRowsEqualTheWholePower() {
        java.util.Random rnd = new java.util.Random(4);
        for (int size : new int[] {5, 70}) {
            Rational[][] e = new Rational[size][size];
            for (int i = 0; i < size; i++) {
                int a = rnd.nextInt(size);
                int b = (a + 1 + rnd.nextInt(size - 1)) % size;
                for (int j = 0; j < size; j++) {
                    e[i][j] = j == a ? Rational.of(3, 10) : j == b ? Rational.of(7, 10) : Rational.ZERO;
                }
            }
            RationalMatrix m = RationalMatrix.of(e);
            RationalMatrix p7 = MatrixPowers.power(m, 7);
            PowerRows rows = new PowerRows(m, 7, org.qchain.exact.Progress.NONE);
            for (int k = 0; k < 200; k++) {
                int i = rnd.nextInt(size);
                int j = rnd.nextInt(size);
                assertEquals(p7.get(i, j), rows.get(i, j));
            }
        }
    }
}
