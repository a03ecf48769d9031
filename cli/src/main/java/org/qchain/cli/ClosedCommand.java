package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.ClosedQuery;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.Start;
import org.qchain.result.ClosedResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;
import picocli.CommandLine.TypeConversionException;

/**
 * {@code qchain closed}: P^n as formulas in a symbolic n and the free parameters. The options become a
 * {@link ClosedQuery}; {@link Analysis#closed} does the work.
 */
@Command(name = "closed", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "P^n of a discrete chain as one formula in a symbolic n (and the parameters without a value), valid for every"
            + " n from the stated valid_from on, under the stated parameter conditions.",
        "Without --from: the whole matrix. With --start A (or --from A): that row. With --from A --to B: one entry."
            + " --start Healthy=3/5 --start Ill=2/5: the distribution after n steps (the start's weighted sum of the"
            + " rows); --to Up,Worn: the probability of being in one of them (the sum of their entries), each as one"
            + " formula built from the combined coefficients.",
        "--form gf prints the generating functions sum_n P^n z^n, --form recurrence the linear recurrences with"
            + " their initial values; these exist for every chain.",
        "Parameters given with --at are substituted first; all others stay symbolic. Numeric values (convergence"
            + " rate, roots of named factors) use --at and the nominal values."})
final class ClosedCommand implements Callable<Integer> {

    /** Converts {@code --form}; a bad word is a usage error naming it. */
    static final class FormConverter implements ITypeConverter<ClosedResult.Form> {
        @Override
        public ClosedResult.Form convert(String value) {
            for (ClosedResult.Form f : ClosedResult.Form.values()) {
                if (f.word().equalsIgnoreCase(value.strip())) {
                    return f;
                }
            }
            throw new TypeConversionException("'" + value + "' is not a form; use matrix, gf or recurrence");
        }
    }

    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = "--from", paramLabel = "STATE", description = "Starting state: print only its row, or with --to"
        + " one entry.")
    String from;

    @Option(names = "--to", paramLabel = "STATE", split = ",", splitSynopsisLabel = ",",
        description = "Final state (needs --from or --start): print one probability; several (--to Up,Worn): the"
            + " probability of being in one of them, the sum of their entries.")
    List<String> to = new ArrayList<>();

    /** {@code --start}, shared with {@code step}: the initial state or an initial distribution. */
    @Mixin
    StartOptions startOptions;

    @Option(names = "--form", paramLabel = "FORM", converter = FormConverter.class, defaultValue = "matrix",
        description = "What to print: matrix (closed form in n, the default), gf (generating function in z) or"
            + " recurrence (linear recurrence in n with initial values).")
    ClosedResult.Form form = ClosedResult.Form.MATRIX;

    @Mixin
    OutputOptions output;

    @Option(names = "--factor", description = "Print each coefficient of the formulas and each limit with numerator"
        + " and denominator factored over the rationals, and det(xI - P) as the product of its irreducible factors.")
    boolean factor;

    @Mixin
    LimitOptions.Terms terms;

    /** Chains without free parameters: the printed digits of the closed form's coefficients, estimated first. */
    @Mixin
    LimitOptions.Digits digitLimit;

    @Override
    public Integer call() {
        if (!to.isEmpty() && from == null && !startOptions.given()) {
            throw new ParameterException(spec.commandLine(), "--to needs --from (the starting state) or --start (the"
                + " initial state or distribution)");
        }
        for (int k = 0; k < to.size(); k++) {
            if (to.subList(0, k).contains(to.get(k))) {
                throw new ParameterException(spec.commandLine(), "--to names " + to.get(k) + " twice; give each state"
                    + " once");
            }
        }
        if (startOptions.given() && from != null) {
            throw new ParameterException(spec.commandLine(), "--start and --from both name the starting state; give one");
        }
        if (factor && form != ClosedResult.Form.MATRIX) {
            throw new ParameterException(spec.commandLine(), "--factor applies to --form matrix (the closed form in n)");
        }
        Optional<Start> start = startOptions.given() ? startOptions.start()
            : Optional.ofNullable(from).map(f -> Start.state(f, "--from"));
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        ClosedQuery q = new ClosedQuery(form, start, to, terms.maxTerms, output.digits(), digitLimit.maxDigits,
            factor);
        ClosedResult result = root.run(spec, progress -> Analysis.closed(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
