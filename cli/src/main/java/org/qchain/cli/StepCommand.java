package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.DistributionQuery;
import org.qchain.analysis.Start;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.Route;
import org.qchain.analysis.StepQuery;
import org.qchain.analysis.TransientFormQuery;
import org.qchain.analysis.TransientQuery;
import org.qchain.format.OutputFormat;
import org.qchain.result.Result;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code qchain step}: exact n-step transition probabilities. */
@Command(name = "step", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "Transition probabilities: P^n of a discrete chain as exact fractions with decimals beside them, or P(t) of a"
            + " continuous chain at given times (-t) as certified decimals.",
        "Without --from: the whole matrix. With --from: that row (where the chain may be after n steps).",
        "With --from and --to: one probability; add --paths K for its K most probable paths. --to Up,Worn: the"
            + " probability of being in one of those states (the sum of their entries).",
        "--start Healthy=3/5 --start Ill=2/5 (or --start Healthy): the distribution after n steps from that start,"
            + " the row vector start P^n.",
        "-n 1,5,10, -n 1..30 or -n \"0..100 by 10\" (with --from or --start): one table over n, one row per n.",
        "A model with a parameter that has no value (or --symbolic) gives each entry as an exact rational function"
            + " of the parameters (--factor: factored), with its value at the nominal or --at point when every"
            + " parameter has one.",
        "--certified gives correctly rounded decimals (--digits) whose every digit is proven by an enclosure of the"
            + " exact value, without the exact fractions: for n too large for exact numbers, and for large sparse"
            + " models.",
        "Continuous chains: -t T (several: -t 1,2,5 or a range -t 0..10:2) gives P(t) = exp(Qt) as certified"
            + " decimals: every printed digit is proven, and the bound (widest enclosure) is printed. With a parameter"
            + " without a value (or --symbolic): P(t) as its closed form in t and the parameters, and at each T as"
            + " formulas in the parameters (with certified decimals where every parameter has a value)."})
