package org.flexmargin.aero;

import org.apache.commons.math3.complex.Complex;

/**
 * Theodorsen's function C(k) = F(k) + i G(k) of the reduced frequency k = &omega; b / V, the lift
 * deficiency of a thin aerofoil in harmonic motion in incompressible flow.
 *
 * <p>T. Theodorsen, "General Theory of Aerodynamic Instability and the Mechanism of Flutter", NACA
 * Report No. 496 (1935):
 *
 * <pre>
 *   C(k) = H1(k) / (H1(k) + i H0(k)),   Hn = Jn - i Yn  (Hankel functions of the second kind)
 * </pre>
 *
 * Written with the real Bessel functions of {@link Bessel}, with a = J1 + Y0 and b = J0 &minus;
 * Y1:
 *
 * <pre>
 *   F = (J1 a - Y1 b) / (a^2 + b^2),   G = -(J1 J0 + Y1 Y0) / (a^2 + b^2)
 * </pre>
 *
 * (the form tabulated by Bisplinghoff, Ashley and Halfman, <i>Aeroelasticity</i>, 1955, Table
 * 5-1). Numerator and denominator are scaled by max(|a|, |b|) so that the 1/k growth of Y1 at small
 * k cannot overflow.
 *
 * <p>Limits: C(0) = 1 exactly and C(+&infin;) = 1/2 exactly. For 0 &lt; k &lt; 1e-12 the
 * small-k form C &asymp; 1 &minus; &pi;k/2 + i k (ln(k/2) + &gamma;) is used (from A&amp;S 9.1.8,
 * 9.1.13 and 9.1.11; the neglected terms are O(k<sup>2</sup> ln<sup>2</sup> k) &lt; 1e-21). For
 * large k, C &asymp; 1/2 &minus; i/(8k).
 *
 * <p>Stateless and thread-safe; {@link #evaluate(double, double[])} allocates nothing.
 */
public final class Theodorsen {
  /** Below this k the two-term small-k expansion is exact to double precision. */
  private static final double SMALL_K = 1e-12;

  private Theodorsen() {}

  /**
   * Writes F(k) and G(k) into {@code fg}.
   *
   * @param reducedFrequency k &ge; 0 (dimensionless); +&infin; gives the limit 1/2
   * @param fg output, length &ge; 2: {@code fg[0] = F}, {@code fg[1] = G}. Modified.
   * @throws IllegalArgumentException if k is negative or NaN, or {@code fg} is too short
   */
  public static void evaluate(double reducedFrequency, double[] fg) {
    double k = reducedFrequency;
    if (!(k >= 0)) {
      throw new IllegalArgumentException("reduced frequency must be >= 0, found " + k);
    }
    if (fg == null || fg.length < 2) {
      throw new IllegalArgumentException("output array needs length >= 2");
    }
    if (k == 0.0) {
      fg[0] = 1.0;
      fg[1] = 0.0;
      return;
    }
    if (k == Double.POSITIVE_INFINITY) {
      fg[0] = 0.5;
      fg[1] = 0.0;
      return;
    }
    if (k < SMALL_K) {
      fg[0] = 1.0 - 0.5 * Math.PI * k;
      fg[1] = k * (Math.log(0.5 * k) + Bessel.EULER_GAMMA);
      return;
    }
    Bessel.evaluate(0, k, fg);
    double j0 = fg[0];
    double y0 = fg[1];
    Bessel.evaluate(1, k, fg);
    double j1 = fg[0];
    double y1 = fg[1];
    double a = j1 + y0;
    double b = j0 - y1;
    double scale = Math.max(Math.abs(a), Math.abs(b));
    a /= scale;
    b /= scale;
    double j0s = j0 / scale;
    double j1s = j1 / scale;
    double y0s = y0 / scale;
    double y1s = y1 / scale;
    double denominator = a * a + b * b;
    fg[0] = (j1s * a - y1s * b) / denominator;
    fg[1] = -(j1s * j0s + y1s * y0s) / denominator;
  }

  /**
   * Convenience form of {@link #evaluate(double, double[])}.
   *
   * @param reducedFrequency k &ge; 0 (dimensionless)
   * @return C(k) = F + i G
   */
  public static Complex value(double reducedFrequency) {
    double[] fg = new double[2];
    evaluate(reducedFrequency, fg);
    return new Complex(fg[0], fg[1]);
  }
}
