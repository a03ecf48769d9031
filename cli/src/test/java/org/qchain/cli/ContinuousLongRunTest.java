package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.analysis.AbsorbQuery;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.AvailabilityQuery;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.LongRunQuery;
import org.qchain.exact.Rational;
import org.qchain.exact.model.ModelParser;
import org.qchain.result.AbsorbResult;
import org.qchain.result.LongRunResult;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFun;

/** {@code classes}, {@code longrun} and {@code absorb} on continuous chains (rates). */
class ContinuousLongRunTest {
    private static final String GEN = Cli.model("generator-set.chain");
    private static final String CAUTION = "\nCaution: results are only as good as the model; safety-critical use"
        + " follows the applicable standards, local codes and licensed engineering review.\n";

    @Test
    void classesOfARateGraph() {
        Cli.Result r = Cli.run("classes", GEN);
        assertEquals(0, r.code(), r::toString);
        assertEquals("Structure of " + GEN + "; parameters at lam=1/500, mu=1/12 (nominal values)\n"
            + "absorbing: (none)\ntransient: (none)\n\n"
            + "Communicating classes\n  class  states         kind\n  0      Both One None  closed\n\n"
            + "Rates (entry from row to column; blank: no transition; diagonal: minus the total rate out)\n"
            + "        Both                        One                         None\n"
            + "  Both  -1/250 (-0.00400000000000)  1/250 (0.00400000000000)\n"
            + "  One   1/12 (0.0833333333333)      -32/375 (-0.0853333333333)  1/500 (0.00200000000000)\n"
            + "  None                              1/12 (0.0833333333333)      -1/12 (-0.0833333333333)\n"
            + CAUTION, r.out());
        Cli.Result j = Cli.run("classes", GEN, "--format", "json");
        assertTrue(j.out().startsWith("{\"source\":\"" + GEN + "\",\"kind\":\"continuous\",\"states\":[\"Both\","
            + "\"One\",\"None\"],\"parameters\":[],\"classes\":[{\"states\":[\"Both\",\"One\",\"None\"],\"closed\":true,"
            + "\"period\":1}]"), j.out());
    }

    // Two identical units in active parallel, failure rate lam each, one repair crew mu: the steady-state
    // unavailability is 2 lam^2/(mu^2 + 2 lam mu + 2 lam^2) and the mean time to failure from both up is
    // (3 lam + mu)/(2 lam^2) (M. Rausand and A. Hoyland, System Reliability Theory, ch. 8; from memory)
    @Test
    void parallelPairFormulas() {
        LoadedModel m = LoadedModel.load(Path.of(GEN), Optional.empty());
        ParamRing ring = ParamRing.of(m.model());
        LongRunResult lr = Analysis.longRun(m, new LongRunQuery(false, true, LongRunQuery.DEFAULT_MAX_DIGITS, 40));
        assertTrue(lr.continuous());
        assertEquals(ring.fromExpr(ModelParser.parseExpression("<ref>", "2*lam^2/(mu^2 + 2*lam*mu + 2*lam^2)")),
            ring.fromExpr(ModelParser.parseExpression("<lr>", lr.classes().get(0).stationary().get(2).plain())));
        Cli.Result r = Cli.run("absorb", GEN, "--absorbing", "None", "--symbolic", "--format", "json");
        assertEquals(0, r.code(), r::toString);
        String t = r.out().replaceAll(".*\"expected_steps\":\\{\"Both\":\"([^\"]*)\".*\\s*", "$1");
        assertEquals(ring.fromExpr(ModelParser.parseExpression("<ref>", "(3*lam + mu)/(2*lam^2)")),
            ring.fromExpr(ModelParser.parseExpression("<absorb>", t)));
    }

    // common practice, no source: the exact figures agree with avail's own route (stationary law, MTTF) at the
    // nominal rates, and the symbolic formulas evaluated there equal the exact numbers
    @Test
    void agreesWithAvailAndWithItsFormulas() {
        LoadedModel m = LoadedModel.load(Path.of(GEN), Optional.empty());
        var fig = Analysis.availability(m, AvailabilityQuery.steadyState(), org.qchain.exact.Progress.NONE);
        LongRunResult exact = Analysis.longRun(m, new LongRunQuery(false, false, LongRunQuery.DEFAULT_MAX_DIGITS, 40));
        LongRunResult sym = Analysis.longRun(m, new LongRunQuery(false, true, LongRunQuery.DEFAULT_MAX_DIGITS, 40));
        ParamRing ring = ParamRing.of(m.model());
        Map<String, Rational> at = Map.of("lam", Rational.of(1, 500), "mu", Rational.of(1, 12));
        for (int i = 0; i < 3; i++) {
            String e = exact.classes().get(0).stationary().get(i).plain();
            assertEquals(fig.stationary().get(m.states().get(i)).toString(), e);
            RatFun f = ring.fromExpr(ModelParser.parseExpression("<sym>", sym.classes().get(0).stationary().get(i)
                .plain()));
            assertEquals(Rational.parse(e), f.evaluate(at));
        }
        AbsorbQuery q = AbsorbQuery.plain();
        AbsorbResult ab = Analysis.absorb(m, new AbsorbQuery(q.from(), List.of("None"), q.rewards(), q.discount(),
            q.steps(), q.limits()));
        assertEquals(fig.mttf().get("Both").orElseThrow().toString(), ab.expectedSteps().get(0).plain());
        assertEquals(fig.mttf().get("One").orElseThrow().toString(), ab.expectedSteps().get(1).plain());
    }

    @Test
    void stepCountingOptionsAreRefused() {
        Cli.Result d = Cli.run("absorb", GEN, "--absorbing", "None", "--reward", Cli.model("press-rewards.txt"),
            "--discount", "1/2");
        assertEquals(2, d.code(), d::toString);
        Cli.Result s = Cli.run("absorb", GEN, "--absorbing", "None", "--steps", "3");
        assertEquals(2, s.code(), s::toString);
        assertEquals("qchain: --steps: the first-passage distribution counts steps and needs a discrete chain; for a"
            + " continuous chain qchain avail gives the reliability and qchain step -t the probabilities at given"
            + " times\n", s.err());
    }
}
