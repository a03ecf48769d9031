package org.qchain.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.qchain.exact.RationalMatrix;

/**
 * Writes the chains of the speed issue's table as model files for whole-process timings ({@code
 * bench/whole-process.sh}): the same fixed seeds as {@link Issue13Bench}.
 *
 * <p>Usage: {@code java -cp bench/target/benchmarks.jar org.qchain.bench.Issue13Chains DIR}.
 */
public final class Issue13Chains {
    private Issue13Chains() {
    }

    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "bench/target/chains");
        Files.createDirectories(dir);
        write(dir.resolve("dense20.chain"), BenchChains.dense(20, 1, BenchChains.range(20, 240)),
            "20 states, dense, row denominators in [20, 240] (seed 1)");
        write(dir.resolve("dense50.chain"), BenchChains.dense(50, 1, BenchChains.range(50, 240)),
            "50 states, dense, row denominators in [50, 240] (seed 1)");
        write(dir.resolve("sparse100.chain"), BenchChains.sparse(100, 5, 2, BenchChains.DECIMAL_DENOMINATORS),
            "100 states, 5 transitions a row, decimal probabilities (seed 2)");
        write(dir.resolve("sparse1000.chain"), BenchChains.sparse(1000, 5, 3, BenchChains.DECIMAL_DENOMINATORS),
            "1000 states, 5 transitions a row, decimal probabilities (seed 3)");
        write(dir.resolve("closed12.chain"),
            BenchChains.dense(12, BenchChains.CLOSED_12_SEED, BenchChains.CLOSED_DENOMINATORS),
            "12 states, dense, row denominators 60, 120 or 240 (the closed-form benchmark's chain)");
        write(dir.resolve("closed20.chain"),
            BenchChains.dense(20, BenchChains.CLOSED_20_SEED, BenchChains.CLOSED_DENOMINATORS),
            "20 states, dense, row denominators 60, 120 or 240 (the closed-form benchmark's chain)");
    }

    /** States S0, S1, ...; every non-zero entry as a transition line, the diagonal included. */
    static void write(Path file, RationalMatrix p, String what) throws IOException {
        StringBuilder sb = new StringBuilder("# benchmark chain (invented): ").append(what).append('\n');
        sb.append("chain discrete\nstates");
        for (int i = 0; i < p.rows(); i++) {
            sb.append(" S").append(i);
        }
        sb.append('\n');
        for (int i = 0; i < p.rows(); i++) {
            for (int j = 0; j < p.cols(); j++) {
                if (!p.get(i, j).isZero()) {
                    sb.append('S').append(i).append(" S").append(j).append(' ').append(p.get(i, j)).append('\n');
                }
            }
        }
        Files.writeString(file, sb.toString());
    }
}
