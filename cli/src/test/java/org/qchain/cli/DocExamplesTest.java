package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Every command that README.md and docs/*.md show with its output ({@code $ qchain ...} or {@code $ ./qchain ...} in
 * a fenced block, followed by the output) is run, and its output must be the text shown, so the pages cannot drift
 * from the program: stderr then stdout if the page shows a {@code qchain:} message line, else stdout; a line
 * {@code ...} stands for lines left out and {@code ...} in a line for text left out; the caution footer is not shown
 * on the pages. A command shown without output (a list of commands) is not run, but its files are checked too. The
 * model paths are relative to the repository root, as on the pages, and every file a shown command reads must exist
 * in the repository (a bundled
 * example in {@code docs/examples} or a test model in {@code cli/src/test/resources}): a block that is illustrative
 * only (its model is a name on the page) is marked by the line {@code <!-- illustrative -->} just before its fence,
 * and is not run. Normalisation: {@code \r\n} is read as {@code \n}, nothing else. Expected text: what our own pages
 * show (README.md, docs/*.md; our own interface), no outside source; the pages' figures are checked against outside
 * sources by the engine tests, not here.
 */
class DocExamplesTest {
    private static final Path ROOT = Path.of("..");

    /** The line before a fence that marks its block as illustrative only (not run). */
    static final String ILLUSTRATIVE = "<!-- illustrative -->";

    /** One example: the page and line, the arguments, the output shown. */
    record Example(String where, List<String> args, String shown) {
    }

    @TestFactory
    Stream<DynamicTest> everyShownCommandPrintsWhatThePageShows() throws IOException {
        List<Example> examples = new ArrayList<>();
        List<Path> pages = new ArrayList<>(List.of(ROOT.resolve("README.md")));
        try (Stream<Path> docs = Files.list(ROOT.resolve("docs"))) {
            docs.filter(p -> p.toString().endsWith(".md")).sorted().forEach(pages::add);
        }
        for (Path page : pages) {
            examples.addAll(examples(page));
        }
        assertTrue(examples.size() >= 15, "the pages show at least 15 commands with output: " + examples.size());
        return examples.stream().map(e -> DynamicTest.dynamicTest(e.where(), () -> {
            List<String> args = new ArrayList<>();
            for (String a : e.args()) {
                args.add(a.startsWith("docs/") || a.startsWith("cli/") ? "../" + a : a);
            }
            Cli.Result r = Cli.run(args.toArray(String[]::new));
            // a page that shows no message line shows stdout only; the caution footer is left off the pages
            boolean messages = e.shown().lines().anyMatch(l -> l.startsWith("qchain: "));
            String actual = withoutCaution((messages ? r.err() : "") + r.out()).replace("../docs/", "docs/").replace("../cli/", "cli/")
                .replace("\r\n", "\n");
            String shown = withoutCaution(e.shown());
            if (!pattern(shown).matcher(actual).matches()) {
                assertEquals(shown, actual, e.where() + ": " + String.join(" ", e.args()));
            }
        }));
    }

    /** The text without the caution paragraph (wherever it stands) and without trailing blank lines. */
    private static String withoutCaution(String text) {
        return text.replaceAll("Caution: [^\\n]*(\\n[^\\n]+)*?review\\.\\n\\n?", "").stripTrailing() + "\n";
    }

    /**
     * The shown text as a pattern: a line that is only {@code ...} stands for any lines (none included), and
     * {@code ...} inside a line for any text on it.
     */
    private static java.util.regex.Pattern pattern(String shown) {
        StringBuilder re = new StringBuilder();
        for (String line : shown.split("\n", -1)) {
            if (line.strip().equals("...")) {
                re.append("(?:[^\n]*\n)*?");
                continue;
            }
            String[] parts = line.split("\\.\\.\\.", -1);
            for (int k = 0; k < parts.length; k++) {
                re.append(k == 0 ? "" : "[^\n]*").append(java.util.regex.Pattern.quote(parts[k]));
            }
            re.append("\n");
        }
        // the split leaves one empty last line after the final newline
        return java.util.regex.Pattern.compile(re.substring(0, re.length() - 1));
    }

    @org.junit.jupiter.api.Test
    void theReadmeErrorExampleMatchesItsSnippet() throws IOException {
        String readme = Files.readString(ROOT.resolve("README.md"), StandardCharsets.UTF_8);
        int start = readme.indexOf("```\nchain discrete\n") + 4;
        String snippet = readme.substring(start, readme.indexOf("```", start));
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("had line (\\d+) said `([^`]*)`, the message would be\\s+`([^`]*)`")
            .matcher(readme);
        assertTrue(m.find(), "the README states an error example");
        List<String> lines = new ArrayList<>(snippet.lines().toList());
        int line = Integer.parseInt(m.group(1));
        String said = m.group(2);
        assertTrue(lines.get(line - 1).startsWith(said.substring(0, said.indexOf(' '))), lines.get(line - 1));
        lines.set(line - 1, said);
        org.qchain.exact.model.Model model = org.qchain.exact.model.ModelParser.parse("pump.chain",
            String.join("\n", lines) + "\n");
        org.qchain.exact.QchainException e = org.junit.jupiter.api.Assertions.assertThrows(
            org.qchain.exact.QchainException.class, () -> org.qchain.exact.model.Chains.transitionMatrix(model));
        assertEquals(m.group(3), e.getMessage());
    }

