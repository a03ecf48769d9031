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
 * The engine with its apfloat paths on (the measured thresholds, {@code auto}) and off ({@code never}), in separate
 * forks since the switch is read once per JVM: the two-state case (integer powers of about 1.3 million digits) and
 * a three-state chain whose last squaring has operands of about a million digits.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class ApintSwitchBench {
    RationalMatrix twoState;
    RationalMatrix threeState;

    @Setup
    public void setup() {
        twoState = RationalMatrix.of(new Rational[][] {
            {Rational.parse("0.9"), Rational.parse("0.1")}, {Rational.parse("0.05"), Rational.parse("0.95")}});
        threeState = RationalMatrix.of(new Rational[][] {
            {Rational.parse("0.9"), Rational.parse("0.07"), Rational.parse("0.03")},
            {Rational.parse("0.05"), Rational.parse("0.9"), Rational.parse("0.05")},
            {Rational.parse("0.2"), Rational.parse("0.001"), Rational.parse("0.799")}});
    }

    /** Two states, n = 1,000,000, apfloat where the thresholds say. */
    @Benchmark
    @Fork(value = 1, jvmArgsAppend = "-Dqchain.exact.apint=auto")
    public RationalMatrix twoStateN1e6Auto() {
        return MatrixPowers.power(twoState, 1_000_000);
    }

    /** Two states, n = 1,000,000, BigInteger only. */
    @Benchmark
    @Fork(value = 1, jvmArgsAppend = "-Dqchain.exact.apint=never")
    public RationalMatrix twoStateN1e6BigIntegerOnly() {
        return MatrixPowers.power(twoState, 1_000_000);
    }

    /** Three states, n = 700,000 (entries of about 2.1 million digits), apfloat where the thresholds say. */
    @Benchmark
    @Warmup(iterations = 0)
    @Measurement(iterations = 2)
    @Fork(value = 1, jvmArgsAppend = "-Dqchain.exact.apint=auto")
    public RationalMatrix threeStateN700kAuto() {
        return MatrixPowers.power(threeState, 700_000);
    }

    /** Three states, n = 700,000, BigInteger only. */
    @Benchmark
    @Warmup(iterations = 0)
    @Measurement(iterations = 2)
    @Fork(value = 1, jvmArgsAppend = "-Dqchain.exact.apint=never")
    public RationalMatrix threeStateN700kBigIntegerOnly() {
        return MatrixPowers.power(threeState, 700_000);
    }
}
