package org.qchain.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.Report;
import org.qchain.analysis.ReportQuery;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.result.ClosedResult;
import org.qchain.result.FormulaTree;
import org.qchain.result.ReportResult;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The report's structure in each format: sections, table shapes, formulas, drawings. */
class ReportLayoutTest {
    private static final String MODELS = "src/test/resources/models/";
    private static final List<String> SECTION_TITLES = List.of("The model", "State diagram",
        "n-step transition probabilities", "Closed form in n", "Long run", "Sensitivity", "Plots");

    static ReportResult report(String model) {
        return Report.run(LoadedModel.load(Path.of(MODELS + model), Optional.empty()), ReportQuery.defaults(),
            Progress.NONE);
    }

    static Document xml(String text) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)));
    }

    private static ReportResult.ClosedSection closedSection(ReportResult r) {
        return r.sections().stream().filter(ReportResult.ClosedSection.class::isInstance)
            .map(ReportResult.ClosedSection.class::cast).findFirst().orElseThrow();
    }

    /**
     * The two-state chain's n-step probability P^n(A -> B) = p/(p+r) (1 - (1-p-r)^n): a standard result (J. R.
     * Norris, Markov Chains, Cambridge University Press 1997, section 1.1, the two-state chain; from memory,
     * common practice). The report's closed form, read back from its plain text, equals it at many exact points.
     */
    @Test
    void twoStateClosedFormIsTheKnownFormula() {
        ReportResult r = report("two-state-symbolic.chain");
        ClosedResult c = closedSection(r).closed().orElseThrow();
        int b = c.cols().indexOf("B");
        FormulaTree f = FormulaTree.parse(c.cells().get(0).get(b).plain());
        FormulaTree aa = FormulaTree.parse(c.cells().get(0).get(c.cols().indexOf("A")).plain());
        for (Rational p : List.of(Rational.of(1, 10), Rational.of(1, 3), Rational.of(7, 9))) {
            for (Rational q : List.of(Rational.of(1, 5), Rational.of(1, 2), Rational.of(2, 3))) {
                for (int n = 0; n <= 12; n++) {
                    Rational s = p.add(q);
                    Rational known = p.divide(s).multiply(Rational.ONE.subtract(Rational.ONE.subtract(s).pow(n)));
                    Map<String, Rational> at = Map.of("p", p, "r", q, c.names().step(), Rational.of(n));
                    assertEquals(known, f.evaluate(at).orElseThrow(), "P^" + n + "(A -> B) at p=" + p + ", r=" + q);
                    assertEquals(Rational.ONE.subtract(known), aa.evaluate(at).orElseThrow());
                }
            }
        }
        // each format prints that very formula: LaTeX in .md and .tex, MathML in .html
        String latex = c.cells().get(0).get(b).latex();
        String md = ReportFormat.MARKDOWN.layout(12).render(r, "two").main();
        assertTrue(md.contains("$P^{n}(\\text{A} \\to \\text{B}) = " + latex + "$"), md);
        String tex = ReportFormat.LATEX.layout(12).render(r, "two").main();
        assertTrue(tex.contains("P^{n}(\\text{A} \\to \\text{B}) = " + latex + "$"), tex);
        String mathml = c.cells().get(0).get(b).mathml();
        String html = ReportFormat.HTML.layout(12).render(r, "two").main();
        assertTrue(html.contains(mathml.substring(mathml.indexOf('>') + 1)), "the MathML of the closed form");
    }

    @Test
    void chainWithAnAbsorbingStateGetsAbsorptionTables() throws Exception {
        ReportResult r = report("press.chain");
        Document d = xml(ReportFormat.HTML.layout(12).render(r, "press").main());
        Element steps = tableWithCaption(d, "Steps until absorption into {Failed}");
        assertEquals(3, steps.getElementsByTagName("tr").getLength(), "a header and the two transient states");
        tableWithCaption(d, "Absorption probabilities");
    }

    @Test
    void progressCountsUpToItsTotal() {
        List<long[]> seen = new ArrayList<>();
        Report.run(LoadedModel.load(Path.of(MODELS + "pump-nominal.chain"), Optional.empty()), ReportQuery.defaults(),
            (phase, done, total) -> {
                // the report's own count; an engine's progress inside a query is labelled "report K/N: ..."
                if (phase.equals("report") || phase.startsWith("report: ")) {
                    seen.add(new long[] {done, total});
                } else {
                    assertTrue(phase.matches("report \\d+/\\d+: .* \\(.*\\)"), phase);
                }
            });
        assertTrue(seen.size() > 30, "one report a query: " + seen.size());
        long total = seen.get(0)[1];
        for (int i = 1; i < seen.size(); i++) {
            assertTrue(seen.get(i)[0] >= seen.get(i - 1)[0] && seen.get(i)[0] <= total, "monotone, within the total");
        }
        assertEquals(total, seen.get(seen.size() - 1)[0]);
    }

    @Test
    void denseDiagramLeavesTheLabelsToTheDotText() throws Exception {
        List<String> states = new ArrayList<>();
        List<ReportResult.Edge> edges = new ArrayList<>();
        for (int i = 0; i < 9; i++) {
            states.add("S" + i);
            for (int j = 0; j < 9; j++) {
                edges.add(new ReportResult.Edge(i, j, new org.qchain.result.ExactValue(Rational.of(1, 9))));
            }
        }
        ReportResult.DiagramSection d = new ReportResult.DiagramSection(states, edges, List.of());
        Document svg = xml(StateDiagram.svg("dense", d));
        assertEquals(81, svg.getElementsByTagName("path").getLength() - 1);
        assertEquals(9, svg.getElementsByTagName("text").getLength(), "state names only");
        assertEquals(81, StateDiagram.dot("dense", d).split("label=", -1).length - 1);
    }

    @Test
    void htmlHasEverySectionTablesOfTheRightShapeAndMathml() throws Exception {
        ReportResult r = report("two-state-nominal.chain");
        String html = ReportFormat.HTML.layout(12).render(r, "r").main();
        assertTrue(html.startsWith("<!DOCTYPE html>"));
        assertFalse(html.contains("<script"), "no script");
        assertFalse(html.matches("(?s).*(src|href)=\"https?:.*"), "no network resource");
        assertTrue(html.contains(Caution.TEXT));
        assertEquals(1, html.split(Pattern.quote(Caution.TEXT), -1).length - 1, "the caution once");
        Document d = xml(html);
        NodeList h2 = d.getElementsByTagName("h2");
        List<String> titles = new ArrayList<>();
        for (int i = 0; i < h2.getLength(); i++) {
            titles.add(h2.item(i).getTextContent());
        }
        assertTrue(titles.containsAll(SECTION_TITLES), titles::toString);
        // every table: each row has as many cells as the header
        NodeList tables = d.getElementsByTagName("table");
        assertTrue(tables.getLength() >= 8, "tables: " + tables.getLength());
        for (int t = 0; t < tables.getLength(); t++) {
            Element table = (Element) tables.item(t);
            NodeList rows = table.getElementsByTagName("tr");
            int width = ((Element) rows.item(0)).getElementsByTagName("th").getLength();
            for (int i = 1; i < rows.getLength(); i++) {
                Element row = (Element) rows.item(i);
                int cells = row.getElementsByTagName("th").getLength() + row.getElementsByTagName("td").getLength();
                assertEquals(width, cells, "table " + table.getElementsByTagName("caption").item(0).getTextContent());
            }
        }
        // the one-step matrix of a two-state chain: a header and two rows of three cells
        Element p1 = tableWithCaption(d, "One-step matrix P (rows: from, columns: to)");
        assertEquals(3, p1.getElementsByTagName("tr").getLength());
        assertEquals(3, ((Element) p1.getElementsByTagName("tr").item(1)).getElementsByTagName("td").getLength() + 1);
        NodeList math = d.getElementsByTagNameNS("http://www.w3.org/1998/Math/MathML", "math");
        assertTrue(math.getLength() > 20, "MathML elements: " + math.getLength());
        assertEquals(2, d.getElementsByTagNameNS("http://www.w3.org/2000/svg", "svg").getLength() - 1,
            "the diagram and two plots");
    }

    private static Element tableWithCaption(Document d, String caption) {
        NodeList tables = d.getElementsByTagName("table");
        for (int t = 0; t < tables.getLength(); t++) {
            Element table = (Element) tables.item(t);
            if (table.getElementsByTagName("caption").item(0).getTextContent().equals(caption)) {
                return table;
            }
        }
        throw new AssertionError("no table " + caption);
    }

    @Test
    void everyPlotIsValidSvgWithOnePointPerValue() throws Exception {
        ReportResult r = report("two-state-nominal.chain");
        ReportResult.PlotsSection plots = r.sections().stream().filter(ReportResult.PlotsSection.class::isInstance)
            .map(ReportResult.PlotsSection.class::cast).findFirst().orElseThrow();
        assertEquals(2, plots.plots().size());
        for (ReportResult.Plot plot : plots.plots()) {
            Document d = xml(SvgPlot.svg(plot));
            NodeList lines = d.getElementsByTagName("polyline");
            assertEquals(plot.series().size(), lines.getLength());
            for (int k = 0; k < lines.getLength(); k++) {
                String points = ((Element) lines.item(k)).getAttribute("points");
                assertEquals(plot.series().get(k).x().size(), points.trim().split(" ").length, plot.id());
            }
            long limits = plot.series().stream().filter(s -> s.limit().isPresent()).count();
            int dashed = 0;
            NodeList l = d.getElementsByTagName("line");
            for (int k = 0; k < l.getLength(); k++) {
                if ("limit".equals(((Element) l.item(k)).getAttribute("class"))) {
                    dashed++;
                }
            }
            assertEquals(limits, dashed, "a dashed line per limit");
        }
        ReportResult.Plot steps = plots.plots().get(0);
        // P^n(A -> j) for n = 0..30, each limit the stationary law (r/(p+r), p/(p+r)) = (2/3, 1/3)
        assertEquals(ReportQuery.DEFAULT_PLOT_STEPS + 1, steps.series().get(0).x().size());
        assertEquals(Optional.of(Rational.of(2, 3)), steps.series().get(0).limit());
        assertEquals(Optional.of(Rational.of(1, 3)), steps.series().get(1).limit());
        // and the same data as TikZ: one coordinate per value
        String tikz = TikzPlot.tikz(steps);
        Matcher m = Pattern.compile("plot coordinates \\{([^}]*)\\}").matcher(tikz);
        int curves = 0;
        while (m.find()) {
            assertEquals(ReportQuery.DEFAULT_PLOT_STEPS + 1, count(m.group(1), "("));
            curves++;
        }
        assertEquals(2, curves);
    }

    @Test
    void ticksAreRoundValuesCoveringTheRange() {
        assertEquals(List.of("0", "0.2", "0.4", "0.6", "0.8", "1"),
            PlotAxes.ticks(0, 1).stream().map(PlotAxes::label).toList());
        assertEquals(List.of("0", "10", "20", "30"),
            PlotAxes.ticks(0, 30).stream().map(PlotAxes::label).toList());
        assertEquals(List.of("0.9985", "0.999", "0.9995", "1"),
            PlotAxes.ticks(0.99890, 1).stream().map(PlotAxes::label).toList());
    }

    @Test
    void diagramDrawsEveryTransitionWithSelfLoopsAndDotListsThem() throws Exception {
        ReportResult r = report("two-state-nominal.chain");
        ReportResult.DiagramSection d = r.sections().stream().filter(ReportResult.DiagramSection.class::isInstance)
            .map(ReportResult.DiagramSection.class::cast).findFirst().orElseThrow();
        assertEquals(4, d.edges().size(), "A->A, A->B, B->A, B->B");
        Document svg = xml(StateDiagram.svg("t", d));
        assertEquals(4, svg.getElementsByTagName("path").getLength() - 1, "one path per edge besides the marker's");
        assertEquals(2, svg.getElementsByTagName("circle").getLength());
        assertEquals(2, StateDiagram.loops(d.edges()));
        String dot = StateDiagram.dot("two", d);
        assertTrue(dot.startsWith("digraph \"two\" {"));
        assertTrue(dot.contains("\"A\" -> \"B\" [label=\"p\"];"), dot);
        assertTrue(dot.contains("\"A\" -> \"A\" [label=\"1 - p\"];"), dot);
    }

    @Test
    void markdownTablesAreGfmTablesAndFormulasAreDollarMath() {
        ReportResult r = report("two-state-nominal.chain");
        ReportLayout.Files files = ReportFormat.MARKDOWN.layout(12).render(r, "two");
        String md = files.main();
        for (String title : SECTION_TITLES) {
            assertTrue(md.contains("\n## " + title.replace("-", "-") + "\n"), title);
        }
        // GFM tables: a header row, a delimiter row, body rows, all with the same number of cells
        String[] lines = md.split("\n");
        int tables = 0;
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].startsWith("|") && (i == 0 || !lines[i - 1].startsWith("|"))) {
                tables++;
                int width = cells(lines[i]);
                assertTrue(lines[i + 1].matches("\\|( --- \\|)+"), lines[i + 1]);
                assertEquals(width, cells(lines[i + 1]));
                for (int j = i + 2; j < lines.length && lines[j].startsWith("|"); j++) {
                    assertEquals(width, cells(lines[j]), lines[j]);
                }
            }
        }
        assertTrue(tables >= 8, "tables: " + tables);
        assertTrue(md.contains("$P^{n}(\\text{A} \\to \\text{B}) = "), "the closed form as $...$ math");
        assertTrue(md.contains("```dot\ndigraph "));
        assertEquals(3, files.attachments().size(), "the diagram and two plots beside it");
        assertTrue(md.contains("](two-plot-steps.svg)"));
    }

    /** Cells of a GFM table row: pipes not escaped by a backslash, less one. */
    private static int cells(String row) {
        int pipes = 0;
        for (int i = 0; i < row.length(); i++) {
            if (row.charAt(i) == '|' && (i == 0 || row.charAt(i - 1) != '\\')) {
                pipes++;
            }
        }
        return pipes - 1;
    }

    @Test
    void latexIsACompleteDocumentWithStandardPackagesOnly() {
        ReportResult r = report("two-state-nominal.chain");
        String tex = ReportFormat.LATEX.layout(12).render(r, "two").main();
        assertTrue(tex.startsWith("\\documentclass{article}\n"));
        assertTrue(tex.trim().endsWith("\\end{document}"));
        Matcher pk = Pattern.compile("\\\\usepackage\\{([^}]*)\\}").matcher(tex);
        List<String> packages = new ArrayList<>();
        while (pk.find()) {
            packages.add(pk.group(1));
        }
        assertEquals(List.of("amsmath", "booktabs", "tikz"), packages);
        for (String env : List.of("tabular", "tikzpicture", "itemize", "center", "verbatim")) {
            assertEquals(count(tex, "\\begin{" + env + "}"), count(tex, "\\end{" + env + "}"), env);
        }
        assertEquals(3, count(tex, "\\begin{tikzpicture}"), "the diagram and two plots");
        // every tabular row has as many cells as its column specification
        Matcher tab = Pattern.compile("\\\\begin\\{tabular\\}\\{(l+)\\}\\n(.*?)\\\\end\\{tabular\\}", Pattern.DOTALL)
            .matcher(tex);
        int tables = 0;
        while (tab.find()) {
            tables++;
            int cols = tab.group(1).length();
            for (String line : tab.group(2).split("\n")) {
                if (line.endsWith("\\\\")) {
                    assertEquals(cols, line.split(" & ", -1).length, line);
                }
            }
        }
        assertTrue(tables >= 8);
        assertTrue(tex.contains("P^{n}(\\text{A} \\to \\text{B}) = "));
    }

    @Test
    void latexTextRaisesPowersAndWritesArrowsAsMath() {
        assertEquals("P\\textsuperscript{10}(Up $\\to$ Down)", LatexReport.text("P^10(Up -> Down)"));
        assertEquals("Limit of P\\textsuperscript{2m + 1}:", LatexReport.text("Limit of P^(2m + 1):"));
        assertEquals("a $\\approx$ 0.5, 50\\% \\textless{} 1", LatexReport.text("a ≈ 0.5, 50% < 1"));
    }

    @Test
    void periodicChainGetsItsSubsequenceLimits() {
        ReportResult r = report("closed-periodic.chain");
        String tex = ReportFormat.LATEX.layout(12).render(r, "p").main();
        assertTrue(tex.contains("Limit of P\\textsuperscript{"), tex);
    }

    private static int count(String s, String what) {
        return s.split(Pattern.quote(what), -1).length - 1;
    }

    @Test
    void continuousReportHasAvailabilityAndTheClosedFormInT() throws Exception {
        ReportResult r = report("generator-set.chain");
        String html = ReportFormat.HTML.layout(12).render(r, "g").main();
        Document d = xml(html);
        // the closed form of P(t) from the first state, its Laplace transforms and the limit (the eigenvalue-0 term)
        assertTrue(html.contains("Closed form in t"), html);
        assertTrue(html.contains("Laplace transforms"), html);
        assertTrue(html.contains("Limit as t grows"), html);
        assertTrue(html.contains("steady-state availability"));
        NodeList lines = d.getElementsByTagNameNS("http://www.w3.org/2000/svg", "polyline");
        assertEquals(3, lines.getLength(), "A(t), R(t) and the sweep");
        assertEquals(ReportQuery.CONTINUOUS_POINTS, ((Element) lines.item(0)).getAttribute("points").split(" ")
            .length);
    }

    @Test
    void availabilityPlotCarriesTheReliabilityBelowTheAvailability() {
        ReportResult.Plot plot = report("generator-set.chain").sections().stream()
            .filter(ReportResult.PlotsSection.class::isInstance).map(ReportResult.PlotsSection.class::cast)
            .flatMap(p -> p.plots().stream()).filter(p -> p.id().equals("availability")).findFirst().orElseThrow();
        assertEquals(2, plot.series().size());
        ReportResult.Series a = plot.series().get(0);
        ReportResult.Series rel = plot.series().get(1);
        assertEquals("R(t)", rel.label());
        // R(0) = A(0) = 1 from an up state; R(t) <= A(t), and R falls: a unit that has never failed has not failed
        // at any earlier time either (common practice, no source)
        assertEquals(Rational.ONE, rel.y().get(0));
        for (int k = 0; k < a.y().size(); k++) {
            assertTrue(rel.y().get(k).compareTo(a.y().get(k)) <= 0, "R <= A at point " + k);
            if (k > 0) {
                assertTrue(rel.y().get(k).compareTo(rel.y().get(k - 1)) < 0, "R falls at point " + k);
            }
        }
    }
}
