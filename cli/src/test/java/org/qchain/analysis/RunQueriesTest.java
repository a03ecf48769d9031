package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Progress;
import org.qchain.result.AbsorbResult;
import org.qchain.result.Formula;
import org.qchain.result.LongRunResult;

/**
 * {@link Analysis#run} answers the structure and long-run queries as their own methods do (a report needs that), and
 * its absorption and limit figures are the ones worked out by hand.
 */
class RunQueriesTest {
    private static final LoadedModel PRESS = LoadedModel.load(Path.of("src/test/resources/models/press.chain"),
        Optional.empty());

    private static List<String> plain(List<Formula> row) {
        return row.stream().map(Formula::plain).toList();
    }

    @Test
    void classesLongRunAndAbsorptionRunThroughRun() {
        assertEquals(Analysis.classes(PRESS, LongRunQuery.plain()), Analysis.run(PRESS, ClassesQuery.plain(),
            Progress.NONE));
        assertEquals(Analysis.longRun(PRESS, LongRunQuery.plain()), Analysis.run(PRESS, LongRunQuery.plain(),
            Progress.NONE));
        assertEquals(Analysis.absorb(PRESS, AbsorbQuery.plain()), Analysis.run(PRESS, AbsorbQuery.plain(),
            Progress.NONE));
    }

    @Test
    void runGivesTheFiguresWorkedOutByHand() {
        // press.chain at p = 1/10, r = 1/4: Q = [[9/10, 1/10], [1/4, 11/20]] on (Good, Worn), Failed absorbing.
        // By hand: det(I - Q) = 9/200 - 1/40 = 1/50, so N = (I - Q)^-1 = [[45/2, 5], [25/2, 5]] and t = N 1 =
        // (55/2, 35/2); every row of B = N R is 1 (the fundamental matrix of an absorbing chain: Grinstead and Snell,
        // Introduction to Probability, ch. 11, from memory)
        AbsorbResult a = (AbsorbResult) Analysis.run(PRESS, AbsorbQuery.plain(), Progress.NONE);
        assertEquals(List.of("Good", "Worn"), a.transients());
        assertEquals(List.of("45/2", "5"), plain(a.fundamental().get(0)));
        assertEquals(List.of("25/2", "5"), plain(a.fundamental().get(1)));
        assertEquals(List.of("55/2", "35/2"), plain(a.expectedSteps()));
        assertEquals(List.of(List.of("1"), List.of("1")), a.probabilities().stream().map(RunQueriesTest::plain)
            .toList());
        // the only closed class is {Failed}, reached with probability 1, so every row of lim P^n is (0, 0, 1)
        // (common practice, no source)
        LongRunResult l = (LongRunResult) Analysis.run(PRESS, LongRunQuery.plain(), Progress.NONE);
        for (List<Formula> row : l.limit()) {
            assertEquals(List.of("0", "0", "1"), plain(row));
        }
    }
}
