package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.Report;
import org.qchain.analysis.ReportQuery;
import org.qchain.exact.Progress;
import org.qchain.exact.model.ModelParser;
import org.qchain.format.ReportFormat;
import org.qchain.format.ReportLayout;
import org.qchain.result.ReportResult;

/**
 * The example reports in {@code docs/examples/reports/} are what the code produces now: the HTML and Markdown
 * reports of the bundled pump-station model with parameters, as {@code qchain report
 * docs/examples/pump-station-params.chain -o docs/examples/reports/pump-station-params.html} (and {@code .md}) writes
 * them from the repository's root. With {@code -Dqchain.updateDocs=true} the test rewrites them first (read the diff
 * before committing). Expected text: the committed example files (our own output, kept as documentation), no
 * outside source; their long-run table is checked against figures worked out by hand.
 */
class ReportExampleTest {
    static final String MODEL = "docs/examples/pump-station-params.chain";
    static final Path DIR = Path.of("../docs/examples/reports");
    static final String BASE = "pump-station-params";

    static Map<String, String> files() throws Exception {
        String text = Files.readString(Path.of("..").resolve(MODEL), StandardCharsets.UTF_8);
        LoadedModel m = LoadedModel.of(ModelParser.parse(MODEL, text), Optional.empty(), Map.of());
        ReportResult r = Report.run(m, ReportQuery.defaults(), Progress.NONE);
        Map<String, String> out = new LinkedHashMap<>();
        for (ReportFormat f : new ReportFormat[] {ReportFormat.HTML, ReportFormat.MARKDOWN}) {
            ReportLayout.Files files = f.layout(12).render(r, BASE);
            out.put(BASE + f.ending(), files.main());
            out.putAll(files.attachments());
        }
        return out;
    }

    @Test
    void exampleReportsAreCurrent() throws Exception {
        Map<String, String> files = files();
        if (Boolean.getBoolean("qchain.updateDocs")) {
            Files.createDirectories(DIR);
            for (Map.Entry<String, String> e : files.entrySet()) {
                Files.writeString(DIR.resolve(e.getKey()), e.getValue(), StandardCharsets.UTF_8);
            }
        }
        for (Map.Entry<String, String> e : files.entrySet()) {
            Path p = DIR.resolve(e.getKey());
            assertEquals(e.getValue(), Files.exists(p) ? Files.readString(p, StandardCharsets.UTF_8) : "(missing)",
                p + " differs from what the code produces; regenerate with mvn -pl cli -am test"
                    + " -Dtest=ReportExampleTest -Dqchain.updateDocs=true -Dsurefire.failIfNoSpecifiedTests=false");
        }
        try (var listed = Files.list(DIR)) {
            assertEquals(files.size(), listed.count(), "no stale file in " + DIR);
        }
    }

    @Test
    void exampleLongRunTableHoldsTheStationaryLawWorkedOutByHand() throws Exception {
        // nominal p = 1/20, r = 1/4: by hand from pi P = pi (common practice, no source), pi_Worn (p + r) = pi_Up p and
        // pi_Down / 2 = pi_Worn p give pi = (60, 10, 1)/71; the mean recurrence times are 1/pi_i (Kac's formula;
        // Grinstead and Snell, Introduction to Probability, ch. 11, from memory); decimals to 12 digits by hand
        String md = Files.readString(DIR.resolve(BASE + ".md"), StandardCharsets.UTF_8);
        for (String row : new String[] {
            "| Up | $\\frac{60}{71}$ ≈ 0.845070422535 | $\\frac{71}{60}$ ≈ 1.18333333333 |",
            "| Worn | $\\frac{10}{71}$ ≈ 0.140845070423 | $\\frac{71}{10}$ ≈ 7.10000000000 |",
            "| Down | $\\frac{1}{71}$ ≈ 0.0140845070423 | $71$ |"}) {
            assertTrue(md.contains("\n" + row + "\n"), row);
        }
    }
}
