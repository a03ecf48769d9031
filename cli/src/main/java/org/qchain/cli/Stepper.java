package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.qchain.cli.result.Entry;
import org.qchain.cli.result.ExactValue;
import org.qchain.cli.result.StepResult;
import org.qchain.exact.Decimals;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.TopPaths;
import org.qchain.exact.WeightedPath;

/**
 * Wires a {@code step} query: size guard, engine call, result value. Shared by {@code step} and {@code demo}; prints
 * nothing.
 */
final class Stepper {
    /** The option that raises the size limit, named in the refusal. */
    static final String MAX_DIGITS_OPTION = "--max-digits";
    /** The option that raises the limit on the work of a path search. */
    static final String MAX_PATH_DIGITS_OPTION = "--max-path-digits";

    private Stepper() {
    }

    /**
     * What to compute.
     *
     * @param n         number of steps
     * @param from      the starting state, for a row or an entry
     * @param to        the final state, for an entry (needs {@code from})
     * @param paths     how many most probable paths to list (needs {@code from} and {@code to})
     * @param digits    significant digits of the decimals
     * @param maxDigits refuse results estimated to have more digits in total
     */
    record Query(long n, Optional<String> from, Optional<String> to, OptionalInt paths, int digits, long maxDigits,
                 long maxPathDigits) {
        /** A query with the default limit on the path search. */
        Query(long n, Optional<String> from, Optional<String> to, OptionalInt paths, int digits, long maxDigits) {
            this(n, from, to, paths, digits, maxDigits, SizeEstimate.DEFAULT_MAX_PATH_DIGITS);
        }

    }

    /**
     * Computes the query on a chain.
     *
     * @param chain    the chain
     * @param q        the query
     * @param progress told about long work; may throw to stop it
     * @return the result value
     * @throws QchainException for an unknown state, a result past the size limit, an interruption
     */
    static StepResult compute(LoadedChain chain, Query q, Progress progress) {
        RationalMatrix p = chain.p();
        List<String> warnings = new ArrayList<>();
        if (q.from().isEmpty()) {
            SizeEstimate.requireWithin(SizeEstimate.digitsOfPower(p, q.n()), q.maxDigits(), MAX_DIGITS_OPTION);
            RationalMatrix pn = MatrixPowers.power(p, q.n(), progress);
            List<List<Entry>> rows = new ArrayList<>();
            for (int i = 0; i < pn.rows(); i++) {
                rows.add(entries(pn.row(i), q.digits()));
            }
            return new StepResult.Matrix(header(chain, q, warnings), chain.states(), rows);
        }
        int from = chain.state("--from", q.from().get());
        OptionalInt to = q.to().isPresent() ? OptionalInt.of(chain.state("--to", q.to().get())) : OptionalInt.empty();
        // one entry is computed through its whole row, so the row's size bounds both
        SizeEstimate.requireWithin(SizeEstimate.digitsOfRow(p, from, q.n()), q.maxDigits(), MAX_DIGITS_OPTION);
        if (to.isEmpty()) {
            Rational[] row = MatrixPowers.rowOfPower(p, from, q.n(), progress);
            return new StepResult.Row(header(chain, q, warnings), q.from().get(), chain.states(),
                entries(row, q.digits()));
        }
        Rational total = MatrixPowers.entryOfPower(p, from, to.getAsInt(), q.n(), progress);
        Optional<List<StepResult.PathLine>> paths = Optional.empty();
        if (q.paths().isPresent()) {
            paths = Optional.of(paths(chain, from, to.getAsInt(), total, q, warnings, progress));
        }
        return new StepResult.Single(header(chain, q, warnings), q.from().get(), q.to().get(),
            entry(total, q.digits()), paths);
    }

    private static List<StepResult.PathLine> paths(LoadedChain chain, int from, int to, Rational total, Query q,
                                                   List<String> warnings, Progress progress) {
        int k = q.paths().getAsInt();
        if (q.n() > Integer.MAX_VALUE) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "-n", q.n(),
                "--paths needs n at most " + Integer.MAX_VALUE);
        }
        List<StepResult.PathLine> out = new ArrayList<>();
        if (total.isZero()) {
            warnings.add("no path of " + q.n() + " steps leads from " + q.from().get() + " to " + q.to().get());
            return out;
        }
        long work = SizeEstimate.digitsOfPathSearch(chain.p(), q.n(), k);
        if (work > q.maxPathDigits()) {
            throw new QchainException(ErrorKey.PATH_SEARCH_TOO_LARGE, work, q.maxPathDigits(), MAX_PATH_DIGITS_OPTION);
        }
        List<WeightedPath> top = TopPaths.mostProbable(chain.p(), from, to, (int) q.n(), k, progress);
        for (WeightedPath w : top) {
            List<String> names = new ArrayList<>();
            for (int s : w.states()) {
                names.add(chain.states().get(s));
            }
            Rational share = w.probability().divide(total);
            out.add(new StepResult.PathLine(names, entry(w.probability(), q.digits()),
                new Entry(ExactValue.of(share), Decimals.format(share.multiply(Rational.of(100)), q.digits()))));
        }
        if (top.size() < k) {
            warnings.add("only " + top.size() + (top.size() == 1 ? " path" : " paths") + " of " + q.n()
                + " steps " + (top.size() == 1 ? "leads" : "lead") + " from " + q.from().get() + " to " + q.to().get()
                + "; --paths asked for " + k);
        }
        return out;
    }

    private static StepResult.Header header(LoadedChain chain, Query q, List<String> warnings) {
        return new StepResult.Header(chain.source(), chain.model().kind().word(), q.n(), q.digits(), warnings);
    }

    static Entry entry(Rational r, int digits) {
        return new Entry(ExactValue.of(r), Decimals.format(r, digits));
    }

    static List<Entry> entries(Rational[] row, int digits) {
        List<Entry> out = new ArrayList<>(row.length);
        for (Rational r : row) {
            out.add(entry(r, digits));
        }
        return out;
    }
}
