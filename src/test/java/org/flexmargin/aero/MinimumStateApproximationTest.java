package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/** Karpel's minimum-state fit (docs/validation.md, "Minimum-state rational fit"). */
class MinimumStateApproximationTest {

  /** Lag roots of {@link #minimumStateData(long)}. */
  static final double[] MINIMUM_STATE_LAG_ROOTS = {0.08, 0.3, 0.9};

  /**
   * Data exactly of the minimum-state form: 3 coordinates, random A0, A1, A2 and rank-one lag
   * matrices D[:, l] E[l, :] at {@link #MINIMUM_STATE_LAG_ROOTS}, evaluated with Commons Math complex
   * arithmetic by {@link RogerApproximationTest.RogerFormData}.
   *
   * @param seed random seed of the coefficients
   * @return the data
   */
  static RogerApproximationTest.RogerFormData minimumStateData(long seed) {
    int n = 3;
    double[] beta = MINIMUM_STATE_LAG_ROOTS;
    Random rnd = new Random(seed);
    double[][][] a = new double[beta.length + 3][n][n];
    for (int m = 0; m < 3; m++) {
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          a[m][i][j] = 2 * rnd.nextDouble() - 1;
        }
      }
    }
    for (int l = 0; l < beta.length; l++) {
      double[] d = {rnd.nextDouble() + 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.2};
      double[] e = {rnd.nextDouble() - 0.5, rnd.nextDouble() + 0.5, rnd.nextDouble() - 0.7};
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          a[l + 3][i][j] = d[i] * e[j];
        }
      }
    }
    return new RogerApproximationTest.RogerFormData(a, beta);
  }

  @Test
  void dataExactlyOfMinimumStateFormAreReproduced() {
    // Closed form: Q(p) = A0 + A1 p + A2 p^2 + D (pI - R)^-1 E p with the fit's own lag roots is in
    // the model set, so the fit can reach it exactly. Data evaluated independently (Commons Math
    // complex arithmetic, RogerApproximationTest.RogerFormData with rank-one lag matrices D[:, l]
    // E[l, :]). Measured worst element error 3.7e-16 on the fitted k and 8.9e-16 up to k = 3 (the
    // start from a Roger fit is already exact here); 1e-12 allows for round-off in the least
    // squares and still tells an exact fit from the ~1e-3 of a fit of the wrong form.
    double[] beta = MINIMUM_STATE_LAG_ROOTS;
    RogerApproximationTest.RogerFormData data = minimumStateData(11);
    MinimumStateApproximation.Result result = MinimumStateApproximation.fitWithConvergence(data,
        RogerApproximation.defaultReducedFrequencies(1.5, RogerApproximation.DEFAULT_POINTS), beta, 0.05,
        org.flexmargin.model.FitWeighting.ELEMENT);
    RationalFit fit = result.fit();
    assertTrue(java.util.Arrays.deepEquals(fit.coefficients(), MinimumStateApproximation.fit(data,
        RogerApproximation.defaultReducedFrequencies(1.5, RogerApproximation.DEFAULT_POINTS), beta, 0.05)
        .coefficients()), "the default weighting is the element weighting");
    // the ridge, set from the residual of the start with E = 0, first pulls the fit off the exact
    // start and vanishes with the residual (measured: round-off, weighted error 2.6e-15, after 11
    // iterations, well before the limit of 400); 1e-14 is the rule's own round-off level (1e-28 on
    // the squares)
    assertTrue(result.convergence().converged());
    assertTrue(result.convergence().iterations() <= 20, result.convergence().toString());
    assertTrue(result.convergence().weightedError() < 1e-14, result.convergence().toString());
    assertTrue(fit.error().worstRelativeError() < 1e-12, "worst " + fit.error().worstRelativeError());
    assertTrue(RogerApproximationTest.denseError(data, fit, 3.0) < 1e-12, "between and beyond the fitted k");
    assertEquals(RationalFit.MINIMUM_STATE, fit.form());
    // the lag matrices are of rank one: every 2 x 2 minor vanishes
    for (int l = 0; l < beta.length; l++) {
      double[][] m = fit.matrix(l + 3);
      double minor = m[0][0] * m[1][1] - m[0][1] * m[1][0];
      assertEquals(0.0, minor, 1e-12 * (Math.abs(m[0][0] * m[1][1]) + Math.abs(m[0][1] * m[1][0]) + 1e-300));
    }
  }

  @Test
  void asManyAerodynamicStatesAsRogerGiveRogersAccuracyOrBetter() {
    // Same state count: Roger with nL lag roots adds nL n states, minimum state with nL n lag roots
    // adds nL n as well. On Theodorsen typical-section forces (n = 2, k in [0, 1.5]) the
    // minimum-state fit is at least as accurate, on the fitted points and between them.
    // Measured (a = -0.5, Lee, Price & Wong section), fitted k / dense grid: Roger 2 lags 0.912 % /
    // 0.920 %, minimum state 4 lags 0.551 % / 0.554 %; Roger 3 lags 0.603 % / 0.603 %, minimum state
    // 6 lags 0.371 % / 0.386 %.
    StripTheoryAero data = RogerApproximationTest.section(-0.5);
    for (int lags = 2; lags <= 3; lags++) {
      RationalFit roger = RogerApproximation.fit(data, RogerApproximationTest.K_MAX, lags);
      RationalFit ms = MinimumStateApproximation.fit(data, RogerApproximationTest.K_MAX, 2 * lags);
      assertTrue(ms.error().worstRelativeError() <= roger.error().worstRelativeError(),
          lags + " lags: minimum state " + ms.error().worstRelativeError() + ", Roger " + roger.error().worstRelativeError());
      assertTrue(RogerApproximationTest.denseError(data, ms, RogerApproximationTest.K_MAX)
          <= RogerApproximationTest.denseError(data, roger, RogerApproximationTest.K_MAX) * 1.001);
      // exact at k = 0 (A0 imposed)
      assertEquals(0.0, StateSpaceFree.errorAtZero(data, ms), 1e-14);
    }
  }

  @Test
  void badInputIsRejectedWithItsFieldPath() {
    StripTheoryAero data = RogerApproximationTest.section(-0.5);
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> MinimumStateApproximation.fit(data, new double[] {0, 0.5, 1.0, 1.5}, new double[0], 0.05));
    assertEquals("rfa.lag_roots", e.fieldPath());
    e = assertThrows(InvalidInputException.class,
        () -> MinimumStateApproximation.fit(data, new double[] {0, 1.5}, new double[] {0.1, 0.2}, 0.05));
    assertEquals("rfa.reduced_frequencies", e.fieldPath());
  }

  /** Error of the fit at k = 0, relative to the largest |Q_ij(0)|. */
  private static final class StateSpaceFree {
    static double errorAtZero(AeroSource data, RationalFit fit) {
      org.ejml.data.ZMatrixRMaj q = new org.ejml.data.ZMatrixRMaj(2, 2);
      org.ejml.data.ZMatrixRMaj f = new org.ejml.data.ZMatrixRMaj(2, 2);
      data.forces(0, q);
      fit.evaluate(0, f);
      double worst = 0;
      double size = 0;
      for (int e = 0; e < q.data.length; e++) {
        worst = Math.max(worst, Math.abs(q.data[e] - f.data[e]));
        size = Math.max(size, Math.abs(q.data[e]));
      }
      return worst / size;
    }
  }
}
