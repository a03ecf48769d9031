package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * {@code step --certified}: the certified decimals equal the exact run's correctly rounded decimals (the reference:
 * the exact module's fractions, rounded by Decimals, itself checked against Java SE BigDecimal), and the options
 * combine as documented.
 */
class CertifiedStepTest {
    private static final String MODEL = Cli.model("plant.chain");

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
    }

    @Test
    void noDigitLimitAppliesToCertifiedDecimals() {
        Cli.Result r = Cli.run("step", MODEL, "-n", "5000000", "--from", "Up", "--to", "Down", "--certified",
            "--max-digits", "1000");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("  certified  0."), r.out());
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
