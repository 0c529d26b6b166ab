package org.flexmargin.simulate;

/**
 * Whether the flight-control loop is closed during a simulation.
 *
 * <p>Example: with {@code CLOSED} a pilot step of 1 deg at the elevator command is added to the
 * law's output, so the loop fights any pitch rate it causes; with {@code OPEN} the elevator
 * follows the pilot command through the hold, delay and actuator alone and the law's output is
 * only recorded.
 */
public enum LoopClosure {
  /** The law's output drives the actuator (plus the pilot command). */
  CLOSED,
  /** Only the pilot command drives the actuator; the law's output is computed but not used. */
  OPEN
}
