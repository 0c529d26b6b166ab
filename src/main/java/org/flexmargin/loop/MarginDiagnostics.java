package org.flexmargin.loop;

/**
 * How the margin search went.
 *
 * @param initialPoints points of the initial logarithmic grid
 * @param seedPoints points added around lightly damped poles
 * @param refinementPoints points added by bisection
 * @param gridPoints final grid size
 * @param unresolvedIntervals intervals still above the phase/gain step limits when the depth or
 *     point cap was reached (0 means the grid resolved L everywhere)
 * @param functionEvaluations total evaluations of L (grid plus root finding and maximisation)
 */
public record MarginDiagnostics(int initialPoints, int seedPoints, int refinementPoints,
    int gridPoints, int unresolvedIntervals, int functionEvaluations) {}
