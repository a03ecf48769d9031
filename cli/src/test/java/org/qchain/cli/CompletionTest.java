package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The bash completion script comes from the command definitions (picocli's AutoComplete), and the committed copy is
 * current; common practice, no source.
 */
class CompletionTest {
    /** The committed copy; regenerate with: ./qchain completion > cli/src/main/completion/qchain-completion.bash */
    private static final Path COMMITTED = Path.of("src/main/completion/qchain-completion.bash");

    @Test
    void scriptCompletesCommandsOptionsAndFormats() {
        Cli.Result r = Cli.run("completion");
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err());
        assertTrue(r.out().startsWith("#!/usr/bin/env bash"), r::toString);
        assertTrue(r.out().contains("complete -F _complete_qchain"), r::toString);
        for (String word : new String[] {"step", "check", "demo", "completion", "--max-digits", "--paths", "--at",
            "(\"text\" \"json\" \"csv\" \"markdown\" \"latex\")"}) {
            assertTrue(r.out().contains(word), () -> "missing " + word);
        }
    }

    @Test
    void committedCopyIsTheGeneratedScript() throws IOException {
        String committed = Files.readString(COMMITTED, StandardCharsets.UTF_8);
        assertEquals(committed, Cli.run("completion").out(),
            "regenerate: ./qchain completion > cli/src/main/completion/qchain-completion.bash");
    }

    @Test
    void scriptIsValidBash() throws IOException, InterruptedException {
        Path tmp = Files.createTempFile("qchain-completion", ".bash");
        try {
            Files.writeString(tmp, Cli.run("completion").out());
            Process p = new ProcessBuilder("bash", "-n", tmp.toString()).redirectErrorStream(true).start();
            String msg = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            assertEquals(0, p.waitFor(), msg);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
