package org.flexmargin.model;

/**
 * Which airspeed a number is. Required wherever a speed is input.
 *
 * <p>Example at 5 000 m (ISA density 0.7364 kg/m^3, sea-level 1.225 kg/m^3): 100 m/s
 * {@code EQUIVALENT} is 100 * sqrt(1.225 / 0.7364) = 129.0 m/s true; 100 m/s {@code TRUE} is
 * 77.5 m/s equivalent.
 */
public enum AirspeedKind {
  /** Equivalent airspeed V_EAS = V sqrt(rho / rho0): fixes the dynamic pressure. */
  EQUIVALENT,
  /** True airspeed relative to the air mass. */
  TRUE
}
