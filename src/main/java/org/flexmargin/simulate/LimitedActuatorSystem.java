package org.flexmargin.simulate;

import org.flexmargin.loop.StateSpace;

/**
 * A linear system containing an actuator whose limits are to be simulated: which states are the
 * actuator's position (and rate), which output is its command, which output reports its rate, and
 * its linear dynamics (first order delta' = w (u - delta); second order delta'' = w^2 (u - delta)
 * - 2 zeta w delta'). Immutable.
 *
 * @param system the linear system (with the actuator rows in their linear form)
 * @param positionState index of the actuator position state
 * @param rateState index of the rate state of a second-order actuator, -1 for first order
 * @param omegaRadPerS w: bandwidth (first order) or natural frequency (second order) (rad/s)
 * @param dampingRatio zeta of a second-order actuator (ignored for first order)
 * @param commandOutput index of the output that is the actuator's command
 * @param rateOutput index of the output that reports the actuator rate, or -1
 */
public record LimitedActuatorSystem(StateSpace system, int positionState, int rateState, double omegaRadPerS,
    double dampingRatio, int commandOutput, int rateOutput) {
  /** Validates. */
  public LimitedActuatorSystem {
    int n = system.stateCount();
    if (positionState < 0 || positionState >= n || rateState >= n || rateState == positionState) {
      throw new IllegalArgumentException("actuator states " + positionState + ", " + rateState + " of " + n);
    }
    if (commandOutput < 0 || commandOutput >= system.outputCount() || rateOutput >= system.outputCount()) {
      throw new IllegalArgumentException("command output " + commandOutput + ", rate output " + rateOutput);
    }
    if (!(omegaRadPerS > 0)) {
      throw new IllegalArgumentException("actuator frequency must be > 0 rad/s, found " + omegaRadPerS);
    }
  }
}
