package org.flexmargin.model;

/** Geometric altitude range (m) covered by the standard atmosphere model of flexmargin. */
public final class Altitudes {
  private Altitudes() {}

  /** Lowest geometric altitude of the atmosphere model (m), US Standard Atmosphere 1976. */
  public static final double MIN_M = -5000.0;
  /** Highest geometric altitude of the atmosphere model (m), US Standard Atmosphere 1976. */
  public static final double MAX_M = 86000.0;

  /** @return {@code altitudeM} if within the model range, else throws */
  public static double check(String path, double altitudeM) {
    return Checks.inRange(path, altitudeM, MIN_M, MAX_M);
  }
}
