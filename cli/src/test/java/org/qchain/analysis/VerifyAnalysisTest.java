package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.floats.Binary64;
import org.qchain.exact.floats.FloatText;
import org.qchain.result.VerifyResult;

/** {@code verify} as a Java library call, without the command line. */
class VerifyAnalysisTest {
    /** A two-state line that breaks down and is repaired (invented demo data). */
    private static final String LINE = "chain discrete\nstates Running Stopped\nRunning Stopped 1/8\nStopped Running 2/3\n";

    // the two-state closed form P^n = (1/(a+b)) [[b, a], [b, a]] + ((1-a-b)^n/(a+b)) [[a, -a], [-b, b]]
    // (common practice, no source; also in MatrixPowers): P^3(Running -> Stopped) = (a/(a+b)) (1 - (1-a-b)^3)
    @Test
    void rowOfAPowerCheckedFromJava(@TempDir Path dir) throws IOException {
        Rational a = Rational.of(1, 8);
        Rational b = Rational.of(2, 3);
        Rational r = Rational.ONE.subtract(a).subtract(b);
        Rational stopped = a.divide(a.add(b)).multiply(Rational.ONE.subtract(r.pow(3)));
        Rational running = Rational.ONE.subtract(stopped);
        Path file = dir.resolve("row.csv");
        Files.writeString(file, "Running,Stopped\n" + FloatText.shortest(Binary64.round(running)) + ","
            + FloatText.shortest(Math.nextUp(Binary64.round(stopped))) + "\n");
        LoadedModel model = LoadedModel.fromText("line.chain", LINE);
        VerifyQuery q = VerifyQuery.power(file, 3, Optional.of("Running"), Optional.empty());
        VerifyResult res = Analysis.verify(model, q, Progress.NONE);
        assertTrue(res.passed(), "one ulp is within the default relative 1e-9");
        assertEquals(2, res.report().checked());
        assertEquals(1, res.report().correctlyRounded());
        assertEquals("Stopped", res.report().worst().get(0).label());
        assertEquals(1, res.report().worst().get(0).ulps().getAsLong());
        VerifyResult strict = Analysis.verify(model, q.withTolerance(new org.qchain.exact.reference.Tolerance(
            Optional.empty(), Optional.empty(), java.util.OptionalLong.of(0))), Progress.NONE);
        assertFalse(strict.passed());
    }
}
