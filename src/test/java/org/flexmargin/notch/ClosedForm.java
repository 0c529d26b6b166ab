package org.flexmargin.notch;

import org.flexmargin.loop.SisoFrequencyFunction;

/** Closed-form responses written out independently of the project's filter classes, for tests. */
final class ClosedForm {
  private ClosedForm() {}

  /**
   * N(j w) = (wn^2 - w^2 + 2j zz wn w) / (wn^2 - w^2 + 2j zp wn w), wn = 2 pi f_c.
   *
   * @return {|N|, arg N in rad} (arg as the difference of the two atan2 angles, unwrapped)
   */
  static double[] notch(double centreHz, double zetaZ, double zetaP, double omega) {
    double wn = 2 * Math.PI * centreHz;
    double re = wn * wn - omega * omega;
    double a = Math.atan2(2 * zetaZ * wn * omega, re);
    double b = Math.atan2(2 * zetaP * wn * omega, re);
    double mag = Math.hypot(re, 2 * zetaZ * wn * omega) / Math.hypot(re, 2 * zetaP * wn * omega);
    return new double[] {mag, a - b};
  }

  /** @return a frequency function of constant value re + j im */
  static SisoFrequencyFunction constant(double re, double im) {
    return (w, out) -> {
      out[0] = re;
      out[1] = im;
    };
  }

  /** @return F(j w) = c (j w)^n for n = 1 (c j w) or n = -1 (-j c / w) */
  static SisoFrequencyFunction power(double c, int n) {
    return (w, out) -> {
      out[0] = 0;
      out[1] = n > 0 ? c * w : -c / w;
    };
  }
}
