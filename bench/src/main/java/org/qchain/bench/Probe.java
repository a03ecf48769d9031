package org.qchain.bench;

import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SizeEstimate;

/** Quick one-shot timings while developing (the figures of record come from the JMH benchmarks). */
public final class Probe {
    private Probe() {
    }

    public static void main(String[] args) {
        String which = args.length > 0 ? args[0] : "all";
        if (which.equals("all") || which.equals("dense")) {
            RationalMatrix p = BenchChains.dense(20, 1, BenchChains.DIVISORS_OF_240);
            time("dense20 d|240 n=256", () -> MatrixPowers.power(p, 256));
            System.out.println("  est digits " + SizeEstimate.digitsOfPower(p, 256));
            RationalMatrix w = BenchChains.dense(20, 1, BenchChains.range(20, 240));
            System.out.println("  wide est digits " + SizeEstimate.digitsOfPower(w, 256));
            time("dense20 den in [20,240] n=256", () -> MatrixPowers.power(w, 256));
            time("dense20 d|240 row n=256", () -> MatrixPowers.rowOfPower(p, 0, 256));
        }
        if (which.equals("all") || which.equals("sparse")) {
            RationalMatrix s = BenchChains.sparse(100, 5, 2, new int[] {10, 20, 50, 100, 1000});
            System.out.println("  sparse est digits " + SizeEstimate.digitsOfPower(s, 64));
            time("sparse100 n=64", () -> MatrixPowers.power(s, 64));
        }
        if (which.equals("all") || which.equals("two")) {
            RationalMatrix t = RationalMatrix.of(new Rational[][] {
                {Rational.parse("0.9"), Rational.parse("0.1")}, {Rational.parse("0.05"), Rational.parse("0.95")}});
            time("two-state n=1e6", () -> MatrixPowers.power(t, 1_000_000));
        }
        if (which.equals("all") || which.equals("entry")) {
            RationalMatrix s = BenchChains.sparse(1000, 5, 3, new int[] {10, 20, 50, 100, 1000});
            System.out.println("  entry est row digits " + SizeEstimate.digitsOfRow(s, 0, 1000));
            time("sparse1000 entry n=1000", () -> MatrixPowers.entryOfPower(s, 0, 500, 1000));
        }
    }

    static void time(String label, Runnable r) {
        for (int i = 0; i < 3; i++) {
            long t0 = System.nanoTime();
            r.run();
            System.out.printf("%s: %.1f ms%n", label, (System.nanoTime() - t0) / 1e6);
        }
    }
}
