package org.qchain.bench;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.floats.FloatText;
import org.qchain.exact.reference.ReferenceReader;
import org.qchain.exact.reference.Target;
import org.qchain.exact.reference.Tolerance;
import org.qchain.exact.reference.Verifier;
import org.qchain.exact.reference.VerifyReport;

/**
 * Checking floating-point results against the exact ones (issue 11). The float values are what a plain
 * double-precision program computes (repeated vector-matrix products in doubles), written as shortest decimals; the
 * comparison (read the text, parse every value exactly, subtract exactly, decide the tolerance exactly) is set
 * against computing the exact values themselves, in the same run.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class VerifyBench {
    RationalMatrix sparse1000;
    Rational[] exactRow;
    String rowCsv;
    Target rowTarget;
    Rational[][] dense1000;
    Path matrixFile;
    Target matrixTarget;

    @Setup
    public void setup() throws IOException {
        sparse1000 = BenchChains.sparse(1000, 5, 3, BenchChains.DECIMAL_DENOMINATORS);
        List<String> names = IntStream.range(0, 1000).mapToObj(i -> "S" + i).toList();
        exactRow = MatrixPowers.rowOfPower(sparse1000, 0, 100);
        rowTarget = Target.vector(names, "the model has 1000 states");
        rowCsv = toCsv(new double[][] {floatRow(sparse1000, 0, 100)});
        // a dense 1000 x 1000 table of exact values with mixed denominators, and a float file of it
        dense1000 = new Rational[1000][1000];
        double[][] f = new double[1000][1000];
        for (int i = 0; i < 1000; i++) {
            for (int j = 0; j < 1000; j++) {
                dense1000[i][j] = Rational.of(1 + (i * 31L + j * 17L) % 997, 1000L * (7 + (i + j) % 13));
                f[i][j] = dense1000[i][j].doubleValue();
            }
        }
        matrixTarget = Target.matrix(names, names, "the model has 1000 states", "the model has 1000 states");
        matrixFile = Files.createTempFile("qchain-verify-bench", ".csv");
        Files.writeString(matrixFile, toCsv(f), StandardCharsets.UTF_8);
    }

    @TearDown
    public void tearDown() throws IOException {
        Files.deleteIfExists(matrixFile);
    }

    /** Row {@code from} of P^n in doubles, as a floating-point program computes it. */
    static double[] floatRow(RationalMatrix p, int from, int n) {
        int s = p.rows();
        double[][] d = new double[s][s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                d[i][j] = p.get(i, j).doubleValue();
            }
        }
        double[] v = new double[s];
        v[from] = 1;
        for (int k = 0; k < n; k++) {
            double[] w = new double[s];
            for (int i = 0; i < s; i++) {
                if (v[i] != 0) {
                    for (int j = 0; j < s; j++) {
                        w[j] += v[i] * d[i][j];
                    }
                }
            }
            v = w;
        }
        return v;
    }

    static String toCsv(double[][] rows) {
        StringBuilder sb = new StringBuilder();
        for (double[] r : rows) {
            for (int j = 0; j < r.length; j++) {
                sb.append(j == 0 ? "" : ",").append(FloatText.shortest(r[j]));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    private static Tolerance relative() {
        return Tolerance.orDefault(Optional.empty(), Optional.empty(), OptionalLong.empty());
    }

    /** The exact values: row 0 of the 1000-state sparse P^100 (what verify computes before comparing). */
    @Benchmark
    public Rational[] sparse1000RowN100Exact() {
        return MatrixPowers.rowOfPower(sparse1000, 0, 100);
    }

    /** The comparison alone: read the 1000 floats of that row and check them exactly against the exact row. */
    @Benchmark
    public VerifyReport sparse1000RowN100Compare() {
        Verifier v = new Verifier(rowTarget, (i, j) -> exactRow[j], relative(), 10);
        return v.report(ReferenceReader.read("row.csv", new StringReader(rowCsv), rowTarget, v));
    }

    /** A 1000 x 1000 CSV file of floats (about 19 MB) read from disk and checked against exact values. */
    @Benchmark
    @Warmup(iterations = 1, time = 1)
    @Measurement(iterations = 3, time = 1)
    public VerifyReport matrix1000FileCompare() {
        Verifier v = new Verifier(matrixTarget, (i, j) -> dense1000[i][j], relative(), 10);
        return v.report(ReferenceReader.read(matrixFile, "matrix.csv", matrixTarget, v));
    }
}
