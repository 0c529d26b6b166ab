package org.flexmargin.sweep;

import java.util.List;

/**
 * Aeroservoelastic results of one configuration: loop margins at every grid point (exact
 * frequency-domain loop) and the closed-loop eigenvalues and onsets (state space).
 *
 * @param points margins at every grid point
 * @param closedLoop closed-loop roots and refined crossings
 */
public record ServoResult(List<ServoPoint> points, ClosedLoopResult closedLoop) {
  /** Copies. */
  public ServoResult {
    points = List.copyOf(points);
  }
}
