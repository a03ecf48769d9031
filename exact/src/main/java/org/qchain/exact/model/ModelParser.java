package org.qchain.exact.model;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.InputLimits;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;
import org.qchain.exact.model.Lexer.Kind;
import org.qchain.exact.model.Lexer.Token;

/**
 * Reads model files, CSV matrices and single expressions. The format is described in {@code docs/model-format.md}.
 *
 * <p>Parsing checks the text, the names and the structure (unknown or duplicate states, parameters and
 * transitions, domains and nominal values) but never evaluates a transition: numeric validation (rows summing to 1,
 * probabilities in [0, 1], non-negative rates, division by zero) happens in {@link Chains#transitionMatrix} with
 * the parameter values, so a model with free parameters parses. A CSV matrix has no parameters and is validated
 * while it is read.
 *
 * <p>Every error is a {@link QchainException} whose message starts with {@code file:line:column:}.
 */
public final class ModelParser {
    /** Words that cannot name a state or a parameter. */
    static final Set<String> RESERVED = Set.of("chain", "param", "states", "in", "inf");

    private ModelParser() {
    }

    /**
     * Reads a model file (UTF-8). A name ending in {@code .csv} (any case) is read as a CSV matrix, anything else
     * as the model format.
     *
     * @param file the file; {@code file.toString()} names it in messages
     * @return the model
     * @throws QchainException CANNOT_READ if the file cannot be read or is not UTF-8, or any parse error
     */
    public static Model parseFile(Path file) {
        return parseFile(file, InputLimits.DEFAULT);
    }

    /**
     * As {@link #parseFile(Path)}, with the given input limits (kept by the model for its dense-size check).
     *
     * @param file   the file; {@code file.toString()} names it in messages
     * @param limits the digit limit of one number and the dense-size limit
     * @return the model
     * @throws QchainException as {@link #parseFile(Path)}
     */
    public static Model parseFile(Path file, InputLimits limits) {
        String name = file.toString();
        String text = read(file, name);
        Path fn = file.getFileName();
        boolean csv = fn != null && fn.toString().toLowerCase(Locale.ROOT).endsWith(".csv");
        return csv ? parseCsv(name, text, limits) : parse(name, text, limits);
    }

    private static String read(Path file, String name) {
        byte[] bytes;
        try {
            if (Files.isDirectory(file)) {
                throw new QchainException(ErrorKey.CANNOT_READ, name, "it is a directory");
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new QchainException(ErrorKey.CANNOT_READ, name, "no such file");
        } catch (AccessDeniedException e) {
            throw new QchainException(ErrorKey.CANNOT_READ, name, "permission denied");
        } catch (IOException e) {
            throw new QchainException(ErrorKey.CANNOT_READ, name, String.valueOf(e.getMessage()));
        } catch (OutOfMemoryError e) {
            throw new QchainException(ErrorKey.CANNOT_READ, name, "the file is too large to read");
        }
        try {
            return StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT)
                .decode(ByteBuffer.wrap(bytes))
                .toString();
        } catch (CharacterCodingException e) {
            throw new QchainException(ErrorKey.CANNOT_READ, name, "it is not UTF-8 text");
        }
    }

    /**
     * Parses the model format.
     *
     * @param sourceName the name used in messages
     * @param text       the whole file
     * @return the model, not yet evaluated
     * @throws QchainException for any error in the text, at its line and column
     */
    public static Model parse(String sourceName, String text) {
        return parse(sourceName, text, InputLimits.DEFAULT);
    }

    /**
     * Parses the model format with the given input limits. Time and memory are linear in the text: nothing is
     * sized by the square of the states (the dense matrix is checked against {@code limits} only when one is
     * built, see {@link Chains#requireDense}).
     *
     * @param sourceName the name used in messages
     * @param text       the whole file
     * @param limits     the digit limit of one number and the dense-size limit
     * @return the model, not yet evaluated
     * @throws QchainException for any error in the text, at its line and column
     */
    public static Model parse(String sourceName, String text, InputLimits limits) {
        return new LineParser(sourceName, splitLines(text), limits).run();
    }

