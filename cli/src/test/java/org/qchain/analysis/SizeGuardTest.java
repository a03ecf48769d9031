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

    /** A walk on S0..S{n-1} with random weights to the two neighbours and the last state absorbing. */
    private static Path walk(Path dir, int n) throws java.io.IOException {
        java.util.Random rnd = new java.util.Random(60);
        StringBuilder sb = new StringBuilder("chain discrete\nstates");
        for (int i = 0; i < n; i++) {
            sb.append(" S").append(i);
        }
        sb.append('\n');
        for (int i = 0; i < n - 1; i++) {
            int up = 1 + rnd.nextInt(100);
            int down = i == 0 ? 0 : 1 + rnd.nextInt(100);
            int stay = 1 + rnd.nextInt(100);
            int total = up + down + stay;
            sb.append('S').append(i).append(" S").append(i + 1).append(' ').append(up).append('/').append(total)
                .append('\n');
            if (down > 0) {
                sb.append('S').append(i).append(" S").append(i - 1).append(' ').append(down).append('/').append(total)
                    .append('\n');
            }
        }
        Path file = dir.resolve("walk.chain");
        java.nio.file.Files.writeString(file, sb.toString());
        return file;
    }

    // a rule of this project (common practice, no source): the estimate is of what is printed, so --brief, which
    // leaves out the n x n tables, is guarded by the size of its few vectors
    @Test
    void briefSolvesAreGuardedByTheirVectorsNotByTheLeftOutTables(@org.junit.jupiter.api.io.TempDir Path dir)
            throws java.io.IOException {
        LoadedModel model = LoadedModel.load(walk(dir, 60), Map.of());
        long limit = 500_000;
        LongRunQuery full = new LongRunQuery(false, false, limit, LongRunQuery.DEFAULT_MAX_STATES, false);
        LongRunQuery brief = new LongRunQuery(false, false, limit, LongRunQuery.DEFAULT_MAX_STATES, true);
        AbsorbQuery plain = AbsorbQuery.plain();
        QchainException e = assertThrows(QchainException.class, () -> Analysis.absorb(model, new AbsorbQuery(
            plain.from(), plain.absorbing(), plain.rewards(), plain.discount(), plain.steps(), full), NO_ENGINE));
        assertEquals(ErrorKey.SOLVE_TOO_LARGE, e.key());
        org.qchain.result.AbsorbResult r = Analysis.absorb(model, new AbsorbQuery(plain.from(), plain.absorbing(),
            plain.rewards(), plain.discount(), plain.steps(), brief));
        assertEquals(59, r.expectedSteps().size());
        // and the estimate of the vectors is still an upper bound of the digits printed
        long printed = 0;
        for (org.qchain.result.Formula f : r.expectedSteps()) {
            printed += f.plain().length();
        }
        for (org.qchain.result.Formula f : r.variance()) {
            printed += f.plain().length();
        }
        long total = printed;
        org.junit.jupiter.api.Assertions.assertTrue(total < limit, () -> "printed " + total + " characters");
        // a long run of the same chain: one closed class; the limit matrix left out
        QchainException l = assertThrows(QchainException.class, () -> Analysis.longRun(model, full));
        assertEquals(ErrorKey.SOLVE_TOO_LARGE, l.key());
        org.qchain.result.LongRunResult lr = Analysis.longRun(model, brief);
        org.qchain.result.LongRunResult.ClassLaw closed = lr.classes().stream().filter(c -> c.closed()).findFirst()
            .orElseThrow();
        assertEquals(java.util.List.of("S59"), closed.states());
        assertEquals("1", closed.stationary().get(0).plain());
    }
}
