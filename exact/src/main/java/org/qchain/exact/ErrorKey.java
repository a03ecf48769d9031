package org.qchain.exact;

/**
 * Message keys of the errors the exact module (and, for keys added before the key split, the other modules) reports.
 * Each key carries an English pattern with {@code {0}}, {@code {1}}, ... placeholders; tests assert the key, not the
 * text. Patterns carry no command-line wording (no option names): the command line adds its hints.
 */
public enum ErrorKey implements MessageKey {
    // --- model files -------------------------------------------------------------------------------------------
    /** A lexical or grammatical error in a model file. {0}: what was expected or found. */
    SYNTAX("{0}"),
    /** {0}: number text. */
    MALFORMED_NUMBER("malformed number ''{0}''"),
    /** {0}: state name. */
    UNKNOWN_STATE("unknown state ''{0}''"),
    /** {0}: state name. */
    DUPLICATE_STATE("state ''{0}'' is declared twice"),
    /** {0}: from, {1}: to, {2}: line of the first definition. */
    DUPLICATE_TRANSITION("duplicate transition {0} -> {1} (first given on line {2})"),
    /** {0}: parameter name. */
    UNKNOWN_PARAMETER("unknown parameter ''{0}'' (declare it with: param {0})"),
    /** {0}: parameter name. */
    DUPLICATE_PARAMETER("parameter ''{0}'' is declared twice"),
    /** {0}: parameter name, {1}: value, {2}: domain. */
    VALUE_OUTSIDE_DOMAIN("value {1} of parameter ''{0}'' is outside its domain {2}"),
    /** {0}: state, {1}: exact sum. */
    ROW_SUM("row {0} sums to {1}, not 1"),
    /** {0}: state, {1}: the negative remainder. */
    NEGATIVE_REMAINDER("row {0}: the listed transitions sum to more than 1; the remainder {0} -> {0} would be {1}"),
    /** {0}: from, {1}: to, {2}: value. */
    PROBABILITY_RANGE("probability {0} -> {1} is {2}, outside [0, 1]"),
    /** {0}: from, {1}: to, {2}: value. */
    NEGATIVE_RATE("rate {0} -> {1} is {2}, must not be negative"),
    /** No states or no data. */
    EMPTY_CHAIN("the chain has no states"),
    /** {0}: detail. */
    DIVISION_BY_ZERO("division by zero{0}"),
    /** {0}: parameter names. */
    FREE_PARAMETERS("parameters without a value: {0}"),
    /** {0}: chain kind found, {1}: what the command needs. */
    WRONG_KIND("this is a {0} chain; {1}"),
    /** {0}: row number, {1}: columns found, {2}: columns expected. */
    CSV_SHAPE("row {0} has {1} entries, expected {2}"),

    // --- sizes and limits --------------------------------------------------------------------------------------
    /** {0}: estimated digits, {1}: limit, {2}: option that raises it. */
    RESULT_TOO_LARGE("the result would have about {0} digits in total, more than the limit {1}; raise it with {2}"),
    /** {0}: what, {1}: value, {2}: reason. */
    BAD_ARGUMENT("invalid {0} ''{1}'': {2}"),

    // --- internal ----------------------------------------------------------------------------------------------
    /** {0}: detail. */
    INTERNAL("internal error: {0}"),
    /** The user interrupted the computation. */
    INTERRUPTED("interrupted"),

