package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.TransientSensQuery;
import org.qchain.exact.Decimals;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.result.TransientSensResult;

/** {@code qchain sens MODEL -t T --from A --to B --wrt p}: certified derivatives of P(t) entries. */
class TransientSensCommandTest {
    private static final String GEN = Cli.model("generator-set.chain");

    @Test
    void oneUnitAgreesWithTheDifferentiatedClosedFormWhereItIsRational() {
        // P_up,up(t) = mu/s + (lam/s) e^(-st), s = lam + mu (R. Billinton and R. N. Allan, "Reliability Evaluation
        // of Engineering Systems", ch. 9; from memory). At t = 0 it is 1 with derivative 0, exactly; for large t
        // the transient term is below 1e-40, so P and dP/dmu are mu/s and lam/s^2 to every printed digit.
        LoadedModel m = LoadedModel.fromText("unit.chain", "chain continuous\nparam lam in (0, inf) = 1/100\n"
            + "param mu in (0, inf) = 1/10\nstates Up Down\nup Up\nUp Down lam\nDown Up mu\n");
        TransientSensResult r = Analysis.transientSens(m, new TransientSensQuery(List.of(Rational.ZERO,
            Rational.of(1000)), "Up", "Up", "mu", 15, 4096, Long.MAX_VALUE), Progress.NONE);
        assertEquals("1", r.rows().get(0).value().text());
        assertEquals("0", r.rows().get(0).derivative().text());
        Rational lam = Rational.of(1, 100);
        Rational s = lam.add(Rational.of(1, 10));
        assertEquals(Decimals.format(Rational.of(1, 10).divide(s), 15), r.rows().get(1).value().text());
        assertEquals(Decimals.format(lam.divide(s.multiply(s)), 15), r.rows().get(1).derivative().text());
    }

    @Test
    void longRunLimitIsTheExactSteadyStateDerivative() {
        // P(t)(Both -> None) tends to the steady-state unavailability, and so does its derivative in mu: at t = 1000
        // (the slowest transient decays like e^(-85)) it is minus the exact d(availability)/dmu = -6912000/268730449.
        Cli.Result r = Cli.run("sens", GEN, "-t", "1000", "--from", "Both", "--to", "None", "--wrt", "mu",
            "--format", "csv");
        assertEquals(0, r.code(), r::toString);
        String d = Decimals.format(Rational.of(-6912000, 268730449), 12);
        assertTrue(r.out().contains("1000,dP/dmu," + d + ","), r.out());
    }

    @Test
    void everyFormatPrintsTheRowsAndTheBounds() {
        for (String f : new String[] {"text", "json", "csv", "markdown", "latex"}) {
            Cli.Result r = Cli.run("sens", GEN, "-t", "1,24", "--from", "Both", "--to", "None", "--wrt", "mu",
                "--format", f);
            assertEquals(0, r.code(), r::toString);
            assertEquals("", r.err());
            assertTrue(r.out().contains("-0.00854516148452"), f + ": " + r.out());
            if (!f.equals("csv")) {
                assertTrue(r.out().contains("licensed engineering review"), f);
            }
        }
        Cli.Result j = Cli.run("sens", GEN, "-t", "24", "--from", "Both", "--to", "None", "--wrt", "mu", "--format",
            "json");
        assertTrue(j.out().startsWith("{\"kind\":\"continuous\",\"of\":\"entry\",\"from\":\"Both\",\"to\":\"None\","
            + "\"wrt\":\"mu\",\"rows\":[{\"t\":\"24\",\"value\":\"0.000661871711626\",\"derivative\":"
            + "\"-0.00854516148452\",\"elasticity\":\"-1.07588340440\",\"bound\":{\"value\":"), j.out());
    }

    @Test
    void pastTheWorkLimitItIsRefusedWithTheEstimate() {
        Cli.Result r = Cli.run("sens", GEN, "-t", "100000", "--from", "Both", "--to", "None", "--wrt", "mu",
            "--max-work", "1000");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().matches("qchain: P\\(t\\) would take about [0-9.]+e[0-9]+ multiplications of [0-9]+-bit"
            + " numbers \\(3 states, [0-9]+ rates, 1 times, uniformization rate times time up to [0-9.]+e[0-9]+\\),"
            + " more than the limit 1000; raise it with --max-work, or ask for fewer digits or times\n"), r.err());
    }

    @Test
    void badCombinationsAreUsageErrors() {
        for (String[] args : new String[][] {
            {"sens", GEN, "-t", "1", "--from", "Both", "--wrt", "mu"},
            {"sens", GEN, "-t", "1", "--from", "Both", "--to", "None", "--wrt", "mu", "-n", "2"},
            {"sens", GEN, "-t", "1", "--from", "Both", "--to", "None", "--wrt", "nu"},
            {"sens", GEN, "-t", "1", "--from", "Both", "--to", "Nowhere", "--wrt", "mu"},
            {"sens", GEN, "-t", "1", "--of", "mttf", "--wrt", "mu"},
            {"sens", Cli.model("plant.chain"), "-t", "1", "--from", "Up", "--to", "Up", "--wrt", "w"}}) {
            Cli.Result r = Cli.run(args);
            assertEquals(2, r.code(), String.join(" ", args) + ": " + r);
            assertTrue(r.err().startsWith("qchain: ") && !r.err().contains("\tat "), r::toString);
        }
    }
}