    /**
     * Parses a plain CSV matrix (RFC 4180 quoting; CRLF or LF line endings; a UTF-8 byte order mark is skipped).
     * The first row is a header of state names if any of its fields is quoted or none is a number; without a header
     * the states are {@code S1 ... Sn}. A header whose first field is empty announces a label column: every row then
     * starts with its state's name. Entries are integers, fractions {@code p/q} or decimals, read exactly. The chain
     * is discrete and is validated (square, rows sum to exactly 1, entries in [0, 1]).
     *
     * @param sourceName the name used in messages
     * @param text       the whole file
     * @return the model
     * @throws QchainException for any error, at its line and column
     */
    public static Model parseCsv(String sourceName, String text) {
        return parseCsv(sourceName, text, InputLimits.DEFAULT);
    }

    /**
     * As {@link #parseCsv(String, String)}, with the given input limits; a header (or first row) wider than the
     * dense-size limit allows is refused before the rows are read.
     *
     * @param sourceName the name used in messages
     * @param text       the whole file
     * @param limits     the digit limit of one number and the dense-size limit
     * @return the model
     * @throws QchainException for any error, at its line and column; DENSE_TOO_LARGE
     */
    public static Model parseCsv(String sourceName, String text, InputLimits limits) {
        Model m = CsvReader.read(sourceName, stripBom(text), limits);
        Chains.transitionMatrix(m, Map.of());
        return m;
    }

    /**
     * Parses one expression in the model format's grammar (numbers, parameter names, {@code + - * / ^},
     * parentheses). Names are not checked against any declaration.
     *
     * @param sourceName the name used in messages (the text is line 1)
     * @param text       the expression, on one line
     * @return the tree
     * @throws QchainException for a syntax error, at its column
     */
    public static Expr parseExpression(String sourceName, String text) {
        return parseExpression(sourceName, text, InputLimits.DEFAULT);
    }

