package org.flexmargin.model;

/**
 * Value of one mode shape at one station, per unit generalized coordinate.
 *
 * <p>Sign convention (fixed): {@code displacementM} is the vertical displacement of the station's
 * reference point (for an aerodynamic strip, its elastic axis), positive <b>up</b>;
 * {@code rotationRad} is the pitch rotation (for a strip, its twist), positive <b>nose up</b>.
 *
 * @param displacementM vertical displacement (m per unit coordinate), positive up
 * @param rotationRad pitch rotation (rad per unit coordinate), positive nose up
 */
public record ShapeValue(double displacementM, double rotationRad) {
  /** Validates both values are finite. */
  public ShapeValue {
    Checks.finite("displacement_m", displacementM);
    Checks.finite("rotation_rad", rotationRad);
  }
}
