package org.flexmargin.structure;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Free-vibration modes of a uniform clamped-free (cantilever) Euler-Bernoulli beam of length L:
 * {@code phi_n(y) = cosh(beta_n y) - cos(beta_n y) - sigma_n (sinh(beta_n y) - sin(beta_n y))},
 * {@code sigma_n = (cosh(beta_n L) + cos(beta_n L)) / (sinh(beta_n L) + sin(beta_n L))}, where
 * beta_n L is the n-th positive root of {@code cos(x) cosh(x) = -1} (Blevins, <i>Formulas for
 * Natural Frequency and Mode Shape</i>, table 8-1; Timoshenko, <i>Vibration Problems in
 * Engineering</i>). With this normalisation phi_n(L) = +/-2 and the integral of phi_m phi_n over
 * [0, L] is L delta_mn.
 *
 * <p>The roots are found by Brent's method on the overflow-free equivalent
 * {@code cos(x) + 1 / cosh(x) = 0}, whose n-th root lies in ((n - 1) pi, n pi). The functions
 * are evaluated in a form without cancellation at large beta y: cosh(x) - sigma sinh(x) is
 * written as {@code (1 + sigma)/2 e^-x + (1 - sigma)/2 e^x} with 1 - sigma computed from
 * exponentially small terms, so any number of functions can be used.
 */
final class ClampedFreeBeamFunctions {
  private final double lengthM;
  private final double[] betaPerM;
  private final double[] onePlusSigmaHalf;
  private final double[] oneMinusSigmaHalfTimesExpBetaL;

  /**
   * @param lengthM beam length L (m), &gt; 0
   * @param count number of functions, &gt;= 1
   */
  ClampedFreeBeamFunctions(double lengthM, int count) {
    this.lengthM = lengthM;
    betaPerM = new double[count];
    onePlusSigmaHalf = new double[count];
    oneMinusSigmaHalfTimesExpBetaL = new double[count];
    for (int n = 0; n < count; n++) {
      double bl = rootBetaL(n + 1);
      betaPerM[n] = bl / lengthM;
      double e = Math.exp(-bl);
      // sigma = (cosh + cos)/(sinh + sin); multiply numerator and denominator by 2 e^-bl.
      double den = 1 - e * e + 2 * Math.sin(bl) * e;
      double sigma = (1 + e * e + 2 * Math.cos(bl) * e) / den;
      // 1 - sigma = (sinh + sin - cosh - cos)/(sinh + sin) = 2 e^-bl (sin - cos - e^-bl) / den
      double oneMinusSigmaTimesExp = 2 * (Math.sin(bl) - Math.cos(bl) - e) / den;
      onePlusSigmaHalf[n] = 0.5 * (1 + sigma);
      oneMinusSigmaHalfTimesExpBetaL[n] = 0.5 * oneMinusSigmaTimesExp;
    }
  }

  /**
   * The n-th positive root of {@code cos(x) cosh(x) = -1}, i.e. beta_n L of the cantilever
   * (1.8751, 4.6941, 7.8548, ...), by Brent's method to about 1e-15 relative.
   *
   * @param n root number, &gt;= 1
   * @return beta_n L (dimensionless)
   */
  static double rootBetaL(int n) {
    if (n < 1) {
      throw new IllegalArgumentException("root number must be >= 1, got " + n);
    }
    BrentSolver solver = new BrentSolver(1e-15, 1e-15);
    return solver.solve(200, x -> Math.cos(x) + 1 / Math.cosh(x), (n - 1) * Math.PI, n * Math.PI);
  }

  /** @return number of functions */
  int count() {
    return betaPerM.length;
  }

  /**
   * @param n function index from 0
   * @return beta_n (1/m)
   */
  double betaPerM(int n) {
    return betaPerM[n];
  }

  /**
   * @param n function index from 0
   * @param yM span station in [0, L] (m)
   * @return phi_n(y) (dimensionless)
   */
  double value(int n, double yM) {
    double x = betaPerM[n] * yM;
    double sigma = 2 * onePlusSigmaHalf[n] - 1;
    return hyperbolicEven(n, x) - Math.cos(x) + sigma * Math.sin(x);
  }

  /**
   * @param n function index from 0
   * @param yM span station in [0, L] (m)
   * @return phi_n'(y) (1/m)
   */
  double slope(int n, double yM) {
    double x = betaPerM[n] * yM;
    double sigma = 2 * onePlusSigmaHalf[n] - 1;
    return betaPerM[n] * (hyperbolicOdd(n, x) + Math.sin(x) + sigma * Math.cos(x));
  }

  /**
   * @param n function index from 0
   * @param yM span station in [0, L] (m)
   * @return phi_n''(y) (1/m^2)
   */
  double curvature(int n, double yM) {
    double x = betaPerM[n] * yM;
    double sigma = 2 * onePlusSigmaHalf[n] - 1;
    double b = betaPerM[n];
    return b * b * (hyperbolicEven(n, x) + Math.cos(x) - sigma * Math.sin(x));
  }

  /** cosh(x) - sigma sinh(x) = (1 + sigma)/2 e^-x + (1 - sigma)/2 e^x. */
  private double hyperbolicEven(int n, double x) {
    double bl = betaPerM[n] * lengthM;
    return onePlusSigmaHalf[n] * Math.exp(-x)
        + oneMinusSigmaHalfTimesExpBetaL[n] * Math.exp(x - bl);
  }

  /** sinh(x) - sigma cosh(x) = -(1 + sigma)/2 e^-x + (1 - sigma)/2 e^x. */
  private double hyperbolicOdd(int n, double x) {
    double bl = betaPerM[n] * lengthM;
    return -onePlusSigmaHalf[n] * Math.exp(-x)
        + oneMinusSigmaHalfTimesExpBetaL[n] * Math.exp(x - bl);
  }
}
