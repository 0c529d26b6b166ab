package org.flexmargin.model;

/**
 * Airspeed sweep at fixed altitude, evenly spaced in the given airspeed kind.
 *
 * @param altitudeM geometric altitude (m)
 * @param kind airspeed kind of {@code fromMps}/{@code toMps}
 * @param fromMps first speed (m/s), &gt; 0
 * @param toMps last speed (m/s), &gt; fromMps
 * @param points number of grid points, &gt;= 2
 */
public record SpeedSweep(double altitudeM, AirspeedKind kind, double fromMps, double toMps, int points)
    implements SweepPlan {
  /** Validates. */
  public SpeedSweep {
    Altitudes.check("altitude_m", altitudeM);
    if (kind == null) {
      throw new InvalidInputException("speed_kind", "eas or tas", "nothing");
    }
    Checks.positive("from_mps", fromMps);
    Checks.positive("to_mps", toMps);
    if (toMps <= fromMps) {
      throw new InvalidInputException(
          "to_mps", "a speed above from_mps = " + fromMps + " m/s", toMps + " m/s (empty or inverted range)");
    }
    Checks.atLeast("points", points, 2);
  }

  @Override
  public int pointCount() {
    return points;
  }
}
