package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * Shifted inverse iteration for the eigenvalue nearest a shift ({@link NearestEigenvalue}) against
 * matrices with known eigenvalues and against Commons Math's eigen-decomposition.
 */
class NearestEigenvalueTest {

  /**
   * Eigenvalues -1 +- 4j, -0.5 +- 10j, -3 and 2 (derived: block diagonal D of the 2 x 2 blocks
   * [a b; -b a], eigenvalues a +- j b, and the two real entries), hidden by the similarity
   * T D T^-1 with T unit upper triangular (ones above the diagonal), which keeps the eigenvalues.
   */
  private static DMatrixRMaj known() {
    DMatrixRMaj d = new DMatrixRMaj(new double[][] {
        {-1, 4, 0, 0, 0, 0}, {-4, -1, 0, 0, 0, 0}, {0, 0, -0.5, 10, 0, 0}, {0, 0, -10, -0.5, 0, 0},
        {0, 0, 0, 0, -3, 0}, {0, 0, 0, 0, 0, 2}});
    DMatrixRMaj t = new DMatrixRMaj(6, 6);
    for (int i = 0; i < 6; i++) {
      for (int j = i; j < 6; j++) {
        t.set(i, j, 1);
      }
    }
    DMatrixRMaj ti = new DMatrixRMaj(6, 6);
    CommonOps_DDRM.invert(t, ti);
    DMatrixRMaj td = new DMatrixRMaj(6, 6);
    CommonOps_DDRM.mult(t, d, td);
    DMatrixRMaj a = new DMatrixRMaj(6, 6);
    CommonOps_DDRM.mult(td, ti, a);
    return a;
  }

  /**
   * Every shift within a quarter of the distance to the next root returns the root it is near.
   * Tolerance 1e-12 relative: the iteration stops at a change of 1e-14 and the matrix entries are
   * exact to round-off (T has small integer entries and an integer inverse).
   */
  @Test
  void findsTheRootNearTheShift() {
    DMatrixRMaj a = known();
    double[][] roots = {{-1, 4}, {-1, -4}, {-0.5, 10}, {-0.5, -10}, {-3, 0}, {2, 0}};
    double[][] offsets = {{0.3, 0.2}, {-0.4, 0.1}, {0.05, -0.5}};
    for (double[] r : roots) {
      for (double[] o : offsets) {
        NearestEigenvalue.Estimate e = NearestEigenvalue.near(a, r[0] + o[0], r[1] + o[1]);
        assertTrue(e.converged(), "shift near " + r[0] + ", " + r[1]);
        double scale = Math.hypot(r[0], r[1]);
        assertEquals(r[0], e.real(), 1e-12 * scale);
        assertEquals(r[1], e.imag(), 1e-12 * scale);
        assertTrue(e.iterations() >= 2 && e.iterations() <= NearestEigenvalue.MAX_ITERATIONS);
      }
    }
  }

