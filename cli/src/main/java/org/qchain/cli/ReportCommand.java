package org.qchain.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import java.util.concurrent.Callable;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.Report;
import org.qchain.analysis.ReportQuery;
import org.qchain.analysis.ReportSection;
import org.qchain.cli.io.AtomicFiles;
import org.qchain.exact.Rational;
import org.qchain.format.ReportFormat;
import org.qchain.format.ReportLayout;
import org.qchain.result.ReportResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;
import picocli.CommandLine.TypeConversionException;

/**
 * {@code qchain report}: a document (HTML, Markdown or LaTeX) with the model, its state diagram, n-step results, the
 * closed form, long-run figures, sensitivity and plots. The options become a {@link ReportQuery}; {@link Report}
 * runs its queries through the analysis; a {@link ReportLayout} writes the document.
 */
@Command(name = "report", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
    sortOptions = false,
    description = {
        "Write a report of a model to a file that you can read and paste: HTML (one self-contained file with MathML"
            + " formulas and SVG drawings), Markdown (GitHub tables, $...$ math, SVG plots beside it) or LaTeX (a"
            + " complete document with TikZ plots).",
        "Sections (all by default): model (states, parameters, the one-step matrix or generator, validation and"
            + " conditions), diagram (Graphviz DOT; drawn in HTML), steps (P^n exact and decimal, or P(t)), closed"
            + " (the closed form in n), longrun (classes, long run, absorption; availability for continuous chains),"
            + " sensitivity (derivative and elasticity for every parameter, and a sweep), plots (P^n against n or"
            + " A(t) and R(t) against t with the limit dashed; the sweep).",
        "The file is written atomically: a failure leaves an existing file untouched."})
