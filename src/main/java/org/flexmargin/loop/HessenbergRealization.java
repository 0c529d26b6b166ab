package org.flexmargin.loop;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.decomposition.hessenberg.HessenbergSimilarDecomposition_DDRM;

/**
 * Orthogonally similar realisation (Q^T A Q, Q^T B, C Q, D) with Q^T A Q upper Hessenberg
 * (Householder reduction, EJML). Immutable after construction; arrays are never handed out.
 */
final class HessenbergRealization {
  final int n;
  final int inputs;
  final int outputs;
  /** Upper Hessenberg H, row-major n x n. */
  final double[] h;
  /** Q^T B, row-major n x m. */
  final double[] bt;
  /** C Q, row-major p x n. */
  final double[] ct;
  /** D, row-major p x m. */
  final double[] d;

  private HessenbergRealization(int n, int inputs, int outputs, double[] h, double[] bt,
      double[] ct, double[] d) {
    this.n = n;
    this.inputs = inputs;
    this.outputs = outputs;
    this.h = h;
    this.bt = bt;
    this.ct = ct;
    this.d = d;
  }

  static HessenbergRealization of(DMatrixRMaj a, DMatrixRMaj b, DMatrixRMaj c, DMatrixRMaj d) {
    int n = a.numRows;
    int m = b.numCols;
    int p = c.numRows;
    if (n == 0) {
      return new HessenbergRealization(0, m, p, new double[0], new double[0], new double[0],
          d.data.clone());
    }
    HessenbergSimilarDecomposition_DDRM hess = new HessenbergSimilarDecomposition_DDRM(n);
    if (!hess.decompose(a.copy())) {
      throw new ArithmeticException("Hessenberg reduction failed");
    }
    DMatrixRMaj hm = hess.getH(null);
    DMatrixRMaj q = hess.getQ(null);
    DMatrixRMaj btm = new DMatrixRMaj(n, m);
    if (m > 0) {
      CommonOps_DDRM.multTransA(q, b, btm);
    }
    DMatrixRMaj ctm = new DMatrixRMaj(p, n);
    if (p > 0) {
      CommonOps_DDRM.mult(c, q, ctm);
    }
    double[] hd = new double[n * n];
    for (int i = 0; i < n; i++) {
      for (int j = Math.max(0, i - 1); j < n; j++) {
        hd[i * n + j] = hm.get(i, j);
      }
    }
    return new HessenbergRealization(n, m, p, hd, copyOf(btm), copyOf(ctm), copyOf(d));
  }

  private static double[] copyOf(DMatrixRMaj m) {
    double[] r = new double[m.numRows * m.numCols];
    for (int i = 0; i < m.numRows; i++) {
      for (int j = 0; j < m.numCols; j++) {
        r[i * m.numCols + j] = m.get(i, j);
      }
    }
    return r;
  }
}