  /**
   * Shift 2 + 0.1 j: the root 2 is 0.1 away, -1 + 4j is hypot(3, 3.9) away; against a general
   * matrix whose eigenvalues come from Commons Math (an independent QR algorithm): the root found
   * is the one nearest the shift among them. Tolerance 1e-9 relative: two backward-stable
   * methods on a well-conditioned 8 x 8 matrix.
   */
  @Test
  void agreesWithAnIndependentSolverOnAGeneralMatrix() {
    int n = 8;
    double[][] arr = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        arr[i][j] = Math.sin(1.7 * i + 0.9 * j * j + 0.3) * (i == j ? 5 : 1);
      }
    }
    EigenDecomposition cm = new EigenDecomposition(new Array2DRowRealMatrix(arr));
    double[] re = cm.getRealEigenvalues();
    double[] im = cm.getImagEigenvalues();
    DMatrixRMaj a = new DMatrixRMaj(arr);
    int checked = 0;
    for (int k = 0; k < n; k++) {
      double sr = re[k] + 0.01;
      double si = im[k] - 0.02;
      NearestEigenvalue.Estimate e = NearestEigenvalue.near(a, sr, si);
      if (!e.converged()) {
        continue;
      }
      int nearest = 0;
      for (int j = 1; j < n; j++) {
        if (Math.hypot(re[j] - sr, im[j] - si) < Math.hypot(re[nearest] - sr, im[nearest] - si)) {
          nearest = j;
        }
      }
      double scale = Math.max(1, Math.hypot(re[nearest], im[nearest]));
      assertEquals(re[nearest], e.real(), 1e-9 * scale);
      assertEquals(im[nearest], e.imag(), 1e-9 * scale);
      checked++;
    }
    assertTrue(checked >= n - 1, "converged for " + checked + " of " + n + " shifts");
  }

  /**
   * The upper triangular [1 0.5; 0 3] has the eigenvalues 1 and 3 (its diagonal). The shift 2 is 1
   * from both (rho = 1): the iteration cannot settle and reports no convergence, leaving the
   * choice to a full eigen-solve. The shift 2.9 is 0.1 from 3 and 1.9 from 1 and settles on 3
   * (tolerance 1e-13: stopping change 1e-14 of |lambda|, exact entries).
   */
  @Test
  void refusesAShiftEquallyFarFromTwoRoots() {
    DMatrixRMaj a = new DMatrixRMaj(new double[][] {{1, 0.5}, {0, 3}});
    NearestEigenvalue.Estimate e = NearestEigenvalue.near(a, 2, 0);
    assertFalse(e.converged());
    assertTrue(Double.isNaN(e.real()) && Double.isNaN(e.imag()));
    assertEquals(NearestEigenvalue.MAX_ITERATIONS, e.iterations());
    NearestEigenvalue.Estimate near3 = NearestEigenvalue.near(a, 2.9, 0);
    assertTrue(near3.converged());
    assertEquals(3, near3.real(), 1e-13);
    assertEquals(0, near3.imag(), 1e-13);
  }

  @Test
  void refusesBadInputs() {
    assertThrows(InvalidInputException.class, () -> NearestEigenvalue.near(null, 0, 0));
    assertThrows(InvalidInputException.class, () -> NearestEigenvalue.near(new DMatrixRMaj(2, 3), 0, 0));
    assertThrows(InvalidInputException.class, () -> NearestEigenvalue.near(new DMatrixRMaj(0, 0), 0, 0));
    assertThrows(InvalidInputException.class, () -> NearestEigenvalue.near(known(), Double.NaN, 0));
    assertThrows(InvalidInputException.class, () -> NearestEigenvalue.near(known(), 0, Double.POSITIVE_INFINITY));
    assertThrows(InvalidInputException.class, () -> new NearestEigenvalue.Estimate(1, 2, -1, true));
    assertThrows(InvalidInputException.class, () -> new NearestEigenvalue.Estimate(Double.NaN, 2, 3, true));
    assertEquals(3, new NearestEigenvalue.Estimate(Double.NaN, Double.NaN, 3, false).iterations());
  }

  /** The start vector has unit norm and no zero component. */
  @Test
  void startVectorIsAUnitVectorWithoutZeros() {
    var x = NearestEigenvalue.startVector(50);
    double sum = 0;
    for (int i = 0; i < 50; i++) {
      double m = Math.hypot(x.data[2 * i], x.data[2 * i + 1]);
      assertTrue(m > 1e-3);
      sum += m * m;
    }
    assertEquals(1, sum, 1e-14);
  }

  /**
   * The same matrix scaled by 1000 (eigenvalues scale with it: -1000 +- 4000j, ...): the stopping
   * test is relative to |lambda| and the residual test relative to |A|, so the iteration settles
   * just as well on large roots. Tolerance 1e-12 relative, as above.
   */
  @Test
  void settlesOnLargeRootsAsOnSmallOnes() {
    DMatrixRMaj a = known();
    CommonOps_DDRM.scale(1000, a);
    NearestEigenvalue.Estimate e = NearestEigenvalue.near(a, -1100, 3800);
    assertTrue(e.converged());
    assertEquals(-1000, e.real(), 1e-12 * 4123);
    assertEquals(4000, e.imag(), 1e-12 * 4123);
  }

  /** A shift exactly on an eigenvalue of diag(1, 2, 3) makes A - sigma I singular: refused. */
  @Test
  void refusesAShiftOnAnEigenvalue() {
    DMatrixRMaj a = new DMatrixRMaj(new double[][] {{1, 0, 0}, {0, 2, 0}, {0, 0, 3}});
    NearestEigenvalue.Estimate e = NearestEigenvalue.near(a, 2, 0);
    assertFalse(e.converged());
    assertEquals(1, e.iterations());
  }

  /**
   * |A x - lambda x| for A = diag(2, 3) and x = (1, 0): 0 at lambda = 2, |2 - 2.5| = 0.5 at 2.5,
   * |2 - (2 + j)| = 1 at 2 + j; for x = (0, j): |3 - 1| = 2 at lambda = 1.
   */
  @Test
  void residualIsTheNormOfAxMinusLambdaX() {
    DMatrixRMaj a = new DMatrixRMaj(new double[][] {{2, 0}, {0, 3}});
    var x = new org.ejml.data.ZMatrixRMaj(2, 1);
    x.set(0, 0, 1, 0);
    assertEquals(0, NearestEigenvalue.residual(a, x, 2, 0), 0.0);
    assertEquals(0.5, NearestEigenvalue.residual(a, x, 2.5, 0), 1e-15);
    assertEquals(1, NearestEigenvalue.residual(a, x, 2, 1), 1e-15);
    var y = new org.ejml.data.ZMatrixRMaj(2, 1);
    y.set(1, 0, 0, 1);
    assertEquals(2, NearestEigenvalue.residual(a, y, 1, 0), 1e-15);
  }
}
