package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.RateSensQuery;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.ctmc.RateSensitivity.Figure;
import org.qchain.result.RateSensResult;
import org.qchain.result.SensResult;

/** {@code qchain sens --of FIGURE --sweep}: the figure and its exact derivative over exact values of a parameter. */
class RateSweepTest {
    private static final String ONE_UNIT = "chain continuous\nparam lam in (0, inf) = 1/400\n"
        + "param mu in (0, inf) = 1/6\nstates Up Down\nup Up\nUp Down lam\nDown Up mu\n";
    private static final String TWO_UNITS = "chain continuous\nparam lam in (0, inf) = 1/500\n"
        + "param mu in (0, inf) = 1/12\nstates Both One None\nup Both One\n"
        + "Both One 2*lam\nOne None lam\nOne Both mu\nNone One mu\n";
    private static final String GEN = Cli.model("generator-set.chain");

    private static RateSensResult sweep(String text, Figure f, String wrt, String range) {
        List<Long> seen = new ArrayList<>();
        RateSensResult r = Analysis.rateSens(LoadedModel.fromText("m.chain", text),
            new RateSensQuery(f, wrt, Optional.empty(), Optional.of(range), SizeEstimate.DEFAULT_MAX_DIGITS),
            (phase, done, total) -> seen.add(done));
        int n = r.sweep().orElseThrow().lines().size();
        assertEquals(n, seen.get(seen.size() - 1), "progress reaches the number of points");
        return r;
    }

    @Test
    void oneUnitAvailabilityOverTheRepairRateIsTheClosedForm() {
        // A = mu/(lam+mu), dA/dmu = lam/(lam+mu)^2 (R. Billinton and R. N. Allan, "Reliability Evaluation of
        // Engineering Systems", ch. 9, the two-state model; from memory).
        Rational lam = Rational.of(1, 400);
        RateSensResult r = sweep(ONE_UNIT, Figure.AVAILABILITY, "mu", "mu in [1/24, 1/6] by 1/48");
        List<SensResult.SweepLine> lines = r.sweep().orElseThrow().lines();
        assertEquals(7, lines.size());
        for (SensResult.SweepLine l : lines) {
            Rational s = lam.add(l.value());
            assertEquals(l.value().divide(s), l.probability(), "A at mu = " + l.value());
            assertEquals(lam.divide(s.multiply(s)), l.derivative(), "dA/dmu at mu = " + l.value());
            // elasticity (mu/A) dA/dmu = lam/(lam+mu)
            assertEquals(lam.divide(s), r.elasticity(l).orElseThrow());
        }
        assertEquals(Rational.of(1, 24), lines.get(0).value());
        assertEquals(Rational.of(1, 6), lines.get(6).value());
    }

    @Test
    void twoUnitMttfOverTheRepairRateIsTheClosedForm() {
        // MTTF from both up = (3 lam + mu)/(2 lam^2), so dMTTF/dmu = 1/(2 lam^2) (Billinton and Allan, ch. 9; from
        // memory); eleven points with the "with N points" form.
        Rational lam = Rational.of(1, 500);
        Rational twoLam2 = Rational.of(2).multiply(lam).multiply(lam);
        RateSensResult r = sweep(TWO_UNITS, Figure.MTTF, "mu", "mu in [1/24, 1/4] with 11 points");
        List<SensResult.SweepLine> lines = r.sweep().orElseThrow().lines();
        assertEquals(11, lines.size());
        for (SensResult.SweepLine l : lines) {
            assertEquals(Rational.of(3).multiply(lam).add(l.value()).divide(twoLam2), l.probability());
            assertEquals(twoLam2.reciprocal(), l.derivative());
        }
    }

    @Test
    void sweepingTheFailureRateGivesTheDerivativeInTheRepairRateAtEachPoint() {
        // dMTTF/dmu = 1/(2 lam^2) at every swept lam, mu fixed at its nominal 1/12 (same source as above).
        RateSensResult r = sweep(TWO_UNITS, Figure.MTTF, "mu", "lam in [1/1000, 1/100] by 1/1000");
        for (SensResult.SweepLine l : r.sweep().orElseThrow().lines()) {
            Rational lam = l.value();
            assertEquals(Rational.of(2).multiply(lam).multiply(lam).reciprocal(), l.derivative());
            // the elasticity uses the point's mu, not the swept lam
            assertEquals(Rational.of(1, 12).divide(l.probability()).multiply(l.derivative()),
                r.elasticity(l).orElseThrow());
        }
    }

