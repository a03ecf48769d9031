package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SparseRationalMatrix;

/** The sparse evaluation path gives the dense path's matrix and errors (common practice, no source). */
class SparseChainsTest {

    @Test
    void everyBundledExampleGivesTheDenseMatrix() throws IOException {
        Path dir = Path.of("..", "docs", "examples");
        int seen = 0;
        try (DirectoryStream<Path> files = Files.newDirectoryStream(dir)) {
            for (Path f : files) {
                Model m;
                try {
                    m = ModelParser.parseFile(f);
                } catch (QchainException e) {
                    continue; // an example of bad input (a float matrix for verify); the parser refused it
                }
                if (!m.freeParameters().isEmpty()) {
                    continue;
                }
                SparseRationalMatrix s = Chains.sparseTransitionMatrix(m, Map.of());
                assertEquals(Chains.transitionMatrix(m), s.toDense(), f.toString());
                seen++;
            }
        }
        assertEquals(true, seen >= 5, "examples read: " + seen);
    }

    // a ring of 20,000 states with one transition each: its dense matrix would hold 4 * 10^8 entries
    @Test
    void aLargeRingNeedsNoDenseMatrix() {
        int n = 20_000;
        StringBuilder sb = new StringBuilder("chain discrete\nstates");
        for (int i = 0; i < n; i++) {
            sb.append(" S").append(i);
        }
        sb.append('\n');
        for (int i = 0; i < n; i++) {
            sb.append('S').append(i).append(" S").append((i + 1) % n).append(" 1/3\n");
        }
        Model m = ModelParser.parse("ring.chain", sb.toString());
        SparseRationalMatrix s = Chains.sparseTransitionMatrix(m, Map.of());
        assertEquals(2L * n, s.nonZeroCount());
        assertEquals(Rational.of(2, 3), s.get(7, 7));
        assertEquals(Rational.of(1, 3), s.get(n - 1, 0));
    }

    @Test
    void errorsAreTheSameAsOnTheDensePath() {
        Model m = ModelParser.parse("bad.chain", "chain discrete\nstates A B\nA B 3/4\nA A 1/2\nB A 1\n");
        QchainException e = assertThrows(QchainException.class, () -> Chains.sparseTransitionMatrix(m, Map.of()));
        assertEquals(ErrorKey.ROW_SUM, e.key());
        QchainException d = assertThrows(QchainException.class, () -> Chains.transitionMatrix(m));
        assertEquals(e.getMessage(), d.getMessage());
    }
}
