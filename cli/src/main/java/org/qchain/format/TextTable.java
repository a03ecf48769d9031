package org.qchain.format;

import java.util.function.IntFunction;
import java.util.ArrayList;
import java.util.List;

/** A plain-text table with left-aligned columns two spaces apart and no trailing spaces. */
final class TextTable {
    private final List<String[]> rows = new ArrayList<>();
    private final String indent;

    TextTable(String indent) {
        this.indent = indent;
    }

    TextTable() {
        this("");
    }

    /** Appends a row (mutates this table). */
    TextTable addRow(String... cells) {
        rows.add(cells.clone());
        return this;
    }

    /** Appends a row (mutates this table). */
    TextTable addRow(List<String> cells) {
        return addRow(cells.toArray(new String[0]));
    }

    /** The table, each line ending with a line break. */
    String render() {
        int cols = rows.stream().mapToInt(r -> r.length).max().orElse(0);
        int[] width = new int[cols];
        for (String[] r : rows) {
            for (int c = 0; c < r.length; c++) {
                width[c] = Math.max(width[c], length(r[c]));
            }
        }
        StringBuilder sb = new StringBuilder();
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder(indent);
            for (int c = 0; c < r.length; c++) {
                line.append(r[c]);
                if (c < r.length - 1) {
                    line.append(" ".repeat(width[c] - length(r[c]) + 2));
                }
            }
            sb.append(line.toString().stripTrailing()).append('\n');
        }
        return sb.toString();
    }

    /**
     * Writes the table with one more column at the right, whose cells are given one by one in row order by
     * {@code lastCell} (called once per row, the header row first) and passed on to the sink after every line: the
     * same text as {@link #render} of the table with that column, without holding that column in memory.
     */
    void render(Sink sink, IntFunction<String> lastCell) {
        int cols = rows.stream().mapToInt(r -> r.length).max().orElse(0);
        int[] width = new int[cols];
        for (String[] r : rows) {
            for (int c = 0; c < r.length; c++) {
                width[c] = Math.max(width[c], length(r[c]));
            }
        }
        for (int i = 0; i < rows.size(); i++) {
            String[] r = rows.get(i);
            StringBuilder line = new StringBuilder(indent);
            for (int c = 0; c < r.length; c++) {
                line.append(r[c]).append(" ".repeat(width[c] - length(r[c]) + 2));
            }
            line.append(lastCell.apply(i));
            sink.sb.append(line.toString().stripTrailing()).append('\n');
            sink.spill();
        }
    }

    private static int length(String s) {
        return s.codePointCount(0, s.length());
    }
}
