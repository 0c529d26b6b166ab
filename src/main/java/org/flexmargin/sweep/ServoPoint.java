package org.flexmargin.sweep;

import java.util.List;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.loop.LoopMarginResult;

/**
 * Loop margins at one sweep point, from the exact broken-loop response.
 *
 * @param pathParameter path parameter t (grid points are integers)
 * @param condition flight condition
 * @param margins all crossings, disk margin, peak gain and diagnostics of L(j w), broken at the
 *     actuator command
 * @param pathMargins loop-at-a-time margins broken at each feedback path (others closed), in the
 *     loop's path order
 * @param notches what each notch delivers at this point
 */
public record ServoPoint(double pathParameter, FlightCondition condition, LoopMarginResult margins,
    List<LoopMarginResult> pathMargins, List<NotchCheck> notches) {
  /** Copies. */
  public ServoPoint {
    pathMargins = List.copyOf(pathMargins);
    notches = List.copyOf(notches);
  }
}
