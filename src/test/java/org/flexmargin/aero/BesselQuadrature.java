package org.flexmargin.aero;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;

/**
 * Independent reference values of J_n and Y_n (n = 0, 1) by Commons Math Gauss-Legendre quadrature
 * of the integral representations, for the tests only.
 *
 * <ul>
 *   <li>Bessel's integral, A&amp;S 9.1.21: J_n(x) = (1/pi) int_0^pi cos(n t - x sin t) dt.
 *   <li>A&amp;S 9.1.22: Y_n(x) = (1/pi) int_0^pi sin(x sin t - n t) dt - (1/pi) int_0^inf (e^{n t}
 *       + (-1)^n e^{-n t}) e^{-x sinh t} dt.
 * </ul>
 *
 * The ranges are cut into pieces short against one oscillation (or one decay length), and each
 * piece is integrated by an iterative 8-point Gauss-Legendre rule to a relative accuracy of 1e-14
 * or an absolute accuracy of 1e-15.
 * The infinite range is truncated where x sinh t exceeds 45 e^2, i.e. the neglected tail is below
 * e^{-300}.
 */
final class BesselQuadrature {
  private BesselQuadrature() {}

  /** @return J_n(x) by A&amp;S 9.1.21 */
  static double j(int n, double x) {
    return integrate(t -> Math.cos(n * t - x * Math.sin(t)), 0.0, Math.PI, pieces(x)) / Math.PI;
  }

  /** @return Y_n(x) by A&amp;S 9.1.22 */
  static double y(int n, double x) {
    double oscillatory =
        integrate(t -> Math.sin(x * Math.sin(t) - n * t), 0.0, Math.PI, pieces(x));
    double sign = (n % 2 == 0) ? 1.0 : -1.0;
    double upper = asinh(45.0 / x) + 2.0;
    int count = (int) Math.ceil(upper / 0.25);
    double decaying =
        integrate(
            t -> (Math.exp(n * t) + sign * Math.exp(-n * t)) * Math.exp(-x * Math.sinh(t)),
            0.0,
            upper,
            count);
    return (oscillatory - decaying) / Math.PI;
  }

  private static int pieces(double x) {
    return Math.max(8, (int) Math.ceil(2.0 * x));
  }

  private static double asinh(double v) {
    return Math.log(v + Math.sqrt(v * v + 1.0));
  }

  private static double integrate(UnivariateFunction f, double lo, double hi, int count) {
    // one integrator per call: it keeps its evaluation count and function, so it is not shared
    // between tests that run at the same time
    IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(8, 1e-14, 1e-15);
    double h = (hi - lo) / count;
    double sum = 0.0;
    for (int i = 0; i < count; i++) {
      sum += integrator.integrate(1_000_000, f, lo + i * h, lo + (i + 1) * h);
    }
    return sum;
  }
}
