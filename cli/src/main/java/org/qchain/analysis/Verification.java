package org.qchain.analysis;

import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.reference.PowerRows;
import org.qchain.exact.reference.ReferenceReader;
import org.qchain.exact.reference.Target;
import org.qchain.exact.reference.Verifier;
import org.qchain.exact.reference.VerifyReport;
import org.qchain.result.VerifyResult;

/**
 * The check of a float file against the exact values: the size guard, the exact values (computed before the file
 * is read for a row or an entry; row by row as the file asks for them for a whole matrix), and the streaming
 * comparison of the exact module ({@link Verifier}). Numeric only: references no symbolic class.
 */
final class Verification {
    private Verification() {
    }

    static VerifyResult run(LoadedModel model, VerifyQuery q, Progress progress) {
        if (q.what().missingAnalysis().isPresent()) {
            throw new QchainException(ErrorKey.VERIFY_NOT_AVAILABLE, q.what().word(), q.what().missingAnalysis().get());
        }
        model.requireDiscrete("qchain verify checks discrete chains (continuous chains are not supported yet)");
        RationalMatrix p = model.matrix();
        List<String> states = model.states();
        String has = "the model has " + states.size() + " states";
        long n = q.n().orElseThrow();
        Target target;
        Verifier.Truth truth;
        switch (q.what()) {
            case MATRIX -> {
                SizeEstimate.requireWithin(SizeEstimate.digitsOfPower(p, n), q.maxDigits(),
                    NumericEngine.MAX_DIGITS_OPTION);
                target = Target.matrix(states, states, has, has);
                truth = new PowerRows(p, n, progress);
            }
            case ROW -> {
                int from = model.state("--from", q.from().get());
                SizeEstimate.requireWithin(SizeEstimate.digitsOfRow(p, from, n), q.maxDigits(),
                    NumericEngine.MAX_DIGITS_OPTION);
                target = Target.vector(states, has);
                Rational[] row = MatrixPowers.rowOfPower(p, from, n, progress);
                truth = (i, j) -> row[j];
            }
            case ENTRY -> {
                int from = model.state("--from", q.from().get());
                int to = model.state("--to", q.to().get());
                SizeEstimate.requireWithin(SizeEstimate.digitsOfRow(p, from, n), q.maxDigits(),
                    NumericEngine.MAX_DIGITS_OPTION);
                target = Target.scalar(q.from().get() + " -> " + q.to().get());
                Rational value = MatrixPowers.entryOfPower(p, from, to, n, progress);
                truth = (i, j) -> value;
            }
            default -> throw new IllegalStateException(q.what().word());
        }
        Verifier v = new Verifier(target, truth, q.tolerance(), q.show(), progress);
        VerifyReport report = v.report(ReferenceReader.read(q.against(), q.againstName(), target, v));
        List<String> warnings = new ArrayList<>();
        if (report.checked() < report.expected()) {
            warnings.add(q.againstName() + " gives " + report.checked() + " of the " + report.expected()
                + " values; only those were checked");
        }
        return new VerifyResult(model.source(), q.againstName(), q.what().word(), q.n(), q.from(), q.to(), target,
            report, warnings);
    }
}
