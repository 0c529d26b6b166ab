package org.flexmargin.numerics;

import org.ejml.data.DMatrixRMaj;

/**
 * Eigenvalues only (no vectors) of a dense real square matrix by the classical three steps:
 *
 * <ol>
 *   <li>balancing by exact power-of-two diagonal scaling ({@link ParlettReinschBalancing};
 *       Parlett &amp; Reinsch, Numer. Math. 13, 1969);
 *   <li>Householder reduction to upper Hessenberg form ({@link HouseholderHessenberg});
 *   <li>Francis's implicit double-shift QR iteration (Francis, Computer J. 4, 1961/62; procedure
 *       hqr in Wilkinson &amp; Reinsch, <i>Handbook for Automatic Computation</i> Vol. II, 1971;
 *       Golub &amp; Van Loan, <i>Matrix Computations</i>, 4th ed., Algorithms 7.5.1-7.5.2) with
 *       deflation at negligible sub-diagonal entries. Because no Schur vectors are wanted, each
 *       sweep only updates the active diagonal block. When the trailing 2 x 2 block has real
 *       eigenvalues, the one nearer the last diagonal entry is used as a double shift.
 * </ol>
 *
 * <p>An ad hoc exceptional shift every {@value #EXCEPTIONAL_PERIOD}th iteration on the same
 * eigenvalue breaks the cycles that the standard shifts can fall into (for example on
 * permutation matrices). After {@code maxIterationsPerEigenvalue} sweeps without a deflation the
 * iteration stops and the result says so; the eigenvalues not reached are NaN.
 *
 * <p>Cost about 10 n^3 flops. All work is on flat row-major arrays with unit-stride inner loops.
 * An instance keeps its workspace between calls, so repeated solves of the same size allocate
 * only the result; instances are therefore not thread-safe (use one per thread).
 */
public final class RealEigenvalues {
  private static final double EPS = Math.ulp(1.0);
  /** Iterations on one eigenvalue between two exceptional shifts. */
  static final int EXCEPTIONAL_PERIOD = 10;
  /** Default sweep budget per eigenvalue (30 in hqr; a little more headroom here). */
  static final int DEFAULT_MAX_ITERATIONS = 40;
  /** Exceptional shift constants of hqr (Wilkinson &amp; Reinsch 1971). */
  private static final double EXCEPTIONAL_SHIFT = 0.75;
  private static final double EXCEPTIONAL_PRODUCT = -0.4375;

  private final int maxIterationsPerEigenvalue;
  private double[] h = new double[0];
  private double[] work1 = new double[0];
  private double[] work2 = new double[0];

  /** A solver with the default iteration limit. */
  public RealEigenvalues() {
    this(DEFAULT_MAX_ITERATIONS);
  }

  /**
   * @param maxIterationsPerEigenvalue sweeps allowed without a deflation (&ge; 0)
   */
  RealEigenvalues(int maxIterationsPerEigenvalue) {
    if (maxIterationsPerEigenvalue < 0) {
      throw new IllegalArgumentException("iteration limit must be >= 0");
    }
    this.maxIterationsPerEigenvalue = maxIterationsPerEigenvalue;
  }

  /**
   * Eigenvalues of a matrix with a fresh solver.
   *
   * @param a square matrix. Not modified.
   * @return eigenvalues and diagnostics
   */
  public static RealEigenvaluesResult of(DMatrixRMaj a) {
    return new RealEigenvalues().solve(a);
  }

  /**
   * @param a square matrix. Not modified.
   * @return eigenvalues and diagnostics
   * @throws IllegalArgumentException if the matrix is not square or has an entry that is not
   *     finite
   */
  public RealEigenvaluesResult solve(DMatrixRMaj a) {
    if (a.numRows != a.numCols) {
      throw new IllegalArgumentException(
          "matrix must be square, got " + a.numRows + " x " + a.numCols);
    }
    return solve(a.numRows, a.data);
  }

  /**
   * @param n order
   * @param rowMajor the n x n matrix row by row (at least n*n entries; the first n*n are used).
   *     Not modified.
   * @return eigenvalues and diagnostics
   * @throws IllegalArgumentException if an entry is not finite or the array is too short
   */
  public RealEigenvaluesResult solve(int n, double[] rowMajor) {
    if (n < 0 || rowMajor.length < n * n) {
      throw new IllegalArgumentException(
          "need " + n + " x " + n + " entries, got " + rowMajor.length);
    }
    for (int i = 0; i < n * n; i++) {
      if (!Double.isFinite(rowMajor[i])) {
        throw new IllegalArgumentException("matrix entry (" + i / n + ", " + i % n
            + ") is not finite: " + rowMajor[i]);
      }
    }
    if (h.length < n * n) {
      h = new double[n * n];
      work1 = new double[n];
      work2 = new double[n];
    }
    System.arraycopy(rowMajor, 0, h, 0, n * n);
    ParlettReinschBalancing.balance(n, h, work1);
    HouseholderHessenberg.reduce(n, h, work1, work2);
    double[] wr = new double[n];
    double[] wi = new double[n];
    return iterate(n, wr, wi);
  }

