package org.flexmargin.numerics;

/**
 * Orthogonal reduction of a dense real matrix to upper Hessenberg form H = Q^T A Q by Householder
 * reflections (Golub &amp; Van Loan, <i>Matrix Computations</i>, 4th ed., Algorithm 7.4.2), on a
 * row-major array with every inner loop running along a row. Q is not formed: the callers need
 * eigenvalues only.
 */
final class HouseholderHessenberg {
  private HouseholderHessenberg() {}

  /**
   * Reduces in place; entries below the first sub-diagonal are set to zero.
   *
   * @param n order
   * @param a row-major n x n matrix, overwritten by H
   * @param v work array, length &ge; n
   * @param w work array, length &ge; n
   */
  static void reduce(int n, double[] a, double[] v, double[] w) {
    for (int k = 0; k < n - 2; k++) {
      double scale = 0;
      for (int i = k + 1; i < n; i++) {
        scale = Math.max(scale, Math.abs(a[i * n + k]));
      }
      if (scale == 0) {
        continue;
      }
      double norm2 = 0;
      for (int i = k + 1; i < n; i++) {
        double x = a[i * n + k] / scale;
        v[i] = x;
        norm2 += x * x;
      }
      double x0 = v[k + 1];
      double alpha = -Math.copySign(Math.sqrt(norm2), x0);
      // u = x - alpha e1, u^T u = 2 alpha (alpha - x0); P = I - beta u u^T
      v[k + 1] = x0 - alpha;
      double beta = 1.0 / (alpha * (alpha - x0));
      applyLeft(n, a, v, w, k, beta);
      applyRight(n, a, v, k, beta);
      a[(k + 1) * n + k] = alpha * scale;
      for (int i = k + 2; i < n; i++) {
        a[i * n + k] = 0;
      }
    }
  }

  /** A[k+1.., k+1..] = P A[k+1.., k+1..]: w = beta u^T A, then A -= u w; row by row. */
  private static void applyLeft(int n, double[] a, double[] u, double[] w, int k, double beta) {
    for (int j = k + 1; j < n; j++) {
      w[j] = 0;
    }
    for (int i = k + 1; i < n; i++) {
      double ui = u[i];
      int row = i * n;
      for (int j = k + 1; j < n; j++) {
        w[j] += ui * a[row + j];
      }
    }
    for (int i = k + 1; i < n; i++) {
      double ui = beta * u[i];
      int row = i * n;
      for (int j = k + 1; j < n; j++) {
        a[row + j] -= ui * w[j];
      }
    }
  }

  /** A[.., k+1..] = A[.., k+1..] P: for each row s = beta a u, then a -= s u^T. */
  private static void applyRight(int n, double[] a, double[] u, int k, double beta) {
    for (int r = 0; r < n; r++) {
      int row = r * n;
      double s = 0;
      for (int j = k + 1; j < n; j++) {
        s += a[row + j] * u[j];
      }
      s *= beta;
      for (int j = k + 1; j < n; j++) {
        a[row + j] -= s * u[j];
      }
    }
  }
}
