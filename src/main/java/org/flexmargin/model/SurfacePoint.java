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
  /** Largest plausible coordinate magnitude (m): no aircraft is 10 km long or wide. */
  public static final double MAX_COORDINATE_M = 1e4;

  /** Validates that all coordinates are finite and within +-{@value #MAX_COORDINATE_M} m. */
  public SurfacePoint {
    Checks.inRange("x_m", xM, -MAX_COORDINATE_M, MAX_COORDINATE_M);
    Checks.inRange("y_m", yM, -MAX_COORDINATE_M, MAX_COORDINATE_M);
    Checks.inRange("z_m", zM, -MAX_COORDINATE_M, MAX_COORDINATE_M);
  }
}
