package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/** The numbers {@code step} prints, checked end to end against values computed outside the CLI and the engine. */
class StepValuesTest {
    private static final String PLANT = Cli.model("plant.chain");

    /** The exact matrix of a JSON matrix result, parsed back from its strings. */
    private static RationalMatrix matrixOf(String json) {
        Matcher m = Pattern.compile("\"matrix\":\\[(\\[.*?\\])\\],").matcher(json);
        assertTrue(m.find(), json);
        List<Rational[]> rows = new ArrayList<>();
        for (String row : m.group(1).split("\\],\\[")) {
            String[] cells = row.replace("[", "").replace("]", "").replace("\"", "").split(",");
            Rational[] r = new Rational[cells.length];
            for (int j = 0; j < cells.length; j++) {
                r[j] = Rational.parse(cells[j]);
            }
            rows.add(r);
        }
        return RationalMatrix.of(rows.toArray(new Rational[0][]));
    }

    private static String json(String... args) {
        Cli.Result r = Cli.run(args);
        assertEquals(0, r.code(), r::toString);
        return r.out();
    }

    @Test
    void twoStepFailureProbabilityMatchesTheHandCount() {
        // by hand: the only 2-step path Up -> Down is Up -> Worn -> Down (Up -> Down is 0), w * 3/100 = 1/20 * 3/100
        String out = json("step", PLANT, "-n", "2", "--from", "Up", "--to", "Down", "--format", "json");
        assertTrue(out.startsWith("{\"n\":2,\"from\":\"Up\",\"to\":\"Down\",\"value\":\"3/2000\",\"decimal\":\"0.00150000000000\","),
            out);
    }

