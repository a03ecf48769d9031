package org.qchain.cli;

import java.util.concurrent.Callable;
import picocli.AutoComplete;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code qchain completion}: a bash completion script generated from the command definitions. */
@Command(name = "completion", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
    description = {
        "Print a bash (and zsh, with bashcompinit) completion script for qchain, generated from the command"
            + " definitions.",
        "Use it with: source <(qchain completion)   or save it as a file in bash-completion's directory."})
final class CompletionCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().getOut().print(script(spec.root().commandLine()));
        spec.commandLine().getOut().flush();
        return ExitCodes.OK;
    }

    /** The script for the command tree of {@code root}. */
    static String script(picocli.CommandLine root) {
        return AutoComplete.bash("qchain", root);
    }
}
