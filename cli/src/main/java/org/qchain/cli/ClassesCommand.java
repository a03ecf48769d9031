package org.qchain.cli;

import java.util.Optional;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.result.ClassesResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code qchain classes}: communicating classes, closed and transient, periods, absorbing states. */
@Command(name = "classes", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
    sortOptions = false, description = {
        "The communicating classes of a chain, discrete or continuous: which are closed (the chain stays once"
            + " inside) and which transient, the period of each class, the absorbing states and the one-step graph.",
        "With parameters without a value: the structure for generic values inside their domains, and the values"
            + " inside or on the edge of the domains that change it.",
        "A continuous chain (rates) has the classes of its rate graph; it is never periodic, and the table shows"
            + " the generator."})
final class ClassesCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Mixin
    OutputOptions output;

    @Mixin
    LongRunOptions options;

    @Override
    public Integer call() {
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        ClassesResult result = root.run(spec, progress -> Analysis.classes(loaded, options.query(false)));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
