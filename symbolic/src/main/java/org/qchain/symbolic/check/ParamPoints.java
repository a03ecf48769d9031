package org.qchain.symbolic.check;

import java.util.LinkedHashMap;
import java.util.Map;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ParamDecl;

/** Parameter points given by the user (for example with {@code --at}), checked against the model's declarations. */
public final class ParamPoints {
    private ParamPoints() {
    }

    /**
     * The model's nominal values overridden by {@code at}, in declaration order, after checking that every name in
     * {@code at} is a declared parameter and every value lies in its domain.
     *
     * @param model the model
     * @param at    user values (may be empty)
     * @return the merged point (parameters without a nominal value and not in {@code at} are absent)
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} for an undeclared name (as the exact module's {@code Chains}),
     *                         {@link ErrorKey#VALUE_OUTSIDE_DOMAIN} for a value outside its domain
     */
    public static Map<String, Rational> resolve(Model model, Map<String, Rational> at) {
        for (Map.Entry<String, Rational> e : at.entrySet()) {
            ParamDecl d = model.param(e.getKey())
                .orElseThrow(() -> new QchainException(ErrorKey.BAD_ARGUMENT, "parameter", e.getKey(),
                    "the model declares no such parameter"));
            if (!d.domain().contains(e.getValue())) {
                throw new QchainException(ErrorKey.VALUE_OUTSIDE_DOMAIN, e.getKey(), e.getValue(), d.domain());
            }
        }
        Map<String, Rational> out = new LinkedHashMap<>();
        for (ParamDecl d : model.params()) {
            Rational v = at.containsKey(d.name()) ? at.get(d.name()) : d.nominal().orElse(null);
            if (v != null) {
                out.put(d.name(), v);
            }
        }
        return out;
    }

    /**
     * Whether {@code x} lies in the closure of the domain (the interval with its finite ends included).
     *
     * @param d the domain
     * @param x the value
     * @return true if {@code lower <= x} and ({@code x <= upper} or no upper end)
     */
    public static boolean inClosure(Domain d, Rational x) {
        return x.compareTo(d.lower()) >= 0 && d.upper().map(u -> x.compareTo(u) <= 0).orElse(true);
    }
}
