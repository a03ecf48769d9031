package org.qchain.format;

import java.io.IOException;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.CertifiedStepResult;
import org.qchain.result.CheckResult;
import org.qchain.result.RateSensResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.Result;
import org.qchain.result.SensResult;
import org.qchain.result.StepResult;
import org.qchain.result.SymbolicStepResult;
import org.qchain.result.TransientResult;
import org.qchain.result.VerifyResult;

/**
 * Lays out any result as text of one format: one method per result type, and every format has a layout for every
 * result type (none throws for a type it cannot lay out). Formatters never compute beyond rounding
 * an exact value to the digits they were made with ({@link OutputFormat#formatter(int)}).
 */
public interface Formatter {

    /**
     * The full text for stdout or an output file, ending with a line break.
     *
     * @param result what to print
     * @return the formatted text
     */
    default String format(Result result) {
        if (result instanceof StepResult.Matrix m) {
            return stepMatrix(m);
        }
        if (result instanceof StepResult.Row r) {
            return stepRow(r);
        }
        if (result instanceof StepResult.Single s) {
            return stepSingle(s);
        }
        if (result instanceof CertifiedStepResult c) {
            return certifiedStep(c);
        }
        if (result instanceof SymbolicStepResult s) {
            return symbolicStep(s);
        }
        if (result instanceof SensResult s) {
            return sens(s);
        }
        if (result instanceof ClosedResult c) {
            return closed(c);
        }
        if (result instanceof TransientResult t) {
            return transientProbabilities(t);
        }
        if (result instanceof AvailabilityResult a) {
            return availability(a);
        }
        if (result instanceof org.qchain.result.SymbolicAvailabilityResult a) {
            return symbolicAvailability(a);
        }
        if (result instanceof RateSensResult r) {
            return rateSens(r);
        }
        if (result instanceof org.qchain.result.TransientSensResult r) {
            return transientSens(r);
        }
        if (result instanceof VerifyResult v) {
            return verify(v);
        }
        if (result instanceof org.qchain.result.ClassesResult c) {
            return classes(c);
        }
        if (result instanceof org.qchain.result.LongRunResult l) {
            return longRun(l);
        }
        if (result instanceof org.qchain.result.AbsorbResult a) {
            return absorb(a);
        }
        if (result instanceof org.qchain.result.DistributionResult d) {
            return distribution(d);
        }
        return check((CheckResult) result);
    }

    /**
     * Writes {@link #format}'s text to {@code out}, the same characters; large results (the exact entries of a
     * whole power or a row) are written in pieces while later entries are still being converted, so the whole
     * text is never held in memory.
     *
     * @param result what to print
     * @param out    where to write
     * @throws IOException if {@code out} fails
     */
    default void write(Result result, Appendable out) throws IOException {
        out.append(format(result));
    }

    /** The full matrix P^n. */
    String stepMatrix(StepResult.Matrix m);

    /** One row of P^n. */
    String stepRow(StepResult.Row r);

    /** One entry of P^n, with its paths if present. */
    String stepSingle(StepResult.Single s);

    /** P^n, a row or an entry as certified decimals. */
    String certifiedStep(CertifiedStepResult r);

    /** P^n, a row or an entry as formulas in the parameters. */
    String symbolicStep(SymbolicStepResult r);

    /** A sensitivity. */
    String sens(SensResult s);

    /** Closed forms in n. */
    String closed(ClosedResult r);

    /** A checked model. */
    String check(CheckResult c);

    /** P(t) of a continuous chain as certified decimals. */
    String transientProbabilities(TransientResult r);

    /** Figures of merit of a repairable system. */
    String availability(AvailabilityResult r);

    /** Figures of merit as formulas in the parameters, with their conditions. */
    String symbolicAvailability(org.qchain.result.SymbolicAvailabilityResult r);

    /** The derivative of a figure of merit with respect to a rate. */
    String rateSens(RateSensResult r);

    /** The derivative of a P(t) entry with respect to a rate parameter, as certified decimals. */
    String transientSens(org.qchain.result.TransientSensResult r);
    /** Float results checked against the exact values. */
    String verify(VerifyResult v);

    /** Communicating classes. */
    String classes(org.qchain.result.ClassesResult r);

    /** The long run. */
    String longRun(org.qchain.result.LongRunResult r);

    /** Absorption. */
    String absorb(org.qchain.result.AbsorbResult r);

    /** Where the chain is after n steps from a start: a distribution, or the probability of a set of states. */
    String distribution(org.qchain.result.DistributionResult r);
}
