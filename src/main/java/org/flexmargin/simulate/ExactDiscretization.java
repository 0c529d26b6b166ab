package org.flexmargin.simulate;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.loop.StateSpace;

/**
 * Exact sampled equivalent of a continuous linear system x' = A x + B u with the input held
 * constant over each step of length T:
 *
 * <pre>
 *   x[k+1] = Ad x[k] + Bd u[k],   [Ad Bd; 0 I] = expm([A B; 0 0] T)
 * </pre>
 *
 * <p>(Franklin, Powell &amp; Workman, <i>Digital Control of Dynamic Systems</i>, 3rd ed., sec.
 * 4.3.3). No truncation error: the only approximation is the hold of the input, so a step or a
 * held sequence is reproduced to rounding. Immutable; arrays are copied out.
 *
 * @param periodS T (s), &gt; 0
 * @param stateTransition Ad = e^{A T}
 * @param inputMatrix Bd = int_0^T e^{A s} ds B
 */
public record ExactDiscretization(double periodS, DMatrixRMaj stateTransition, DMatrixRMaj inputMatrix) {
  /** Validates and copies. */
  public ExactDiscretization {
    if (!(periodS > 0) || !Double.isFinite(periodS)) {
      throw new IllegalArgumentException("time step must be finite and > 0 s, found " + periodS);
    }
    stateTransition = stateTransition.copy();
    inputMatrix = inputMatrix.copy();
  }

  @Override
  public DMatrixRMaj stateTransition() {
    return stateTransition.copy();
  }

  @Override
  public DMatrixRMaj inputMatrix() {
    return inputMatrix.copy();
  }

  /**
   * @param a continuous state matrix (n x n, 1/s)
   * @param b continuous input matrix (n x m)
   * @param periodS T (s)
   * @return the zero-order-hold equivalent
   */
  public static ExactDiscretization of(DMatrixRMaj a, DMatrixRMaj b, double periodS) {
    int n = a.numRows;
    int m = b.numCols;
    DMatrixRMaj big = new DMatrixRMaj(n + m, n + m);
    CommonOps_DDRM.insert(a, big, 0, 0);
    CommonOps_DDRM.insert(b, big, 0, n);
    CommonOps_DDRM.scale(periodS, big);
    DMatrixRMaj e = MatrixExponential.of(big);
    DMatrixRMaj bd = m == 0 ? new DMatrixRMaj(n, 0) : CommonOps_DDRM.extract(e, 0, n, n, n + m);
    return new ExactDiscretization(periodS, CommonOps_DDRM.extract(e, 0, n, 0, n), bd);
  }

  /**
   * @param system continuous system
   * @param periodS T (s)
   * @return the zero-order-hold equivalent of its state equation
   */
  public static ExactDiscretization of(StateSpace system, double periodS) {
    return of(system.a(), system.b(), periodS);
  }

  /**
   * Covariance of the state increment over one step when the system is driven by continuous white
   * noise w of intensity W (E[w(t) w(t+tau)^T] = W delta(tau)) through G, by Van Loan's method
   * (C. F. Van Loan, "Computing integrals involving the matrix exponential", IEEE Trans. Automatic
   * Control 23(3):395-404, 1978): with expm([-A, G W G^T; 0, A^T] T) = [., E12; 0, E22],
   * Ad = E22^T and Qd = Ad E12 = int_0^T e^{A s} G W G^T e^{A^T s} ds.
   *
   * @param a continuous state matrix (n x n)
   * @param gwg G W G^T (n x n, symmetric)
   * @param periodS T (s)
   * @return Qd (n x n, symmetric)
   */
  public static DMatrixRMaj noiseCovariance(DMatrixRMaj a, DMatrixRMaj gwg, double periodS) {
    int n = a.numRows;
    DMatrixRMaj big = new DMatrixRMaj(2 * n, 2 * n);
    DMatrixRMaj minusA = a.copy();
    CommonOps_DDRM.scale(-1, minusA);
    CommonOps_DDRM.insert(minusA, big, 0, 0);
    CommonOps_DDRM.insert(gwg, big, 0, n);
    DMatrixRMaj at = new DMatrixRMaj(n, n);
    CommonOps_DDRM.transpose(a, at);
    CommonOps_DDRM.insert(at, big, n, n);
    CommonOps_DDRM.scale(periodS, big);
    DMatrixRMaj e = MatrixExponential.of(big);
    DMatrixRMaj e12 = CommonOps_DDRM.extract(e, 0, n, n, 2 * n);
    DMatrixRMaj e22 = CommonOps_DDRM.extract(e, n, 2 * n, n, 2 * n);
    DMatrixRMaj ad = new DMatrixRMaj(n, n);
    CommonOps_DDRM.transpose(e22, ad);
    DMatrixRMaj q = new DMatrixRMaj(n, n);
    CommonOps_DDRM.mult(ad, e12, q);
    symmetrize(q);
    return q;
  }

  static void symmetrize(DMatrixRMaj q) {
    for (int i = 0; i < q.numRows; i++) {
      for (int j = i + 1; j < q.numCols; j++) {
        double v = 0.5 * (q.get(i, j) + q.get(j, i));
        q.set(i, j, v);
        q.set(j, i, v);
      }
    }
  }
}
