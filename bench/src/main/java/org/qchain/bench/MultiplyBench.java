package org.qchain.bench;

import java.math.BigInteger;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.apfloat.Apint;
import org.apfloat.ApintMath;
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

/**
 * {@link BigInteger} against apfloat {@link Apint} for one large multiplication and for an integer power, with and
 * without the conversions between the two (radix 16, the cheap direction per the library notes). Decides where the
 * exact engine switches to apfloat.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1, time = 1)
@Measurement(iterations = 3, time = 1)
@Fork(1)
public class MultiplyBench {
    /** Decimal digits of each operand (and of the power's result). */
    @Param({"10000", "100000", "1000000", "4000000"})
    public int digits;

    BigInteger a;
    BigInteger b;
    Apint a16;
    Apint b16;
    Apint product16;
    int exponent;
    static final BigInteger BASE = BigInteger.valueOf(19);

    @Setup
    public void setup() {
        Random rnd = new Random(42);
        int bits = (int) Math.ceil(digits * Math.log(10) / Math.log(2));
        a = new BigInteger(bits, rnd).setBit(bits - 1);
        b = new BigInteger(bits, rnd).setBit(bits - 1);
        a16 = new Apint(a, 16);
        b16 = new Apint(b, 16);
        product16 = a16.multiply(b16);
        exponent = (int) (digits / Math.log10(19));
    }

    /** {@code BigInteger.multiply} (Karatsuba / Toom-Cook 3 in Java 17). */
    @Benchmark
    public BigInteger multiplyBigInteger() {
        return a.multiply(b);
    }

    /** {@code Apint.multiply} on operands already in apfloat (radix 16); no conversion. */
    @Benchmark
    public Apint multiplyApintOnly() {
        return a16.multiply(b16);
    }

    /** Convert both operands to {@code Apint} (radix 16), multiply, convert the product back. */
    @Benchmark
    public BigInteger multiplyApintWithConversions() {
        return new Apint(a, 16).multiply(new Apint(b, 16)).toBigInteger();
    }

    /** The conversion in alone: one operand, {@code new Apint(BigInteger, 16)}. */
    @Benchmark
    public Apint convertToApint16() {
        return new Apint(a, 16);
    }

    /** The conversion out alone: a product of twice the digits, {@code Apint.toBigInteger()}. */
    @Benchmark
    public BigInteger convertProductToBigInteger() {
        return product16.toBigInteger();
    }

    /** {@code 19^e} with about {@code digits} digits, {@code BigInteger.pow}. */
    @Benchmark
    public BigInteger powBigInteger() {
        return BASE.pow(exponent);
    }

    /** {@code 19^e} by {@code ApintMath.pow} in radix 16, converted to {@code BigInteger} at the end. */
    @Benchmark
    public BigInteger powApintWithConversion() {
        return ApintMath.pow(new Apint(19, 16), exponent).toBigInteger();
    }
}
