package org.flexmargin.ase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.ejml.dense.row.factory.LinearSolverFactory_ZDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.junit.jupiter.api.Test;

/**
 * The complex Gaussian elimination of the aircraft frequency response against EJML's general complex
 * LU (an independent library solving the same systems another way), a closed-form inverse, and
 * textbook cases that need row exchanges.
 */
class ComplexSystemSolverTest {
  private static final double EPS = Math.ulp(1.0);

  /** Fills the solver with a (row major, re/im interleaved) and b; returns the solution or null. */
  private static double[] solve(double[] a, double[] b) {
    ComplexSystemSolver s = new ComplexSystemSolver(b.length / 2);
    System.arraycopy(a, 0, s.matrix(), 0, a.length);
    System.arraycopy(b, 0, s.rhs(), 0, b.length);
    return s.solve() ? s.rhs().clone() : null;
  }

  private static double[] ejmlSolve(double[] a, double[] b) {
    int n = b.length / 2;
    ZMatrixRMaj am = new ZMatrixRMaj(n, n);
    System.arraycopy(a, 0, am.data, 0, a.length);
    ZMatrixRMaj bm = new ZMatrixRMaj(n, 1);
    System.arraycopy(b, 0, bm.data, 0, b.length);
    ZMatrixRMaj x = new ZMatrixRMaj(n, 1);
    LinearSolverDense<ZMatrixRMaj> lu = LinearSolverFactory_ZDRM.lu(n);
    assertTrue(lu.setA(am));
    lu.solve(bm, x);
    return x.data.clone();
  }

  /** Infinity-norm condition number ||A|| ||A^-1||, the inverse from EJML. */
  private static double condition(double[] a, int n) {
    ZMatrixRMaj am = new ZMatrixRMaj(n, n);
    System.arraycopy(a, 0, am.data, 0, a.length);
    ZMatrixRMaj inv = new ZMatrixRMaj(n, n);
    assertTrue(CommonOps_ZDRM.invert(am, inv));
    return rowSumNorm(a, n) * rowSumNorm(inv.data, n);
  }

  private static double rowSumNorm(double[] a, int n) {
    double best = 0;
    for (int i = 0; i < n; i++) {
      double sum = 0;
      for (int j = 0; j < n; j++) {
        sum += Math.hypot(a[2 * (i * n + j)], a[2 * (i * n + j) + 1]);
      }
      best = Math.max(best, sum);
    }
    return best;
  }

  private static double maxModulus(double[] v) {
    double best = 0;
    for (int i = 0; i < v.length; i += 2) {
      best = Math.max(best, Math.hypot(v[i], v[i + 1]));
    }
    return best;
  }

  private static double maxDifference(double[] x, double[] y) {
    double best = 0;
    for (int i = 0; i < x.length; i += 2) {
      best = Math.max(best, Math.hypot(x[i] - y[i], x[i + 1] - y[i + 1]));
    }
    return best;
  }

  /** max_i |b - A x|_i, computed from the original matrix. */
  private static double residual(double[] a, double[] b, double[] x) {
    int n = b.length / 2;
    double best = 0;
    for (int i = 0; i < n; i++) {
      double rr = b[2 * i];
      double ri = b[2 * i + 1];
      for (int j = 0; j < n; j++) {
        double ar = a[2 * (i * n + j)];
        double ai = a[2 * (i * n + j) + 1];
        rr -= ar * x[2 * j] - ai * x[2 * j + 1];
        ri -= ar * x[2 * j + 1] + ai * x[2 * j];
      }
      best = Math.max(best, Math.hypot(rr, ri));
    }
    return best;
  }

  private static double[] gaussian(Random r, int len) {
    double[] v = new double[len];
    for (int i = 0; i < len; i++) {
      v[i] = r.nextGaussian();
    }
    return v;
  }

