package org.qchain.exact.model;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;
import org.qchain.exact.InputLimits;
import org.qchain.exact.Rational;

/**
 * A parsed chain: its kind, parameters, states (their order fixes rows and columns) and the transitions as listed.
 * Immutable; built by {@link ModelParser} or {@link #of}.
 */
public final class Model {
    private final String source;
    private final ChainKind kind;
    private final List<ParamDecl> params;
    private final List<String> states;
    private final List<Transition> transitions;
    // sparse: a model of 100,000 states on one line must not cost states squared
    private final Map<Long, Transition> byPair;
    private final Map<String, Integer> index;
    private final List<List<Transition>> rows;
    private final List<String> used;
    private final InputLimits limits;
    private final List<Integer> up;

    private Model(String source, ChainKind kind, List<ParamDecl> params, List<String> states,
                  List<Transition> transitions, InputLimits limits) {
        this(source, kind, params, states, transitions, limits, null);
    }

    private Model(String source, ChainKind kind, List<ParamDecl> params, List<String> states,
                  List<Transition> transitions, InputLimits limits, List<Integer> up) {
        this.up = up == null ? null : List.copyOf(up);
        this.source = source;
        this.kind = kind;
        this.params = List.copyOf(params);
        this.states = List.copyOf(states);
        this.transitions = List.copyOf(transitions);
        this.limits = limits;
        int n = states.size();
        this.byPair = new HashMap<>();
        this.index = new HashMap<>();
        for (int i = 0; i < n; i++) {
            index.putIfAbsent(this.states.get(i), i);
        }
        List<List<Transition>> byRow = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            byRow.add(new ArrayList<>());
        }
        Set<String> names = new LinkedHashSet<>();
        for (Transition t : transitions) {
            if (t.from() < 0 || t.from() >= n || t.to() < 0 || t.to() >= n) {
                throw new IllegalArgumentException("state index out of range in " + t);
            }
            if (byPair.putIfAbsent(pair(t.from(), t.to()), t) != null) {
                throw new IllegalArgumentException("duplicate transition " + states.get(t.from()) + " -> " + states.get(t.to()));
            }
            byRow.get(t.from()).add(t);
            names.addAll(t.expr().variables());
        }
        this.rows = byRow.stream().map(List::copyOf).toList();
        List<String> u = new ArrayList<>();
        for (ParamDecl p : this.params) {
            if (names.remove(p.name())) {
                u.add(p.name());
            }
        }
        u.addAll(names); // names used but not declared (only in models built in code) keep their first-use order
        this.used = List.copyOf(u);
    }

    /**
     * A model from its parts. The parser has already checked names; this factory only checks that no transition
     * is given twice.
     *
     * @param source      the file name as given, for messages
     * @param kind        discrete or continuous
     * @param params      the parameter declarations, in file order
     * @param states      the state names, in file order
     * @param transitions the listed transitions
     * @return the model
     * @throws IllegalArgumentException if a transition is given twice or an index is out of range
     */
    public static Model of(String source, ChainKind kind, List<ParamDecl> params, List<String> states,
                           List<Transition> transitions) {
        return new Model(source, kind, params, states, transitions, InputLimits.DEFAULT);
    }

    /**
     * As {@link #of(String, ChainKind, List, List, List)}, with the input limits the model was read under (its
     * dense matrix is checked against them).
     *
     * @param source      the file name as given, for messages
     * @param kind        discrete or continuous
     * @param params      the parameter declarations, in file order
     * @param states      the state names, in file order
     * @param transitions the listed transitions
     * @param limits      the input limits
     * @return the model
     * @throws IllegalArgumentException if a transition is given twice or an index is out of range
     */
    public static Model of(String source, ChainKind kind, List<ParamDecl> params, List<String> states,
                           List<Transition> transitions, InputLimits limits) {
        return new Model(source, kind, params, states, transitions, limits);
    }

    private static long pair(int from, int to) {
        return ((long) from << 32) | (to & 0xffffffffL);
    }

    /** The input limits the model was read under. */
    public InputLimits limits() {
        return limits;
    }

    /**
     * This model with its operating states marked (the {@code up} line); the other states are down.
     *
     * @param upStates indexes of the operating states, in the order listed
     * @return a copy of this model that knows its operating states
     * @throws IllegalArgumentException if an index is out of range or repeated
     */
    public Model withUpStates(List<Integer> upStates) {
        java.util.Set<Integer> seen = new java.util.HashSet<>();
        for (int i : upStates) {
            if (i < 0 || i >= states.size() || !seen.add(i)) {
                throw new IllegalArgumentException("bad or repeated up state index " + i);
            }
        }
        return new Model(source, kind, params, states, transitions, limits, upStates);
    }

    /**
     * The operating states (indexes, in the order the {@code up} line lists them), if the model marks them.
     *
     * @return the indexes, or empty if the model has no {@code up} line
     */
    public Optional<List<Integer>> upStates() {
        return Optional.ofNullable(up);
    }

    /** The file name as given, for messages. */
    public String source() {
        return source;
    }

    /** Discrete or continuous. */
    public ChainKind kind() {
        return kind;
    }

    /** The parameter declarations, in file order. */
    public List<ParamDecl> params() {
        return params;
    }

    /** The declaration of a parameter. */
    public Optional<ParamDecl> param(String name) {
        return params.stream().filter(p -> p.name().equals(name)).findFirst();
    }

    /** Names of the parameters that have no nominal value. */
    public List<String> freeParameters() {
        List<String> out = new ArrayList<>();
        for (ParamDecl p : params) {
            if (p.nominal().isEmpty()) {
                out.add(p.name());
            }
        }
        return out;
    }

    /** The nominal values of the parameters that have one, in file order. */
    public Map<String, Rational> nominalValues() {
        Map<String, Rational> out = new LinkedHashMap<>();
        for (ParamDecl p : params) {
            p.nominal().ifPresent(v -> out.put(p.name(), v));
        }
        return out;
    }

    /** The state names, in file order. */
    public List<String> states() {
        return states;
    }

    /** Number of states. */
    public int size() {
        return states.size();
    }

    /** The index of a state name. */
    public OptionalInt indexOf(String state) {
        Integer i = index.get(state);
        return i == null ? OptionalInt.empty() : OptionalInt.of(i);
    }

    /** The transitions as listed, in file order. */
    public List<Transition> transitions() {
        return transitions;
    }

    /** The listed transition from {@code i} to {@code j}, if any. */
    public Optional<Transition> listed(int i, int j) {
        return Optional.ofNullable(byPair.get(pair(i, j)));
    }

    /** The listed transitions out of state {@code i}, in file order (an unmodifiable list). */
    public List<Transition> outgoing(int i) {
        return rows.get(i);
    }

    /**
     * The last listed transition out of state {@code i} in file order: row-sum and remainder errors point at it.
     *
     * @param i the row
     * @return the transition, or empty if the row lists none
     */
    public Optional<Transition> lastListed(int i) {
        List<Transition> r = rows.get(i);
        return r.isEmpty() ? Optional.empty() : Optional.of(r.get(r.size() - 1));
    }

    /**
     * Names of the parameters that some transition uses, in declaration order. Declared but unused parameters are
     * left out; they need no value.
     */
    public List<String> usedParameters() {
        return used;
    }

    /**
     * The matrix entry {@code (i, j)} as an expression. Discrete: the listed probability; for an unlisted
     * self-transition, the remainder {@code 1 - (sum of the row's listed transitions)}; otherwise 0. Continuous: the
     * listed rate; the diagonal is minus the sum of the row's off-diagonal rates (the generator).
     *
     * @param i row (from)
     * @param j column (to)
     * @return the entry's expression
     */
    public Expr entry(int i, int j) {
        Transition t = byPair.get(pair(i, j));
        if (i != j || (t != null && kind == ChainKind.DISCRETE)) {
            return t == null ? Expr.num(Rational.ZERO) : t.expr();
        }
        Expr sum = null;
        for (Transition o : outgoing(i)) {
            if (o.to() != i) {
                sum = sum == null ? o.expr() : Expr.add(sum, o.expr());
            }
        }
        if (kind == ChainKind.DISCRETE) {
            return sum == null ? Expr.num(Rational.ONE) : Expr.sub(Expr.num(Rational.ONE), sum);
        }
        return sum == null ? Expr.num(Rational.ZERO) : new Expr.Neg(sum, null);
    }
}
