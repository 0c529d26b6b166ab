package org.flexmargin.model;

/**
 * A failure (or degraded) state of the flight-control loop in a campaign matrix.
 *
 * @param name unique name, e.g. {@code nominal}, {@code accel_lost}
 * @param pathLost sensor name of the feedback path that is lost (its path removed), or
 *     {@code null} for none
 * @param actuatorBandwidthFactor factor on the actuator bandwidth (dimensionless), &gt; 0; 1 for
 *     none
 * @param addedDelayS delay added to the computation delay (s), &gt;= 0
 */
public record FailureState(String name, String pathLost, double actuatorBandwidthFactor, double addedDelayS) {
  /** The nominal state: nothing lost, nothing degraded. */
  public static final FailureState NOMINAL = new FailureState("nominal", null, 1.0, 0.0);

  /** Validates. */
  public FailureState {
    Checks.name("name", name);
    Checks.positive("actuator_bandwidth_factor", actuatorBandwidthFactor);
    Checks.nonNegative("added_delay_s", addedDelayS);
  }
}
