package org.flexmargin.model;

/**
 * Order of the actuator model.
 *
 * <p>Example at bandwidth 10 Hz: {@code FIRST} is 1/(tau s + 1) with tau = 1/(2 pi 10) s, phase
 * -45 deg at 10 Hz; {@code SECOND} with damping ratio 0.7 is w^2/(s^2 + 1.4 w s + w^2),
 * w = 2 pi 10 rad/s, phase -90 deg at 10 Hz.
 */
public enum ActuatorOrder {
  /** First-order lag with corner at the bandwidth. */
  FIRST,
  /** Second-order with natural frequency at the bandwidth and the given damping ratio. */
  SECOND
}
