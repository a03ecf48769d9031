package org.qchain.cli.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.cli.result.Entry;
import org.qchain.cli.result.StepResult;

/**
 * Human-readable layout: an overview matrix of decimals, then every entry with its decimal beside the exact fraction
 * (exact last, so long fractions do not push other columns apart), then the caution.
 */
final class TextFormatter implements Formatter {
    /** Lines of the decimal overview stay within this many characters where they can. */
    static final int WIDTH = 100;

    @Override
    public String matrix(StepResult.Matrix m) {
        StepResult.Header h = m.header();
        StringBuilder sb = new StringBuilder();
        sb.append(power(h)).append(" for ").append(h.source()).append(" (").append(h.kind()).append(" chain, ")
            .append(m.states().size()).append(m.states().size() == 1 ? " state)" : " states)").append('\n');
        sb.append("Row i, column j: probability of being in state j after ").append(steps(h.n()))
            .append(", starting in state i.\n\n");
        sb.append("Decimals (").append(digits(h)).append("):\n");
        List<int[]> blocks = columnBlocks(m);
        for (int[] block : blocks) {
            if (blocks.size() > 1) {
                sb.append("columns ").append(block[0] + 1).append(" to ").append(block[1]).append(" of ")
                    .append(m.states().size()).append(":\n");
            }
            TextTable overview = new TextTable();
            List<String> head = new ArrayList<>();
            head.add("from\\to");
            head.addAll(m.states().subList(block[0], block[1]));
            overview.addRow(head);
            for (int i = 0; i < m.states().size(); i++) {
                List<String> line = new ArrayList<>();
                line.add(m.states().get(i));
                for (Entry e : m.entries().get(i).subList(block[0], block[1])) {
                    line.add(e.decimal());
                }
                overview.addRow(line);
            }
            sb.append(overview.render()).append('\n');
        }
        sb.append("Exact values:\n");
        TextTable list = new TextTable().addRow("from", "to", "decimal", "exact");
        for (int i = 0; i < m.states().size(); i++) {
            for (int j = 0; j < m.states().size(); j++) {
                Entry e = m.entries().get(i).get(j);
                list.addRow(m.states().get(i), m.states().get(j), e.decimal(), e.exact().plain());
            }
        }
        sb.append(list.render());
        return sb.append('\n').append(Caution.wrapped(WIDTH)).append('\n').toString();
    }

    /**
     * Splits the overview's columns into blocks [start, end) whose lines stay within {@link #WIDTH} characters (at
     * least one column a block), so that a matrix of many states stays readable in a terminal.
     */
    private static List<int[]> columnBlocks(StepResult.Matrix m) {
        int n = m.states().size();
        int label = "from\\to".length();
        for (String s : m.states()) {
            label = Math.max(label, s.length());
        }
        List<int[]> out = new ArrayList<>();
        int start = 0;
        int used = label;
        for (int j = 0; j < n; j++) {
            int w = m.states().get(j).length();
            for (List<Entry> row : m.entries()) {
                w = Math.max(w, row.get(j).decimal().length());
            }
            if (j > start && used + 2 + w > WIDTH) {
                out.add(new int[] {start, j});
                start = j;
                used = label;
            }
            used += 2 + w;
        }
        out.add(new int[] {start, n});
        return out;
    }

    @Override
    public String row(StepResult.Row r) {
        StepResult.Header h = r.header();
        StringBuilder sb = new StringBuilder();
        sb.append("Row ").append(r.from()).append(" of ").append(power(h)).append(" for ").append(h.source())
            .append(" (").append(h.kind()).append(" chain)\n");
        sb.append("Probability of being in each state after ").append(steps(h.n())).append(", starting in ")
            .append(r.from()).append("; decimals to ").append(digits(h)).append(".\n\n");
        TextTable t = new TextTable().addRow("to", "decimal", "exact");
        for (int j = 0; j < r.states().size(); j++) {
            Entry e = r.entries().get(j);
            t.addRow(r.states().get(j), e.decimal(), e.exact().plain());
        }
        sb.append(t.render());
        return sb.append('\n').append(Caution.wrapped(WIDTH)).append('\n').toString();
    }

    @Override
    public String single(StepResult.Single s) {
        StepResult.Header h = s.header();
        StringBuilder sb = new StringBuilder();
        String name = power(h) + "(" + s.from() + " -> " + s.to() + ")";
        sb.append(name).append(" for ").append(h.source()).append(" (").append(h.kind()).append(" chain)\n");
        sb.append("Probability of being in ").append(s.to()).append(" after ").append(steps(h.n()))
            .append(", starting in ").append(s.from()).append(":\n");
        // not a table: a long exact value must not push the decimal's note to the right
        sb.append("  exact    ").append(s.value().exact().plain()).append('\n');
        sb.append("  decimal  ").append(s.value().decimal()).append("  (").append(digits(h)).append(")\n");
        s.paths().ifPresent(paths -> appendPaths(sb, s, name, paths));
        return sb.append('\n').append(Caution.wrapped(WIDTH)).append('\n').toString();
    }

    private static void appendPaths(StringBuilder sb, StepResult.Single s, String name,
                                    List<StepResult.PathLine> paths) {
        long n = s.header().n();
        sb.append('\n');
        if (paths.isEmpty()) {
            sb.append("No path of ").append(steps(n)).append(" leads from ").append(s.from()).append(" to ")
                .append(s.to()).append(".\n");
            return;
        }
        sb.append(paths.size() == 1 ? "The most probable path" : "The " + paths.size() + " most probable paths")
            .append(" of ").append(steps(n)).append(" from ").append(s.from()).append(" to ").append(s.to())
            .append(", with their share of ").append(name).append(":\n");
        TextTable t = new TextTable().addRow("rank", "share", "probability", "path");
        boolean runs = false;
        for (int k = 0; k < paths.size(); k++) {
            StepResult.PathLine p = paths.get(k);
            t.addRow(String.valueOf(k + 1), p.share().decimal() + "%", p.probability().decimal(),
                Paths.compact(p.states()));
            runs |= Paths.hasRun(p.states());
        }
        sb.append(t.render());
        if (runs) {
            sb.append("(\"A x3\" stands for 3 consecutive time points in state A.)\n");
        }
        sb.append("\nExact values of the paths:\n");
        TextTable e = new TextTable().addRow("rank", "share", "probability");
        for (int k = 0; k < paths.size(); k++) {
            StepResult.PathLine p = paths.get(k);
            e.addRow(String.valueOf(k + 1), p.share().exact().plain(), p.probability().exact().plain());
        }
        sb.append(e.render());
    }

    static String power(StepResult.Header h) {
        return "P^" + h.n();
    }

    static String steps(long n) {
        return n == 1 ? "1 step" : n + " steps";
    }

    static String digits(StepResult.Header h) {
        return h.digits() + " significant digits, correctly rounded";
    }
}