    @Test
    void atOverridesTheNominalValue() {
        // by hand as above with w = 1/10: 1/10 * 3/100
        String out = json("step", PLANT, "-n", "2", "--from", "Up", "--to", "Down", "--format", "json", "--at",
            "w=1/10");
        assertTrue(out.contains("\"value\":\"3/1000\""), out);
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 2, 3, 10, 64})
    void twoStateChainMatchesTheClosedForm(int n) {
        // Grinstead and Snell, Introduction to Probability, ch. 11 (two-state chain, from memory):
        // P^n = 1/(a+b) [[b, a], [b, a]] + (1-a-b)^n/(a+b) [[a, -a], [-b, b]], here a = 1/10, b = 1/2
        Rational a = Rational.of(1, 10);
        Rational b = Rational.of(1, 2);
        Rational s = a.add(b);
        Rational t = Rational.ONE.subtract(s).pow(n).divide(s);
        Rational[][] expected = {
            {b.divide(s).add(t.multiply(a)), a.divide(s).subtract(t.multiply(a))},
            {b.divide(s).subtract(t.multiply(b)), a.divide(s).add(t.multiply(b))}};
        String out = json("step", Cli.model("two-state.chain"), "-n", String.valueOf(n), "--format", "json");
        assertTrue(out.startsWith("{\"kind\":\"discrete\",\"n\":" + n + ",\"states\":[\"Working\",\"Failed\"],"),
            out);
        assertEquals(RationalMatrix.of(expected), matrixOf(out));
    }

    @Test
    void goldenMatrixEqualsTheSchoolbookProduct() {
        // P of plant.chain written out by hand (remainders on the diagonal), multiplied out with the plain product,
        // not the engine's powers
        RationalMatrix p = RationalMatrix.of(new Rational[][] {
            {Rational.of(19, 20), Rational.of(1, 20), Rational.ZERO},
            {Rational.of(1, 4), Rational.of(18, 25), Rational.of(3, 100)},
            {Rational.of(1, 2), Rational.ZERO, Rational.of(1, 2)}});
        RationalMatrix p4 = p.multiply(p).multiply(p).multiply(p);
        assertEquals(p4, matrixOf(json("step", PLANT, "-n", "4", "--format", "json")));
        assertEquals(p, matrixOf(json("step", PLANT, "-n", "1", "--format", "json")));
    }

    @Test
    void rowAndEntryAgreeWithTheFullMatrix() {
        RationalMatrix p7 = matrixOf(json("step", PLANT, "-n", "7", "--format", "json"));
        String row = json("step", PLANT, "-n", "7", "--from", "Worn", "--format", "json");
        String expectedRow = "\"row\":[\"" + p7.get(1, 0) + "\",\"" + p7.get(1, 1) + "\",\"" + p7.get(1, 2) + "\"]";
        assertTrue(row.contains(expectedRow), row);
        String entry = json("step", PLANT, "-n", "7", "--from", "Worn", "--to", "Up", "--format", "json");
        assertTrue(entry.contains("\"value\":\"" + p7.get(1, 0) + "\""), entry);
    }

    @Test
    void pathProbabilitiesAreProductsOfStepsAndSharesOfTheTotal() {
        // the most probable 4-step path Up x3 > Worn > Down: (19/20)^2 * 1/20 * 3/100 = 1083/800000, by hand;
        // its share is that over P^4(Up, Down) = 12009/2500000
        String out = json("step", PLANT, "-n", "4", "--from", "Up", "--to", "Down", "--paths", "1", "--format",
            "json");
        assertTrue(out.contains("\"paths\":[{\"states\":[\"Up\",\"Up\",\"Up\",\"Worn\",\"Down\"],"
            + "\"probability\":\"1083/800000\""), out);
        assertTrue(out.contains("\"share\":\"" + Rational.of(1083, 800000).divide(Rational.of(12009, 2500000))
            + "\""), out);
    }

    @Test
    void csvMatrixReadsBackAsAChainAndSquaresToTheFourStepMatrix(@TempDir Path dir) throws IOException {
        // Chapman-Kolmogorov through files: P^4 = (P^2)^2 (common practice, no source)
        Path p2 = dir.resolve("p2.csv");
        assertEquals(0, Cli.run("step", PLANT, "-n", "2", "--format", "csv", "-o", p2.toString()).code());
        Cli.Result check = Cli.run("check", p2.toString());
        assertEquals(0, check.code(), check::toString);
        assertTrue(check.out().endsWith("OK: 3 states, discrete, rows sum to 1\n"), check::toString);
        String viaFile = Cli.run("step", p2.toString(), "-n", "2", "--format", "csv").out();
        assertEquals(Cli.run("step", PLANT, "-n", "4", "--format", "csv").out(), viaFile);
        assertTrue(Files.readString(p2).startsWith("Up,Worn,Down\r\n"));
    }

    @Test
    void warningsGoToStderrAndIntoTheJsonArrayButNotIntoOtherStdout() {
        // by hand: the only 2-step path from Up to Down is Up -> Worn -> Down, so 3 paths cannot be listed
        String warning = "only 1 path of 2 steps leads from Up to Down; --paths asked for 3";
        Cli.Result json = Cli.run("step", PLANT, "-n", "2", "--from", "Up", "--to", "Down", "--paths", "3",
            "--format", "json");
        assertEquals(0, json.code(), json::toString);
        assertEquals("qchain: warning: " + warning + "\n", json.err());
        assertTrue(json.out().endsWith(",\"warnings\":[\"" + warning + "\"]}\n"), json::toString);
        Cli.Result csv = Cli.run("step", PLANT, "-n", "2", "--from", "Up", "--to", "Down", "--paths", "3",
            "--format", "csv");
        assertEquals("qchain: warning: " + warning + "\n", csv.err());
        assertEquals("rank,probability,decimal,share,percent,path\r\n"
            + "1,3/2000,0.00150000000000,1,100,Up Worn Down\r\n", csv.out());
    }

    @Test
    void zeroStepsIsTheIdentity() {
        assertEquals(RationalMatrix.identity(3), matrixOf(json("step", PLANT, "-n", "0", "--format", "json")));
    }
}
