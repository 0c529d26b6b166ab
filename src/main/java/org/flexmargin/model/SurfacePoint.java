package org.flexmargin.model;

/**
 * A point in the aircraft axes used by lifting surfaces and splines: x aft, y to the right (looking
 * forward), z up.
 *
 * @param xM x coordinate (m), positive aft
 * @param yM y coordinate (m), positive to starboard
 * @param zM z coordinate (m), positive up
 */
public record SurfacePoint(double xM, double yM, double zM) {
  /** Validates that all coordinates are finite. */
  public SurfacePoint {
    Checks.finite("x_m", xM);
    Checks.finite("y_m", yM);
    Checks.finite("z_m", zM);
  }
}
