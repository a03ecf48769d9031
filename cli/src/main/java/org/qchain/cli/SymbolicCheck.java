package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.qchain.cli.format.Caution;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Model;
import org.qchain.symbolic.Formulas;
import org.qchain.symbolic.RatFunMatrix;

/**
 * The symbolic path of {@code qchain check}: the one-step matrix as formulas in the parameters, rows that sum to 1
 * identically, and each entry's range over the parameter domains (warnings with the condition; an error where the
 * nominal values break it). Loaded only on that path.
 */
final class SymbolicCheck {
    private SymbolicCheck() {
    }

    static int run(CheckCommand c, Model m) {
        if (m.kind() != ChainKind.DISCRETE) {
            throw new QchainException(ErrorKey.WRONG_KIND, m.kind().word(),
                "qchain check with symbolic parameters needs a discrete chain (continuous chains are not supported yet)");
        }
        SymbolicStep.SymbolicContext ctx = SymbolicStep.SymbolicContext.of(m, c.model.at());
        RatFunMatrix p = ctx.p();
        StringBuilder sb = new StringBuilder();
        sb.append("One-step matrix of ").append(m.source()).append(" (").append(m.kind().word()).append(" chain, ")
            .append(m.size()).append(" states) as exact rational functions of ")
            .append(ctx.parameters().isEmpty() ? "(no parameters)" : String.join(", ", ctx.parameters()))
            .append(":\n");
        List<String> lines = new ArrayList<>();
        int width = 0;
        for (int i = 0; i < m.size(); i++) {
            for (int j = 0; j < m.size(); j++) {
                width = Math.max(width, (m.states().get(i) + " -> " + m.states().get(j)).length());
            }
        }
        for (int i = 0; i < m.size(); i++) {
            for (int j = 0; j < m.size(); j++) {
                String label = m.states().get(i) + " -> " + m.states().get(j);
                lines.add("  " + label + " ".repeat(width - label.length() + 2) + Formulas.plain(p.get(i, j)));
            }
        }
        sb.append(String.join("\n", lines)).append('\n');
        if (!ctx.warnings().isEmpty()) {
            sb.append("\nConditions (each entry must lie in [0, 1] for the results to be probabilities):\n");
            for (String w : ctx.warnings()) {
                sb.append("  ").append(w).append('\n');
            }
        }
        int size = m.size();
        sb.append('\n').append(Caution.TEXT).append("\n\n");
        sb.append("OK: ").append(size).append(size == 1 ? " state" : " states").append(", ").append(m.kind().word())
            .append(", rows sum to 1 identically; ")
            .append(ctx.warnings().isEmpty() ? "entries in [0, 1] on the whole parameter domain"
                : ctx.warnings().size() + (ctx.warnings().size() == 1 ? " condition" : " conditions")
                    + " on the parameters (above)")
            .append('\n');
        Emitter.emit(c.spec, sb.toString(), ctx.warnings(), Optional.empty());
        return ExitCodes.OK;
    }
}
