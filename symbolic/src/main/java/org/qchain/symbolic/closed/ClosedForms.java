package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ParamDecl;

/**
 * Closed forms of P^n in a symbolic n: the entry point of this package.
 *
 * <pre>{@code
 * Model m = ...;                                       // rows 1-a, a / b, 1-b
 * ClosedForm cf = ClosedForms.of(m, Map.of());
 * cf.formula(0, 0);      // "b/(a + b) + a/(a + b)*(1 - a - b)^n"
 * cf.conditions();       // ["a + b != 0"]
 * cf.evaluate(5, Map.of("a", Rational.of(1, 3), "b", Rational.of(1, 4)));   // exact P^5
 * }</pre>
 */
public final class ClosedForms {
    private ClosedForms() {
    }

    /**
     * The closed form of P^n for a discrete-time model, with the given parameter values substituted and every
     * other parameter that the matrix uses kept symbolic.
     *
     * @param model a discrete-time model
     * @param at    values for some parameters (may be empty)
     * @return the closed form
     * @throws QchainException with {@link ErrorKey#WRONG_KIND} for a continuous-time model,
     *                         {@link ErrorKey#UNKNOWN_PARAMETER} for a value of an undeclared parameter,
     *                         {@link ErrorKey#CLOSED_FORM_UNSUPPORTED} for a repeated irreducible factor of degree
     *                         at least 2 with a Jordan block
     */
    public static ClosedForm of(Model model, Map<String, Rational> at) {
        if (model.kind() != ChainKind.DISCRETE) {
            throw new QchainException(ErrorKey.WRONG_KIND, model.kind().word(),
                "closed forms in n are for discrete-time chains");
        }
        for (String name : at.keySet()) {
            if (model.param(name).isEmpty()) {
                throw new QchainException(ErrorKey.UNKNOWN_PARAMETER, name);
            }
        }
        int s = model.size();
        Set<String> used = new LinkedHashSet<>();
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                used.addAll(model.entry(i, j).variables());
            }
        }
        List<String> names = new ArrayList<>();
        for (ParamDecl p : model.params()) {
            if (used.contains(p.name()) && !at.containsKey(p.name())) {
                names.add(p.name());
            }
        }
        ParamField f = new ParamField(names, "x");
        Quotient<BigRational>[][] p = Mat.create(s);
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                p[i][j] = f.of(model.entry(i, j), at);
            }
        }
        return new ClosedForm(f, Spectral.of(f, p), model.states());
    }

    /**
     * The closed form with every parameter symbolic.
     *
     * @see #of(Model, Map)
     */
    public static ClosedForm of(Model model) {
        return of(model, Map.of());
    }
}
