package org.flexmargin.model;

/**
 * One spanwise aerodynamic strip for strip theory. Its motion is read from the mode shapes at the
 * station of the same name: displacement of the elastic axis (positive up) and twist (positive
 * nose up).
 *
 * @param station station name in the mode table
 * @param widthM spanwise width of the strip (m)
 * @param semichordM local semichord b (m)
 * @param elasticAxisA local elastic axis aft of mid-chord (semichords), Theodorsen's a
 * @param liftSlopePerRad local lift-curve slope (1/rad); 2 pi is Theodorsen's flat plate
 * @param placement position on the aircraft and elevator chord, for the quasi-steady coupling with
 *     the short period; {@code null} when not given
 */
public record Strip(String station, double widthM, double semichordM, double elasticAxisA,
    double liftSlopePerRad, StripPlacement placement) {
  /** Validates. */
  public Strip {
    Checks.name("station", station);
    Checks.positive("width_m", widthM);
    Checks.positive("semichord_m", semichordM);
    Checks.inRange("elastic_axis_a", elasticAxisA, -0.999, 0.999);
    Checks.positive("lift_slope_per_rad", liftSlopePerRad);
  }

  /** A strip without placement (no coupling with the short period is computed from it). */
  public Strip(String station, double widthM, double semichordM, double elasticAxisA, double liftSlopePerRad) {
    this(station, widthM, semichordM, elasticAxisA, liftSlopePerRad, null);
  }
}
