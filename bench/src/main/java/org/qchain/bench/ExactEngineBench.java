package org.qchain.bench;

import java.util.concurrent.TimeUnit;
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
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/**
 * The exact engine on the cases of the foundation issue. Each chain comes from a fixed seed ({@link BenchChains}).
 * The baseline (Hipparchus {@code FieldMatrix<BigFraction>.power}) lives in {@link BaselineBench} because one call
 * takes seconds to minutes.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class ExactEngineBench {
    RationalMatrix dense20;
    RationalMatrix dense20Wide;
    RationalMatrix sparse100;
    RationalMatrix twoState;
    RationalMatrix sparse1000;

    @Setup
    public void setup() {
        dense20 = BenchChains.dense(20, 1, BenchChains.DIVISORS_OF_240);
        dense20Wide = BenchChains.dense(20, 1, BenchChains.range(20, 240));
        sparse100 = BenchChains.sparse(100, 5, 2, BenchChains.DECIMAL_DENOMINATORS);
        twoState = RationalMatrix.of(new Rational[][] {
            {Rational.parse("0.9"), Rational.parse("0.1")}, {Rational.parse("0.05"), Rational.parse("0.95")}});
        sparse1000 = BenchChains.sparse(1000, 5, 3, BenchChains.DECIMAL_DENOMINATORS);
    }

    /** 20 states, dense, row denominators dividing 240 (common denominator 240), full P^256. */
    @Benchmark
    public RationalMatrix dense20PowerN256() {
        return MatrixPowers.power(dense20, 256);
    }

    /** The same chain at n = 64 (pairs with the baseline's second point). */
    @Benchmark
    public RationalMatrix dense20PowerN64() {
        return MatrixPowers.power(dense20, 64);
    }

    /** 20 states, dense, row denominators anywhere in [20, 240] (common denominator about 4e24), full P^256. */
    @Benchmark
    public RationalMatrix dense20WidePowerN256() {
        return MatrixPowers.power(dense20Wide, 256);
    }

    /** One row of the 20-state P^256 (path sums). */
    @Benchmark
    public Rational[] dense20RowN256() {
        return MatrixPowers.rowOfPower(dense20, 0, 256);
    }

    /** 100 states, 5 transitions per row, decimal probabilities (denominators 10 to 1000), full P^64. */
    @Benchmark
    public RationalMatrix sparse100PowerN64() {
        return MatrixPowers.power(sparse100, 64);
    }

    /** The 100-state chain at n = 16 (pairs with the baseline, which takes minutes at n = 64). */
    @Benchmark
    public RationalMatrix sparse100PowerN16() {
        return MatrixPowers.power(sparse100, 16);
    }

    /** 2 states, a = 1/10, b = 1/20, full P^1,000,000 (entries of about 1.3 million digits). */
    @Benchmark
    public RationalMatrix twoStatePowerN1e6() {
        return MatrixPowers.power(twoState, 1_000_000);
    }

    /** One entry of P^1000 for 1000 states, 5 transitions per row, decimal probabilities (path sums). */
    @Benchmark
    public Rational sparse1000EntryN1000() {
        return MatrixPowers.entryOfPower(sparse1000, 0, 500, 1000);
    }
}
