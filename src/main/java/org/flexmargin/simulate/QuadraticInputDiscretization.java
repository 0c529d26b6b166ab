package org.flexmargin.simulate;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

/**
 * Exact step of x' = A x + B u over one period T when the input is the quadratic through its
 * values at the three Gauss-Legendre points of the step (s = 1/2 - sqrt(15)/10, 1/2, 1/2 +
 * sqrt(15)/10 of T):
 *
 * <pre>
 *   x[k+1] = Ad x[k] + G0 u(s0) + G1 u(s1) + G2 u(s2)
 * </pre>
 *
 * <p>The matrices come from one block exponential (C. F. Van Loan, "Computing integrals involving
 * the matrix exponential", IEEE Trans. Automatic Control 23(3):395-404, 1978): with w0' = w1,
 * w1' = w2, w2' = 0 appended to the state, w0(s) = c0 + c1 s + c2 s^2 / 2 and
 * expm([A T, B T, 0, 0; 0, 0, I, 0; 0, 0, 0, I; 0, 0, 0, 0]) = [Ad, E1, E2, E3; ...], so an input
 * a0 + a1 s + a2 s^2 (s = t / T) moves the state by E1 a0 + E2 a1 + 2 E3 a2; each Gk is that
 * combination for the Lagrange polynomial of node k. The state transition has no truncation
 * error; the input is exact for quadratics, and sampling at interior points keeps a jump on a
 * step boundary out of the fit. Immutable.
 */
final class QuadraticInputDiscretization {
  /** The fit's nodes as fractions of the step. */
  static final double[] NODES = {0.5 - Math.sqrt(15) / 10, 0.5, 0.5 + Math.sqrt(15) / 10};

  private final int n;
  private final int m;
  private final double[] ad;
  private final double[] gamma;

  private QuadraticInputDiscretization(int n, int m, double[] ad, double[] gamma) {
    this.n = n;
    this.m = m;
    this.ad = ad;
    this.gamma = gamma;
  }

  /**
   * @param a continuous state matrix (n x n, 1/s)
   * @param b continuous input matrix (n x m)
   * @param periodS T (s), &gt; 0
   * @return the step with a quadratic input
   */
  static QuadraticInputDiscretization of(DMatrixRMaj a, DMatrixRMaj b, double periodS) {
    if (!(periodS > 0) || !Double.isFinite(periodS)) {
      throw new IllegalArgumentException("time step must be finite and > 0 s, found " + periodS);
    }
    int n = a.numRows;
    int m = b.numCols;
    DMatrixRMaj big = new DMatrixRMaj(n + 3 * m, n + 3 * m);
    CommonOps_DDRM.insert(a, big, 0, 0);
    CommonOps_DDRM.insert(b, big, 0, n);
    CommonOps_DDRM.scale(periodS, big);
    for (int i = 0; i < 2 * m; i++) {
      big.set(n + i, n + m + i, 1.0);
    }
    DMatrixRMaj e = MatrixExponential.of(big);
    double[][] power = new double[3][];
    for (int p = 0; p < 3; p++) {
      power[p] = CommonOps_DDRM.extract(e, 0, n, n + p * m, n + (p + 1) * m).data;
    }
    // gamma, row i: G0[i, :], G1[i, :], G2[i, :] side by side, against the inputs node by node
    double[] gamma = new double[n * 3 * m];
    for (int k = 0; k < 3; k++) {
      double[] coef = lagrange(k);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < m; j++) {
          int at = i * m + j;
          gamma[i * 3 * m + k * m + j] = coef[0] * power[0][at] + coef[1] * power[1][at] + 2 * coef[2] * power[2][at];
        }
      }
    }
    return new QuadraticInputDiscretization(n, m, CommonOps_DDRM.extract(e, 0, n, 0, n).data, gamma);
  }

  /**
   * @param k node index (0..2)
   * @return coefficients {c0, c1, c2} of the Lagrange polynomial of node k: 1 at node k, 0 at the
   *     others, c0 + c1 s + c2 s^2
   */
  static double[] lagrange(int k) {
    double denominator = 1;
    double sum = 0;
    double product = 1;
    for (int i = 0; i < 3; i++) {
      if (i != k) {
        denominator *= NODES[k] - NODES[i];
        sum += NODES[i];
        product *= NODES[i];
      }
    }
    return new double[] {product / denominator, -sum / denominator, 1 / denominator};
  }

  /**
   * @param values the input's values at the three nodes
   * @param s a fraction of the step
   * @return the quadratic through them at s
   */
  static double fitted(double[] values, double s) {
    double v = 0;
    for (int k = 0; k < 3; k++) {
      double[] c = lagrange(k);
      v += values[k] * (c[0] + s * (c[1] + s * c[2]));
    }
    return v;
  }

  /**
   * @param values the input's values at the three nodes
   * @param s a fraction of the step
   * @return the slope of the quadratic through them at s, per unit of s (per step)
   */
  static double fittedSlope(double[] values, double s) {
    double v = 0;
    for (int k = 0; k < 3; k++) {
      double[] c = lagrange(k);
      v += values[k] * (c[1] + 2 * s * c[2]);
    }
    return v;
  }

  /**
   * x[k+1] = Ad x + sum over nodes of Gk u(node k).
   *
   * @param x the state at the start of the step (not modified)
   * @param u the inputs node by node: u[k m + j] is input j at node k
   * @param next receives the state at the end of the step (not x)
   */
  void step(double[] x, double[] u, double[] next) {
    int w = 3 * m;
    int blocks = n - n % 4;
    for (int i = 0; i < n; i++) {
      double s = 0;
      int row = i * n;
      int j = 0;
      // four terms a pass (fewer loop tests), added in column order as a plain loop would
      for (; j < blocks; j += 4) {
        s += ad[row + j] * x[j];
        s += ad[row + j + 1] * x[j + 1];
        s += ad[row + j + 2] * x[j + 2];
        s += ad[row + j + 3] * x[j + 3];
      }
      for (; j < n; j++) {
        s += ad[row + j] * x[j];
      }
      int g = i * w;
      for (int k = 0; k < w; k++) {
        s += gamma[g + k] * u[k];
      }
      next[i] = s;
    }
  }
}
