package org.qchain.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.qchain.exact.DecimalText;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SparseRationalMatrix;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.certified.CertifiedPowers;

/**
 * The exact-work rows of the issue on speed near the limit, each with its in-run baseline:
 * <ul>
 * <li>whole powers of dense chains (20 states, row denominators in [20, 240], P^256 and P^1024; 50 states, row
 * denominators in [50, 240], P^64) with the multi-modular engine where it applies ({@code modular=auto}) and with the
 * direct BigInteger engine ({@code modular=never}, the old engine);</li>
 * <li>the decimal text of the 400 entries of the 20-state P^256 (about 5 million digits): {@code BigInteger.toString}
 * (the old way) against {@link DecimalText}, one thread and all cores;</li>
 * <li>certified decimals (12 digits) of one entry of the 100-state sparse chain at n = 10^6 and of one row of the
 * 1000-state sparse chain at n = 10^6, whose exact values (billions of digits) the exact engine refuses.</li>
 * </ul>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class Issue13Bench {
    @Param({"auto", "never"})
    public String modular;

    RationalMatrix dense20Wide;
    RationalMatrix dense50;
    Rational[] entries;
    SparseRationalMatrix sparse100;
    SparseRationalMatrix sparse1000;

    @Setup
    public void setup() {
        System.setProperty("qchain.exact.modular", modular);
        dense20Wide = BenchChains.dense(20, 1, BenchChains.range(20, 240));
        dense50 = BenchChains.dense(50, 1, BenchChains.range(50, 240));
        RationalMatrix p256 = MatrixPowers.power(dense20Wide, 256);
        entries = new Rational[400];
        for (int i = 0; i < 20; i++) {
            for (int j = 0; j < 20; j++) {
                entries[20 * i + j] = p256.get(i, j);
            }
        }
        sparse100 = SparseRationalMatrix.of(BenchChains.sparse(100, 5, 2, BenchChains.DECIMAL_DENOMINATORS));
        sparse1000 = SparseRationalMatrix.of(BenchChains.sparse(1000, 5, 3, BenchChains.DECIMAL_DENOMINATORS));
    }

    /** Row 1 of the issue's table: 20 states, dense, P^256, every entry reduced. */
    @Benchmark
    public RationalMatrix dense20PowerN256() {
        return MatrixPowers.power(dense20Wide, 256);
    }

    /** Row 2: 50 states, dense, P^64. */
    @Benchmark
    public RationalMatrix dense50PowerN64() {
        return MatrixPowers.power(dense50, 64);
    }

    /** A larger power of row 1's chain (entries of about 84,000 bits), where the modular engine should win. */
    @Benchmark
    public RationalMatrix dense20PowerN1024() {
        return MatrixPowers.power(dense20Wide, 1024);
    }

    /** The old text conversion: {@code Rational.toString} (Java's {@code BigInteger.toString}). */
    @Benchmark
    public long textJdk() {
        long chars = 0;
        for (Rational r : entries) {
            chars += r.toString().length();
        }
        return chars;
    }

    /** {@link DecimalText#toString(Rational)}, one thread. */
    @Benchmark
    public long textDivideAndConquer() {
        long chars = 0;
        for (Rational r : entries) {
            chars += DecimalText.toString(r).length();
        }
        return chars;
    }

    /** {@link DecimalText#toStrings}, all cores. */
    @Benchmark
    public long textDivideAndConquerParallel() {
        long chars = 0;
        for (String s : DecimalText.toStrings(entries)) {
            chars += s.length();
        }
        return chars;
    }

    /** Row 3: 100 states, 5 transitions a row, entry S0 -> S1 of P^1,000,000, 12 certified digits. */
    @Benchmark
    public CertifiedDecimal certifiedSparse100EntryN1e6() {
        return CertifiedPowers.entry(sparse100, 0, 1, 1_000_000, CertifiedPowers.Settings.of(12), Progress.NONE);
    }

    /** One row of a 1000-state sparse chain at n = 10^6, 12 certified digits. */
    @Benchmark
    public CertifiedDecimal[] certifiedSparse1000RowN1e6() {
        return CertifiedPowers.row(sparse1000, 0, 1_000_000, CertifiedPowers.Settings.of(12), Progress.NONE);
    }
}
