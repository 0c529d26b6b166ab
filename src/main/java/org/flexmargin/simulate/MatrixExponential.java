package org.flexmargin.simulate;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.NormOps_DDRM;

/**
 * Matrix exponential by scaling and squaring with the degree-13 Padé approximant (Higham, "The
 * scaling and squaring method for the matrix exponential revisited", SIAM J. Matrix Anal. Appl.
 * 26(4):1179-1193, 2005, algorithm 2.3 for the degree-13 branch). Accurate to about unit roundoff
 * times the condition number of the exponential. Stateless.
 */
public final class MatrixExponential {
  /** Padé 13 coefficients b_0..b_13 (Higham 2005, eq. 2.5 family). */
  private static final double[] B = {
    64764752532480000.0, 32382376266240000.0, 7771770303897600.0, 1187353796428800.0,
    129060195264000.0, 10559470521600.0, 670442572800.0, 33522128640.0, 1323241920.0,
    40840800.0, 960960.0, 16380.0, 182.0, 1.0
  };

  /** theta_13: largest 1-norm for which the degree-13 approximant needs no scaling (Higham 2005, table 2.3). */
  private static final double THETA_13 = 5.371920351148152;

  private MatrixExponential() {}

  /**
   * @param a square matrix (not modified)
   * @return e^a
   * @throws ArithmeticException if an entry is not finite or the Padé denominator is singular
   */
  public static DMatrixRMaj of(DMatrixRMaj a) {
    int n = a.numRows;
    if (a.numCols != n) {
      throw new IllegalArgumentException("matrix exponential of a " + a.numRows + " x " + a.numCols + " matrix");
    }
    if (n == 0) {
      return new DMatrixRMaj(0, 0);
    }
    for (int i = 0; i < a.getNumElements(); i++) {
      if (!Double.isFinite(a.data[i])) {
        throw new ArithmeticException("matrix exponential: entry " + i + " is " + a.data[i]);
      }
    }
    double norm = NormOps_DDRM.normP1(a);
    int s = norm > THETA_13 ? (int) Math.ceil(Math.log(norm / THETA_13) / Math.log(2)) : 0;
    DMatrixRMaj x = a.copy();
    CommonOps_DDRM.scale(Math.pow(2, -s), x);
    DMatrixRMaj x2 = new DMatrixRMaj(n, n);
    DMatrixRMaj x4 = new DMatrixRMaj(n, n);
    DMatrixRMaj x6 = new DMatrixRMaj(n, n);
    CommonOps_DDRM.mult(x, x, x2);
    CommonOps_DDRM.mult(x2, x2, x4);
    CommonOps_DDRM.mult(x4, x2, x6);
    DMatrixRMaj eye = CommonOps_DDRM.identity(n);
    DMatrixRMaj inner = combine(x6, B[13], x4, B[11], x2, B[9], null, 0);
    DMatrixRMaj tmp = new DMatrixRMaj(n, n);
    CommonOps_DDRM.mult(x6, inner, tmp);
    DMatrixRMaj uArg = combine(x6, B[7], x4, B[5], x2, B[3], eye, B[1]);
    CommonOps_DDRM.addEquals(uArg, tmp);
    DMatrixRMaj u = new DMatrixRMaj(n, n);
    CommonOps_DDRM.mult(x, uArg, u);
    inner = combine(x6, B[12], x4, B[10], x2, B[8], null, 0);
    CommonOps_DDRM.mult(x6, inner, tmp);
    DMatrixRMaj v = combine(x6, B[6], x4, B[4], x2, B[2], eye, B[0]);
    CommonOps_DDRM.addEquals(v, tmp);
    DMatrixRMaj p = new DMatrixRMaj(n, n);
    DMatrixRMaj q = new DMatrixRMaj(n, n);
    CommonOps_DDRM.add(v, u, p);
    CommonOps_DDRM.subtract(v, u, q);
    DMatrixRMaj r = new DMatrixRMaj(n, n);
    if (!CommonOps_DDRM.solve(q, p, r)) {
      throw new ArithmeticException("matrix exponential: singular Padé denominator");
    }
    for (int k = 0; k < s; k++) {
      CommonOps_DDRM.mult(r, r, tmp);
      r.setTo(tmp);
    }
    return r;
  }

  private static DMatrixRMaj combine(DMatrixRMaj a, double ca, DMatrixRMaj b, double cb, DMatrixRMaj c,
      double cc, DMatrixRMaj d, double cd) {
    DMatrixRMaj r = new DMatrixRMaj(a.numRows, a.numCols);
    CommonOps_DDRM.add(ca, a, cb, b, r);
    CommonOps_DDRM.addEquals(r, cc, c);
    if (d != null) {
      CommonOps_DDRM.addEquals(r, cd, d);
    }
    return r;
  }
}
