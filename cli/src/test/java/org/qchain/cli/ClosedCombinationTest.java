package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qchain.analysis.LoadedModel;
import org.qchain.exact.Rational;
import org.qchain.result.FormulaTree;
import org.qchain.symbolic.closed.ClosedForm;
import org.qchain.symbolic.closed.ClosedForms;
import org.qchain.symbolic.closed.Combination;

/**
 * {@code closed --start DIST --to SET} against {@code step} with the same {@code --start} and {@code --to}: the
 * closed form of the combination evaluated at n = 0 .. 20 equals the exact values {@code step -n 0..20} prints
 * (common practice, no source: the probability of a set after n steps from a distribution is
 * {@code sum_i s_i sum_(j in To) P^n(i, j)}, and {@code step} computes it by exact products). Where the printed
 * formula has only rational pieces, the printed text itself is read back ({@link FormulaTree}) and evaluated.
 */
class ClosedCombinationTest {
    private static final String[] ENTRIES = {"1/2", "1/3", "1/4", "1/6", "2/7", "1/10"};
    private static final Pattern VALUE = Pattern.compile("\"value\":\"([^\"]+)\"");
    private static final Pattern FORMULA = Pattern.compile("\"formula\":\"([^\"]+)\"");

    @TempDir
    Path dir;

    /** A random chain: each state moves to at most two others (off-diagonal entries; the diagonal is the rest). */
    private static String randomChain(Random rnd, int s, boolean triangular) {
        StringBuilder sb = new StringBuilder("chain discrete\nstates");
        for (int i = 0; i < s; i++) {
            sb.append(" S").append(i);
        }
        sb.append('\n');
        for (int i = 0; i < s; i++) {
            int moves = 0;
            for (int j = 0; j < s && moves < 2; j++) {
                // an upper-triangular chain has its diagonal as eigenvalues: rational, so the formula prints plainly
                if (j != i && (!triangular || j > i) && rnd.nextInt(3) > 0) {
                    sb.append('S').append(i).append(" S").append(j).append(' ')
                        .append(ENTRIES[rnd.nextInt(ENTRIES.length)]).append('\n');
                    moves++;
                }
            }
        }
        return sb.toString();
    }

    private static List<String> startArgs(Map<Integer, Rational> start) {
        List<String> out = new ArrayList<>();
        start.forEach((i, v) -> {
            out.add("--start");
            out.add("S" + i + "=" + v);
        });
        return out;
    }

    private static Map<Integer, Rational> randomStart(Random rnd, int s) {
        Map<Integer, Rational> w = new LinkedHashMap<>();
        Rational left = Rational.ONE;
        for (int i = 0; i < s - 1; i++) {
            if (rnd.nextBoolean()) {
                Rational v = left.multiply(Rational.of(1 + rnd.nextInt(3), 4));
                w.put(i, v);
                left = left.subtract(v);
            }
        }
        w.put(s - 1, left);
        return w;
    }

    private static List<Integer> randomSet(Random rnd, int s) {
        List<Integer> to = new ArrayList<>();
        for (int j = 0; j < s; j++) {
            if (rnd.nextBoolean()) {
                to.add(j);
            }
        }
        return to.isEmpty() ? List.of(rnd.nextInt(s)) : to;
    }

    private static String setArg(List<Integer> to) {
        List<String> names = new ArrayList<>();
        for (int j : to) {
            names.add("S" + j);
        }
        return String.join(",", names);
    }

    /** The exact values that {@code step -n 0..20} prints, one per n. */
    private static List<Rational> stepValues(List<String> args) {
        List<String> a = new ArrayList<>(List.of("step"));
        a.addAll(args);
        a.addAll(List.of("-n", "0..20", "--format", "json"));
        Cli.Result r = Cli.run(a.toArray(new String[0]));
        assertEquals(0, r.code(), r::toString);
        List<Rational> out = new ArrayList<>();
        Matcher m = VALUE.matcher(r.out());
        while (m.find()) {
            out.add(Rational.parse(m.group(1)));
        }
        assertEquals(21, out.size(), r::toString);
        return out;
    }

