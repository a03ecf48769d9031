package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;

/**
 * {@code qchain closed}: exact output in every format against golden files in
 * {@code src/test/resources/golden/closed/}, and the usage errors. The layouts are our own (common practice, no
 * source; JSON RFC 8259, the shape named in issue 4 of this project). The formula in them is the standard two-state
 * closed form P^n(Lit -> Lit) = (b + a (1 - a - b)^n)/(a + b) (Grinstead and Snell, Introduction to Probability,
 * ch. 11, from memory), whose agreement with exact powers the symbolic module's tests check.
 *
 * <p>After an intended change of layout, regenerate with {@code mvn -pl cli test -Dtest=ClosedCommandTest
 * -Dqchain.updateGolden=true} and review the diff before committing.
 */
class ClosedCommandTest {
    private static final Path GOLDEN = Path.of("src/test/resources/golden/closed");
    private static final String BEACON = Cli.model("beacon.chain");

    record Case(String file, List<String> args) {
        @Override
        public String toString() {
            return file;
        }
    }

    static Stream<Case> cases() {
        List<Case> out = new ArrayList<>();
        for (String f : new String[] {"text", "json", "markdown", "latex", "csv"}) {
            String ext = f.equals("text") ? "txt" : f.equals("markdown") ? "md" : f.equals("latex") ? "tex" : f;
            out.add(new Case("matrix." + ext, List.of(BEACON, "--format", f)));
            out.add(new Case("row." + ext, List.of(BEACON, "--start", "Lit", "--format", f)));
            out.add(new Case("entry." + ext, List.of(BEACON, "--from", "Lit", "--to", "Dark", "--format", f)));
            out.add(new Case("gf." + ext, List.of(BEACON, "--form", "gf", "--from", "Lit", "--to", "Lit", "--format", f)));
            out.add(new Case("recurrence." + ext, List.of(BEACON, "--form", "recurrence", "--from", "Lit", "--format", f)));
        }
        // a is given, b keeps its nominal value 1/2 for the numeric rate
        out.add(new Case("at.txt", List.of(BEACON, "--at", "a=1/10", "--from", "Lit")));
        out.add(new Case("at.csv", List.of(BEACON, "--at", "a=1/10", "--from", "Lit", "--format", "csv")));
        // CSV of a start distribution and a set of final states: the fields as step's CSV writes them
        out.add(new Case("start-set.csv", List.of(BEACON, "--start", "Lit=1/4", "--start", "Dark=3/4", "--to",
            "Lit,Dark", "--format", "csv")));
        // numeric chains: a Jordan block (binomial terms) and a period-2 chain
        out.add(new Case("jordan.json", List.of(Cli.model("closed-jordan.chain"), "--format", "json")));
        out.add(new Case("periodic.txt", List.of(Cli.model("closed-periodic.chain"))));
        // CSV: the limits of each subsequence r, a double eigenvalue, the roots of a named cubic, --factor
        out.add(new Case("periodic.csv", List.of(Cli.model("closed-periodic.chain"), "--format", "csv")));
        out.add(new Case("jordan.csv", List.of(Cli.model("closed-jordan.chain"), "--format", "csv")));
        out.add(new Case("cubic.csv", List.of(Cli.model("closed-cubic.chain"), "--from", "Run", "--to", "Run",
            "--format", "csv")));
        out.add(new Case("plant-factor.csv", List.of(Cli.model("plant.chain"), "--from", "Up", "--to", "Down",
            "--factor", "--format", "csv")));
        // regression (issue 8): parameters named n and x move the formulas' symbols; closed domains with a
        // periodic corner (n = x = 1) state the long run's condition and the special points
        out.add(new Case("names.txt", List.of(Cli.model("closed-names.chain"))));
        out.add(new Case("names.json", List.of(Cli.model("closed-names.chain"), "--form", "gf", "--from", "Running",
            "--to", "Broken", "--format", "json")));
        // an irreducible quadratic factor (square roots) in every format, and a named cubic with numeric roots
        for (String f : new String[] {"text", "json", "markdown", "latex", "csv"}) {
            String ext = f.equals("text") ? "txt" : f.equals("markdown") ? "md" : f.equals("latex") ? "tex" : f;
            out.add(new Case("quadratic." + ext, List.of(Cli.model("closed-stages.chain"), "--from", "Working",
                "--to", "Fixing", "--format", f)));
        }
        // a condition with roots inside the domain (a double eigenvalue there): reported as not shown to hold
        out.add(new Case("plant-entry.txt", List.of(Cli.model("plant.chain"), "--from", "Up", "--to", "Down")));
        // a double irreducible quadratic with a Jordan block: binomial(n, k) times the (n - k)-th powers of the pair
        String rounds = Cli.model("closed-rounds.chain");
        out.add(new Case("rounds.txt", List.of(rounds, "--from", "Draft1")));
        out.add(new Case("rounds.json", List.of(rounds, "--format", "json")));
        out.add(new Case("rounds-entry.tex", List.of(rounds, "--from", "Draft1", "--to", "Revise2", "--format", "latex")));
        out.add(new Case("cubic.txt", List.of(Cli.model("closed-cubic.chain"), "--from", "Run", "--to", "Run",
            "--digits", "15")));
        // parameters named s and l1: the square root and the eigenvalues take other names (R, L1/λ1)
        out.add(new Case("names-quadratic.txt", List.of(Cli.model("closed-stages-names.chain"), "--at", "l1=1/2",
            "--from", "Working", "--to", "Fixing")));
        out.add(new Case("names-quadratic.json", List.of(Cli.model("closed-stages-names.chain"), "--at", "l1=1/2",
            "--from", "Working", "--to", "Fixing", "--format", "json")));
        // --factor: coefficients and limits with numerator and denominator factored, det(xI - P) as a product
        out.add(new Case("plant-factor.txt", List.of(Cli.model("plant.chain"), "--from", "Up", "--factor")));
        out.add(new Case("plant-factor.json", List.of(Cli.model("plant.chain"), "--from", "Up", "--to", "Down",
            "--factor", "--format", "json")));
        out.add(new Case("rounds-factor.tex", List.of(rounds, "--from", "Draft1", "--to", "Draft2", "--factor",
            "--format", "latex")));
        // issue 8: a start distribution and a set of final states, in every format: one formula built from the
        // combined coefficients (checked against step in ClosedCombinationTest)
        String plant = Cli.model("plant.chain");
        for (String f : new String[] {"text", "json", "markdown", "latex"}) {
            String ext = f.equals("text") ? "txt" : f.equals("markdown") ? "md" : f.equals("latex") ? "tex" : f;
            out.add(new Case("plant-start-set." + ext, List.of(plant, "--start", "Up=9/10", "--start", "Worn=1/10",
                "--to", "Worn,Down", "--format", f)));
        }
        out.add(new Case("plant-start-row.json", List.of(plant, "--start", "Up=9/10", "--start", "Worn=1/10",
            "--format", "json")));
        out.add(new Case("plant-start-gf.txt", List.of(plant, "--start", "Up=9/10", "--start", "Worn=1/10",
            "--to", "Worn,Down", "--form", "gf")));
        out.add(new Case("plant-start-recurrence.json", List.of(plant, "--start", "Up=9/10", "--start", "Worn=1/10",
            "--to", "Worn,Down", "--form", "recurrence", "--format", "json")));
        // the whole state space: probability 1, no condition (the terms of 1 - a - b cancel)
        out.add(new Case("beacon-all.txt", List.of(BEACON, "--from", "Lit", "--to", "Lit,Dark")));
        // a periodic chain: the start's limits of both subsequences
        out.add(new Case("periodic-start-set.txt", List.of(Cli.model("closed-periodic.chain"), "--start",
            "StopA=1/2", "--start", "Hub=1/2", "--to", "StopA,StopB")));
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void closedOutputMatchesGolden(Case c) throws IOException {
        List<String> args = new ArrayList<>(List.of("closed"));
        args.addAll(c.args());
        Cli.Result r = Cli.run(args.toArray(new String[0]));
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err(), "stderr carries nothing on success");
        Cli.assertMatchesGolden(r, GOLDEN.resolve(c.file()));
    }

