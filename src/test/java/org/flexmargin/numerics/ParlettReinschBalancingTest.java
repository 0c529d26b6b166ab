package org.flexmargin.numerics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** Balancing worked by hand on small matrices, and its stopping condition on a larger one. */
class ParlettReinschBalancingTest {

  @Test
  void factorBringsTheScaledColumnNormWithinAFactorTwoOfTheRowNorm() {
    // c f^2 must land in [r/2, 2r): 1 * 4^2 = 16 for r = 16; 16 / 4^2 = 1 for r = 1
    assertEquals(4.0, ParlettReinschBalancing.factor(1, 16), 0.0);
    assertEquals(0.25, ParlettReinschBalancing.factor(16, 1), 0.0);
    assertEquals(1.0, ParlettReinschBalancing.factor(1, 1), 0.0);
    // 1 * 2^2 = 4 in [1.95, 7.8); c = 1 already in [1, 4) for r = 2
    assertEquals(2.0, ParlettReinschBalancing.factor(1, 3.9), 0.0);
    assertEquals(1.0, ParlettReinschBalancing.factor(1, 2), 0.0);
    // 2^-10 * (2^10)^2 = 2^10 = r
    assertEquals(1024.0, ParlettReinschBalancing.factor(Math.scalb(1.0, -10), 1024), 0.0);
  }

  @Test
  void aTwoByTwoWithUnequalOffDiagonalsIsBalancedExactly() {
    // [[1, 2^10], [2^-10, 1]]: row 0 has r = 2^10, column 0 has c = 2^-10, so f = 2^10 and
    // D^-1 A D with D = diag(2^10, 1) = [[1, 1], [1, 1]]; then every row matches its column.
    double[] a = {1, 1024, 1.0 / 1024, 1};
    double[] scale = new double[2];
    ParlettReinschBalancing.balance(2, a, scale);
    assertArrayEquals(new double[] {1, 1, 1, 1}, a, 0.0);
    assertArrayEquals(new double[] {1024, 1}, scale, 0.0);
  }

  @Test
  void rowsOrColumnsWithoutOffDiagonalEntriesAreLeftAlone() {
    // row 0 and column 1 have no off-diagonal entries: nothing to balance against
    double[] a = {1, 0, 5, 2};
    double[] scale = {7, 7};
    ParlettReinschBalancing.balance(2, a, scale);
    assertArrayEquals(new double[] {1, 0, 5, 2}, a, 0.0);
    assertArrayEquals(new double[] {1, 1}, scale, 0.0);
  }

  @Test
  void balancedMatrixIsAnExactDiagonalSimilarityWithRowAndColumnNormsMatched() {
    // Random 10 x 10 with rows scaled by 2^(4i) and columns by 2^(-4j): norms spread over 2^72.
    int n = 10;
    Random rnd = new Random(314);
    double[] a0 = new double[n * n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a0[i * n + j] = Math.scalb(rnd.nextGaussian(), 4 * (i - j));
      }
    }
    double[] a = a0.clone();
    double[] d = new double[n];
    ParlettReinschBalancing.balance(n, a, d);
    for (int i = 0; i < n; i++) {
      // the scaling is a power of two, so D^-1 A D is exact: entry by entry equality
      assertEquals(d[i], Math.scalb(1.0, Math.getExponent(d[i])), 0.0);
      for (int j = 0; j < n; j++) {
        assertEquals(a0[i * n + j] / d[i] * d[j], a[i * n + j], 0.0);
      }
    }
    // Stopping rule: no power of two f reduces c + r by 5 %. For rho = c / r with f = 2 (rho in
    // [1/8, 1/2)): (4 rho + 1) / 2 < 0.95 (1 + rho) iff rho < 0.45 / 1.05 = 3/7; for rho < 1/8
    // f >= 4 always gains. So at the end 3/7 <= c / r <= 7/3 in every row.
    for (int i = 0; i < n; i++) {
      double c = 0;
      double r = 0;
      for (int j = 0; j < n; j++) {
        if (j != i) {
          c += Math.abs(a[j * n + i]);
          r += Math.abs(a[i * n + j]);
        }
      }
      assertTrue(c / r >= 3.0 / 7 && c / r <= 7.0 / 3, "row " + i + ": c / r = " + c / r);
    }
  }
}
