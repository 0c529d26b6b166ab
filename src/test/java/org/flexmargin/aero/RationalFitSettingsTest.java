package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RationalFitForm;
import org.flexmargin.model.RationalFitSettings;
import org.junit.jupiter.api.Test;

/**
 * Fits made from the case's rational-fit settings ({@link RationalFits}): the defaults are the fit
 * made before the settings existed, each setting changes the fit as it says, and the weighted and
 * minimum-state fits reproduce data that are exactly of their form (docs/validation.md,
 * "Minimum-state rational fit").
 */
class RationalFitSettingsTest {

  private static RationalFitSettings settings(RationalFitForm form, int lagCount, double[] roots, double kMin,
      double kMax, int points, FitWeighting weighting) {
    return new RationalFitSettings(form, lagCount, roots, kMin, kMax, points, weighting);
  }

  @Test
  void theDefaultsAreTheFourLagRogerFitBitForBit() {
    StripTheoryAero data = RogerApproximationTest.section(-0.5);
    RationalFit before = RogerApproximation.fit(data, 1.5, 4);
    RationalFit now = RationalFits.fit(data, RationalFitSettings.defaults(), 1.5);
    assertArrayEquals(before.lagRoots(), now.lagRoots(), 0.0);
    assertArrayEquals(before.reducedFrequencies(), now.reducedFrequencies(), 0.0);
    for (int m = 0; m < before.lagCount() + 3; m++) {
      for (int i = 0; i < 2; i++) {
        assertArrayEquals(before.matrix(m)[i], now.matrix(m)[i], 0.0, "A" + m);
      }
    }
    assertEquals(RationalFit.ROGER, now.form());
    assertEquals("Roger approximation, 4 lag roots, k from 0 to 1.500, worst element error "
        + String.format(java.util.Locale.ROOT, "%.2f", 100 * now.error().worstRelativeError()) + " %",
        RationalFits.summary(now));
  }

  @Test
  void eachSettingChangesTheFitAsItSays() {
    StripTheoryAero data = RogerApproximationTest.section(-0.5);
    // explicit lag roots are used as given
    RationalFit roots = RationalFits.fit(data,
        settings(RationalFitForm.ROGER, -1, new double[] {0.07, 0.4}, 0, Double.NaN, 31, FitWeighting.UNIFORM), 1.5);
    assertArrayEquals(new double[] {0.07, 0.4}, roots.lagRoots(), 0.0);
    // a lag count places that many roots by the default rule over the given range: geometric from
    // 0.02 k_max to 0.15 k_max (closed form for k_max = 2, nL = 3: 0.04, 0.04 sqrt(7.5), 0.3)
    RationalFit count = RationalFits.fit(data,
        settings(RationalFitForm.ROGER, 3, null, 0, 2.0, 31, FitWeighting.UNIFORM), 1.5);
    assertArrayEquals(new double[] {0.04, 0.04 * Math.sqrt(7.5), 0.3}, count.lagRoots(), 1e-15);
    // the range and the number of points: k_i = k_min + (k_max - k_min) (i / (N - 1))^2
    RationalFit range = RationalFits.fit(data,
        settings(RationalFitForm.ROGER, -1, null, 0.1, 0.9, 5, FitWeighting.UNIFORM), 1.5);
    assertArrayEquals(new double[] {0.1, 0.15, 0.3, 0.55, 0.9}, range.reducedFrequencies(), 1e-15);
    assertEquals("Roger approximation, 4 lag roots, k from 0.100 to 0.900, worst element error "
        + String.format(java.util.Locale.ROOT, "%.2f", 100 * range.error().worstRelativeError()) + " %",
        RationalFits.summary(range));
    // the automatic range ends at the analysis's own k_max
    RationalFit auto = RationalFits.fit(data, RationalFitSettings.defaults(), 0.8);
    assertEquals(0.8, auto.maxReducedFrequency(), 0.0);
    // the minimum-state form with its automatic lag count (2 n = 4)
    RationalFit ms = RationalFits.fit(data,
        settings(RationalFitForm.MINIMUM_STATE, -1, null, 0, Double.NaN, 31, FitWeighting.UNIFORM), 1.5);
    assertEquals(RationalFit.MINIMUM_STATE, ms.form());
    assertEquals(4, ms.lagCount());
    assertTrue(RationalFits.summary(ms).startsWith("minimum-state (Karpel) approximation, 4 lag roots"),
        RationalFits.summary(ms));
    // weighting changes a fit of data that are not of the fitted form
    RationalFit uniform = RationalFits.fit(data, RationalFitSettings.defaults(), 1.5);
    RationalFit weighted = RationalFits.fit(data,
        settings(RationalFitForm.ROGER, -1, null, 0, Double.NaN, 31, FitWeighting.INVERSE_MAGNITUDE), 1.5);
    assertNotEquals(uniform.coefficient(1, 1, 0), weighted.coefficient(1, 1, 0));
  }

