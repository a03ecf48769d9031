package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** {@code classes}: parameter values that change the structure, for factors in several parameters too. */
class SpecialValuesTest {
    // common practice, no source: an entry (p - r)^2 vanishes exactly on the line p = r, which crosses the inside of
    // [0, 1/4]^2; there B can no longer return to A, so {A, B} splits into two transient classes. The entry
    // p*r + 1/10 is positive on the whole box and changes nothing.
    @Test
    void aFactorInTwoParametersIsListedWithItsEffect() {
        Cli.Result r = Cli.run("classes", Cli.model("ward-curve.chain"), "--symbolic", "--format", "json");
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("\"special_values\":[{\"condition\":\"p = 0\",\"effect\":\"A can no longer leave;"
            + " classes become {A} closed, {B}, {C} closed\"},{\"condition\":\"p - r = 0\",\"effect\":\"classes become"
            + " {A}, {B}, {C} closed\"}]"), r.out());
    }

    // common practice, no source: p^2 + r + 1/10 is positive on [0, 1/4]^2, so it is not a special value; r = 0
    // (a factor of p*r) is one
    @Test
    void aFactorThatNeverVanishesIsNotListed() throws java.io.IOException {
        java.nio.file.Path f = java.nio.file.Files.createTempFile("curve", ".chain");
        java.nio.file.Files.writeString(f, "chain discrete\nparam p in [0, 1/4] = 1/10\nparam r in [0, 1/4] = 1/5\n"
            + "states A B C\nA A 1 - p\nA B p\nB A p*p + r + 1/10\nB B 9/10 - p*p - r - p*r\nB C p*r\nC C 1\n");
        Cli.Result r = Cli.run("classes", f.toString(), "--symbolic", "--format", "json");
        java.nio.file.Files.delete(f);
        assertEquals(0, r.code(), r::toString);
        assertTrue(r.out().contains("\"special_values\":[{\"condition\":\"p = 0\",\"effect\":\"A can no longer leave;"
            + " classes become {A} closed, {B}, {C} closed\"},{\"condition\":\"r = 0\",\"effect\":\"classes become"
            + " {A, B} closed, {C} closed\"}]"), r.out());
    }
}
