package org.flexmargin.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.distribution.BetaDistribution;
import org.junit.jupiter.api.Test;

/** The Clopper-Pearson interval against closed forms, published values and Commons Math. */
class ClopperPearsonTest {

  @Test
  void noSuccessesAndAllSuccessesHaveClosedForms() {
    // k = 0: P(X = 0 | p) = (1 - p)^n = alpha/2 gives p_U = 1 - (alpha/2)^(1/n); k = n by symmetry
    // (Clopper and Pearson, Biometrika 26, 1934; derived, docs/validation.md "Campaign statistics").
    for (int n : new int[] {1, 10, 20, 300}) {
      ClopperPearson.Interval none = ClopperPearson.interval(0, n, 0.95);
      assertEquals(0.0, none.low());
      // bisection to 1e-15 on an exact sum: agreement to 1e-12
      assertEquals(1 - Math.pow(0.025, 1.0 / n), none.high(), 1e-12);
      ClopperPearson.Interval all = ClopperPearson.interval(n, n, 0.95);
      assertEquals(Math.pow(0.025, 1.0 / n), all.low(), 1e-12);
      assertEquals(1.0, all.high());
    }
  }

  @Test
  void tabulatedValues() {
    // 95 % exact binomial limits, from memory of the tables of Clopper and Pearson (Biometrika 26,
    // 1934) as reprinted in statistics handbooks: 0/10 -> [0, 0.3085], 5/10 -> [0.1871, 0.8129],
    // 1/10 -> [0.0025, 0.4450], 10/20 -> [0.2720, 0.7280]. Tables give 4 decimals: tolerance 6e-5.
    check(0, 10, 0.0, 0.3085);
    check(5, 10, 0.1871, 0.8129);
    check(1, 10, 0.0025, 0.4450);
    check(10, 20, 0.2720, 0.7280);
  }

  private static void check(int k, int n, double lo, double hi) {
    ClopperPearson.Interval i = ClopperPearson.interval(k, n, 0.95);
    assertEquals(lo, i.low(), 6e-5, k + "/" + n + " low");
    assertEquals(hi, i.high(), 6e-5, k + "/" + n + " high");
  }

  @Test
  void agreesWithBetaQuantilesOfCommonsMath() {
    // The interval's bounds are the beta quantiles B(alpha/2; k, n-k+1) and B(1-alpha/2; k+1, n-k)
    // (the binomial-beta identity); Commons Math computes them from the regularized incomplete beta
    // function, our class from binomial sums. Commons Math's inverse solver accuracy is 1e-9 by
    // default: tolerance 1e-8.
    for (int n : new int[] {3, 17, 60, 250, 1000}) {
      for (int k = 1; k < n; k += Math.max(1, n / 7)) {
        for (double conf : new double[] {0.9, 0.95, 0.99}) {
          double a = 1 - conf;
          ClopperPearson.Interval i = ClopperPearson.interval(k, n, conf);
          double lo = new BetaDistribution(null, k, n - k + 1.0, 1e-12).inverseCumulativeProbability(a / 2);
          double hi = new BetaDistribution(null, k + 1.0, n - k, 1e-12).inverseCumulativeProbability(1 - a / 2);
          assertEquals(lo, i.low(), 1e-8, k + "/" + n + " at " + conf);
          assertEquals(hi, i.high(), 1e-8, k + "/" + n + " at " + conf);
        }
      }
    }
  }
}
