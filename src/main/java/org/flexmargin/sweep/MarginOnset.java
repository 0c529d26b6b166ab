package org.flexmargin.sweep;

import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.clearance.CheckKey;

/**
 * The speed at which one requirement is first violated along the sweep, refined as a root of the
 * requirement's excess (achieved minus required) between the grid points that bracket it.
 *
 * @param key the requirement (check kind and subject)
 * @param description plain words for the requirement at the failing side of the bracket
 * @param condition flight condition at the onset
 * @param requiredValue required value at the onset (check's unit)
 * @param unit unit symbol of the requirement
 * @param evaluations loop analyses used by the refinement
 * @param refined false when the refinement left the bracket (the check disappeared between grid
 *     points, e.g. a crossover that ceases to exist); the onset is then the first failing grid
 *     point
 */
public record MarginOnset(
    CheckKey key, String description, FlightCondition condition, double requiredValue, String unit,
    int evaluations, boolean refined) {}