  /** Francis double-shift QR on the Hessenberg matrix in h, eigenvalues into wr, wi. */
  private RealEigenvaluesResult iterate(int n, double[] wr, double[] wi) {
    double norm = 0;
    for (int i = 0; i < n * n; i++) {
      norm = Math.max(norm, Math.abs(h[i]));
    }
    int hi = n - 1;
    int its = 0;
    int total = 0;
    while (hi >= 0) {
      int l = activeTop(n, hi, norm);
      if (l == hi) {
        wr[hi] = h[hi * n + hi];
        hi--;
        its = 0;
      } else if (l == hi - 1) {
        trailingPair(n, hi, wr, wi);
        hi -= 2;
        its = 0;
      } else if (its >= maxIterationsPerEigenvalue) {
        for (int i = 0; i <= hi; i++) {
          wr[i] = Double.NaN;
          wi[i] = Double.NaN;
        }
        return new RealEigenvaluesResult(wr, wi, total, false);
      } else {
        its++;
        total++;
        sweep(n, l, hi, its % EXCEPTIONAL_PERIOD == 0);
      }
    }
    return new RealEigenvaluesResult(wr, wi, total, true);
  }

  /**
   * Top row of the unreduced block ending at row hi: the sub-diagonal entry above it is
   * negligible (and is set to zero) or it is row 0.
   */
  private int activeTop(int n, int hi, double norm) {
    for (int l = hi; l > 0; l--) {
      if (negligible(h[l * n + l - 1], h[(l - 1) * n + l - 1], h[(l - 1) * n + l], h[l * n + l],
          norm)) {
        h[l * n + l - 1] = 0;
        return l;
      }
    }
    return 0;
  }

  /**
   * Whether the sub-diagonal entry c of the diagonal block [[a, b], [c, d]] can be set to zero.
   * Either it is below round-off of its diagonal neighbours (the test of hqr), or it is below
   * round-off of the matrix norm (a backward-stable perturbation) and changes the eigenvalues
   * of the block, by about b c / (a - d), only at round-off of d (the criterion of Ahues &amp;
   * Tisseur, LAPACK Working Note 122, 1997). The second test deflates the nearly repeated
   * eigenvalues of strongly non-normal blocks, where the first can stall above round-off.
   *
   * @param c sub-diagonal entry
   * @param a diagonal entry above-left of c
   * @param b super-diagonal entry (mirror of c)
   * @param d diagonal entry right of c
   * @param norm largest entry of the Hessenberg matrix
   */
  static boolean negligible(double c, double a, double b, double d, double norm) {
    double sub = Math.abs(c);
    double s = Math.abs(a) + Math.abs(d);
    if (s == 0) {
      s = norm;
    }
    return sub <= EPS * s
        || sub <= EPS * norm && sub * Math.abs(b) <= EPS * Math.abs(d) * Math.abs(a - d);
  }

  /** Eigenvalues of the trailing 2 x 2 block at rows hi-1, hi into wr, wi. */
  private void trailingPair(int n, int hi, double[] wr, double[] wi) {
    int r = (hi - 1) * n + hi - 1;
    double a = h[r];
    double b = h[r + 1];
    double c = h[r + n];
    double d = h[r + n + 1];
    // c != 0 (else the block would have been split), so sc > 0
    double sc = Math.max(Math.max(Math.abs(a), Math.abs(b)), Math.max(Math.abs(c), Math.abs(d)));
    a /= sc;
    b /= sc;
    c /= sc;
    d /= sc;
    // lambda = d + p +- sqrt(p^2 + b c), p = (a - d) / 2
    double p = 0.5 * (a - d);
    double bc = b * c;
    double q = p * p + bc;
    if (q >= 0) {
      double z = p + Math.copySign(Math.sqrt(q), p);
      wr[hi - 1] = (d + z) * sc;
      // second root d - bc / z avoids cancellation (z = 0 only when both roots equal d)
      wr[hi] = (z == 0 ? d : d - bc / z) * sc;
    } else {
      double im = Math.sqrt(-q) * sc;
      wr[hi - 1] = (d + p) * sc;
      wr[hi] = wr[hi - 1];
      wi[hi - 1] = im;
      wi[hi] = -im;
    }
  }

