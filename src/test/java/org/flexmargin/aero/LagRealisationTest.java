package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * The lag terms of a rational fit as aerodynamic states: Roger's n states per lag root and Karpel's
 * one, both reproducing the fit's Q(p) off the imaginary axis, their state numbering, the writers of
 * the state equations, and the checks on a minimum-state fit's lag matrices.
 */
class LagRealisationTest {

  /** Random 3 x 3 data of the minimum-state form at three lag roots (rank-one lag matrices). */
  private static RationalFit minimumStateFit() {
    RogerApproximationTest.RogerFormData data = MinimumStateApproximationTest.minimumStateData(5);
    return fit(data.a, data.beta, RationalFit.MINIMUM_STATE);
  }

  private static RationalFit fit(double[][][] a, double[] beta, String form) {
    int n = a[0].length;
    return new RationalFit(0.7, beta, a, new double[] {0, 0.5, 1.5}, FitError.of(new double[n][n], new double[n][n]),
        0.05, List.of(), "data", form);
  }

  private static String path(Runnable r) {
    return assertThrows(InvalidInputException.class, r::run).fieldPath();
  }

  /**
   * Q(p) = A0 + A1 p + A2 p^2 + C (p I - A)^-1 B p of the realisation, with A = diag(-beta_l) over
   * the lag states, B the stacked E_l and C = [D_1 .. D_nL], by a dense complex LU solve (EJML):
   * generic linear algebra that knows nothing of the block structure.
   */
  private static ZMatrixRMaj realised(RationalFit f, LagRealisation lags, double pr, double pi) {
    int n = f.size();
    int ns = lags.stateCount();
    ZMatrixRMaj sys = new ZMatrixRMaj(ns, ns);
    ZMatrixRMaj bp = new ZMatrixRMaj(ns, n);
    ZMatrixRMaj c = new ZMatrixRMaj(n, ns);
    for (int l = 0; l < lags.lagCount(); l++) {
      for (int k = 0; k < lags.states(l); k++) {
        int s = lags.firstState(l) + k;
        sys.set(s, s, pr + lags.lagRoot(l), pi);
        for (int j = 0; j < n; j++) {
          bp.set(s, j, lags.input(l, k, j) * pr, lags.input(l, k, j) * pi);
          c.set(j, s, lags.output(l, j, k), 0);
        }
      }
    }
    ZMatrixRMaj x = new ZMatrixRMaj(ns, n);
    assertTrue(CommonOps_ZDRM.solve(sys, bp, x));
    ZMatrixRMaj q = new ZMatrixRMaj(n, n);
    CommonOps_ZDRM.mult(c, x, q);
    double p2r = pr * pr - pi * pi;
    double p2i = 2 * pr * pi;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double a0 = f.coefficient(0, i, j);
        double a1 = f.coefficient(1, i, j);
        double a2 = f.coefficient(2, i, j);
        q.set(i, j, q.getReal(i, j) + a0 + a1 * pr + a2 * p2r, q.getImag(i, j) + a1 * pi + a2 * p2i);
      }
    }
    return q;
  }

  private static void assertReproducesTheFit(RationalFit f, LagRealisation lags) {
    // Closed form: D_l (p + beta_l)^-1 E_l p = A_{l+3} p / (p + beta_l) when D_l E_l = A_{l+3}, so
    // the realisation is the fit's formula rearranged. Points on, left and right of the imaginary
    // axis, between and beyond the lag roots (0.08 .. 0.9). 1e-12 of the largest |Q_ij|: a few
    // dozen rounded operations on entries of order 1 (round-off ~1e-15), and the rank-one
    // refactoring of the minimum-state lag matrices agrees to rounding as well.
    double[][] ps = {{0, 0.3}, {0.2, 1.1}, {-0.05, 0.6}, {1.5, -2.0}, {-0.4, 0.01}, {3.0, 0}};
    int n = f.size();
    ZMatrixRMaj own = new ZMatrixRMaj(n, n);
    for (double[] p : ps) {
      ZMatrixRMaj got = realised(f, lags, p[0], p[1]);
      f.evaluateLaplace(p[0], p[1], own);
      double largest = 0;
      for (int e = 0; e < n * n; e++) {
        largest = Math.max(largest, Math.hypot(own.data[2 * e], own.data[2 * e + 1]));
      }
      for (int e = 0; e < 2 * n * n; e++) {
        assertEquals(own.data[e], got.data[e], 1e-12 * largest, "entry " + e + " at p = " + p[0] + " + " + p[1] + " i");
      }
    }
  }

  @Test
  void minimumStateRealisationHasOneStatePerLagRootAndReproducesQ() {
    RationalFit f = minimumStateFit();
    LagRealisation lags = f.lagRealisation();
    assertEquals(3, lags.size());
    assertEquals(3, lags.lagCount());
    assertEquals(3, lags.stateCount());
    for (int l = 0; l < 3; l++) {
      assertEquals(1, lags.states(l));
      assertEquals(l, lags.firstState(l));
      assertEquals(f.lagRoot(l), lags.lagRoot(l), 0.0);
    }
    assertFalse(lags.perCoordinate());
    assertReproducesTheFit(f, lags);
  }

  @Test
  void rogerRealisationHasNStatesPerLagRootAndReproducesQ() {
    RogerApproximationTest.RogerFormData data = MinimumStateApproximationTest.minimumStateData(5);
    double[][][] a = data.a;
    a[3][0][2] += 0.3; // no longer of rank one: Roger's form realises any lag matrix
    RationalFit f = fit(a, data.beta, RationalFit.ROGER);
    LagRealisation lags = f.lagRealisation();
    assertEquals(9, lags.stateCount());
    assertEquals(3, lags.states(1));
    assertEquals(6, lags.firstState(2));
    assertTrue(lags.perCoordinate());
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        assertEquals(i == j ? 1.0 : 0.0, lags.input(1, i, j), 0.0);
        assertEquals(a[4][i][j], lags.output(1, i, j), 0.0);
      }
    }
    assertReproducesTheFit(f, lags);
  }

  @Test
  void theSameMatricesCalledRogerFormGetTheFullRealisation() {
    RationalFit ms = minimumStateFit();
    RationalFit roger = fit(ms.coefficients(), ms.lagRoots(), RationalFit.ROGER);
    assertEquals(9, roger.lagRealisation().stateCount());
    assertEquals(3, ms.lagRealisation().stateCount());
    // a fit without lag roots has no lag states in either form
    RationalFit none = fit(new double[][][] {{{1}}, {{0}}, {{0}}}, new double[0], RationalFit.MINIMUM_STATE);
    assertEquals(0, none.lagRealisation().stateCount());
    assertEquals(1, none.lagRealisation().size());
  }

  @Test
  void aMinimumStateFitNeedsLagMatricesOfRankOne() {
    RationalFit ms = minimumStateFit();
    double[][][] a = ms.coefficients();
    // a relative change of 1e-6 in one entry is far above round-off and breaks rank one
    a[4][1][2] *= 1 + 1e-6;
    assertEquals("rational_fit.coefficients[4]", path(() -> fit(a, ms.lagRoots(), RationalFit.MINIMUM_STATE)));
    assertEquals(RationalFit.ROGER, fit(a, ms.lagRoots(), RationalFit.ROGER).form());
    // the identity has rank n
    double[][][] id = {{{1, 0}, {0, 1}}, new double[2][2], new double[2][2], {{1, 0}, {0, 1}}};
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> fit(id, new double[] {0.4}, RationalFit.MINIMUM_STATE));
    assertEquals("rational_fit.coefficients[3]", e.fieldPath());
    assertTrue(e.getMessage().contains("rank one"), e.getMessage());
    // the residual is reported relative to the largest entry: 2 I leaves 2 of 2 after its first row
    double[][][] twice = {{{1, 0}, {0, 1}}, new double[2][2], new double[2][2], {{2, 0}, {0, 2}}};
    String words = assertThrows(InvalidInputException.class,
        () -> fit(twice, new double[] {0.4}, RationalFit.MINIMUM_STATE)).getMessage();
    assertTrue(words.contains("residual of 1.00 of its largest entry"), words);
    // the tolerance is relative: a defect of 1e-11 of the largest entry passes at any scale
    double[][][] big = ms.coefficients();
    for (double[] row : big[3]) {
      for (int j = 0; j < row.length; j++) {
        row[j] *= 1e3;
      }
    }
    big[3][1][1] += 1e-11 * 1e3;
    assertEquals(3, fit(big, ms.lagRoots(), RationalFit.MINIMUM_STATE).lagRealisation().stateCount());
    // a zero lag matrix is of rank one (and zero) and the products of the fit pass unchanged
    double[][][] zero = {{{1, 0}, {0, 1}}, new double[2][2], new double[2][2], new double[2][2]};
    assertEquals(1, fit(zero, new double[] {0.4}, RationalFit.MINIMUM_STATE).lagRealisation().stateCount());
    assertEquals(RationalFit.MINIMUM_STATE, ms.form());
  }

  @Test
  void writesTheForceColumnsAndTheLagRows() {
    // n = 2; lag 0 rank one (e = (3, 4) / 5, d = (2, -1)), lag 1 Roger-like (E = I, D = [[1, 2], [3, 4]]):
    // states z0 (one) and z1 (two). Hand-written expectation.
    LagRealisation lags = new LagRealisation(2, new double[] {0.5, 2.0},
        new double[][][] {{{0.6, 0.8}}, {{1, 0}, {0, 1}}},
        new double[][][] {{{2}, {-1}}, {{1, 2}, {3, 4}}});
    assertEquals(3, lags.stateCount());
    assertEquals(1, lags.firstState(1));
    assertFalse(lags.perCoordinate());
    double[][][] id = {{{1, 0}, {0, 1}}};
    assertTrue(new LagRealisation(2, new double[] {0.5}, id, id).perCoordinate());
    assertFalse(new LagRealisation(2, new double[] {0.5}, new double[][][] {{{1, 0}, {0.5, 1}}}, id).perCoordinate());
    assertFalse(new LagRealisation(2, new double[] {0.5}, new double[][][] {{{1, 0}, {0, 2}}}, id).perCoordinate());
    // one row that is the first row of the identity is still not a per-coordinate block
    assertFalse(LagRealisation.rankOne(new double[] {0.5}, new double[][] {{1, 2}}, new double[][] {{1, 0}})
        .perCoordinate());
    DMatrixRMaj rhs = new DMatrixRMaj(2, 7);
    lags.setForceColumns(rhs, 0, 4, 10.0);
    assertArrayEquals(new double[] {0, 0, 0, 0, 20, 10, 20, 0, 0, 0, 0, -10, 30, 40}, rhs.data, 0.0);
    DMatrixRMaj a = new DMatrixRMaj(7, 7);
    lags.setLagRows(a, 4, 2, beta -> -3 * beta);
    double[] expected = new double[49];
    expected[4 * 7 + 2] = 0.6;
    expected[4 * 7 + 3] = 0.8;
    expected[4 * 7 + 4] = -1.5;
    expected[5 * 7 + 2] = 1;
    expected[5 * 7 + 5] = -6;
    expected[6 * 7 + 3] = 1;
    expected[6 * 7 + 6] = -6;
    assertArrayEquals(expected, a.data, 0.0);
    // offsets: rows 1.. of a taller target
    DMatrixRMaj shifted = new DMatrixRMaj(3, 4);
    lags.setForceColumns(shifted, 1, 1, 1.0);
    assertEquals(2, shifted.get(1, 1), 0.0);
    assertEquals(4, shifted.get(2, 3), 0.0);
    assertEquals(0, shifted.get(0, 1), 0.0);
  }

  @Test
  void arraysAreCopiedInAndOut() {
    double[] roots = {0.5};
    double[][][] in = {{{0.6, 0.8}}};
    double[][][] out = {{{2}, {-1}}};
    LagRealisation lags = new LagRealisation(2, roots, in, out);
    roots[0] = 9;
    in[0][0][0] = 9;
    out[0][0][0] = 9;
    assertEquals(0.5, lags.lagRoot(0), 0.0);
    assertEquals(0.6, lags.input(0, 0, 0), 0.0);
    assertEquals(2, lags.output(0, 0, 0), 0.0);
    lags.lagRoots()[0] = 9;
    lags.inputs()[0][0][0] = 9;
    lags.outputs()[0][0][0] = 9;
    assertEquals(0.5, lags.lagRoots()[0], 0.0);
    assertEquals(0.6, lags.inputs()[0][0][0], 0.0);
    assertEquals(2, lags.outputs()[0][0][0], 0.0);
    assertEquals(0.8, lags.inputs()[0][0][1], 0.0);
    assertEquals(-1, lags.outputs()[0][1][0], 0.0);
  }

  @Test
  void invalidRealisationsAreRejectedWithTheirFieldPaths() {
    double[] one = {0.5};
    double[][][] e = {{{0.6, 0.8}}};
    double[][][] d = {{{2}, {-1}}};
    assertEquals("lag_realisation.size", path(() -> new LagRealisation(0, one, e, d)));
    assertEquals("lag_realisation.lag_roots[0]", path(() -> new LagRealisation(2, new double[] {-1}, e, d)));
    assertEquals("lag_realisation", path(() -> new LagRealisation(2, one, null, d)));
    assertEquals("lag_realisation", path(() -> new LagRealisation(2, one, e, null)));
    assertEquals("lag_realisation", path(() -> new LagRealisation(2, one, new double[0][][], d)));
    assertEquals("lag_realisation", path(() -> new LagRealisation(2, one, e, new double[2][][])));
    assertEquals("lag_realisation.inputs[0]", path(() -> new LagRealisation(2, one, new double[][][] {{}}, d)));
    assertEquals("lag_realisation.inputs[0]", path(() -> new LagRealisation(2, one, new double[1][][], d)));
    assertEquals("lag_realisation.inputs[0][0]", path(() -> new LagRealisation(2, one, new double[][][] {{{1}}}, d)));
    assertEquals("lag_realisation.inputs[0][0]", path(() -> new LagRealisation(2, one, new double[][][] {{null}}, d)));
    assertEquals("lag_realisation.inputs[0][0][1]",
        path(() -> new LagRealisation(2, one, new double[][][] {{{1, Double.NaN}}}, d)));
    assertEquals("lag_realisation.outputs[0]", path(() -> new LagRealisation(2, one, e, new double[][][] {{{2}}})));
    assertEquals("lag_realisation.outputs[0]", path(() -> new LagRealisation(2, one, e, new double[1][][])));
    assertEquals("lag_realisation.outputs[0][1]",
        path(() -> new LagRealisation(2, one, e, new double[][][] {{{2}, {1, 1}}})));
    assertEquals("lag_realisation.outputs[0][1][0]",
        path(() -> new LagRealisation(2, one, e, new double[][][] {{{2}, {Double.POSITIVE_INFINITY}}})));
    assertEquals("lag_realisation", path(() -> LagRealisation.rankOne(one, null, new double[][] {{1}})));
    assertEquals("lag_realisation", path(() -> LagRealisation.rankOne(one, new double[0][], new double[0][])));
    assertEquals("lag_realisation", path(() -> LagRealisation.rankOne(one, new double[][] {{1}}, null)));
    assertEquals("lag_realisation", path(() -> LagRealisation.rankOne(one, new double[][] {{1}}, new double[2][])));
    assertEquals("lag_realisation", path(() -> LagRealisation.rankOne(one, new double[][] {{1}}, new double[1][])));
    assertEquals("lag_realisation.outputs[0]",
        path(() -> LagRealisation.rankOne(one, new double[][] {{1}}, new double[][] {{1, 2}})));
    assertEquals("lag_realisation.outputs[0]",
        path(() -> LagRealisation.rankOne(one, new double[][] {null}, new double[][] {{1, 2}})));
    LagRealisation ok = LagRealisation.rankOne(one, new double[][] {{2, -1}}, new double[][] {{0.6, 0.8}});
    assertEquals(-1, ok.output(0, 1, 0), 0.0);
    assertEquals(0.8, ok.input(0, 0, 1), 0.0);
    assertEquals(0, LagRealisation.roger(2, new double[0], new double[0][][]).stateCount());
    assertEquals("lag_realisation", path(() -> LagRealisation.roger(2, one, null)));
  }
}