    /**
     * Every located message the pages quote in backquotes ({@code `row-sum.chain:4:1: row Up sums to 3/4, not 1`}) is
     * the real first line for the file of that name in {@code cli/src/test/resources/models/bad} ({@code check}, or
     * {@code step -t 1} for a continuous chain), or for a reference file {@code plant-p4-*} of the test model
     * {@code plant.chain} ({@code verify -n 4}); the only other file name allowed is the README's {@code pump.chain},
     * whose snippet {@link #theReadmeErrorExampleMatchesItsSnippet} checks, with that one message.
     */
    @org.junit.jupiter.api.Test
    void everyQuotedErrorMessageIsTheRealOne() throws IOException {
        Path bad = ROOT.resolve("cli/src/test/resources/models/bad");
        String readme = Files.readString(ROOT.resolve("README.md"), StandardCharsets.UTF_8);
        java.util.regex.Matcher rm = java.util.regex.Pattern.compile("the message would be\\s+`([^`]*)`")
            .matcher(readme);
        assertTrue(rm.find());
        String readmeMessage = rm.group(1);
        java.util.regex.Pattern quoted = java.util.regex.Pattern.compile(
            "`([A-Za-z0-9_-]+\\.(?:chain|csv)):(\\d+):(\\d+): ([^`]*)`");
        List<Path> pages = new ArrayList<>(List.of(ROOT.resolve("README.md")));
        try (Stream<Path> docs = Files.list(ROOT.resolve("docs"))) {
            docs.filter(p -> p.toString().endsWith(".md")).sorted().forEach(pages::add);
        }
        int checked = 0;
        for (Path page : pages) {
            java.util.regex.Matcher m = quoted.matcher(Files.readString(page, StandardCharsets.UTF_8));
            while (m.find()) {
                String name = m.group(1);
                String where = ROOT.relativize(page) + ": " + m.group();
                if (name.equals("pump.chain")) {
                    assertEquals(readmeMessage, m.group().substring(1, m.group().length() - 1), where);
                    continue;
                }
                Path file = bad.resolve(name);
                Path reference = ROOT.resolve("cli/src/test/resources/reference").resolve(name);
                Cli.Result r;
                if (name.startsWith("plant-p4-") && Files.exists(reference)) {
                    // a reference file of the test model plant.chain at n = 4: the message of verify
                    file = reference;
                    r = Cli.run("verify", Cli.model("plant.chain"), "--against", file.toString(), "-n", "4");
                } else {
                    assertTrue(Files.exists(file), where + ": no such file in " + ROOT.relativize(bad));
                    boolean continuous = Files.readString(file, StandardCharsets.UTF_8).contains("chain continuous");
                    r = continuous ? Cli.run("step", file.toString(), "-t", "1") : Cli.run("check", file.toString());
                }
                String path = file.toString();
                assertEquals(2, r.code(), where + ": " + r);
                assertEquals("qchain: " + path + m.group().substring(1 + name.length(), m.group().length() - 1),
                    r.errLines()[0], where);
                checked++;
            }
        }
        assertTrue(checked >= 30, "the pages quote at least 30 located messages of bundled files: " + checked);
    }

    /** The examples of one page. */
    private static List<Example> examples(Path page) throws IOException {
        List<String> lines = Files.readAllLines(page, StandardCharsets.UTF_8);
        List<Example> out = new ArrayList<>();
        boolean fenced = false;
        boolean illustrative = false;
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            if (line.startsWith("```")) {
                fenced = !fenced;
                illustrative = fenced && i > 0 && lines.get(i - 1).strip().equals(ILLUSTRATIVE);
                continue;
            }
            String cmd = line.startsWith("$ qchain ") ? line.substring(9)
                : line.startsWith("$ ./qchain ") ? line.substring(11) : null;
            if (fenced && !illustrative && cmd == null) {
                // a command shown without its output (a list of commands): its files must exist all the same
                java.util.regex.Matcher q = java.util.regex.Pattern.compile("(?:^|\\s)(?:\\./)?qchain (.*)$")
                    .matcher(line);
                if (q.find()) {
                    requireFiles(ROOT.relativize(page) + ":" + (i + 1), words(q.group(1).split(" #")[0]));
                }
            }
            if (!fenced || cmd == null || illustrative) {
                continue;
            }
            StringBuilder shown = new StringBuilder();
            int j = i + 1;
            while (j < lines.size() && !lines.get(j).startsWith("```") && !lines.get(j).startsWith("$ ")) {
                shown.append(lines.get(j)).append('\n');
                j++;
            }
            List<String> args = words(cmd);
            String where = ROOT.relativize(page) + ":" + (i + 1);
            requireFiles(where, args);
            if (shown.length() > 0) {
                out.add(new Example(where, args, shown.toString()));
            }
        }
        return out;
    }

    /** The files a shown command reads must be in the repository (what it writes, after -o or >, need not). */
    private static void requireFiles(String where, List<String> args) {
        for (int k = 0; k < args.size(); k++) {
            String a = args.get(k);
            boolean written = k > 0 && List.of("-o", "--output", "--save-model", ">").contains(args.get(k - 1));
            if (!written && a.matches("[^-=\\s>]+\\.(chain|csv|json)")) {
                assertTrue(Files.exists(ROOT.resolve(a)), where + ": the page's command names " + a
                    + ", which is not in the repository; use a bundled file or mark the block " + ILLUSTRATIVE);
            }
        }
    }

    /** Splits a shell command line into words; double quotes group. */
    private static List<String> words(String cmd) {
        List<String> out = new ArrayList<>();
        StringBuilder w = new StringBuilder();
        boolean quoted = false;
        boolean any = false;
        for (char c : cmd.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
                any = true;
            } else if (c == ' ' && !quoted) {
                if (any) {
                    out.add(w.toString());
                }
                w.setLength(0);
                any = false;
            } else {
                w.append(c);
                any = true;
            }
        }
        if (any) {
            out.add(w.toString());
        }
        return out;
    }
}
