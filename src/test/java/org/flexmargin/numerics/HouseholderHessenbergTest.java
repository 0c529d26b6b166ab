package org.flexmargin.numerics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.ejml.data.Complex_F64;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.junit.jupiter.api.Test;

/**
 * Hessenberg reduction checked through what an orthogonal similarity must keep: zeros below the
 * sub-diagonal, Frobenius norm, trace, eigenvalues (EJML on the original), and the first row and
 * column (H e1 and e1^T H) up to the reflection.
 */
class HouseholderHessenbergTest {

  @Test
  void randomMatrixKeepsItsInvariants() {
    int n = 12;
    Random rnd = new Random(27);
    double[] a0 = new double[n * n];
    for (int i = 0; i < n * n; i++) {
      a0[i] = rnd.nextGaussian();
    }
    double[] h = a0.clone();
    HouseholderHessenberg.reduce(n, h, new double[n], new double[n]);
    double f0 = 0;
    double f1 = 0;
    double t0 = 0;
    double t1 = 0;
    for (int i = 0; i < n; i++) {
      t0 += a0[i * n + i];
      t1 += h[i * n + i];
      for (int j = 0; j < n; j++) {
        f0 += a0[i * n + j] * a0[i * n + j];
        f1 += h[i * n + j] * h[i * n + j];
        if (i > j + 1) {
          assertEquals(0.0, h[i * n + j], 0.0, "entry " + i + "," + j);
        }
      }
    }
    // orthogonal similarity: round-off of about n reflections, n eps relative
    assertEquals(f0, f1, 1e-13 * f0);
    assertEquals(t0, t1, 1e-13 * n);
    // first step: H[0][0] = A[0][0] exactly; |H[1][0]| = ||A[1.., 0]||; row 0 keeps its norm
    assertEquals(a0[0], h[0], 0.0);
    double col = 0;
    double row0 = 0;
    double row1 = 0;
    for (int i = 1; i < n; i++) {
      col += a0[i * n] * a0[i * n];
      row0 += a0[i] * a0[i];
      row1 += h[i] * h[i];
    }
    assertEquals(Math.sqrt(col), Math.abs(h[n]), 1e-14 * Math.sqrt(col));
    assertEquals(row0, row1, 1e-13 * row0);
    // eigenvalues of H against EJML's on A (independent library)
    EigenDecomposition_F64<DMatrixRMaj> ej = DecompositionFactory_DDRM.eig(n, false);
    assertTrue(ej.decompose(new DMatrixRMaj(n, n, true, a0)));
    EigenDecomposition_F64<DMatrixRMaj> eh = DecompositionFactory_DDRM.eig(n, false);
    assertTrue(eh.decompose(new DMatrixRMaj(n, n, true, h)));
    double[][] e = new double[4][n];
    for (int i = 0; i < n; i++) {
      Complex_F64 x = ej.getEigenvalue(i);
      Complex_F64 y = eh.getEigenvalue(i);
      e[0][i] = x.real;
      e[1][i] = x.imaginary;
      e[2][i] = y.real;
      e[3][i] = y.imaginary;
    }
    // well-conditioned random spectrum, backward errors ~n eps: 1e-10 leaves a wide margin
    assertTrue(EigenvalueMatch.maxDistance(e[0], e[1], e[2], e[3]) < 1e-10);
  }

  @Test
  void columnsAlreadyZeroBelowTheSubDiagonalAreSkippedAndLargeEntriesDoNotOverflow() {
    // column 0 is zero below the diagonal: step 0 must leave the matrix alone; step 1 works on
    // entries of 1e200, whose squares would overflow without scaling.
    double big = 1e200;
    double[] a = {
      2, 1, 1, 1,
      0, 1, 3, 1,
      0, big, 1, 1,
      0, big, 1, 1,
    };
    double[] h = a.clone();
    HouseholderHessenberg.reduce(4, h, new double[4], new double[4]);
    assertArrayEquals(new double[] {2, 0, 0, 0}, new double[] {h[0], h[4], h[8], h[12]}, 0.0);
    assertEquals(0.0, h[13], 0.0);
    // |H[2][1]| = ||(big, big)|| = sqrt(2) big
    assertEquals(Math.sqrt(2) * big, Math.abs(h[9]), 1e-14 * big);
    assertTrue(Double.isFinite(h[10]) && Double.isFinite(h[15]));
  }

  @Test
  void ordersOneAndTwoAreAlreadyHessenberg() {
    double[] one = {5};
    HouseholderHessenberg.reduce(1, one, new double[1], new double[1]);
    assertArrayEquals(new double[] {5}, one, 0.0);
    double[] two = {1, 2, 3, 4};
    HouseholderHessenberg.reduce(2, two, new double[2], new double[2]);
    assertArrayEquals(new double[] {1, 2, 3, 4}, two, 0.0);
  }
}
