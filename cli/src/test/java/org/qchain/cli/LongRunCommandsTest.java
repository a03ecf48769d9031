package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.ClosedQuery;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.LongRunQuery;
import org.qchain.exact.model.ModelParser;
import org.qchain.result.LongRunResult;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFun;

/** {@code classes}, {@code longrun} and {@code absorb}: exact output, golden files, errors. */
class LongRunCommandsTest {
    private static final Path GOLDEN = Path.of("src/test/resources/golden/longrun");
    private static final String PRESS = Cli.model("press.chain");
    private static final String REWARDS = Cli.model("press-rewards.txt");

    static Stream<List<String>> cases() {
        List<List<String>> out = new ArrayList<>();
        for (String f : new String[] {"text", "json", "csv", "markdown", "latex"}) {
            String ext = f.equals("text") ? "txt" : f.equals("markdown") ? "md" : f.equals("latex") ? "tex" : f;
            out.add(List.of("classes-press." + ext, "classes", PRESS, "--format", f));
            out.add(List.of("longrun-press." + ext, "longrun", PRESS, "--format", f));
            out.add(List.of("absorb-press." + ext, "absorb", PRESS, "--reward", REWARDS, "--discount", "100/105",
                "--steps", "3", "--format", f));
        }
        out.add(List.of("classes-press-symbolic.txt", "classes", PRESS, "--symbolic"));
        out.add(List.of("longrun-beacon-passage.json", "longrun", Cli.model("beacon.chain"), "--passage",
            "--format", "json"));
        out.add(List.of("longrun-periodic.txt", "longrun", Cli.model("closed-periodic.chain")));
        return out.stream();
    }

    // golden files, reviewed by hand: press absorption checked against the exact engine's sourced tests
    // (ChainEngineTest); beacon stationary law b/(a + b), a/(a + b) and first passages 1/a, 1/b (standard two-state
    // results, from memory)
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void outputMatchesGolden(List<String> c) throws IOException {
        Cli.Result r = Cli.run(c.subList(1, c.size()).toArray(new String[0]));
        assertEquals(0, r.code(), r::toString);
        Cli.assertMatchesGolden(r, GOLDEN.resolve(c.get(0)));
    }

    // standard two-state result (from memory): pi = (b/(a + b), a/(a + b)), m(Lit, Dark) = 1/a, m(Dark, Lit) = 1/b
    @Test
    void beaconJsonShape() {
        Cli.Result r = Cli.run("longrun", Cli.model("beacon.chain"), "--symbolic", "--passage", "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertEquals("{\"source\":\"" + Cli.model("beacon.chain") + "\",\"states\":[\"Lit\",\"Dark\"],"
            + "\"parameters\":[\"a\",\"b\"],\"classes\":[{\"states\":[\"Lit\",\"Dark\"],\"closed\":true,\"period\":1,"
            + "\"stationary\":{\"Lit\":\"b/(a + b)\",\"Dark\":\"a/(a + b)\"},"
            + "\"mean_recurrence\":{\"Lit\":\"(a + b)/b\",\"Dark\":\"(a + b)/a\"}}],\"absorption_into_classes\":{},"
            + "\"limit\":[[\"b/(a + b)\",\"a/(a + b)\"],[\"b/(a + b)\",\"a/(a + b)\"]],\"cesaro\":false,"
            + "\"passage\":[[\"(a + b)/b\",\"1/a\"],[\"1/b\",\"(a + b)/a\"]],\"warnings\":[]}\n", r.out());
    }

    // common practice, no source: longrun's limit equals the long-run limit of closed (P^n in a symbolic n)
    @Test
    void limitAgreesWithClosedForm() {
        for (String name : List.of("beacon.chain", "press.chain", "two-state.chain")) {
            LoadedModel m = LoadedModel.load(Path.of(Cli.model(name)), Optional.empty());
            LongRunResult lr = Analysis.longRun(m, new LongRunQuery(false, true, LongRunQuery.DEFAULT_MAX_DIGITS, 40));
            List<List<org.qchain.result.Formula>> closed = Analysis.closed(m, ClosedQuery.matrix(), (p, d, t) -> { })
                .longRun().orElseThrow().limits().get(0);
            ParamRing ring = ParamRing.of(m.model());
            for (int i = 0; i < m.states().size(); i++) {
                for (int j = 0; j < m.states().size(); j++) {
                    RatFun a = ring.fromExpr(ModelParser.parseExpression("<longrun>", lr.limit().get(i).get(j).plain()));
                    RatFun b = ring.fromExpr(ModelParser.parseExpression("<closed>", closed.get(i).get(j).plain()));
                    assertEquals(b, a, name + " (" + i + "," + j + ")");
                }
            }
        }
    }

    @Test
    void noAbsorbingStateIsAClearError() {
        Cli.Result r = Cli.run("absorb", Cli.model("beacon.chain"), "--at", "a=1/3");
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: absorb: the chain has no absorbing state; name the states to reach with --absorbing"
            + " A,B\n", r.err());
        Cli.Result made = Cli.run("absorb", Cli.model("beacon.chain"), "--at", "a=1/3", "--absorbing", "Dark",
            "--format", "json");
        assertEquals(0, made.code(), made::toString);
        // time to first reach Dark from Lit is geometric with success a = 1/3: mean 3, variance (1 - a)/a^2 = 6
        assertTrue(made.out().contains("\"expected_steps\":{\"Lit\":\"3\"},\"variance\":{\"Lit\":\"6\"}"), made.out());
    }

    @Test
    void passageOfAReducibleChainIsRefused() {
        Cli.Result r = Cli.run("longrun", PRESS, "--passage");
        assertEquals(2, r.code(), r::toString);
        assertTrue(r.err().startsWith("qchain: --passage: mean first-passage times between all states need an"
            + " irreducible chain; this one has 2 classes"), r.err());
    }

    @Test
    void badRewardFileIsLocated(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("r.txt");
        Files.writeString(f, "Good 10\n  Broken 3\n");
        Cli.Result r = Cli.run("absorb", PRESS, "--reward", f.toString());
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: " + f + ":2:3: unknown state 'Broken'\n", r.err());
        Files.writeString(f, "Good ten\n");
        Cli.Result r2 = Cli.run("absorb", PRESS, "--reward", f.toString());
        assertEquals("qchain: " + f + ":1:6: malformed number 'ten'\n", r2.err());
        Cli.Result r3 = Cli.run("absorb", PRESS, "--reward", f.toString(), "--discount", "2");
        assertEquals(2, r3.code(), r3::toString);
        assertTrue(r3.err().contains("strictly between 0 and 1"), r3.err());
    }

    @Test
    void unknownStateNamesTheStates() {
        Cli.Result r = Cli.run("absorb", PRESS, "--absorbing", "Nope");
        assertEquals(2, r.code(), r::toString);
        assertEquals("qchain: invalid --absorbing 'Nope': not a state of " + PRESS + " (states: Good, Worn, Failed)\n",
            r.err());
    }

    // common practice, no source: reward lines in the model give the same rewards as the same values in a file
    @Test
    void modelRewardLinesEqualARewardFile() {
        Cli.Result lines = Cli.run("absorb", Cli.model("press-rewards.chain"), "--discount", "100/105", "--format", "json");
        Cli.Result file = Cli.run("absorb", PRESS, "--reward", REWARDS, "--discount", "100/105", "--format", "json");
        assertEquals(0, lines.code(), lines::toString);
        String tail = "\"rewards\":";
        assertEquals(file.out().substring(file.out().indexOf(tail)), lines.out().substring(lines.out().indexOf(tail)));
    }
}
