package org.qchain.cli.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;

/** Streamed output files stay atomic: all of the text or the old file, never a part (common practice, no source). */
class AtomicStreamTest {
    @TempDir
    Path dir;

    @Test
    void aStreamedFileHoldsEveryPiece() throws IOException {
        Path target = dir.resolve("out.json");
        AtomicFiles.write(target, "--output", w -> {
            for (int i = 0; i < 100_000; i++) {
                w.write(i + "\n");
            }
        });
        List<String> lines = Files.readAllLines(target);
        assertEquals(100_000, lines.size());
        assertEquals("99999", lines.get(99_999));
    }

    @Test
    void aFailureMidwayLeavesTheOldFileAndNoTemporaryFile() throws IOException {
        Path target = dir.resolve("out.json");
        Files.writeString(target, "old\n");
        QchainException e = assertThrows(QchainException.class, () -> AtomicFiles.write(target, "--output", w -> {
            w.write("x".repeat(1 << 20));
            throw new QchainException(ErrorKey.INTERRUPTED);
        }));
        assertEquals(ErrorKey.INTERRUPTED, e.key());
        assertEquals("old\n", Files.readString(target));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList());
        }
    }
}
