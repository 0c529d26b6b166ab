package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * The rational-fit record built by hand: validation with field paths, Roger's form evaluated at
 * points where it reduces to simple closed forms, and the flags and words it reports.
 */
class RationalFitTest {

  private static final double[] LAGS = {0.5};

  /** A 1 x 1 fit Q(p) = a0 + a1 p + a2 p^2 + a3 p / (p + beta). */
  private static RationalFit scalar(double a0, double a1, double a2, double a3, double beta, double worst,
      double threshold) {
    double[][][] c = {{{a0}}, {{a1}}, {{a2}}, {{a3}}};
    FitError e = new FitError(new double[][] {{worst}}, new double[][] {{0}}, worst, 0, 0);
    return new RationalFit(0.8, new double[] {beta}, c, new double[] {0, 0.5, 1.2}, e, threshold, List.of("w"),
        "data", RationalFit.ROGER);
  }

  private static FitError zeroError(int n) {
    return FitError.of(new double[n][n], new double[n][n]);
  }

  private static String path(Runnable r) {
    return assertThrows(InvalidInputException.class, r::run).fieldPath();
  }

  @Test
  void evaluatesRogersFormAtClosedFormPoints() {
    // Q(p) = 2 + 3 p + 5 p^2 + 7 p / (p + 0.5)
    RationalFit f = scalar(2, 3, 5, 7, 0.5, 0.01, 0.05);
    ZMatrixRMaj out = new ZMatrixRMaj(1, 1);
    // k = 0.5 = beta: ik / (ik + beta) = i / (i + 1) = (1 + i) / 2, so
    // Q = 2 - 5 (0.25) + 7 / 2 + i (3 (0.5) + 7 / 2) = 4.25 + 5 i (derived)
    f.evaluate(0.5, out);
    assertEquals(4.25, out.getReal(0, 0), 1e-14);
    assertEquals(5.0, out.getImag(0, 0), 1e-14);
    // real p = 1: 2 + 3 + 5 + 7 / 1.5 (derived), imaginary part zero
    f.evaluateLaplace(1.0, 0.0, out);
    assertEquals(10 + 7 / 1.5, out.getReal(0, 0), 1e-14);
    assertEquals(0.0, out.getImag(0, 0), 0.0);
    // p = -0.25 + 0.25 i: p^2 = -0.125 i; p + beta = 0.25 (1 + i), p / (p + beta) = (-1 + i) / (1 + i) = i
    // Q = 2 - 0.75 + 7 (0) + i (0.75 - 0.625 + 7) (derived)
    f.evaluateLaplace(-0.25, 0.25, out);
    assertEquals(1.25, out.getReal(0, 0), 1e-14);
    assertEquals(7.125, out.getImag(0, 0), 1e-14);
    // forces() is evaluate(); the output is reshaped
    ZMatrixRMaj big = new ZMatrixRMaj(3, 3);
    f.forces(0.5, big);
    assertEquals(1, big.numRows);
    assertEquals(4.25, big.getReal(0, 0), 1e-14);
  }

  @Test
  void poleAndInvalidArgumentsAreRefused() {
    RationalFit f = scalar(2, 3, 5, 7, 0.5, 0.01, 0.05);
    ZMatrixRMaj out = new ZMatrixRMaj(1, 1);
    assertThrows(IllegalArgumentException.class, () -> f.evaluateLaplace(-0.5, 0.0, out));
    assertThrows(IllegalArgumentException.class, () -> f.evaluateLaplace(Double.NaN, 0.0, out));
    assertThrows(IllegalArgumentException.class, () -> f.evaluateLaplace(0.0, Double.POSITIVE_INFINITY, out));
    assertThrows(IllegalArgumentException.class, () -> f.evaluate(-0.1, out));
    assertThrows(IllegalArgumentException.class, () -> f.evaluate(Double.NaN, out));
    assertThrows(IllegalArgumentException.class, () -> f.evaluate(Double.POSITIVE_INFINITY, out));
    // k = 0 is allowed and gives A0
    f.evaluate(0.0, out);
    assertEquals(2.0, out.getReal(0, 0), 0.0);
  }

