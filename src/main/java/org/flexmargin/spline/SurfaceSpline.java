package org.flexmargin.spline;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * The infinite-plate spline of Harder and Desmarais (J. Aircraft 9(2), 1972): the deflection of an
 * infinite plate loaded by point forces F_i at the structural points (x_i, y_i),
 *
 * <pre>
 *   w(x, y) = a0 + a1 x + a2 y + sum_i F_i r_i^2 ln r_i^2,   r_i^2 = (x - x_i)^2 + (y - y_i)^2,
 * </pre>
 *
 * with sum F_i = sum x_i F_i = sum y_i F_i = 0 (force and moment equilibrium), passing through the
 * given deflections. Any plane a0 + a1 x + a2 y (rigid heave, pitch and roll) is reproduced
 * exactly. The slope dw/dx = a1 + sum_i 2 F_i (x - x_i)(ln r_i^2 + 1).
 *
 * <p>Immutable; built once per set of structural points.
 */
public final class SurfaceSpline {
  private final double[] xs;
  private final double[] ys;
  /** (n + 3) x n: coefficients (F, a) per unit deflection at each point. */
  private final DMatrixRMaj coefficients;

  /**
   * @param xs x of the structural points (m), at least three not on one line
   * @param ys y of the structural points (m)
   * @throws IllegalArgumentException if the points are collinear or coincide
   */
  public SurfaceSpline(double[] xs, double[] ys) {
    int n = xs.length;
    if (ys.length != n || n < 3) {
      throw new IllegalArgumentException("a surface spline needs at least three points");
    }
    if (collinear(xs, ys)) {
      throw new IllegalArgumentException(
          "surface spline points are collinear or coincide: need points spread over the surface");
    }
    this.xs = xs.clone();
    this.ys = ys.clone();
    DMatrixRMaj a = new DMatrixRMaj(n + 3, n + 3);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a.set(i, j, kernel(xs[i] - xs[j], ys[i] - ys[j]));
      }
      a.set(i, n, 1);
      a.set(i, n + 1, xs[i]);
      a.set(i, n + 2, ys[i]);
      a.set(n, i, 1);
      a.set(n + 1, i, xs[i]);
      a.set(n + 2, i, ys[i]);
    }
    DMatrixRMaj rhs = new DMatrixRMaj(n + 3, n);
    for (int i = 0; i < n; i++) {
      rhs.set(i, i, 1);
    }
    LinearSolverDense<DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(n + 3);
    if (!lu.setA(a)) {
      throw new IllegalArgumentException("surface spline points give a singular system (repeated points?)");
    }
    coefficients = new DMatrixRMaj(n + 3, n);
    lu.solve(rhs, coefficients);
  }

  /** True if the points' second moments about their centroid are (numerically) of rank one. */
  private static boolean collinear(double[] xs, double[] ys) {
    int n = xs.length;
    double mx = 0, my = 0;
    for (int i = 0; i < n; i++) {
      mx += xs[i] / n;
      my += ys[i] / n;
    }
    double sxx = 0, syy = 0, sxy = 0;
    for (int i = 0; i < n; i++) {
      double dx = xs[i] - mx, dy = ys[i] - my;
      sxx += dx * dx;
      syy += dy * dy;
      sxy += dx * dy;
    }
    double tr = sxx + syy;
    return tr == 0 || (sxx * syy - sxy * sxy) <= 1e-12 * tr * tr;
  }

  private static double kernel(double dx, double dy) {
    double r2 = dx * dx + dy * dy;
    return r2 == 0 ? 0 : r2 * Math.log(r2);
  }

  /**
   * @param tx target x (m)
   * @param ty target y (m)
   * @param slope false for the deflection w, true for the streamwise slope dw/dx
   * @return the interpolation from point deflections to target values
   */
  public SplineMatrix to(double[] tx, double[] ty, boolean slope) {
    int n = xs.length;
    int m = tx.length;
    double[] g = new double[m * n];
    double[] basis = new double[n + 3];
    for (int t = 0; t < m; t++) {
      for (int i = 0; i < n; i++) {
        double dx = tx[t] - xs[i], dy = ty[t] - ys[i];
        double r2 = dx * dx + dy * dy;
        basis[i] = slope ? (r2 == 0 ? 0 : 2 * dx * (Math.log(r2) + 1)) : kernel(dx, dy);
      }
      basis[n] = slope ? 0 : 1;
      basis[n + 1] = slope ? 1 : tx[t];
      basis[n + 2] = slope ? 0 : ty[t];
      for (int c = 0; c < n; c++) {
        double s = 0;
        for (int r = 0; r < n + 3; r++) {
          s += basis[r] * coefficients.get(r, c);
        }
        g[t * n + c] = s;
      }
    }
    return new SplineMatrix(m, n, g);
  }
}
