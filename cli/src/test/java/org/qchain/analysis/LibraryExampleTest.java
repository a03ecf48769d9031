package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.format.OutputFormat;
import org.qchain.result.ClosedResult;
import org.qchain.result.SensResult;
import org.qchain.result.StepResult;
import org.qchain.result.SymbolicStepResult;

/**
 * The example of docs/library.md, run as written: {@code step}, {@code closed} and {@code sens} as a Java library
 * through {@code org.qchain.analysis}, with no command line. The printed lines must equal the output block of the
 * page, so the page stays true. The values are cross-checked by hand: P^2(Up -> Down) of the pump is p^2 (the only
 * two-step path Up, Worn, Down), so dP/dp = 2p (derived by hand).
 */
class LibraryExampleTest {
    private static final Path PAGE = Path.of("../docs/library.md");
    private static final Path MODEL = Path.of("../docs/examples/pump-station-params.chain");

    /** The example's code, as on the page; returns what it prints. */
    private static List<String> example(Path file) {
        List<String> out = new ArrayList<>();
        // --- example start
        LoadedModel pump = LoadedModel.load(file, Map.of());        // parsed, resolved, validated once

        // step, numeric: the nominal values p = 1/20, r = 1/4
        StepResult.Single down = (StepResult.Single) Analysis.step(pump, StepQuery.entry(2, "Up", "Down"),
            Progress.NONE);
        out.add("P^2(Up -> Down) = " + down.value());

        // step, symbolic: the same entry as a formula in p and r, and its value at the nominal point
        SymbolicStepResult f = (SymbolicStepResult) Analysis.step(pump,
            StepQuery.entry(2, "Up", "Down").withSymbolic(true), Progress.NONE);
        out.add("as a formula: " + f.formulas().get(0).get(0).plain() + " = " + f.values().get().get(0).get(0)
            + " at " + f.point().get().text());

        // closed: P^n(Up -> Down) for every n, with r given and p symbolic
        LoadedModel atR = LoadedModel.load(file, Map.of("r", Rational.of(1, 4)));
        ClosedResult c = Analysis.closed(atR, ClosedQuery.entry("Up", "Down"), Progress.NONE);
        String formula = c.cells().get(0).get(0).plain();      // and .latex(), for a document
        out.add("closed form in n and " + c.parameters() + ", valid for n >= " + c.validFrom());

        // sens: dP/dp of P^2(Up -> Down), exact at the nominal point
        SensResult s = Analysis.sens(pump, SensQuery.of(2, "Up", "Down", "p"), Progress.NONE);
        out.add("dP/dp = " + s.derivative().plain() + " = " + s.at().get().derivative());

        // any result in any format, decimals to the digits asked for
        out.add(OutputFormat.JSON.formatter(6).format(down).strip());
        // --- example end
        return out;
    }

    @Test
    void theLibraryExampleRunsAndPrintsWhatThePageShows() throws IOException {
        List<String> printed = example(MODEL);
        assertEquals("P^2(Up -> Down) = 1/400", printed.get(0));
        assertTrue(printed.get(3).endsWith(" = 1/10"), printed.get(3));
        String page = Files.readString(PAGE, StandardCharsets.UTF_8);
        int start = page.indexOf("```text\n") + "```text\n".length();
        String shown = page.substring(start, page.indexOf("```", start));
        // the page runs from the repository's root, the test from the cli module's directory
        assertEquals(shown, String.join("\n", printed).replace("../docs/", "docs/") + "\n",
            "docs/library.md's output block");
    }

    @Test
    void theExampleCodeOnThePageIsTheTestedCode() throws IOException {
        String page = Files.readString(PAGE, StandardCharsets.UTF_8);
        String source = Files.readString(Path.of("src/test/java/org/qchain/analysis/LibraryExampleTest.java"),
            StandardCharsets.UTF_8);
        String code = source.substring(source.indexOf("// --- example start\n") + 21, source.indexOf("        // ---"
            + " example end"));
        for (String line : code.split("\n")) {
            String l = line.strip();
            // the page prints each line where the test collects it
            String onPage = l.replace("out.add(", "System.out.println(");
            if (!l.isEmpty()) {
                assertTrue(page.contains(onPage), () -> "docs/library.md lacks: " + onPage);
            }
        }
    }

    @Test
    void anyQueryRunsThroughTheOneEntryPoint() {
        // a report is a list of queries: Analysis.run gives each the result its own method gives
        LoadedModel pump = LoadedModel.load(MODEL, Map.of());
        List<Query> queries = List.of(StepQuery.entry(2, "Up", "Down"), SensQuery.of(2, "Up", "Down", "p"),
            new CheckQuery(false));
        String viaRun = "";
        for (Query q : queries) {
            viaRun += OutputFormat.TEXT.formatter(6).format(Analysis.run(pump, q, Progress.NONE));
        }
        String direct = OutputFormat.TEXT.formatter(6).format(Analysis.step(pump, StepQuery.entry(2, "Up", "Down"),
            Progress.NONE)) + OutputFormat.TEXT.formatter(6).format(Analysis.sens(pump, SensQuery.of(2, "Up",
            "Down", "p"), Progress.NONE)) + OutputFormat.TEXT.formatter(6).format(Analysis.check(pump,
            new CheckQuery(false)));
        assertEquals(direct, viaRun);
        assertTrue(viaRun.contains("1/400"), viaRun);
    }
}