final class ReportCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "FILE",
        description = "The report file; its ending (.html, .md, .tex) sets the format unless --format is given."
            + " Never the model file.")
    Path output;

    @Option(names = "--format", paramLabel = "FORMAT", converter = FormatConverter.class,
        description = "html, markdown or latex (default: from the ending of FILE).")
    ReportFormat format;

    @Option(names = "--sections", paramLabel = "LIST", split = ",",
        description = "Only these sections, comma-separated: " + "model, diagram, steps, closed, longrun, sensitivity,"
            + " plots (default: all).")
    List<String> sections;

    @Option(names = "--skip", paramLabel = "LIST", split = ",",
        description = "Leave out these sections (the same names).")
    List<String> skip;

    @Option(names = {"-n", "--steps"}, paramLabel = "N", split = ",", converter = Converters.Steps.class,
        description = "The n of the n-step results of a discrete chain, comma-separated (default: 1,5,10).")
    List<Long> steps;

    @Option(names = {"-t", "--time"}, paramLabel = "T", converter = Converters.Times.class,
        description = "The times of P(t) of a continuous chain: T, T1,T2,... or A..B:STEP (default: 1,10,100).")
    Converters.TimeList times;

    @Option(names = "--from", paramLabel = "STATE",
        description = "The start state of the rows, the closed form and the plots (default: the first state; the"
            + " whole matrix is shown for chains of up to 6 states unless --from is given).")
    String from;

    @Option(names = "--to", paramLabel = "STATES", split = ",",
        description = "The target states of the plotted entries (default: every state for up to 6 states, else the"
            + " last); with one state, the closed form is of that entry only.")
    List<String> to;

    @Option(names = "--plot-steps", paramLabel = "N", converter = Converters.Steps.class,
        description = "The last n of the P^n plot (default: 30).")
    Long plotSteps;

    @Option(names = "--plot-time", paramLabel = "T", converter = Converters.PositiveRational.class,
        description = "The last t of the A(t) or P(t) plot (default: 10 over the largest total rate out of a state,"
            + " rounded up).")
    Rational plotTime;

    @Option(names = "--sens-to", paramLabel = "STATE",
        description = "Discrete chains: the sensitivity is of P^n(FROM -> STATE) (default: the last state).")
    String sensTo;

    @Option(names = "--sens-steps", paramLabel = "N", converter = Converters.Steps.class,
        description = "The n of that figure (default: the largest -n).")
    Long sensSteps;

    @Option(names = "--sweep", paramLabel = "\"NAME in [LOW, HIGH] with K points\"",
        description = "The sweep, in the model file's interval syntax (default: the first parameter from its"
            + " domain's lower end to twice its value, 11 points).")
    String sweep;

    @Mixin
    DigitsOption digitsOption;

    @Mixin
    LimitOptions.Digits digitLimit;

    @Mixin
    LimitOptions.Terms termLimit;

    /** {@code --format}'s words. */
    static final class FormatConverter implements picocli.CommandLine.ITypeConverter<ReportFormat> {
        @Override
        public ReportFormat convert(String value) {
            return ReportFormat.of(value).orElseThrow(() -> new TypeConversionException("unknown report format '"
                + value + "' (expected one of: " + ReportFormat.words() + ")"));
        }
    }

    private Set<ReportSection> sections() {
        Set<ReportSection> s = EnumSet.allOf(ReportSection.class);
        if (sections != null) {
            s = EnumSet.noneOf(ReportSection.class);
            for (String w : sections) {
                s.add(section("--sections", w));
            }
        }
        if (skip != null) {
            for (String w : skip) {
                s.remove(section("--skip", w));
            }
        }
        return s;
    }

    private ReportSection section(String option, String word) {
        return ReportSection.of(word).orElseThrow(() -> new ParameterException(spec.commandLine(), option + " '" + word
            + "': not a section (the sections are: " + ReportSection.words() + ")"));
    }

    @Override
    public Integer call() {
        ReportFormat f = format != null ? format : ReportFormat.ofFileName(output.getFileName().toString())
            .orElseThrow(() -> new ParameterException(spec.commandLine(), "-o " + output + ": give a file ending in"
                + " .html, .md or .tex, or choose the format with --format html|markdown|latex"));
        Set<ReportSection> chosen = sections();
        String name = output.getFileName().toString();
        String base = name.contains(".") ? name.substring(0, name.lastIndexOf('.')) : name;
        Emitter.checkTarget(Optional.of(output), Optional.of(model.model));
        LoadedModel loaded = model.load();
        ReportQuery defaults = ReportQuery.defaults();
        ReportQuery q = new ReportQuery(chosen, steps == null ? defaults.steps() : steps,
            times == null ? defaults.times() : times.times(), Optional.ofNullable(from),
            to == null ? List.of() : to, plotSteps == null ? defaults.plotSteps() : Math.max(1, plotSteps),
            Optional.ofNullable(plotTime), Optional.ofNullable(sensTo),
            sensSteps == null ? OptionalLong.empty() : OptionalLong.of(sensSteps), Optional.ofNullable(sweep),
            digitsOption.digits, termLimit.maxTerms, digitLimit.maxDigits,
            sections != null && chosen.contains(ReportSection.CLOSED) ? Integer.MAX_VALUE
                : ReportQuery.DEFAULT_CLOSED_MAX_STATES);
        ReportResult result = root.run(spec, progress -> Report.run(loaded, q, progress));
        ReportLayout.Files files = f.layout(digitsOption.digits).render(result, base);
        List<Path> written = new ArrayList<>();
        for (Map.Entry<String, String> e : files.attachments().entrySet()) {
            Path p = output.resolveSibling(e.getKey());
            Emitter.checkTarget(Optional.of(p), Optional.of(model.model));
            written.add(p);
        }
        for (Path p : written) {
            AtomicFiles.write(p, "--output", files.attachments().get(p.getFileName().toString()));
        }
        Emitter.emit(spec, files.main(), result.warnings(), Optional.of(output));
        return ExitCodes.OK;
    }
}
