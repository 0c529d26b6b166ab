package org.flexmargin.lattice;

/**
 * The oscillatory increment of the kernel of the subsonic lifting-surface integral equation, in
 * the form used by the doublet-lattice method (Albano and Rodden, AIAA J. 7(2), 1969; Rodden,
 * Taylor and McIntosh, J. Aircraft 35(5), 1998, whose notation this class follows).
 *
 * <p>For a receiving point at (x0, y0, z0) from a point of a doublet line, with r1 = sqrt(y0^2 +
 * z0^2), beta^2 = 1 - M^2, R = sqrt(x0^2 + beta^2 r1^2), k1 = omega r1 / U and u1 = (M R - x0) /
 * (beta^2 r1), the kernel is exp(-i omega x0 / U) (K1 T1 + K2 T2*) with T1 = cos(gamma_r -
 * gamma_s), T2* = (z0 cos gamma_r - y0 sin gamma_r)(z0 cos gamma_s - y0 sin gamma_s) and
 *
 * <pre>
 *   K1 = -I1 - M r1 exp(-i k1 u1) / (R sqrt(1 + u1^2))
 *   K2 = 3 I2 + i k1 M^2 r1^2 exp(-i k1 u1) / (R^2 sqrt(1 + u1^2))
 *        + M r1 ((1 + u1^2) beta^2 r1^2 / R^2 + 2 + M r1 u1 / R) exp(-i k1 u1) / (R (1 + u1^2)^1.5)
 *   I1 = int_u1^inf exp(-i k1 u) / (1 + u^2)^1.5 du,   3 I2 = int_u1^inf 3 exp(-i k1 u) / (1 + u^2)^2.5 du
 * </pre>
 *
 * The steady values K10 = -1 - x0/R and K20 = 2 + (x0/R)(2 + beta^2 r1^2 / R^2) are subtracted
 * (the steady part is a horseshoe vortex, see {@link InfluenceMatrix}); this class returns the
 * numerators P1 = (K1 e - K10) T1 and P2 = (K2 e - K20) T2*.
 *
 * <p>I1 and I2 follow from integration by parts with 1 - u / sqrt(1 + u^2) approximated by an
 * exponential sum a_n exp(-p_n u), p_n = b 2^n (the form of Laschka, 1963, as used by Rodden et
 * al.). The eleven coefficients here were fitted by least squares to that function over u in
 * [0, 2000] with the sum of a_n fixed to 1; the largest error is 1.2e-4 (see docs/lifting-surfaces.md).
 * For u1 &lt; 0 the integrals follow from I(u1) = 2 Re I(0) - conj(I(-u1)).
 *
 * <p>Stateless; {@link #evaluate} writes into the caller's array.
 */
final class IncrementalKernel {
  /** Base of the exponents p_n = B 2^n, n = 1..11. */
  static final double B = 0.009054814793;

  /** Coefficients a_n of the exponential sum (fitted, see the class comment). */
  static final double[] A = {
    3.4709791142801904e-04, -1.9081066816889480e-04, 3.0755878558512417e-03,
    5.0919999205097932e-03, 3.2498771554542241e-02, 1.0451396103630241e-01,
    4.0901909362797556e-01, 7.9495246711833212e-01, -4.1336065416565071e-01,
    7.2196505392246271e-02, -8.1440195882215155e-03
  };

  private static final double[] P = new double[A.length];

  static {
    double p = B;
    for (int n = 0; n < A.length; n++) {
      p *= 2;
      P[n] = p;
    }
  }

  private IncrementalKernel() {}

  /** @return the exponential-sum approximation of 1 - u / sqrt(1 + u^2) for u &gt;= 0 */
  static double approximation(double u) {
    double s = 0;
    for (int n = 0; n < A.length; n++) {
      s += A[n] * Math.exp(-P[n] * u);
    }
    return s;
  }

  /**
   * Writes I1 and 3 I2 at (u1, k1) into {@code out} as {re I1, im I1, re 3I2, im 3I2}.
   *
   * @param u1 lower limit (any sign)
   * @param k1 omega r1 / U (dimensionless), &gt;= 0
   * @param out length &gt;= 8 (the last four are scratch), modified
   */
  static void integrals(double u1, double k1, double[] out) {
    double k2 = k1 * k1;
    if (u1 >= 0) {
      integralsNonNegative(u1, k1, k2, out, 0);
      return;
    }
    integralsNonNegative(0, k1, k2, out, 4);
    integralsNonNegative(-u1, k1, k2, out, 0);
    out[0] = 2 * out[4] - out[0];
    out[2] = 2 * out[6] - out[2];
  }