final class StepCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = {"-n", "--steps"}, paramLabel = "N", converter = Converters.StepSeries.class,
        description = "Number of steps (0 or more); discrete chains. With --from or --start also a list (1,5,10), a"
            + " range (1..30) or a stepped range (\"0..100 by 10\"): one table over n.")
    Converters.StepList n;

    @Option(names = {"-t", "--time"}, paramLabel = "T", converter = Converters.Times.class,
        description = "Time(s) for a continuous chain: T, T1,T2,... or A..B:STEP (rationals, 0 or more).")
    Converters.TimeList times;

    @Option(names = "--from", paramLabel = "STATE", description = "Starting state: print only its row of P^n.")
    String from;

    @Option(names = "--to", paramLabel = "STATE", split = ",", splitSynopsisLabel = ",",
        description = "Final state (needs --from or --start): print one probability; several (--to Up,Worn): the"
            + " probability of being in one of them.")
    List<String> to = new ArrayList<>();

    @Mixin
    StartOptions startOptions;

    @Option(names = "--paths", paramLabel = "K", converter = Converters.PathCount.class,
        description = "Also list the K most probable paths of n steps from --from to --to, with their exact"
            + " probabilities and share of the total.")
    Integer paths;

    @Mixin
    OutputOptions output;

    @Mixin
    LimitOptions.Digits digitLimit;

    @Option(names = "--max-path-digits", paramLabel = "W", converter = Converters.DigitLimit.class,
        defaultValue = "" + org.qchain.exact.SizeEstimate.DEFAULT_MAX_PATH_DIGITS,
        description = "Refuse a --paths search estimated to process more than W digits in all; the work grows"
            + " with the square of n (default: ${DEFAULT-VALUE}).")
    long maxPathDigits = org.qchain.exact.SizeEstimate.DEFAULT_MAX_PATH_DIGITS;

    @Option(names = "--certified",
        description = "Certified decimals instead of exact fractions: every printed digit proven by interval"
            + " arithmetic, with the width of each enclosure. No digit limit applies; the work is estimated first.")
    boolean certified;

    @Option(names = "--max-work", paramLabel = "W", converter = Converters.WorkLimit.class,
        defaultValue = "" + org.qchain.exact.certified.CertifiedPowers.DEFAULT_MAX_WORK,
        description = "With --certified or -t: refuse computations estimated to need more than W multiplications of"
            + " fixed-point numbers (default: ${DEFAULT-VALUE}).")
    long maxWork = org.qchain.exact.certified.CertifiedPowers.DEFAULT_MAX_WORK;

    @Option(names = "--symbolic",
        description = "Keep every parameter symbolic, even those with nominal values (formulas, and values at the"
            + " nominal or --at point). Models with a parameter without a value are symbolic anyway.")
    boolean symbolic;

    @Mixin
    SymbolicOptions symbolicOptions;

    @Option(names = "--double",
        description = "With --format csv or json: add each value's correctly rounded binary64 (IEEE 754 double) as"
            + " the shortest decimal that reads back as that double and as a hexadecimal float, for pasting exact"
            + " reference values into other programs' tests.")
    boolean doubles;

    @Override
    public Integer call() {
        if ((n == null) == (times == null)) {
            throw new ParameterException(spec.commandLine(), n == null
                ? "give the number of steps -n N (discrete chain) or the time -t T (continuous chain)"
                : "-n (steps of a discrete chain) and -t (time of a continuous chain) exclude each other");
        }
        if (times != null) {
            return continuous();
        }
        if (!to.isEmpty() && from == null && !startOptions.given()) {
            throw new ParameterException(spec.commandLine(), "--to needs --from (the starting state) or --start (the"
                + " initial state or distribution)");
        }
        if (startOptions.given() && from != null) {
            throw new ParameterException(spec.commandLine(), "--start and --from both name the start; give one");
        }
        for (int k = 0; k < to.size(); k++) {
            if (to.subList(0, k).contains(to.get(k))) {
                throw new ParameterException(spec.commandLine(), "--to names " + to.get(k) + " twice; give each state"
                    + " once");
            }
        }
        if (startOptions.given() || to.size() > 1 || n.series()) {
            return distribution();
        }
        if (paths != null && (from == null || to.isEmpty())) {
            throw new ParameterException(spec.commandLine(), "--paths needs both --from and --to");
        }
        if (certified && paths != null) {
            throw new ParameterException(spec.commandLine(), "--paths lists exact path probabilities; it does not"
                + " combine with --certified");
        }
        if (certified && symbolic) {
            throw new ParameterException(spec.commandLine(), "--certified gives decimals of numbers; it does not"
                + " combine with --symbolic");
        }
        if (certified && doubles) {
            throw new ParameterException(spec.commandLine(), "--double gives the binary64 of exact values; it does not"
                + " combine with --certified");
        }
        if (doubles && output.format != OutputFormat.CSV && output.format != OutputFormat.JSON) {
            throw new ParameterException(spec.commandLine(), "--double needs --format csv or --format json");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        StepQuery q = new StepQuery(n.single(), Optional.ofNullable(from), to.stream().findFirst(),
            paths == null ? OptionalInt.empty() : OptionalInt.of(paths), digitLimit.maxDigits, maxPathDigits, symbolic,
            symbolicOptions.factor, symbolicOptions.maxTerms(), certified, output.digits(), maxWork);
        if (Analysis.route(loaded, q) == Route.SYMBOLIC) {
            if (paths != null) {
                throw new ParameterException(spec.commandLine(), "--paths needs numeric values for every parameter"
                    + " (the most probable paths of a symbolic chain depend on the parameters)");
            }
        } else if (symbolicOptions.factor) {
            throw new ParameterException(spec.commandLine(), "--factor applies to symbolic results: the model has"
                + " values for all its parameters (use --symbolic to keep them symbolic)");
        }
        if (doubles && Analysis.route(loaded, q) == Route.SYMBOLIC) {
            throw new ParameterException(spec.commandLine(), "--double needs numeric values for every parameter"
                + " (a formula has no double; give values with --at)");
        }
        Result result = root.run(spec, progress -> Analysis.step(loaded, q, progress));
        Emitter.emit(spec, output.formatter(doubles), result, output.output());
        return ExitCodes.OK;
    }

    /**
     * {@code --start}, a {@code --to} set or a list of n: the distribution (or a set's probability) after n steps,
     * one table over n for a list.
     */
    private Integer distribution() {
        String what = startOptions.given() ? "--start" : to.size() > 1 ? "a --to set" : "a list or range of -n";
        if (from == null && !startOptions.given()) {
            throw new ParameterException(spec.commandLine(), what + " needs --from or --start: one table over n of a"
                + " row, an entry or a distribution (the whole matrix is printed for one n)");
        }
        if (paths != null) {
            throw new ParameterException(spec.commandLine(), "--paths lists the paths of one entry: one n, one --from"
                + " state and one --to state (not " + what + ")");
        }
        if (certified || symbolic || doubles) {
            throw new ParameterException(spec.commandLine(), what + " gives exact values and decimals; it does not"
                + " combine with --certified, --symbolic or --double");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        Start start = startOptions.start().orElseGet(() -> Start.state(from, "--from"));
        LoadedModel loaded = model.load();
        if (symbolicOptions.factor && (n.series() || !loaded.hasParameterWithoutNominal())) {
            throw new ParameterException(spec.commandLine(), "--factor applies to formulas: " + what + " gives them"
                + " for one n on a model with a parameter without a value");
        }
        DistributionQuery q = new DistributionQuery(n.ns(), n.series(), start, to, digitLimit.maxDigits,
            symbolicOptions.factor, symbolicOptions.maxTerms());
        Result result = root.run(spec, progress -> Analysis.distribution(loaded, q, progress));
        Emitter.emit(spec, output.formatter(), result, output.output());
        return ExitCodes.OK;
    }

    /**
     * {@code -t}: P(t) of a continuous chain as certified decimals; with a parameter without a value, or with
     * {@code --symbolic}, the closed form in t and at each time (formulas in the parameters).
     */
    private Integer continuous() {
        if (!to.isEmpty() || startOptions.given() || paths != null) {
            throw new ParameterException(spec.commandLine(), "-t takes --from, --digits, --max-work, --symbolic,"
                + " --factor, --format and --output; --to, --start and --paths are for discrete chains");
        }
        if (certified && symbolic) {
            throw new ParameterException(spec.commandLine(), "--certified and --symbolic exclude each other");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        if (symbolic || !loaded.complete()) {
            TransientFormQuery sq = new TransientFormQuery(times.times(), Optional.ofNullable(from), output.digits(),
                symbolicOptions.factor, symbolicOptions.maxTerms(), digitLimit.maxDigits, maxWork);
            Result result = root.run(spec, progress -> Analysis.transientForm(loaded, sq, progress));
            Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
            return ExitCodes.OK;
        }
        if (symbolicOptions.factor) {
            throw new ParameterException(spec.commandLine(), "--factor applies to symbolic results: the model has"
                + " values for all its parameters (use --symbolic to keep them symbolic)");
        }
        TransientQuery q = new TransientQuery(times.times(), Optional.ofNullable(from), output.digits(),
            org.qchain.exact.certified.CertifiedPowers.DEFAULT_MAX_BITS, maxWork);
        Result result = root.run(spec, progress -> Analysis.transientProbabilities(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
