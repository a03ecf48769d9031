package org.qchain.bench;

import org.qchain.exact.MatrixPowers;
import org.qchain.exact.RationalMatrix;

/**
 * One-shot timing of the Hipparchus baseline and the engine on one case, for baseline points too slow to repeat in
 * JMH (minutes per call). Usage: {@code java -cp bench/target/benchmarks.jar org.qchain.bench.OneShotBaseline CASE N}
 * with CASE one of {@code dense20}, {@code dense20wide}, {@code sparse100}. Prints wall-clock times of one call each
 * (engine after two warm-up calls); JMH figures remain the ones of record.
 */
public final class OneShotBaseline {
    private OneShotBaseline() {
    }

    /**
     * Runs the case.
     *
     * @param args case name and exponent
     */
    public static void main(String[] args) {
        RationalMatrix p;
        switch (args[0]) {
            case "dense20":
                p = BenchChains.dense(20, 1, BenchChains.DIVISORS_OF_240);
                break;
            case "dense20wide":
                p = BenchChains.dense(20, 1, BenchChains.range(20, 240));
                break;
            case "sparse100":
                p = BenchChains.sparse(100, 5, 2, BenchChains.DECIMAL_DENOMINATORS);
                break;
            default:
                throw new IllegalArgumentException("unknown case " + args[0]);
        }
        int n = Integer.parseInt(args[1]);
        for (int i = 0; i < 3; i++) {
            MatrixPowers.power(p, n);
        }
        long t0 = System.nanoTime();
        RationalMatrix ours = MatrixPowers.power(p, n);
        long t1 = System.nanoTime();
        var ref = BenchChains.toHipparchus(p).power(n);
        long t2 = System.nanoTime();
        boolean same = ours.get(0, 0).numerator().equals(ref.getEntry(0, 0).getNumerator())
                && ours.get(0, 0).denominator().equals(ref.getEntry(0, 0).getDenominator());
        System.out.printf("%s n=%d engine %.1f ms, hipparchus %.1f ms, ratio %.0fx, entry (0,0) equal: %b%n", args[0], n,
                (t1 - t0) / 1e6, (t2 - t1) / 1e6, (double) (t2 - t1) / (t1 - t0), same);
    }
}
