package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Progress;

/** {@link Analysis#run} answers the structure and long-run queries as their own methods do (a report needs that). */
class RunQueriesTest {
    private static final LoadedModel PRESS = LoadedModel.load(Path.of("src/test/resources/models/press.chain"),
        Optional.empty());

    @Test
    void classesLongRunAndAbsorptionRunThroughRun() {
        assertEquals(Analysis.classes(PRESS, LongRunQuery.plain()), Analysis.run(PRESS, ClassesQuery.plain(),
            Progress.NONE));
        assertEquals(Analysis.longRun(PRESS, LongRunQuery.plain()), Analysis.run(PRESS, LongRunQuery.plain(),
            Progress.NONE));
        assertEquals(Analysis.absorb(PRESS, AbsorbQuery.plain()), Analysis.run(PRESS, AbsorbQuery.plain(),
            Progress.NONE));
    }
}