    /**
     * As {@link #parseExpression(String, String)}, with the given digit limit of one number.
     *
     * @param sourceName the name used in messages (the text is line 1)
     * @param text       the expression, on one line
     * @param limits     the input limits
     * @return the tree
     * @throws QchainException for a syntax error, at its column
     */
    public static Expr parseExpression(String sourceName, String text, InputLimits limits) {
        Columns cols = Columns.of(text);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                throw new QchainException(new SourcePos(sourceName, 1, cols.column(i)), ErrorKey.SYNTAX,
                    "an expression must be on one line");
            }
        }
        return new ExprParser(Lexer.tokens(sourceName, 1, text, cols, 0, text.length(), limits.maxNumberDigits()), 0)
            .parseAll();
    }

    /** The form {@code NAME=START:STEP:END}, which reads as {@code NAME in [START, END] by STEP}. */
    private static final java.util.regex.Pattern OLD_SWEEP =
        java.util.regex.Pattern.compile("\\s*(\\w+)\\s*=([^:]+):([^:]+):([^:]+)");

    /**
     * Reads a sweep in the model file's interval syntax: {@code NAME in INTERVAL by STEP} or
     * {@code NAME in INTERVAL with COUNT points}, e.g. {@code p in [0, 1/10] by 1/100}; the ends and the step are
     * constants as in a {@code param} line. The name is not checked against a model.
     *
     * @param sourceName the name used in messages (the text is line 1)
     * @param text       the sweep
     * @return the points, counted but not listed (the caller checks the count against its limit first)
     * @throws QchainException SYNTAX, BAD_DOMAIN or MALFORMED_NUMBER at the column at fault; SWEEP for a step that
     *                         is not positive, an infinite upper end, or no point in the interval
     */
    public static SweepSpec parseSweep(String sourceName, String text) {
        java.util.regex.Matcher old = OLD_SWEEP.matcher(text);
        if (old.matches()) {
            throw new QchainException(ErrorKey.SWEEP, text.strip(), "write it as '"
                + old.group(1) + " in [" + old.group(2).strip() + ", " + old.group(4).strip() + "] by "
                + old.group(3).strip() + "'");
        }
        Columns cols = Columns.of(text);
        List<Token> toks = Lexer.tokens(sourceName, 1, text, cols, 0, text.length(),
            InputLimits.DEFAULT_MAX_NUMBER_DIGITS);
        ExprParser p = new ExprParser(toks, 0);
        String example = " (a sweep is NAME in [LOW, HIGH] by STEP, or NAME in [LOW, HIGH] with COUNT points)";
        Token name = p.next();
        if (name.kind() != Kind.NAME || RESERVED.contains(name.text())) {
            throw new QchainException(name.pos(), ErrorKey.SYNTAX, "expected a parameter name, found "
                + name.describe() + example);
        }
        Token in = p.next();
        if (in.kind() != Kind.NAME || !in.text().equals("in")) {
            throw new QchainException(in.pos(), ErrorKey.SYNTAX, "expected 'in' after the parameter name, found "
                + in.describe() + example);
        }
        Domain d = LineParser.domain(p, text);
        if (d.upper().isEmpty()) {
            throw new QchainException(in.pos(), ErrorKey.SWEEP, text.strip(), "a sweep needs a finite upper end");
        }
        Token form = p.next();
        String word = form.kind() == Kind.NAME ? form.text() : "";
        if (word.equals("by")) {
            if (p.peek().kind() == Kind.END) {
                throw new QchainException(p.peek().pos(), ErrorKey.SYNTAX, "missing the step after 'by'");
            }
            Rational step = ExprParser.constant(p.parseExpr(), "a step");
            p.expectEnd("the step");
            return SweepSpec.byStep(text.strip(), name.text(), d, step);
        }
        if (word.equals("with")) {
            Token k = p.next();
            if (!k.isIntegerLiteral()) {
                throw new QchainException(k.pos(), ErrorKey.SYNTAX, "expected a whole number of points after 'with',"
                    + " found " + k.describe());
            }
            Token points = p.next();
            if (points.kind() != Kind.NAME || !(points.text().equals("points") || points.text().equals("point"))) {
                throw new QchainException(points.pos(), ErrorKey.SYNTAX, "expected 'points' after the count, found "
                    + points.describe());
            }
            p.expectEnd("'points'");
            BigInteger count = k.value().numerator();
            return SweepSpec.withPoints(text.strip(), name.text(), d,
                count.bitLength() > 62 ? Long.MAX_VALUE : count.longValueExact());
        }
        throw new QchainException(form.pos(), ErrorKey.SYNTAX, "expected 'by STEP' or 'with COUNT points' after the"
            + " interval, found " + form.describe());
    }

    /** The parameter-name nodes of a tree, left to right. */
    static List<Expr.Var> varNodes(Expr e) {
        return Folding.varNodes(e);
    }

    static String stripBom(String text) {
        return !text.isEmpty() && text.charAt(0) == '\uFEFF' ? text.substring(1) : text;
    }

    /** Lines without their terminators (CRLF, LF or CR); a final terminator does not start another line. */
    static List<String> splitLines(String text) {
        String t = stripBom(text);
        List<String> lines = new ArrayList<>();
        int start = 0;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c == '\n' || c == '\r') {
                lines.add(t.substring(start, i));
                if (c == '\r' && i + 1 < t.length() && t.charAt(i + 1) == '\n') {
                    i++;
                }
                start = i + 1;
            }
        }
        if (start < t.length()) {
            lines.add(t.substring(start));
        }
        return lines;
    }

    /** Whether a state name is well formed: letters, digits, '_', '-', '.', starting with a letter, digit or '_'. */
    static boolean isStateName(String s) {
        if (s.isEmpty() || !Lexer.isNamePart(s.charAt(0))) {
            return false;
        }
        for (int i = 1; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!Lexer.isNamePart(c) && c != '-' && c != '.') {
                return false;
            }
        }
        return true;
    }

    /** Whether a parameter name is well formed: a letter or '_', then letters, digits or '_'. */
    static boolean isParamName(String s) {
        if (s.isEmpty() || !Lexer.isNameStart(s.charAt(0))) {
            return false;
        }
        return s.chars().allMatch(c -> Lexer.isNamePart((char) c));
    }

    static final String STATE_NAME_RULE =
        "a state name uses letters, digits, '_', '-' and '.', and starts with a letter, a digit or '_'";
    static final String PARAM_NAME_RULE =
        "a parameter name starts with a letter or '_' and continues with letters, digits or '_'";

    /** A whitespace-delimited word: {@code start} and {@code end} are 0-based indexes into the line. */
    private record Word(String text, int start, int end) {
    }

    private static List<Word> words(String line) {
        List<Word> out = new ArrayList<>();
        int i = 0;
        int n = line.length();
        while (i < n) {
            while (i < n && Character.isWhitespace(line.charAt(i))) {
                i++;
            }
            int s = i;
            while (i < n && !Character.isWhitespace(line.charAt(i))) {
                i++;
            }
            if (i > s) {
                out.add(new Word(line.substring(s, i), s, i));
            }
        }
        return out;
    }

    /** One pass over the lines of a model file; everything must be declared before it is used. */
    private static final class LineParser {
        private final String file;
        private final List<String> lines;
        private final InputLimits limits;
        private Columns cols;
        private ChainKind kind;
        private int chainLine;
        private int firstDeclLine;
        private final Map<String, ParamDecl> params = new LinkedHashMap<>();
        private List<String> states;
        private final Map<String, Integer> stateIndex = new HashMap<>();
        private int statesLine;
        private List<Integer> up;
        private int upLine;
        private final List<Transition> transitions = new ArrayList<>();
        private final Map<Long, Transition> seen = new HashMap<>();

        LineParser(String file, List<String> lines, InputLimits limits) {
            this.file = file;
            this.lines = lines;
            this.limits = limits;
        }

        /** The position of the char at {@code index} on line {@code line}, the one being read. */
        private SourcePos pos(int line, int index) {
            return new SourcePos(file, line, cols.column(index));
        }

        private List<Token> tokens(int ln, String line, int start) {
            return Lexer.tokens(file, ln, line, cols, start, line.length(), limits.maxNumberDigits());
        }

        private ChainKind kind() {
            return kind == null ? ChainKind.DISCRETE : kind;
        }

        Model run() {
            for (int k = 0; k < lines.size(); k++) {
                String raw = lines.get(k);
                int hash = raw.indexOf('#');
                String line = hash >= 0 ? raw.substring(0, hash) : raw;
                List<Word> w = words(line);
                if (w.isEmpty()) {
                    continue;
                }
                int ln = k + 1;
                cols = Columns.of(line);
                switch (w.get(0).text()) {
                    case "chain":
                        chainLine(ln, line, w);
                        break;
                    case "param":
                        if (!transitions.isEmpty()) {
                            throw new QchainException(pos(ln, w.get(0).start()), ErrorKey.PARAM_AFTER_TRANSITIONS,
                                transitions.get(0).pos().line());
                        }
                        markDeclaration(ln);
                        paramLine(ln, line, w.get(0));
                        break;
                    case "states":
                        markDeclaration(ln);
                        statesLine(ln, line, w);
                        break;
                    case "up":
                        if (stateIndex.containsKey("up")) {
                            otherLine(ln, line, w); // a state named "up": its transitions keep their meaning
                            break;
                        }
                        markDeclaration(ln);
                        upLine(ln, line, w);
                        break;
                    default:
                        markDeclaration(ln);
                        otherLine(ln, line, w);
                }
            }
            if (states == null) {
                throw new QchainException(new SourcePos(file, 1, 1), ErrorKey.MISSING_STATES, "the end of the file");
            }
            Model m = Model.of(file, kind(), List.copyOf(params.values()), states, transitions, limits);
            return up == null ? m : m.withUpStates(up);
        }

        /** {@code up STATE STATE ...}: the operating states, after {@code states} and before the transitions. */
        private void upLine(int ln, String line, List<Word> w) {
            SourcePos at = pos(ln, w.get(0).start());
            if (states == null) {
                throw new QchainException(at, ErrorKey.MISSING_STATES, "the 'up' line");
            }
            if (upLine != 0) {
                throw new QchainException(at, ErrorKey.DUPLICATE_LINE, "up", upLine);
            }
            if (!transitions.isEmpty()) {
                throw new QchainException(at, ErrorKey.SYNTAX,
                    "the 'up' line must come before the transitions (line " + transitions.get(0).pos().line()
                        + " is a transition)");
            }
            if (w.size() == 1) {
                throw new QchainException(pos(ln, line.length()), ErrorKey.SYNTAX,
                    "missing the operating states after 'up', e.g. 'up " + states.get(0) + "'");
            }
            List<Integer> idx = new ArrayList<>();
            for (Word s : w.subList(1, w.size())) {
                Integer i = stateIndex.get(s.text());
                if (i == null) {
                    throw new QchainException(pos(ln, s.start()), ErrorKey.UNKNOWN_STATE, s.text());
                }
                if (idx.contains(i)) {
                    throw new QchainException(pos(ln, s.start()), ErrorKey.UP_STATE_TWICE, s.text());
                }
                idx.add(i);
            }
            up = idx;
            upLine = ln;
        }

        private void markDeclaration(int ln) {
            if (firstDeclLine == 0) {
                firstDeclLine = ln;
            }
        }

        private void chainLine(int ln, String line, List<Word> w) {
            if (chainLine != 0) {
                throw new QchainException(pos(ln, w.get(0).start()), ErrorKey.DUPLICATE_LINE, "chain", chainLine);
            }
            if (firstDeclLine != 0) {
                throw new QchainException(pos(ln, w.get(0).start()), ErrorKey.SYNTAX,
                    "the 'chain' line must come before the parameters, states and transitions (line "
                        + firstDeclLine + " comes first)");
            }
            if (w.size() < 2) {
                throw new QchainException(pos(ln, line.length()), ErrorKey.SYNTAX,
                    "missing the kind after 'chain': discrete or continuous");
            }
            Word k = w.get(1);
            if (k.text().equals("discrete")) {
                kind = ChainKind.DISCRETE;
            } else if (k.text().equals("continuous")) {
                kind = ChainKind.CONTINUOUS;
            } else {
                throw new QchainException(pos(ln, k.start()), ErrorKey.SYNTAX,
                    "unknown chain kind '" + k.text() + "': expected discrete or continuous");
            }
            if (w.size() > 2) {
                throw new QchainException(pos(ln, w.get(2).start()), ErrorKey.UNEXPECTED_TEXT, w.get(2).text(),
                    "the chain kind");
            }
            chainLine = ln;
        }

        private void paramLine(int ln, String line, Word keyword) {
            int s = keyword.end();
            while (s < line.length() && Character.isWhitespace(line.charAt(s))) {
                s++;
            }
            int e = s;
            while (e < line.length() && !Character.isWhitespace(line.charAt(e)) && "=([,".indexOf(line.charAt(e)) < 0) {
                e++;
            }
            String name = line.substring(s, e);
            SourcePos namePos = pos(ln, s);
            if (name.isEmpty()) {
                throw new QchainException(namePos, ErrorKey.SYNTAX, "missing the parameter name after 'param'");
            }
            if (RESERVED.contains(name)) {
                throw new QchainException(namePos, ErrorKey.RESERVED_NAME, name, "parameter");
            }
            if (!isParamName(name)) {
                throw new QchainException(namePos, ErrorKey.INVALID_NAME, "parameter", name, PARAM_NAME_RULE);
            }
            if (params.containsKey(name)) {
                throw new QchainException(namePos, ErrorKey.DUPLICATE_PARAMETER, name);
            }
            List<Token> toks = tokens(ln, line, e);
            ExprParser p = new ExprParser(toks, 0);
            Domain domain = Domain.defaultFor(kind());
            Token t = p.peek();
            if (t.kind() == Kind.NAME && t.text().equals("in")) {
                p.next();
                domain = domain(p, line);
                t = p.peek();
            }
            Optional<Rational> nominal = Optional.empty();
            if (t.is("=")) {
                p.next();
                Token first = p.peek();
                if (first.kind() == Kind.END) {
                    throw new QchainException(first.pos(), ErrorKey.SYNTAX, "missing the value after '='");
                }
                Rational v = ExprParser.constant(p.parseExpr(), "a nominal value");
                if (!domain.contains(v)) {
                    // name the value as written (0.6 rather than 3/5)
                    String written = line.substring(first.index(), p.peek().index()).strip();
                    throw new QchainException(first.pos(), ErrorKey.VALUE_OUTSIDE_DOMAIN, name, written, domain);
                }
                nominal = Optional.of(v);
                p.expectEnd("the nominal value");
            } else if (t.kind() != Kind.END) {
                throw new QchainException(t.pos(), ErrorKey.UNEXPECTED_TEXT, t.text(),
                    (p.position() == 0 ? "the parameter name" : "the domain")
                        + " (a parameter line is: param NAME [in (LOW, HIGH)] [= VALUE])");
            }
            params.put(name, new ParamDecl(name, domain, nominal, namePos));
        }

        static Domain domain(ExprParser p, String line) {
            Token open = p.next();
            if (!open.is("(") && !open.is("[")) {
                throw new QchainException(open.pos(), ErrorKey.SYNTAX,
                    "expected '(' or '[' to open the domain after 'in', found " + open.describe());
            }
            Token lowTok = p.peek();
            if (isInf(p)) {
                throw badDomain(open, line, lowTok.pos(), "the lower end must be finite");
            }
            Rational lower = ExprParser.constant(p.parseExpr(), "a domain end");
            Token comma = p.next();
            if (!comma.is(",")) {
                throw new QchainException(comma.pos(), ErrorKey.SYNTAX,
                    "expected ',' between the ends of the domain, found " + comma.describe());
            }
            Optional<Rational> upper;
            Token upTok = p.peek();
            if (isInf(p)) {
                if (upTok.is("-")) {
                    throw badDomain(open, line, upTok.pos(), "the upper end cannot be -inf");
                }
                skipInf(p);
                upper = Optional.empty();
            } else {
                upper = Optional.of(ExprParser.constant(p.parseExpr(), "a domain end"));
            }
            Token close = p.next();
            if (!close.is(")") && !close.is("]")) {
                throw new QchainException(close.pos(), ErrorKey.SYNTAX,
                    "expected ')' or ']' to close the domain, found " + close.describe());
            }
            String text = line.substring(open.index(), close.index() + 1);
            boolean lowerClosed = open.is("[");
            boolean upperClosed = close.is("]");
            if (upper.isEmpty() && upperClosed) {
                throw new QchainException(close.pos(), ErrorKey.BAD_DOMAIN, text, "an infinite end is open: write ')' after inf");
            }
            if (upper.isPresent()) {
                int c = lower.compareTo(upper.get());
                if (c > 0) {
                    throw new QchainException(open.pos(), ErrorKey.BAD_DOMAIN, text, "the lower end is above the upper end");
                }
                if (c == 0 && !(lowerClosed && upperClosed)) {
                    throw new QchainException(open.pos(), ErrorKey.BAD_DOMAIN, text, "it contains no value");
                }
            }
            return new Domain(lower, lowerClosed, upper, upperClosed);
        }

        private static boolean isInf(ExprParser p) {
            if (isInfWord(p.peek())) {
                return true;
            }
            return (p.peek().is("-") || p.peek().is("+")) && isInfWord(p.peekAhead(1));
        }

        private static boolean isInfWord(Token t) {
            return t.kind() == Kind.NAME && t.text().equals("inf");
        }

        private static void skipInf(ExprParser p) {
            if (p.peek().is("+")) {
                p.next();
            }
            p.next();
        }

        private static QchainException badDomain(Token open, String line, SourcePos at, String why) {
            int close = line.indexOf(')', open.index());
            int close2 = line.indexOf(']', open.index());
            int end = close < 0 ? close2 : (close2 < 0 ? close : Math.min(close, close2));
            String text = end < 0 ? line.substring(open.index()).strip() : line.substring(open.index(), end + 1);
            return new QchainException(at, ErrorKey.BAD_DOMAIN, text, why);
        }

        private void statesLine(int ln, String line, List<Word> w) {
            if (statesLine != 0) {
                throw new QchainException(pos(ln, w.get(0).start()), ErrorKey.DUPLICATE_LINE, "states", statesLine);
            }
            if (w.size() == 1) {
                throw new QchainException(pos(ln, w.get(0).start()), ErrorKey.EMPTY_CHAIN);
            }
            List<String> names = new ArrayList<>();
            for (Word s : w.subList(1, w.size())) {
                String name = s.text();
                SourcePos p = pos(ln, s.start());
                if (RESERVED.contains(name)) {
                    throw new QchainException(p, ErrorKey.RESERVED_NAME, name, "state");
                }
                if (!isStateName(name)) {
                    String rule = name.contains(",") ? STATE_NAME_RULE + " (separate names with spaces)" : STATE_NAME_RULE;
                    throw new QchainException(p, ErrorKey.INVALID_NAME, "state", name, rule);
                }
                if (stateIndex.containsKey(name)) {
                    throw new QchainException(p, ErrorKey.DUPLICATE_STATE, name);
                }
                stateIndex.put(name, names.size());
                names.add(name);
            }
            states = names;
            statesLine = ln;
        }

        private void otherLine(int ln, String line, List<Word> w) {
            Word first = w.get(0);
            SourcePos p = pos(ln, first.start());
            if (states == null) {
                if (laterStateNames().contains(first.text()) || (w.size() >= 3 && laterStateNames().isEmpty())) {
                    throw new QchainException(p, ErrorKey.MISSING_STATES, "this transition");
                }
                throw new QchainException(p, ErrorKey.UNKNOWN_KEYWORD, first.text(), "");
            }
            if (!stateIndex.containsKey(first.text())) {
                if (w.size() >= 3) {
                    throw new QchainException(p, ErrorKey.UNKNOWN_STATE, first.text());
                }
                throw new QchainException(p, ErrorKey.UNKNOWN_KEYWORD, first.text(), "; it is not a declared state either");
            }
            transition(ln, line, w);
        }

        /** The names on a {@code states} line anywhere in the file (for the message about a misplaced one). */
        private Set<String> laterStateNames() {
            for (String raw : lines) {
                int hash = raw.indexOf('#');
                List<Word> w = words(hash >= 0 ? raw.substring(0, hash) : raw);
                if (!w.isEmpty() && w.get(0).text().equals("states")) {
                    Set<String> out = new HashSet<>();
                    w.subList(1, w.size()).forEach(x -> out.add(x.text()));
                    return out;
                }
            }
            return Set.of();
        }

        private void transition(int ln, String line, List<Word> w) {
            Word fromW = w.get(0);
            SourcePos linePos = pos(ln, fromW.start());
            String what = kind() == ChainKind.DISCRETE ? "probability" : "rate";
            if (w.size() < 2) {
                throw new QchainException(pos(ln, fromW.end()), ErrorKey.SYNTAX,
                    "a transition is FROM TO EXPRESSION; missing the target state and the " + what);
            }
            Word toW = w.get(1);
            Integer to = stateIndex.get(toW.text());
            if (to == null) {
                throw new QchainException(pos(ln, toW.start()), ErrorKey.UNKNOWN_STATE, toW.text());
            }
            int from = stateIndex.get(fromW.text());
            if (from == to && kind() == ChainKind.CONTINUOUS) {
                throw new QchainException(linePos, ErrorKey.SELF_RATE, fromW.text());
            }
            Transition first = seen.get(key(from, to));
            if (first != null) {
                throw new QchainException(linePos, ErrorKey.DUPLICATE_TRANSITION, fromW.text(), toW.text(),
                    first.pos().line());
            }
            List<Token> toks = tokens(ln, line, toW.end());
            Token start = toks.get(0);
            if (start.kind() == Kind.END) {
                throw new QchainException(start.pos(), ErrorKey.SYNTAX,
                    "missing the " + what + " after '" + fromW.text() + " " + toW.text() + "'");
            }
            Expr e = new ExprParser(toks, 0).parseAll();
            for (Expr.Var v : varNodes(e)) {
                if (!params.containsKey(v.name())) {
                    throw new QchainException(v.pos(), ErrorKey.UNKNOWN_PARAMETER, v.name());
                }
            }
            Transition t = new Transition(from, to, e, linePos, start.pos());
            seen.put(key(from, to), t);
            transitions.add(t);
        }

        private static long key(int from, int to) {
            return ((long) from << 32) | (to & 0xffffffffL);
        }
    }
}
