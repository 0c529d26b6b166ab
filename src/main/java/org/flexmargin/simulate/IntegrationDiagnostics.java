package org.flexmargin.simulate;

/**
 * How the adaptive integration went, for the results. Immutable.
 *
 * @param acceptedSteps number of accepted integration steps
 * @param evaluations number of derivative evaluations (rejected steps included)
 * @param smallestStepS smallest accepted step (s), NaN if none
 * @param largestStepS largest accepted step (s), NaN if none
 * @param meanStepS mean accepted step (s), NaN if none
 * @param relativeTolerance relative error tolerance per step
 * @param absoluteTolerance absolute error tolerance per step (unit of each state)
 * @param exactSteps output steps taken exactly (actuator clear of its limits), not integrated
 */
public record IntegrationDiagnostics(int acceptedSteps, int evaluations, double smallestStepS, double largestStepS,
    double meanStepS, double relativeTolerance, double absoluteTolerance, int exactSteps) {}
