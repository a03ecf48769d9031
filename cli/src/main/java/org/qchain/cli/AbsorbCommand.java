package org.qchain.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import org.qchain.analysis.AbsorbQuery;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.RewardFile;
import org.qchain.exact.Rational;
import org.qchain.result.AbsorbResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;
import picocli.CommandLine.TypeConversionException;

/** {@code qchain absorb}: time to absorption, absorption probabilities, rewards, first passage. */
@Command(name = "absorb", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
    sortOptions = false, description = {
        "Absorption of a chain, discrete or continuous: the expected visits N = (I - Q)^-1, the expected number of"
            + " steps until absorption and its variance, and the probability of ending in each absorbing state,"
            + " exactly or as formulas in the parameters.",
        "--absorbing A,B makes states absorbing (the time to first reach them). --reward FILE (lines STATE VALUE)"
            + " adds the expected reward until absorption, the long-run average reward per step and, with"
            + " --discount V, the expected discounted reward. --steps N adds the distribution of the first-passage"
            + " time into the absorbing states for n = 1..N.",
        "A continuous chain (rates): N = (-Q)^-1 holds the expected time in each state, then the expected time"
            + " until absorption (the mean time to failure when the down states are absorbing) and its variance,"
            + " in the model's time unit; --discount and --steps need a discrete chain."})
final class AbsorbCommand implements Callable<Integer> {
    /** Reads {@code --discount}: a rational strictly between 0 and 1. */
    static final class Discount implements ITypeConverter<Rational> {
        @Override
        public Rational convert(String value) {
            Rational v;
            try {
                v = Rational.parse(value.strip());
            } catch (RuntimeException e) {
                throw new TypeConversionException("'" + value + "' is not a number such as 100/105 or 0.95");
            }
            if (v.signum() <= 0 || v.compareTo(Rational.ONE) >= 0) {
                throw new TypeConversionException("'" + value + "' must be strictly between 0 and 1 (v = 1/(1 + i)"
                    + " for an interest rate i, e.g. 100/105)");
            }
            return v;
        }
    }

    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = "--from", paramLabel = "STATE", description = "Print only this starting state.")
    String from;

    @Option(names = "--absorbing", paramLabel = "A,B", split = ",", description = "Make these states absorbing"
        + " (for the time to first reach them).")
    List<String> absorbing = new ArrayList<>();

    @Option(names = "--reward", paramLabel = "FILE", description = "Rewards per step: lines STATE VALUE (states not"
        + " listed earn 0; # starts a comment).")
    Path reward;

    @Option(names = "--discount", paramLabel = "V", converter = Discount.class, description = "Discount factor per"
        + " step, 0 < V < 1, for the expected discounted reward (needs rewards).")
    Rational discount;

    @Option(names = "--steps", paramLabel = "N", description = "Also the first-passage distribution P(T = n) and"
        + " P(T <= n) for n = 1..N.")
    Integer steps;

    @Mixin
    OutputOptions output;

    @Mixin
    LongRunOptions options;

    @Override
    public Integer call() {
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        // a reward file replaces the model's own reward lines
        Map<String, Rational> rewards = reward == null ? loaded.model().rewards() : RewardFile.read(reward, loaded);
        if (discount != null && rewards.isEmpty()) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                "--discount needs rewards: --reward FILE or reward lines in the model");
        }
        AbsorbQuery q = new AbsorbQuery(Optional.ofNullable(from), absorbing, rewards, Optional.ofNullable(discount),
            steps == null ? OptionalInt.empty() : OptionalInt.of(steps), options.query(false));
        AbsorbResult result = root.run(spec, progress -> Analysis.absorb(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
