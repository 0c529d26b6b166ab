package org.flexmargin.model;

/**
 * What an uncertain campaign parameter changes in a sample's case. Factors multiply the base
 * value; {@link #ADDED_DELAY_S} adds seconds to the loop's computation delay.
 *
 * <p>Example: {@code MODAL_FREQUENCY} with the value 1.03 for mode {@code wing_torsion_1} turns
 * its 13.0 Hz into 13.39 Hz (the generalized mass is kept, so the stiffness grows by 1.03^2).
 */
public enum UncertainQuantity {
  /** Factor on the in-vacuo frequency of the named modes (dimensionless). */
  MODAL_FREQUENCY("modal_frequency", true),
  /** Factor on the viscous damping ratio of the named modes (dimensionless). */
  MODAL_DAMPING("modal_damping", true),
  /** Factor on the generalized mass of the named modes (dimensionless). */
  GENERALIZED_MASS("generalized_mass", true),
  /**
   * Factor on the mode-shape values (displacement and rotation) of the named modes at the
   * stations of the loop's sensors (dimensionless).
   */
  SENSOR_SHAPE("sensor_shape", true),
  /** Factor on every strip's lift-curve slope (strip theory; dimensionless). */
  AERO_SCALE("aero_scale", false),
  /** Factor on the actuator bandwidth (dimensionless). */
  ACTUATOR_BANDWIDTH("actuator_bandwidth", false),
  /** Seconds added to the loop's computation delay (s); the total must stay &gt;= 0. */
  ADDED_DELAY_S("added_delay_s", false);

  private final String key;
  private final boolean perMode;

  UncertainQuantity(String key, boolean perMode) {
    this.key = key;
    this.perMode = perMode;
  }

  /** @return the campaign-file key */
  public String key() {
    return key;
  }

  /** @return whether the parameter applies to named modes */
  public boolean perMode() {
    return perMode;
  }
}
