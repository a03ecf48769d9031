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
 * {@code qchain verify}: exit codes, messages and the exact output. The reference files in
 * {@code src/test/resources/reference/} hold the test model's P^4 as doubles: {@code plant-p4.csv} is each exact entry
 * correctly rounded (written by Python's {@code float(Fraction(...))} and {@code repr}, reference library behaviour:
 * both round correctly and print the shortest round-trip digits); {@code plant-p4-bad.csv} has Worn -> Down one ulp
 * up ({@code math.nextafter}) and Down -> Up off by a relative 1e-6. The layouts are our own (common practice, no
 * source); the exact P^4 is the one {@code StepValuesTest} checks.
 */
class VerifyCommandTest {
    private static final Path GOLDEN = Path.of("src/test/resources/golden");
    private static final String REF = "src/test/resources/reference/";
    private static final String MODEL = Cli.model("plant.chain");

    private static Cli.Result verify(String file, String... more) {
        List<String> args = new ArrayList<>(List.of("verify", MODEL, "--against", REF + file));
        args.addAll(List.of(more));
        return Cli.run(args.toArray(new String[0]));
    }

    private static void assertOneLineError(String expected, Cli.Result r) {
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out(), r::toString);
        assertEquals(expected + "\n", r.err(), r::toString);
    }

    // IEEE 754-2019 binary64: every value is the correctly rounded double of the exact P^4 entry: 0 ulp, exit 0
    @Test
    void correctlyRoundedFilePassesWithExitZero() throws IOException {
        Cli.Result r = verify("plant-p4.csv", "-n", "4", "--ulps", "0");
        assertEquals(0, r.code(), r::toString);
        assertEquals("", r.err());
        Cli.assertMatchesGolden(r, GOLDEN.resolve("verify-pass.txt"));
    }

    static Stream<String> formats() {
        return Stream.of("text", "json", "csv", "markdown", "latex");
    }

    // a value one ulp off is reported as 1 ulp; the 1e-6 one fails the default 1e-9 and comes first; exit 3
    @ParameterizedTest(name = "{0}")
    @MethodSource("formats")
    void perturbedFileFailsWithExitThree(String format) throws IOException {
        Cli.Result r = verify("plant-p4-bad.csv", "-n", "4", "--format", format);
        assertEquals(3, r.code(), r::toString);
        assertEquals("", r.err());
        String ext = format.equals("text") ? "txt" : format.equals("markdown") ? "md" : format.equals("latex") ? "tex"
            : format;
        Cli.assertMatchesGolden(r, GOLDEN.resolve("verify-fail." + ext));
    }

    @Test
    void theJsonReportNamesTheWorstEntryItsErrorsAndPlace() {
        String out = verify("plant-p4-bad.csv", "-n", "4", "--format", "json", "--show", "2").out();
        assertTrue(out.startsWith("{\"what\":\"matrix\",\"n\":4,\"model\":\"" + MODEL + "\""), out);
        assertTrue(out.contains("\"passed\":false,\"expected\":9,\"checked\":9,\"overTolerance\":1,\"nonFinite\":0,"
            + "\"correctlyRounded\":7,\"allCorrectlyRounded\":false"), out);
        assertTrue(out.contains("\"worst\":[{\"entry\":\"Down -> Up\",\"from\":\"Down\",\"to\":\"Up\","
            + "\"given\":\"0.8554383554374999\""), out);
        assertTrue(out.contains("{\"entry\":\"Worn -> Down\",\"from\":\"Worn\",\"to\":\"Down\",\"given\":"
            + "\"0.029229690000000003\""), out);
        assertTrue(out.contains("\"ulps\":1,\"correctlyRounded\":false,\"pass\":true,\"line\":3,\"column\":23}"), out);
    }

    // a value passes when it meets any tolerance given
    @Test
    void anyToleranceGivenSuffices() {
        assertEquals(0, verify("plant-p4-bad.csv", "-n", "4", "--tol", "1e-5").code());
        assertEquals(3, verify("plant-p4-bad.csv", "-n", "4", "--ulps", "1").code());
        assertEquals(0, verify("plant-p4-bad.csv", "-n", "4", "--ulps", "1", "--abs-tol", "1e-6").code());
        assertEquals(3, verify("plant-p4-bad.csv", "-n", "4", "--ulps", "0", "--tol", "1e-17").code());
    }

    @Test
    void rowKeyedByStateChecksTheSubsetGiven() {
        Cli.Result r = verify("plant-p4-worn.json", "-n", "4", "--from", "Worn", "--ulps", "0", "--format", "csv");
        assertEquals(0, r.code(), r::toString);
        assertEquals("qchain: warning: " + REF + "plant-p4-worn.json gives 2 of the 3 values; only those were checked\n",
            r.err());
        assertEquals("entry,given,exact,decimal,error,relative_error,ulps,correctly_rounded,pass,line,column\r\n"
            + "Down,0x1.dee634a7d26c7p-6,2922969/100000000,0.0292296900000,-8.551470642714776e-19,"
            + "-2.9256111312555065e-17,0,true,true,1,28\r\n"
            + "Up,0.65188675,2607547/4000000,0.651886750000,0,0,0,true,true,1,8\r\n", r.out());
    }

    @Test
    void entryAndLongForm() {
        assertEquals(0, verify("plant-p4-up-down.csv", "-n", "4", "--from", "Up", "--to", "Down", "--ulps", "0")
            .code());
        Cli.Result r = verify("plant-p4-long.csv", "-n", "4", "--ulps", "0", "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("\"form\":\"CSV from,to,value\""), r.out());
    }

    // IEEE 754-2019: NaN is not a number of any tolerance
    @Test
    void notANumberFails() {
        Cli.Result r = verify("plant-p4-nan.json", "-n", "4", "--tol", "1");
        assertEquals(3, r.code(), r::toString);
        assertTrue(r.out().contains("Worn -> Worn  NaN "), r.out());
        assertTrue(r.out().contains("not finite"), r.out());
    }

    // the message shape: file:line, then what was expected
    @Test
    void wrongShapeIsExitTwoWithThePlace() {
        assertOneLineError("qchain: " + REF + "plant-p4-ragged.csv:4:1: 2 values, the model has 3 states",
            verify("plant-p4-ragged.csv", "-n", "4"));
        assertOneLineError("qchain: " + REF + "plant-p4-unknown.csv:1:9: unknown state 'Broken'; expected one of Up,"
            + " Worn, Down", verify("plant-p4-unknown.csv", "-n", "4"));
        assertOneLineError("qchain: cannot read " + REF + "no-such.csv: no such file", verify("no-such.csv", "-n", "4"));
    }

    private static Cli.Result verifyModel(String model, String file, String... more) {
        List<String> args = new ArrayList<>(List.of("verify", Cli.model(model), "--against", REF + file));
        args.addAll(List.of(more));
        return Cli.run(args.toArray(new String[0]));
    }

    // Grinstead and Snell, Introduction to Probability, ch. 11, the drunkard's walk on 0..4 with p = 1/2 (from
    // memory): absorption probabilities from 1, 2, 3 into 0 are 3/4, 1/2, 1/4; the expected steps are 3, 4, 3
    @Test
    void absorptionAndExpectedStepsOfTheDrunkardsWalk() {
        Cli.Result r = verifyModel("drunkard-walk.chain", "walk-absorption.csv", "--what", "absorption", "--ulps", "0");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("6 values checked, 0 over the tolerance"), r.out());
        Cli.Result s = verifyModel("drunkard-walk.chain", "walk-steps.csv", "--what", "expected-steps");
        assertEquals(3, s.code(), s::toString);
        assertTrue(s.out().contains("3 values checked, 1 over the tolerance"), s.out());
        assertTrue(s.out().contains("S3     3.0000001  3"), s.out());
    }

    // One repairable unit with failure rate λ and repair rate μ: availability μ/(λ+μ) = 10/11 here, MTTF 1/λ = 100
    // (standard reliability result, from memory); the file holds the correctly rounded doubles of 10/11 and 1/11
    @Test
    void availabilityStationaryAndMttfOfOneRepairableUnit() {
        Cli.Result a = verifyModel("one-unit.chain", "one-unit-availability.csv", "--what", "availability",
            "--ulps", "0");
        assertEquals(0, a.code(), a::toString);
        Cli.Result st = verifyModel("one-unit.chain", "one-unit-stationary.csv", "--what", "stationary", "--ulps", "0");
        assertEquals(0, st.code(), st::toString);
        Cli.Result m = verifyModel("one-unit.chain", "one-unit-mttf.csv", "--what", "mttf", "--ulps", "0");
        assertEquals(0, m.code(), m::toString);
    }

    // One repairable unit, λ = 1/100, μ = 1/10: P(t)(Up -> Up) = μ/(λ+μ) + λ/(λ+μ) e^(-(λ+μ)t) (standard reliability
    // result, from memory); one-unit-p5.csv holds that formula's entries at t = 5 as the correctly rounded doubles of
    // 60-digit values from Python's decimal module (reference library behaviour), so every value is 0 ulp off
    @Test
    void transientProbabilitiesAreComparedWithCertifiedEnclosures() {
        Cli.Result r = verifyModel("one-unit.chain", "one-unit-p5.csv", "-t", "5", "--ulps", "0");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().startsWith("P(5) of "), r.out());
        assertTrue(r.out().contains("4 values checked, 0 over the tolerance"), r.out());
        assertTrue(r.err().startsWith("qchain: warning: P(t) is not rational: each value was compared with the midpoint"
            + " of a certified enclosure no wider than "), r.err());
        Cli.Result onDiscrete = verify("plant-p4.csv", "-t", "2");
        assertEquals(2, onDiscrete.code(), onDiscrete::toString);
    }

    @Test
    void aStationaryLawThatIsNotUniqueIsRefused() {
        assertOneLineError("qchain: verify --what stationary: the chain has 2 closed classes, so its stationary law is"
            + " not unique (see qchain longrun)",
            verifyModel("drunkard-walk.chain", "walk-steps.csv", "--what", "stationary"));
    }

    @Test
    void usageErrors() {
        for (String[] args : new String[][] {
            {"-n", "4", "--symbolic"}, {"-t", "2"}, {"-n", "4", "-t", "2"}, {"-t", "-1"}, {}, {"-n", "4", "--to", "Up"}, {"-n", "4", "--what", "row"},
            {"-n", "4", "--what", "nonsense"}, {"-n", "4", "--tol", "-1"}, {"-n", "4", "--ulps", "-2"}}) {
            Cli.Result r = verify("plant-p4.csv", args);
            assertEquals(2, r.code(), () -> String.join(" ", args) + "\n" + r);
            assertEquals("", r.out());
        }
        Cli.Result sym = verify("plant-p4.csv", "-n", "4", "--symbolic");
        assertTrue(sym.err().startsWith("qchain: --symbolic does not apply to verify: a float file holds numbers"),
            sym.err());
    }

    @Test
    void outputNeverOverwritesTheCheckedFile() {
        Cli.Result r = verify("plant-p4.csv", "-n", "4", "-o", REF + "plant-p4.csv");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().startsWith("qchain: --output must not be the --against file"), r.err());
    }

    @Test
    void showZeroPrintsTheSummaryOnly() {
        Cli.Result r = verify("plant-p4-bad.csv", "-n", "4", "--show", "0");
        assertEquals(3, r.code(), r::toString);
        assertTrue(!r.out().contains("Down -> Up"), r.out());
        assertTrue(r.out().contains("9 values checked, 1 over the tolerance; worst relative error 1.00e-6"), r.out());
    }

    @Test
    void freeParametersNeedValues() {
        String free = Cli.model("free.chain");
        Cli.Result r = Cli.run("verify", free, "--against", REF + "free-p1.csv", "-n", "1", "--from", "On");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().startsWith("qchain: parameters without a value: p"), r.err());
        Cli.Result ok = Cli.run("verify", free, "--against", REF + "free-p1.csv", "-n", "1", "--from", "On", "--at",
            "p=1/2", "--ulps", "0");
        assertEquals(0, ok.code(), ok::toString);
    }

    @Test
    void helpListsExitCodeThree() {
        Cli.Result r = Cli.run("verify", "--help");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("   3    verify: a value is outside the tolerance"), r.out());
        assertTrue(Cli.run("step", "--help").out().contains("   3    verify: a value is outside the tolerance"));
    }
}
