package org.flexmargin.sweep;

import java.util.List;
import org.flexmargin.flutter.FlutterCrossing;

/**
 * Closed-loop (aeroservoelastic) stability of one configuration along the sweep.
 *
 * @param points eigenvalues at every grid point
 * @param crossings refined damping crossings of closed-loop roots (g = 0 and the damping limit),
 *     labelled with the open-loop root they are nearest to
 * @param fitDescription the rational approximation used (lags, range, worst element error)
 * @param eigenSolves closed-loop eigen-decompositions performed
 * @param warnings numerical remarks (fit quality, unmatched roots)
 * @param assumptions modelling assumptions in words
 */
public record ClosedLoopResult(
    List<ClosedLoopPoint> points,
    List<FlutterCrossing> crossings,
    String fitDescription,
    int eigenSolves,
    List<String> warnings,
    List<String> assumptions) {
  /** Copies. */
  public ClosedLoopResult {
    points = List.copyOf(points);
    crossings = List.copyOf(crossings);
    warnings = List.copyOf(warnings);
    assumptions = List.copyOf(assumptions);
  }
}
