package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/** {@code reward STATE VALUE} lines (common practice, no source: the model format's own rule). */
class RewardLineTest {
    private static final String HEAD = "chain discrete\nstates Up Down\nUp Down 1/10\nDown Up 1/2\n";

    @Test
    void rewardLinesAreRead() {
        Model m = ModelParser.parse("m.chain", HEAD + "reward Up 12.5\nreward Down -3/4\n");
        assertEquals(Map.of("Up", Rational.of(25, 2), "Down", Rational.of(-3, 4)), m.rewards());
        assertEquals(Map.of(), ModelParser.parse("m.chain", HEAD).rewards());
    }

    @Test
    void badRewardLinesAreLocated() {
        QchainException e = assertThrows(QchainException.class,
            () -> ModelParser.parse("m.chain", HEAD + "reward Sideways 1\n"));
        assertEquals(ErrorKey.UNKNOWN_STATE, e.key());
        assertEquals("m.chain:5:8: unknown state 'Sideways'", e.getMessage());
        QchainException e2 = assertThrows(QchainException.class,
            () -> ModelParser.parse("m.chain", HEAD + "reward Up lots\n"));
        assertEquals("m.chain:5:11: malformed number 'lots'", e2.getMessage());
    }
}
