package org.qchain.analysis;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.InputLimits;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SparseRationalMatrix;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.ParamDecl;
import org.qchain.exact.model.RowSums;
import org.qchain.result.Point;

/**
 * A model parsed once, its parameter point resolved once (nominal values, overridden by the given ones) and
 * validated once, whatever analysis runs on it next. Every query reads the same loaded model, so every command
 * accepts and refuses the same models with the same message at the same {@code file:line:col}.
 *
 * <p>Validation: a discrete model whose used parameters all have a value is evaluated exactly at that point through
 * {@link Chains#sparseTransitionMatrix(Model, Map)} (entries in [0, 1], rows summing to exactly 1); the dense matrix
 * is built from it when a query first needs it, after the dense-size refusal. Every discrete model with parameters
 * must also have rows that sum to 1 identically in them, not only at the point: {@link RowSums} proves it without the
 * symbolic module, so every command refuses the same models with the same message. A model with a
 * parameter without a value is then checked with its parameters symbolic (ranges over the
 * parameter domains); that check sits behind {@link SymbolicValidation}, so loading a model with values for every
 * parameter loads no JAS or Symja class. Continuous models are parsed and resolved; the queries that need a discrete
 * chain refuse them.
 *
 * <p>Immutable once loaded (the symbolic check, when asked for, is computed once and kept).
 */
public final class LoadedModel {
    private final Model model;
    private final Optional<Path> file;
    private final Map<String, Rational> given;
    private final java.util.Set<String> explicit;
    private final Map<String, Rational> known;
    private final Optional<SparseRationalMatrix> sparse;
    /** A continuous chain's generator at the point, as validated at load (empty if a parameter has no value). */
    private final Optional<SparseRationalMatrix> sparseGenerator;
    private volatile RationalMatrix dense;
    private volatile RationalMatrix generator;
    private volatile SymbolicValidation symbolic;

    private LoadedModel(Model model, Optional<Path> file, Map<String, Rational> given) {
        this(model, file, given, given.keySet());
    }

    private LoadedModel(Model model, Optional<Path> file, Map<String, Rational> given, java.util.Set<String> explicit) {
        this.model = model;
        this.file = file;
        this.given = given;
        this.explicit = java.util.Set.copyOf(explicit);
        Map<String, Rational> k = new LinkedHashMap<>();
        for (ParamDecl d : model.params()) {
            Rational v = given.containsKey(d.name()) ? given.get(d.name()) : d.nominal().orElse(null);
            if (v != null) {
                k.put(d.name(), v);
            }
        }
        this.known = java.util.Collections.unmodifiableMap(k);
        if (model.kind() == ChainKind.DISCRETE && complete()) {
            // the numeric check: throws, located, for an entry outside [0, 1] or a row not summing to 1; stored
            // sparse, so a large model with few transitions a state needs no dense matrix unless a query asks for one
            this.sparse = Optional.of(Chains.sparseTransitionMatrix(model, given));
            this.sparseGenerator = Optional.empty();
            if (!model.usedParameters().isEmpty()) {
                // rows must sum to 1 identically, not only at this point: the same refusal as the symbolic route,
                // proved without JAS (rows without parameters were just checked exactly)
                RowSums.requireIdenticallyOne(model, false);
            }
        } else {
            this.sparse = Optional.empty();
            // a continuous chain is validated (negative rates, division by zero) before any command looks at its
            // kind, so every command refuses a broken one with the same located message; the generator is kept
            this.sparseGenerator = model.kind() == ChainKind.CONTINUOUS && complete()
                ? Optional.of(Chains.sparseTransitionMatrix(model, given)) : Optional.empty();
            if (model.kind() == ChainKind.DISCRETE) {
                Chains.requireDense(model);
                RowSums.requireIdenticallyOne(model, true);
                symbolic();
            }
        }
    }

    /**
     * Reads a model file (a name ending in {@code .csv} is read as a plain CSV matrix) and loads it.
     *
     * @param file   the model file
     * @param values parameter values that override the nominal ones, by name
     * @return the loaded model
     * @throws QchainException for an unreadable file, a bad model (with file:line:col), an unknown parameter or a
     *                         value outside its domain
     */
    public static LoadedModel load(Path file, Map<String, Rational> values) {
        return of(ModelParser.parseFile(file), Optional.of(file), values);
    }

    /**
     * Reads a model file and loads it with parameter values in the text form {@code p=1/20, r=0.25}.
     *
     * @param file the model file
     * @param at   the values, if any
     * @return the loaded model
     * @throws QchainException as {@link #load(Path, Map)}; {@link ErrorKey#BAD_ARGUMENT} naming {@code --at} for a
     *                         malformed value list
     */
    public static LoadedModel load(Path file, Optional<String> at) {
        return load(file, at, InputLimits.DEFAULT);
    }

