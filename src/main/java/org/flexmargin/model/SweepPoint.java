package org.flexmargin.model;

/**
 * One explicit flight point.
 *
 * @param altitudeM geometric altitude (m)
 * @param speedMps airspeed (m/s) of the given kind, &gt; 0
 * @param kind airspeed kind
 */
public record SweepPoint(double altitudeM, double speedMps, AirspeedKind kind) {
  /** Validates. */
  public SweepPoint {
    Altitudes.check("altitude_m", altitudeM);
    Checks.positive("speed_mps", speedMps);
    if (kind == null) {
      throw new InvalidInputException("speed_kind", "eas or tas", "nothing");
    }
  }
}
