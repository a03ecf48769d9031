package org.qchain.bench;

import edu.jas.arith.BigRational;
import edu.jas.poly.GenPolynomialRing;
import edu.jas.ufd.Quotient;
import edu.jas.ufd.QuotientRing;
import edu.jas.vector.GenMatrix;
import edu.jas.vector.GenMatrixRing;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.qchain.exact.Rational;
import org.qchain.symbolic.Formulas;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.Poly;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.cas.SymjaSession;

/**
 * Symbolic powers of transition matrices with parameters: qchain's representation (JAS polynomials over one common
 * denominator) against JAS {@code Quotient} matrices and against Symja's own {@code MatrixPower}, in the same run.
 *
 * <p>Run: {@code mvn -B -Pbench -pl bench -am package -DskipTests && java -jar bench/target/benchmarks.jar
 * SymbolicPowerBench}. Figures go to docs/performance.md ("Symbolic parameters").
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xss8m", "-Xmx4g",
    "-Dlog4j2.loggerContextFactory=org.apache.logging.log4j.simple.SimpleLoggerContextFactory"})
@State(Scope.Thread)
public class SymbolicPowerBench {
    private RatFunMatrix birthDeath;
    private RatFunMatrix sixState;
    private RatFunMatrix rational;
    private RatFun entry20;
    private GenMatrix<Quotient<BigRational>> rationalQuotient;
    private GenMatrix<Quotient<BigRational>> birthDeathQuotient;
    private SymjaSession cas;
    private String birthDeathSymja;
    private String sixStateSymja;
    private String entry20Symja;

    /** 3 states, 2 parameters: rows 1-a, a, 0 / b, 1-a-b, a / 0, b, 1-b. */
    static RatFunMatrix birthDeath() {
        ParamRing r = ParamRing.of(List.of("a", "b"));
        Poly a = r.variable("a");
        Poly b = r.variable("b");
        Poly one = r.one();
        Poly zero = r.zero();
        Poly[][] e = {{one.subtract(a), a, zero}, {b, one.subtract(a).subtract(b), a}, {zero, b, one.subtract(b)}};
        return fromPolys(r, e);
    }

    /**
     * 6 states, 3 parameters: up one state with a (from states 0-4), down one with b (states 1-5), back to state 0
     * with c (states 2-5); the diagonal is the remainder.
     */
    static RatFunMatrix sixState() {
        ParamRing r = ParamRing.of(List.of("a", "b", "c"));
        Poly a = r.variable("a");
        Poly b = r.variable("b");
        Poly c = r.variable("c");
        int n = 6;
        Poly[][] e = new Poly[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                e[i][j] = r.zero();
            }
        }
        for (int i = 0; i < n; i++) {
            if (i + 1 < n) {
                e[i][i + 1] = e[i][i + 1].add(a);
            }
            if (i > 0) {
                e[i][i - 1] = e[i][i - 1].add(b);
            }
            if (i >= 2) {
                e[i][0] = e[i][0].add(c);
            }
            Poly rest = r.one();
            for (int j = 0; j < n; j++) {
                if (j != i) {
                    rest = rest.subtract(e[i][j]);
                }
            }
            e[i][i] = rest;
        }
        return fromPolys(r, e);
    }

    /** 3 states with parameter denominators (from the library notes): rows /(1+a), /(1+a+b), /(2+b). */
    static RatFunMatrix rational() {
        ParamRing r = ParamRing.of(List.of("a", "b"));
        RatFun a = RatFun.of(r.variable("a"));
        RatFun b = RatFun.of(r.variable("b"));
        RatFun one = RatFun.of(r.one());
        RatFun zero = RatFun.of(r.zero());
        RatFun d1 = one.add(a);
        RatFun d2 = one.add(a).add(b);
        RatFun d3 = one.add(one).add(b);
        RatFun[][] e = {{one.divide(d1), a.divide(d1), zero}, {b.divide(d2), one.divide(d2), a.divide(d2)},
            {zero, b.divide(d3), one.add(one).divide(d3)}};
        return RatFunMatrix.of(r, e);
    }

    private static RatFunMatrix fromPolys(ParamRing r, Poly[][] e) {
        RatFun[][] f = new RatFun[e.length][e.length];
        for (int i = 0; i < e.length; i++) {
            for (int j = 0; j < e.length; j++) {
                f[i][j] = RatFun.of(e[i][j]);
            }
        }
        return RatFunMatrix.of(r, f);
    }

    static String symjaMatrix(RatFunMatrix m) {
        StringBuilder sb = new StringBuilder("{");
        for (int i = 0; i < m.size(); i++) {
            sb.append(i == 0 ? "{" : ",{");
            for (int j = 0; j < m.size(); j++) {
                sb.append(j == 0 ? "" : ",").append(m.get(i, j));
            }
            sb.append('}');
        }
        return sb.append('}').toString();
    }

    static GenMatrix<Quotient<BigRational>> quotientMatrix(RatFunMatrix m) {
        GenPolynomialRing<BigRational> pr = new GenPolynomialRing<>(BigRational.ZERO,
            m.ring().variables().toArray(new String[0]));
        QuotientRing<BigRational> qr = new QuotientRing<>(pr);
        List<List<Quotient<BigRational>>> rows = new ArrayList<>();
        for (int i = 0; i < m.size(); i++) {
            List<Quotient<BigRational>> row = new ArrayList<>();
            for (int j = 0; j < m.size(); j++) {
                RatFun f = m.get(i, j);
                row.add(new Quotient<>(qr, pr.parse(f.numerator().toString()), pr.parse(f.denominator().toString())));
            }
            rows.add(row);
        }
        return new GenMatrix<>(new GenMatrixRing<>(qr, m.size(), m.size()), rows);
    }

    static <C extends edu.jas.structure.RingElem<C>> GenMatrix<C> power(GenMatrix<C> m, int n) {
        GenMatrix<C> r = m;
        for (int k = 1; k < n; k++) {
            r = r.multiply(m);
        }
        return r;
    }

    /** Builds the inputs and checks once that every method computes the same matrix (at a rational point). */
    @Setup(Level.Trial)
    public void setUp() {
        birthDeath = birthDeath();
        sixState = sixState();
        rational = rational();
        rationalQuotient = quotientMatrix(rational);
        birthDeathQuotient = quotientMatrix(birthDeath);
        cas = SymjaSession.open();
        birthDeathSymja = "MatrixPower(" + symjaMatrix(birthDeath) + ", 20)";
        sixStateSymja = "MatrixPower(" + symjaMatrix(sixState) + ", 10)";
        RatFunMatrix p20 = birthDeath.power(20);
        entry20 = p20.get(0, 0);
        entry20Symja = entry20.toString();
        String symjaAt = cas.eval("ReplaceAll(" + birthDeathSymja + "[[1, 1]], {a -> 1/3, b -> 1/5})");
        Rational ours = entry20.evaluate(java.util.Map.of("a", Rational.of(1, 3), "b", Rational.of(1, 5)));
        if (!Rational.parse(symjaAt).equals(ours)) {
            throw new IllegalStateException("Symja and qchain differ: " + symjaAt + " vs " + ours);
        }
    }

    /** qchain: 3-state birth-death chain, two parameters, full P^20 expanded and reduced. */
    @Benchmark
    public RatFunMatrix birthDeathP20Qchain() {
        return birthDeath.power(20);
    }

    /** JAS Quotient matrix (gcd-normalised entries), 19 products. */
    @Benchmark
    public Object birthDeathP20JasQuotient() {
        return power(birthDeathQuotient, 20);
    }

    /** Baseline: Symja's own MatrixPower on the same input. */
    @Benchmark
    public String birthDeathP20Symja() {
        return cas.eval(birthDeathSymja);
    }

    /** qchain: 6-state chain, three parameters, P^10. */
    @Benchmark
    public RatFunMatrix sixStateP10Qchain() {
        return sixState.power(10);
    }

    /** Baseline: Symja's MatrixPower, 6 states, P^10. */
    @Benchmark
    public String sixStateP10Symja() {
        return cas.eval(sixStateSymja);
    }

    /** qchain: 3 states with parameter denominators, P^8 (one common denominator, reduced by its factors). */
    @Benchmark
    public RatFunMatrix rationalP8Qchain() {
        return rational.power(8);
    }

    /** JAS Quotient matrix on the same input, P^8. */
    @Benchmark
    public Object rationalP8JasQuotient() {
        return power(rationalQuotient, 8);
    }

    /** qchain's own LaTeX printer on entry (0,0) of the birth-death P^20 (211 terms). */
    @Benchmark
    public String latexQchain() {
        return Formulas.latex(entry20);
    }

    /** Symja's TeXForm on the same entry (parse + format). */
    @Benchmark
    public String latexSymja() {
        return cas.texForm(entry20Symja);
    }

    /** qchain's factored form of the same entry (JAS factorisation). */
    @Benchmark
    public String factorQchain() {
        return Formulas.plain(entry20.factor());
    }
}
