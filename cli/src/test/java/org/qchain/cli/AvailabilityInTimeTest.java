package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.AvailabilityQuery;
import org.qchain.analysis.LoadedModel;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.SymbolicAvailabilityResult;

/**
 * The point availability A(t) and the reliability R(t) of {@code qchain avail}: as closed forms in t on the formulas
 * route, and as certified decimals at given times on the numeric route.
 */
class AvailabilityInTimeTest {
    private static final String UNIT = Cli.model("repairable-unit.chain");
    private static final String ONE = Cli.model("one-unit.chain");
    private static final String PAIR = Cli.model("pair-rational-roots.chain");

    private static SymbolicAvailabilityResult.InTime inTime(String file, int maxTimeStates) {
        LoadedModel m = LoadedModel.load(Path.of(file), Optional.empty());
        AvailabilityQuery d = AvailabilityQuery.steadyState();
        return Analysis.availabilityFormulas(m, new AvailabilityQuery(d.from(), d.times(), d.hoursPerYear(),
            d.digits(), d.maxBits(), d.maxWork(), true, d.maxStates(), maxTimeStates), Progress.NONE).inTime()
            .orElseThrow();
    }

    @Test
    void oneRepairableUnitHasTheTextbookAvailabilityAndReliability() {
        // Standard reliability texts (e.g. Rausand and Hoyland, System Reliability Theory, ch. on Markov models),
        // from memory: A(t) = mu/(lam+mu) + lam/(lam+mu) exp(-(lam+mu)t), R(t) = exp(-lam t).
        SymbolicAvailabilityResult.InTime t = inTime(UNIT, AvailabilityQuery.DEFAULT_MAX_TIME_STATES);
        assertEquals("Up", t.from());
        assertEquals("t", t.time());
        assertEquals("mu/(lam + mu) + lam/(lam + mu)*exp(-(lam + mu)*t)", t.pointAvailability().plain());
        assertEquals("exp(-lam*t)", t.reliability().plain());
        assertTrue(t.availabilityWhere().isEmpty() && t.reliabilityWhere().isEmpty());
    }

    @Test
    void parallelPairReliabilityIsTheTwoExponentialFormula() {
        // Two identical units in active parallel, one repair crew (standard result, from memory):
        // R(t) = (s1 exp(s2 t) - s2 exp(s1 t))/(s1 - s2), s1, s2 the roots of s^2 + (3 lam + mu) s + 2 lam^2.
        // With lam = 1, mu = 3/2: s1 = -1/2, s2 = -4, so R(t) = 8/7 exp(-t/2) - 1/7 exp(-4t) (worked by hand).
        SymbolicAvailabilityResult.InTime t = inTime(PAIR, AvailabilityQuery.DEFAULT_MAX_TIME_STATES);
        assertEquals("8/7*exp(-1/2*t) - 1/7*exp(-4*t)", t.reliability().plain());
    }

    @Test
    void certifiedReliabilityAgreesWithTheClosedFormEvaluatedWithApfloat() {
        // R(t) from the numeric route (uniformization with the down states absorbing) against the closed forms
        // above evaluated with apfloat's exp at 60 digits (a reference library): one unit exp(-t/100) and the pair
        // 8/7 exp(-t/2) - 1/7 exp(-4t).
        for (String t : List.of("1", "10", "5/2")) {
            Rational time = Rational.parse(t);
            Apfloat x = new Apfloat(new BigDecimal(time.numerator()).divide(new BigDecimal(time.denominator()),
                new MathContext(60)), 60);
            Apfloat one = ApfloatMath.exp(x.multiply(new Apfloat("-0.01", 60)));
            Apfloat pair = ApfloatMath.exp(x.multiply(new Apfloat("-0.5", 60))).multiply(new Apfloat(8, 60))
                .subtract(ApfloatMath.exp(x.multiply(new Apfloat(-4, 60)))).divide(new Apfloat(7, 60));
            assertEquals(round(one), reliability(ONE, time), "one unit at t=" + t);
            assertEquals(round(pair), reliability(PAIR, time), "pair at t=" + t);
        }
    }

    @Test
    void reliabilityNeverExceedsAvailabilityAtTheSameTime() {
        // R(t) <= A(t): staying up throughout [0, t] implies being up at t (common practice, no source)
        LoadedModel m = LoadedModel.load(Path.of(PAIR), Optional.empty());
        AvailabilityResult r = Analysis.availability(m, new AvailabilityQuery(Optional.empty(),
            List.of(Rational.of(1), Rational.of(7)), Rational.of(8766), 12, 4096), Progress.NONE);
        for (int k = 0; k < 2; k++) {
            assertTrue(new BigDecimal(r.reliability().get(k).value().text())
                .compareTo(new BigDecimal(r.point().get(k).value().text())) < 0);
        }
    }

