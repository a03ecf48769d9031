package org.qchain.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Long closed-form formulas in LaTeX are broken over lines of the align* at top-level signs only (issue 8). */
class LatexBreakTest {
    @Test
    void breaksOnlyAtTopLevelSignsAndEveryLineBalances() {
        StringBuilder tex = new StringBuilder("\\frac{a}{a + b}");
        for (int k = 0; k < 12; k++) {
            tex.append(" - \\frac{a}{a + b} \\left(1 - a - b + \\sqrt{a b}\\right)^{n - ").append(k).append('}');
        }
        String out = LatexFormatter.broken(tex.toString());
        String[] lines = out.split(" \\\\\\\\\n");
        assertTrue(lines.length > 1, out);
        for (String line : lines) {
            // braces and \left/\right pairs balance on every line (common practice, no source: TeX's grouping)
            int depth = 0;
            for (char c : line.toCharArray()) {
                depth += c == '{' ? 1 : (c == '}' ? -1 : 0);
            }
            assertEquals(0, depth, line);
            assertEquals(line.split("\\\\left", -1).length, line.split("\\\\right", -1).length, line);
        }
        // nothing but the line breaks is added
        assertEquals(tex.toString(), out.replace(" \\\\\n&\\quad ", " "));
        assertEquals("x + y", LatexFormatter.broken("x + y"));
    }
}
