package org.flexmargin.sweep;

import java.util.List;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.model.InvalidInputException;

/**
 * Closed-loop (aeroservoelastic) stability of one configuration along the sweep.
 *
 * @param points eigenvalues at every grid point, in path order; at least one (the sweep start)
 * @param crossings refined damping crossings of closed-loop roots (g = 0 and the damping limit),
 *     labelled with the open-loop root they are nearest to; each g = 0 crossing is the onset on
 *     the exact frequency-domain loop when that refinement succeeded (see {@code refinements}),
 *     damping-limit crossings are those of the rational model
 * @param fitDescription the rational approximation used (lags, range, worst element error)
 * @param eigenSolves full closed-loop eigen-decompositions performed (grid points, and onset refinement
 *     steps where tracking the single root did not settle)
 * @param warnings numerical remarks (fit quality, unmatched roots)
 * @param assumptions modelling assumptions in words
 * @param refinements every g = 0 crossing of the rational model with its exact-loop refinement
 *     and the difference between the two, in crossing order
 */
public record ClosedLoopResult(
    List<ClosedLoopPoint> points,
    List<FlutterCrossing> crossings,
    String fitDescription,
    int eigenSolves,
    List<String> warnings,
    List<String> assumptions,
    List<OnsetRefinement> refinements) {
  /**
   * Validates and copies.
   *
   * @throws InvalidInputException {@code closed_loop.points} when there is no sweep point
   */
  public ClosedLoopResult {
    if (points == null || points.isEmpty()) {
      throw new InvalidInputException("closed_loop.points", "at least one sweep point (the sweep start)", "none");
    }
    refinements = List.copyOf(refinements);
    points = List.copyOf(points);
    crossings = List.copyOf(crossings);
    warnings = List.copyOf(warnings);
    assumptions = List.copyOf(assumptions);
  }

  /** @return the eigenvalues at the first grid point, the sweep start */
  public ClosedLoopPoint start() {
    return points.get(0);
  }

  /**
   * @param crossing one of {@link #crossings()}
   * @return which model located it, in words: the exact loop with the rational onset and the
   *     difference beside it, or the closed-loop state space
   */
  public String routeOf(FlutterCrossing crossing) {
    for (OnsetRefinement r : refinements) {
      if (r.exact().isPresent() && r.exact().get().equals(crossing)) {
        return String.format(java.util.Locale.ROOT, "exact frequency-domain loop; rational model %.2f m/s EAS, "
            + "difference %+.2f m/s", r.rational().condition().speedEasMps(), r.speedDifferenceEasMps());
      }
    }
    return "closed-loop state space";
  }

  /** Without exact-loop refinements (the crossings are those of the rational model). */
  public ClosedLoopResult(List<ClosedLoopPoint> points, List<FlutterCrossing> crossings, String fitDescription,
      int eigenSolves, List<String> warnings, List<String> assumptions) {
    this(points, crossings, fitDescription, eigenSolves, warnings, assumptions, List.of());
  }
}
