package org.flexmargin.sweep;

/**
 * One closed-loop eigenvalue s (upper half plane and real axis), labelled by the open-loop root it
 * is nearest to.
 *
 * @param realPerS Re s (1/s)
 * @param imagRadPerS Im s (rad/s), &gt;= 0
 * @param label mode name or "short period" for the open-loop root it is nearest to; otherwise
 *     "rigid body + loop" (well below the first elastic mode) or "control loop" (actuator, filters,
 *     aerodynamic lags)
 */
public record ClosedLoopRoot(double realPerS, double imagRadPerS, String label) {
  /** @return frequency (Hz) */
  public double frequencyHz() {
    return imagRadPerS / (2 * Math.PI);
  }

  /** @return damping ratio zeta = -Re s / |s| (positive stable) */
  public double dampingRatio() {
    double m = Math.hypot(realPerS, imagRadPerS);
    return m == 0 ? 0 : -realPerS / m;
  }

  /** @return g = 2 Re s / Im s (V-g convention, negative stable); +/- infinity for a real root */
  public double dampingG() {
    if (imagRadPerS == 0) {
      return realPerS > 0 ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
    }
    return 2 * realPerS / imagRadPerS;
  }
}