    // --- model files and CSV (appended) -------------------------------------------------------------------------
    /** {0}: the file name as given, {1}: the reason. */
    CANNOT_READ("cannot read {0}: {1}"),
    /** {0}: what comes without a states line before it ("this transition", "the end of the file"). */
    MISSING_STATES("no ''states'' line before {0}; declare the states first, e.g. ''states Up Down''"),
    /** {0}: the word, {1}: a hint (may be empty). */
    UNKNOWN_KEYWORD("unknown keyword ''{0}'': a line is ''chain'', ''param'', ''states'' or a transition FROM TO EXPRESSION{1}"),
    /** {0}: the unexpected text, {1}: after what, with an optional hint. */
    UNEXPECTED_TEXT("unexpected ''{0}'' after {1}"),
    /** {0}: the function name. */
    FUNCTION_NOT_SUPPORTED("functions are not supported: {0} (expressions use numbers, parameters, + - * / ^ and parentheses)"),
    /** {0}: the state. */
    SELF_RATE("a continuous chain takes no rate from {0} to itself: the diagonal is minus the total rate out of {0}; remove this line"),
    /** {0}: the word, {1}: what it would name (state, parameter). */
    RESERVED_NAME("''{0}'' is a reserved word and cannot name a {1}"),
    /** {0}: what (state, parameter), {1}: the name, {2}: the rule. */
    INVALID_NAME("invalid {0} name ''{1}'': {2}"),
    /** {0}: the keyword, {1}: line of the first such line. */
    DUPLICATE_LINE("a second ''{0}'' line (the first is on line {1})"),
    /** {0}: the domain as written, {1}: why it is invalid. */
    BAD_DOMAIN("invalid domain {0}: {1}"),
    /** {0}: rows, {1}: columns. */
    CSV_NOT_SQUARE("the matrix has {0} rows and {1} columns; a transition matrix must be square"),
    /** {0}: the power as written, {1}: estimated digits, {2}: the limit in digits. */
    POWER_TOO_LARGE("''{0}'' would have about {1} digits, more than the {2} digits a power in a model may have"),

    // --- symbolic parameters -----------------------------------------------------------------------------------
    /** {0}: n, {1}: estimated terms, {2}: degree bound, {3}: limit, {4}: option that raises it. */
    SYMBOLIC_TOO_LARGE("the symbolic P^{0} would have up to about {1} polynomial terms in total (entries of degree up to {2}),"
        + " more than the limit {3}; raise it with {4}"),
    /** {0}: entry label such as {@code Worn->Worn}, {1}: formula, {0}: the state, {1}: what the row sums to. */
    SYMBOLIC_ROW_SUM("row {0} sums to {1}, not identically 1"),
    /** {0}: entry label, {1}: formula, {2}: condition, {3}: where it fails. */
    SYMBOLIC_RANGE("{0} is {1}: needs {2}; {3}"),
    /** {0}: what, {1}: detail. */
    SWEEP("invalid sweep ''{0}'': {1}"),
    /** {0}: the power as written, {1}: its degree, {2}: the largest degree allowed. */
    SYMBOLIC_POWER_TOO_LARGE("''{0}'' would have degree {1} in the parameters, more than the {2} a power in a model may have"),
    /** {0}: n, {1}: estimated digits, {2}: limit, {3}: option that raises it. */
    SYMBOLIC_DIGITS_TOO_LARGE("the symbolic P^{0} would have up to about {1} digits in its coefficients, more than the"
        + " limit {2}; raise it with {3}"),

    // --- closed forms in n (appended) --------------------------------------------------------------------------
    /**
     * {0}: what the closed-form engine cannot do, and what is still available. No current case raises it (repeated
     * factors with Jordan blocks now have closed forms); kept because keys are never dropped.
     */
    CLOSED_FORM_UNSUPPORTED("no closed form in n: {0}"),
    /** {0}: the condition that fails, {1}: the parameter values. */
    CLOSED_FORM_CONDITION("the closed form needs {0}, which fails at {1}; compute it with these values given instead"),
    /** {0}: estimated digits processed, {1}: limit, {2}: option that raises it. */
    PATH_SEARCH_TOO_LARGE("the path search would process about {0} digits in all, more than the limit {1}; raise it with {2}, or ask for fewer steps or paths"),

    // --- reference files for verify (issue 11) -----------------------------------------------------------------
    /** {0}: values found, {1}: what was expected ("the model has 6 states"). */
    REF_VALUE_COUNT("{0} values, {1}"),
    /** {0}: rows found, {1}: what was expected. */
    REF_ROW_COUNT("{0} rows of values, {1}"),
    /** {0}: the label, {1}: the labels allowed. */
    REF_UNKNOWN_STATE("unknown state ''{0}''; expected one of {1}"),
    /** {0}: the entry, {1}: line of the first value. */
    REF_DUPLICATE("a second value for {0} (the first is on line {1})"),
    /** {0}: what is missing. */
    REF_MISSING("no value for {0}"),
    /** {0}: the text, {1}: a detail (empty, or starting with a colon). */
    REF_NOT_A_NUMBER("''{0}'' is not a number{1}; expected a decimal such as 0.25 or 1.5e-3, a hexadecimal"
        + " float such as 0x1.8p-3, inf or nan"),
    /** {0}: what was expected. */
    REF_EMPTY("the file has no values; expected {0}"),
    /** {0}: what was expected and found. */
    REF_SHAPE("{0}"),

