package org.qchain.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.qchain.result.ReportResult;

/**
 * The report's files accepted by the tools that read them: the LaTeX document compiles with {@code pdflatex}, the DOT
 * text renders with Graphviz {@code dot -Tsvg}. Each test is skipped, with a message, when its tool is not installed
 * ({@code .ci/run} installs both). The references are the tools themselves: TeX Live's pdflatex (LaTeX as in Lamport,
 * LaTeX: A Document Preparation System, from memory) and Graphviz's dot reading the DOT language (the Graphviz
 * documentation).
 */
class ReportToolsTest {
    private static final Path DIR = Path.of("target/report-tools");

    /** The program's path if it is on the PATH. */
    static Optional<Path> onPath(String program) {
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            Path p = Path.of(dir, program);
            if (Files.isExecutable(p)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    record Run(int code, String output) {
    }

    static Run run(Path dir, long seconds, Optional<String> stdin, String... command) throws Exception {
        ProcessBuilder pb = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true);
        Path log = Files.createTempFile(dir, "run", ".log");
        pb.redirectOutput(log.toFile());
        Process p = pb.start();
        if (stdin.isPresent()) {
            p.getOutputStream().write(stdin.get().getBytes(StandardCharsets.UTF_8));
        }
        p.getOutputStream().close();
        if (!p.waitFor(seconds, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError(String.join(" ", command) + " took more than " + seconds + " s");
        }
        String out = Files.readString(log, StandardCharsets.UTF_8);
        Files.delete(log);
        return new Run(p.exitValue(), out);
    }

    @Test
    void latexReportCompilesWithPdflatex() throws Exception {
        Optional<Path> pdflatex = onPath("pdflatex");
        assumeTrue(pdflatex.isPresent(), "skipped: pdflatex is not installed (Debian: texlive-latex-base,"
            + " texlive-latex-recommended, texlive-pictures)");
        Files.createDirectories(DIR);
        for (String model : List.of("two-state-nominal.chain", "two-state-symbolic.chain", "generator-set.chain",
            "pump-params.chain", "pump-nominal.chain", "press.chain", "closed-periodic.chain")) {
            ReportResult r = ReportLayoutTest.report(model);
            String base = model.replace(".chain", "");
            Files.writeString(DIR.resolve(base + ".tex"), ReportFormat.LATEX.layout(12).render(r, base).main(),
                StandardCharsets.UTF_8);
            Run run = run(DIR, 120, Optional.empty(), pdflatex.get().toString(), "-interaction=nonstopmode",
                "-halt-on-error", base + ".tex");
            assertEquals(0, run.code(), () -> model + ": pdflatex failed:\n" + tail(run.output()));
            assertTrue(Files.size(DIR.resolve(base + ".pdf")) > 1000, model);
        }
    }

    @Test
    void dotTextIsAcceptedByGraphviz() throws Exception {
        Optional<Path> dot = onPath("dot");
        assumeTrue(dot.isPresent(), "skipped: Graphviz dot is not installed (Debian: graphviz)");
        Files.createDirectories(DIR);
        for (String model : List.of("two-state-nominal.chain", "generator-set.chain", "pump-params.chain")) {
            ReportResult r = ReportLayoutTest.report(model);
            ReportResult.DiagramSection d = r.sections().stream().filter(ReportResult.DiagramSection.class::isInstance)
                .map(ReportResult.DiagramSection.class::cast).findFirst().orElseThrow();
            String text = StateDiagram.dot(r.source(), d);
            Run run = run(DIR, 60, Optional.of(text), dot.get().toString(), "-Tsvg");
            assertEquals(0, run.code(), () -> model + ": dot failed:\n" + run.output());
            assertTrue(run.output().contains("<svg"), model);
            // one <g class="edge"> per transition in Graphviz's drawing (Graphviz's SVG output, from memory)
            assertEquals(d.edges().size(), run.output().split("class=\"edge\"", -1).length - 1, model);
        }
    }

    private static String tail(String s) {
        String[] lines = s.split("\n");
        return String.join("\n", java.util.Arrays.copyOfRange(lines, Math.max(0, lines.length - 30), lines.length));
    }

}
