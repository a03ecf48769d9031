package org.qchain.cli;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.AvailabilityQuery;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.LongRunQuery;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedPowers;
import org.qchain.result.Result;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code qchain avail}: figures of merit of a repairable system. */
@Command(name = "avail", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "Figures of merit of a repairable system (a continuous chain whose 'up' line marks the operating states),"
            + " exactly or as formulas in the parameters.",
        "Exact: steady-state availability and unavailability, down hours per year, failure frequency (failures per"
            + " unit of time in the long run), mean up and down time per cycle, mean time to failure (MTTF: expected"
            + " time to first reach a down state) from each up state, and the long-run share of every state.",
        "With -t: point availability A(t) from --from (default: the first up state) as certified decimals.",
        "Parameters without a value (or --symbolic): the same figures as formulas in the parameters, with the"
            + " conditions under which they hold, and their exact values where every parameter has one."})
final class AvailCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = {"-t", "--time"}, paramLabel = "T", converter = Converters.Times.class,
        description = "Time(s) for the point availability A(t): T, T1,T2,... or A..B:STEP.")
    Converters.TimeList times;

    @Option(names = "--from", paramLabel = "STATE",
        description = "Start of the point availability (default: the first state on the 'up' line).")
    String from;

    @Option(names = "--hours-per-year", paramLabel = "H", defaultValue = "8766",
        converter = Converters.PositiveRational.class,
        description = "Hours in a year for the down time per year (default: ${DEFAULT-VALUE}, 365.25 days;"
            + " rates must then be per hour).")
    Rational hoursPerYear;

    @Option(names = "--max-work", paramLabel = "W", converter = Converters.WorkLimit.class,
        defaultValue = "" + CertifiedPowers.DEFAULT_MAX_WORK,
        description = "With -t: refuse point availabilities estimated to need more than W multiplications of"
            + " fixed-point numbers (default: ${DEFAULT-VALUE}).")
    long maxWork = CertifiedPowers.DEFAULT_MAX_WORK;

    @Option(names = "--symbolic", description = "Keep every parameter symbolic, even those with nominal values:"
        + " formulas, with their values at the point. Models with a parameter without a value are symbolic anyway.")
    boolean symbolic;

    @Option(names = "--formulas-in-t", description = "Give A(t) and R(t) as closed forms in t with the parameter"
        + " values put in (exact numbers for the rates; parameters without a value stay symbolic); loads the formula"
        + " engine. Not with --symbolic, which gives them in the parameters.")
    boolean formulasInT;

    @Option(names = "--max-states", paramLabel = "S", defaultValue = "" + LongRunQuery.DEFAULT_MAX_STATES,
        description = "Refuse symbolic solves of more than S states (default: ${DEFAULT-VALUE}).")
    int maxStates = LongRunQuery.DEFAULT_MAX_STATES;

    @Option(names = "--max-time-states", paramLabel = "S", defaultValue = "" + AvailabilityQuery.DEFAULT_MAX_TIME_STATES,
        description = "With formulas: give A(t) and R(t) as formulas in t for chains of at most S states, 0 for never"
            + " (default: ${DEFAULT-VALUE}; they need the generator's eigenvalues).")
    int maxTimeStates = AvailabilityQuery.DEFAULT_MAX_TIME_STATES;

    @Mixin
    OutputOptions output;

    @Override
    public Integer call() {
        Rational h = hoursPerYear;
        if (maxStates < 1) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                "Invalid value for option '--max-states': " + maxStates + " (must be at least 1)");
        }
        if (maxTimeStates < 0) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                "Invalid value for option '--max-time-states': " + maxTimeStates + " (must be at least 0)");
        }
        if (formulasInT && symbolic) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                "Options '--formulas-in-t' and '--symbolic' exclude each other: --symbolic keeps the parameters in"
                    + " the formulas in t, --formulas-in-t puts their values in");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = formulasInT ? model.load().withKnownValuesGiven() : model.load();
        AvailabilityQuery q = new AvailabilityQuery(Optional.ofNullable(from),
            times == null ? List.of() : times.times(), h, output.digits(), CertifiedPowers.DEFAULT_MAX_BITS, maxWork,
            symbolic || formulasInT, maxStates, maxTimeStates);
        Result result = root.run(spec, progress -> Analysis.run(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
