package org.qchain.analysis;

/**
 * A question about a loaded model, for {@link Analysis#run}: one record type per capability. A report is a list of
 * queries run through the same analysis. Add a new query type to {@code permits} and to {@link Analysis#run}.
 */
public sealed interface Query permits StepQuery, SensQuery, ClosedQuery, CheckQuery, VerifyQuery,
    TransientQuery, AvailabilityQuery, RateSensQuery, DistributionQuery, LongRunQuery, AbsorbQuery, ClassesQuery,
    TransientSensQuery, TransientFormQuery {
}
