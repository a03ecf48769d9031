package org.qchain.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.qchain.analysis.LoadedModel;
import org.qchain.exact.InputLimits;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The model file and parameter values, shared by every command that reads a model. */
final class ModelOptions {
    @Parameters(index = "0", paramLabel = "MODEL",
        description = "Model file: the qchain text format (see docs/model-format.md), or a plain CSV matrix"
            + " (file name ending in .csv).")
    Path model;

    @Option(names = "--at", paramLabel = "NAME=VALUE",
        description = "An exact parameter value, overriding its nominal value in the model; repeat it for each"
            + " parameter: --at p=1/20 --at r=0.25 (decimals are read exactly).")
    List<String> at = new ArrayList<>();

    @Option(names = "--max-input-digits", paramLabel = "N", converter = Converters.InputDigits.class,
        description = "Largest number of digits of one number in the model or an option (default: "
            + InputLimits.DEFAULT_MAX_NUMBER_DIGITS + "); reading a number costs time quadratic in its length.")
    Integer maxInputDigits;

    @Option(names = "--max-dense-states", paramLabel = "N", converter = Converters.DenseStates.class,
        description = "Largest number of states of a model whose dense matrix is built (default: 4096, a matrix of"
            + " 16777216 entries).")
    Long maxDenseStates;

    /** Parses, resolves and validates the model once, for any query. */
    LoadedModel load() {
        return LoadedModel.load(model, at(), limits());
    }

    /** The input limits, the defaults unless raised. */
    InputLimits limits() {
        InputLimits l = InputLimits.DEFAULT;
        if (maxInputDigits != null) {
            l = l.withMaxNumberDigits(maxInputDigits);
        }
        if (maxDenseStates != null) {
            l = l.withMaxDenseEntries(maxDenseStates * maxDenseStates);
        }
        return l;
    }

    /** The {@code --at} texts, in the order given. */
    List<String> at() {
        return List.copyOf(at);
    }
}
