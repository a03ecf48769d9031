package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.AvailabilityQuery;
import org.qchain.analysis.LoadedModel;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.model.ModelParser;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.Formula;
import org.qchain.result.SymbolicAvailabilityResult;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFun;

/**
 * {@code qchain avail} with symbolic rates: the figures of merit as formulas, checked as identities of rational
 * functions against textbook formulas, and at random rational points against the exact numeric figures.
 */
class SymbolicAvailabilityTest {
    private static final String UNIT = Cli.model("repairable-unit.chain");
    private static final String PAIR = Cli.model("parallel-pair.chain");
    private static final Path GOLDEN = Path.of("src/test/resources/golden/continuous");

    private static SymbolicAvailabilityResult formulas(String file) {
        LoadedModel m = LoadedModel.load(Path.of(file), Optional.empty());
        return Analysis.availabilityFormulas(m, AvailabilityQuery.steadyState(), Progress.NONE);
    }

    /** Whether a printed formula equals a reference formula as a rational function of the model's parameters. */
    private static void assertSame(String file, String reference, Formula actual) {
        ParamRing ring = ParamRing.of(ModelParser.parseFile(Path.of(file)));
        assertEquals(ring.fromExpr(ModelParser.parseExpression("<reference>", reference)),
            ring.fromExpr(ModelParser.parseExpression("<avail>", actual.plain())), actual.plain());
    }

    @Test
    void oneRepairableUnit() {
        // One unit, failure rate lam, repair rate mu: A = mu/(lam + mu), MTTF = 1/lam, mean down time 1/mu, failure
        // frequency lam mu/(lam + mu) (M. Rausand and A. Hoyland, "System Reliability Theory", ch. 8, the
        // repairable single component; R. Billinton and R. N. Allan, "Reliability Evaluation of Engineering
        // Systems", ch. 9; from memory).
        SymbolicAvailabilityResult r = formulas(UNIT);
        assertEquals(List.of("Up"), r.up());
        assertEquals(List.of("lam", "mu"), r.parameters());
        assertSame(UNIT, "mu/(lam + mu)", r.availability());
        assertSame(UNIT, "lam/(lam + mu)", r.unavailability());
        assertSame(UNIT, "8766*lam/(lam + mu)", r.downHoursPerYear());
        assertSame(UNIT, "1/lam", r.mttf().get("Up").orElseThrow());
        assertSame(UNIT, "lam*mu/(lam + mu)", r.failureFrequency());
        assertSame(UNIT, "1/lam", r.meanUpTime().orElseThrow());
        assertSame(UNIT, "1/mu", r.meanDownTime().orElseThrow());
        // lam, mu and lam + mu are positive on (0, inf): every condition is proved
        assertEquals(List.of("lam != 0", "mu != 0", "lam + mu != 0"),
            r.conditions().stream().map(org.qchain.result.Condition::plain).toList());
        assertTrue(r.notProved().isEmpty());
    }

    @Test
    void twoIdenticalUnitsInActiveParallelWithOneRepairCrew() {
        // MTTF from both up = (3 lam + mu)/(2 lam^2); steady-state unavailability 2 lam^2/(mu^2 + 2 lam mu + 2 lam^2)
        // (M. Rausand and A. Hoyland, "System Reliability Theory", ch. 8, parallel system of two identical
        // components with one repair crew; from memory).
        SymbolicAvailabilityResult r = formulas(PAIR);
        assertSame(PAIR, "(3*lam + mu)/(2*lam^2)", r.mttf().get("Both").orElseThrow());
        assertSame(PAIR, "2*lam^2/(mu^2 + 2*lam*mu + 2*lam^2)", r.unavailability());
        // from One, one failure away: (2 lam + mu)/(2 lam^2) (derived by hand from -Q_UU m = 1)
        assertSame(PAIR, "(2*lam + mu)/(2*lam^2)", r.mttf().get("One").orElseThrow());
        // frequency and duration: A = omega x mean up time (common practice, no source)
        ParamRing ring = ParamRing.of(ModelParser.parseFile(Path.of(PAIR)));
        RatFun a = ring.fromExpr(ModelParser.parseExpression("<a>", r.availability().plain()));
        RatFun w = ring.fromExpr(ModelParser.parseExpression("<w>", r.failureFrequency().plain()));
        RatFun up = ring.fromExpr(ModelParser.parseExpression("<u>", r.meanUpTime().orElseThrow().plain()));
        assertEquals(a, w.multiply(up));
    }

    @Test
    void aConditionOnAClosedEndIsNotProved() {
        // lam may be 0 here: then the unit never fails, and 1/lam is no MTTF (common practice, no source)
        LoadedModel m = LoadedModel.fromText("closed.chain", "chain continuous\nparam lam in [0, inf)\n"
            + "param mu in (0, inf)\nstates Up Down\nup Up\nUp Down lam\nDown Up mu\n");
        SymbolicAvailabilityResult r = Analysis.availabilityFormulas(m, AvailabilityQuery.steadyState(),
            Progress.NONE);
        assertEquals(List.of("lam != 0"), r.notProved().stream().map(org.qchain.result.Condition::plain)
            .toList());
    }

    /** A random repairable chain of four states with three symbolic rates; the cycle keeps it irreducible. */
    private static String randomModel(Random rnd) {
        String[] rates = {"a", "b", "c", "a + b", "2*c", "1/2", "a*b", "b + 1/3"};
        StringBuilder sb = new StringBuilder("chain continuous\nparam a in (0, inf)\nparam b in (0, inf)\n"
            + "param c in (0, inf)\nstates S0 S1 S2 S3\nup S0 S1" + (rnd.nextBoolean() ? " S2" : "") + "\n");
        for (int i = 0; i < 4; i++) {
            for (int j = 0; j < 4; j++) {
                if (i != j && (j == (i + 1) % 4 || rnd.nextInt(3) == 0)) {
                    sb.append("S").append(i).append(" S").append(j).append(' ')
                        .append(rates[rnd.nextInt(rates.length)]).append('\n');
                }
            }
        }
        return sb.toString();
    }