  /**
   * Random complex systems of orders 1 to 14 (the plant has 2 + m, m about 10): both solvers are
   * backward stable, so each solution is within about 2 n kappa eps (relative) of the exact one, with
   * kappa the condition number computed from EJML's inverse; the tolerance is twice that, for the
   * two solutions' distance (it stays near 1e-13 to 1e-12 for these matrices). The residual check is Gaussian elimination's
   * backward-error bound |b - A x| &lt;= c n eps (|A| |x| + |b|) with a small growth factor
   * (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed., Thm 9.4; from memory), c = 4.
   */
  @Test
  void randomSystemsAgreeWithEjml() {
    Random r = new Random(20261203L);
    for (int n = 1; n <= 14; n++) {
      for (int trial = 0; trial < 20; trial++) {
        double[] a = gaussian(r, 2 * n * n);
        double[] b = gaussian(r, 2 * n);
        double[] x = solve(a, b);
        double[] ref = ejmlSolve(a, b);
        double kappa = condition(a, n);
        double tol = 4 * n * kappa * EPS;
        assertTrue(maxDifference(x, ref) <= tol * maxModulus(ref),
            "order " + n + " trial " + trial + ": " + maxDifference(x, ref) / maxModulus(ref) + " > " + tol);
        assertTrue(residual(a, b, x) <= 4 * n * EPS * (rowSumNorm(a, n) * maxModulus(x) + maxModulus(b)),
            "residual, order " + n + " trial " + trial);
      }
    }
  }

  /**
   * Order-12 systems scaled like the plant's (elastic rows ~1e7 against rigid rows ~1): the pivots
   * then come from the large rows first. Agreement with EJML within the same backward-stability
   * bound, 4 n kappa eps, kappa of the scaled matrix.
   */
  @Test
  void badlyScaledRowsAgreeWithEjml() {
    Random r = new Random(7L);
    int n = 12;
    for (int trial = 0; trial < 50; trial++) {
      double[] a = gaussian(r, 2 * n * n);
      for (int i = 2; i < n; i++) {
        for (int j = 0; j < 2 * n; j++) {
          a[2 * i * n + j] *= 1e7;
        }
      }
      double[] b = gaussian(r, 2 * n);
      double[] x = solve(a, b);
      double[] ref = ejmlSolve(a, b);
      double tol = 4 * n * condition(a, n) * EPS;
      assertTrue(maxDifference(x, ref) <= tol * maxModulus(ref), "trial " + trial);
      assertTrue(residual(a, b, x) <= 4 * n * EPS * (rowSumNorm(a, n) * maxModulus(x) + maxModulus(b)),
          "residual, trial " + trial);
    }
  }

  /**
   * (1 + i) H with H the Hilbert matrix of order 6 (kappa about 3e7): b = e_1 gives x = (1 - i) / 2
   * times the first column of H^-1, whose integer entries have the closed form
   * (H^-1)_ij = (-1)^(i+j) (i+j-1) C(n+i-1, n-j) C(n+j-1, n-i) C(i+j-2, i-1)^2 (1-based; Choi,
   * "Tricks or treats with the Hilbert matrix", Amer. Math. Monthly 90, 1983; from memory). The
   * entries 1/(i+j-1) are rounded, so the stored matrix is a relative eps perturbation: tolerance
   * 4 n kappa eps with kappa = ||H|| ||H^-1|| from the closed forms. EJML must agree to the same bound.
   */
  @Test
  void illConditionedHilbertSystemAgainstClosedFormInverse() {
    int n = 6;
    double[] a = new double[2 * n * n];
    double[] b = new double[2 * n];
    b[0] = 1;
    double normH = 0;
    double normInv = 0;
    double[] firstColumn = new double[n];
    for (int i = 1; i <= n; i++) {
      double rowH = 0;
      double rowInv = 0;
      for (int j = 1; j <= n; j++) {
        double h = 1.0 / (i + j - 1);
        a[2 * ((i - 1) * n + j - 1)] = h;
        a[2 * ((i - 1) * n + j - 1) + 1] = h;
        rowH += h;
        double inv = ((i + j) % 2 == 0 ? 1 : -1) * (i + j - 1) * binomial(n + i - 1, n - j)
            * binomial(n + j - 1, n - i) * Math.pow(binomial(i + j - 2, i - 1), 2);
        rowInv += Math.abs(inv);
        if (j == 1) {
          firstColumn[i - 1] = inv;
        }
      }
      normH = Math.max(normH, rowH);
      normInv = Math.max(normInv, rowInv);
    }
    // a sanity check of the closed form: (H^-1)_11 = n^2 for every order
    assertEquals(n * n, firstColumn[0], 0.0);
    double kappa = normH * normInv;
    assertTrue(kappa > 1e7, "ill-conditioned: " + kappa);
    double tol = 4 * n * kappa * EPS;
    double[] x = solve(a, b);
    double[] ref = ejmlSolve(a, b);
    double scale = 0;
    for (double c : firstColumn) {
      scale = Math.max(scale, Math.abs(c) / Math.sqrt(2));
    }
    for (int i = 0; i < n; i++) {
      // x_i = (1 - i)/2 c_i
      assertEquals(firstColumn[i] / 2, x[2 * i], tol * scale, "re " + i);
      assertEquals(-firstColumn[i] / 2, x[2 * i + 1], tol * scale, "im " + i);
    }
    assertTrue(maxDifference(x, ref) <= 2 * tol * maxModulus(ref));
  }

