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
  /** p_n^2. */
  private static final double[] PP = new double[A.length];

  static {
    double p = B;
    for (int n = 0; n < A.length; n++) {
      p *= 2;
      P[n] = p;
      PP[n] = p * p;
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
    double[] s = new double[SUMS + A.length];
    boolean negative = u1 < 0;
    double u = Math.abs(u1);
    sums(u, k1, true, negative, s);
    double q = Math.sqrt(1 + u * u);
    double f = 1 - u / q;
    double er = Math.cos(k1 * u1), ei = -Math.sin(k1 * u1);
    bracket1(u, k1, f, s, 0, out, 4);
    bracket2(u, k1, f, q, s, 0, out, 6);
    if (!negative) {
      // I = e^{-i k1 u1} B(u1)
      mulInto(er, ei, out[4], out[5], out, 0);
      mulInto(er, ei, out[6], out[7], out, 2);
      return;
    }
    // I(u1) = 2 Re I(0) - e^{-i k1 u1} conj(B(|u1|))
    mulInto(er, ei, -out[4], out[5], out, 0);
    mulInto(er, ei, -out[6], out[7], out, 2);
    double[] zero = new double[4];
    bracket1(0, k1, 1, s, 4, zero, 0);
    bracket2(0, k1, 1, 1, s, 4, zero, 2);
    out[0] += 2 * zero[0];
    out[2] += 2 * zero[2];
  }

  /** Length of the sums array of {@link #sums}. */
  private static final int SUMS = 8;

  /**
   * The exponential sums S1(u) = sum a_n e^{-p_n u} / c_n and S2(u) = sum a_n e^{-p_n u} (c_n u +
   * 1) / c_n^2, c_n = p_n + i k1, at u (entries 0..3: re S1, im S1, re S2, im S2) and, if asked, at
   * 0 (entries 4..7). Terms whose exponential is below 1e-18 are left out when u alone is asked
   * (their share is below 1e-16, far under the 1.2e-4 error of the sum itself). The reciprocals
   * 1 / (p_n^2 + k1^2) come from one division and running products (entries 8..18 are scratch).
   */
  private static void sums(double u, double k1, boolean second, boolean atZero, double[] s) {
    double k2 = k1 * k1;
    reciprocals(k2, s, SUMS);
    double s1r = 0, s1i = 0, s2r = 0, s2i = 0, z1r = 0, z1i = 0, z2r = 0, z2i = 0;
    double e = Math.exp(-P[0] * u);
    for (int n = 0; n < A.length; n++) {
      if (n > 0) {
        e *= e; // p_n = 2 p_(n-1)
      }
      if (!atZero && e < 1e-18) {
        break;
      }
      double p = P[n];
      double inv = s[SUMS + n];
      // 1/c = (p - i k) / (p^2 + k^2)
      double ir = p * inv, ii = -k1 * inv;
      double w = A[n] * e;
      s1r += w * ir;
      s1i += w * ii;
      double jr = ir * ir - ii * ii, ji = 2 * ir * ii; // 1/c^2
      if (second) {
        // (c u + 1)/c^2 = u/c + 1/c^2
        s2r += w * (u * ir + jr);
        s2i += w * (u * ii + ji);
      }
      if (atZero) {
        z1r += A[n] * ir;
        z1i += A[n] * ii;
        z2r += A[n] * jr;
        z2i += A[n] * ji;
      }
    }
    s[0] = s1r; s[1] = s1i; s[2] = s2r; s[3] = s2i;
    s[4] = z1r; s[5] = z1i; s[6] = z2r; s[7] = z2i;
  }

  /**
   * Writes 1 / (p_n^2 + k2) for n = 0..10 to {@code r[at + n]}: the running products d_0 ... d_n,
   * one reciprocal of the last, then back substitution (the products stay within 1e-6 and 1e120
   * for k2 up to 1e10; beyond that, plain divisions).
   */
  private static void reciprocals(double k2, double[] r, int at) {
    int m = A.length;
    if (k2 > 1e10) {
      for (int n = 0; n < m; n++) {
        r[at + n] = 1 / (PP[n] + k2);
      }
      return;
    }
    double prod = 1;
    for (int n = 0; n < m; n++) {
      prod *= PP[n] + k2;
      r[at + n] = prod;
    }
    double inv = 1 / prod;
    for (int n = m - 1; n > 0; n--) {
      double dn = PP[n] + k2;
      r[at + n] = inv * r[at + n - 1];
      inv *= dn;
    }
    r[at] = inv;
  }

  /** B1(u) = f - i k1 S1, with I1 = e^{-i k1 u} B1 for u &gt;= 0; S1 at {@code s[at]}. */
  private static void bracket1(double u, double k1, double f, double[] s, int at, double[] out, int to) {
    out[to] = f + k1 * s[at + 1];
    out[to + 1] = -k1 * s[at];
  }

  /**
   * B2(u) = (2 + i k1 u) f - u / (1 + u^2)^1.5 - i k1 S1 + k1^2 S2, with 3 I2 = e^{-i k1 u} B2 for
   * u &gt;= 0; S1, S2 at {@code s[at]}; q = sqrt(1 + u^2).
   */
  private static void bracket2(
      double u, double k1, double f, double q, double[] s, int at, double[] out, int to) {
    double k2 = k1 * k1;
    out[to] = 2 * f - u / (q * q * q) + k1 * s[at + 1] + k2 * s[at + 2];
    out[to + 1] = k1 * u * f - k1 * s[at] + k2 * s[at + 3];
  }

  private static void mulInto(double ar, double ai, double br, double bi, double[] out, int to) {
    out[to] = ar * br - ai * bi;
    out[to + 1] = ar * bi + ai * br;
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
   * @param phaseRe cos(omega x0 / U), the real part of exp(-i omega x0 / U), supplied by the caller
   *     (who can update it from point to point without a sine and cosine)
   * @param phaseIm -sin(omega x0 / U)
   * @param out length &gt;= 24: {re P1, im P1, re P2, im P2} then scratch; modified
   */
  static void evaluate(
      double x0, double yl, double zl, double cosDg, double sinDg, double omegaOverU, double mach,
      double phaseRe, double phaseIm, double[] out) {
    double r1sq = yl * yl + zl * zl;
    double r1 = Math.sqrt(r1sq);
    double xr = phaseRe, xi = phaseIm;
    if (r1 <= 1e-12 * Math.abs(x0) || r1 == 0) {
      // on the doublet line's own streamline: K1 -> -2 behind it, 0 ahead; T2* = 0
      if (x0 > 0) {
        out[0] = -2 * (xr - 1) * cosDg;
        out[1] = -2 * xi * cosDg;
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
    double invB = 1 / (beta2 * r1), invR = 1 / r;
    double u1 = (mach * r - x0) * invB;
    // sqrt(1 + u1^2) = (R - M x0) / (beta^2 r1) exactly (docs/lifting-surfaces.md)
    double q = (r - mach * x0) * invB;
    double q2 = q * q;
    double t2 = zl * (-yl * sinDg + zl * cosDg);
    boolean second = t2 != 0;
    boolean negative = u1 < 0;
    double u = Math.abs(u1);
    sums(u, k1, second, negative, out);
    double f = 1 - u / q;
    // E X = exp(-i (k1 u1 + omega x0 / U))
    double er = Math.cos(k1 * u1), ei = -Math.sin(k1 * u1);
    double exr = er * xr - ei * xi, exi = er * xi + ei * xr;
    double mr = mach * r1 * invR;
    double k10 = -1 - x0 * invR;
    // K1 X = c X + E X W with (u1 >= 0) c = 0, W = -(B1 + M r1 / (R q));
    // (u1 < 0) c = -2 Re B1(0), W = conj(B1(|u1|)) - M r1 / (R q)
    bracket1(u, k1, f, out, 0, out, 20);
    double wr, wi, c = 0;
    if (negative) {
      wr = out[20] - mr / q;
      wi = -out[21];
      c = -2 * (1 + k1 * out[5]);
    } else {
      wr = -(out[20] + mr / q);
      wi = -out[21];
    }
    double re1 = c * xr + exr * wr - exi * wi - k10;
    double im1 = c * xi + exr * wi + exi * wr;
    if (!second) {
      out[0] = re1 * cosDg;
      out[1] = im1 * cosDg;
      out[2] = 0;
      out[3] = 0;
      return;
    }
    // K2 X = c X + E X W with W = (+-) B2 + g + i k1 M^2 r1^2 / (R^2 q), c = 2 Re B2(0) if u1 < 0
    double t = mach * mach * r1sq / (r * r);
    double g = mr * (q2 * beta2 * r1sq / (r * r) + 2 + mach * r1 * u1 / r) / (q2 * q);
    bracket2(u, k1, f, q, out, 0, out, 22);
    double vr, vi, c2 = 0;
    if (negative) {
      vr = -out[22] + g;
      vi = out[23] + k1 * t / q;
      double k2 = k1 * k1;
      c2 = 2 * (2 + k1 * out[5] + k2 * out[6]);
    } else {
      vr = out[22] + g;
      vi = out[23] + k1 * t / q;
    }
    double k20 = 2 + x0 / r * (2 + beta2 * r1sq / (r * r));
    out[0] = re1 * cosDg;
    out[1] = im1 * cosDg;
    out[2] = (c2 * xr + exr * vr - exi * vi - k20) * t2;
    out[3] = (c2 * xi + exr * vi + exi * vr) * t2;
  }
}
