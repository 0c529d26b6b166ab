package org.flexmargin.model;

import java.util.List;

/**
 * One feedback path of the control law: sensor, filters, then proportional-plus-integral gain,
 * scheduled on dynamic pressure, summed into the elevator command.
 *
 * <p>Sign convention (fixed): elevator positive trailing edge down; a path contributes
 * {@code delta_cmd = factor(q) (Kp + Ki / s) F(s) y} where y is the sensor signal. Positive gains
 * on pitch rate or normal acceleration are stabilising for a conventional aircraft (C_m_delta &lt;
 * 0): a nose-up rate of 0.1 rad/s with Kp = 0.3 commands 0.03 rad trailing edge down, a nose-down
 * moment.
 *
 * @param sensor sensor name
 * @param proportionalGain Kp (rad of elevator per sensor unit: rad/s, g or rad)
 * @param integralGainPerS Ki (rad of elevator per sensor unit per second)
 * @param filters filters in series, in order
 * @param schedule gain factor on dynamic pressure
 */
public record FeedbackPath(
    String sensor, double proportionalGain, double integralGainPerS, List<FilterSpec> filters,
    GainSchedule schedule) {
  /** Validates and copies. */
  public FeedbackPath {
    Checks.name("sensor", sensor);
    Checks.finite("proportional_gain", proportionalGain);
    Checks.finite("integral_gain_per_s", integralGainPerS);
    filters = filters == null ? List.of() : List.copyOf(filters);
    schedule = schedule == null ? GainSchedule.CONSTANT : schedule;
  }
}
