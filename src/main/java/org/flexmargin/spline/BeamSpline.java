package org.flexmargin.spline;

import java.util.Arrays;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * A beam spline along a straight reference axis parallel to y (for example the elastic axis of a
 * wing): the structural stations carry the axis position x_i at span y_i, a vertical displacement
 * h_i and a streamwise pitch theta_i (positive nose up). Between the stations
 *
 * <ul>
 *   <li>h(y) is the infinite-beam spline h = a0 + a1 y + sum F_i |y - y_i|^3 with sum F_i = sum
 *       y_i F_i = 0 (a cubic spline with zero curvature at the ends, the deflection of a long
 *       beam under point loads), which reproduces any straight line exactly;
 *   <li>theta(y) and the axis position x_a(y) are linear between stations and extended linearly
 *       beyond the end stations;
 *   <li>a point (x, y) off the axis moves with the rigid chord: w = h(y) - theta(y) (x - x_a(y)),
 *       dw/dx = -theta(y).
 * </ul>
 *
 * Rigid heave (h = const, theta = 0) and rigid pitch about any line x = x0 (h_i = -theta0 (x_i -
 * x0), theta = theta0) are reproduced exactly when the stations lie on a straight axis.
 *
 * <p>Immutable.
 */
public final class BeamSpline {
  private final double[] ys;
  private final double[] xs;
  private final int[] order;
  private final double[] sortedY;
  private final double[] coefficients; // (n + 2) x n, row-major

  /**
   * @param xs axis position x_i at each station (m)
   * @param ys span position y_i of each station (m), at least two distinct
   * @throws IllegalArgumentException if fewer than two distinct stations
   */
  public BeamSpline(double[] xs, double[] ys) {
    int n = ys.length;
    if (xs.length != n || n < 2) {
      throw new IllegalArgumentException("a beam spline needs at least two stations");
    }
    this.xs = xs.clone();
    this.ys = ys.clone();
    Integer[] idx = new Integer[n];
    for (int i = 0; i < n; i++) {
      idx[i] = i;
    }
    Arrays.sort(idx, (a, b) -> Double.compare(ys[a], ys[b]));
    order = new int[n];
    sortedY = new double[n];
    for (int i = 0; i < n; i++) {
      order[i] = idx[i];
      sortedY[i] = ys[idx[i]];
      if (i > 0 && sortedY[i] - sortedY[i - 1] <= 1e-12 * (1 + Math.abs(sortedY[i]))) {
        throw new IllegalArgumentException("two beam-spline stations at the same span position y = " + sortedY[i]);
      }
    }
    DMatrixRMaj a = new DMatrixRMaj(n + 2, n + 2);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double d = Math.abs(ys[i] - ys[j]);
        a.set(i, j, d * d * d);
      }
      a.set(i, n, 1);
      a.set(i, n + 1, ys[i]);
      a.set(n, i, 1);
      a.set(n + 1, i, ys[i]);
    }
    DMatrixRMaj rhs = new DMatrixRMaj(n + 2, n);
    for (int i = 0; i < n; i++) {
      rhs.set(i, i, 1);
    }
    DMatrixRMaj sol = new DMatrixRMaj(n + 2, n);
    LinearSolverDense<DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(n + 2);
    if (!lu.setA(a)) {
      throw new IllegalArgumentException("beam spline stations give a singular system");
    }
    lu.solve(rhs, sol);
    coefficients = sol.data;
  }

  /** @return number of stations */
  public int size() {
    return ys.length;
  }

  /**
   * Interpolation of the stations' (h, theta) to w (or dw/dx) at target points. The source vector
   * is [h_0..h_(n-1), theta_0..theta_(n-1)].
   *
   * @param tx target x (m)
   * @param ty target y (m)
   * @param slope false for w, true for dw/dx
   * @return targets x 2n matrix
   */
  public SplineMatrix to(double[] tx, double[] ty, boolean slope) {
    int n = ys.length;
    int m = tx.length;
    double[] g = new double[m * 2 * n];
    double[] lin = new double[n];
    for (int t = 0; t < m; t++) {
      linearWeights(ty[t], lin);
      int o = t * 2 * n;
      double xa = 0;
      for (int i = 0; i < n; i++) {
        xa += lin[i] * xs[i];
      }
      double arm = tx[t] - xa;
      for (int i = 0; i < n; i++) {
        g[o + n + i] = slope ? -lin[i] : -arm * lin[i];
      }
      if (slope) {
        continue;
      }
      for (int c = 0; c < n; c++) {
        double s = 0;
        for (int r = 0; r < n; r++) {
          double d = Math.abs(ty[t] - ys[r]);
          s += d * d * d * coefficients[r * n + c];
        }
        s += coefficients[n * n + c] + ty[t] * coefficients[(n + 1) * n + c];
        g[o + c] = s;
      }
    }
    return new SplineMatrix(m, 2 * n, g);
  }

  /** Linear interpolation (extended linearly beyond the ends) weights in station order. */
  private void linearWeights(double y, double[] w) {
    Arrays.fill(w, 0);
    int n = sortedY.length;
    int hi = Arrays.binarySearch(sortedY, y);
    if (hi >= 0) {
      w[order[hi]] = 1;
      return;
    }
    hi = -hi - 1;
    hi = Math.max(1, Math.min(n - 1, hi));
    int lo = hi - 1;
    double f = (y - sortedY[lo]) / (sortedY[hi] - sortedY[lo]);
    w[order[lo]] = 1 - f;
    w[order[hi]] = f;
  }
}
