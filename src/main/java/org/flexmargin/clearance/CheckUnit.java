package org.flexmargin.clearance;

/**
 * Unit of a check's required and achieved values, with the least scale used to normalise its
 * excess ({@link ClearanceCheck#normalisedExcess()}): the excess is divided by
 * max(|required|, least scale). The least scales are our choice; they only avoid dividing by the
 * zero requirements of the 1.15 V_L regime and never change pass or fail.
 */
public enum CheckUnit {
  /** Decibels (gain margins, structural peak); least scale 1 dB. */
  DECIBEL("dB", 1.0),
  /** Degrees (phase margins, phase stabilisation); least scale 5 deg. */
  DEGREE("deg", 5.0),
  /** Metres per second, equivalent airspeed; least scale 1 m/s. */
  METRE_PER_SECOND_EAS("m/s EAS", 1.0),
  /**
   * Damping as a structural damping coefficient g, positive = damped (g ~ 2 zeta; the V-g charts
   * draw the same number with the opposite sign); least scale 0.005.
   */
  DAMPING_G("g", 0.005),
  /** Stable (+1) or unstable (-1) against a requirement of 0; least scale 1. */
  STABILITY("", 1.0);

  private final String symbol;
  private final double leastScale;

  CheckUnit(String symbol, double leastScale) {
    this.symbol = symbol;
    this.leastScale = leastScale;
  }

  /** @return the unit symbol for display ("dB", "deg", ...) */
  public String symbol() {
    return symbol;
  }

  /** @return the least normalisation scale, in this unit */
  public double leastScale() {
    return leastScale;
  }
}