  private static double binomial(int n, int k) {
    double c = 1;
    for (int i = 1; i <= k; i++) {
      c = c * (n - k + i) / i;
    }
    return c;
  }

  /**
   * [[1e-20, 1], [1, 1]] x = [1, 2]: without a row exchange the multiplier 1e20 swamps the second
   * row and x_1 comes out 0; with partial pivoting x = (1/(1 - 1e-20), (1 - 2e-20)/(1 - 1e-20)),
   * i.e. (1, 1) to working precision (the classic example of Forsythe &amp; Moler, Computer Solution
   * of Linear Algebraic Systems, ch. 9; from memory). Both exact to round-off.
   */
  @Test
  void rowExchangeIsNeededAndMade() {
    double[] x = solve(new double[] {1e-20, 0, 1, 0, 1, 0, 1, 0}, new double[] {1, 0, 2, 0});
    assertEquals(1, x[0], 2 * EPS);
    assertEquals(0, x[1], 0.0);
    assertEquals(1, x[2], 2 * EPS);
    assertEquals(0, x[3], 0.0);
    // a zero leading entry: [[0, i], [2, 0]] x = [1, 4] gives x = (2, -i) exactly
    double[] y = solve(new double[] {0, 0, 0, 1, 2, 0, 0, 0}, new double[] {1, 0, 4, 0});
    assertEquals(2, y[0], 0.0);
    assertEquals(0, y[1], 0.0);
    assertEquals(0, y[2], 0.0);
    assertEquals(-1, y[3], 0.0);
  }

  /**
   * The same swamping at the second step, with the large candidate purely imaginary: rows
   * [1, 0, 0, 0], [0, 1e-20, 1, 0], [0, i, 1, 0], [0, 0, 0, 1] and b = (1, 1, 1 + i, 1). Exactly,
   * x_2 = i / (i - 1e-20) and x_3 = 1 - 1e-20 x_2, both 1 to working precision; without the exchange
   * x_2 would come out 0. The candidate's size is |Re| + |Im|, so the imaginary part must count.
   */
  @Test
  void rowExchangeAtALaterStepWithAnImaginaryCandidate() {
    int n = 4;
    double[] a = new double[2 * n * n];
    a[0] = 1;
    a[2 * (n + 1)] = 1e-20;
    a[2 * (n + 2)] = 1;
    a[2 * (2 * n + 1) + 1] = 1;
    a[2 * (2 * n + 2)] = 1;
    a[2 * (3 * n + 3)] = 1;
    double[] x = solve(a, new double[] {1, 0, 1, 0, 1, 1, 1, 0});
    double[] expected = {1, 0, 1, 0, 1, 0, 1, 0};
    for (int i = 0; i < 2 * n; i++) {
      assertEquals(expected[i], x[i], 4 * EPS, "entry " + i);
    }
  }

