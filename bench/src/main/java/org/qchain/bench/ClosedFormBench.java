package org.qchain.bench;

import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.closed.ClosedForm;
import org.qchain.symbolic.closed.ClosedForms;

/**
 * Closed forms of P^n in symbolic n (issue 4): the full closed form (factorisation, projectors, formulas in plain
 * syntax, conditions, long run) of a 3-state birth-death chain with two free parameters, and of a 10-state numeric
 * chain with rational eigenvalues. Baselines in the same run: one explicit power of the same matrix (the symbolic
 * module's P^20 for the 3-state chain, the exact engine's P^64 for the 10-state one). Issue 13: dense 12- and
 * 20-state numeric chains ({@link BenchChains#dense}, fixed seeds), with {@code route} = {@code general} (the
 * Quotient route) as the in-run baseline of {@code route} = {@code integer}.
 *
 * <p>Run: {@code mvn -B -Pbench -pl bench -am package -DskipTests && java -jar bench/target/benchmarks.jar
 * ClosedFormBench}. Figures go to docs/performance.md ("Closed forms in n").
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xss8m", "-Xmx4g",
    "-Dlog4j2.loggerContextFactory=org.apache.logging.log4j.simple.SimpleLoggerContextFactory"})
@State(Scope.Thread)
public class ClosedFormBench {
    /** The system property of the closed-form package that forces the general route (its RationalRoute). */
    static final String GENERAL_ROUTE = "qchain.closed.generalRoute";

    /** Rows 1-a, a, 0 / b, 1-a-b, a / 0, b, 1-b. */
    static final String BIRTH_DEATH = String.join("\n",
        "chain discrete",
        "param a",
        "param b",
        "states Low Mid High",
        "Low Mid a",
        "Mid Low b",
        "Mid High a",
        "High Mid b",
        "");

    /**
     * 10 stages of a repair line: state k stays with probability 1/(k+2), else moves on to k+1 or straight to the
     * last state; upper triangular, so the eigenvalues are the distinct diagonal entries 1/2, 1/3, ..., 1/10 and 1.
     */
    static String tenStages() {
        StringBuilder b = new StringBuilder("chain discrete\nstates");
        for (int k = 0; k < 10; k++) {
            b.append(" S").append(k);
        }
        b.append('\n');
        for (int k = 0; k < 9; k++) {
            int d = k + 2;
            if (k == 8) {
                b.append("S8 S9 ").append(k + 1).append('/').append(d).append('\n');
            } else {
                b.append("S").append(k).append(" S").append(k + 1).append(' ').append(k + 1).append('/').append(2 * d).append('\n');
                b.append("S").append(k).append(" S9 ").append(k + 1).append('/').append(2 * d).append('\n');
            }
        }
        return b.toString();
    }

    /**
     * Which route a parameter-free chain takes: {@code integer} (the default: integer arithmetic over a common
     * denominator) or {@code general} (the Quotient route over Q(parameters), the in-run baseline).
     */
    @Param({"integer", "general"})
    public String route;

    private Model birthDeath;
    private Model dense12;
    private Model dense20;
    private Model ten;
    private RatFunMatrix birthDeathMatrix;
    private RationalMatrix tenMatrix;

    @Setup
    public void setUp() {
        if (route.equals("general")) {
            System.setProperty(GENERAL_ROUTE, "true");
        } else {
            System.clearProperty(GENERAL_ROUTE);
        }
        dense12 = ModelParser.parse("dense-12.chain", BenchChains.modelText(
            BenchChains.dense(12, BenchChains.CLOSED_12_SEED, BenchChains.CLOSED_DENOMINATORS)));
        dense20 = ModelParser.parse("dense-20.chain", BenchChains.modelText(
            BenchChains.dense(20, BenchChains.CLOSED_20_SEED, BenchChains.CLOSED_DENOMINATORS)));
        birthDeath = ModelParser.parse("birth-death.chain", BIRTH_DEATH);
        ten = ModelParser.parse("ten-stages.chain", tenStages());
        birthDeathMatrix = RatFunMatrix.fromModel(birthDeath);
        Rational[][] t = new Rational[10][10];
        for (int i = 0; i < 10; i++) {
            for (int j = 0; j < 10; j++) {
                t[i][j] = ten.entry(i, j).evaluate(name -> Rational.ZERO);
            }
        }
        tenMatrix = RationalMatrix.of(t);
    }

    private static Object all(ClosedForm cf) {
        // everything the command prints: formulas, conditions, eigenvalues and the long run
        return cf.matrix().toString() + cf.conditions() + cf.eigenvalues() + cf.longRun();
    }

    @Benchmark
    public Object birthDeathClosedForm() {
        return all(ClosedForms.of(birthDeath, Map.of()));
    }

    @Benchmark
    public Object birthDeathBaselinePower20() {
        return birthDeathMatrix.power(20);
    }

    @Benchmark
    public Object tenStatesClosedForm() {
        return all(ClosedForms.of(ten, Map.of()));
    }

    /** 12-state dense numeric chain (issue 13, row 4): eigenvalue 1 and one irreducible factor of degree 11. */
    @Benchmark
    public Object dense12ClosedForm() {
        return all(ClosedForms.of(dense12, Map.of()));
    }

    /**
     * 20-state dense numeric chain (issue 13, row 5): a factor of degree 19. The general route takes about a minute
     * an operation; run it with {@code -p route=integer} unless the baseline is wanted.
     */
    @Benchmark
    public Object dense20ClosedForm() {
        return all(ClosedForms.of(dense20, Map.of()));
    }

    @Benchmark
    public Object tenStatesBaselinePower64() {
        return MatrixPowers.power(tenMatrix, 64);
    }
}
