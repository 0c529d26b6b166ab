package org.flexmargin.sweep;

import java.util.List;
import org.flexmargin.model.InvalidInputException;

/**
 * Aeroservoelastic results of one configuration: loop margins at every grid point (exact
 * frequency-domain loop) and the closed-loop eigenvalues and onsets (state space).
 *
 * @param points margins at every grid point
 * @param closedLoop closed-loop roots and refined crossings
 */
public record ServoResult(List<ServoPoint> points, ClosedLoopResult closedLoop) {
  /**
   * Validates and copies.
   *
   * @throws InvalidInputException {@code servo.points} or {@code servo.closed_loop} when missing
   */
  public ServoResult {
    if (points == null) {
      throw new InvalidInputException("servo.points", "the loop margins at the sweep points", "none");
    }
    if (closedLoop == null) {
      throw new InvalidInputException("servo.closed_loop", "the closed-loop eigenvalues along the sweep", "none");
    }
    points = List.copyOf(points);
  }
}