  @Test
  void reportsItsRangeFlagsAndWords() {
    RationalFit f = scalar(2, 3, 5, 7, 0.5, 0.01, 0.05);
    assertEquals(1, f.size());
    assertEquals(1, f.lagCount());
    assertEquals(0.5, f.lagRoot(0), 0.0);
    assertEquals(0.0, f.minReducedFrequency(), 0.0);
    assertEquals(1.2, f.maxReducedFrequency(), 0.0);
    assertEquals(0.8, f.referenceSemichordM(), 0.0);
    assertFalse(f.exceedsErrorThreshold());
    assertEquals("rational fit (Roger form, 1 lag roots, k up to 1.20, worst element error 1.0 %) of data",
        f.description());
    // exactly at the threshold is not above it; just above it is
    assertFalse(scalar(2, 3, 5, 7, 0.5, 0.05, 0.05).exceedsErrorThreshold());
    assertTrue(scalar(2, 3, 5, 7, 0.5, 0.0501, 0.05).exceedsErrorThreshold());
    // copies out
    f.coefficients()[3][0][0] = 100;
    f.reducedFrequencies()[2] = 100;
    assertEquals(7, f.coefficient(3, 0, 0), 0.0);
    assertEquals(7, f.matrix(3)[0][0], 0.0);
    assertEquals(1.2, f.reducedFrequencies()[2], 0.0);
    assertEquals(4, f.coefficients().length);
    // missing words default: no description, Roger's form
    RationalFit bare = new RationalFit(1.0, new double[0], new double[][][] {{{1}}, {{0}}, {{0}}},
        new double[] {0.0}, zeroError(1), 0.05, List.of(), null, null);
    assertEquals("", bare.sourceDescription());
    assertEquals(RationalFit.ROGER, bare.form());
    assertEquals(0, bare.lagCount());
  }

  @Test
  void arraysAreCopiedIn() {
    double[] lags = {0.5};
    double[][][] c = {{{2}}, {{3}}, {{5}}, {{7}}};
    double[] ks = {0, 1};
    RationalFit f = new RationalFit(1.0, lags, c, ks, zeroError(1), 0.05, List.of(), "d", RationalFit.MINIMUM_STATE);
    lags[0] = 9;
    c[0][0][0] = 9;
    ks[1] = 9;
    assertEquals(0.5, f.lagRoot(0), 0.0);
    assertEquals(2, f.coefficient(0, 0, 0), 0.0);
    assertEquals(1, f.maxReducedFrequency(), 0.0);
    assertEquals(RationalFit.MINIMUM_STATE, f.form());
  }

