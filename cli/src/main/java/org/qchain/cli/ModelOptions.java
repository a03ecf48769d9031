package org.qchain.cli;

import java.nio.file.Path;
import java.util.Optional;
import org.qchain.analysis.LoadedModel;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The model file and parameter values, shared by every command that reads a model. */
final class ModelOptions {
    @Parameters(index = "0", paramLabel = "MODEL",
        description = "Model file: the qchain text format (see docs/model-format.md), or a plain CSV matrix"
            + " (file name ending in .csv).")
    Path model;

    @Option(names = "--at", paramLabel = "NAME=VALUE[,...]",
        description = "Exact parameter values, e.g. p=1/20,r=0.25 (decimals are read exactly); they override the"
            + " nominal values in the model.")
    String at;

    /** Parses, resolves and validates the model once, for any query. */
    LoadedModel load() {
        return LoadedModel.load(model, at());
    }

    /** The {@code --at} text, if given. */
    Optional<String> at() {
        return Optional.ofNullable(at);
    }
}
