package org.flexmargin.ase;

/**
 * Solver of a dense complex linear system A x = b of fixed order n by Gaussian elimination with
 * partial pivoting, on flat arrays with real and imaginary parts interleaved.
 *
 * <p>The caller fills {@link #matrix()} (row major: entry (i, j) has its real part at
 * {@code 2 (i n + j)} and its imaginary part next to it) and {@link #rhs()} (entry i at {@code 2 i},
 * {@code 2 i + 1}), then calls {@link #solve()}, which overwrites both: the matrix with its
 * eliminated form (of no use to the caller: its rows stay where they were, their pivot order is
 * kept in a table of row starts), the right-hand side with the solution x. At each step the pivot
 * is the candidate of largest |Re| + |Im| (the modulus estimate of the BLAS complex
 * index-of-maximum routine, which cannot overflow); rows are exchanged in the table, not moved;
 * complex quotients use Smith's algorithm. A workspace: nothing is
 * allocated per solve; not thread-safe.
 */
final class ComplexSystemSolver {
  private final int n;
  private final double[] a;
  private final double[] b;
  private final double[] quotient = new double[2];
  /** Start of the i-th pivot row in {@link #a}: rows are exchanged by exchanging these. */
  private final int[] rowStart;

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
    this.rowStart = new int[order];
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
    int[] rs = rowStart;
    for (int i = 0; i < n; i++) {
      rs[i] = i * row;
    }
    for (int k = 0; k < n; k++) {
      int ck = 2 * k;
      int p = k;
      double best = Math.abs(a[rs[k] + ck]) + Math.abs(a[rs[k] + ck + 1]);
      for (int i = k + 1; i < n; i++) {
        int ik = rs[i] + ck;
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
        int t = rs[k];
        rs[k] = rs[p];
        rs[p] = t;
        double br = b[2 * k];
        double bi = b[2 * k + 1];
        b[2 * k] = b[2 * p];
        b[2 * k + 1] = b[2 * p + 1];
        b[2 * p] = br;
        b[2 * p + 1] = bi;
      }
      int rowK = rs[k];
      reciprocal(a[rowK + ck], a[rowK + ck + 1]);
      double invR = quotient[0];
      double invI = quotient[1];
      double bkR = b[2 * k];
      double bkI = b[2 * k + 1];
      for (int i = k + 1; i < n; i++) {
        int rowI = rs[i];
        double xr = a[rowI + ck];
        double xi = a[rowI + ck + 1];
        if (xr == 0 && xi == 0) {
          continue;
        }
        double lr = xr * invR - xi * invI;
        double li = xr * invI + xi * invR;
        int end = rowI + row;
        for (int j = rowI + ck + 2, jk = rowK + ck + 2; j < end; j += 2, jk += 2) {
          double ur = a[jk];
          double ui = a[jk + 1];
          a[j] -= lr * ur - li * ui;
          a[j + 1] -= lr * ui + li * ur;
        }
        b[2 * i] -= lr * bkR - li * bkI;
        b[2 * i + 1] -= lr * bkI + li * bkR;
      }
    }
    for (int i = n - 1; i >= 0; i--) {
      int rowI = rs[i];
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
