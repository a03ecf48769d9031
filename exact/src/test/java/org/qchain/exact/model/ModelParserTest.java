package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/** Valid model files and their exact matrices. */
class ModelParserTest {
    static final Path EXAMPLES = Path.of("..", "docs", "examples");

    static Rational q(String s) {
        return Rational.parse(s);
    }

    static RationalMatrix matrix(String... rows) {
        Rational[][] a = new Rational[rows.length][];
        for (int i = 0; i < rows.length; i++) {
            String[] f = rows[i].trim().split("\\s+");
            a[i] = new Rational[f.length];
            for (int j = 0; j < f.length; j++) {
                a[i][j] = q(f[j]);
            }
        }
        return RationalMatrix.of(a);
    }

    @Test
    void pumpStationExampleGivesTheExpectedMatrixWithRemainders() {
        // common practice, no source: the unlisted self-transition is 1 minus the row's listed probabilities
        Model m = ModelParser.parseFile(EXAMPLES.resolve("pump-station.chain"));
        assertEquals(ChainKind.DISCRETE, m.kind());
        assertEquals(List.of("Up", "Worn", "Down"), m.states());
        assertEquals(matrix(
            "47/50 1/20 1/100",
            "1/4 63/100 3/25",
            "1/2 0 1/2"), Chains.transitionMatrix(m, Map.of()));
    }

    @Test
    void decimalsAreReadExactly() {
        // common practice, no source: a decimal literal denotes the exact fraction with a power-of-ten denominator
        Model m = ModelParser.parse("d.chain", "states A B\nA B 0.1\nB A 1e-3\nB B 0.999\n");
        RationalMatrix p = Chains.transitionMatrix(m, Map.of());
        assertEquals(q("1/10"), p.get(0, 1));
        assertEquals(q("9/10"), p.get(0, 0));
        assertEquals(q("1/1000"), p.get(1, 0));
        assertEquals(q("999/1000"), p.get(1, 1));
    }

    @Test
    void parametersTakeNominalValuesOrOverrides() {
        // common practice, no source: values given explicitly override the nominal ones
        Model m = ModelParser.parseFile(EXAMPLES.resolve("pump-station-params.chain"));
        assertEquals(List.of("p", "r"), m.usedParameters());
        assertEquals(matrix(
            "19/20 1/20 0",
            "1/4 7/10 1/20",
            "1/2 0 1/2"), Chains.transitionMatrix(m));
        assertEquals(matrix(
            "9/10 1/10 0",
            "1/2 2/5 1/10",
            "1/2 0 1/2"), Chains.transitionMatrix(m, Chains.parseAssignments(m, "p = 1/10, r=0.5")));
    }

    @Test
    void freeParametersParseAndHaveDefaultDomains() {
        // the foundation and symbolic issues: a model with free parameters parses; default domain (0, 1) discrete
        Model m = ModelParser.parse("f.chain", "param a\nparam b\nstates X Y\nX Y a\nY X b\n");
        assertEquals(List.of("a", "b"), m.freeParameters());
        assertEquals(Domain.probability(), m.param("a").orElseThrow().domain());
        assertEquals(Optional.empty(), m.param("a").orElseThrow().nominal());
        Expr xx = m.entry(0, 0);
        assertEquals(q("3/4"), xx.evaluate(Map.of("a", q("1/4"))::get));
    }

    @Test
    void continuousChainGivesTheGenerator() {
        // common practice, no source: a generator's diagonal is minus the row's total rate, rows sum to 0
        Model m = ModelParser.parseFile(EXAMPLES.resolve("call-centre.chain"));
        assertEquals(ChainKind.CONTINUOUS, m.kind());
        assertEquals(Domain.positive(), m.param("lam").orElseThrow().domain());
        assertEquals(matrix(
            "-1/2 1/2 0 0",
            "1/4 -3/4 1/2 0",
            "0 1/2 -1 1/2",
            "0 0 1/2 -1/2"), Chains.transitionMatrix(m));
    }