    @Test
    void jsonHasTheDocumentedShape() {
        Cli.Result r = Cli.run("closed", BEACON, "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().startsWith("{\"n_symbol\":\"n\",\"valid_from\":0,\"conditions\":[\"a + b != 0\"],"
            + "\"states\":[\"Lit\",\"Dark\"],\"matrix\":[[\"b/(a + b) + a/(a + b)*(1 - a - b)^n\","), r.out());
        Cli.Result e = Cli.run("closed", BEACON, "--from", "Lit", "--to", "Lit", "--format", "json");
        assertTrue(e.out().contains("\"from\":\"Lit\",\"to\":\"Lit\",\"formula\":\"b/(a + b) + a/(a + b)*(1 - a - b)^n\""),
            e.out());
    }

    /** The columns of closed's CSV, as docs/commands.md lists them. */
    private static final List<String> CSV_HEADER = List.of("record", "from", "to", "r", "name", "formula",
        "valid_from", "multiplicity", "decimal", "proved");

    @Test
    void csvIsOneRfc4180TableWithOneKindPerRecord() {
        java.util.Set<String> kinds = java.util.Set.of("entry", "coefficient", "initial", "condition", "factor",
            "eigenvalue", "limit", "rate", "long_run_condition", "special_point", "substituted", "point");
        for (List<String> args : List.of(List.of(BEACON), List.of(Cli.model("closed-names.chain")),
                List.of(BEACON, "--at", "a=1/10"),
                List.of(Cli.model("closed-cubic.chain")), List.of(Cli.model("plant.chain"), "--from", "Up"),
                List.of(BEACON, "--form", "recurrence"), List.of(BEACON, "--form", "gf", "--from", "Dark"))) {
            List<String> all = new ArrayList<>(List.of("closed"));
            all.addAll(args);
            all.addAll(List.of("--format", "csv"));
            Cli.Result r = Cli.run(all.toArray(new String[0]));
            assertEquals(0, r.code(), r::toString);
            assertEquals("", r.err());
            List<List<String>> records = Rfc4180.parse(r.out());
            assertEquals(CSV_HEADER, records.get(0), args.toString());
            for (List<String> rec : records.subList(1, records.size())) {
                assertEquals(CSV_HEADER.size(), rec.size(), rec::toString);
                assertTrue(kinds.contains(rec.get(0)), rec::toString);
                assertTrue(List.of("", "true", "false").contains(rec.get(9)), rec::toString);
                assertEquals(rec.get(0).endsWith("condition"), !rec.get(9).isEmpty(), rec::toString);
            }
        }
    }