    @Test
    void everyDerivativeAgreesWithACentralDifferenceOfTheSweepsExactValues() {
        // On a fine sweep, (F(x+h) - F(x-h))/(2h) from neighbouring exact values matches the exact derivative at x to
        // O(h^2) (common practice, no source).
        for (Figure f : Figure.values()) {
            for (String p : new String[] {"lam", "mu"}) {
                String range = p.equals("lam") ? "lam in [1/510, 1/490] by 1/1000000" : "mu in [1/12, 1/11] by 1/100000";
                RateSensResult r = sweep(TWO_UNITS, f, p, range);
                List<SensResult.SweepLine> lines = r.sweep().orElseThrow().lines();
                Rational h = r.sweep().orElseThrow().step();
                for (int k = 1; k + 1 < lines.size(); k += Math.max(1, lines.size() / 7)) {
                    Rational central = lines.get(k + 1).probability().subtract(lines.get(k - 1).probability())
                        .divide(h.multiply(Rational.of(2)));
                    Rational d = lines.get(k).derivative();
                    assertTrue(central.subtract(d).abs().compareTo(d.abs().multiply(Rational.of(1, 100_000))) <= 0,
                        f + " by " + p + " at " + lines.get(k).value() + ": " + central + " vs " + d);
                }
            }
        }
    }

    @Test
    void theCommandPrintsTheTableInEveryFormat() {
        for (String f : new String[] {"text", "json", "csv", "markdown", "latex"}) {
            Cli.Result r = Cli.run("sens", GEN, "--of", "mttf", "--wrt", "mu", "--sweep", "mu in [1/24, 1/6] by 1/48",
                "--format", f);
            assertEquals(0, r.code(), r::toString);
            assertEquals("", r.err());
            // the first and last point: MTTF 17875/3 at mu = 1/24, 64750/3 at mu = 1/6, derivative 125000
            assertTrue(r.out().contains("17875") && r.out().contains("64750") && r.out().contains("125000"), f);
            if (!f.equals("csv")) {
                assertTrue(r.out().contains("licensed engineering review"), f);
            }
        }
        Cli.Result j = Cli.run("sens", GEN, "--of", "availability", "--wrt", "mu", "--sweep",
            "mu in [1/24, 1/6] with 3 points", "--format", "json");
        assertTrue(j.out().contains("\"sweep\":{\"parameter\":\"mu\",\"start\":\"1/24\",\"step\":\"1/16\",\"end\":\"1/6\","
            + "\"others\":{\"lam\":\"1/500\"},\"rows\":[{\"mu\":\"1/24\",\"value\":\"17125/17197\","
            + "\"decimal\":\"0.995813223237\",\"derivative\":\"56592000/295736809\",\"derivative_decimal\":"
            + "\"0.191359338025\",\"elasticity\":\"18864/2355989\",\"elasticity_decimal\":\"0.00800682855480\"}"),
            j.out());
        Cli.Result c = Cli.run("sens", GEN, "--of", "mttf", "--wrt", "mu", "--sweep", "mu in [1/24, 1/6] with 2 points",
            "--format", "csv");
        // CSV records end in CRLF (RFC 4180)
        assertEquals("mu,value,decimal,derivative,derivative_decimal,elasticity,elasticity_decimal\r\n"
            + "1/24,17875/3,5958.33333333,125000,125000,125/143,0.874125874126\r\n"
            + "1/6,64750/3,21583.3333333,125000,125000,250/259,0.965250965251\r\n", c.out());
    }

    @Test
    void aSweepPastTheDigitLimitIsRefusedBeforeAnySolveWithItsEstimate() {
        Cli.Result r = Cli.run("sens", GEN, "--of", "mttf", "--wrt", "mu", "--sweep", "mu in [1/24, 1/6] by 1/4800",
            "--max-digits", "1000");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().matches("qchain: the sweep would compute about [0-9]+ digits of exact values at 601 points,"
            + " more than the limit 1000; raise it with --max-digits, or sweep fewer points\n"), r.err());
        assertEquals(0, Cli.run("sens", GEN, "--of", "mttf", "--wrt", "mu", "--sweep", "mu in [1/24, 1/6] by 1/4800")
            .code());
    }

    @Test
    void anInterruptStopsTheSweepBetweenPoints() {
        Thread.currentThread().interrupt();
        try {
            org.qchain.exact.QchainException e = org.junit.jupiter.api.Assertions.assertThrows(
                org.qchain.exact.QchainException.class, () -> Analysis.rateSens(LoadedModel.fromText("m.chain",
                    TWO_UNITS), new RateSensQuery(Figure.MTTF, "mu", Optional.empty(),
                    Optional.of("mu in [1/24, 1/6] by 1/48"), SizeEstimate.DEFAULT_MAX_DIGITS), Progress.NONE));
            assertEquals(org.qchain.exact.ErrorKey.INTERRUPTED, e.key());
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void badSweepsAreUsageErrors() {
        for (String s : new String[] {"nu in [0, 1] by 1/10", "mu in [1, 0] by 1/10", "mu in [0, 1] by 0",
            "mu in [-1, 1] by 1/10", "mu in [0, 1] by 1/100000", "mu from 0"}) {
            Cli.Result r = Cli.run("sens", GEN, "--of", "mttf", "--wrt", "mu", "--sweep", s);
            assertEquals(2, r.code(), s + ": " + r);
            assertTrue(r.err().startsWith("qchain: ") && !r.err().contains("\tat "), r::toString);
        }
    }
}
