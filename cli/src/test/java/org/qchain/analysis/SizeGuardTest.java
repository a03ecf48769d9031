package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
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

    private static final Path FREE = Path.of("src/test/resources/models/free.chain");

    @Test
    void aSymbolicPowerPastTheTermLimitIsRefusedBeforeTheSymbolicEngine() {
        // the term limit of the symbolic power is the analysis layer's decision now, not RatFunMatrix.power's
        LoadedModel pump = LoadedModel.load(MODEL, Map.of());
        StepQuery q = StepQuery.matrix(40).withSymbolic(true);
        StepQuery few = new StepQuery(q.n(), q.from(), q.to(), q.paths(), q.maxDigits(), q.maxPathDigits(), true,
            false, 100);
        QchainException e = assertThrows(QchainException.class, () -> Analysis.step(pump, few, NO_ENGINE));
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE, e.key());
        assertEquals("the symbolic P^40 would have up to about 7749 polynomial terms in total (entries of degree up"
            + " to 40), more than the limit 100; raise it with --max-terms", e.getMessage());
        QchainException row = assertThrows(QchainException.class, () -> Analysis.run(pump,
            new StepQuery(40, Optional.of("Up"), Optional.empty(), OptionalInt.empty(), q.maxDigits(),
                q.maxPathDigits(), true, false, 100), NO_ENGINE));
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE, row.key());
    }

    @Test
    void aSymbolicPowerPastTheDigitLimitIsRefusedBeforeTheSymbolicEngine() {
        LoadedModel free = LoadedModel.load(FREE, Map.of());
        StepQuery q = new StepQuery(400, Optional.empty(), Optional.empty(), OptionalInt.empty(), 1000,
            Long.MAX_VALUE, true, false, StepQuery.DEFAULT_MAX_TERMS);
        QchainException e = assertThrows(QchainException.class, () -> Analysis.run(free, q, NO_ENGINE));
        assertEquals(ErrorKey.SYMBOLIC_DIGITS_TOO_LARGE, e.key());
    }

    @Test
    void aSensitivityPastTheTermLimitIsRefusedBeforeTheSymbolicEngine() {
        LoadedModel pump = LoadedModel.load(MODEL, Map.of());
        SensQuery q = new SensQuery(60, "Up", "Down", "p", Optional.empty(), false, 100, 50_000_000);
        QchainException e = assertThrows(QchainException.class, () -> Analysis.run(pump, q, NO_ENGINE));
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE, e.key());
    }

    @Test
    void closedFormsPastTheTermLimitAreRefusedBeforeTheClosedFormEngine() {
        // the closed forms' guard on P^1 .. P^s sat inside ClosedForms; it is the analysis layer's now
        LoadedModel free = LoadedModel.load(FREE, Map.of());
        ClosedQuery q = new ClosedQuery(org.qchain.result.ClosedResult.Form.MATRIX, Optional.empty(), "--from",
            Optional.empty(), 2, 12);
        QchainException e = assertThrows(QchainException.class, () -> Analysis.run(free, q, NO_ENGINE));
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE, e.key());
        ClosedQuery series = new ClosedQuery(org.qchain.result.ClosedResult.Form.GF, Optional.empty(),
            "--from", Optional.empty(), 2, 12);
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE,
            assertThrows(QchainException.class, () -> Analysis.run(free, series, NO_ENGINE)).key());
    }

    @Test
    void aNumericPowerPastTheDigitLimitIsRefusedBeforeSquaring() {
        LoadedModel pump = LoadedModel.load(MODEL, Map.of());
        QchainException e = assertThrows(QchainException.class,
            () -> Analysis.step(pump, StepQuery.matrix(1L << 40), NO_ENGINE));
        assertEquals(ErrorKey.RESULT_TOO_LARGE, e.key());
    }

    private static final Path PUMP = Path.of("src/test/resources/models/pump-params.chain");
    private static final Path CUBIC = Path.of("src/test/resources/models/closed-cubic.chain");

    @Test
    void aSweepPastTheDigitLimitIsRefusedBeforeTheFormulaIsComputed() {
        // the sweep's own figure needs the formula (a power of the symbolic matrix, which reports its progress);
        // the guard's bound comes from the one-step matrix
        LoadedModel pump = LoadedModel.load(PUMP, Map.of());
        SensQuery q = new SensQuery(20, "Up", "Down", "p", Optional.of("p in [0, 1/2] by 1/20000"), false,
            StepQuery.DEFAULT_MAX_TERMS, 100_000);
        QchainException e = assertThrows(QchainException.class, () -> Analysis.run(pump, q, NO_ENGINE));
        assertEquals(ErrorKey.SWEEP_TOO_LARGE, e.key());
        org.junit.jupiter.api.Assertions.assertTrue(e.getMessage().matches("the sweep would compute about \\d+ digits"
            + " of exact values at 10001 points, more than the limit 100000; raise it with --max-digits, or sweep"
            + " fewer points"), e::getMessage);
        // within the limit, the same sweep runs
        SensQuery small = new SensQuery(20, "Up", "Down", "p", Optional.of("p in [0, 1/2] by 1/20"), false,
            StepQuery.DEFAULT_MAX_TERMS, 100_000);
        assertEquals(11, Analysis.sens(pump, small, Progress.NONE).sweep().orElseThrow().lines().size());
    }

    @Test
    void aSweepInTheOtherParameterIsBoundedToo() {
        LoadedModel pump = LoadedModel.load(PUMP, Map.of("p", Rational.of(1, 10)));
        SensQuery q = new SensQuery(10, "Up", "Down", "p", Optional.of("r in [0, 1/2] by 1/20000"), false,
            StepQuery.DEFAULT_MAX_TERMS, 40_000);
        assertEquals(ErrorKey.SWEEP_TOO_LARGE,
            assertThrows(QchainException.class, () -> Analysis.run(pump, q, NO_ENGINE)).key());
    }

    @Test
    void aParameterFreeClosedFormPastTheDigitLimitIsRefusedBeforeTheClosedFormEngine() {
        // the engine's own figure (1040 digits) needs the characteristic polynomial's factors, after its "powers"
        // and "factoring" phases; the guard's bound (2720) comes from P's entries
        LoadedModel cubic = LoadedModel.load(CUBIC, Map.of());
        for (org.qchain.result.ClosedResult.Form form : org.qchain.result.ClosedResult.Form.values()) {
            ClosedQuery q = new ClosedQuery(form, Optional.empty(), "--from", Optional.empty(),
                StepQuery.DEFAULT_MAX_TERMS, 12, 2719);
            QchainException e = assertThrows(QchainException.class, () -> Analysis.run(cubic, q, NO_ENGINE));
            assertEquals("the result would have about 2720 digits in total, more than the limit 2719; raise it with"
                + " --max-digits", e.getMessage());
        }
        ClosedQuery ok = new ClosedQuery(org.qchain.result.ClosedResult.Form.MATRIX, Optional.empty(), "--from",
            Optional.empty(), StepQuery.DEFAULT_MAX_TERMS, 12, 2720);
        Analysis.run(cubic, ok, Progress.NONE);
        // parameters given values make the chain parameter-free: the bound applies
        LoadedModel pump = LoadedModel.load(PUMP, Map.of("p", Rational.of(1, 10), "r", Rational.of(1, 4)));
        ClosedQuery tiny = new ClosedQuery(org.qchain.result.ClosedResult.Form.MATRIX, Optional.empty(), "--from",
            Optional.empty(), StepQuery.DEFAULT_MAX_TERMS, 12, 10);
        assertEquals(ErrorKey.RESULT_TOO_LARGE,
            assertThrows(QchainException.class, () -> Analysis.run(pump, tiny, NO_ENGINE)).key());
    }

    @Test
    void continuousClosedFormsAndSymbolicStepsAreRefusedBeforeTheClosedFormEngine() {
        LoadedModel gen = LoadedModel.load(Path.of("../docs/examples/generator-set.chain"), Map.of());
        ClosedQuery q = new ClosedQuery(org.qchain.result.ClosedResult.Form.MATRIX, Optional.empty(), "--from",
            Optional.empty(), 2, 12);
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE,
            assertThrows(QchainException.class, () -> Analysis.run(gen, q, NO_ENGINE)).key());
        TransientFormQuery t = new TransientFormQuery(java.util.List.of(Rational.ONE), Optional.empty(), 12, false, 2,
            ClosedQuery.DEFAULT_MAX_DIGITS, 1_000_000);
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE,
            assertThrows(QchainException.class, () -> Analysis.run(gen, t, NO_ENGINE)).key());
        // rates without parameters: the digit bound applies
        LoadedModel numeric = LoadedModel.load(Path.of("src/test/resources/models/continuous.chain"), Map.of());
        ClosedQuery tiny = new ClosedQuery(org.qchain.result.ClosedResult.Form.MATRIX, Optional.empty(), "--from",
            Optional.empty(), StepQuery.DEFAULT_MAX_TERMS, 12, 1);
        assertEquals(ErrorKey.RESULT_TOO_LARGE,
            assertThrows(QchainException.class, () -> Analysis.run(numeric, tiny, NO_ENGINE)).key());
        // the certified decimals at the point: their work estimate refuses before either engine
        TransientFormQuery work = new TransientFormQuery(java.util.List.of(Rational.ONE), Optional.empty(), 12, false,
            StepQuery.DEFAULT_MAX_TERMS, ClosedQuery.DEFAULT_MAX_DIGITS, 1);
        assertEquals(ErrorKey.TRANSIENT_TOO_LARGE,
            assertThrows(QchainException.class, () -> Analysis.run(numeric, work, NO_ENGINE)).key());
    }
}