    @Test
    void csvFormulasReadBackToTheExactPowers() {
        // each entry of P^n, read back from the CSV and evaluated at n = 5, a = 1/3, b = 1/5, is step's exact value;
        // each limit is the entry of the stationary law, b/(a + b) = 3/8 for Lit (Grinstead and Snell, ch. 11,
        // from memory)
        Cli.Result c = Cli.run("closed", BEACON, "--format", "csv");
        Cli.Result s = Cli.run("step", BEACON, "-n", "5", "--at", "a=1/3", "--at", "b=1/5", "--format", "csv");
        assertEquals(0, s.code(), s::toString);
        List<List<String>> step = Rfc4180.parse(s.out());
        java.util.Map<String, org.qchain.exact.Rational> at = java.util.Map.of("n", org.qchain.exact.Rational.of(5),
            "a", org.qchain.exact.Rational.of(1, 3), "b", org.qchain.exact.Rational.of(1, 5));
        int entries = 0;
        for (List<String> rec : Rfc4180.parse(c.out())) {
            if (rec.get(0).equals("entry")) {
                // step's records: n,from,to,value,decimal,formula
                List<String> same = step.stream().filter(x -> x.get(1).equals(rec.get(1)) && x.get(2).equals(rec.get(2)))
                    .findFirst().orElseThrow();
                assertEquals(org.qchain.exact.Rational.parse(same.get(3)),
                    org.qchain.result.FormulaTree.parse(rec.get(5)).evaluate(at).orElseThrow(), rec::toString);
                entries++;
            }
            if (rec.get(0).equals("limit") && rec.get(2).equals("Lit")) {
                assertEquals(org.qchain.exact.Rational.of(3, 8),
                    org.qchain.result.FormulaTree.parse(rec.get(5)).evaluate(at).orElseThrow(), rec::toString);
            }
        }
        assertEquals(4, entries);
    }

