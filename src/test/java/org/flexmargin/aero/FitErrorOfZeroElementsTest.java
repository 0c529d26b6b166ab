package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import org.junit.jupiter.api.Test;

/**
 * The fit error of an element that is zero in the data: a lag term of rank one can put a small
 * value there, which is judged against the largest element of all instead of being reported as an
 * infinite relative error.
 */
class FitErrorOfZeroElementsTest {
  @Test
  void aZeroElementIsJudgedAgainstTheLargestElement() {
    // data: Q(ik) = diag(1, 2) at every k, so element (0, 1) is zero. Fit: A0 = diag(1, 2) and one
    // lag term beta = 0.2 whose matrix is c = 0.01 at (0, 1) only. Its error there is
    // max_k |c i k / (i k + beta)| = c k / sqrt(k^2 + beta^2) at the largest k = 1 (derived: the
    // modulus grows with k) = 0.01 / sqrt(1.04) = 9.8058e-3, relative to the largest element 2:
    // 4.9029e-3. Every other element is fitted exactly
    double c = 0.01;
    double beta = 0.2;
    double[] ks = {0, 0.5, 1};
    double[][] data = new double[ks.length][8];
    for (double[] row : data) {
      row[0] = 1;
      row[6] = 2;
    }
    double[][][] coefficients = new double[4][2][2];
    coefficients[0][0][0] = 1;
    coefficients[0][1][1] = 2;
    coefficients[3][0][1] = c;
    FunctionForces source = new FunctionForces(2, 0.5, 0, 1, (k, out) -> {
      out.set(0, 0, 1, 0);
      out.set(1, 1, 2, 0);
    }, "diagonal forces");
    RationalFit fit = RogerApproximation.measured(source, new double[] {beta}, coefficients, ks, data, 0.05,
        new ArrayList<>(), RationalFit.MINIMUM_STATE);
    double expected = c / Math.sqrt(1 + beta * beta) / 2;
    assertEquals(expected, fit.error().worstRelativeError(), 1e-15);
    assertEquals(0, fit.error().worstRow());
    assertEquals(1, fit.error().worstColumn());
    assertEquals(0.0, fit.error().relativeError()[0][0], 0.0);
    assertEquals(0.0, fit.error().relativeError()[1][0], 0.0);
    assertEquals(0.0, fit.error().relativeError()[1][1], 0.0);
  }
}
