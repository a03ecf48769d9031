package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** Help texts read as whole sentences and offer only what a command accepts (common practice, no source). */
class HelpTextTest {

    @Test
    void everyCommandSummaryInTheRootHelpEndsASentence() {
        Cli.Result r = Cli.run("--help");
        assertEquals(0, r.code(), r::toString);
        String commands = r.out().substring(r.out().indexOf("Commands:"), r.out().indexOf("Exit codes:"));
        // one summary per command; continuation lines are indented deeper
        String[] entries = commands.split("\n  (?=\\S)");
        assertTrue(entries.length >= 7, commands);
        for (String e : Arrays.copyOfRange(entries, 1, entries.length)) {
            String text = e.strip().replaceAll("\\s+", " ");
            assertTrue(text.endsWith("."), "cut mid-sentence: " + text);
        }
    }

    @Test
    void closedOffersEveryFormatCsvIncluded() {
        Cli.Result help = Cli.run("closed", "--help");
        assertEquals(0, help.code(), help::toString);
        String text = help.out().replaceAll("\\s+", " ");
        assertTrue(text.contains("Output format: text, json, csv, markdown, latex (default: text)."), text);
        assertFalse(text.contains("csv is not available"), text);
        Cli.Result csv = Cli.run("closed", Cli.model("plant.chain"), "--format", "csv");
        assertEquals(0, csv.code(), csv::toString);
        assertTrue(csv.out().startsWith("record,from,to,r,name,formula,valid_from,multiplicity,decimal,proved\r\n"),
            csv::toString);
    }

    /**
     * Regression (issue 8): every paragraph of every command's description, and every option's and parameter's
     * description, is whole sentences: it ends with a full stop (or a colon before a list), and none starts
     * lower-case in the middle of a sentence that the previous paragraph began.
     */
    @Test
    void noDescriptionBreaksMidSentence() {
        picocli.CommandLine root = QchainCommand.newCommandLine(false);
        java.util.List<String> bad = new java.util.ArrayList<>();
        java.util.List<picocli.CommandLine> all = new java.util.ArrayList<>(java.util.List.of(root));
        all.addAll(root.getSubcommands().values());
        for (picocli.CommandLine cl : all) {
            picocli.CommandLine.Model.CommandSpec spec = cl.getCommandSpec();
            String name = spec.qualifiedName();
            paragraphs(name + " description", spec.usageMessage().description(), bad);
            for (picocli.CommandLine.Model.OptionSpec o : spec.options()) {
                paragraphs(name + " " + o.longestName(), o.description(), bad);
            }
            for (picocli.CommandLine.Model.PositionalParamSpec pp : spec.positionalParameters()) {
                paragraphs(name + " " + pp.paramLabel(), pp.description(), bad);
            }
        }
        assertEquals(java.util.List.of(), bad);
    }

    private static void paragraphs(String where, String[] texts, java.util.List<String> bad) {
        for (int k = 0; k < texts.length; k++) {
            String t = texts[k].replace("%n", "").strip();
            if (t.isEmpty()) {
                continue;
            }
            if (!(t.endsWith(".") || t.endsWith(":"))) {
                bad.add(where + ": ends mid-sentence: " + t);
            }
            if (k > 0 && Character.isLowerCase(t.charAt(0))) {
                bad.add(where + ": starts mid-sentence: " + t);
            }
        }
    }
}
