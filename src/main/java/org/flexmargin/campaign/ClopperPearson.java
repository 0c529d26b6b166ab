package org.flexmargin.campaign;

import org.apache.commons.math3.special.Gamma;

/**
 * The Clopper-Pearson ("exact") confidence interval of a binomial proportion (Clopper and Pearson,
 * Biometrika 26, 1934): with k successes in n trials, the lower bound p_L solves
 * P(X &gt;= k | p_L) = alpha / 2 (0 when k = 0) and the upper bound p_U solves
 * P(X &lt;= k | p_U) = alpha / 2 (1 when k = n), X binomial(n, p). Both are found by bisection on
 * the binomial tail sums (log-space terms), independently of the incomplete beta function.
 */
public final class ClopperPearson {
  private ClopperPearson() {}

  /**
   * Interval of a proportion.
   *
   * @param low lower bound
   * @param high upper bound
   */
  public record Interval(double low, double high) {}

  /**
   * @param successes k, 0 &lt;= k &lt;= n
   * @param trials n &gt;= 1
   * @param confidence two-sided confidence level in (0, 1), e.g. 0.95
   * @return the interval
   */
  public static Interval interval(int successes, int trials, double confidence) {
    if (trials < 1 || successes < 0 || successes > trials) {
      throw new IllegalArgumentException("need 0 <= k <= n and n >= 1, got k = " + successes + ", n = " + trials);
    }
    if (!(confidence > 0 && confidence < 1)) {
      throw new IllegalArgumentException("confidence must be in (0, 1), got " + confidence);
    }
    double alpha = 1 - confidence;
    double low = successes == 0 ? 0.0 : solve(p -> upperTail(successes, trials, p), alpha / 2, true);
    double high = successes == trials ? 1.0 : solve(p -> 1 - upperTail(successes + 1, trials, p), alpha / 2, false);
    return new Interval(low, high);
  }

  /** @return P(X &gt;= k) for X binomial(n, p) */
  static double upperTail(int k, int n, double p) {
    if (k <= 0) {
      return 1.0;
    }
    if (p <= 0) {
      return 0.0;
    }
    if (p >= 1) {
      return 1.0;
    }
    double lp = Math.log(p);
    double lq = Math.log1p(-p);
    double lnf = Gamma.logGamma(n + 1.0);
    // sum the smaller side for accuracy
    double sum = 0;
    if (k > n * p) {
      for (int i = k; i <= n; i++) {
        sum += Math.exp(lnf - Gamma.logGamma(i + 1.0) - Gamma.logGamma(n - i + 1.0) + i * lp + (n - i) * lq);
      }
      return Math.min(1.0, sum);
    }
    for (int i = 0; i < k; i++) {
      sum += Math.exp(lnf - Gamma.logGamma(i + 1.0) - Gamma.logGamma(n - i + 1.0) + i * lp + (n - i) * lq);
    }
    return Math.max(0.0, 1 - sum);
  }

  /** Bisection for f(p) = target, f increasing in p when {@code increasing}, else decreasing. */
  private static double solve(java.util.function.DoubleUnaryOperator f, double target, boolean increasing) {
    double a = 0;
    double b = 1;
    for (int it = 0; it < 200 && b - a > 1e-15; it++) {
      double m = 0.5 * (a + b);
      double v = f.applyAsDouble(m);
      if ((v < target) == increasing) {
        a = m;
      } else {
        b = m;
      }
    }
    return 0.5 * (a + b);
  }
}
