package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.ClosedQuery;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.StepQuery;
import org.qchain.exact.Rational;
import org.qchain.result.ClosedResult;
import org.qchain.result.StepResult;
import org.qchain.symbolic.cas.SymjaSession;

/**
 * The closed forms as printed read back to the right values: the plain entry written with named eigenvalues and
 * square roots, with the printed {@code where} definitions substituted back (last name first), and the expanded
 * entry, each also with {@code --factor}, are evaluated by Symja (matheclipse-core 3.0.0, {@code N[..., 40]}, a
 * general-purpose reference outside the project) at a rational point and step count, and compared with the exact
 * P^n entry of {@code step} at the same point.
 */
class ClosedNamesReadBackTest {
    private static final SymjaSession CAS = SymjaSession.open();

    /** One check: a model, its symbolic parameter, a rational point, whether factored, a step count, given values. */
    private record Case(String model, String param, String point, boolean factor, int n, Map<String, Rational> given) {
        Case(String model, String param, String point, boolean factor, int n) {
            this(model, param, point, factor, n, Map.of());
        }
    }

    private static String substituted(ClosedResult r, String plain) {
        String out = plain;
        for (int k = r.where().size() - 1; k >= 0; k--) {
            ClosedResult.Where w = r.where().get(k);
            out = out.replaceAll("\\b" + Pattern.quote(w.name()) + "\\b",
                Matcher.quoteReplacement("(" + w.value().plain() + ")"));
        }
        return out;
    }

    private static BigDecimal evaluate(String formula, String step, int n, String param, String point) {
        String expr = formula.replaceAll("\\b" + step + "\\b", "(" + n + ")")
            .replaceAll("\\b" + param + "\\b", "(" + point + ")");
        return new BigDecimal(CAS.eval("Re(N(" + expr + ", 40))").replace("*10^", "E"), MathContext.DECIMAL128);
    }

    @Test
    void printedEntriesEvaluateToTheExactPowers() {
        List<Case> cases = List.of(new Case("closed-stages.chain", "a", "1/7", false, 12),
            new Case("closed-stages.chain", "a", "1/3", true, 1), new Case("plant.chain", "w", "2/9", true, 4),
            new Case("closed-stages-names.chain", "s", "1/5", false, 3, Map.of("l1", Rational.of(1, 2))));
        for (Case c : cases) {
            LoadedModel m = LoadedModel.load(Path.of(Cli.model(c.model())), c.given());
            ClosedResult r = Analysis.closed(m, ClosedQuery.matrix().factored(c.factor()), (p, d, t) -> { });
            assertFalse(r.where().isEmpty(), "a quadratic pair is named in " + c);
            assertEquals(c.factor(), r.factored());
            Map<String, Rational> point = new java.util.HashMap<>(c.given());
            point.put(c.param(), Rational.parse(c.point()));
            LoadedModel at = LoadedModel.load(Path.of(Cli.model(c.model())), point);
            StepResult.Matrix exact = (StepResult.Matrix) Analysis.step(at, StepQuery.matrix(c.n()), (p, d, t) -> { });
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    String named = r.shownCells().get(i).get(j).plain();
                    String expanded = r.cells().get(i).get(j).plain();
                    assertTrue(named.length() <= expanded.length(), "names shorten the entry");
                    Rational want = exact.entries().get(i).get(j);
                    BigDecimal w = new BigDecimal(want.numerator()).divide(new BigDecimal(want.denominator()),
                        MathContext.DECIMAL128);
                    for (String f : List.of(substituted(r, named), expanded)) {
                        BigDecimal got = evaluate(f, r.names().step(), c.n(), c.param(), c.point());
                        assertTrue(got.subtract(w).abs().compareTo(new BigDecimal("1e-25")) < 0,
                            c + " (" + i + "," + j + "): " + f + " gives " + got + ", exact " + w);
                    }
                }
            }
        }
    }
}