    @Test
    void everyBundledExampleIsAValidChain() {
        // common practice, no source: the rows of a stochastic matrix sum to 1, of a generator to 0
        for (String f : List.of("pump-station.chain", "pump-station-params.chain", "courier-fleet.chain",
            "clinic.chain", "call-centre.chain", "warehouse-robot.csv")) {
            Model m = ModelParser.parseFile(EXAMPLES.resolve(f));
            RationalMatrix p = Chains.transitionMatrix(m);
            Rational target = m.kind() == ChainKind.DISCRETE ? Rational.ONE : Rational.ZERO;
            for (int i = 0; i < p.rows(); i++) {
                Rational s = Rational.ZERO;
                for (int j = 0; j < p.cols(); j++) {
                    s = s.add(p.get(i, j));
                    assertEquals(m.entry(i, j).evaluate(Chains.effectiveValues(m, Map.of())::get), p.get(i, j), f);
                }
                assertEquals(target, s, f + " row " + i);
            }
            assertTrue(p.isSquare());
        }
    }

    @Test
    void namesFollowTheDocumentedRules() {
        // the project's own naming rules (docs/model-format.md), common practice, no source
        Model m = ModelParser.parse("n.chain",
            "chain continuous\nparam \u03bb = 2\nparam mu_2 = 1/3\nstates 0 S-1 v1.2 _x\n"
                + "0 S-1 \u03bb\nS-1 v1.2 mu_2 * \u03bb\n\tv1.2\t_x\t1   # tabs separate words too\n");
        assertEquals(List.of("0", "S-1", "v1.2", "_x"), m.states());
        assertEquals(List.of("\u03bb", "mu_2"), m.usedParameters());
        RationalMatrix q = Chains.transitionMatrix(m);
        assertEquals(q("2/3"), q.get(1, 2));
        assertEquals(q("-1"), q.get(2, 2));
    }

    @Test
    void packageExampleWorksAsDocumented() {
        // the example in package-info.java and docs/model-format.md
        Model m = ModelParser.parse("pump.chain", "param p in (0, 1) = 1/20\nstates Up Down\nUp   Down p\nDown Up   1/2\n");
        assertEquals(matrix("19/20 1/20", "1/2 1/2"), Chains.transitionMatrix(m));
        assertEquals(matrix("9/10 1/10", "1/2 1/2"), Chains.transitionMatrix(m, Chains.parseAssignments(m, "p=0.1")));
        Model pp = ModelParser.parseFile(EXAMPLES.resolve("pump-station-params.chain"));
        assertEquals("1 - (p + r)", Expr.toPlain(pp.entry(1, 1)));
    }

    @Test
    void commentsBlankLinesAndLineEndingsAreIgnored() {
        // common practice, no source: LF, CRLF and CR end lines; '#' comments run to the end of the line
        Model lf = ModelParser.parse("a", "# c\nstates A B\n\nA B 1/2 # half\n");
        Model crlf = ModelParser.parse("a", "# c\r\nstates A B\r\n\r\nA B 1/2 # half\r\n");
        Model cr = ModelParser.parse("a", "\uFEFF# c\rstates A B\r\rA B 1/2 # half");
        assertEquals(Chains.transitionMatrix(lf), Chains.transitionMatrix(crlf));
        assertEquals(Chains.transitionMatrix(lf), Chains.transitionMatrix(cr));
        assertEquals(4, cr.transitions().get(0).pos().line());
        assertEquals(5, cr.transitions().get(0).exprPos().column());
    }

    @Test
    void theFoundationIssuesExampleReadsAsWritten() {
        // the example of the model format in the project's foundation issue, verbatim with its comments
        String text = """
            chain discrete                  # or: chain continuous (rates; a later issue)
            param p = 1/20                  # optional nominal value; optional domain: param p in (0, 1) = 1/20
            states Up Worn Down             # order fixes rows and columns
            Up   Worn  p                    # FROM TO EXPRESSION: one-step probability
            Worn Down  3/100
            Worn Up    0.25                 # decimals are read exactly: 0.25 = 1/4
            Down Up    1/2
            """;
        Model m = ModelParser.parse("issue.chain", text);
        assertEquals(matrix("19/20 1/20 0", "1/4 18/25 3/100", "1/2 0 1/2"),
            Chains.transitionMatrix(m, m.nominalValues()));
    }
}
