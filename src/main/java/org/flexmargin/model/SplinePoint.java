package org.flexmargin.model;

/**
 * A structural point of a spline: where a mode-table station lies on the planform.
 *
 * @param station station name in the mode table
 * @param xM x of the point (m), positive aft; for a beam spline the axis position at that station
 * @param yM y of the point (m), positive to starboard
 */
public record SplinePoint(String station, double xM, double yM) {
  /** Validates. */
  public SplinePoint {
    Checks.name("station", station);
    Checks.finite("x_m", xM);
    Checks.finite("y_m", yM);
  }
}