    @Test
    void theStateLimitLeavesTheFormulasOutWithAWarning() {
        LoadedModel m = LoadedModel.load(Path.of(PAIR), Optional.empty());
        AvailabilityQuery d = AvailabilityQuery.steadyState();
        SymbolicAvailabilityResult r = Analysis.availabilityFormulas(m, new AvailabilityQuery(d.from(), d.times(),
            d.hoursPerYear(), d.digits(), d.maxBits(), d.maxWork(), true, d.maxStates(), 2), Progress.NONE);
        assertTrue(r.inTime().isEmpty());
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("up to 2 states; this one has 3")), r::toString);
        Cli.Result json = Cli.run("avail", UNIT, "--format", "json");
        assertEquals(0, json.code(), json::toString);
        assertTrue(json.out().contains("\"point_availability\":\"mu/(lam + mu) + lam/(lam + mu)*exp(-(lam + mu)*t)\""
            + ",\"reliability\":\"exp(-lam*t)\",\"from\":\"Up\",\"t_symbol\":\"t\""), json.out());
        Cli.Result bad = Cli.run("avail", UNIT, "--max-time-states", "-1");
        assertEquals(2, bad.code(), bad::toString);
    }

    @Test
    void formulasInTPutTheRatesInForAModelWithValues() {
        // one unit with lam = 1/100, mu = 1/10: A(t) = mu/(lam+mu) + lam/(lam+mu) e^(-(lam+mu)t) and R(t) = e^(-lam t)
        // (Billinton and Allan, Reliability Evaluation of Engineering Systems, ch. on continuous Markov processes;
        // from memory), so 10/11 + 1/11 e^(-11t/100) and e^(-t/100)
        Cli.Result json = Cli.run("avail", Cli.model("one-unit.chain"), "--formulas-in-t", "--format", "json");
        assertEquals(0, json.code(), json::toString);
        assertTrue(json.out().contains("\"point_availability\":\"10/11 + 1/11*exp(-11/100*t)\",\"reliability\":"
            + "\"exp(-1/100*t)\""), json.out());
        assertTrue(json.out().contains("\"parameters\":[]"), json.out());
        // a model with nominal values: they are put in and said to be nominal; the figures are exact numbers
        Cli.Result text = Cli.run("avail", Cli.model("generator-set.chain"), "--formulas-in-t");
        assertEquals(0, text.code(), text::toString);
        assertTrue(text.out().contains("Substituted before solving (nominal values): lam=1/500, mu=1/12\n"), text.out());
        // two units in parallel, one crew: A = 1 - 2 lam^2/(mu^2 + 2 lam mu + 2 lam^2) (Billinton and Allan, the same
        // chapter; from memory) = 16375/16393 at lam = 1/500, mu = 1/12
        assertTrue(text.out().contains("\nsteady-state availability                 16375/16393\n"), text.out());
        assertTrue(text.out().contains("point availability A(t) from Both         16375/16393 + "), text.out());
        // a parameter without a value stays in the formulas; one given with --at is put in and said to be given
        Cli.Result mixed = Cli.run("avail", Cli.model("repairable-unit.chain"), "--formulas-in-t", "--at",
            "lam=1/100", "--format", "json");
        assertEquals(0, mixed.code(), mixed::toString);
        // mu/(lam+mu) at lam = 1/100 is 100 mu/(1 + 100 mu), lam/(lam+mu) is 1/(1 + 100 mu) (the formula above)
        assertTrue(mixed.out().contains("\"point_availability\":\"100*mu/(1 + 100*mu) + 1/(1 + 100*mu)*exp(-(1/100"
            + " + mu)*t)\""), mixed.out());
        assertTrue(mixed.out().contains("\"parameters\":[\"mu\"]"), mixed.out());
        assertTrue(mixed.out().contains("\"reliability\":\"exp(-1/100*t)\""), mixed.out());
        Cli.Result both = Cli.run("avail", Cli.model("one-unit.chain"), "--formulas-in-t", "--symbolic");
        assertEquals(2, both.code(), both::toString);
        assertTrue(both.err().startsWith("qchain: Options '--formulas-in-t' and '--symbolic' exclude each other"),
            both.err());
    }

    /** The value rounded to 12 significant digits, as the certified decimals print it (no exponent). */
    private static String round(Apfloat v) {
        return new BigDecimal(v.toString(true)).round(new MathContext(12, RoundingMode.HALF_EVEN)).toPlainString();
    }

    private static String reliability(String file, Rational t) {
        LoadedModel m = LoadedModel.load(Path.of(file), Optional.empty());
        AvailabilityResult r = Analysis.availability(m, new AvailabilityQuery(Optional.empty(), List.of(t),
            Rational.of(8766), 12, 4096), Progress.NONE);
        return r.reliability().get(0).value().text();
    }
}
