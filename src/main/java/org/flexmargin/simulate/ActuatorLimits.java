package org.flexmargin.simulate;

import org.flexmargin.model.InvalidInputException;

/**
 * Rate and position limits of the elevator actuator. {@code Double.POSITIVE_INFINITY} means no
 * limit. Immutable.
 *
 * @param rateLimitRadPerS largest elevator rate (rad/s), &gt; 0
 * @param positionLimitRad largest elevator deflection either way (rad), &gt; 0
 */
public record ActuatorLimits(double rateLimitRadPerS, double positionLimitRad) {
  /** Validates. */
  public ActuatorLimits {
    if (!(rateLimitRadPerS > 0)) {
      throw new InvalidInputException("actuator_limits.rate_limit", "a value > 0 (or none)",
          String.valueOf(rateLimitRadPerS));
    }
    if (!(positionLimitRad > 0)) {
      throw new InvalidInputException("actuator_limits.position_limit", "a value > 0 (or none)",
          String.valueOf(positionLimitRad));
    }
  }

  /** @return true if neither limit is finite */
  public boolean none() {
    return Double.isInfinite(rateLimitRadPerS) && Double.isInfinite(positionLimitRad);
  }
}
