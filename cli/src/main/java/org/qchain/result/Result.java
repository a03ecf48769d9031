package org.qchain.result;

import java.util.List;

/**
 * What an analysis computed, ready for any formatter. Every result is an immutable record; formatters lay it out and
 * never compute beyond rounding an exact value for display.
 */
public sealed interface Result permits StepResult, CertifiedStepResult, SymbolicStepResult, SensResult, ClosedResult,
    CheckResult, TransientResult, AvailabilityResult, RateSensResult, VerifyResult, ClassesResult, LongRunResult,
    AbsorbResult, DistributionResult, TransientSensResult, SymbolicAvailabilityResult {

    /** The model file name as the user gave it. */
    String source();

    /** Warnings for the user, one line each (the command line also prints them on stderr). */
    List<String> warnings();
}
