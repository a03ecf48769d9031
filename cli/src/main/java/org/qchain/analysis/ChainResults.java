package org.qchain.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.longrun.Arithmetic;
import org.qchain.exact.longrun.ChainEngine;
import org.qchain.exact.longrun.Structure;
import org.qchain.result.AbsorbResult;
import org.qchain.result.ClassesResult;
import org.qchain.result.Formula;
import org.qchain.result.LongRunResult;

/**
 * Turns the long-run engine's answers into results, for either route: the route supplies the arithmetic, the matrix
 * and how one value prints. Knows no symbolic type.
 */
final class ChainResults {
    private ChainResults() {
    }

    /** The values the numeric route used and where they came from; none on the symbolic route (free parameters). */
    private static Optional<org.qchain.result.Point> at(LoadedModel model, List<String> parameters) {
        return parameters.isEmpty() ? model.point().filter(p -> !p.isEmpty()) : Optional.empty();
    }

    /** The largest N for the first-passage distribution. */
    static final int MAX_STEPS = 100_000;

    static <T> ClassesResult classes(LoadedModel model, Arithmetic<T> f, List<List<T>> p, Function<T, Formula> fmt,
            List<String> parameters, List<ClassesResult.SpecialValue> special, List<String> warnings, boolean brief) {
        List<String> names = model.states();
        boolean ct = continuous(model);
        Structure s = Structure.of(graph(model, f, p));
        List<ClassesResult.ChainClass> cls = new ArrayList<>();
        for (int c = 0; c < s.classes().size(); c++) {
            cls.add(new ClassesResult.ChainClass(names(names, s.classes().get(c)), s.closed().get(c),
                s.periods().get(c)));
        }
        return new ClassesResult(model.source(), names, parameters, cls, names(names, s.absorbing()),
            names(names, s.transients()), special, brief ? List.of() : table(p, fmt), warnings, at(model, parameters), ct, brief);
    }

    /**
     * The graph the structure is read from: the non-zero entries, with a loop at every state of a continuous chain
     * (it is never periodic).
     */
    static <T> boolean[][] graph(LoadedModel model, Arithmetic<T> f, List<List<T>> p) {
        return continuous(model) ? ChainEngine.generatorGraph(f, p) : ChainEngine.graph(f, p);
    }

    /** Whether the model is a continuous-time chain (its matrix is then the generator). */
    static boolean continuous(LoadedModel model) {
        return model.model().kind() == org.qchain.exact.model.ChainKind.CONTINUOUS;
    }

    static <T> LongRunResult longRun(LoadedModel model, LongRunQuery q, Arithmetic<T> f, List<List<T>> p,
            Function<T, Formula> fmt, List<String> parameters, List<String> warnings) {
        List<String> names = model.states();
        boolean ct = continuous(model);
        ChainEngine.LongRun<T> lr = ct ? ChainEngine.longRunContinuous(f, p, names, q.passage())
            : ChainEngine.longRun(f, p, names, q.passage());
        List<LongRunResult.ClassLaw> laws = new ArrayList<>();
        for (ChainEngine.ClassLaw<T> c : lr.classes()) {
            laws.add(new LongRunResult.ClassLaw(names(names, c.states()), c.closed(), c.period(),
                c.stationary().stream().map(fmt).toList(), c.meanRecurrence().stream().map(fmt).toList()));
        }
        List<Integer> closed = lr.structure().closedClasses();
        List<LongRunResult.Absorption> abs = new ArrayList<>();
        List<Integer> tr = lr.structure().transients();
        for (int a = 0; a < tr.size(); a++) {
            abs.add(new LongRunResult.Absorption(names.get(tr.get(a)), closed,
                lr.absorption().get(a).stream().map(fmt).toList()));
        }
        if (lr.cesaro()) {
            warnings = new ArrayList<>(warnings);
            warnings.add("a closed class is periodic: P^n has no limit; the limit shown is that of the averages"
                + " (P + P^2 + ... + P^n)/n");
        }
        return new LongRunResult(model.source(), names, parameters, laws, abs,
            q.brief() ? List.of() : table(lr.limit(), fmt), lr.cesaro(), lr.passage().map(m -> table(m, fmt)),
            warnings, at(model, parameters), ct, q.brief());
    }