  /**
   * One implicit double-shift QR sweep on rows and columns l..hi (at least 3 x 3): the shifts
   * are the eigenvalues of the trailing 2 x 2 block, or the exceptional ones.
   */
  private void sweep(int n, int l, int hi, boolean exceptional) {
    // shift matrix [[s11, s12], [s21, s22]] enters only through s11, s22 and s12 s21
    double s11;
    double s22;
    double s12s21;
    if (exceptional) {
      double s = Math.abs(h[hi * n + hi - 1]) + Math.abs(h[(hi - 1) * n + hi - 2]);
      s11 = h[hi * n + hi] + EXCEPTIONAL_SHIFT * s;
      s22 = s11;
      s12s21 = EXCEPTIONAL_PRODUCT * s * s;
    } else {
      s11 = h[(hi - 1) * n + hi - 1];
      s22 = h[hi * n + hi];
      s12s21 = h[(hi - 1) * n + hi] * h[hi * n + hi - 1];
      double p = 0.5 * (s11 - s22);
      double q = p * p + s12s21;
      if (q >= 0) {
        // two real shifts: use the one nearer h[hi][hi] twice. Two distinct real shifts cannot
        // separate a window holding two copies of a nearly repeated pair (they stall); one
        // repeated shift converges to a single eigenvalue or one tight cluster at a time.
        double z = p + Math.copySign(Math.sqrt(q), p);
        s11 = z == 0 ? s22 : s22 - s12s21 / z;
        s22 = s11;
        s12s21 = 0;
      }
    }
    // first column of (H - s1 I)(H - s2 I), written to limit cancellation
    double h00 = h[l * n + l];
    double h01 = h[l * n + l + 1];
    double h10 = h[(l + 1) * n + l];
    double h11 = h[(l + 1) * n + l + 1];
    double h21 = h[(l + 2) * n + l + 1];
    double x = (h00 - s11) * (h00 - s22) - s12s21 + h01 * h10;
    double y = h10 * ((h00 - s11) + (h11 - s22));
    double z = h10 * h21;
    for (int k = l; k < hi; k++) {
      boolean three = k < hi - 1;
      if (k > l) {
        x = h[k * n + k - 1];
        y = h[(k + 1) * n + k - 1];
        z = three ? h[(k + 2) * n + k - 1] : 0.0;
      }
      double scale = Math.abs(x) + Math.abs(y) + Math.abs(z);
      if (scale == 0) {
        continue;
      }
      x /= scale;
      y /= scale;
      z /= scale;
      double beta = -Math.copySign(Math.sqrt(x * x + y * y + z * z), x);
      // reflector I - tau u u^T with u = (1, u1, u2) maps (x, y, z) to (beta, 0, 0)
      double tau = (beta - x) / beta;
      double u1 = y / (x - beta);
      double u2 = z / (x - beta);
      if (k > l) {
        h[k * n + k - 1] = beta * scale;
        h[(k + 1) * n + k - 1] = 0;
        if (three) {
          h[(k + 2) * n + k - 1] = 0;
        }
      }
      reflectRows(n, k, hi, three, tau, u1, u2);
      reflectColumns(n, k, l, Math.min(k + 3, hi), three, tau, u1, u2);
    }
  }

  /** Rows k, k+1 (, k+2), columns k..hi: H = P H. */
  private void reflectRows(int n, int k, int hi, boolean three, double tau, double u1, double u2) {
    int r0 = k * n;
    int r1 = r0 + n;
    int r2 = r1 + n;
    if (three) {
      for (int j = k; j <= hi; j++) {
        double s = tau * (h[r0 + j] + u1 * h[r1 + j] + u2 * h[r2 + j]);
        h[r0 + j] -= s;
        h[r1 + j] -= s * u1;
        h[r2 + j] -= s * u2;
      }
    } else {
      for (int j = k; j <= hi; j++) {
        double s = tau * (h[r0 + j] + u1 * h[r1 + j]);
        h[r0 + j] -= s;
        h[r1 + j] -= s * u1;
      }
    }
  }

  /** Rows l..last, columns k, k+1 (, k+2): H = H P. */
  private void reflectColumns(
      int n, int k, int l, int last, boolean three, double tau, double u1, double u2) {
    for (int i = l; i <= last; i++) {
      int c = i * n + k;
      if (three) {
        double s = tau * (h[c] + u1 * h[c + 1] + u2 * h[c + 2]);
        h[c] -= s;
        h[c + 1] -= s * u1;
        h[c + 2] -= s * u2;
      } else {
        double s = tau * (h[c] + u1 * h[c + 1]);
        h[c] -= s;
        h[c + 1] -= s * u1;
      }
    }
  }
}
