package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.SensQuery;
import org.qchain.result.SensResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/**
 * {@code qchain sens}: the sensitivity of one n-step probability to a parameter. The options become a
 * {@link SensQuery}; {@link Analysis#sens} does the work.
 */
@Command(name = "sens", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "Sensitivity to a parameter, with its exact derivative and elasticity: of P^n(FROM -> TO) of a discrete"
            + " chain, or of P(t) and of the figures of merit (availability, MTTF, ...) of a continuous chain.",
        "P and dP/dp are printed as formulas in the parameters, with their values and the elasticity (p/P) dP/dp at"
            + " the nominal values (or --at).",
        "With --sweep: a table of P and dP/dp over exact values of the parameter, exact and decimal.",
        "For a continuous chain, -t T --from A --to B: P(t)(A -> B), its derivative and elasticity as certified"
            + " decimals, every printed digit proven (uniformization with a rigorous bound, in interval arithmetic).",
        "For a continuous chain, --of availability|unavailability|mttf|failure-frequency differentiates a figure of"
            + " merit exactly (with --sweep: a table of the figure, its derivative and its elasticity)."})
final class SensCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = "--of", paramLabel = "FIGURE", defaultValue = "entry",
        description = "What is differentiated: entry (P^n(FROM -> TO), the default), or for a continuous chain with"
            + " an 'up' line availability, unavailability, mttf (from --from, default the first up state) or"
            + " failure-frequency, exactly at the nominal or --at point (with --sweep: over the sweep's points).")
    String of = "entry";

    @Option(names = {"-n", "--steps"}, paramLabel = "N", converter = Converters.Steps.class,
        description = "Number of steps (0 or more); for --of entry.")
    Long n;

    @Option(names = {"-t", "--time"}, paramLabel = "T", converter = Converters.Times.class,
        description = "Time(s) for a continuous chain, --of entry: T, T1,T2,... or A..B:STEP (rationals, 0 or more);"
            + " P(t)(FROM -> TO), its derivative and elasticity as certified decimals (--digits).")
    Converters.TimeList times;

    @Option(names = "--max-work", paramLabel = "W", converter = Converters.WorkLimit.class,
        defaultValue = "" + org.qchain.exact.certified.CertifiedPowers.DEFAULT_MAX_WORK,
        description = "With -t: refuse a computation estimated to need more than W multiplications of fixed-point"
            + " numbers (default: ${DEFAULT-VALUE}).")
    long maxWork = org.qchain.exact.certified.CertifiedPowers.DEFAULT_MAX_WORK;

    @Option(names = "--from", paramLabel = "STATE", description = "Starting state.")
    String from;

    @Option(names = "--to", paramLabel = "STATE", split = ",", splitSynopsisLabel = ",",
        description = "State after n steps (or at time t, with -t); for --of entry. Several (--to Up,Worn): P is the probability of being in"
            + " one of them.")
    List<String> to = new ArrayList<>();

    @Option(names = "--wrt", required = true, paramLabel = "PARAM", split = ",", splitSynopsisLabel = ",",
        description = "The parameter p of the derivative dP/dp; several (--wrt p,r): the gradient, one derivative and"
            + " elasticity per parameter.")
    List<String> wrt = new ArrayList<>();

    @Option(names = "--sweep", paramLabel = "\"NAME in [LOW, HIGH] by STEP\"",
        description = "A table of P and dP/dp over exact values of NAME, in the model file's interval syntax:"
            + " \"p in [0, 1/10] by 1/100\" or \"p in [0, 1/10] with 11 points\" (an open end such as (0 is left"
            + " out; at most 10001 points); the other parameters at their nominal or --at values. With --of FIGURE:"
            + " the figure, its derivative and elasticity, exact; --max-digits bounds the estimated digits of all.")
    String sweep;

    @Mixin
    OutputOptions output;

    @Mixin
    SymbolicOptions symbolicOptions;

    @Mixin
    LimitOptions.Digits digitLimit;

    @Override
    public Integer call() {
        if (!of.equals("entry")) {
            if (times != null) {
                throw new ParameterException(spec.commandLine(), "-t is for --of entry (P(t) of a continuous chain)");
            }
            return figure();
        }
        if (times != null) {
            return transientEntry();
        }
        if (n == null || from == null || to.isEmpty()) {
            throw new ParameterException(spec.commandLine(), to.isEmpty() || from != null
                ? "--of entry needs -n N, --from STATE and --to STATE"
                : "--to needs --from (the starting state; sens has no --start: for a start distribution, the"
                    + " sensitivity is the weighted sum of those of its states)");
        }
        if (to.stream().distinct().count() != to.size() || wrt.stream().distinct().count() != wrt.size()) {
            throw new ParameterException(spec.commandLine(), "a state of --to or a parameter of --wrt is given twice");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        SensQuery q = new SensQuery(n, from, String.join(",", to), wrt.get(0), Optional.ofNullable(sweep),
            symbolicOptions.factor, symbolicOptions.maxTerms(), digitLimit.maxDigits, to, wrt);
        SensResult result = root.run(spec, progress -> Analysis.sens(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }

    /** {@code --of entry -t T}: certified P(t)(FROM -> TO) of a continuous chain and its derivative. */
    private Integer transientEntry() {
        if (n != null || sweep != null || symbolicOptions.factor || wrt.size() > 1 || to.size() > 1 || from == null
            || to.isEmpty()) {
            throw new ParameterException(spec.commandLine(), "-t takes --from STATE, --to STATE, one --wrt, --at,"
                + " --digits, --max-work, --format and --output (-n, --sweep, --factor, several --to or --wrt are for"
                + " discrete chains)");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        org.qchain.analysis.TransientSensQuery q = new org.qchain.analysis.TransientSensQuery(times.times(), from,
            to.get(0), wrt.get(0), output.digits(), org.qchain.exact.certified.CertifiedPowers.DEFAULT_MAX_BITS,
            maxWork);
        org.qchain.result.Result result = root.run(spec, progress -> Analysis.transientSens(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }

    /** {@code --of FIGURE}: the exact derivative of a figure of merit of a continuous chain. */
    private Integer figure() {
        org.qchain.exact.ctmc.RateSensitivity.Figure f = org.qchain.analysis.Figures.of(of).orElseThrow(() ->
            new ParameterException(spec.commandLine(), "--of '" + of + "': expected entry, availability,"
                + " unavailability, mttf or failure-frequency"));
        if (wrt.size() > 1) {
            throw new ParameterException(spec.commandLine(), "--of " + of + " takes one --wrt parameter (the gradient"
                + " is for --of entry)");
        }
        if (n != null || !to.isEmpty() || symbolicOptions.factor) {
            throw new ParameterException(spec.commandLine(), "--of " + of + " takes --wrt, --from, --sweep, --at,"
                + " --digits, --max-digits, --format and --output (-n, --to and --factor are for --of entry)");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        org.qchain.analysis.RateSensQuery q = new org.qchain.analysis.RateSensQuery(f, wrt.get(0),
            Optional.ofNullable(from), Optional.ofNullable(sweep), digitLimit.maxDigits);
        org.qchain.result.Result result = root.run(spec, progress -> Analysis.rateSens(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