    private static void assertUsage(String message, String... args) {
        Cli.Result r = Cli.run(args);
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out());
        assertEquals("qchain: " + message, r.errLines()[0], r::toString);
        assertTrue(!r.err().contains("\tat "), "no stack trace");
    }

    @Test
    void badOptionsAreUsageErrors() {
        assertUsage("--to needs --from (the starting state) or --start (the initial state or distribution)", "closed", BEACON, "--to", "Lit");
        assertUsage("--start and --from both name the starting state; give one", "closed", BEACON, "--start", "Lit",
            "--from", "Dark");
        assertUsage("invalid --from 'Gone': not a state of " + BEACON + " (states: Lit, Dark)", "closed", BEACON,
            "--from", "Gone");
        assertUsage("--factor applies to --form matrix (the closed form in n)", "closed", BEACON, "--form", "gf",
            "--factor");
        assertUsage("Invalid value for option '--form': 'series' is not a form; use matrix, gf or recurrence",
            "closed", BEACON, "--form", "series");
        assertUsage("invalid --at 'a=2': value 2 of parameter 'a' is outside its domain (0, 1)", "closed", BEACON,
            "--at", "a=2");
        assertUsage("this is a continuous chain; the gf form is for discrete-time chains (a continuous chain's closed"
            + " form comes with its Laplace transforms)", "closed", Cli.model("continuous.chain"), "--form", "gf");
    }

    @Test
    void conditionsThatAlwaysHoldAreNotReportedAsNotShown() {
        // regression (issue 8): the press model's radicand 1 - 10p + 10r + 25p^2 + 50pr + 25r^2 is
        // (5p + 5r - 1)^2 + 20r > 0 on the open domains (by hand: common practice, no source); a condition with a
        // zero inside the domains (18 - 9p - 10r, 0 at p = 8/9, r = 1) is still reported
        Cli.Result r = Cli.run("closed", Cli.model("press.chain"));
        assertEquals(0, r.code(), r::toString);
        String first = r.out().lines().filter(l -> l.startsWith("Valid for")).findFirst().orElseThrow();
        assertEquals("Valid for n >= 0 where 1 - 10*p + 10*r + 25*p^2 + 50*p*r + 25*r^2 != 0. It always holds"
            + " inside the parameters' domains.", first);
        assertTrue(r.out().contains("Not shown to hold throughout the parameters' domains: 18 - 9*p - 10*r != 0."),
            r.out());
    }

    @Test
    void hugeInputIsRefusedWithTheEstimate() {
        assertUsage("the symbolic P^2 would have up to about 24 polynomial terms in total (entries of degree up to 2),"
            + " more than the limit 3; raise it with --max-terms", "closed", BEACON, "--max-terms", "3");
    }

    @Test
    void aParameterFreeClosedFormPastTheDigitLimitIsRefusedWithTheEstimate() {
        // chi = (x - 1)(x^3 - x^2/12 + 7x/24 + 1/4): the parts of both factors, 4 x 4^2 entries; the engine counts
        // 1040 digits after factoring, the size guard's bound from P's entries, before any work, is 2720
        assertUsage("the result would have about 2720 digits in total, more than the limit 10; raise it with"
            + " --max-digits", "closed", Cli.model("closed-cubic.chain"), "--max-digits", "10");
        assertUsage("the result would have about 2720 digits in total, more than the limit 1040; raise it with"
            + " --max-digits", "closed", Cli.model("closed-cubic.chain"), "--max-digits", "1040");
        assertEquals(0, Cli.run("closed", Cli.model("closed-cubic.chain"), "--max-digits", "2720").code());
    }

    // common practice, no source: a value given with --at is substituted before solving, and every format says so
    @Test
    void valuesGivenWithAtAreNamedAsSubstituted() {
        String m = "../docs/examples/pump-station-params.chain";
        Cli.Result t = Cli.run("closed", m, "--at", "p=1/10", "--from", "Up", "--to", "Down");
        assertEquals(0, t.code(), t::toString);
        assertTrue(t.out().contains("\nParameters (symbolic): r\nSubstituted before solving (given with --at): p=1/10\n"),
            t.out());
        Cli.Result j = Cli.run("closed", m, "--at", "p=1/10", "--from", "Up", "--to", "Down", "--format", "json");
        assertTrue(j.out().contains("\"parameters\":[\"r\"],\"substituted\":{\"p\":\"1/10\"}"), j.out());
        Cli.Result md = Cli.run("closed", m, "--at", "p=1/10", "--from", "Up", "--to", "Down", "--format", "markdown");
        assertTrue(md.out().contains("Substituted before solving (given with --at): `p=1/10`."), md.out());
        Cli.Result none = Cli.run("closed", m, "--from", "Up", "--to", "Down", "--format", "json");
        assertTrue(!none.out().contains("substituted"), none.out());
    }
}
