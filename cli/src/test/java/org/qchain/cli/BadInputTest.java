package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Every bad input that the foundation issue lists gives exit code 2, nothing on stdout and exactly one line on
 * stderr: {@code qchain: file:line:col: message}, never a stack trace. The positions follow the model format's rules
 * (docs/model-format.md: a row's sum error points at the line of its last listed transition); the message layout is
 * common practice, no source.
 */
class BadInputTest {
    private static final String BAD = Cli.MODELS + "bad/";

    private static void assertOneLineError(String expected, Cli.Result r) {
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out(), r::toString);
        assertEquals(expected + "\n", r.err(), r::toString);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        unknown-state.chain        | 4:6 | unknown state 'Dwn'
        duplicate-transition.chain | 5:1 | duplicate transition Up -> Down (first given on line 3)
        unknown-parameter.chain    | 4:16 | unknown parameter 'q' (declare it with: param q)
        malformed-number.chain     | 3:12 | malformed number '0.0.5'
        row-sum.chain              | 4:1 | row Up sums to 3/4, not 1
        negative-remainder.chain   | 4:1 | row Up: the listed transitions sum to more than 1; the remainder Up -> Up would be -1/4
        probability-range.chain    | 3:12 | probability Up -> Down is 3/2, outside [0, 1]
        no-states.chain            | 2:1 | the chain has no states
        empty.csv                  | 1:1 | the chain has no states
        ragged.csv                 | 3:1 | row 2 has 1 entries, expected 2
        """)
    void badModelIsOneLineWithItsPosition(String file, String where, String message) {
        String expected = "qchain: " + BAD + file + ":" + where + ": " + message;
        assertOneLineError(expected, Cli.run("step", BAD + file, "-n", "3"));
        // check reports the same error the same way
        assertOneLineError(expected, Cli.run("check", BAD + file));
    }

    @Test
    void fileWithoutStatesLineSaysWhatIsMissing() {
        assertOneLineError("qchain: " + BAD + "empty.chain:1:1: no 'states' line before the end of the file; declare"
            + " the states first, e.g. 'states Up Down'", Cli.run("step", BAD + "empty.chain", "-n", "1"));
    }

    @Test
    void missingModelFileIsAnInputError() {
        assertOneLineError("qchain: cannot read no-such.chain: no such file", Cli.run("step", "no-such.chain", "-n",
            "1"));
    }

    @Test
    void unknownStateInFromListsTheStates() {
        assertOneLineError("qchain: invalid --from 'Dwn': not a state of " + Cli.model("plant.chain")
            + " (states: Up, Worn, Down)", Cli.run("step", Cli.model("plant.chain"), "-n", "2", "--from", "Dwn"));
    }

    @Test
    void unknownStateInToListsTheStates() {
        assertOneLineError("qchain: invalid --to 'up': not a state of " + Cli.model("plant.chain")
            + " (states: Up, Worn, Down)",
            Cli.run("step", Cli.model("plant.chain"), "-n", "2", "--from", "Up", "--to", "up"));
    }

    @Test
    void parameterValueOutsideItsDomainNamesTheOption() {
        assertOneLineError("qchain: invalid --at 'w=2': value 2 of parameter 'w' is outside its domain (0, 1)",
            Cli.run("step", Cli.model("plant.chain"), "-n", "2", "--at", "w=2"));
    }

    @Test
    void unknownParameterInAtNamesTheOption() {
        assertOneLineError("qchain: invalid --at 'x=1/2': invalid parameter value 'x=1/2': the model has no"
            + " parameter 'x' (parameters: w)", Cli.run("step", Cli.model("plant.chain"), "-n", "2", "--at", "x=1/2"));
    }

    @Test
    void freeParametersWithoutValuesGiveFormulas() {
        // a parameter without a value takes the symbolic path (SymbolicCommandsTest has the full outputs)
        Cli.Result r = Cli.run("step", Cli.model("free.chain"), "-n", "2", "--from", "On", "--to", "Off", "--format",
            "csv");
        assertEquals(0, r.code(), r::toString);
        // P^2(On, Off) = (1 - p) p + p (1 - 1/3) = 5/3 p - p^2 (derived by hand)
        assertEquals("n,from,to,formula\r\n2,On,Off,5/3*p - p^2\r\n", r.out());
    }

    @Test
    void freeParameterWithAtValueIsComputed() {
        Cli.Result r = Cli.run("step", Cli.model("free.chain"), "-n", "1", "--at", "p=1/4", "--from", "On",
            "--to", "Off", "--format", "csv");
        assertEquals(0, r.code(), r::toString);
        // the one-step entry is p itself; the symbolic path appends the formula to the numeric columns
        assertEquals("n,from,to,value,decimal,formula\r\n1,On,Off,1/4,0.250000000000,p\r\n", r.out());
    }

    @Test
    void continuousChainIsRefusedForNow() {
        assertOneLineError("qchain: this is a continuous chain; qchain step -n needs a discrete chain; for a continuous"
            + " chain give the time: qchain step MODEL -t T", Cli.run("step", Cli.model("continuous.chain"), "-n", "2"));
    }

    @Test
    void resultOverTheDigitLimitIsRefusedWithTheEstimate() {
        Cli.Result r = Cli.run("step", Cli.model("plant.chain"), "-n", "5000", "--max-digits", "1000");
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out());
        // the estimate itself comes from the engine's SizeEstimate; here: it is in the message, over the limit
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("qchain: the result would have about (\\d+)"
            + " digits in total, more than the limit 1000; raise it with --max-digits\n").matcher(r.err());
        assertEquals(true, m.matches(), r::toString);
        assertEquals(true, Long.parseLong(m.group(1)) > 1000, r::toString);
    }

    @Test
    void raisingTheLimitLetsTheSameQueryThrough() {
        Cli.Result r = Cli.run("step", Cli.model("plant.chain"), "-n", "30", "--from", "Up", "--max-digits", "100000",
            "--format", "json");
        assertEquals(0, r.code(), r::toString);
    }

    // common practice, no source: a path search is quadratic in n, so it is estimated and refused before it starts
    @Test
    void pathSearchOverItsLimitIsRefusedWithTheEstimate() {
        Cli.Result r = Cli.run("step", Cli.model("plant.chain"), "-n", "200000", "--from", "Up", "--to", "Down",
            "--paths", "5");
        assertEquals(2, r.code(), r::toString);
        assertEquals("", r.out());
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("qchain: the path search would process about"
            + " (\\d+) digits in all, more than the limit 50000000000; raise it with --max-path-digits, or ask for"
            + " fewer steps or paths\n").matcher(r.err());
        assertEquals(true, m.matches(), r::toString);
        assertEquals(true, Long.parseLong(m.group(1)) > 50_000_000_000L, r::toString);
    }

    @Test
    void raisingThePathLimitLetsTheSameQueryThrough() {
        assertEquals(2, Cli.run("step", Cli.model("plant.chain"), "-n", "40", "--from", "Up", "--to", "Down",
            "--paths", "2", "--max-path-digits", "10").code());
        Cli.Result r = Cli.run("step", Cli.model("plant.chain"), "-n", "40", "--from", "Up", "--to", "Down",
            "--paths", "2", "--max-path-digits", "100000000", "--format", "json");
        assertEquals(0, r.code(), r::toString);
    }
}
