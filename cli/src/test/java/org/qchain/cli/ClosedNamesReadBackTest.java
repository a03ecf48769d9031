package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
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
 * The closed forms written with named eigenvalues and square roots read back to the right values: the printed plain
 * entry, with the printed {@code where} definitions substituted back (last name first), is evaluated by Symja
 * (matheclipse-core 3.0.0, {@code N[..., 40]}, a general-purpose reference outside the project) at a rational point
 * and step count, and compared with the exact P^n entry of {@code step} at the same point.
 */
class ClosedNamesReadBackTest {

    private static String substituted(ClosedResult r, String plain) {
        String out = plain;
        List<ClosedResult.Where> where = r.where();
        for (int k = where.size() - 1; k >= 0; k--) {
            ClosedResult.Where w = where.get(k);
            out = out.replaceAll("\\b" + java.util.regex.Pattern.quote(w.name()) + "\\b",
                java.util.regex.Matcher.quoteReplacement("(" + w.value().plain() + ")"));
        }
        return out;
    }

    @Test
    void namedEntriesEvaluateToTheExactPowers() {
        SymjaSession cas = SymjaSession.open();
        for (String model : List.of("closed-stages.chain", "plant.chain")) {
            for (String point : List.of(model.equals("plant.chain") ? "1/40" : "1/7")) {
                String param = model.equals("plant.chain") ? "w" : "a";
                LoadedModel m = LoadedModel.load(Path.of(Cli.model(model)), Optional.empty());
                ClosedResult r = Analysis.closed(m, ClosedQuery.matrix(), (p, d, t) -> { });
                assertFalse(r.where().isEmpty(), "a quadratic pair is named in " + model);
                LoadedModel at = LoadedModel.load(Path.of(Cli.model(model)),
                    java.util.Map.of(param, Rational.parse(point)));
                for (int n : new int[] {1, 12}) {
                    StepResult.Matrix exact = (StepResult.Matrix) Analysis.step(at, StepQuery.matrix(n),
                        (p, d, t) -> { });
                    for (int i = 0; i < r.rows().size(); i++) {
                        for (int j = 0; j < r.cols().size(); j++) {
                            String f = substituted(r, r.shownCells().get(i).get(j).plain());
                            assertTrue(r.shownCells().get(i).get(j).plain().length()
                                <= r.cells().get(i).get(j).plain().length(), "names shorten the entry");
                            String expr = f.replaceAll("\\b" + r.names().step() + "\\b", "(" + n + ")")
                                .replaceAll("\\b" + param + "\\b", "(" + point + ")");
                            String v = cas.eval("N(Re(" + expr + "), 40)");
                            BigDecimal got = new BigDecimal(v.replace("*10^", "E"), MathContext.DECIMAL128);
                            Rational want = exact.entries().get(i).get(j);
                            BigDecimal w = new BigDecimal(want.numerator()).divide(new BigDecimal(want.denominator()),
                                MathContext.DECIMAL128);
                            assertEquals(0, got.subtract(w).abs().compareTo(new BigDecimal("1e-25")) < 0 ? 0 : 1,
                                model + " P^" + n + "(" + i + "," + j + ") at " + point + ": " + got + " vs " + w);
                        }
                    }
                }
            }
        }
    }
}
