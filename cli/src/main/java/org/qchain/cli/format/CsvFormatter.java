package org.qchain.cli.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.cli.result.Entry;
import org.qchain.cli.result.StepResult;

/**
 * Comma-separated values as RFC 4180 defines them: CRLF after every record, a header row, fields quoted when they hold
 * a comma, a quotation mark or a line break, quotation marks doubled.
 *
 * <p>The full matrix is written as a header row of state names and one row of exact values per state, which is the
 * plain CSV matrix form that the model parser reads back: the output of {@code step -n N --format csv} is itself a
 * valid model (the N-step chain).
 */
final class CsvFormatter implements Formatter {
    private static final String EOL = "\r\n";

    @Override
    public String matrix(StepResult.Matrix m) {
        StringBuilder sb = new StringBuilder();
        record(sb, m.states());
        for (List<Entry> row : m.entries()) {
            record(sb, row.stream().map(e -> e.exact().plain()).toList());
        }
        return sb.toString();
    }

    @Override
    public String row(StepResult.Row r) {
        StringBuilder sb = new StringBuilder();
        record(sb, List.of("n", "from", "to", "value", "decimal"));
        for (int j = 0; j < r.states().size(); j++) {
            Entry e = r.entries().get(j);
            record(sb, List.of(String.valueOf(r.header().n()), r.from(), r.states().get(j), e.exact().plain(),
                e.decimal()));
        }
        return sb.toString();
    }

    @Override
    public String single(StepResult.Single s) {
        StringBuilder sb = new StringBuilder();
        if (s.paths().isPresent()) {
            record(sb, List.of("rank", "probability", "decimal", "share", "percent", "path"));
            List<StepResult.PathLine> paths = s.paths().get();
            for (int k = 0; k < paths.size(); k++) {
                StepResult.PathLine p = paths.get(k);
                record(sb, List.of(String.valueOf(k + 1), p.probability().exact().plain(), p.probability().decimal(),
                    p.share().exact().plain(), p.share().decimal(), String.join(" ", p.states())));
            }
            return sb.toString();
        }
        record(sb, List.of("n", "from", "to", "value", "decimal"));
        record(sb, List.of(String.valueOf(s.header().n()), s.from(), s.to(), s.value().exact().plain(),
            s.value().decimal()));
        return sb.toString();
    }

    private static void record(StringBuilder sb, List<String> fields) {
        List<String> out = new ArrayList<>(fields.size());
        for (String f : fields) {
            out.add(field(f));
        }
        sb.append(String.join(",", out)).append(EOL);
    }

    /** One field, quoted only where RFC 4180 section 2 requires it. */
    static String field(String f) {
        if (f.indexOf(',') < 0 && f.indexOf('"') < 0 && f.indexOf('\n') < 0 && f.indexOf('\r') < 0) {
            return f;
        }
        return '"' + f.replace("\"", "\"\"") + '"';
    }
}
