package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The generating function {@code [(I - zP)^-1]_ij} and the linear recurrence of every entry of P^n, as rational
 * functions in z and the parameters. These exist for every chain: they need the characteristic polynomial and the
 * adjugate, but no eigenvalue. Immutable (reduced forms are cached on first use); made by
 * {@link ClosedForms#series} or {@link ClosedForm#series()}.
 */
public final class SeriesForm {

    private final Series series;
    private final ParamField field;
    private final List<String> states;
    private final int size;
    /** Reduced generating functions, made on first use (idempotent, so an unsynchronised race is harmless). */
    private final List<GenPolynomial<Quotient<BigRational>>>[][] gfCache;
    private final Symbols symbols;

    SeriesForm(Series series, List<String> states) {
        this.series = series;
        this.field = series.field;
        this.states = List.copyOf(states);
        this.size = series.size;
        this.symbols = Symbols.avoiding(field.names);
        @SuppressWarnings("unchecked")
        List<GenPolynomial<Quotient<BigRational>>>[][] cache = (List<GenPolynomial<Quotient<BigRational>>>[][]) new List[size][size];
        this.gfCache = cache;
    }

    Series raw() {
        return series;
    }

    /** The state names; their order fixes rows and columns. */
    public List<String> states() {
        return states;
    }

    /** The free parameters, in declaration order. */
    public List<String> parameters() {
        return field.names;
    }

    /** The characteristic polynomial {@code det(xI - P)} in plain syntax, highest power of x first. */
    public String characteristicPolynomial() {
        return Fml.plain(field.formula(series.chi, symbols.variable()));
    }

    /** The names the formulas use for their own quantities, none of them a parameter's name. */
    public Symbols symbols() {
        return symbols;
    }


    /** Numerator and denominator in z of entry (i, j) of (I - zP)^-1, reduced, denominator(0) = 1. */
    List<GenPolynomial<Quotient<BigRational>>> gfParts(int i, int j) {
        List<GenPolynomial<Quotient<BigRational>>> cached = gfCache[i][j];
        if (cached != null) {
            return cached;
        }
        List<GenPolynomial<Quotient<BigRational>>> out = gfParts(m -> m[i][j]);
        gfCache[i][j] = out;
        return out;
    }

    private final Map<String, List<GenPolynomial<Quotient<BigRational>>>> combinedCache =
        new java.util.concurrent.ConcurrentHashMap<>();

    /** As {@link #gfParts(int, int)} for a combination: the adjugate's coefficients combined before reducing. */
    List<GenPolynomial<Quotient<BigRational>>> gfParts(Combination c) {
        if (c.isEntry()) {
            return gfParts(c.row(), c.col());
        }
        c.check(size);
        return combinedCache.computeIfAbsent(c.key(), k -> gfParts(m -> c.apply(field, m)));
    }

    private List<GenPolynomial<Quotient<BigRational>>> gfParts(ClosedForm.Cell cell) {
        // adj(I - zP) = sum_k B_k z^k with B_k = sum_{m<=k} c_m P^(k-m); det(I - zP) = sum_k c_k z^k
        GenPolynomial<Quotient<BigRational>> num = field.univariate.getZERO();
        GenPolynomial<Quotient<BigRational>> den = field.univariate.getZERO();
        List<Quotient<BigRational>> c = series.charCoeffs;
        for (int k = 0; k <= size; k++) {
            den = den.sum(c.get(k), ExpVector.create(1, 0, k));
            if (k < size) {
                num = num.sum(cell.apply(series.adjugate.get(k)), ExpVector.create(1, 0, k));
            }
        }
        List<GenPolynomial<Quotient<BigRational>>> out;
        if (num.isZERO()) {
            out = List.of(num, field.univariate.getONE());
        } else {
            // det(I - zP) = prod over factors f^m of chi of rev(f)^m, rev(f)(z) = z^deg f * f(1/z): divide out
            // every common factor by trial division (no gcd over Q(parameters), whose coefficients swell)
            for (int f = 0; f < series.factors.size(); f++) {
                GenPolynomial<Quotient<BigRational>> r = reversed(series.factors.get(f));
                if (r.degree(0) == 0) {
                    continue;
                }
                for (int k = 0; k < series.multiplicities.get(f); k++) {
                    GenPolynomial<Quotient<BigRational>>[] qn = num.quotientRemainder(r);
                    if (!qn[1].isZERO()) {
                        break;
                    }
                    num = qn[0];
                    den = den.divide(r);
                }
            }
            Quotient<BigRational> d0 = den.trailingBaseCoefficient();
            out = List.of(num.divide(d0), den.divide(d0));
        }
        return out;
    }

    private GenPolynomial<Quotient<BigRational>> reversed(GenPolynomial<Quotient<BigRational>> f) {
        long e = f.degree(0);
        GenPolynomial<Quotient<BigRational>> r = field.univariate.getZERO();
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : f.getMap().entrySet()) {
            r = r.sum(t.getValue(), ExpVector.create(1, 0, e - t.getKey().getVal(0)));
        }
        return r;
    }

    /**
     * The generating function of entry (i, j).
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public GeneratingFunction generatingFunction(int i, int j) {
        return printed(gfParts(i, j), symbols.series(), false);
    }

    /**
     * The generating function of a combination of entries, {@code sum_n (sum_i s_i sum_(j in To) P^n(i, j)) z^n}:
     * the combined adjugate over det(I - zP), reduced by the factors it shares with the denominator.
     *
     * @throws IndexOutOfBoundsException if the combination names a state out of range
     */
    public GeneratingFunction generatingFunction(Combination c) {
        return printed(gfParts(c), symbols.series(), false);
    }

    /**
     * Entry (i, j) of the Laplace transform {@code (sI - Q)^-1 = adj(sI - Q)/det(sI - Q)} of exp(Qt), for the
     * matrix Q this series was made from (a continuous chain's generator), reduced by trial division with the
     * known factors of {@code det(sI - Q)} and printed with the denominator monic in s before the parameters'
     * denominators are cleared.
     *
     * @param variable the transform's variable (never a parameter's name)
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    GeneratingFunction laplaceTransform(int i, int j, String variable) {
        // adj(xI - Q) = sum_k B_k x^(s-1-k), det(xI - Q) = chi(x)
        GenPolynomial<Quotient<BigRational>> num = field.univariate.getZERO();
        for (int k = 0; k < size; k++) {
            num = num.sum(series.adjugate.get(k)[i][j], ExpVector.create(1, 0, size - 1 - k));
        }
        GenPolynomial<Quotient<BigRational>> den = series.chi;
        if (num.isZERO()) {
            den = field.univariate.getONE();
        } else {
            for (int f = 0; f < series.factors.size(); f++) {
                GenPolynomial<Quotient<BigRational>> g = series.factors.get(f);
                for (int k = 0; k < series.multiplicities.get(f); k++) {
                    GenPolynomial<Quotient<BigRational>>[] qn = num.quotientRemainder(g);
                    if (!qn[1].isZERO()) {
                        break;
                    }
                    num = qn[0];
                    den = den.divide(g);
                }
            }
        }
        return printed(List.of(num, den), variable, true);
    }

    /** num/den with the parameters' denominators cleared, in ascending or descending powers of the variable. */
    private GeneratingFunction printed(List<GenPolynomial<Quotient<BigRational>>> parts, String variable,
                                       boolean descending) {
        // clear the parameters' denominators: multiply both by the lcm of all coefficient denominators
        GenPolynomial<BigRational> l = field.poly.getONE();
        for (GenPolynomial<Quotient<BigRational>> p : parts) {
            for (Quotient<BigRational> q : p.getMap().values()) {
                l = lcm(l, q.den);
            }
        }
        Fml num = polynomial(parts.get(0), l, variable, descending);
        Fml den = polynomial(parts.get(1), l, variable, descending);
        Fml whole = Fml.isOne(den) ? num : Fml.div(num, den);
        return new GeneratingFunction(variable, Fml.plain(num), Fml.plain(den), Fml.plain(whole), Fml.latex(whole));
    }

    private GenPolynomial<BigRational> lcm(GenPolynomial<BigRational> a, GenPolynomial<BigRational> b) {
        if (b.isConstant()) {
            return a;
        }
        GenPolynomial<BigRational> g = a.gcd(b);
        return a.multiply(b).divide(g);
    }

    /** sum_k coeff_k v^k with each coefficient times l (a polynomial then), ascending or descending in v. */
    private Fml polynomial(GenPolynomial<Quotient<BigRational>> p, GenPolynomial<BigRational> l, String variable,
                           boolean descending) {
        List<Fml> terms = new ArrayList<>();
        Quotient<BigRational> lq = new Quotient<>(field.field, l);
        TreeMap<Long, Quotient<BigRational>> byPower = descending ? new TreeMap<>(java.util.Comparator.reverseOrder())
            : new TreeMap<>();
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : p.getMap().entrySet()) {
            byPower.put(t.getKey().getVal(0), t.getValue().multiply(lq));
        }
        for (Map.Entry<Long, Quotient<BigRational>> t : byPower.entrySet()) {
            Fml c = field.formula(t.getValue());
            long k = t.getKey();
            Fml zk = k == 0 ? Fml.ONE : Fml.pow(Fml.name(variable), Fml.integer(k));
            terms.add(Fml.prod(c, zk));
        }
        return Fml.sum(terms);
    }

    /** r_1 .. r_d and the first n from which u(n) = sum r_k u(n - k) holds, for entry (i, j). */
    List<Quotient<BigRational>> recurrenceCoefficients(int i, int j) {
        return recurrenceCoefficients(gfParts(i, j));
    }

    private List<Quotient<BigRational>> recurrenceCoefficients(List<GenPolynomial<Quotient<BigRational>>> parts) {
        GenPolynomial<Quotient<BigRational>> den = parts.get(1);
        int d = (int) den.degree(0);
        Quotient<BigRational>[] a = Spectral.coefficients(field, den, d);
        List<Quotient<BigRational>> r = new ArrayList<>();
        for (int k = 1; k <= d; k++) {
            r.add(a[k].negate());
        }
        return r;
    }

    int recurrenceStart(int i, int j) {
        return recurrenceStart(gfParts(i, j));
    }

    private static int recurrenceStart(List<GenPolynomial<Quotient<BigRational>>> parts) {
        long dn = parts.get(0).isZERO() ? -1 : parts.get(0).degree(0);
        return (int) Math.max(parts.get(1).degree(0), dn + 1);
    }

    /**
     * The linear recurrence of entry (i, j) with its initial values.
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public Recurrence recurrence(int i, int j) {
        return recurrence(gfParts(i, j), m -> m[i][j]);
    }

    /**
     * The linear recurrence of a combination of entries with its initial values: the recurrence its reduced
     * generating function gives, which may be shorter than that of any entry in it.
     *
     * @throws IndexOutOfBoundsException if the combination names a state out of range
     */
    public Recurrence recurrence(Combination c) {
        return recurrence(gfParts(c), m -> c.apply(field, m));
    }

    private Recurrence recurrence(List<GenPolynomial<Quotient<BigRational>>> parts, ClosedForm.Cell cell) {
        List<Quotient<BigRational>> r = recurrenceCoefficients(parts);
        int start = recurrenceStart(parts);
        List<String> coeffs = new ArrayList<>();
        List<String> coeffsLatex = new ArrayList<>();
        List<String> initValuesLatex = new ArrayList<>();
        List<Fml> rhs = new ArrayList<>();
        for (int k = 0; k < r.size(); k++) {
            Fml c = field.formula(r.get(k));
            coeffs.add(Fml.plain(c));
            coeffsLatex.add(Fml.latex(c));
            Fml arg = Fml.sum(Fml.name(symbols.step()), Fml.neg(Fml.integer(k + 1)));
            rhs.add(Fml.prod(c, Fml.call(symbols.sequence(), arg)));
        }
        String u = symbols.sequence();
        List<String> init = new ArrayList<>();
        List<String> initLatex = new ArrayList<>();
        for (int k = 0; k < start; k++) {
            Fml v = field.formula(cell.apply(series.powers.get(k)));
            init.add(Fml.plain(v));
            initValuesLatex.add(Fml.latex(v));
            initLatex.add(Fml.latex(Fml.name(u)) + "(" + k + ") = " + Fml.latex(v));
        }
        Fml right = Fml.sum(rhs);
        String n = symbols.step();
        StringBuilder plain = new StringBuilder(u + "(" + n + ") = " + Fml.plain(right) + " for " + n + " >= " + start);
        for (int k = 0; k < init.size(); k++) {
            plain.append("; ").append(u).append('(').append(k).append(") = ").append(init.get(k));
        }
        String latex = Fml.latex(Fml.name(u)) + "(" + Fml.latex(Fml.name(n)) + ") = " + Fml.latex(right) + " \\quad ("
            + Fml.latex(Fml.name(n)) + " \\ge " + start + ")"
            + (initLatex.isEmpty() ? "" : ",\\; " + String.join(",\\; ", initLatex));
        return new Recurrence(r.size(), coeffs, start, init, plain.toString(), latex, coeffsLatex, initValuesLatex);
    }

}
