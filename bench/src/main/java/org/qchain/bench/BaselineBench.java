package org.qchain.bench;

import java.util.concurrent.TimeUnit;
import org.hipparchus.fraction.BigFraction;
import org.hipparchus.linear.FieldMatrix;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The baseline: Hipparchus {@code Array2DRowFieldMatrix<BigFraction>.power(n)} (exact, a gcd after every operation)
 * on the same chains as {@link ExactEngineBench}. Single-shot: one call takes seconds.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 2)
@Fork(1)
public class BaselineBench {
    FieldMatrix<BigFraction> dense20;
    FieldMatrix<BigFraction> sparse100;

    @Setup
    public void setup() {
        dense20 = BenchChains.toHipparchus(BenchChains.dense(20, 1, BenchChains.DIVISORS_OF_240));
        sparse100 = BenchChains.toHipparchus(BenchChains.sparse(100, 5, 2, BenchChains.DECIMAL_DENOMINATORS));
    }

    /** Baseline for {@link ExactEngineBench#dense20PowerN256()}. */
    @Benchmark
    public FieldMatrix<BigFraction> dense20PowerN256() {
        return dense20.power(256);
    }

    /** The same chain at n = 64 (a smaller baseline point). */
    @Benchmark
    public FieldMatrix<BigFraction> dense20PowerN64() {
        return dense20.power(64);
    }

    /** Baseline for the 100-state case at n = 16 (n = 64 took about 3 minutes in a one-shot probe). */
    @Benchmark
    public FieldMatrix<BigFraction> sparse100PowerN16() {
        return sparse100.power(16);
    }
}