    /** The formula that {@code closed ... --format json} prints. */
    private static String closedFormula(List<String> args) {
        List<String> a = new ArrayList<>(List.of("closed"));
        a.addAll(args);
        a.addAll(List.of("--format", "json"));
        Cli.Result r = Cli.run(a.toArray(new String[0]));
        assertEquals(0, r.code(), r::toString);
        Matcher m = FORMULA.matcher(r.out());
        assertTrue(m.find(), r::toString);
        return m.group(1);
    }

    @Test
    void closedFormsOfRandomCombinationsEqualStepAtEveryN() throws IOException {
        Random rnd = new Random(8L);
        int printedRead = 0;
        for (int t = 0; t < 10; t++) {
            int s = 2 + rnd.nextInt(3);
            boolean triangular = t % 2 == 0;
            Path file = dir.resolve("random" + t + ".chain");
            Files.writeString(file, randomChain(rnd, s, triangular));
            Map<Integer, Rational> start = randomStart(rnd, s);
            List<Integer> to = randomSet(rnd, s);
            List<String> args = new ArrayList<>(List.of(file.toString()));
            args.addAll(startArgs(start));
            args.addAll(List.of("--to", setArg(to)));
            List<Rational> step = stepValues(args);
            // the engine's closed form of the same combination, exactly at each n
            LoadedModel model = LoadedModel.load(file, Optional.empty());
            ClosedForm cf = ClosedForms.of(model.model());
            Combination c = Combination.of(start, to);
            for (int n = 0; n <= 20; n++) {
                assertEquals(step.get(n), cf.evaluate(n, c, Map.of()), file + " " + args + " n = " + n);
            }
            // the printed formula, read back, where it is rational throughout (valid from n = valid_from)
            FormulaTree printed = FormulaTree.parse(closedFormula(args));
            int from = cf.validFrom(c);
            for (int n = from; n <= 20; n++) {
                Optional<Rational> v = printed.evaluate(Map.of("n", Rational.of(n)));
                if (v.isEmpty()) {
                    break;
                }
                assertEquals(step.get(n), v.get(), "printed " + printed.latex() + " at n = " + n);
                printedRead++;
            }
        }
        assertTrue(printedRead > 40, "printed formulas read back: " + printedRead);
    }

    @Test
    void aSymbolicChainAtRandomPointsEqualsStep() {
        // the pump station with p and r: the closed form keeps them free; step takes them with --at
        String m = "../docs/examples/pump-station-params.chain";
        ClosedForm cf = ClosedForms.of(LoadedModel.load(Path.of(m), Optional.empty()).model());
        Random rnd = new Random(2026L);
        for (int t = 0; t < 4; t++) {
            Rational p = Rational.of(1 + rnd.nextInt(9), 20);
            Rational r = Rational.of(1 + rnd.nextInt(9), 20);
            Map<Integer, Rational> start = randomStart(rnd, 3);
            List<Integer> to = randomSet(rnd, 3);
            List<String> args = new ArrayList<>(List.of(m, "--at", "p=" + p, "--at", "r=" + r));
            start.forEach((i, v) -> args.addAll(List.of("--start", List.of("Up", "Worn", "Down").get(i) + "=" + v)));
            List<String> names = new ArrayList<>();
            to.forEach(j -> names.add(List.of("Up", "Worn", "Down").get(j)));
            args.addAll(List.of("--to", String.join(",", names)));
            List<Rational> step = stepValues(args);
            Combination c = Combination.of(start, to);
            for (int n = 0; n <= 20; n++) {
                assertEquals(step.get(n), cf.evaluate(n, c, Map.of("p", p, "r", r)), args + " n = " + n);
            }
        }
    }
}
