package org.qchain.cli.format;

import java.util.List;
import org.qchain.cli.result.Entry;
import org.qchain.cli.result.StepResult;

/**
 * One compact JSON object per result, then a line break. The keys the foundation issue names come first, in its order;
 * fields added since come after them and are never renamed or dropped (see docs/commands.md for the schema).
 */
final class JsonFormatter implements Formatter {

    @Override
    public String matrix(StepResult.Matrix m) {
        StepResult.Header h = m.header();
        List<List<String>> exact = m.entries().stream().map(r -> r.stream().map(e -> e.exact().plain()).toList())
            .toList();
        List<List<String>> decimals = m.entries().stream().map(r -> r.stream().map(Entry::decimal).toList()).toList();
        Json j = Json.object()
            .string("kind", h.kind())
            .number("n", h.n())
            .strings("states", m.states())
            .stringRows("matrix", exact)
            .stringRows("decimals", decimals);
        return common(j, h).close() + "\n";
    }

    @Override
    public String row(StepResult.Row r) {
        StepResult.Header h = r.header();
        Json j = Json.object()
            .number("n", h.n())
            .string("from", r.from())
            .strings("states", r.states())
            .strings("row", r.entries().stream().map(e -> e.exact().plain()).toList())
            .strings("decimals", r.entries().stream().map(Entry::decimal).toList())
            .string("kind", h.kind());
        return common(j, h).close() + "\n";
    }

    @Override
    public String single(StepResult.Single s) {
        StepResult.Header h = s.header();
        Json j = Json.object()
            .number("n", h.n())
            .string("from", s.from())
            .string("to", s.to())
            .string("value", s.value().exact().plain())
            .string("decimal", s.value().decimal())
            .string("kind", h.kind());
        s.paths().ifPresent(paths -> j.objects("paths", paths, p -> Json.object()
            .strings("states", p.states())
            .string("probability", p.probability().exact().plain())
            .string("decimal", p.probability().decimal())
            .string("share", p.share().exact().plain())
            .string("percent", p.share().decimal())));
        return common(j, h).close() + "\n";
    }

    private static Json common(Json j, StepResult.Header h) {
        return j.number("digits", h.digits()).string("model", h.source()).strings("warnings", h.warnings());
    }
}
