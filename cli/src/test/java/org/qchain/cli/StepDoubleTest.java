package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.floats.Binary64;
import org.qchain.exact.floats.FloatText;

/** {@code step --double}: the binary64 columns are the correctly rounded doubles of the exact values. */
class StepDoubleTest {

    // reference library behaviour: Double.parseDouble rounds correctly (Java SE API), so the shortest decimal must
    // read back as the correctly rounded double of the exact value (IEEE 754-2019), and the hex float (JLS §3.10.2)
    // must be exactly that double
    @Test
    void doublesAreTheCorrectlyRoundedValues() {
        Cli.Result r = Cli.run("step", Cli.model("depot.chain"), "-n", "7", "--format", "csv", "--double");
        assertEquals(0, r.code(), r::toString);
        String[] lines = r.out().split("\r\n");
        assertEquals("from,to,value,double,hex", lines[0]);
        assertTrue(lines.length > 30);
        for (int k = 1; k < lines.length; k++) {
            String[] f = lines[k].split(",");
            double d = Binary64.round(Rational.parse(f[2]));
            assertEquals(d, Double.parseDouble(f[3]), lines[k]);
            assertEquals(Binary64.exact(d), FloatText.parseHex(f[4]), lines[k]);
            assertEquals(FloatText.shortest(d), f[3]);
        }
    }

    @Test
    void doublesNeedCsvOrJsonAndNumbers() {
        Cli.Result text = Cli.run("step", Cli.model("plant.chain"), "-n", "2", "--double");
        assertEquals(2, text.code());
        assertTrue(text.err().startsWith("qchain: --double needs --format csv or --format json"), text.err());
        Cli.Result sym = Cli.run("step", Cli.model("free.chain"), "-n", "2", "--format", "json", "--double");
        assertEquals(2, sym.code());
        assertTrue(sym.err().startsWith("qchain: --double needs numeric values for every parameter"), sym.err());
    }
}
