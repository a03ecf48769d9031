package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * Every query's size guard refuses before any engine runs: the progress passed in fails the test at the first
 * report, which any engine makes when it starts (a rule of this project, common practice, no source).
 */
class SizeGuardTest {
    private static final Path MODEL = Path.of("../docs/examples/pump-station-params.chain");
    private static final Progress NO_ENGINE = (phase, done, total) -> {
        throw new AssertionError("an engine ran: " + phase);
    };

    @Test
    void aPathSearchPastItsLimitIsRefusedBeforeTheEntryIsComputed() {
        // step -n 2000000 --from Up --to Down --paths 5 on a 3-state chain (it used to compute the entry first)
        LoadedModel pump = LoadedModel.load(MODEL, Map.of());
        QchainException e = assertThrows(QchainException.class,
            () -> Analysis.step(pump, StepQuery.entry(2_000_000, "Up", "Down").withPaths(5), NO_ENGINE));
        assertEquals(ErrorKey.PATH_SEARCH_TOO_LARGE, e.key());
    }

    @Test
    void aSymbolicStepWhoseValuesAtThePointAreTooLargeIsRefusedBeforeTheSymbolicEngine() {
        LoadedModel pump = LoadedModel.load(MODEL, Map.of("p", Rational.of(1, 20)));
        QchainException e = assertThrows(QchainException.class,
            () -> Analysis.step(pump, StepQuery.row(50_000_000, "Up").withSymbolic(true), NO_ENGINE));
        assertEquals(ErrorKey.RESULT_TOO_LARGE, e.key());
    }

    @Test
    void aNumericPowerPastTheDigitLimitIsRefusedBeforeSquaring() {
        LoadedModel pump = LoadedModel.load(MODEL, Map.of());
        QchainException e = assertThrows(QchainException.class,
            () -> Analysis.step(pump, StepQuery.matrix(1L << 40), NO_ENGINE));
        assertEquals(ErrorKey.RESULT_TOO_LARGE, e.key());
    }
}
