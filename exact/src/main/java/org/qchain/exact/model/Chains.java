package org.qchain.exact.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SourcePos;

/**
 * From a parsed {@link Model} and parameter values to an exact, validated matrix: the one-step transition matrix of
 * a discrete chain, or the generator (rate matrix, rows summing to 0) of a continuous one.
 *
 * <pre>{@code
 * Model m = ModelParser.parseFile(Path.of("docs/examples/pump-station-params.chain"));
 * RationalMatrix p = Chains.transitionMatrix(m, Chains.parseAssignments(m, "p=1/20, r=1/4"));
 * }</pre>
 */
public final class Chains {
    private Chains() {
    }

    /**
     * The exact matrix at the nominal values of the parameters.
     *
     * @param m the model
     * @return the matrix
     * @throws QchainException as {@link #transitionMatrix(Model, Map)}
     */
    public static RationalMatrix transitionMatrix(Model m) {
        return transitionMatrix(m, Map.of());
    }

    /**
     * The exact matrix of the model with the given parameter values. Discrete chain: entry (i, j) is the listed
     * probability, the unlisted diagonal is the remainder {@code 1 - (sum of the row)}; a row that lists its
     * self-transition must sum to exactly 1. Continuous chain: the generator, whose off-diagonal entries are the
     * listed rates and whose diagonal is minus the row's total rate.
     *
     * @param m      the model
     * @param values values that override the nominal ones; every parameter used must end with a value
     * @return the validated matrix
     * @throws QchainException DENSE_TOO_LARGE before any work if the dense matrix exceeds the model's limit
     *                         ({@link #requireDense}); FREE_PARAMETERS naming the parameters used without a value;
     *                         BAD_ARGUMENT for a name
     *                         the model does not declare; VALUE_OUTSIDE_DOMAIN; and, at the position of the
     *                         offending text, DIVISION_BY_ZERO, PROBABILITY_RANGE, NEGATIVE_RATE, ROW_SUM (at the
     *                         row's last listed transition) or NEGATIVE_REMAINDER (likewise)
     */
    public static RationalMatrix transitionMatrix(Model m, Map<String, Rational> values) {
        requireDense(m);
        Map<String, Rational> env = effectiveValues(m, values);
        int n = m.size();
        Rational[][] a = new Rational[n][n];
        for (Rational[] row : a) {
            Arrays.fill(row, Rational.ZERO);
        }
        Rational[] offDiagonal = new Rational[n];
        Arrays.fill(offDiagonal, Rational.ZERO);
        boolean discrete = m.kind() == ChainKind.DISCRETE;
        for (Transition t : m.transitions()) {
            Rational v = t.expr().evaluate(env::get);
            String from = m.states().get(t.from());
            String to = m.states().get(t.to());
            if (discrete && (v.signum() < 0 || v.compareTo(Rational.ONE) > 0)) {
                throw new QchainException(t.exprPos(), ErrorKey.PROBABILITY_RANGE, from, to, v);
            }
            if (!discrete && v.signum() < 0) {
                throw new QchainException(t.exprPos(), ErrorKey.NEGATIVE_RATE, from, to, v);
            }
            a[t.from()][t.to()] = v;
            if (t.from() != t.to()) {
                offDiagonal[t.from()] = offDiagonal[t.from()].add(v);
            }
        }
        for (int i = 0; i < n; i++) {
            String state = m.states().get(i);
            SourcePos at = m.lastListed(i).map(Transition::pos).orElse(null);
            if (!discrete) {
                a[i][i] = offDiagonal[i].negate();
            } else if (m.listed(i, i).isPresent()) {
                Rational sum = offDiagonal[i].add(a[i][i]);
                if (!sum.isOne()) {
                    throw new QchainException(at, ErrorKey.ROW_SUM, state, sum);
                }
            } else {
                Rational rest = Rational.ONE.subtract(offDiagonal[i]);
                if (rest.signum() < 0) {
                    throw new QchainException(at, ErrorKey.NEGATIVE_REMAINDER, state, rest);
                }
                a[i][i] = rest;
            }
        }
        return RationalMatrix.of(a);
    }