    static <T> AbsorbResult absorb(LoadedModel model, AbsorbQuery q, Arithmetic<T> f, List<List<T>> p,
            Function<T, Formula> fmt, List<String> parameters, List<String> warnings) {
        List<String> names = model.states();
        Set<Integer> made = new TreeSet<>();
        for (String a : q.absorbing()) {
            made.add(model.state("--absorbing", a));
        }
        Optional<Integer> from = q.from().map(s -> model.state("--from", s));
        for (String r : q.rewards().keySet()) {
            model.state("--reward", r);
        }
        if (q.steps().isPresent() && (q.steps().getAsInt() < 1 || q.steps().getAsInt() > MAX_STEPS)) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--steps", q.steps().getAsInt(),
                "must be between 1 and " + MAX_STEPS);
        }
        boolean ct = continuous(model);
        if (ct && q.discount().isPresent()) {
            throw new QchainException(ErrorKey.NOT_APPLICABLE, "--discount",
                "a discount factor per step needs a discrete chain; this chain is continuous");
        }
        if (ct && q.steps().isPresent()) {
            throw new QchainException(ErrorKey.NOT_APPLICABLE, "--steps",
                "the first-passage distribution counts steps and needs a discrete chain; for a continuous chain"
                    + " qchain avail gives the reliability and qchain step -t the probabilities at given times");
        }
        boolean brief = q.limits().brief();
        ChainEngine.Absorption<T> a = brief ? ChainEngine.absorbBrief(f, p, names, made, ct)
            : ct ? ChainEngine.absorbContinuous(f, p, names, made) : ChainEngine.absorb(f, p, names, made);
        if (from.isPresent() && !a.transientStates().contains(from.get())) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--from", names.get(from.get()),
                "is absorbing; choose one of " + String.join(", ", names(names, a.transientStates())));
        }
        Optional<AbsorbResult.Rewards> rewards = Optional.empty();
        if (!q.rewards().isEmpty()) {
            List<T> r = new ArrayList<>();
            for (String s : names) {
                r.add(f.of(q.rewards().getOrDefault(s, Rational.ZERO)));
            }
            List<List<T>> pm = ct ? ChainEngine.withZeroRows(f, p, made) : ChainEngine.withAbsorbing(f, p, made);
            ChainEngine.LongRun<T> lr = ct ? ChainEngine.longRunContinuous(f, pm, names, false)
                : ChainEngine.longRun(f, pm, names, false);
            List<T> disc = q.discount().map(v -> ChainEngine.discountedReward(f, pm, r, f.of(v))).orElse(List.of());
            rewards = Optional.of(new AbsorbResult.Rewards(names, r.stream().map(fmt).toList(),
                ChainEngine.accumulatedReward(f, p, a, r, names, ct).stream().map(fmt).toList(),
                ChainEngine.longRunAverageReward(f, lr, r).stream().map(fmt).toList(),
                q.discount().map(v -> fmt.apply(f.of(v))), disc.stream().map(fmt).toList()));
        }
        Optional<AbsorbResult.Passage> passage = Optional.empty();
        if (q.steps().isPresent()) {
            List<List<T>> pm = ChainEngine.withAbsorbing(f, p, made);
            List<List<T>> exactly = ChainEngine.firstPassage(f, pm, new TreeSet<>(a.absorbingStates()),
                q.steps().getAsInt());
            List<List<T>> within = new ArrayList<>();
            for (List<T> row : exactly) {
                List<T> cum = new ArrayList<>();
                T s = f.zero();
                for (T x : row) {
                    s = f.add(s, x);
                    cum.add(s);
                }
                within.add(cum);
            }
            passage = Optional.of(new AbsorbResult.Passage(names, table(exactly, fmt), table(within, fmt)));
        }
        return new AbsorbResult(model.source(), parameters, names(names, a.transientStates()),
            names(names, a.absorbingStates()), names(names, List.copyOf(made)), table(a.fundamental(), fmt),
            a.expectedSteps().stream().map(fmt).toList(), a.variance().stream().map(fmt).toList(),
            table(a.probabilities(), fmt), rewards, passage, q.from(), warnings, at(model, parameters), ct, brief);
    }

    private static List<String> names(List<String> names, List<Integer> idx) {
        return idx.stream().map(names::get).toList();
    }

    private static <T> List<List<Formula>> table(List<List<T>> m, Function<T, Formula> fmt) {
        return m.stream().map(row -> row.stream().map(fmt).toList()).toList();
    }
}
