package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code closed} on continuous chains (P(t) in a symbolic t with its Laplace transforms) and {@code step -t} with
 * symbolic parameters: exact output (layouts our own, common practice, no source; the formulas are checked against
 * textbook results and exact invariants in the symbolic module's TransientFormTest), usage errors with exit code 2.
 */
class ContinuousClosedFormTest {
    private static final Path GOLDEN = Path.of("src/test/resources/golden/continuous-closed");
    private static final String GEN = Cli.model("generator-set.chain");
    private static final String UNIT = Cli.model("unit-rates.chain");

    record Case(String file, List<String> args) {
        @Override
        public String toString() {
            return file;
        }
    }

    static Stream<Case> cases() {
        List<Case> out = new ArrayList<>();
        for (String f : new String[] {"text", "json", "markdown", "latex"}) {
            String ext = f.equals("text") ? "txt" : f.equals("markdown") ? "md" : f.equals("latex") ? "tex" : f;
            out.add(new Case("closed." + ext, List.of("closed", GEN, "--format", f)));
            out.add(new Case("closed-entry." + ext, List.of("closed", GEN, "--from", "Both", "--to", "None",
                "--format", f)));
        }
        for (String f : new String[] {"text", "json", "csv", "markdown", "latex"}) {
            String ext = f.equals("text") ? "txt" : f.equals("markdown") ? "md" : f.equals("latex") ? "tex" : f;
            out.add(new Case("step-t-symbolic." + ext, List.of("step", UNIT, "-t", "1,5/2", "--format", f)));
            out.add(new Case("step-t-nominal." + ext, List.of("step", GEN, "-t", "24", "--from", "Both", "--symbolic",
                "--format", f)));
        }
        out.add(new Case("closed-row.json", List.of("closed", GEN, "--start", "One", "--format", "json")));
        out.add(new Case("closed-factor.txt", List.of("closed", UNIT, "--factor")));
        out.add(new Case("closed-at.txt", List.of("closed", GEN, "--at", "mu=1/12")));
        out.add(new Case("closed-numeric.txt", List.of("closed", Cli.model("continuous.chain"))));
        out.add(new Case("closed-names.txt", List.of("closed", Cli.model("rates-named-t.chain"))));
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void outputMatchesGolden(Case c) throws IOException {
        Cli.Result r = Cli.run(c.args().toArray(new String[0]));
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err(), "stderr carries nothing on success");
        Cli.assertMatchesGolden(r, GOLDEN.resolve(c.file()));
    }

    @Test
    void oneRepairableUnitPrintsTheStandardFormula() {
        // Rausand and Hoyland, System Reliability Theory, ch. on Markov models (from memory):
        // P_UpUp(t) = mu/(lam + mu) + lam/(lam + mu) e^(-(lam + mu) t), limit mu/(lam + mu)
        Cli.Result r = Cli.run("closed", UNIT, "--from", "Up", "--to", "Up");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("P(t)(Up -> Up) = mu/(lam + mu) + lam/(lam + mu)*exp(-(lam + mu)*t)\n"), r.out());
        assertTrue(r.out().contains("  Up -> Up  mu/(lam + mu)\n"), r.out());
        assertTrue(r.out().contains("  L(Up -> Up; s) = (s + mu)/(s^2 + (lam + mu)*s)\n"), r.out());
    }

    @Test
    void stepAtATimeWithFreeRatesGivesFormulasInTheRates() {
        Cli.Result r = Cli.run("step", UNIT, "-t", "2", "--from", "Up", "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().startsWith("{\"kind\":\"continuous\",\"t\":\"2\",\"matrix\":[[\"mu/(lam + mu) + lam/(lam + mu)"
            + "*exp(-2*lam - 2*mu)\",\"lam/(lam + mu) - lam/(lam + mu)*exp(-2*lam - 2*mu)\"]],\"digits\":12,"
            + "\"symbolic\":true,\"t_symbol\":\"t\""), r.out());
    }

    @Test
    void symbolsMoveAwayFromParametersNamedTAndS() {
        Cli.Result r = Cli.run("closed", Cli.model("rates-named-t.chain"), "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("\"t_symbol\":\"tau\",\"transform_variable\":\"p\""), r.out());
        assertTrue(r.out().contains("exp(-(t + s)*tau)"), r.out());
    }

    @Test
    void seriesFormsAreRefusedAndCsvIsWrittenForContinuousClosedForms() {
        Cli.Result gf = Cli.run("closed", GEN, "--form", "recurrence");
        assertEquals(2, gf.code(), gf::toString);
        assertEquals("qchain: this is a continuous chain; the recurrence form is for discrete-time chains (a continuous"
            + " chain's closed form comes with its Laplace transforms)\n", gf.err());
        // CSV carries a continuous closed form as it does a discrete one: one record per entry, in t
        Cli.Result csv = Cli.run("closed", GEN, "--format", "csv");
        assertEquals(0, csv.code(), csv::toString);
        assertTrue(csv.out().startsWith("record,from,to,r,name,formula,valid_from,multiplicity,decimal,proved\r\n"),
            csv.out());
        assertTrue(csv.out().contains("\r\nentry,Both,Both,,,mu^2/(2*lam^2 + 2*lam*mu + mu^2) + "), csv.out());
        assertTrue(csv.out().contains("*t)"), csv.out());
        // a start distribution is refused on a continuous chain, with the option at fault
        Cli.Result dist = Cli.run("closed", GEN, "--start", "Both=1/2", "--start", "One=1/2");
        assertEquals(2, dist.code(), dist::toString);
        assertTrue(dist.err().contains("--start"), dist.err());
    }

    @Test
    void stepTimeOptionsOfDiscreteChainsStayRefused() {
        Cli.Result r = Cli.run("step", UNIT, "-t", "1", "--to", "Up");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().contains("-t takes --from, --digits, --max-work, --symbolic, --factor, --format and --output;"
            + " --to, --start and --paths are for discrete chains"), r.err());
        Cli.Result f = Cli.run("step", GEN, "-t", "1", "--factor");
        assertEquals(2, f.code(), f::toString);
        assertTrue(f.err().contains("--factor applies to symbolic results"), f.err());
    }
}
