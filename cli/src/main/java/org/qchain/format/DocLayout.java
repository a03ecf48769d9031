package org.qchain.format;

import org.qchain.result.AbsorbResult;
import org.qchain.result.ClassesResult;
import org.qchain.result.LongRunResult;

/**
 * The formats that lay out the {@code classes}, {@code longrun} and {@code absorb} results as the titled tables of
 * {@link Sections} (text, Markdown, LaTeX, CSV): each renders a {@link Sections.Doc} in its own syntax. JSON is not
 * one of them: it writes its own fields for these results, so it has no {@code render} to refuse.
 */
abstract class DocLayout extends Layout {
    DocLayout(int digits) {
        super(digits);
    }

    DocLayout(int digits, boolean doubles) {
        super(digits, doubles);
    }

    @Override
    public final String classes(ClassesResult r) {
        return render(Sections.of(r));
    }

    @Override
    public final String longRun(LongRunResult r) {
        return render(Sections.of(r));
    }

    @Override
    public final String absorb(AbsorbResult r) {
        return render(Sections.of(r));
    }

    /** Renders the tables of a {@code classes}, {@code longrun} or {@code absorb} result. */
    abstract String render(Sections.Doc d);
}
