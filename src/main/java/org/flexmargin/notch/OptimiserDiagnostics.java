package org.flexmargin.notch;

/**
 * How the notch optimisation went.
 *
 * @param method optimiser in words
 * @param evaluations objective evaluations over all runs
 * @param runs optimiser runs (start plus restarts)
 * @param finalObjective objective at the returned set: worst phase loss (deg) plus the penalty
 * @param penaltyWeight weight of the squared violations in the objective (per dB^2 or deg^2)
 * @param worstPeakExcessDb largest structural peak above the limit at the returned set, dB (&lt;= 0
 *     when met)
 * @param violations number of violated constraints at the returned set
 * @param samples loop samples used (configurations x shifts x points)
 * @param storedValues complex loop values stored for the evaluation
 */
public record OptimiserDiagnostics(String method, int evaluations, int runs, double finalObjective,
    double penaltyWeight, double worstPeakExcessDb, int violations, int samples, int storedValues) {}
