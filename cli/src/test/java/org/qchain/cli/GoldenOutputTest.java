package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The exact output of {@code step} on a small model, in every format and shape, against golden files in
 * {@code src/test/resources/golden/}. The layouts are our own (common practice, no source; CSV follows RFC 4180,
 * JSON RFC 8259). The numbers in them come from the exact module and are cross-checked independently in
 * {@link StepValuesTest} (by hand and against the two-state closed form).
 *
 * <p>After an intended change of layout, regenerate with {@code mvn -pl cli test -Dtest=GoldenOutputTest
 * -Dqchain.updateGolden=true} and review the diff before committing.
 */
class GoldenOutputTest {
    private static final Path GOLDEN = Path.of("src/test/resources/golden");
    private static final String MODEL = Cli.model("plant.chain");

    /** One golden case: the file name, the model and the arguments after {@code step MODEL -n 4}. */
    record Case(String file, String model, List<String> args) {
        Case(String file, List<String> args) {
            this(file, MODEL, args);
        }

        @Override
        public String toString() {
            return file;
        }
    }

    static Stream<Case> cases() {
        List<Case> out = new ArrayList<>();
        for (String f : new String[] {"text", "json", "csv", "markdown", "latex"}) {
            String ext = f.equals("text") ? "txt" : f.equals("markdown") ? "md" : f.equals("latex") ? "tex" : f;
            out.add(new Case("step-matrix." + ext, List.of("--format", f)));
            out.add(new Case("step-row." + ext, List.of("--from", "Worn", "--format", f)));
            out.add(new Case("step-entry." + ext, List.of("--from", "Up", "--to", "Down", "--format", f)));
            out.add(new Case("step-paths." + ext, List.of("--from", "Up", "--to", "Down", "--paths", "3",
                "--format", f)));
        }
        out.add(new Case("step-matrix-digits5.txt", List.of("--digits", "5")));
        // --double: each value's correctly rounded binary64, as shortest decimal and hex float
        out.add(new Case("step-matrix-double.csv", List.of("--format", "csv", "--double")));
        out.add(new Case("step-matrix-double.json", List.of("--format", "json", "--double")));
        out.add(new Case("step-row-double.csv", List.of("--from", "Worn", "--format", "csv", "--double")));
        out.add(new Case("step-row-double.json", List.of("--from", "Worn", "--format", "json", "--double")));
        out.add(new Case("step-entry-double.csv", List.of("--from", "Up", "--to", "Down", "--format", "csv",
            "--double")));
        out.add(new Case("step-entry-double.json", List.of("--from", "Up", "--to", "Down", "--format", "json",
            "--double")));
        // six states at 20 digits: the decimal overview is split into column blocks of at most 100 characters
        out.add(new Case("step-matrix-wide.txt", Cli.model("depot.chain"), List.of("--digits", "20")));
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void stepOutputMatchesGolden(Case c) throws IOException {
        List<String> args = new ArrayList<>(List.of("step", c.model(), "-n", "4"));
        args.addAll(c.args());
        Cli.Result r = Cli.run(args.toArray(new String[0]));
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err(), "stderr carries nothing on success");
        Cli.assertMatchesGolden(r, GOLDEN.resolve(c.file()));
    }
}
