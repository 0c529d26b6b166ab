package org.flexmargin.model;

/**
 * Elevator actuator: commanded to achieved deflection.
 *
 * @param order model order
 * @param bandwidthHz corner (first order) or natural frequency (second order) (Hz)
 * @param dampingRatio damping ratio of the second-order model (dimensionless; ignored for first
 *     order)
 */
public record ActuatorSpec(ActuatorOrder order, double bandwidthHz, double dampingRatio) {
  /** Validates. */
  public ActuatorSpec {
    if (order == null) {
      throw new InvalidInputException("order", "first or second", "nothing");
    }
    Checks.positive("bandwidth_hz", bandwidthHz);
    Checks.inRange("damping_ratio", dampingRatio, 0.0, 5.0);
  }
}
