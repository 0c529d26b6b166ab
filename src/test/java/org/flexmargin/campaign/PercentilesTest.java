package org.flexmargin.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.junit.jupiter.api.Test;

/** Percentiles against Commons Math's Percentile with the same definition. */
class PercentilesTest {
  @Test
  void agreesWithCommonsMathDefinition7() {
    SplittableRandom rng = new SplittableRandom(7);
    for (int n : new int[] {1, 2, 5, 30, 301}) {
      double[] x = new double[n];
      for (int i = 0; i < n; i++) {
        x[i] = 50 + 100 * rng.nextDouble();
      }
      Percentile ref = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
      for (double p : new double[] {0.05, 0.25, 0.5, 0.95, 1.0}) {
        // same formula, different arithmetic order: a few ulps of values near 100
        double expected = ref.evaluate(x, 100 * p);
        assertEquals(expected, Percentiles.of(x, p), 1e-12, "n = " + n + ", p = " + p);
      }
    }
  }

  @Test
  void onsetsBeyondTheSweepSortLastAndReachInfinity() {
    double inf = Double.POSITIVE_INFINITY;
    double[] x = {80, inf, 90, inf, 100};
    assertEquals(90, Percentiles.of(x, 0.25)); // h = 1: the second smallest
    assertEquals(inf, Percentiles.of(x, 0.6)); // between 100 and infinity
    assertEquals(80 + 0.2 * 10, Percentiles.of(x, 0.05), 1e-12); // h = 0.2: derived from definition 7
  }

  @Test
  void lostMarginsSortFirstAndReachMinusInfinity() {
    double lost = Double.NEGATIVE_INFINITY;
    double[] x = {12, lost, 10, 14, 16};
    // sorted: -inf, 10, 12, 14, 16 (definition 7, h = 4 p)
    assertEquals(lost, Percentiles.of(x, 0.0));
    assertEquals(lost, Percentiles.of(x, 0.05)); // h = 0.2, between -inf and 10
    assertEquals(10, Percentiles.of(x, 0.25)); // h = 1
    assertEquals(12 + 0.4 * 2, Percentiles.of(x, 0.6), 1e-12); // h = 2.4
    assertEquals(16, Percentiles.of(x, 1.0));
    double[] both = {lost, 5, Double.POSITIVE_INFINITY};
    assertEquals(5, Percentiles.of(both, 0.5)); // h = 1
    assertEquals(lost, Percentiles.of(both, 0.25));
    assertEquals(Double.POSITIVE_INFINITY, Percentiles.of(both, 0.75));
  }
}
