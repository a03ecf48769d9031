package org.qchain.cli;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import org.qchain.cli.format.OutputFormat;
import org.qchain.cli.result.StepResult;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code qchain check}: validates a model and prints its one-step matrix. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "Validate a model file and print its one-step matrix (exact and decimal).",
        "The last line is \"OK: ...\" when the model is valid; any error is reported as file:line:col."})
final class CheckCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    ModelOptions model;

    @Option(names = "--digits", paramLabel = "D", converter = Converters.Digits.class,
        defaultValue = "" + OutputOptions.DEFAULT_DIGITS,
        description = "Significant digits of the decimals, correctly rounded (default: ${DEFAULT-VALUE}).")
    int digits = OutputOptions.DEFAULT_DIGITS;

    @Option(names = "--symbolic",
        description = "Keep the parameters symbolic: print the entries as formulas and check, over the parameter"
            + " domains, that rows sum to 1 identically and entries stay in [0, 1] (with the conditions where they"
            + " may not). Models with a parameter without a value (none given with --at) are checked this way anyway.")
    boolean symbolic;

    @Override
    public Integer call() {
        Model parsed = ModelParser.parseFile(model.model);
        if (SymbolicRoute.appliesToCheck(parsed, symbolic, model.at())) {
            return SymbolicRoute.check(this, parsed);
        }
        LoadedChain chain = LoadedChain.load(parsed, model, spec.name());
        RationalMatrix p = chain.p();
        verifyStochastic(chain, p);
        // one step needs no size guard: the result is the model itself
        StepResult.Matrix m = (StepResult.Matrix) Stepper.compute(chain,
            new Stepper.Query(1, Optional.empty(), Optional.empty(), OptionalInt.empty(), digits, Long.MAX_VALUE),
            Progress.NONE);
        int size = chain.states().size();
        String ok = "OK: " + size + (size == 1 ? " state" : " states") + ", " + chain.model().kind().word()
            + ", rows sum to 1\n";
        Emitter.emit(spec, OutputFormat.TEXT.formatter().format(m) + ok, List.of(), Optional.empty());
        return ExitCodes.OK;
    }

    /** A second, independent look at the evaluated matrix: entries in [0, 1], every row summing to exactly 1. */
    private static void verifyStochastic(LoadedChain chain, RationalMatrix p) {
        for (int i = 0; i < p.rows(); i++) {
            Rational sum = Rational.ZERO;
            for (int j = 0; j < p.cols(); j++) {
                Rational x = p.get(i, j);
                if (x.signum() < 0 || x.compareTo(Rational.ONE) > 0) {
                    throw new QchainException(ErrorKey.PROBABILITY_RANGE, chain.states().get(i),
                        chain.states().get(j), x);
                }
                sum = sum.add(x);
            }
            if (!sum.isOne()) {
                throw new QchainException(ErrorKey.ROW_SUM, chain.states().get(i), sum);
            }
        }
    }
}
