package org.flexmargin.flutter;

import org.flexmargin.atmosphere.FlightCondition;

/**
 * A damping crossing refined as a root between grid points.
 *
 * @param branch index of the tracked root (branch i starts at mode i)
 * @param branchName name of the mode the branch starts from
 * @param kind what the crossing means
 * @param pathParameter path parameter t at the crossing (grid points are integers)
 * @param condition flight condition at the crossing (altitude, TAS, and derived EAS, Mach, q)
 * @param frequencyHz frequency of the root at the crossing (Hz)
 * @param thresholdG the g level crossed (0 or minus the damping limit; V-g convention)
 * @param evaluations root solves used by the refinement
 * @param bracketWidth final bracket width in path parameter units
 */
public record FlutterCrossing(
    int branch,
    String branchName,
    CrossingKind kind,
    double pathParameter,
    FlightCondition condition,
    double frequencyHz,
    double thresholdG,
    int evaluations,
    double bracketWidth) {}
