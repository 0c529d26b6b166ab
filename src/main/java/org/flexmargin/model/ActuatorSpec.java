package org.flexmargin.model;

/**
 * Elevator actuator: commanded to achieved deflection, with optional rate and position limits.
 *
 * <p>The limits do not enter the linear analysis (margins, closed-loop eigenvalues, flutter); they
 * give the rate-saturation line of each sweep point and the limited actuator of the time-domain
 * simulation. Example: a 12 Hz actuator limited to 60 deg/s saturates in rate under a command of
 * 60 / (360 x 12 |A|) deg at 12 Hz, |A| its gain there.
 *
 * @param order model order
 * @param bandwidthHz corner (first order) or natural frequency (second order) (Hz)
 * @param dampingRatio damping ratio of the second-order model (dimensionless; ignored for first
 *     order)
 * @param rateLimitRadPerS largest elevator rate (rad/s), &gt; 0; positive infinity for none given
 * @param positionLimitRad largest elevator deflection either way (rad), &gt; 0; positive infinity
 *     for none given
 */
public record ActuatorSpec(ActuatorOrder order, double bandwidthHz, double dampingRatio, double rateLimitRadPerS,
    double positionLimitRad) {
  /** Validates. */
  public ActuatorSpec {
    if (order == null) {
      throw new InvalidInputException("order", "first or second", "nothing");
    }
    Checks.positive("bandwidth_hz", bandwidthHz);
    Checks.inRange("damping_ratio", dampingRatio, 0.0, 5.0);
    if (!(rateLimitRadPerS > 0)) {
      throw new InvalidInputException("rate_limit_deg_s", "a rate limit > 0 deg/s", String.valueOf(
          Math.toDegrees(rateLimitRadPerS)));
    }
    if (!(positionLimitRad > 0)) {
      throw new InvalidInputException("position_limit_deg", "a position limit > 0 deg", String.valueOf(
          Math.toDegrees(positionLimitRad)));
    }
  }

  /**
   * An actuator without limits.
   *
   * @param order model order
   * @param bandwidthHz corner or natural frequency (Hz)
   * @param dampingRatio damping ratio of the second-order model
   */
  public ActuatorSpec(ActuatorOrder order, double bandwidthHz, double dampingRatio) {
    this(order, bandwidthHz, dampingRatio, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
  }

  /** @return true if a finite rate limit is given */
  public boolean hasRateLimit() {
    return Double.isFinite(rateLimitRadPerS);
  }
}
