package org.flexmargin.ase;

/**
 * Solver of a dense complex linear system A x = b of fixed order n by Gaussian elimination with
 * partial pivoting, on flat arrays with real and imaginary parts interleaved.
 *
 * <p>The caller fills {@link #matrix()} (row major: entry (i, j) has its real part at
 * {@code 2 (i n + j)} and its imaginary part next to it) and {@link #rhs()} (entry i at {@code 2 i},
 * {@code 2 i + 1}), then calls {@link #solve()}, which overwrites both: the matrix with its
 * eliminated upper-triangular form, the right-hand side with the solution x. At each step the pivot
 * is the candidate of largest |Re| + |Im| (the modulus estimate of the BLAS complex
 * index-of-maximum routine, which cannot overflow); complex quotients use Smith's algorithm. A
 * workspace: nothing is allocated per solve; not thread-safe.
 */
final class ComplexSystemSolver {
  private final int n;
  private final double[] a;
  private final double[] b;
  private final double[] quotient = new double[2];

  /**
   * @param order number of unknowns n, &gt;= 1
   */
  ComplexSystemSolver(int order) {
    if (order < 1) {
      throw new IllegalArgumentException("order must be >= 1, got " + order);
    }
    this.n = order;
    this.a = new double[2 * order * order];
    this.b = new double[2 * order];
  }

  /** @return the number of unknowns */
  int order() {
    return n;
  }

  /** @return the coefficient matrix, row major, re/im interleaved (filled by the caller) */
  double[] matrix() {
    return a;
  }

  /** @return the right-hand side before {@link #solve()}, the solution after (re/im interleaved) */
  double[] rhs() {
    return b;
  }

  /**
   * Solves in place.
   *
   * @return false when the system is singular to working precision: a pivot column of exact
   *     zeros, a non-finite pivot, or a solution that is not finite
   */
  boolean solve() {
    int row = 2 * n;
    for (int k = 0; k < n; k++) {
      int kk = k * row + 2 * k;
      int p = k;
      double best = Math.abs(a[kk]) + Math.abs(a[kk + 1]);
      for (int i = k + 1; i < n; i++) {
        int ik = i * row + 2 * k;
        double size = Math.abs(a[ik]) + Math.abs(a[ik + 1]);
        if (size > best) {
          best = size;
          p = i;
        }
      }
      if (!(best > 0) || !Double.isFinite(best)) {
        return false;
      }
      if (p != k) {
        swapRows(k, p);
      }
      reciprocal(a[kk], a[kk + 1]);
      double invR = quotient[0];
      double invI = quotient[1];
      double bkR = b[2 * k];
      double bkI = b[2 * k + 1];
      for (int i = k + 1; i < n; i++) {
        int ik = i * row + 2 * k;
        double xr = a[ik];
        double xi = a[ik + 1];
        if (xr == 0 && xi == 0) {
          continue;
        }
        double lr = xr * invR - xi * invI;
        double li = xr * invI + xi * invR;
        int rowI = i * row;
        int rowK = k * row;
        for (int j = 2 * (k + 1); j < row; j += 2) {
          double ur = a[rowK + j];
          double ui = a[rowK + j + 1];
          a[rowI + j] -= lr * ur - li * ui;
          a[rowI + j + 1] -= lr * ui + li * ur;
        }
        b[2 * i] -= lr * bkR - li * bkI;
        b[2 * i + 1] -= lr * bkI + li * bkR;
      }
    }
    for (int i = n - 1; i >= 0; i--) {
      int rowI = i * row;
      double sr = b[2 * i];
      double si = b[2 * i + 1];
      for (int j = i + 1; j < n; j++) {
        double ur = a[rowI + 2 * j];
        double ui = a[rowI + 2 * j + 1];
        double xr = b[2 * j];
        double xi = b[2 * j + 1];
        sr -= ur * xr - ui * xi;
        si -= ur * xi + ui * xr;
      }
      divide(sr, si, a[rowI + 2 * i], a[rowI + 2 * i + 1]);
      if (!Double.isFinite(quotient[0]) || !Double.isFinite(quotient[1])) {
        return false;
      }
      b[2 * i] = quotient[0];
      b[2 * i + 1] = quotient[1];
    }
    return true;
  }

  private void swapRows(int k, int p) {
    int rowK = k * 2 * n;
    int rowP = p * 2 * n;
    for (int j = 2 * k; j < 2 * n; j++) {
      double t = a[rowK + j];
      a[rowK + j] = a[rowP + j];
      a[rowP + j] = t;
    }
    for (int j = 0; j < 2; j++) {
      double t = b[2 * k + j];
      b[2 * k + j] = b[2 * p + j];
      b[2 * p + j] = t;
    }
  }

  private void reciprocal(double cr, double ci) {
    divide(1.0, 0.0, cr, ci);
  }

  /** (xr + i xi) / (cr + i ci) into {@link #quotient}, by Smith's algorithm (no needless overflow). */
  private void divide(double xr, double xi, double cr, double ci) {
    if (Math.abs(cr) >= Math.abs(ci)) {
      double r = ci / cr;
      double den = cr + ci * r;
      quotient[0] = (xr + xi * r) / den;
      quotient[1] = (xi - xr * r) / den;
    } else {
      double r = cr / ci;
      double den = cr * r + ci;
      quotient[0] = (xr * r + xi) / den;
      quotient[1] = (xi * r - xr) / den;
    }
  }
}