    /**
     * Refuses, before any work, a model whose dense {@code n x n} matrix would exceed the dense-size limit it was
     * read under ({@link Model#limits()}); every builder of a dense matrix from a model calls it first.
     *
     * @param m the model
     * @throws QchainException {@link ErrorKey#DENSE_TOO_LARGE} with the entries and a lower bound of the memory
     */
    public static void requireDense(Model m) {
        m.limits().requireDense(m.size());
    }

    /**
     * The values the model is evaluated with: the nominal values, overridden by {@code values}.
     *
     * @param m      the model
     * @param values explicit values
     * @return the values of all parameters that have one, in declaration order
     * @throws QchainException BAD_ARGUMENT for a name the model does not declare; VALUE_OUTSIDE_DOMAIN;
     *                         FREE_PARAMETERS if a parameter used by a transition has no value
     */
    public static Map<String, Rational> effectiveValues(Model m, Map<String, Rational> values) {
        for (Map.Entry<String, Rational> e : values.entrySet()) {
            Optional<ParamDecl> d = m.param(e.getKey());
            if (d.isEmpty()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter", e.getKey(),
                    "the model declares no such parameter" + declared(m));
            }
            if (!d.get().domain().contains(e.getValue())) {
                throw new QchainException(ErrorKey.VALUE_OUTSIDE_DOMAIN, e.getKey(), e.getValue(), d.get().domain());
            }
        }
        Map<String, Rational> env = new LinkedHashMap<>();
        for (ParamDecl p : m.params()) {
            Rational v = values.containsKey(p.name()) ? values.get(p.name()) : p.nominal().orElse(null);
            if (v != null) {
                env.put(p.name(), v);
            }
        }
        List<String> free = new ArrayList<>();
        for (String name : m.usedParameters()) {
            if (!env.containsKey(name)) {
                free.add(name);
            }
        }
        if (!free.isEmpty()) {
            throw new QchainException(ErrorKey.FREE_PARAMETERS, String.join(", ", free));
        }
        return env;
    }

    /**
     * Reads parameter values such as {@code p=1/20, r=0.25} (spaces allowed; values are integers, fractions or
     * decimals, read exactly).
     *
     * @param m    the model whose parameters are meant
     * @param text comma-separated {@code NAME=VALUE} items
     * @return the values in the order given
     * @throws QchainException BAD_ARGUMENT naming the item at fault (not NAME=VALUE, unknown name, name given twice,
     *                         malformed value); VALUE_OUTSIDE_DOMAIN if a value lies outside the parameter's domain
     */
    public static Map<String, Rational> parseAssignments(Model m, String text) {
        Map<String, Rational> out = new LinkedHashMap<>();
        for (String raw : text.split(",", -1)) {
            String item = raw.strip();
            int eq = item.indexOf('=');
            if (eq < 0) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter value", item,
                    item.isEmpty() ? "empty item; write NAME=VALUE, e.g. p=1/20" : "expected NAME=VALUE, e.g. p=1/20");
            }
            String name = item.substring(0, eq).strip();
            String value = item.substring(eq + 1).strip();
            Optional<ParamDecl> d = m.param(name);
            if (d.isEmpty()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter value", item,
                    name.isEmpty() ? "missing the name before '='" : "the model has no parameter '" + name + "'" + declared(m));
            }
            if (out.containsKey(name)) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter value", item,
                    "'" + name + "' is given more than once");
            }
            Rational v;
            try {
                v = Lexer.constant(value, null, m.limits().maxNumberDigits());
            } catch (QchainException e) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter value", item,
                    value.isEmpty() ? "missing the value after '='" : e.detail());
            }
            if (!d.get().domain().contains(v)) {
                throw new QchainException(ErrorKey.VALUE_OUTSIDE_DOMAIN, name, value, d.get().domain());
            }
            out.put(name, v);
        }
        return out;
    }

    private static String declared(Model m) {
        if (m.params().isEmpty()) {
            return " (it declares no parameters)";
        }
        return " (parameters: " + String.join(", ", m.params().stream().map(ParamDecl::name).toList()) + ")";
    }
}