    /**
     * As {@link #load(Path, Optional)}, under the given input limits (digits of one number, states of a dense
     * matrix); the model keeps them, so every engine checks its dense size against them before any work.
     *
     * @param file   the model file
     * @param at     the values, if any
     * @param limits the input limits
     * @return the loaded model
     * @throws QchainException as {@link #load(Path, Optional)}; NUMBER_TOO_LONG, DENSE_TOO_LARGE
     */
    public static LoadedModel load(Path file, Optional<String> at, InputLimits limits) {
        return load(file, at.map(List::of).orElse(List.of()), limits);
    }

    /**
     * Reads a model file and loads it with the values of repeated {@code --at} options, each
     * {@code NAME=VALUE} (or several, comma-separated); a name may be given once in all.
     *
     * @param file   the model file
     * @param at     the options' texts, in the order given
     * @param limits the input limits
     * @return the loaded model
     * @throws QchainException as {@link #load(Path, Optional)}; {@link ErrorKey#BAD_ARGUMENT} naming {@code --at}
     *                         for a malformed value or a name given twice
     */
    public static LoadedModel load(Path file, List<String> at, InputLimits limits) {
        Model m = ModelParser.parseFile(file, limits);
        Map<String, Rational> values = new LinkedHashMap<>();
        for (String text : at) {
            for (Map.Entry<String, Rational> e : assignments(m, text).entrySet()) {
                if (values.putIfAbsent(e.getKey(), e.getValue()) != null) {
                    throw new QchainException(ErrorKey.BAD_ARGUMENT, "--at", text,
                        "'" + e.getKey() + "' is given more than once");
                }
            }
        }
        return of(m, Optional.of(file), values);
    }

    /**
     * Loads a model read from text (a bundled example).
     *
     * @param name the name for messages
     * @param text the model text
     * @return the loaded model, with the nominal values
     */
    public static LoadedModel fromText(String name, String text) {
        return of(ModelParser.parse(name, text), Optional.empty(), Map.of());
    }

    /**
     * Loads a parsed model.
     *
     * @param model  the model
     * @param file   the file it came from, if any (an output file must not replace it)
     * @param values parameter values that override the nominal ones
     * @return the loaded model
     */
    public static LoadedModel of(Model model, Optional<Path> file, Map<String, Rational> values) {
        try {
            // names and domains of the given values, checked by the exact module before any evaluation
            Chains.effectiveValues(model, values);
        } catch (QchainException e) {
            if (e.key() != ErrorKey.FREE_PARAMETERS) {
                throw e;
            }
        }
        return new LoadedModel(model, file, Map.copyOf(values));
    }

