package org.flexmargin.sweep;

import java.util.List;
import org.flexmargin.atmosphere.FlightCondition;

/**
 * Closed-loop eigenvalues at one sweep point.
 *
 * @param pathParameter path parameter t
 * @param condition flight condition
 * @param roots eigenvalues with Im &gt;= 0, labelled
 * @param states closed-loop state count
 */
public record ClosedLoopPoint(double pathParameter, FlightCondition condition, List<ClosedLoopRoot> roots, int states) {
  /** Copies. */
  public ClosedLoopPoint {
    roots = List.copyOf(roots);
  }

  /** @return the largest real part (1/s): positive means the closed loop is unstable */
  public double maxRealPart() {
    return roots.stream().mapToDouble(ClosedLoopRoot::realPerS).max().orElse(Double.NEGATIVE_INFINITY);
  }
}
