package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.Report;
import org.qchain.analysis.ReportQuery;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.format.ReportFormat;

/**
 * {@code qchain report}: formats by file ending, section choice, refusals, atomic files, Ctrl-C. Expected text and
 * messages: docs/commands.md, "qchain report" (our own interface), no outside source; the figures named below are
 * worked out by hand.
 */
class ReportCommandTest {
    @TempDir
    Path dir;

    @Test
    void writesTheLayoutsTextIntoTheFileNamedByItsEnding() throws Exception {
        Path out = dir.resolve("pump.html");
        Cli.Result r = Cli.run("report", Cli.model("pump-nominal.chain"), "-o", out.toString());
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.out());
        // the same text as the layout of the same queries
        LoadedModel m = LoadedModel.load(Path.of(Cli.model("pump-nominal.chain")), Optional.empty());
        String expected = ReportFormat.HTML.layout(12).render(Report.run(m, ReportQuery.defaults(), Progress.NONE),
            "pump").main();
        assertEquals(expected, Files.readString(out, StandardCharsets.UTF_8));
        // p = 1/20, r = 1/4: by hand from pi P = pi (common practice, no source), pi_Worn (p + r) = pi_Up p and
        // pi_Down / 2 = pi_Worn p give pi = (60, 10, 1)/71; 60/71 = 0.845070422535..., 1/71 = 0.0140845070422535...
        assertTrue(expected.contains("≈ 0.845070422535<"), "pi(Up) = 60/71");
        assertTrue(expected.contains("≈ 0.0140845070423<"), "pi(Down) = 1/71");
    }

    @Test
    void markdownWritesItsDrawingsBesideTheDocument() throws Exception {
        Path out = dir.resolve("two.md");
        Cli.Result r = Cli.run("report", Cli.model("two-state-nominal.chain"), "-o", out.toString());
        assertEquals(0, r.code(), r::toString);
        assertTrue(Files.readString(out).startsWith("# Report: "));
        for (String f : new String[] {"two-diagram.svg", "two-plot-steps.svg", "two-plot-sweep.svg"}) {
            assertTrue(Files.readString(dir.resolve(f)).startsWith("<svg "), f);
        }
    }

    @Test
    void formatOptionOverridesTheEnding() throws Exception {
        Path out = dir.resolve("report.txt");
        Cli.Result r = Cli.run("report", Cli.model("two-state-nominal.chain"), "-o", out.toString(), "--format",
            "latex", "--sections", "model,steps", "-n", "2,3");
        assertEquals(0, r.code(), r::toString);
        String tex = Files.readString(out);
        assertTrue(tex.startsWith("\\documentclass{article}"));
        assertTrue(tex.contains("\\section*{The model}"));
        assertTrue(tex.contains("\\subsection*{P\\textsuperscript{3} (3 steps)}"), tex);
        assertTrue(!tex.contains("Long run") && !tex.contains("State diagram"), "only the chosen sections");
    }

    @Test
    void unknownEndingIsAUsageError() {
        Cli.Result r = Cli.run("report", Cli.model("two-state-nominal.chain"), "-o", dir.resolve("r.txt").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("qchain: -o " + dir.resolve("r.txt") + ": give a file ending in .html,"
            + " .md or .tex, or choose the format with --format html|markdown|latex\n"), r.err());
    }

    @Test
    void unknownSectionIsAUsageError() {
        Cli.Result r = Cli.run("report", Cli.model("two-state-nominal.chain"), "-o", dir.resolve("r.md").toString(),
            "--skip", "plots,charts");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("qchain: --skip 'charts': not a section (the sections are: model,"
            + " diagram, steps, closed, longrun, sensitivity, plots)\n"), r.err());
    }

    @Test
    void failureLeavesAnExistingFileUntouched() throws Exception {
        Path out = dir.resolve("keep.html");
        Files.writeString(out, "earlier report\n");
        Cli.Result r = Cli.run("report", Cli.model("two-state-nominal.chain"), "-o", out.toString(), "--from",
            "Nowhere");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().contains("--from 'Nowhere'") || r.err().contains("Nowhere"), r.err());
        assertEquals("earlier report\n", Files.readString(out));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file left");
        }
    }

    @Test
    void badSweepIsAnErrorBeforeAnyWork() {
        Cli.Result r = Cli.run("report", Cli.model("two-state-nominal.chain"), "-o", dir.resolve("r.md").toString(),
            "--sweep", "q in [0, 1] with 3 points");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().startsWith("qchain: invalid --sweep 'q in [0, 1] with 3 points': 'q' is not a parameter of"),
            r.err());
        Cli.Result s = Cli.run("report", Cli.model("two-state-nominal.chain"), "-o", dir.resolve("r.md").toString(),
            "--sweep", "p from 0 to 1");
        assertEquals(2, s.code(), s::toString);
        assertTrue(!Files.exists(dir.resolve("r.md")));
        Cli.Result t = Cli.run("report", Cli.model("two-state-nominal.chain"), "-o", dir.resolve("r.md").toString(),
            "--sweep", "p in [0, 2] with 3 points");
        assertEquals(2, t.code(), t::toString);
        assertTrue(!Files.exists(dir.resolve("r.md")));
    }

    @Test
    void neverWritesOverTheModel() throws Exception {
        Path model = dir.resolve("m.md");
        Files.copy(Path.of(Cli.model("two-state-nominal.chain")), model);
        String before = Files.readString(model);
        Cli.Result r = Cli.run("report", model.toString(), "-o", model.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("it is the input model"), r.err());
        assertEquals(before, Files.readString(model));
    }

    @Test
    void interruptionEndsTheReport() {
        LoadedModel m = LoadedModel.load(Path.of(Cli.model("pump-nominal.chain")), Optional.empty());
        try {
            QchainException e = org.junit.jupiter.api.Assertions.assertThrows(QchainException.class,
                () -> Report.run(m, ReportQuery.defaults(), (phase, done, total) -> Thread.currentThread().interrupt()));
            assertEquals(ErrorKey.INTERRUPTED, e.key());
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void continuousChainGetsAvailabilityAndTheClosedFormInT() throws Exception {
        Path out = dir.resolve("gen.md");
        Cli.Result r = Cli.run("report", Cli.model("generator-set.chain"), "-o", out.toString(), "-t", "1,24");
        assertEquals(0, r.code(), r::toString);
        String md = Files.readString(out);
        assertTrue(md.contains("## Transition probabilities P(t)"));
        assertTrue(md.contains("### P(t) at t = 24"));
        assertTrue(md.contains("## Closed form in t"), md);
        assertTrue(md.contains("P(t) = exp(Qt) in closed form, valid for t ≥ 0; parameters (symbolic): lam, mu."), md);
        // by hand from pi Q = 0 of the birth-death chain (common practice, no source): pi_One = pi_Both 2 lam/mu,
        // pi_None = pi_One lam/mu; at lam = 1/500, mu = 1/12 that is (15625, 750, 18)/16393, so A = 16375/16393
        assertTrue(md.contains("| steady-state availability | $\\frac{16375}{16393}$ ≈ 0.998901970353 |"), md);
    }
}
