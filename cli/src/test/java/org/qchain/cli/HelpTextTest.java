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
    void closedOffersOnlyTheFormatsItWrites() {
        Cli.Result help = Cli.run("closed", "--help");
        assertEquals(0, help.code(), help::toString);
        String text = help.out().replaceAll("\\s+", " ");
        assertTrue(text.contains("Output format: text, json, markdown, latex (default: text); csv is not available"
            + " for closed forms."), text);
        assertFalse(text.contains("csv, markdown"), text);
        assertFalse(Cli.run("step", "--help").out().contains("csv is not available"));
        Cli.Result csv = Cli.run("closed", Cli.model("plant.chain"), "--format", "csv");
        assertEquals(2, csv.code(), csv::toString);
    }
}