    // --- input robustness: number sizes, nesting, declaration order, dense size (appended) ----------------------
    /** {0}: the number as written (shortened), {1}: its digits, {2}: the limit. */
    NUMBER_TOO_LONG("the number ''{0}'' has {1} digits, more than the limit of {2} digits for one number"),
    /** {0}: the limit of nested parentheses. */
    NESTING_TOO_DEEP("parentheses nested more than {0} deep"),
    /** {0}: line of the first transition. */
    PARAM_AFTER_TRANSITIONS("a ''param'' line after the transitions: declare parameters before the first transition (line {0}); move this line up"),
    /** {0}: states, {1}: entries, {2}: memory lower bound, {3}: the limit in entries, {4}: the most states it allows. */
    DENSE_TOO_LARGE("the model has {0} states: its dense matrix would have {1} entries (at least {2} of memory), more than the limit of {3} entries ({4} states)"),

    // --- verify (issue 11, appended) ----------------------------------------------------------------------------
    /** {0}: the quantity, {1}: the analysis it needs. */
    VERIFY_NOT_AVAILABLE("checking {0} needs {1}, which this version of qchain does not have yet"),

    // --- linear systems, long run and absorption (appended) ---------------------------------------------------------
    /** {0}: what is singular and why (names states or the condition). */
    SINGULAR_SYSTEM("the system is singular: {0}"),
    /** {0}: what cannot be computed, {1}: why. */
    NO_ABSORPTION("{0}: {1}"),
    /** {0}: size of the system, {1}: estimated digits, {2}: limit, {3}: option that raises it. */
    SOLVE_TOO_LARGE("the exact solve of a {0}-state system would have about {1} digits in its result, more than the"
        + " limit {2}; raise it with {3}"),

    // --- continuous-time chains and availability (issue 10) ---
    /** {0}: state. */
    UP_STATE_TWICE("state ''{0}'' is listed twice on the ''up'' line"),
    /** {0}: the figure asked for. */
    NO_UP_STATES("{0} needs the operating states: add a line ''up STATE STATE ...'' after ''states'' (the other states are down)"),
    /** {0}: what is degenerate. */
    DEGENERATE_AVAILABILITY("{0}"),

    // --- certified decimals (issue 13) -------------------------------------------------------------------------
    /** {0}: estimated multiplications, {1}: their operand size in bits, {2}: the limit, {3}: the option that raises it. */
    CERTIFIED_TOO_LARGE("the certified computation would take about {0} multiplications of {1}-bit numbers, more than the limit {2}; raise it with {3}, or ask for one row of the power"),

    // --- long run and absorption (appended) ---
    /** {0}: what cannot be computed, {1}: why. */
    NOT_APPLICABLE("{0}: {1}"),

    // --- closed forms and sweeps: guards (issue 8) -------------------------------------------------------------
    /** {0}: estimated digits of the exact values, {1}: points, {2}: the limit, {3}: how to raise it (may be empty). */
    SWEEP_TOO_LARGE("the sweep would compute about {0} digits of exact values at {1} points, more than the limit {2}{3}"),

    // --- continuous chains (appended) ---
    /**
     * {0}: estimated multiplications, {1}: bits, {2}: states, {3}: stored rates, {4}: times, {5}: the largest
     * uniformization rate times time, {6}: the limit, {7}: the option that raises it.
     */
    TRANSIENT_TOO_LARGE("P(t) would take about {0} multiplications of {1}-bit numbers ({2} states, {3} rates, {4} times,"
        + " uniformization rate times time up to {5}), more than the limit {6}; raise it with {7}, or ask for fewer"
        + " digits or times"),

    // --- row sums proved identically without the symbolic module (appended) ---
    /** {0}: the state, {1}: estimated term multiplications, {2}: estimated terms of the largest polynomial, {3}: limit. */
    ROW_SUM_CHECK_TOO_LARGE("checking that row {0} sums to 1 identically would take about {1} term multiplications"
        + " (polynomials of up to about {2} terms), more than the limit {3}; simplify the row''s expressions");

    private final String pattern;

    ErrorKey(String pattern) {
        this.pattern = pattern;
    }

    /** The English pattern with {@code {i}} placeholders; {@code ''} stands for one quote. */
    @Override
    public String pattern() {
        return pattern;
    }
}
