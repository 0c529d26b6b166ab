package org.flexmargin.sweep;

/**
 * One line of the findings table: a divergence speed or a refined damping crossing.
 *
 * @param configuration configuration name
 * @param what plain description, e.g. "divergence", "flutter onset", "damping below limit"
 * @param mode mode (branch) name, or "-" for divergence
 * @param speedEasMps equivalent airspeed (m/s)
 * @param speedTasMps true airspeed (m/s)
 * @param mach Mach number
 * @param altitudeM geometric altitude (m)
 * @param frequencyHz frequency (Hz); 0 for divergence
 * @param remark extra words (threshold, confirmation, method)
 */
public record Finding(
    String configuration,
    String what,
    String mode,
    double speedEasMps,
    double speedTasMps,
    double mach,
    double altitudeM,
    double frequencyHz,
    String remark) {

  /** Knots per metre per second (1 kt = 1852/3600 m/s exactly). */
  public static final double KNOTS_PER_MPS = 3600.0 / 1852.0;

  /** @return equivalent airspeed in knots */
  public double speedEasKnots() {
    return speedEasMps * KNOTS_PER_MPS;
  }
}
