package org.flexmargin.simulate;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Sinusoidal-input describing functions N = (first harmonic of the output) / (input amplitude),
 * as a complex gain {re, im}, of the two actuator nonlinearities.
 *
 * <p>Saturation at +/-a with input A sin(theta), A &gt; a: N = (2/pi) (asin(a/A) + (a/A) sqrt(1 -
 * (a/A)^2)), real (Gelb &amp; Vander Velde, <i>Multiple-Input Describing Functions and Nonlinear
 * System Design</i>, McGraw-Hill 1968, ch. 2).
 *
 * <p>Rate limiter with limit R and input A sin(omega t), r = omega_on / omega, omega_on = R / A
 * (an ideal limiter: the output follows the input while it can and otherwise moves at R toward
 * it). For r &gt;= 1, N = 1. For r &lt; 1 the steady output follows the input from theta_1 to
 * theta_2 = acos(-r) and then ramps at slope -A r (per radian of theta) until it meets the input
 * again at theta_1 + pi, where theta_1 solves sin theta_1 + sin theta_2 = r (theta_1 + pi -
 * theta_2) (derived from the half-wave symmetry). When no such theta_1 exists (r &lt;=
 * 1/sqrt(1 + pi^2/4) = 0.537, omega &gt;= 1.862 omega_on) the output is a triangle wave with
 * peaks where the input crosses it, and N = (4/pi) r e^{-j acos(pi r / 2)} (Duda, "Prediction of
 * pilot-in-the-loop oscillations due to rate saturation", J. Guidance, Control and Dynamics
 * 20(3):581-587, 1997). The first harmonic is integrated in closed form over the two pieces in
 * both cases. Stateless.
 */
public final class DescribingFunctions {
  /** r below which the rate-limiter output is a pure triangle wave: 1 / sqrt(1 + pi^2 / 4). */
  public static final double TRIANGLE_ONSET_RATIO = 1 / Math.sqrt(1 + Math.PI * Math.PI / 4);

  private DescribingFunctions() {}

  /**
   * @param amplitude input amplitude A (&gt; 0)
   * @param limit saturation level a (&gt; 0), same unit
   * @return N (real, 0 &lt; N &lt;= 1)
   */
  public static double saturation(double amplitude, double limit) {
    if (amplitude <= limit) {
      return 1.0;
    }
    double x = limit / amplitude;
    return 2 / Math.PI * (Math.asin(x) + x * Math.sqrt(1 - x * x));
  }

  /**
   * @param onsetRatio r = R / (A omega) (&gt; 0)
   * @return N as {re, im}; the phase is a lag (im &lt;= 0)
   */
  public static double[] rateLimiter(double onsetRatio) {
    double r = onsetRatio;
    if (r >= 1) {
      return new double[] {1.0, 0.0};
    }
    double theta1;
    double theta2;
    if (r <= TRIANGLE_ONSET_RATIO) {
      // triangle: the ramp runs from the peak theta_p (input falling through it) for half a period
      theta2 = Math.PI - Math.asin(Math.PI * r / 2);
      theta1 = theta2;
    } else {
      theta2 = Math.acos(-r);
      double t2 = theta2;
      theta1 = new BrentSolver(1e-15, 1e-15).solve(200,
          t1 -> Math.sin(t1) + Math.sin(t2) - r * (t1 + Math.PI - t2), Math.acos(r), t2);
    }
    // first harmonic over the half period [theta1, theta1 + pi] (half-wave symmetry: times 2/pi)
    double b1 = 0;
    double a1 = 0;
    // follow: y = sin(theta) (unit amplitude)
    b1 += (theta2 - theta1) / 2 - (Math.sin(2 * theta2) - Math.sin(2 * theta1)) / 4;
    a1 += (sq(Math.sin(theta2)) - sq(Math.sin(theta1))) / 2;
    // ramp: y = c0 + c1 theta with c1 = -r, c0 = sin(theta2) + r theta2
    double c1 = -r;
    double c0 = Math.sin(theta2) + r * theta2;
    double e = theta1 + Math.PI;
    b1 += rampSin(c0, c1, e) - rampSin(c0, c1, theta2);
    a1 += rampCos(c0, c1, e) - rampCos(c0, c1, theta2);
    return new double[] {2 / Math.PI * b1, 2 / Math.PI * a1};
  }

  /** Antiderivative of (c0 + c1 t) sin t. */
  private static double rampSin(double c0, double c1, double t) {
    return -c0 * Math.cos(t) + c1 * (Math.sin(t) - t * Math.cos(t));
  }

  /** Antiderivative of (c0 + c1 t) cos t. */
  private static double rampCos(double c0, double c1, double t) {
    return c0 * Math.sin(t) + c1 * (Math.cos(t) + t * Math.sin(t));
  }

  private static double sq(double x) {
    return x * x;
  }
}