    /**
     * Reads parameter values such as {@code p=1/20, r=0.25} for a model.
     *
     * @param model the model whose parameters are named
     * @param text  the text
     * @return the values, by name, in the order given
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} naming {@code --at} and the text, with the reason
     */
    public static Map<String, Rational> assignments(Model model, String text) {
        try {
            return Chains.parseAssignments(model, text);
        } catch (QchainException e) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--at", text, e.detail());
        }
    }

    /**
     * The same model with every known value of a used parameter given explicitly, so that the formulas route puts
     * them all in: its formulas are then in the parameters without a value only (in none for a complete model), and
     * closed forms in t come out with exact numbers for the rates.
     *
     * @return the model with its known values given
     */
    public LoadedModel withKnownValuesGiven() {
        Map<String, Rational> values = new java.util.LinkedHashMap<>();
        for (String name : model.usedParameters()) {
            if (known.containsKey(name)) {
                values.put(name, known.get(name));
            }
        }
        return new LoadedModel(model, file, values, explicit);
    }

    /**
     * The names of the values given with {@code --at}: those of {@link #given} unless
     * {@link #withKnownValuesGiven} added the nominal values.
     */
    public java.util.Set<String> explicit() {
        return explicit;
    }

    /** The parsed model. */
    public Model model() {
        return model;
    }

    /** The name used in output headers: the file name as the user gave it. */
    public String source() {
        return model.source();
    }

    /** The model file, if the model came from one. */
    public Optional<Path> file() {
        return file;
    }

    /** The state names. */
    public List<String> states() {
        return model.states();
    }

    /** The values given explicitly (the {@code --at} values), by name. */
    public Map<String, Rational> given() {
        return given;
    }

    /** Every value known: nominal values overridden by the given ones, in declaration order. */
    public Map<String, Rational> known() {
        return known;
    }

    /** Whether every parameter that a transition uses has a value (nominal or given). */
    public boolean complete() {
        return free().isEmpty();
    }

    /** The used parameters without a value, in declaration order. */
    public List<String> free() {
        List<String> out = new ArrayList<>();
        for (String name : model.usedParameters()) {
            if (!known.containsKey(name)) {
                out.add(name);
            }
        }
        return out;
    }

    /** Whether some used parameter has no nominal value (a value given explicitly does not count). */
    public boolean hasParameterWithoutNominal() {
        for (String name : model.usedParameters()) {
            if (model.param(name).flatMap(ParamDecl::nominal).isEmpty()) {
                return true;
            }
        }
        return false;
    }

    /**
     * The values of the used parameters, if every one has a value.
     *
     * @return the point, in declaration order; empty if a used parameter has no value
     */
    public Optional<Point> point() {
        if (!complete()) {
            return Optional.empty();
        }
        Map<String, Rational> p = new LinkedHashMap<>();
        for (String name : model.usedParameters()) {
            p.put(name, known.get(name));
        }
        return Optional.of(new Point(p, explicit));
    }

    /**
     * The exact one-step matrix at the point.
     *
     * @return the matrix, validated
     * @throws QchainException {@link ErrorKey#FREE_PARAMETERS} if a used parameter has no value;
     *                         {@link ErrorKey#WRONG_KIND} for a continuous model
     */
    public RationalMatrix matrix() {
        RationalMatrix d = dense;
        if (d == null) {
            SparseRationalMatrix s = sparseMatrix();
            // the dense-size refusal, with the size in the message, before any n x n array exists
            Chains.requireDense(model);
            d = s.toDense();
            dense = d;
        }
        return d;
    }

    /**
     * The exact one-step matrix at the point, stored sparse (memory in proportion to the transitions): for engines
     * that work on large sparse chains without a dense matrix.
     *
     * @return the matrix, validated
     * @throws QchainException {@link ErrorKey#FREE_PARAMETERS} if a used parameter has no value;
     *                         {@link ErrorKey#WRONG_KIND} for a continuous model
     */
    public SparseRationalMatrix sparseMatrix() {
        if (sparse.isPresent()) {
            return sparse.get();
        }
        if (model.kind() != ChainKind.DISCRETE) {
            throw new QchainException(ErrorKey.WRONG_KIND, model.kind().word(), "it has no one-step matrix");
        }
        throw new QchainException(ErrorKey.FREE_PARAMETERS, String.join(", ", free()));
    }

    /**
     * The index of a state named in a query.
     *
     * @param option the option or field that names it, for the message
     * @param name   the state name
     * @return its index
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} listing the states if there is no such state
     */
    public int state(String option, String name) {
        return model.indexOf(name).orElseThrow(() -> new QchainException(ErrorKey.BAD_ARGUMENT, option, name,
            "not a state of " + model.source() + " (states: " + String.join(", ", model.states()) + ")"));
    }

    /**
     * The exact generator (rate matrix) of a continuous chain at the point.
     *
     * @param what the command or figure, for the message when the model is not continuous
     * @return the generator, validated (no negative rate, no division by zero)
     * @throws QchainException {@link ErrorKey#WRONG_KIND} for a discrete model; {@link ErrorKey#FREE_PARAMETERS} if a
     *                         used parameter has no value; the located errors of {@link Chains#transitionMatrix}
     */
    public RationalMatrix generator(String what) {
        if (model.kind() != ChainKind.CONTINUOUS) {
            throw new QchainException(ErrorKey.WRONG_KIND, model.kind().word(), what + " needs a continuous chain");
        }
        RationalMatrix g = generator;
        if (g == null) {
            if (sparseGenerator.isEmpty()) {
                // a parameter without a value: the same refusal as the validation would give
                return Chains.transitionMatrix(model, given);
            }
            Chains.requireDense(model);
            g = sparseGenerator.get().toDense();
            generator = g;
        }
        return g;
    }

    /**
     * Refuses a model that is not a discrete chain.
     *
     * @param why the reason, as the message's second part
     * @throws QchainException {@link ErrorKey#WRONG_KIND}
     */
    void requireDiscrete(String why) {
        if (model.kind() != ChainKind.DISCRETE) {
            throw new QchainException(ErrorKey.WRONG_KIND, model.kind().word(), why);
        }
    }

    /**
     * Refuses a model that is not a continuous chain.
     *
     * @param why the reason, as the message's second part
     * @throws QchainException {@link ErrorKey#WRONG_KIND}
     */
    void requireContinuous(String why) {
        if (model.kind() != ChainKind.CONTINUOUS) {
            throw new QchainException(ErrorKey.WRONG_KIND, model.kind().word(), why);
        }
    }

    /** The symbolic check of the model (rows sum to 1 identically; range conditions), computed once. */
    SymbolicValidation symbolic() {
        SymbolicValidation s = symbolic;
        if (s == null) {
            synchronized (this) {
                s = symbolic;
                if (s == null) {
                    // the only reference to the symbolic side: numeric runs never reach it
                    s = Interrupts.guarded(() -> SymbolicEngine.validate(model, known, given.keySet()));
                    symbolic = s;
                }
            }
        }
        return s;
    }
}
