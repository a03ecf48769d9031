package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.qchain.exact.model.ModelErrorsTest.assertMessage;
import static org.qchain.exact.model.ModelErrorsTest.parseError;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;

/** The optional {@code up STATE ...} line (docs/model-format.md, the project's own format; common practice, no source). */
class UpLineTest {
    private static final String HEAD = "chain continuous\nparam lam = 1/1000\nparam mu = 1/8\nstates Up Degraded Down\n";

    @Test
    void upLineMarksTheOperatingStatesInTheOrderListed() {
        Model m = ModelParser.parse("m.chain", HEAD + "up Degraded Up\nUp Degraded lam\nDegraded Down lam\nDown Up mu\n");
        assertEquals(List.of(1, 0), m.upStates().orElseThrow());
    }

    @Test
    void withoutAnUpLineNoStatesAreMarked() {
        Model m = ModelParser.parse("m.chain", HEAD + "Up Down lam\nDown Up mu\n");
        assertTrue(m.upStates().isEmpty());
    }

    @Test
    void upLineAfterATransitionIsAnErrorNamingTheTransition() {
        assertMessage("m.chain:6:1: the 'up' line must come before the transitions (line 5 is a transition)",
            parseError(ErrorKey.SYNTAX, 6, 1, HEAD + "Up Down lam\nup Up\n"));
    }

    @Test
    void upLineBeforeTheStatesIsAnError() {
        parseError(ErrorKey.MISSING_STATES, 2, 1, "chain continuous\nup Up\nstates Up Down\n");
    }

    @Test
    void unknownAndRepeatedUpStatesAreReportedAtTheirColumn() {
        parseError(ErrorKey.UNKNOWN_STATE, 5, 7, HEAD + "up Up Dwn\n");
        assertMessage("m.chain:5:7: state 'Up' is listed twice on the 'up' line",
            parseError(ErrorKey.UP_STATE_TWICE, 5, 7, HEAD + "up Up Up\n"));
    }

    @Test
    void emptyAndSecondUpLinesAreErrors() {
        parseError(ErrorKey.SYNTAX, 5, 3, HEAD + "up\n");
        parseError(ErrorKey.DUPLICATE_LINE, 6, 1, HEAD + "up Up\nup Degraded\n");
    }

    @Test
    void aStateNamedUpKeepsItsTransitions() {
        Model m = ModelParser.parse("m.chain", "states up down\nup down 1/2\n");
        assertTrue(m.upStates().isEmpty());
        assertEquals(1, m.transitions().size());
    }
}
