package org.qchain.format;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Escaping rules of the output formats, each checked against the standard that defines it. */
class FormatEscapingTest {

    @Test
    void jsonEscapesQuoteBackslashAndControlCharacters() {
        // RFC 8259, section 7: quotation mark, reverse solidus and U+0000..U+001F must be escaped
        assertEquals("\"a\\\"b\\\\c\"", Json.quote("a\"b\\c"));
        assertEquals("\"\\n\\r\\t\\b\\f\\u0001\\u001f\"", Json.quote("\n\r\t\b\f\u0001\u001f"));
    }

    @Test
    void jsonWritesNonAsciiAsUtf16Escapes() {
        // RFC 8259, section 7: any character may be escaped as \\uXXXX; outside the BMP as a surrogate pair
        assertEquals("\"\\u00e9t\\u00e9 \\ud83d\\ude80\"", Json.quote("\u00e9t\u00e9 \ud83d\ude80"));
    }

    @Test
    void jsonObjectKeepsKeyOrder() {
        assertEquals("{\"n\":3,\"from\":\"A\",\"list\":[\"x\",\"y\"],\"rows\":[[\"1\"],[]]}",
            Json.object().number("n", 3).string("from", "A").strings("list", java.util.List.of("x", "y"))
                .stringRows("rows", java.util.List.of(java.util.List.of("1"), java.util.List.of())).close());
    }

    @Test
    void csvQuotesOnlyWhereNeededAndDoublesQuotes() {
        // RFC 4180, section 2, rules 6 and 7
        assertEquals("Up", Text.csvField("Up"));
        assertEquals("\"a,b\"", Text.csvField("a,b"));
        assertEquals("\"say \"\"hi\"\"\"", Text.csvField("say \"hi\""));
        assertEquals("\"two\r\nlines\"", Text.csvField("two\r\nlines"));
    }

    @Test
    void latexEscapesTheTenSpecialCharacters() {
        // the special characters of LaTeX text mode: common practice, no source
        assertEquals("a\\_b \\& c\\% \\$ \\# \\{x\\} \\textasciitilde{} \\textasciicircum{} \\textbackslash{}",
            Text.latex("a_b & c% $ # {x} ~ ^ \\"));
    }

    @Test
    void markdownEscapesTableAndEmphasisMarkup() {
        // CommonMark backslash escapes; '|' ends a table cell (GitHub tables): common practice, no source
        assertEquals("Pump\\|A \\*B\\* \\_c\\_", Text.markdown("Pump|A *B* _c_"));
    }

    @Test
    void pathsCompressRunsOfThreeOrMore() {
        assertEquals("Up x4 > Worn > Down > Down",
            Paths.compact(java.util.List.of("Up", "Up", "Up", "Up", "Worn", "Down", "Down")));
    }

    @Test
    void fracWritesIntegersPlainAndFractionsWithTheSignOutside() {
        // LaTeX's \frac{numerator}{denominator}: common practice, no source
        assertEquals("3", Text.frac(org.qchain.exact.Rational.of(3, 1)));
        assertEquals("\\frac{1}{4}", Text.frac(org.qchain.exact.Rational.of(1, 4)));
        assertEquals("-\\frac{2}{3}", Text.frac(org.qchain.exact.Rational.of(-2, 3)));
    }
}
