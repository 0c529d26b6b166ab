package org.flexmargin.model;

/**
 * Second-order notch N(s) = (s^2 + 2 zeta_z w s + w^2) / (s^2 + 2 zeta_p w s + w^2), w = 2 pi
 * centreHz. Its gain at the centre is zeta_z / zeta_p (common practice; e.g. 0.05/0.5 gives
 * -20 dB).
 *
 * @param centreHz centre frequency (Hz)
 * @param numeratorDampingRatio zeta_z (dimensionless), &gt;= 0
 * @param denominatorDampingRatio zeta_p (dimensionless), &gt; zeta_z for a notch
 */
public record NotchFilterSpec(double centreHz, double numeratorDampingRatio, double denominatorDampingRatio)
    implements FilterSpec {
  /** Validates. */
  public NotchFilterSpec {
    Checks.positive("centre_hz", centreHz);
    Checks.inRange("numerator_damping_ratio", numeratorDampingRatio, 0.0, 10.0);
    Checks.inRange("denominator_damping_ratio", denominatorDampingRatio, 1e-6, 10.0);
  }

  /** @return depth at the centre, 20 log10(zeta_z / zeta_p) (dB); -infinity for zeta_z = 0 */
  public double depthDb() {
    return 20 * Math.log10(numeratorDampingRatio / denominatorDampingRatio);
  }
}
