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
 * on the pages. A command shown without output (a list of commands), or on a model that is only a name on the page
 * ({@code pump.chain}), is skipped. The model paths are relative to the repository root, as on the pages.
 */
class DocExamplesTest {
    private static final Path ROOT = Path.of("..");

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
                args.add(a.startsWith("docs/") ? "../" + a : a);
            }
            Cli.Result r = Cli.run(args.toArray(String[]::new));
            // a page that shows no message line shows stdout only; the caution footer is left off the pages
            boolean messages = e.shown().lines().anyMatch(l -> l.startsWith("qchain: "));
            String actual = withoutCaution((messages ? r.err() : "") + r.out()).replace("../docs/", "docs/")
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

    /** The examples of one page. */
    private static List<Example> examples(Path page) throws IOException {
        List<String> lines = Files.readAllLines(page, StandardCharsets.UTF_8);
        List<Example> out = new ArrayList<>();
        boolean fenced = false;
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            if (line.startsWith("```")) {
                fenced = !fenced;
                continue;
            }
            String cmd = line.startsWith("$ qchain ") ? line.substring(9)
                : line.startsWith("$ ./qchain ") ? line.substring(11) : null;
            if (!fenced || cmd == null) {
                continue;
            }
            StringBuilder shown = new StringBuilder();
            int j = i + 1;
            while (j < lines.size() && !lines.get(j).startsWith("```") && !lines.get(j).startsWith("$ ")) {
                shown.append(lines.get(j)).append('\n');
                j++;
            }
            List<String> args = words(cmd);
            boolean modelExists = args.size() < 2 || !args.get(1).contains(".") || Files.exists(ROOT.resolve(args.get(1)));
            if (shown.length() > 0 && modelExists) {
                out.add(new Example(ROOT.relativize(page) + ":" + (i + 1), args, shown.toString()));
            }
        }
        return out;
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
