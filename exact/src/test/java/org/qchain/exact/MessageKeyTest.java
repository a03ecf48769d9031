package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The exact module's message keys: filled patterns, and no command-line wording (a rule of this project). Expected
 * text: our own messages (the key table in docs/model-format.md), no outside source; the pattern syntax ({0}, and
 * '' for one quote) is that of java.text.MessageFormat (Java SE API docs).
 */
class MessageKeyTest {
    private static final Pattern OPTION = Pattern.compile("--[a-z]");

    @Test
    void exactKeysNameNoCommandLineOption() {
        // options belong to the front end, which adds them as hints; a key names them only through an argument
        for (ErrorKey k : ErrorKey.values()) {
            assertFalse(OPTION.matcher(k.pattern()).find(), k.name() + ": " + k.pattern());
        }
    }

    @Test
    void patternsAreFilledInOrderWithQuotesUndoubled() {
        assertEquals("invalid state 'X': no such state", ErrorKey.BAD_ARGUMENT.format("state", "X", "no such state"));
        MessageKey k = ErrorKey.FREE_PARAMETERS;
        assertEquals("parameters without a value: p, r", k.format("p, r"));
        assertEquals("x:1:2: parameters without a value: p",
            new QchainException(new SourcePos("x", 1, 2), k, "p").getMessage());
    }
}
