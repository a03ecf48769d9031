package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code --max-input-digits} and {@code --max-dense-states}: the exact module refuses a too long number or a too
 * large dense matrix before any work, and the command line adds the option that raises the limit. The limits are
 * the project's (docs/model-format.md); the arithmetic is common practice, no source.
 */
class InputLimitsOptionsTest {
    @TempDir
    Path dir;

    private String write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p.toString();
    }

    @Test
    void aTooLongNumberNamesTheOptionThatRaisesTheLimit() throws IOException {
        String den = "1" + "0".repeat(10_000);
        String m = write("long.chain", "states A B\nA B 1/" + den + "\n");
        Cli.Result r = Cli.run("step", m, "-n", "1", "--from", "A", "--to", "B");
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: " + m + ":2:7: the number '100000000000000000000000... (10001 characters)' has 10001"
            + " digits, more than the limit of 10000 digits for one number; raise it with --max-input-digits",
            r.errLines()[0]);
        Cli.Result ok = Cli.run("step", m, "-n", "1", "--from", "A", "--to", "B", "--max-input-digits", "10001");
        assertEquals(0, ok.code(), ok::toString);
        assertTrue(ok.out().contains("1/" + den), ok.out().substring(0, 200));
    }

    @Test
    void aTooLargeDenseMatrixIsRefusedBeforeWorkAndTheLimitCanBeRaised() throws IOException {
        String m = write("five.chain", "states A B C D E\nA B 1/2\nB C 1/2\nC D 1/2\nD E 1/2\n");
        Cli.Result r = Cli.run("step", m, "-n", "3", "--max-dense-states", "4");
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: the model has 5 states: its dense matrix would have 25 entries (at least 100 bytes of"
            + " memory), more than the limit of 16 entries (4 states); raise it with --max-dense-states",
            r.errLines()[0]);
        assertEquals(0, Cli.run("step", m, "-n", "3", "--max-dense-states", "5").code());
    }

    @Test
    void theLimitsAreCountsOfAsciiDigits() {
        Cli.Result r = Cli.run("step", Cli.model("plant.chain"), "-n", "1", "--max-dense-states", "0");
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: Invalid value for option '--max-dense-states': '0' must be at least 1", r.errLines()[0]);
    }
}
