package org.qchain.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;

/**
 * A parsed model with its one-step matrix at the chosen parameter values.
 *
 * @param model the model
 * @param file  the model file, if it came from one (the demo's comes from the jar)
 * @param p     the one-step transition matrix
 */
record LoadedChain(Model model, Optional<Path> file, RationalMatrix p) {

    /**
     * Reads, validates and evaluates the model that {@code options} name.
     *
     * @param options the model file and {@code --at}
     * @param command the command's name, for messages
     * @return the chain
     * @throws QchainException for a missing or unreadable file, a bad model (with file:line:col), a continuous chain,
     *                         or parameters without values
     */
    static LoadedChain load(ModelOptions options, String command) {
        Path file = options.model;
        // a name ending in .csv is read as a plain CSV matrix, anything else as the model format
        return evaluate(ModelParser.parseFile(file), Optional.of(file), options.at(), command);
    }

    /**
     * Validates and evaluates a model already parsed from the file that {@code options} name.
     *
     * @param model   the parsed model
     * @param options the model file and {@code --at}
     * @param command the command's name, for messages
     * @return the chain
     */
    static LoadedChain load(Model model, ModelOptions options, String command) {
        return evaluate(model, Optional.of(options.model), options.at(), command);
    }

    /**
     * Reads the model from text (the demo's bundled example).
     *
     * @param name the name for messages
     * @param text the model text
     * @param command the command's name, for messages
     * @return the chain
     */
    static LoadedChain fromText(String name, String text, String command) {
        return evaluate(ModelParser.parse(name, text), Optional.empty(), Optional.empty(), command);
    }

    private static LoadedChain evaluate(Model model, Optional<Path> file, Optional<String> at, String command) {
        if (model.kind() != ChainKind.DISCRETE) {
            throw new QchainException(ErrorKey.WRONG_KIND, model.kind().word(),
                "qchain " + command + " needs a discrete chain (continuous chains are not supported yet)");
        }
        EvaluationRoute.Route route = EvaluationRoute.decide(model, at);
        EvaluationRoute.Numeric numeric = (EvaluationRoute.Numeric) route;
        return new LoadedChain(model, file, Chains.transitionMatrix(model, numeric.values()));
    }

    /** The name used in output headers: the file name as the user gave it. */
    String source() {
        return model.source();
    }

    /**
     * The index of a state named in an option.
     *
     * @param option the option, for the message
     * @param name   the state name
     * @return its index
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} listing the states if there is no such state
     */
    int state(String option, String name) {
        return OptionValues.state(model, option, name);
    }

    /** The state names. */
    List<String> states() {
        return model.states();
    }

    /** A checked read of a classpath resource as UTF-8 text. */
    static String resource(String name) throws IOException {
        try (var in = LoadedChain.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new QchainException(ErrorKey.INTERNAL, "resource " + name + " is missing from the jar");
            }
            return new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        }
    }
}