  @Test
  void invalidFitsAreRejectedWithTheirFieldPaths() {
    double[][][] ok = {{{2}}, {{3}}, {{5}}, {{7}}};
    double[] ks = {0, 1};
    FitError e1 = zeroError(1);
    assertEquals("rational_fit.reference_semichord_m",
        path(() -> new RationalFit(0.0, LAGS, ok, ks, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.reference_semichord_m",
        path(() -> new RationalFit(Double.POSITIVE_INFINITY, LAGS, ok, ks, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.lag_roots",
        path(() -> new RationalFit(1, null, ok, ks, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.lag_roots[0]",
        path(() -> new RationalFit(1, new double[] {Double.POSITIVE_INFINITY}, ok, ks, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.lag_roots[0]",
        path(() -> new RationalFit(1, new double[] {0.0}, ok, ks, e1, 0.05, List.of(), "", null)));
    // lag roots closer than 1e-6 relative are one root; 1e-5 apart they are two
    assertEquals("rational_fit.lag_roots[1]", path(() -> RationalFit.checkedLagRoots("rational_fit.lag_roots",
        new double[] {1.0, 1.0 + 5e-7})));
    assertEquals("rational_fit.lag_roots[1]", path(() -> RationalFit.checkedLagRoots("rational_fit.lag_roots",
        new double[] {1.0 + 5e-7, 1.0})));
    assertEquals(2, RationalFit.checkedLagRoots("x", new double[] {1.0, 1.0 + 1e-5}).length);
    assertEquals("rational_fit.coefficients",
        path(() -> new RationalFit(1, LAGS, null, ks, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.coefficients",
        path(() -> new RationalFit(1, LAGS, new double[][][] {{{2}}, {{3}}, {{5}}}, ks, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.coefficients[0]",
        path(() -> new RationalFit(1, LAGS, new double[][][] {null, {{3}}, {{5}}, {{7}}}, ks, e1, 0.05, List.of(), "",
            null)));
    assertEquals("rational_fit.coefficients[0]",
        path(() -> new RationalFit(1, LAGS, new double[][][] {{}, {{3}}, {{5}}, {{7}}}, ks, e1, 0.05, List.of(), "",
            null)));
    assertEquals("rational_fit.coefficients[2]",
        path(() -> new RationalFit(1, LAGS, new double[][][] {{{2}}, {{3}}, null, {{7}}}, ks, e1, 0.05, List.of(), "",
            null)));
    assertEquals("rational_fit.coefficients[3]",
        path(() -> new RationalFit(1, LAGS, new double[][][] {{{2}}, {{3}}, {{5}}, {{7}, {8}}}, ks, e1, 0.05,
            List.of(), "", null)));
    assertEquals("rational_fit.coefficients[1][0]",
        path(() -> new RationalFit(1, LAGS, new double[][][] {{{2}}, {null}, {{5}}, {{7}}}, ks, e1, 0.05, List.of(), "",
            null)));
    assertEquals("rational_fit.coefficients[1][0]",
        path(() -> new RationalFit(1, LAGS, new double[][][] {{{2}}, {{3, 4}}, {{5}}, {{7}}}, ks, e1, 0.05, List.of(),
            "", null)));
    assertEquals("rational_fit.coefficients[2][0][0]",
        path(() -> new RationalFit(1, LAGS, new double[][][] {{{2}}, {{3}}, {{Double.NaN}}, {{7}}}, ks, e1, 0.05,
            List.of(), "", null)));
    assertEquals("rational_fit.coefficients[3][0][0]",
        path(() -> new RationalFit(1, LAGS, new double[][][] {{{2}}, {{3}}, {{5}}, {{Double.NEGATIVE_INFINITY}}}, ks,
            e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.reduced_frequencies",
        path(() -> new RationalFit(1, LAGS, ok, null, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.reduced_frequencies",
        path(() -> new RationalFit(1, LAGS, ok, new double[0], e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.reduced_frequencies[0]",
        path(() -> new RationalFit(1, LAGS, ok, new double[] {-0.1, 1}, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.reduced_frequencies[1]",
        path(() -> new RationalFit(1, LAGS, ok, new double[] {0, Double.POSITIVE_INFINITY}, e1, 0.05, List.of(), "",
            null)));
    assertEquals("rational_fit.reduced_frequencies[1]",
        path(() -> new RationalFit(1, LAGS, ok, new double[] {0.5, 0.5}, e1, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.error",
        path(() -> new RationalFit(1, LAGS, ok, ks, null, 0.05, List.of(), "", null)));
    assertEquals("rational_fit.error",
        path(() -> new RationalFit(1, LAGS, ok, ks, zeroError(2), 0.05, List.of(), "", null)));
    assertEquals("rational_fit.error_threshold",
        path(() -> new RationalFit(1, LAGS, ok, ks, e1, 0.0, List.of(), "", null)));
    assertEquals("rational_fit.error_threshold",
        path(() -> new RationalFit(1, LAGS, ok, ks, e1, Double.NaN, List.of(), "", null)));
    assertEquals("rational_fit.warnings",
        path(() -> new RationalFit(1, LAGS, ok, ks, e1, 0.05, null, "", null)));
    // a single reduced frequency of 0 is a valid fit record
    assertEquals(0.0, new RationalFit(1, LAGS, ok, new double[] {0}, e1, 0.05, List.of(), "", null)
        .maxReducedFrequency(), 0.0);
  }
}
