package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The names of a quadratic pair and its square root never equal a parameter's name (common practice, no source). */
class SymbolsNamesTest {
    @Test
    void usualNamesAreLAndS() {
        Symbols s = Symbols.avoiding(List.of("a", "b"));
        assertEquals("l1", s.eigenvalue(1));
        assertEquals("s", s.root());
    }

    @Test
    void parametersNamedLikeThemMoveThem() {
        Symbols s = Symbols.avoiding(List.of("l2", "s"));
        assertEquals("L1", s.eigenvalue(1));
        assertEquals("R", s.root());
        Symbols t = Symbols.avoiding(List.of("l1", "L3", "R", "s"));
        assertEquals("ev1", t.eigenvalue(1));
        assertEquals("S", t.root());
    }
}
