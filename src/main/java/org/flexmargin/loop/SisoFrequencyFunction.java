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
   * The pure (transport) delay contained in F, whose phase -w tau a frequency grid must follow:
   * {@link LoopMargins} keeps the turn w tau below pi per grid interval and unwraps the phase of
   * F e^{j w tau}, so no turn of the delay is lost however long it is.
   *
   * @return tau, s (&gt;= 0); 0 when F has no delay or does not know it
   */
  default double pureDelayS() {
    return 0.0;
  }

  /**
   * Poles of F known to the function itself, used only to place frequency-grid points around
   * lightly damped resonances (a {@link LinearBlock} gives the eigenvalues of its state space).
   *
   * @return the poles; {@link Eigenvalues#none()} when unknown
   */
  default Eigenvalues knownPoles() {
    return Eigenvalues.none();
  }

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
