package org.flexmargin.loop;

/**
 * Order of the diagonal [n/n] Padé approximation of a pure delay,
 *
 * <pre>
 *   e^{-s tau} ~ P(-s tau) / P(s tau),   P(x) = sum_{k=0..n} c_k x^k,
 *   c_k = (2n - k)! n! / ((2n)! k! (n - k)!)
 * </pre>
 *
 * (closed form; e.g. Baker &amp; Graves-Morris, <i>Padé Approximants</i>, or Franklin, Powell
 * &amp; Emami-Naeini, <i>Feedback Control of Dynamic Systems</i>, sec. 5.6). The approximation is
 * all-pass (unit gain at every frequency) and its phase error grows with w tau.
 */
public enum PadeOrder {
  /** First order, (1 - s tau/2)/(1 + s tau/2). */
  ORDER_1(1),
  /** Second order. */
  ORDER_2(2),
  /** Third order. */
  ORDER_3(3),
  /** Fourth order. */
  ORDER_4(4),
  /** Fifth order. */
  ORDER_5(5),
  /** Sixth order. */
  ORDER_6(6);

  private final int degree;

  PadeOrder(int degree) {
    this.degree = degree;
  }

  /** @return the polynomial degree n (= number of states of the realisation) */
  public int degree() {
    return degree;
  }

  /**
   * @param degree 1..6
   * @return the order of that degree
   */
  public static PadeOrder ofDegree(int degree) {
    for (PadeOrder o : values()) {
      if (o.degree == degree) {
        return o;
      }
    }
    throw new org.flexmargin.model.InvalidInputException("pade_order", "a degree from 1 to 6",
        String.valueOf(degree));
  }

  /** @return c_0..c_n of the closed form above, ascending powers (c_0 = 1) */
  public double[] coefficients() {
    int n = degree;
    double[] c = new double[n + 1];
    for (int k = 0; k <= n; k++) {
      c[k] = factorial(2 * n - k) * factorial(n)
          / (factorial(2 * n) * factorial(k) * factorial(n - k));
    }
    return c;
  }

  /** @return c_0..c_n as a polynomial in descending powers (index n - k holds c_k), P(x) */
  public double[] descendingCoefficients() {
    double[] c = coefficients();
    double[] p = new double[c.length];
    for (int k = 0; k < c.length; k++) {
      p[degree - k] = c[k];
    }
    return p;
  }

  private static double factorial(int k) {
    double f = 1;
    for (int i = 2; i <= k; i++) {
      f *= i;
    }
    return f;
  }
}
