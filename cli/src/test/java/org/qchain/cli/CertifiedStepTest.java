package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * {@code step --certified}: the certified decimals equal the exact run's correctly rounded decimals (the exact
 * module's fractions, rounded by Decimals, itself checked against Java SE BigDecimal), and, at large n, the decimals
 * of the stationary law worked out by hand and rounded by Java SE BigDecimal; the options combine as documented
 * (messages: docs/commands.md, our own interface, no outside source).
 */
class CertifiedStepTest {
    private static final String MODEL = Cli.model("plant.chain");

    /**
     * plant.chain's stationary law, by hand from pi P = pi (common practice, no source): pi_Worn (1/4 + 3/100) =
     * pi_Up / 20 and pi_Down / 2 = 3/100 pi_Worn give pi = (280, 50, 3)/333 over (Up, Worn, Down).
     */
    private static final long[] PI_NUMERATORS = {280, 50, 3};
    private static final long PI_DENOMINATOR = 333;

    /** pi_j to {@code digits} significant digits, rounded by Java SE BigDecimal (the reference rounding). */
    private static String piDecimal(int j, int digits) {
        return java.math.BigDecimal.valueOf(PI_NUMERATORS[j]).divide(java.math.BigDecimal.valueOf(PI_DENOMINATOR),
            new java.math.MathContext(digits, java.math.RoundingMode.HALF_EVEN)).toPlainString();
    }

    /** The JSON array named {@code key} in {@code json} (flat arrays of strings only). */
    private static String array(String json, String key) {
        Matcher m = Pattern.compile("\"" + key + "\":(\\[[^\\]]*\\])").matcher(json);
        assertTrue(m.find(), key + " in " + json);
        return m.group(1);
    }

    @Test
    void certifiedRowEqualsTheExactRowsDecimals() {
        for (String n : new String[] {"1", "7", "60", "400"}) {
            Cli.Result exact = Cli.run("step", MODEL, "-n", n, "--from", "Up", "--format", "json", "--digits", "15");
            Cli.Result cert = Cli.run("step", MODEL, "-n", n, "--from", "Up", "--format", "json", "--digits", "15",
                "--certified");
            assertEquals(0, cert.code(), cert::toString);
            assertEquals(array(exact.out(), "decimals"), array(cert.out(), "decimals"), "n = " + n);
            assertTrue(cert.out().contains("\"certified\":true"));
        }
        // P^n -> the matrix of rows pi, off by O(|l|^n) for l the largest other eigenvalue (common practice, no
        // source); by hand the other two sum to trace - 1 = 1.17 and multiply to det P = 0.3365, so |l| ~ 0.66 and
        // at n = 400 the gap is ~1e-72, far below the 15th digit
        Cli.Result cert = Cli.run("step", MODEL, "-n", "400", "--from", "Up", "--format", "json", "--digits", "15",
            "--certified");
        assertEquals("[\"" + piDecimal(0, 15) + "\",\"" + piDecimal(1, 15) + "\",\"" + piDecimal(2, 15) + "\"]",
            array(cert.out(), "decimals"));
    }

    @Test
    void noDigitLimitAppliesToCertifiedDecimals() {
        Cli.Result r = Cli.run("step", MODEL, "-n", "5000000", "--from", "Up", "--to", "Down", "--certified",
            "--max-digits", "1000");
        assertEquals(0, r.code(), r::toString);
        // P^5000000(Up, Down) = pi_Down = 1/111 to far more than 12 digits (as above)
        assertTrue(r.out().contains("  certified  " + piDecimal(2, 12)), r.out());
        assertEquals("", r.err());
    }

    @Test
    void pathsAndSymbolicDoNotCombineWithCertified() {
        Cli.Result p = Cli.run("step", MODEL, "-n", "3", "--from", "Up", "--to", "Down", "--paths", "2",
            "--certified");
        assertEquals(2, p.code(), p::toString);
        assertTrue(p.err().startsWith("qchain: --paths lists exact path probabilities; it does not combine with"
            + " --certified\n"), p.err());
        Cli.Result s = Cli.run("step", MODEL, "-n", "3", "--symbolic", "--certified");
        assertEquals(2, s.code(), s::toString);
        assertTrue(s.err().startsWith("qchain: --certified gives decimals of numbers; it does not combine with"
            + " --symbolic\n"), s.err());
    }

    @Test
    void workOverTheLimitIsRefusedWithTheEstimate() {
        Cli.Result r = Cli.run("step", MODEL, "-n", "100000", "--certified", "--max-work", "10");
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out());
        assertTrue(Pattern.compile("qchain: the certified computation would take about [0-9.]+e[0-9]+"
            + " multiplications of [0-9]+-bit numbers, more than the limit 10; raise it with --max-work, or ask for"
            + " one row of the power\n").matcher(r.err()).matches(), r.err());
    }
}