  @Test
  void theInverseMagnitudeFitIsTheWeightedLeastSquaresSolution() {
    // Independent check: for element (1, 0) of the Theodorsen section (lag roots 0.05 and 0.3,
    // 11 frequencies up to 1.5), the weighted least-squares problem built here from its definition
    // (rows Re: -k^2 A2 + sum k^2/(k^2+b^2) A_l = Re Q - A0, Im: k A1 + sum k b/(k^2+b^2) A_l = Im Q,
    // each divided by max(|Q_10(ik)|, 0.05 max_k |Q_10|)) and solved by Commons Math's QR
    // decomposition gives the fit's A1, A2, A3, A4. 1e-9 of the largest: two least-squares solutions
    // of a problem of condition ~1e4, rounding 1e-16 (A1 of this element is zero to rounding).
    StripTheoryAero data = RogerApproximationTest.section(-0.5);
    double[] beta = {0.05, 0.3};
    double[] ks = RogerApproximation.reducedFrequencies(0, 1.5, 11);
    RationalFit fit = RogerApproximation.fit(data, ks, beta, 0.05, FitWeighting.INVERSE_MAGNITUDE);
    int i = 1;
    int j = 0;
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    data.forces(0, q);
    double a0 = q.getReal(i, j);
    double scale = Math.abs(a0);
    double[][] qs = new double[ks.length][];
    for (int r = 0; r < ks.length; r++) {
      data.forces(ks[r], q);
      qs[r] = new double[] {q.getReal(i, j), q.getImag(i, j)};
      scale = Math.max(scale, Math.hypot(qs[r][0], qs[r][1]));
    }
    double[][] a = new double[2 * ks.length][4];
    double[] b = new double[2 * ks.length];
    for (int r = 0; r < ks.length; r++) {
      double k = ks[r];
      double w = 1 / Math.max(Math.hypot(qs[r][0], qs[r][1]), 0.05 * scale);
      a[2 * r][1] = -k * k * w;
      a[2 * r + 1][0] = k * w;
      for (int l = 0; l < 2; l++) {
        a[2 * r][2 + l] = k * k / (k * k + beta[l] * beta[l]) * w;
        a[2 * r + 1][2 + l] = k * beta[l] / (k * k + beta[l] * beta[l]) * w;
      }
      b[2 * r] = (qs[r][0] - a0) * w;
      b[2 * r + 1] = qs[r][1] * w;
    }
    RealVector x = new QRDecomposition(new Array2DRowRealMatrix(a)).getSolver().solve(new ArrayRealVector(b));
    double largest = x.getLInfNorm();
    for (int u = 0; u < 4; u++) {
      assertEquals(x.getEntry(u), fit.coefficient(u + 1, i, j), 1e-9 * largest, "A" + (u + 1));
    }
    assertEquals(a0, fit.coefficient(0, i, j), 0.0, "A0 imposed");
  }

  @Test
  void dataOfEitherFormAreReproducedWithEitherWeighting() {
    // Closed form: data exactly of Roger's form with rank-one lag matrices (3 coordinates, lag roots
    // 0.08, 0.3, 0.9, evaluated independently by RogerApproximationTest.RogerFormData with Commons
    // Math complex arithmetic) are in the model set of both forms, so every weighting reaches them
    // exactly. 1e-11: round-off of the least squares (the weights reach 20), far below the ~1e-3 of
    // a fit of the wrong form; checked on the fitted k and on 1501 k up to 3 (between and beyond).
    int n = 3;
    double[] beta = MinimumStateApproximationTest.MINIMUM_STATE_LAG_ROOTS;
    RogerApproximationTest.RogerFormData data = MinimumStateApproximationTest.minimumStateData(5);
    for (RationalFitForm form : RationalFitForm.values()) {
      for (FitWeighting w : FitWeighting.values()) {
        RationalFit fit = RationalFits.fit(data, settings(form, -1, beta, 0, 1.5, 31, w), 1.0);
        String what = form + " " + w;
        assertTrue(fit.error().worstRelativeError() < 1e-11, what + ": " + fit.error().worstRelativeError());
        assertTrue(RogerApproximationTest.denseError(data, fit, 3.0) < 1e-11, what + " between and beyond");
        for (int l = 0; l < beta.length; l++) {
          for (int i = 0; i < n; i++) {
            assertArrayEquals(data.a[l + 3][i], fit.matrix(l + 3)[i], 1e-10, what + " lag matrix " + l);
          }
        }
      }
    }
  }

  @Test
  void aFitTheSettingsCannotMakeIsRefusedWithItsKey() {
    StripTheoryAero data = RogerApproximationTest.section(-0.5);
    // 24 minimum-state lag roots need (2 n + 24 + 1) / 2 + 1 = 15 non-zero frequencies; 5 points give 4
    InvalidInputException e = assertThrows(InvalidInputException.class, () -> RationalFits.fit(data,
        settings(RationalFitForm.MINIMUM_STATE, 24, null, 0, Double.NaN, 5, FitWeighting.UNIFORM), 1.5));
    assertEquals("rfa.reduced_frequencies", e.fieldPath());
    assertThrows(InvalidInputException.class, () -> RationalFits.fit(null, RationalFitSettings.defaults(), 1.5));
    assertThrows(InvalidInputException.class, () -> RationalFits.fit(data, null, 1.5));
    assertEquals("rfa.min_reduced_frequency", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.reducedFrequencies(0.5, 0.5, 5)).fieldPath());
  }
}
