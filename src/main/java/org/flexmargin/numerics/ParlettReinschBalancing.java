package org.flexmargin.numerics;

/**
 * Diagonal similarity scaling of a dense real matrix by powers of two so that every row and the
 * matching column have about the same 1-norm (Parlett &amp; Reinsch, "Balancing a matrix for
 * calculation of eigenvalues and eigenvectors", Numer. Math. 13:293-304, 1969). The eigenvalues
 * are unchanged; the norm, and with it the round-off of a later eigenvalue computation, can drop
 * by orders of magnitude for badly scaled matrices. Scaling by powers of two is exact.
 *
 * <p>Only the scaling step is done (no permutation to isolate eigenvalues). Works in place on a
 * row-major n x n array.
 */
final class ParlettReinschBalancing {
  /** Scaling radix; a power of two keeps the scaling free of rounding. */
  private static final double RADIX = 2.0;
  /** A scaling is applied only if it reduces row norm + column norm below this fraction. */
  private static final double GAIN = 0.95;

  private ParlettReinschBalancing() {}

  /**
   * Balances in place.
   *
   * @param n order of the matrix
   * @param a row-major n x n matrix, overwritten by D^-1 A D
   * @param scale out: the diagonal of D (length &ge; n)
   */
  static void balance(int n, double[] a, double[] scale) {
    for (int i = 0; i < n; i++) {
      scale[i] = 1.0;
    }
    boolean changed = true;
    while (changed) {
      changed = false;
      for (int i = 0; i < n; i++) {
        double c = 0;
        double r = 0;
        for (int j = 0; j < n; j++) {
          if (j != i) {
            c += Math.abs(a[j * n + i]);
            r += Math.abs(a[i * n + j]);
          }
        }
        if (c == 0 || r == 0) {
          continue;
        }
        double f = factor(c, r);
        if ((c * f * f + r) / f < GAIN * (c + r)) {
          changed = true;
          scale[i] *= f;
          double g = 1.0 / f;
          int row = i * n;
          for (int j = 0; j < n; j++) {
            a[row + j] *= g;
          }
          for (int j = 0; j < n; j++) {
            a[j * n + i] *= f;
          }
        }
      }
    }
  }

  /**
   * The power of two f that brings column norm times f and row norm over f within a factor
   * RADIX of each other.
   */
  static double factor(double c, double r) {
    double f = 1.0;
    double cs = c;
    while (cs < r / RADIX) {
      f *= RADIX;
      cs *= RADIX * RADIX;
    }
    while (cs >= r * RADIX) {
      f /= RADIX;
      cs /= RADIX * RADIX;
    }
    return f;
  }
}
