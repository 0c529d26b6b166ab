package org.flexmargin.loop;

/**
 * A single-input single-output frequency function F(j w), for example a broken-loop response
 * L(j w) computed directly in the frequency domain, a measured frequency response, or a {@link
 * LinearBlock}. Implementations need not be thread-safe unless they say so.
 */
@FunctionalInterface
public interface SisoFrequencyFunction {
  /**
   * Evaluates F(j w).
   *
   * @param omegaRadPerS frequency w, rad/s (&gt;= 0)
   * @param reIm receives Re F in [0] and Im F in [1]
   */
  void response(double omegaRadPerS, double[] reIm);

  /**
   * @param omegaRadPerS frequency, rad/s
   * @return |F(j w)|
   */
  default double magnitude(double omegaRadPerS) {
    double[] v = new double[2];
    response(omegaRadPerS, v);
    return Math.hypot(v[0], v[1]);
  }

  /**
   * @param omegaRadPerS frequency, rad/s
   * @return arg F(j w), rad, in (-pi, pi]
   */
  default double phaseRad(double omegaRadPerS) {
    double[] v = new double[2];
    response(omegaRadPerS, v);
    return Math.atan2(v[1], v[0]);
  }
}
