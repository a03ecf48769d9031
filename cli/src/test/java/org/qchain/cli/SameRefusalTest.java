package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every bad model of the test corpus ({@code src/test/resources/models/bad/}) is refused by {@code step},
 * {@code check}, {@code sens} and {@code closed} (and {@code step} and {@code check} with {@code --symbolic}) with the
 * same one-line message at the same {@code file:line:col} and exit code 2: the commands share one load, resolve and
 * validate path (a rule of this project, common practice, no source). The corpus includes models whose rows sum to 1
 * only at their nominal values ({@code row-sum-nominal*.chain}): every command refuses them, the numeric ones too.
 */
class SameRefusalTest {
    static Stream<Path> badModels() throws IOException {
        try (Stream<Path> s = Files.list(Path.of(Cli.MODELS, "bad"))) {
            return s.sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badModels")
    void everyCommandRefusesTheModelWithTheSameMessage(Path model) {
        String m = model.toString();
        List<String[]> runs = List.of(new String[] {"step", m, "-n", "2"},
            new String[] {"check", m},
            new String[] {"step", m, "-n", "2", "--symbolic"},
            new String[] {"check", m, "--symbolic"},
            new String[] {"sens", m, "-n", "2", "--from", "A", "--to", "A", "--wrt", "a"},
            new String[] {"closed", m});
        Cli.Result first = Cli.run(runs.get(0));
        assertEquals(2, first.code(), first::toString);
        assertEquals("", first.out());
        assertTrue(first.err().startsWith("qchain: " + m + ":") && first.err().endsWith("\n")
            && first.err().indexOf('\n') == first.err().length() - 1, first::toString);
        for (String[] args : runs.subList(1, runs.size())) {
            Cli.Result r = Cli.run(args);
            assertEquals(2, r.code(), r::toString);
            assertEquals("", r.out(), args[0]);
            assertEquals(first.err(), r.err(), args[0]);
        }
    }

    @Test
    void aRowThatSumsToOneAsARationalFunctionIsAcceptedByEveryCommand() {
        // (a^2 - a)/(a - 1) + 1 - a is 1 for every a but 1, which lies outside the domain (0, 1): accepted, as the
        // symbolic route accepts it (an identity of rational functions)
        String m = Cli.model("quotient-row.chain");
        for (String[] args : List.of(new String[] {"step", m, "-n", "2"}, new String[] {"check", m},
            new String[] {"sens", m, "-n", "2", "--from", "A", "--to", "A", "--wrt", "a"},
            new String[] {"closed", m, "--from", "A", "--to", "A"},
            new String[] {"step", m, "-n", "2", "--symbolic"}, new String[] {"check", m, "--symbolic"})) {
            Cli.Result r = Cli.run(args);
            assertEquals(0, r.code(), r::toString);
        }
    }
}
