package org.qchain.format;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/** The formats of a report (the values of {@code qchain report --format}), each with its file name ending. */
public enum ReportFormat {
    /** One self-contained HTML5 file: MathML formulas, inline SVG plots and diagram, no script. */
    HTML("html", ".html"),
    /** GitHub-flavoured Markdown: GFM tables, math between {@code $...$}, plots as SVG files beside it. */
    MARKDOWN("markdown", ".md"),
    /** A complete LaTeX document (amsmath, booktabs, tikz): TikZ plots. */
    LATEX("latex", ".tex");

    private final String word;
    private final String ending;

    ReportFormat(String word, String ending) {
        this.word = word;
        this.ending = ending;
    }

    /** The word of {@code --format}. */
    public String word() {
        return word;
    }

    /** The file name ending, such as {@code .html}. */
    public String ending() {
        return ending;
    }

    /** The format of a word, ignoring case and surrounding spaces. */
    public static Optional<ReportFormat> of(String word) {
        return Arrays.stream(values()).filter(f -> f.word.equalsIgnoreCase(word.strip())).findFirst();
    }

    /** The format a file name's ending implies ({@code .htm} too), if any. */
    public static Optional<ReportFormat> ofFileName(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        if (n.endsWith(".htm")) {
            return Optional.of(HTML);
        }
        return Arrays.stream(values()).filter(f -> n.endsWith(f.ending)).findFirst();
    }

    /** Every format's word, comma-separated. */
    public static String words() {
        return Arrays.stream(values()).map(ReportFormat::word).collect(Collectors.joining(", "));
    }

    /**
     * The layout of this format.
     *
     * @param digits significant digits of the decimals
     * @return the layout
     */
    public ReportLayout layout(int digits) {
        return switch (this) {
            case HTML -> new HtmlReport(digits);
            case MARKDOWN -> new MarkdownReport(digits);
            case LATEX -> new LatexReport(digits);
        };
    }
}