  /**
   * Pivots with the larger part real and with the larger part imaginary (the two branches of Smith's
   * division): a 2 x 2 triangular system with exact answers. [[3+4i, 1], [0, 1+2i]] x = [b1, b2] with
   * b2 = (1+2i)(2-i) = 4+3i and b1 = (3+4i)(1+i) + (2-i) = 1+6i gives x = (1+i, 2-i).
   */
  @Test
  void bothBranchesOfTheComplexQuotient() {
    double[] a = {3, 4, 1, 0, 0, 0, 1, 2};
    double[] x = solve(a, new double[] {1, 6, 4, 3});
    assertEquals(1, x[0], 4 * EPS);
    assertEquals(1, x[1], 4 * EPS);
    assertEquals(2, x[2], 4 * EPS);
    assertEquals(-1, x[3], 4 * EPS);
    // the same with the columns' real and imaginary roles swapped: multiply row 1 by -i, row 2 by i:
    // [[4-3i, -i], [0, -2+i]] x = [6-i, -3+4i]
    double[] b = {4, -3, 0, -1, 0, 0, -2, 1};
    double[] y = solve(b, new double[] {6, -1, -3, 4});
    assertEquals(1, y[0], 4 * EPS);
    assertEquals(1, y[1], 4 * EPS);
    assertEquals(2, y[2], 4 * EPS);
    assertEquals(-1, y[3], 4 * EPS);
    // 1 x 1 with a purely imaginary pivot: (2i) x = 6 - 4i, x = -2 - 3i
    double[] z = solve(new double[] {0, 2}, new double[] {6, -4});
    assertEquals(-2, z[0], 0.0);
    assertEquals(-3, z[1], 0.0);
  }

  /** A lower-triangular system: the elimination below the diagonal must be carried out. */
  @Test
  void eliminationBelowTheDiagonal() {
    // [[2, 0, 0], [1, 1, 0], [i, 0, 1]] x = [2, 3, 1 + i] gives x = (1, 2, 1)
    double[] a = {2, 0, 0, 0, 0, 0, 1, 0, 1, 0, 0, 0, 0, 1, 0, 0, 1, 0};
    double[] x = solve(a, new double[] {2, 0, 3, 0, 1, 1});
    double[] expected = {1, 0, 2, 0, 1, 0};
    for (int i = 0; i < 6; i++) {
      assertEquals(expected[i], x[i], 4 * EPS, "entry " + i);
    }
  }

  /** Singular or non-finite systems are reported, not solved into garbage. */
  @Test
  void singularSystemsAreReported() {
    // a zero column
    assertFalse(new ComplexSystemSolver(1).solve());
    double[] zeroColumn = {1, 1, 0, 0, 2, 0, 0, 0};
    assertEquals(null, solve(zeroColumn, new double[] {1, 0, 1, 0}));
    // second row twice the first (exact in binary): the last pivot is exactly zero
    double[] dependent = {1, 0, 3, 0, 0.5, 0, 2, 0, 6, 0, 1, 0, 0, 0, 1, 0, 1, 0};
    assertEquals(null, solve(dependent, new double[] {1, 0, 2, 0, 0, 0}));
    // a NaN entry
    assertEquals(null, solve(new double[] {Double.NaN, 0, 0, 0, 0, 0, 1, 0}, new double[] {1, 0, 1, 0}));
    // finite pivots whose quotient overflows, in its real or in its imaginary part
    assertEquals(null, solve(new double[] {1e-300, 0}, new double[] {1e300, 0}));
    assertEquals(null, solve(new double[] {1e-300, 0}, new double[] {0, 1e300}));
    assertThrows(IllegalArgumentException.class, () -> new ComplexSystemSolver(0));
    assertEquals(3, new ComplexSystemSolver(3).order());
  }
}