    /** A formula's value at a point; each formula text is read into the ring once per chain, not once per point. */
    private static Rational value(Formula f, Map<String, Rational> at, ParamRing ring, Map<String, RatFun> read) {
        return read.computeIfAbsent(f.plain(), t -> ring.fromExpr(ModelParser.parseExpression("<f>", t)))
            .evaluate(at);
    }

    @Test
    void formulasAtRandomRationalPointsEqualTheExactFigures() {
        // common practice, no source: the formulas evaluated at a point are the figures of the chain at that point
        Random rnd = new Random(20261203L);
        for (int trial = 0; trial < 12; trial++) {
            String text = trial < 2 ? null : randomModel(rnd);
            LoadedModel sym = text == null ? LoadedModel.load(Path.of(trial == 0 ? UNIT : PAIR), Optional.empty())
                : LoadedModel.fromText("random.chain", text);
            SymbolicAvailabilityResult f = Analysis.availabilityFormulas(sym, AvailabilityQuery.steadyState(),
                Progress.NONE);
            ParamRing ring = ParamRing.of(sym.model());
            Map<String, RatFun> read = new HashMap<>();
            for (int k = 0; k < 3; k++) {
                Map<String, Rational> at = new LinkedHashMap<>();
                for (String p : sym.model().usedParameters()) {
                    at.put(p, Rational.of(1 + rnd.nextInt(40), 1 + rnd.nextInt(60)));
                }
                LoadedModel num = LoadedModel.of(sym.model(), Optional.empty(), at);
                AvailabilityResult e = Analysis.availability(num, AvailabilityQuery.steadyState(), Progress.NONE);
                String where = text + at;
                Function<Formula, Rational> v = g -> value(g, at, ring, read);
                assertEquals(e.availability(), v.apply(f.availability()), where);
                assertEquals(e.unavailability(), v.apply(f.unavailability()), where);
                assertEquals(e.downHoursPerYear(), v.apply(f.downHoursPerYear()), where);
                assertEquals(e.failureFrequency(), v.apply(f.failureFrequency()), where);
                assertEquals(e.meanUpTime().orElseThrow(), v.apply(f.meanUpTime().orElseThrow()), where);
                assertEquals(e.meanDownTime().orElseThrow(), v.apply(f.meanDownTime().orElseThrow()), where);
                for (String s : e.up()) {
                    assertEquals(e.mttf().get(s).orElseThrow(), v.apply(f.mttf().get(s).orElseThrow()), where);
                }
                for (String s : e.states()) {
                    assertEquals(e.stationary().get(s), v.apply(f.stationary().get(s)), where);
                }
            }
        }
    }

    @Test
    void symbolicOptionGivesFormulasAndTheirValuesAtTheNominalPoint() {
        LoadedModel m = LoadedModel.load(Path.of(Cli.model("generator-set.chain")), Optional.empty());
        AvailabilityQuery d = AvailabilityQuery.steadyState();
        SymbolicAvailabilityResult r = Analysis.availabilityFormulas(m, new AvailabilityQuery(d.from(), d.times(),
            d.hoursPerYear(), d.digits(), d.maxBits(), d.maxWork(), true, d.maxStates(), 0), Progress.NONE);
        AvailabilityResult at = r.atPoint().orElseThrow();
        // 1 - 2 lam^2/(mu^2 + 2 lam mu + 2 lam^2) at lam = 1/500, mu = 1/12 (the formula above, evaluated by hand)
        assertEquals(Rational.of(16375, 16393), at.availability());
    }

    @ParameterizedTest
    @ValueSource(strings = {"text", "json", "csv", "markdown", "latex"})
    void everyFormatMatchesItsGoldenFile(String format) throws IOException {
        String ext = format.equals("text") ? "txt" : format.equals("markdown") ? "md" : format.equals("latex")
            ? "tex" : format;
        Cli.Result r = Cli.run("avail", PAIR, "--format", format);
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err());
        Cli.assertMatchesGolden(r, GOLDEN.resolve("avail-symbolic." + ext));
    }

    @Test
    void givenValuesAreSubstitutedAndNamed() throws IOException {
        Cli.Result r = Cli.run("avail", UNIT, "--at", "mu=1/10");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().startsWith("Availability of " + UNIT + " (continuous chain; up: Up; every other state is"
            + " down; formulas in lam)\nSubstituted before solving (given with --at): mu=1/10\n"), r.out());
        assertTrue(r.out().contains("steady-state availability                 1/(1 + 10*lam)\n"), r.out());
        Cli.Result s = Cli.run("avail", Cli.model("generator-set.chain"), "--symbolic", "--format", "json");
        assertEquals(0, s.code(), s::toString);
        Cli.assertMatchesGolden(s, GOLDEN.resolve("avail-symbolic-nominal.json"));
    }

    @Test
    void pointAvailabilityAtGivenTimesNeedsValues() {
        Cli.Result r = Cli.run("avail", UNIT, "-t", "1");
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out());
        assertEquals("qchain: the point availability A(t) at given times needs a value for every parameter"
            + " (parameters without a value: lam, mu; give them with --at NAME=VALUE); without -t, qchain avail"
            + " gives the steady-state figures and the MTTF as formulas in the parameters\n", r.err());
        assertFalse(Cli.run("avail", UNIT, "-t", "1", "--at", "lam=1/100,mu=1/10").out().isEmpty());
    }
}
