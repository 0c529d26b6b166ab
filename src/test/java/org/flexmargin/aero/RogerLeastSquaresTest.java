package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RationalFitSettings;
import org.junit.jupiter.api.Test;

/**
 * Roger's least squares on data whose best fit is known in closed form, its default grids, its
 * data-range remarks and its input checks.
 */
class RogerLeastSquaresTest {

  /** Element (i, j) of Q(ik) as a complex number {re, im}. */
  @FunctionalInterface
  interface Element {
    double[] at(int i, int j, double k);
  }

  /** An n x n source from a formula, valid on [kMin, kMax]. */
  static AeroSource source(int n, double kMin, double kMax, Element f) {
    return new FunctionForces(n, 1.5, kMin, kMax, (k, out) -> {
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          double[] v = f.at(i, j, k);
          out.set(i, j, v[0], v[1]);
        }
      }
    }, "formula");
  }

  /**
   * Without lag roots the real rows hold only A2 and the imaginary rows only A1 (Re Q - A0 = -k^2
   * A2, Im Q = k A1), so the two decouple into one-parameter least squares with the closed-form
   * solutions A1 = sum k Im Q / sum k^2 and A2 = -sum k^2 (Re Q - A0) / sum k^4 (derived).
   * Fitted at k = 0, 1, 2:
   *
   * <ul>
   *   <li>(0, 0) = 1 + i k^3: A1 = (1 + 16)/(1 + 4) = 3.4; misfit |k^3 - 3.4 k| = 2.4 at k = 1 and
   *       1.2 at k = 2; largest |Q| = |1 + 8 i| = sqrt 65, relative error 2.4 / sqrt 65;
   *   <li>(0, 1) = 0: fitted exactly by zero, relative error 0;
   *   <li>(1, 0) = 2 - 3 k^2 = 2 + 3 (ik)^2: exactly representable, A2 = 3, error 0;
   *   <li>(1, 1) = 0.5 + k^4: A2 = -(1 + 64)/(1 + 16) = -65/17; misfit |k^4 - 65 k^2 / 17| = 48/17 at
   *       k = 1 and 12/17 at k = 2; largest |Q| = 16.5, relative error 48 / (17 x 16.5).
   * </ul>
   *
   * Tolerance 1e-13: a 6 x 2 QR solve of numbers of order 10 rounds at 1e-15.
   */
  @Test
  void quasiSteadyFitOfKnownPerturbationsHasTheClosedFormErrors() {
    AeroSource data = source(2, 0, 10, (i, j, k) -> switch (2 * i + j) {
      case 0 -> new double[] {1, k * k * k};
      case 1 -> new double[] {0, 0};
      case 2 -> new double[] {2 - 3 * k * k, 0};
      default -> new double[] {0.5 + k * k * k * k, 0};
    });
    RationalFit fit = RogerApproximation.fit(data, new double[] {0, 1, 2}, new double[0], 0.05);
    double tol = 1e-13;
    assertEquals(1.0, fit.coefficient(0, 0, 0), tol);
    assertEquals(2.0, fit.coefficient(0, 1, 0), tol);
    assertEquals(0.5, fit.coefficient(0, 1, 1), tol);
    assertEquals(3.4, fit.coefficient(1, 0, 0), tol);
    assertEquals(0.0, fit.coefficient(2, 0, 0), tol);
    assertEquals(0.0, fit.coefficient(1, 1, 0), tol);
    assertEquals(3.0, fit.coefficient(2, 1, 0), tol);
    assertEquals(-65.0 / 17, fit.coefficient(2, 1, 1), tol);
    assertEquals(0.0, fit.coefficient(1, 1, 1), tol);
    FitError e = fit.error();
    assertEquals(2.4, e.absoluteError()[0][0], tol);
    assertEquals(0.0, e.absoluteError()[0][1], 0.0);
    assertEquals(0.0, e.absoluteError()[1][0], tol);
    assertEquals(48.0 / 17, e.absoluteError()[1][1], tol);
    assertEquals(2.4 / Math.sqrt(65), e.relativeAt(0, 0), tol);
    assertEquals(0.0, e.relativeAt(0, 1), 0.0);
    assertEquals(0.0, e.relativeAt(1, 0), tol);
    assertEquals(48.0 / (17 * 16.5), e.relativeAt(1, 1), tol);
    assertEquals(0, e.worstRow());
    assertEquals(0, e.worstColumn());
    assertTrue(fit.exceedsErrorThreshold());
    assertEquals(List.of("rational fit error 29.8 % on element (0, 0) exceeds 5.00 %: add lag roots or narrow "
        + "the fitted range"), fit.warnings());
    // the same fit against a threshold above the worst error has no warning
    RationalFit lenient = RogerApproximation.fit(data, new double[] {0, 1, 2}, new double[0], 0.3);
    assertTrue(lenient.warnings().isEmpty(), lenient.warnings().toString());
    assertEquals(1.5, lenient.referenceSemichordM(), 0.0);
    assertEquals(RationalFit.ROGER, lenient.form());
    assertEquals("formula", lenient.sourceDescription());
  }

  /**
   * A0 = Re Q(0) is a constraint, not fitted: data that jump at k = 0 keep their steady value, and
   * the steady value enters the scale of the relative error.
   */
  @Test
  void steadyValueIsImposedEvenWhereTheDataDisagreeWithTheFormAtZero() {
    // data 3 + i k on k > 0 but 5 at k = 0: A0 = Re Q(0) = 5 is imposed, the real rows then fit
    // -2 = -k^2 A2 in least squares: A2 = 2 sum k^2 / sum k^4 = 2 (1 + 4)/(1 + 16) = 10/17 (derived)
    AeroSource data = source(1, 0, 10, (i, j, k) -> k == 0 ? new double[] {5, 0} : new double[] {3, k});
    RationalFit fit = RogerApproximation.fit(data, new double[] {1, 2}, new double[0], 0.05);
    assertEquals(5.0, fit.coefficient(0, 0, 0), 0.0);
    assertEquals(1.0, fit.coefficient(1, 0, 0), 1e-13);
    assertEquals(10.0 / 17, fit.coefficient(2, 0, 0), 1e-13);
    // misfit of the real part: |5 - k^2 10/17 - 3| = 24/17 at k = 1, |2 - 40/17| = 6/17 at k = 2;
    // largest modulus over the fitted k and A0: max(|3 + i|, |3 + 2i|, 5) = 5
    assertEquals(24.0 / 17, fit.error().absoluteError()[0][0], 1e-13);
    assertEquals(24.0 / (17 * 5), fit.error().relativeAt(0, 0), 1e-13);
  }

  @Test
  void defaultGridsFollowTheirFormulas() {
    // k_i = k_max (i / (n - 1))^2
    assertArrayEquals(new double[] {0, 0.125, 0.5, 1.125, 2.0},
        RogerApproximation.defaultReducedFrequencies(2.0, 5), 1e-15);
    assertArrayEquals(new double[] {0, 0.375, 1.5}, RogerApproximation.defaultReducedFrequencies(1.5, 3), 1e-15);
    // beta_l = 0.02 k_max 7.5^((l - 1)/(nL - 1)); one lag: 0.05 k_max
    assertArrayEquals(new double[] {0.075}, RogerApproximation.defaultLagRoots(1.5, 1), 1e-15);
    assertArrayEquals(new double[] {0.03, 0.225}, RogerApproximation.defaultLagRoots(1.5, 2), 1e-15);
    assertArrayEquals(new double[] {0.03, 0.03 * Math.sqrt(7.5), 0.225}, RogerApproximation.defaultLagRoots(1.5, 3),
        1e-15);
    assertEquals(0, RogerApproximation.defaultLagRoots(1.5, 0).length);
    assertEquals(12, RogerApproximation.defaultLagRoots(1.5, 12).length);
    assertEquals(0.3, RogerApproximation.defaultLagRoots(2.0, 12)[11], 1e-15);
    String points = "rfa.points";
    assertEquals(points, assertThrows(InvalidInputException.class,
        () -> RogerApproximation.defaultReducedFrequencies(1.5, 2)).fieldPath());
    assertEquals("rfa.lag_count", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.defaultLagRoots(1.5, RationalFitSettings.MAX_LAG_COUNT + 1)).fieldPath());
    for (double bad : new double[] {0, -1, Double.NaN, Double.POSITIVE_INFINITY}) {
      assertEquals("rfa.max_reduced_frequency", assertThrows(InvalidInputException.class,
          () -> RogerApproximation.defaultLagRoots(bad, 2)).fieldPath());
      assertEquals("rfa.max_reduced_frequency", assertThrows(InvalidInputException.class,
          () -> RogerApproximation.defaultReducedFrequencies(bad, 5)).fieldPath());
    }
  }

  @Test
  void dataRangeRemarks() {
    Element smooth = (i, j, k) -> new double[] {1, k};
    // a source starting above k = 0 supplies A0 itself: said once
    List<String> low = RogerApproximation.fit(source(1, 0.1, 10, smooth), new double[] {0.1, 0.5, 1}, new double[0])
        .warnings();
    assertEquals(List.of("steady forces A0 taken from the source at k = 0, below its range (lowest k 0.1000)"), low);
    // fitted frequencies below and above the source's range
    List<String> both = RogerApproximation.fit(source(1, 0.1, 0.8, smooth), new double[] {0, 0.5, 1}, new double[0])
        .warnings();
    assertEquals(2, both.size());
    assertEquals("fitted reduced frequencies 0.000 .. 1.000 extend beyond the data range 0.1000 .. 0.8000",
        both.get(1));
    assertEquals(1, RogerApproximation.fit(source(1, 0, 0.8, smooth), new double[] {0, 0.5, 1}, new double[0])
        .warnings().size());
    // exactly on the range's ends: no remark
    assertTrue(RogerApproximation.fit(source(1, 0, 1, smooth), new double[] {0, 0.5, 1}, new double[0])
        .warnings().isEmpty());
  }

  @Test
  void inputChecks() {
    AeroSource data = source(1, 0, 10, (i, j, k) -> new double[] {1, k});
    double[] ks = {0, 0.5, 1, 1.5};
    assertEquals("rfa.source", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(null, ks, new double[0])).fieldPath());
    for (double bad : new double[] {Double.POSITIVE_INFINITY, Double.NaN, -0.1}) {
      assertEquals("rfa.error_threshold", assertThrows(InvalidInputException.class,
          () -> RogerApproximation.fit(data, ks, new double[0], bad)).fieldPath());
    }
    assertEquals("rfa.reduced_frequencies", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(data, null, new double[0])).fieldPath());
    assertEquals("rfa.reduced_frequencies", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(data, new double[0], new double[0])).fieldPath());
    assertEquals("rfa.reduced_frequencies[0]", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(data, new double[] {-0.5, 1, 2}, new double[0])).fieldPath());
    assertEquals("rfa.reduced_frequencies[1]", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(data, new double[] {0.5, Double.POSITIVE_INFINITY}, new double[0])).fieldPath());
    assertEquals("rfa.reduced_frequencies[1]", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(data, new double[] {0.5, 0.5, 1}, new double[0])).fieldPath());
    // nL + 2 unknowns need ceil((nL + 2) / 2) + 1 frequencies above 0 (two equations each, one spare):
    // one lag root needs 3, two need 3, three need 4
    assertEquals("rfa.reduced_frequencies", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(data, new double[] {0, 0.5, 1}, new double[] {0.3})).fieldPath());
    assertEquals(1, RogerApproximation.fit(data, new double[] {0, 0.5, 1, 1.5}, new double[] {0.3}).lagCount());
    assertEquals(2, RogerApproximation.fit(data, new double[] {0.5, 1, 1.5}, new double[] {0.3, 0.9}).lagCount());
    assertEquals("rfa.reduced_frequencies", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(data, new double[] {0, 0.5, 1, 1.5}, new double[] {0.3, 0.6, 0.9})).fieldPath());
    assertEquals(3, RogerApproximation.fit(data, new double[] {0.4, 0.8, 1.2, 1.6}, new double[] {0.3, 0.6, 0.9})
        .lagCount());
    // no lag roots: two frequencies above 0
    assertEquals("rfa.reduced_frequencies", assertThrows(InvalidInputException.class,
        () -> RogerApproximation.fit(data, new double[] {0, 1}, new double[0])).fieldPath());
    assertEquals(0, RogerApproximation.fit(data, new double[] {1, 2}, new double[0]).lagCount());
  }
}
