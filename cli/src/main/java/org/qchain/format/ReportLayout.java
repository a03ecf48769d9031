package org.qchain.format;

import java.util.Map;
import org.qchain.result.ReportResult;

/**
 * Lays out a report in one format. Every layout walks the same sections in the same order ({@link ReportWriter});
 * the formats differ only in how a heading, a paragraph, a table, a formula, a diagram or a plot is written.
 */
public interface ReportLayout {

    /**
     * The report's files.
     *
     * @param main        the document, ending with a line break
     * @param attachments further files the document links to, by a name relative to the document's directory
     *                    (Markdown: the plots as SVG files); empty for self-contained formats
     */
    record Files(String main, Map<String, String> attachments) {
        /** Copies the map. */
        public Files {
            attachments = Map.copyOf(attachments);
        }
    }

    /**
     * Lays out a report.
     *
     * @param report   the report's results
     * @param baseName the document's file name without its ending, for the names of attachments
     * @return the files
     */
    Files render(ReportResult report, String baseName);
}
