package org.flexmargin.loop;

/**
 * Evaluates G(j w) = C (j w I - A)^-1 B + D of one {@link StateSpace} at many frequencies by the
 * Hessenberg method of Laub ("Efficient multivariable frequency response computations", IEEE
 * Trans. Automatic Control 26(2):407-408, 1981).
 *
 * <p>A is reduced once to upper Hessenberg form H = Q^T A Q by an orthogonal similarity (cached
 * in the system), B and C are transformed to Q^T B and C Q, and at every frequency the
 * Hessenberg system (j w I - H) X = Q^T B is solved by Gaussian elimination with adjacent-row
 * partial pivoting (only one sub-diagonal entry per column to eliminate) and back substitution:
 * O(n^2) per frequency and right-hand side instead of O(n^3) for a dense solve. Orthogonal
 * similarity leaves the transfer matrix unchanged and is backward stable.
 *
 * <p>Workspaces are allocated once and reused; an instance is therefore <b>not</b> thread-safe:
 * use one evaluator per thread (they share the immutable reduction).
 */
public final class FrequencyResponseEvaluator {
  private final HessenbergRealization hr;
  private final double[] mr;
  private final double[] mi;
  private final double[] xr;
  private final double[] xi;

  /**
   * @param system the system to evaluate (its Hessenberg reduction is computed on first use and
   *     cached)
   */
  public FrequencyResponseEvaluator(StateSpace system) {
    this.hr = system.hessenberg();
    int n = hr.n;
    this.mr = new double[n * n];
    this.mi = new double[n * n];
    this.xr = new double[n * hr.inputs];
    this.xi = new double[n * hr.inputs];
  }

  /** @return number of outputs p */
  public int outputCount() {
    return hr.outputs;
  }

  /** @return number of inputs m */
  public int inputCount() {
    return hr.inputs;
  }

  /**
   * Evaluates the transfer matrix at one frequency.
   *
   * @param omegaRadPerS frequency w, rad/s. At an eigenvalue of A on the imaginary axis the
   *     result is infinite or NaN.
   * @param re receives Re G(j w), row-major p x m (length at least p m)
   * @param im receives Im G(j w), row-major p x m
   */
  public void evaluate(double omegaRadPerS, double[] re, double[] im) {
    int n = hr.n;
    int m = hr.inputs;
    int p = hr.outputs;
    double[] h = hr.h;
    // M = j w I - H (upper Hessenberg); X = Q^T B
    for (int i = 0; i < n; i++) {
      int row = i * n;
      for (int j = Math.max(0, i - 1); j < n; j++) {
        mr[row + j] = -h[row + j];
        mi[row + j] = 0.0;
      }
      mi[row + i] = omegaRadPerS;
    }
    System.arraycopy(hr.bt, 0, xr, 0, n * m);
    java.util.Arrays.fill(xi, 0, n * m, 0.0);
    // Forward elimination of the single sub-diagonal entry of each column.
    for (int k = 0; k < n - 1; k++) {
      int rk = k * n;
      int rk1 = (k + 1) * n;
      double pr = mr[rk + k];
      double pi = mi[rk + k];
      double sr = mr[rk1 + k];
      double si = mi[rk1 + k];
      if (sr == 0.0 && si == 0.0) {
        continue;
      }
      if (Math.hypot(sr, si) > Math.hypot(pr, pi)) {
        for (int j = k; j < n; j++) {
          double t = mr[rk + j];
          mr[rk + j] = mr[rk1 + j];
          mr[rk1 + j] = t;
          t = mi[rk + j];
          mi[rk + j] = mi[rk1 + j];
          mi[rk1 + j] = t;
        }
        for (int j = 0; j < m; j++) {
          double t = xr[k * m + j];
          xr[k * m + j] = xr[(k + 1) * m + j];
          xr[(k + 1) * m + j] = t;
          t = xi[k * m + j];
          xi[k * m + j] = xi[(k + 1) * m + j];
          xi[(k + 1) * m + j] = t;
        }
        pr = mr[rk + k];
        pi = mi[rk + k];
        sr = mr[rk1 + k];
        si = mi[rk1 + k];
      }
      // l = s / p
      double den = pr * pr + pi * pi;
      double lr = (sr * pr + si * pi) / den;
      double li = (si * pr - sr * pi) / den;
      mr[rk1 + k] = 0.0;
      mi[rk1 + k] = 0.0;
      for (int j = k + 1; j < n; j++) {
        double ar = mr[rk + j];
        double ai = mi[rk + j];
        mr[rk1 + j] -= lr * ar - li * ai;
        mi[rk1 + j] -= lr * ai + li * ar;
      }
      for (int j = 0; j < m; j++) {
        double ar = xr[k * m + j];
        double ai = xi[k * m + j];
        xr[(k + 1) * m + j] -= lr * ar - li * ai;
        xi[(k + 1) * m + j] -= lr * ai + li * ar;
      }
    }
    // Back substitution on the upper triangle.
    for (int i = n - 1; i >= 0; i--) {
      int ri = i * n;
      double dr = mr[ri + i];
      double di = mi[ri + i];
      double den = dr * dr + di * di;
      for (int j = 0; j < m; j++) {
        double sr = xr[i * m + j];
        double si = xi[i * m + j];
        for (int l = i + 1; l < n; l++) {
          double ar = mr[ri + l];
          double ai = mi[ri + l];
          double vr = xr[l * m + j];
          double vi = xi[l * m + j];
          sr -= ar * vr - ai * vi;
          si -= ar * vi + ai * vr;
        }
        xr[i * m + j] = (sr * dr + si * di) / den;
        xi[i * m + j] = (si * dr - sr * di) / den;
      }
    }
    // G = C Q X + D
    double[] ct = hr.ct;
    for (int i = 0; i < p; i++) {
      for (int j = 0; j < m; j++) {
        double sr = hr.d[i * m + j];
        double si = 0.0;
        for (int l = 0; l < n; l++) {
          double cv = ct[i * n + l];
          sr += cv * xr[l * m + j];
          si += cv * xi[l * m + j];
        }
        re[i * m + j] = sr;
        im[i * m + j] = si;
      }
    }
  }
}
