package org.flexmargin.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.ejml.data.DMatrixRMaj;
import org.junit.jupiter.api.Test;

class GeneralizedSymmetricEigenTest {

  @Test
  void agreesWithCommonsMathAndIsMassNormalised() {
    // independent general-purpose computation: Commons Math Cholesky + symmetric
    // EigenDecomposition of L^-1 K L^-T (a second implementation of Golub & Van Loan 8.7.2).
    // Tolerance 1e-10 relative: both are backward stable on this well-conditioned random pair.
    Random random = new Random(7);
    int n = 6;
    double[][] a = new double[n][n];
    double[][] b = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a[i][j] = random.nextGaussian();
        b[i][j] = random.nextGaussian();
      }
    }
    RealMatrix ra = new Array2DRowRealMatrix(a);
    RealMatrix rb = new Array2DRowRealMatrix(b);
    RealMatrix k = ra.multiply(ra.transpose());
    RealMatrix m = rb.multiply(rb.transpose()).add(identity(n).scalarMultiply(n));
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        k.setEntry(i, j, 0.5 * (k.getEntry(i, j) + k.getEntry(j, i)));
        m.setEntry(i, j, 0.5 * (m.getEntry(i, j) + m.getEntry(j, i)));
      }
    }
    GeneralizedSymmetricEigen.Solution sol =
        GeneralizedSymmetricEigen.solve(new DMatrixRMaj(k.getData()), new DMatrixRMaj(m.getData()));

    RealMatrix linv = new CholeskyDecomposition(m).getL();
    linv = new org.apache.commons.math3.linear.LUDecomposition(linv).getSolver().getInverse();
    RealMatrix reduced = linv.multiply(k).multiply(linv.transpose());
    double[] expected = new EigenDecomposition(reduced).getRealEigenvalues();
    Arrays.sort(expected);
    for (int i = 0; i < n; i++) {
      assertEquals(expected[i], sol.eigenvalues()[i], 1e-10 * Math.abs(expected[n - 1]));
    }
    // definition: K v = lambda M v and v^T M v = 1
    for (int c = 0; c < n; c++) {
      double[] v = new double[n];
      for (int r = 0; r < n; r++) {
        v[r] = sol.vectors().get(r, c);
      }
      double[] kv = k.operate(v);
      double[] mv = m.operate(v);
      double vmv = 0;
      for (int r = 0; r < n; r++) {
        assertEquals(kv[r], sol.eigenvalues()[c] * mv[r], 1e-10 * norm(kv) + 1e-12);
        vmv += v[r] * mv[r];
      }
      assertEquals(1.0, vmv, 1e-12);
    }
  }

  private static RealMatrix identity(int n) {
    return org.apache.commons.math3.linear.MatrixUtils.createRealIdentityMatrix(n);
  }

  private static double norm(double[] x) {
    double s = 0;
    for (double v : x) {
      s += v * v;
    }
    return Math.sqrt(s);
  }
}
