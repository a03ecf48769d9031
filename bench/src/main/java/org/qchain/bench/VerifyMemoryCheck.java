package org.qchain.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.stream.IntStream;
import org.qchain.exact.Rational;
import org.qchain.exact.floats.Binary64;
import org.qchain.exact.floats.FloatText;
import org.qchain.exact.reference.ReferenceReader;
import org.qchain.exact.reference.Target;
import org.qchain.exact.reference.Tolerance;
import org.qchain.exact.reference.Verifier;
import org.qchain.exact.reference.VerifyReport;

/**
 * Shows that checking a float file needs memory for the target, not for the file's text: writes a {@code size x size}
 * CSV of correctly rounded doubles (one entry one ulp off), then checks it against exact values computed on the fly.
 * Run it with a heap smaller than the file, e.g.
 * {@code java -Xmx64m -cp bench/target/benchmarks.jar org.qchain.bench.VerifyMemoryCheck 2000}.
 */
public final class VerifyMemoryCheck {
    private VerifyMemoryCheck() {
    }

    static Rational truth(int i, int j) {
        return Rational.of(1 + (i * 31L + j * 17L) % 997, 1000L * (7 + (i + j) % 13));
    }

    public static void main(String[] args) throws IOException {
        int size = args.length > 0 ? Integer.parseInt(args[0]) : 2000;
        Path file = Files.createTempFile("qchain-verify-memory", ".csv");
        try {
            try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
                for (int i = 0; i < size; i++) {
                    for (int j = 0; j < size; j++) {
                        double d = Binary64.round(truth(i, j));
                        if (i == size / 2 && j == size / 3) {
                            d = Math.nextUp(d);
                        }
                        w.write(j == 0 ? "" : ",");
                        w.write(FloatText.shortest(d));
                    }
                    w.write("\r\n");
                }
            }
            List<String> names = IntStream.range(0, size).mapToObj(i -> "S" + i).toList();
            String what = "the model has " + size + " states";
            Target target = Target.matrix(names, names, what, what);
            Verifier v = new Verifier(target, VerifyMemoryCheck::truth,
                Tolerance.orDefault(Optional.empty(), Optional.empty(), OptionalLong.of(0)), 10);
            long t0 = System.nanoTime();
            VerifyReport r = v.report(ReferenceReader.read(file, file.getFileName().toString(), target, v));
            long ms = (System.nanoTime() - t0) / 1_000_000;
            Runtime rt = Runtime.getRuntime();
            System.out.printf("file %d MB, %d values checked in %d ms, %d over tolerance (worst %s, %s ulp), max heap %d MB%n",
                Files.size(file) >> 20, r.checked(), ms, r.overTolerance(), r.worst().get(0).label(),
                r.worst().get(0).ulps().orElse(-1), rt.maxMemory() >> 20);
        } finally {
            Files.deleteIfExists(file);
        }
    }
}
