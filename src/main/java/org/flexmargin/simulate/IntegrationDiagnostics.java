package org.flexmargin.simulate;

/**
 * How the adaptive integration went, for the results. Immutable.
 *
 * @param acceptedSteps number of accepted steps
 * @param evaluations number of derivative evaluations (rejected steps included)
 * @param smallestStepS smallest accepted step (s)
 * @param largestStepS largest accepted step (s)
 * @param meanStepS mean accepted step (s)
 * @param relativeTolerance relative error tolerance per step
 * @param absoluteTolerance absolute error tolerance per step (unit of each state)
 */
public record IntegrationDiagnostics(int acceptedSteps, int evaluations, double smallestStepS, double largestStepS,
    double meanStepS, double relativeTolerance, double absoluteTolerance) {}
