package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;

/**
 * {@code step --start} (a state or a distribution), {@code --to} sets and {@code -n} lists and ranges: exit codes and
 * exact output, and the numbers against values computed outside the engine.
 */
class StartAndSeriesTest {
    private static final String PLANT = Cli.model("plant.chain");
    private static final String TWO = Cli.model("two-state.chain");
    private static final String CAUTION = "\nCaution: results are only as good as the model; safety-critical use"
        + " follows the applicable\nstandards, local codes and licensed engineering review.\n";

    private static Cli.Result ok(String... args) {
        Cli.Result r = Cli.run(args);
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err(), r::toString);
        return r;
    }

    private static Cli.Result usage(String... args) {
        Cli.Result r = Cli.run(args);
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out(), r::toString);
        return r;
    }

    /** The exact strings of every {@code "row":[...]} of a JSON text, in order. */
    private static List<List<Rational>> rows(String json) {
        List<List<Rational>> out = new ArrayList<>();
        Matcher m = Pattern.compile("\"row\":\\[([^\\]]*)\\]").matcher(json);
        while (m.find()) {
            List<Rational> row = new ArrayList<>();
            for (String cell : m.group(1).replace("\"", "").split(",")) {
                row.add(Rational.parse(cell));
            }
            out.add(row);
        }
        return out;
    }

    /** Grinstead and Snell, Introduction to Probability, ch. 11 (two-state chain, from memory): P^n(0, j). */
    private static List<Rational> twoStateRow(int n, Rational a, Rational b) {
        Rational s = a.add(b);
        Rational t = Rational.ONE.subtract(s).pow(n).divide(s);
        return List.of(b.divide(s).add(t.multiply(a)), a.divide(s).subtract(t.multiply(a)));
    }

    @Test
    void startDistributionPrintsTheMixtureOfRows() {
        Cli.Result r = ok("step", PLANT, "-n", "2", "--start", "Up=1/2", "--start", "Worn=1/2");
        // by hand: 1/2 row Up of P^2 (183/200, 167/2000, 3/2000) + 1/2 row Worn of P^2 (173/400, 5309/10000,
        // 183/5000), the rows of P^2 from StepValuesTest's hand count
        assertEquals("Distribution after 2 steps for " + PLANT + " (discrete chain)\n"
            + "Probability of being in each state after 2 steps, starting from the distribution Up=1/2, Worn=1/2.\n"
            + "Parameters at w=1/20 (nominal values).\n"
            + "Decimals: 12 significant digits, correctly rounded.\n\n"
            + "to    decimal          exact\n"
            + "Up    0.673750000000   539/800\n"
            + "Worn  0.307200000000   192/625\n"
            + "Down  0.0190500000000  381/20000\n" + CAUTION, r.out());
        Rational half = Rational.of(1, 2);
        assertEquals(Rational.of(539, 800), half.multiply(Rational.of(183, 200)).add(half.multiply(Rational.of(173, 400))));
        assertEquals(Rational.of(381, 20000), half.multiply(Rational.of(3, 2000)).add(half.multiply(Rational.of(183, 5000))));
    }

    @Test
    void startDistributionJsonExtendsTheRowShape() {
        Cli.Result r = ok("step", TWO, "-n", "1", "--start", "Working=0.25", "--start", "Failed=3/4", "--format",
            "json");
        // 1/4 (9/10, 1/10) + 3/4 (1/2, 1/2) = (3/5, 2/5)
        assertEquals("{\"n\":1,\"start\":{\"Working\":\"1/4\",\"Failed\":\"3/4\"},\"states\":[\"Working\",\"Failed\"],"
            + "\"row\":[\"3/5\",\"2/5\"],\"decimals\":[\"0.600000000000\",\"0.400000000000\"],\"kind\":\"discrete\","
            + "\"digits\":12,\"model\":\"" + TWO + "\",\"warnings\":[]}\n", r.out());
    }

    @Test
    void startStateIsTheRowOfFrom() {
        String start = ok("step", PLANT, "-n", "3", "--start", "Up", "--format", "json").out();
        String from = ok("step", PLANT, "-n", "3", "--from", "Up", "--format", "json").out();
        assertEquals(rows(from), rows(start));
        assertTrue(start.startsWith("{\"n\":3,\"from\":\"Up\",\"start\":{\"Up\":\"1\"},\"states\":[\"Up\",\"Worn\","
            + "\"Down\"],\"row\":[\"7127/8000\",\"10587/100000\",\"651/200000\"],"), start);
        assertTrue(start.contains(",\"kind\":\"discrete\",\"at\":{\"w\":\"1/20\"},\"digits\":12,"), start);
    }

    @Test
    void startMustSumToExactlyOne() {
        Cli.Result r = usage("step", PLANT, "-n", "3", "--start", "Up=1/2", "--start", "Worn=1/3");
        assertEquals("qchain: invalid --start 'Up=1/2 Worn=1/3': the probabilities sum to 5/6, not exactly 1\n",
            r.err());
    }

    @Test
    void badStartValuesNameTheOption() {
        assertEquals("qchain: invalid --start 'Up=x': 'x' is not a probability; write a fraction such as 3/5 or a"
            + " decimal such as 0.6\n", usage("step", PLANT, "-n", "3", "--start", "Up=x", "--start", "Down=1").err());
        assertEquals("qchain: invalid --start 'Up Down': give one state (--start Healthy) or one --start"
            + " STATE=PROBABILITY per state, summing to 1 (--start Healthy=3/5 --start Ill=2/5)\n",
            usage("step", PLANT, "-n", "3", "--start", "Up", "--start", "Down").err());
        assertEquals("qchain: invalid --start 'Sick': not a state of " + PLANT + " (states: Up, Worn, Down)\n",
            usage("step", PLANT, "-n", "3", "--start", "Sick").err());
        assertEquals("qchain: invalid --start 'Up=3/2': a probability lies in [0, 1]\n",
            usage("step", PLANT, "-n", "3", "--start", "Up=3/2", "--start", "Down=-1/2").err());
        assertEquals("qchain: invalid --start 'Up=1/2 Up=1/2': state Up is given twice\n",
            usage("step", PLANT, "-n", "3", "--start", "Up=1/2", "--start", "Up=1/2").err());
    }

    @Test
    void startAndFromExcludeEachOther() {
        assertEquals("qchain: --start and --from both name the start; give one\nTry 'qchain step --help' for more"
            + " information.\n", usage("step", PLANT, "-n", "3", "--start", "Up", "--from", "Up").err());
    }

    @Test
    void toSetIsTheSumOfItsEntries() {
        Cli.Result r = ok("step", PLANT, "-n", "2", "--from", "Up", "--to", "Worn,Down", "--format", "json");
        // 167/2000 + 3/2000 = 17/200 (the row of P^2 above)
        assertEquals("{\"n\":2,\"from\":\"Up\",\"start\":{\"Up\":\"1\"},\"to\":\"Worn,Down\","
            + "\"to_states\":[\"Worn\",\"Down\"],\"value\":\"17/200\",\"decimal\":\"0.0850000000000\","
            + "\"kind\":\"discrete\",\"at\":{\"w\":\"1/20\"},\"digits\":12,\"model\":\"" + PLANT + "\","
            + "\"warnings\":[]}\n", r.out());
        Cli.Result text = ok("step", PLANT, "-n", "2", "--start", "Up=1/2", "--start", "Worn=1/2", "--to",
            "Worn,Down");
        // 1/2 (167/2000 + 3/2000) + 1/2 (5309/10000 + 183/5000) = 261/800
        assertEquals("Probability of {Worn, Down} after 2 steps for " + PLANT + " (discrete chain)\n"
            + "Probability of being in one of {Worn, Down} after 2 steps, starting from the distribution Up=1/2,"
            + " Worn=1/2.\n"
            + "Parameters at w=1/20 (nominal values).\n"
            + "  exact    261/800\n"
            + "  decimal  0.326250000000  (12 significant digits, correctly rounded)\n" + CAUTION, text.out());
    }

    @Test
    void aStateTwiceInTheSetIsAUsageError() {
        assertEquals("qchain: --to names Up twice; give each state once\nTry 'qchain step --help' for more"
            + " information.\n", usage("step", PLANT, "-n", "2", "--from", "Up", "--to", "Up,Worn,Up").err());
    }

    @Test
    void toWithoutAStartNamesBothOptions() {
        assertEquals("qchain: --to needs --from (the starting state) or --start (the initial state or"
            + " distribution)\nTry 'qchain step --help' for more information.\n",
            usage("step", PLANT, "-n", "3", "--to", "Up").err());
        assertEquals("qchain: --to needs --from (the starting state) or --start (the initial state or"
            + " distribution)\nTry 'qchain closed --help' for more information.\n",
            usage("closed", PLANT, "--to", "Up").err());
    }

    @Test
    void seriesOfTwoStateChainMatchesTheClosedForm() {
        Cli.Result r = ok("step", TWO, "-n", "0..12", "--from", "Working", "--format", "json");
        assertTrue(r.out().startsWith("{\"kind\":\"series\",\"n\":[0,1,2,3,4,5,6,7,8,9,10,11,12],\"steps\":[{\"n\":0,"
            + "\"from\":\"Working\",\"start\":{\"Working\":\"1\"},\"states\":[\"Working\",\"Failed\"],\"row\":[\"1\","
            + "\"0\"],"), r.out());
        assertTrue(r.out().endsWith("}],\"digits\":12,\"model\":\"" + TWO + "\",\"warnings\":[]}\n"), r.out());
        List<List<Rational>> rows = rows(r.out());
        assertEquals(13, rows.size());
        for (int n = 0; n <= 12; n++) {
            assertEquals(twoStateRow(n, Rational.of(1, 10), Rational.of(1, 2)), rows.get(n), "n = " + n);
        }
    }

    @Test
    void seriesIsOneTableOverN() {
        Cli.Result r = ok("step", TWO, "-n", "1,3", "--start", "Working=1/4", "--start", "Failed=3/4");
        assertEquals("Distribution over n for " + TWO + " (discrete chain)\n"
            + "Probability of being in each state after n steps, starting from the distribution Working=1/4,"
            + " Failed=3/4.\n\n"
            + "Decimals (12 significant digits, correctly rounded):\n"
            + "n  Working         Failed\n"
            + "1  0.600000000000  0.400000000000\n"
            + "3  0.796000000000  0.204000000000\n\n"
            + "Exact values:\n"
            + "n  to       decimal         exact\n"
            + "1  Working  0.600000000000  3/5\n"
            + "1  Failed   0.400000000000  2/5\n"
            + "3  Working  0.796000000000  199/250\n"
            + "3  Failed   0.204000000000  51/250\n" + CAUTION, r.out());
    }

    @Test
    void steppedRangeOfASetInCsv() {
        Cli.Result r = ok("step", TWO, "-n", "0..20 by 10", "--from", "Working", "--to", "Failed,Working",
            "--format", "csv");
        // the two states together always hold probability 1
        assertEquals("n,from,to,value,decimal\r\n0,Working,Failed Working,1,1\r\n10,Working,Failed Working,1,1\r\n"
            + "20,Working,Failed Working,1,1\r\n", r.out());
        Cli.Result one = ok("step", TWO, "-n", "0..20 by 10", "--from", "Working", "--to", "Failed", "--format",
            "csv");
        assertEquals("n,from,to,value,decimal\r\n0,Working,Failed,0,0\r\n10,Working,Failed,"
            + twoStateRow(10, Rational.of(1, 10), Rational.of(1, 2)).get(1) + ",0.166649190400\r\n20,Working,Failed,"
            + twoStateRow(20, Rational.of(1, 10), Rational.of(1, 2)).get(1) + ",0.166666664834\r\n", one.out());
    }

    @Test
    void seriesInMarkdownAndLatex() {
        Cli.Result md = ok("step", TWO, "-n", "1,2", "--from", "Working", "--to", "Failed", "--format", "markdown");
        assertEquals("Probability of being in Failed after n steps for `" + TWO + "` (discrete chain), starting in"
            + " Working.\n\nExact:\n\n| n | Failed |\n| --- | --- |\n| 1 | 1/10 |\n| 2 | 7/50 |\n\nDecimal:\n\n"
            + "| n | Failed |\n| --- | --- |\n| 1 | 0.100000000000 |\n| 2 | 0.140000000000 |\n\nDecimals: 12"
            + " significant digits, correctly rounded.\n\n*Caution: results are only as good as the model;"
            + " safety-critical use follows the applicable standards, local codes and licensed engineering"
            + " review.*\n", md.out());
        Cli.Result tex = ok("step", TWO, "-n", "1,2", "--from", "Working", "--format", "latex");
        assertTrue(tex.out().contains("\\begin{tabular}{r|rr}\n$n$ & Working & Failed \\\\ \\hline\n"
            + "1 & $\\frac{9}{10}$ & $\\frac{1}{10}$ \\\\\n2 & $\\frac{43}{50}$ & $\\frac{7}{50}$ \\\\\n"), tex.out());
    }

    @Test
    void seriesNeedsAStart() {
        assertEquals("qchain: a list or range of -n needs --from or --start: one table over n of a row, an entry or"
            + " a distribution (the whole matrix is printed for one n)\nTry 'qchain step --help' for more"
            + " information.\n", usage("step", PLANT, "-n", "1,2").err());
        assertEquals("qchain: --paths lists the paths of one entry: one n, one --from state and one --to state (not"
            + " a list or range of -n)\nTry 'qchain step --help' for more information.\n",
            usage("step", PLANT, "-n", "1..3", "--from", "Up", "--to", "Down", "--paths", "2").err());
    }

    @Test
    void oneGuardEstimatesTheWholeSeries() {
        // each n alone fits under the limit, the series does not: refused before any work, with the estimate
        ok("step", PLANT, "-n", "2000", "--from", "Up", "--max-digits", "100000");
        Cli.Result r = usage("step", PLANT, "-n", "1..2000", "--from", "Up", "--max-digits", "100000");
        assertEquals("qchain: the result would have about 25309932 digits in total, more than the limit 100000;"
            + " raise it with --max-digits\n", r.err());
    }

    @Test
    void badStepListsAreUsageErrors() {
        assertEquals("qchain: Invalid value for option '--steps': '5..1': a range A..B needs A <= B\n",
            usage("step", PLANT, "-n", "5..1", "--from", "Up").errLines()[0] + "\n");
        assertEquals("qchain: Invalid value for option '--steps': '0' in '0..10 by 0': the step of a range must be"
            + " at least 1\n", usage("step", PLANT, "-n", "0..10 by 0", "--from", "Up").errLines()[0] + "\n");
        assertEquals("qchain: Invalid value for option '--steps': '1,,2': a number of steps is missing (write e.g."
            + " 1,5,10, 1..30 or \"0..100 by 10\")\n", usage("step", PLANT, "-n", "1,,2", "--from", "Up")
            .errLines()[0] + "\n");
        assertEquals("qchain: Invalid value for option '--steps': '0..100000' gives more than 10000 numbers of"
            + " steps\n", usage("step", PLANT, "-n", "0..100000", "--from", "Up").errLines()[0] + "\n");
    }

    @Test
    void closedTakesTheStartOfStep() {
        Cli.Result start = ok("closed", TWO, "--start", "Working", "--format", "json");
        Cli.Result from = ok("closed", TWO, "--from", "Working", "--format", "json");
        // --start adds the start's probabilities, as step does; the rest is the same
        assertEquals(from.out(), start.out().replace(",\"start_distribution\":{\"Working\":\"1\"}", ""));
        assertTrue(start.out().contains("\"start\":\"Working\",\"start_distribution\":{\"Working\":\"1\"},"),
            start.out());
        // issue 8: an initial distribution gives the closed form of start·P^n, one formula per state
        Cli.Result dist = ok("closed", TWO, "--start", "Working=1/2", "--start", "Failed=1/2", "--format", "json");
        assertTrue(dist.out().contains("\"start\":\"Working=1/2, Failed=1/2\",\"start_distribution\":"
            + "{\"Working\":\"1/2\",\"Failed\":\"1/2\"},\"row\":["), dist.out());
    }

    @Test
    void freeParametersGiveFormulasForOneN() {
        // pump-params.chain: Up -> Worn p, Worn -> Down p, Worn -> Up r, Down -> Up 1/2, p without a value. By hand
        // (common practice, no source): P^2(Up, .) = ((1-p)^2 + p r, (1-p) p + p (1-p-r), p^2) and P^2(Worn, .) =
        // (r (1-p) + (1-p-r) r + p/2, r p + (1-p-r)^2, (1-p-r) p); half of each
        String pump = Cli.model("pump-params.chain");
        Cli.Result r = Cli.run("step", pump, "-n", "2", "--start", "Up=1/2", "--start", "Worn=1/2");
        assertEquals(0, r.code(), r::toString);
        assertEquals("Distribution after 2 steps from Up=1/2, Worn=1/2 for " + pump + " (discrete chain, 3 states) as"
            + " exact rational functions of p, r\n"
            + "Each formula is in canonical form: numerator and denominator coprime, expanded.\n\n"
            + "from              to    P^2\n"
            + "Up=1/2, Worn=1/2  Up    1/2 - 3/4*p + r + 1/2*p^2 - 1/2*p*r - 1/2*r^2\n"
            + "Up=1/2, Worn=1/2  Worn  1/2 - r - 1/2*p^2 + p*r + 1/2*r^2\n"
            + "Up=1/2, Worn=1/2  Down  3/4*p - 1/2*p*r\n\n"
            + "Caution: results are only as good as the model; safety-critical use follows the applicable standards,"
            + " local codes and licensed engineering review.\n", r.out());
        // with --at the formula is evaluated and checked against the exact engine: 1/2 + 3/40 - 1/4 - 1/200 +
        // 1/80 + 1/32 = 291/800
        Cli.Result at = Cli.run("step", pump, "-n", "2", "--start", "Up=1/2", "--start", "Worn=1/2", "--to",
            "Worn,Down", "--at", "p=1/10");
        assertEquals(0, at.code(), at::toString);
        assertTrue(at.out().contains("\nUp=1/2, Worn=1/2  Worn,Down  1/2 + 3/4*p - r - 1/2*p^2 + 1/2*p*r + 1/2*r^2\n"),
            at.out());
        assertTrue(at.out().contains("\nUp=1/2, Worn=1/2  Worn,Down  0.363750000000  291/800\n"), at.out());
        Cli.Result factored = Cli.run("step", pump, "-n", "2", "--start", "Up=1/2", "--start", "Worn=1/2", "--to",
            "Worn,Down", "--factor");
        assertEquals(0, factored.code(), factored::toString);
        assertTrue(factored.out().contains("\nUp=1/2, Worn=1/2  Worn,Down  1/4*(2 + 3*p - 4*r - 2*p^2 + 2*p*r +"
            + " 2*r^2)\n"), factored.out());
        Cli.Result terms = Cli.run("step", pump, "-n", "2", "--start", "Up=1/2", "--start", "Worn=1/2", "--max-terms",
            "2");
        assertEquals(2, terms.code(), terms::toString);
        assertTrue(terms.err().endsWith("qchain: the symbolic P^2 would have up to about 18 polynomial terms in total"
            + " (entries of degree up to 2), more than the limit 2; raise it with --max-terms\n"), terms::toString);
        assertEquals("qchain: --factor applies to formulas: --start gives them for one n on a model with a parameter"
            + " without a value\nTry 'qchain step --help' for more information.\n",
            usage("step", PLANT, "-n", "2", "--start", "Up", "--factor").err());
        Cli.Result series = Cli.run("step", pump, "-n", "1,2", "--from", "Up");
        assertEquals(2, series.code(), series::toString);
        assertEquals("qchain: a list or range of n needs a value for every parameter (parameters without a value: p;"
            + " give them with --at NAME=VALUE); formulas in the parameters are given for one n at a time\n",
            series.err());
    }
}
