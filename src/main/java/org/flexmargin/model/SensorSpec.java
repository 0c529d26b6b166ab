package org.flexmargin.model;

/**
 * One feedback sensor.
 *
 * @param name unique sensor name
 * @param kind what it measures
 * @param station mode-table station whose shape values give its elastic pick-up
 * @param leverArmM station position aft of the centre of mass (m); an accelerometer there adds
 *     -leverArmM * q_dot / g0 to the rigid normal acceleration (positive up)
 * @param bandwidthHz first-order sensor bandwidth (Hz); 0 for an ideal sensor
 */
public record SensorSpec(String name, SensorKind kind, String station, double leverArmM, double bandwidthHz) {
  /** Validates. */
  public SensorSpec {
    Checks.name("name", name);
    if (kind == null) {
      throw new InvalidInputException("kind", "pitch_rate_gyro, normal_accelerometer or angle_of_attack_vane",
          "nothing");
    }
    Checks.name("station", station);
    Checks.finite("lever_arm_m", leverArmM);
    Checks.nonNegative("bandwidth_hz", bandwidthHz);
  }
}
