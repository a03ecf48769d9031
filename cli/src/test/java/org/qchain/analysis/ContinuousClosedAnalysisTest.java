package org.qchain.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.result.ClosedResult;
import org.qchain.result.LongRunResult;
import org.qchain.result.SymbolicTransientResult;

/** The closed form of a continuous chain's P(t) through the analysis layer, as a library user calls it. */
class ContinuousClosedAnalysisTest {
    private static final Path GEN = Path.of("../docs/examples/generator-set.chain");
    private static final Path PUMP = Path.of("../docs/examples/intake-pump.chain");

    @Test
    void theLimitAtThePointIsTheLongRunLaw() {
        // common practice, no source: lim P(t) has every row equal to the stationary law, which longrun solves from
        // pi Q = 0 on its own route
        for (Map<String, Rational> at : List.of(Map.<String, Rational>of(),
            Map.of("lam", Rational.of(1, 10), "mu", Rational.of(3, 7)))) {
            LoadedModel m = LoadedModel.load(GEN, at);
            ClosedResult closed = Analysis.closed(m, ClosedQuery.matrix(), Progress.NONE);
            assertEquals(ClosedResult.Kind.CONTINUOUS, closed.kind());
            LongRunResult lr = Analysis.longRun(m, LongRunQuery.plain());
            List<List<Rational>> values = closed.longRun().orElseThrow().values().get(0);
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    assertEquals(lr.limit().get(i).get(j).plain(), values.get(i).get(j).toString(), at + " " + i + j);
                }
            }
        }
    }

    @Test
    void theRateIsTheLargestRealPartOfTheOtherEigenvalues() {
        // the pump: eigenvalues 0 and -(lam + mu) (derived by hand from det(xI - Q) = x (x + lam + mu))
        LoadedModel m = LoadedModel.load(PUMP, Map.of("lam", Rational.of(1, 300), "mu", Rational.of(1, 8)));
        ClosedResult r = Analysis.closed(m, ClosedQuery.entry("Running", "Running"), Progress.NONE);
        // lam and mu were substituted: a closed form without parameters
        assertEquals("77/600", r.longRun().orElseThrow().rate().plain().replace("-", ""));
        assertEquals("75/77 + 2/77*exp(-77/600*t)", r.cells().get(0).get(0).plain());
        assertEquals("s", r.transformSymbol());
        assertEquals("(600*s + 75)/(600*s^2 + 77*s)", r.transforms().get(0).get(0).plain());
    }

    @Test
    void stepAtTimesGivesTheFormulasAndTheirValuesWithSymbolicRates() {
        LoadedModel m = LoadedModel.load(GEN, Map.of());
        SymbolicTransientResult r = Analysis.transientForm(m, new TransientFormQuery(List.of(Rational.of(24)),
            Optional.of("Both"), 12, false, StepQuery.DEFAULT_MAX_TERMS, ClosedQuery.DEFAULT_MAX_DIGITS,
            org.qchain.exact.certified.CertifiedPowers.DEFAULT_MAX_WORK), Progress.NONE);
        assertEquals(List.of("lam", "mu"), r.parameters());
        // the decimals at the nominal point are the numeric route's (docs/commands.md shows the same row)
        assertEquals("0.000661871711626", r.values().orElseThrow().times().get(0).rows().get(0).get(2).text());
        assertTrue(r.times().get(0).plainCells().get(0).get(2).plain().contains("exp(-24*(3/2*lam + mu"));
    }
}
