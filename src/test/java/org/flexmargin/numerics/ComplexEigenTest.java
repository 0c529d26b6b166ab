package org.flexmargin.numerics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.ejml.data.Complex_F64;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.decompose.lu.LUDecompositionAlt_ZDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Validation of the complex eigen-decomposition against an independent library (EJML's real
 * general eigen-decomposition), closed forms (companion matrices of polynomials with chosen roots,
 * triangular matrices) and invariants (trace, determinant from EJML's complex LU, residuals).
 */
class ComplexEigenTest {

  private final ComplexEigen eigen = new ComplexEigen();

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 3, 5, 8, 20, 60})
  void realMatricesAgreeWithEjml(int n) {
    // Independent library: EJML's real general eigen-decomposition (Francis double-shift QR).
    Random rnd = new Random(345 + n);
    DMatrixRMaj a = new DMatrixRMaj(n, n);
    for (int i = 0; i < n * n; i++) {
      a.data[i] = rnd.nextGaussian();
    }
    EigenDecomposition_F64<DMatrixRMaj> ej = DecompositionFactory_DDRM.eig(n, false);
    assertTrue(ej.decompose(a.copy()));
    double[][] expected = new double[n][];
    for (int i = 0; i < n; i++) {
      Complex_F64 ev = ej.getEigenvalue(i);
      expected[i] = new double[] {ev.real, ev.imaginary};
    }
    ComplexEigenResult r = eigen.decompose(toComplex(a));
    double[][] got = new double[n][];
    for (int i = 0; i < n; i++) {
      got[i] = new double[] {r.realAt(i), r.imagAt(i)};
    }
    sort(expected);
    sort(got);
    for (int i = 0; i < n; i++) {
      // 1e-9 absolute on O(sqrt n) eigenvalues of Gaussian matrices: both solvers are backward
      // stable (~1e-15 ||A||); eigenvalue conditioning of random matrices costs a few digits.
      assertEquals(expected[i][0], got[i][0], 1e-9, "re " + i);
      assertEquals(expected[i][1], got[i][1], 1e-9, "im " + i);
    }
    assertTrue(r.relativeResidual() < 1e-12 * n, "residual " + r.relativeResidual());
  }

  @ParameterizedTest
  @ValueSource(ints = {2, 4, 10, 40, 120})
  void complexMatricesSatisfyResidualTraceAndDeterminant(int n) {
    Random rnd = new Random(7 * n);
    ZMatrixRMaj a = new ZMatrixRMaj(n, n);
    for (int i = 0; i < 2 * n * n; i++) {
      a.data[i] = rnd.nextGaussian();
    }
    ComplexEigenResult r = eigen.decompose(a);
    // residual ||A v - lambda v|| relative to max|A|: backward stable algorithm, 1e-12 * n
    assertTrue(r.relativeResidual() < 1e-12 * n, "residual " + r.relativeResidual());
    // trace = sum of eigenvalues (invariant)
    double tr = 0;
    double ti = 0;
    for (int i = 0; i < n; i++) {
      tr += a.getReal(i, i);
      ti += a.getImag(i, i);
    }
    double sr = Arrays.stream(r.real()).sum();
    double si = Arrays.stream(r.imag()).sum();
    assertEquals(tr, sr, 1e-10 * n);
    assertEquals(ti, si, 1e-10 * n);
    if (n <= 10) {
      // determinant = product of eigenvalues; independent: EJML complex LU
      LUDecompositionAlt_ZDRM lu = new LUDecompositionAlt_ZDRM();
      assertTrue(lu.decompose(a.copy()));
      Complex_F64 det = lu.computeDeterminant();
      double pr = 1;
      double pi = 0;
      for (int i = 0; i < n; i++) {
        double nr = pr * r.realAt(i) - pi * r.imagAt(i);
        pi = pr * r.imagAt(i) + pi * r.realAt(i);
        pr = nr;
      }
      double scale = Math.max(1, Math.hypot(det.real, det.imaginary));
      assertEquals(det.real, pr, 1e-9 * scale);
      assertEquals(det.imaginary, pi, 1e-9 * scale);
    }
  }

  @Test
  void companionMatrixOfChosenComplexRootsReturnsThem() {
    // Closed form: the companion matrix of prod (z - r_i) has eigenvalues r_i.
    double[][] roots = {{-0.1, 3.0}, {0.2, -1.5}, {1.0, 0.0}, {-2.0, 0.5}, {0.0, 7.0}};
    int n = roots.length;
    // polynomial coefficients c_0..c_n (monic), complex
    double[] cr = new double[n + 1];
    double[] ci = new double[n + 1];
    cr[0] = 1;
    for (double[] root : roots) {
      for (int j = n; j >= 1; j--) {
        double nr = cr[j] - (root[0] * cr[j - 1] - root[1] * ci[j - 1]);
        double ni = ci[j] - (root[0] * ci[j - 1] + root[1] * cr[j - 1]);
        cr[j] = nr;
        ci[j] = ni;
      }
    }
    ZMatrixRMaj c = new ZMatrixRMaj(n, n);
    for (int j = 0; j < n; j++) {
      c.set(0, j, -cr[j + 1], -ci[j + 1]);
    }
    for (int i = 1; i < n; i++) {
      c.set(i, i - 1, 1, 0);
    }
    ComplexEigenResult r = eigen.decompose(c);
    for (double[] root : roots) {
      double best = Double.MAX_VALUE;
      for (int i = 0; i < n; i++) {
        best = Math.min(best, Math.hypot(r.realAt(i) - root[0], r.imagAt(i) - root[1]));
      }
      // well-separated simple roots: 1e-10 absolute
      assertTrue(best < 1e-10, "root " + Arrays.toString(root) + " missed by " + best);
    }
  }

  @Test
  void triangularAndRepeatedAndZeroCases() {
    ZMatrixRMaj zero = new ZMatrixRMaj(3, 3);
    ComplexEigenResult z = eigen.decompose(zero);
    for (int i = 0; i < 3; i++) {
      assertEquals(0, z.realAt(i), 0);
      assertEquals(0, z.imagAt(i), 0);
    }
    ZMatrixRMaj id = new ZMatrixRMaj(4, 4);
    for (int i = 0; i < 4; i++) {
      id.set(i, i, 2, -1);
    }
    ComplexEigenResult r = eigen.decompose(id);
    for (int i = 0; i < 4; i++) {
      assertEquals(2, r.realAt(i), 1e-15);
      assertEquals(-1, r.imagAt(i), 1e-15);
    }
    // upper triangular: eigenvalues are the diagonal (closed form)
    ZMatrixRMaj t = new ZMatrixRMaj(3, 3);
    t.set(0, 0, 1, 1);
    t.set(0, 1, 5, 0);
    t.set(0, 2, 0, 2);
    t.set(1, 1, -3, 0);
    t.set(1, 2, 1, 1);
    t.set(2, 2, 0, 4);
    ComplexEigenResult tr = eigen.decompose(t);
    double[][] got = {
      {tr.realAt(0), tr.imagAt(0)}, {tr.realAt(1), tr.imagAt(1)}, {tr.realAt(2), tr.imagAt(2)}
    };
    sort(got);
    assertEquals(-3, got[0][0], 1e-14);
    assertEquals(0, got[1][0], 1e-14);
    assertEquals(4, got[1][1], 1e-14);
    assertEquals(1, got[2][0], 1e-14);
    assertEquals(1, got[2][1], 1e-14);
    assertTrue(tr.relativeResidual() < 1e-14);
  }

  @Test
  void badlyScaledMatrixStillHasSmallResidual() {
    // extreme scaling: entries spanning 1e-6..1e6 as in structural matrices in mixed units
    int n = 12;
    Random rnd = new Random(11);
    ZMatrixRMaj a = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double s = Math.pow(10, (i - j) / 2.0);
        a.set(i, j, s * rnd.nextGaussian(), s * rnd.nextGaussian());
      }
    }
    ComplexEigenResult r = eigen.decompose(a);
    assertTrue(r.relativeResidual() < 1e-11, "residual " + r.relativeResidual());
  }

  static ZMatrixRMaj toComplex(DMatrixRMaj a) {
    ZMatrixRMaj z = new ZMatrixRMaj(a.numRows, a.numCols);
    for (int i = 0; i < a.numRows; i++) {
      for (int j = 0; j < a.numCols; j++) {
        z.set(i, j, a.get(i, j), 0);
      }
    }
    return z;
  }

  private static void sort(double[][] v) {
    Arrays.sort(
        v,
        (x, y) -> {
          if (Math.abs(x[0] - y[0]) > 1e-7) {
            return Double.compare(x[0], y[0]);
          }
          return Double.compare(x[1], y[1]);
        });
  }
}