  private static void integralsNonNegative(double u1, double k1, double k2, double[] out, int at) {
    // sums S1 = sum a_n e^{-p_n u1} / c_n and S2 = sum a_n e^{-p_n u1} (c_n u1 + 1) / c_n^2,
    // c_n = p_n + i k1
    double s1r = 0, s1i = 0, s2r = 0, s2i = 0;
    double e = u1 == 0 ? 1 : Math.exp(-P[0] * u1);
    for (int n = 0; n < A.length; n++) {
      if (n > 0) {
        e *= e; // p_n = 2 p_(n-1)
      }
      if (e < 1e-300) {
        break;
      }
      double p = P[n];
      double inv = 1 / (p * p + k2);
      double w = A[n] * e;
      // 1/c = (p - i k) / d
      double ir = p * inv, ii = -k1 * inv;
      s1r += w * ir;
      s1i += w * ii;
      // (c u1 + 1)/c^2 = u1/c + 1/c^2
      s2r += w * (u1 * ir + ir * ir - ii * ii);
      s2i += w * (u1 * ii + 2 * ir * ii);
    }
    double q = Math.sqrt(1 + u1 * u1);
    double f = 1 - u1 / q;
    // I1 = e^{-i k1 u1} [f - i k1 S1]
    double br = f + k1 * s1i, bi = -k1 * s1r;
    // 3 I2 = e^{-i k1 u1} [(2 + i k1 u1) f - u1/(1+u1^2)^1.5 - i k1 S1 + k1^2 S2]
    double cr = 2 * f - u1 / (q * q * q) + k1 * s1i + k2 * s2r;
    double ci = k1 * u1 * f - k1 * s1r + k2 * s2i;
    if (u1 == 0) {
      out[at] = br;
      out[at + 1] = bi;
      out[at + 2] = cr;
      out[at + 3] = ci;
      return;
    }
    double cs = Math.cos(k1 * u1), sn = -Math.sin(k1 * u1);
    out[at] = br * cs - bi * sn;
    out[at + 1] = br * sn + bi * cs;
    out[at + 2] = cr * cs - ci * sn;
    out[at + 3] = cr * sn + ci * cs;
  }

  /**
   * Evaluates the incremental kernel numerators at one point.
   *
   * @param x0 streamwise distance of the receiving point behind the sending point (m)
   * @param yl lateral offset of the receiving point in the sending box's plane (m)
   * @param zl offset of the receiving point normal to the sending box's plane (m)
   * @param cosDg cos(gamma_r - gamma_s), the dihedral difference of receiving and sending box
   * @param sinDg sin(gamma_r - gamma_s)
   * @param omegaOverU omega / U (rad/m)
   * @param mach Mach number in [0, 1)
   * @param out length &gt;= 8: {re P1, im P1, re P2, im P2} then scratch; modified
   */
  static void evaluate(
      double x0, double yl, double zl, double cosDg, double sinDg, double omegaOverU, double mach,
      double[] out) {
    double r1sq = yl * yl + zl * zl;
    double r1 = Math.sqrt(r1sq);
    double ex = Math.cos(omegaOverU * x0), ey = -Math.sin(omegaOverU * x0);
    if (r1 <= 1e-12 * Math.abs(x0) || r1 == 0) {
      // on the doublet line's own streamline: K1 -> -2 behind it, 0 ahead; T2* = 0
      if (x0 > 0) {
        out[0] = -2 * (ex - 1) * cosDg;
        out[1] = -2 * ey * cosDg;
      } else {
        out[0] = 0;
        out[1] = 0;
      }
      out[2] = 0;
      out[3] = 0;
      return;
    }
    double beta2 = 1 - mach * mach;
    double r = Math.sqrt(x0 * x0 + beta2 * r1sq);
    double k1 = omegaOverU * r1;
    double u1 = (mach * r - x0) / (beta2 * r1);
    integrals(u1, k1, out);
    double i1r = out[0], i1i = out[1], i2r = out[2], i2i = out[3];
    double q2 = 1 + u1 * u1;
    double q = Math.sqrt(q2);
    // e^{-i k1 u1}
    double er = Math.cos(k1 * u1), ei = -Math.sin(k1 * u1);
    double mr = mach * r1 / r;
    double k1r = -i1r - mr * er / q;
    double k1i = -i1i - mr * ei / q;
    double t = mach * mach * r1sq / (r * r);
    double bracket = q2 * beta2 * r1sq / (r * r) + 2 + mach * r1 * u1 / r;
    double g = mr * bracket / (q2 * q);
    // i k1 t e / q = (k1 t / q) * (i er - ei)
    double k2r = i2r - k1 * t / q * ei + g * er;
    double k2i = i2i + k1 * t / q * er + g * ei;
    double k10 = -1 - x0 / r;
    double k20 = 2 + x0 / r * (2 + beta2 * r1sq / (r * r));
    double t2 = zl * (-yl * sinDg + zl * cosDg);
    out[0] = (k1r * ex - k1i * ey - k10) * cosDg;
    out[1] = (k1r * ey + k1i * ex) * cosDg;
    out[2] = (k2r * ex - k2i * ey - k20) * t2;
    out[3] = (k2r * ey + k2i * ex) * t2;
  }
}
