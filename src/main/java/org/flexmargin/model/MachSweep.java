package org.flexmargin.model;

/**
 * Matched-point sweep: fixed Mach number, altitude stepped from high to low (or any order given),
 * so that dynamic pressure and equivalent airspeed change along the path.
 *
 * @param machNumber Mach number (dimensionless), &gt; 0
 * @param fromAltitudeM first geometric altitude (m)
 * @param toAltitudeM last geometric altitude (m), different from the first
 * @param points number of grid points, &gt;= 2
 */
public record MachSweep(double machNumber, double fromAltitudeM, double toAltitudeM, int points)
    implements SweepPlan {
  /** Validates. */
  public MachSweep {
    Checks.inRange("mach", machNumber, 1e-6, 5.0);
    Altitudes.check("from_altitude_m", fromAltitudeM);
    Altitudes.check("to_altitude_m", toAltitudeM);
    if (fromAltitudeM == toAltitudeM) {
      throw new InvalidInputException(
          "to_altitude_m", "an altitude different from from_altitude_m", toAltitudeM + " m (empty range)");
    }
    Checks.atLeast("points", points, 2);
  }

  @Override
  public int pointCount() {
    return points;
  }
}
