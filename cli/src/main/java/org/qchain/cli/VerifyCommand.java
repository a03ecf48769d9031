package org.qchain.cli;

import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.VerifyQuery;
import org.qchain.exact.Rational;
import org.qchain.exact.reference.Tolerance;
import org.qchain.result.VerifyResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code qchain verify}: another tool's floating-point results checked exactly against the truth. */
@Command(name = "verify", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
    sortOptions = false,
    description = {
        "Check floating-point results from another tool (your code, a spreadsheet, a numerical library) against"
            + " the exact values.",
        "Each number in FILE is read exactly and subtracted exactly from the truth; only the errors are rounded,"
            + " for display. Prints the worst entries first, then a summary; exits 0 when every value meets the"
            + " tolerance and 3 when one does not.",
        "FILE is CSV (a table, optionally with a header of state names in any order and a column of row names; or"
            + " from,to,value records) or JSON (a nested array or an object keyed by state names); see"
            + " docs/reference-files.md."})
final class VerifyCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = "--against", required = true, paramLabel = "FILE",
        description = "The file of floating-point results to check (CSV or JSON).")
    Path against;

    @Option(names = {"-n", "--steps"}, paramLabel = "N", converter = Converters.Steps.class,
        description = "Number of steps: the file holds P^n (or its row with --from, or one entry with --to).")
    Long n;

    @Option(names = {"-t", "--time"}, paramLabel = "T",
        description = "Time of a continuous chain: the file holds P(t) (or its row, or one entry), compared with"
            + " certified enclosures of P(t).")
    String time;

    @Option(names = "--what", paramLabel = "WHAT", converter = Converters.VerifyWhat.class,
        completionCandidates = Converters.VerifyWhatWords.class,
        description = "What the file holds: ${COMPLETION-CANDIDATES} (default: matrix with -n; row with --from;"
            + " entry with --from and --to).")
    VerifyQuery.What what;

    @Option(names = "--from", paramLabel = "STATE", description = "Starting state of a row or an entry.")
    String from;

    @Option(names = "--to", paramLabel = "STATE", description = "Final state of an entry (needs --from).")
    String to;

    @Option(names = "--tol", paramLabel = "R", converter = Converters.Bound.class,
        description = "Relative tolerance: |x - t| <= R |t| (default 1e-9 when no tolerance is given).")
    Rational tol;

    @Option(names = "--abs-tol", paramLabel = "A", converter = Converters.Bound.class,
        description = "Absolute tolerance: |x - t| <= A. A value passes when it meets any tolerance given.")
    Rational absTol;

    @Option(names = "--ulps", paramLabel = "K", converter = Converters.UlpBound.class,
        description = "Tolerance in units in the last place of a binary64: at most K doubles between the value's"
            + " double and the correctly rounded double of the truth (0: correctly rounded).")
    Long ulps;

    @Option(names = "--show", paramLabel = "K", converter = Converters.ShowCount.class,
        defaultValue = "" + VerifyQuery.DEFAULT_SHOW,
        description = "How many of the worst entries to list (default: ${DEFAULT-VALUE}).")
    int show = VerifyQuery.DEFAULT_SHOW;

    @Option(names = "--symbolic", description = "Refused: a float file holds numbers; give values with --at.")
    boolean symbolic;

    @Mixin
    OutputOptions output;

    @Mixin
    LimitOptions.Digits digitLimit;

    @Override
    public Integer call() {
        if (symbolic) {
            throw new ParameterException(spec.commandLine(), "--symbolic does not apply to verify: a float file"
                + " holds numbers, so every parameter needs a value (give them with --at)");
        }
        Optional<Rational> t = Optional.empty();
        if (time != null) {
            if (n != null) {
                throw new ParameterException(spec.commandLine(), "give -n (P^n of a discrete chain) or -t (P(t) of a"
                    + " continuous chain), not both");
            }
            Rational r;
            try {
                r = Rational.parse(time);
            } catch (RuntimeException e) {
                throw new ParameterException(spec.commandLine(), "-t: '" + time + "' is not a number (write e.g. 2,"
                    + " 0.5 or 1/3)");
            }
            if (r.signum() < 0) {
                throw new ParameterException(spec.commandLine(), "-t: '" + time + "' is negative; the time must be"
                    + " 0 or more");
            }
            t = Optional.of(r);
        }
        if (to != null && from == null) {
            throw new ParameterException(spec.commandLine(), "--to needs --from (the starting state)");
        }
        VerifyQuery.What w = what != null ? what : to != null ? VerifyQuery.What.ENTRY
            : from != null ? VerifyQuery.What.ROW : VerifyQuery.What.MATRIX;
        boolean power = w == VerifyQuery.What.MATRIX || w == VerifyQuery.What.ROW || w == VerifyQuery.What.ENTRY;
        if (power && n == null && t.isEmpty()) {
            throw new ParameterException(spec.commandLine(), "--what " + w.word() + " needs -n N (the number of"
                + " steps), or -t T for a continuous chain");
        }
        if (w == VerifyQuery.What.ROW && (from == null || to != null)) {
            throw new ParameterException(spec.commandLine(), "--what row needs --from (and no --to)");
        }
        if (w == VerifyQuery.What.ENTRY && (from == null || to == null)) {
            throw new ParameterException(spec.commandLine(), "--what entry needs --from and --to");
        }
        if (w == VerifyQuery.What.MATRIX && from != null) {
            throw new ParameterException(spec.commandLine(), "--what matrix takes no --from or --to");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        if (output.output().isPresent() && output.output().get().toAbsolutePath().normalize()
                .equals(against.toAbsolutePath().normalize())) {
            throw new ParameterException(spec.commandLine(), "--output must not be the --against file");
        }
        LoadedModel loaded = model.load();
        Tolerance tolerance = Tolerance.orDefault(Optional.ofNullable(tol), Optional.ofNullable(absTol),
            ulps == null ? OptionalLong.empty() : OptionalLong.of(ulps));
        VerifyQuery q = new VerifyQuery(against, against.toString(), w,
            n == null ? OptionalLong.empty() : OptionalLong.of(n), Optional.ofNullable(from), Optional.ofNullable(to),
            tolerance, show, digitLimit.maxDigits, t);
        VerifyResult result = root.run(spec, progress -> Analysis.verify(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return result.passed() ? ExitCodes.OK : ExitCodes.OVER_TOLERANCE;
    }
}
