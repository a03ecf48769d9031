package org.qchain.cli;

import java.util.Map;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Model;

/**
 * Reads the option values that name parts of a model ({@code --from}, {@code --to}, {@code --start}, {@code --at}),
 * with errors that name the option. Shared by the numeric and the symbolic paths, so it uses {@code exact} types only.
 */
final class OptionValues {
    private OptionValues() {
    }

    /**
     * The index of a state named in an option.
     *
     * @param model  the model
     * @param option the option, for the message
     * @param name   the state name
     * @return its index
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} listing the states if there is no such state
     */
    static int state(Model model, String option, String name) {
        return model.indexOf(name).orElseThrow(() -> new QchainException(ErrorKey.BAD_ARGUMENT, option, name,
            "not a state of " + model.source() + " (states: " + String.join(", ", model.states()) + ")"));
    }

    /**
     * Reads {@code --at}.
     *
     * @param model the model whose parameters are named
     * @param text  the option's text
     * @return the values, by parameter name
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} naming the option and the text given, with the parser's
     *                         reason
     */
    static Map<String, Rational> assignments(Model model, String text) {
        try {
            return Chains.parseAssignments(model, text);
        } catch (QchainException e) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--at", text, e.detail());
        }
    }
}
