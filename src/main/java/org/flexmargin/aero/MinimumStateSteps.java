package org.flexmargin.aero;

import java.util.Arrays;
import java.util.Locale;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.flexmargin.model.InvalidInputException;

/**
 * The two alternating least-squares half-steps of {@link MinimumStateApproximation}, reduced to the
 * lag coefficients.
 *
 * <p>The equations of element (i, j) at the fitted k<sub>r</sub> are, weighted by w<sub>r</sub>,
 * real part: -k<sub>r</sub><sup>2</sup> A2<sub>ij</sub> + sum<sub>l</sub> c<sub>l</sub>
 * Re L<sub>l</sub>(k<sub>r</sub>) = Re T<sub>ij</sub>(k<sub>r</sub>), imaginary part:
 * k<sub>r</sub> A1<sub>ij</sub> + sum<sub>l</sub> c<sub>l</sub> Im L<sub>l</sub>(k<sub>r</sub>) =
 * Im T<sub>ij</sub>(k<sub>r</sub>), with c<sub>l</sub> = D<sub>il</sub> E<sub>lj</sub>, L<sub>l</sub>
 * = ik / (ik + &beta;<sub>l</sub>) and T = Q - A0. A1<sub>ij</sub> and A2<sub>ij</sub> belong to
 * this element alone, so they are eliminated once, before the iterations: the real rows are
 * projected orthogonally to the column of A2<sub>ij</sub>, the imaginary rows to that of
 * A1<sub>ij</sub> (variable projection), leaving per element a least-squares problem in c alone,
 * X<sub>ij</sub> c &asymp; y<sub>ij</sub>, with Gram matrix M<sub>ij</sub> = X<sup>T</sup>X and
 * right side h<sub>ij</sub> = X<sup>T</sup>y. With D fixed, column j of E then solves the
 * nL x nL normal equations (sum<sub>i</sub> M<sub>ij</sub> &#8728; d<sub>i</sub>
 * d<sub>i</sub><sup>T</sup>) E[:, j] = sum<sub>i</sub> d<sub>i</sub> &#8728; h<sub>ij</sub>
 * (&#8728; the element-wise product, d<sub>i</sub> row i of D); with E fixed, row i of D the same
 * with the roles swapped. This is the same minimiser as the full least squares of each half-step
 * in (A1, A2, E) or (A1, A2, D), at a cost per iteration of order n<sup>2</sup>
 * nL<sup>2</sup> instead of n<sup>3</sup> n<sub>k</sub> (2n + nL)<sup>2</sup>, and with every
 * workspace allocated once.
 *
 * <p>The normal equations are scaled to a unit diagonal and solved by Cholesky; where that fails
 * (a lag column of D or row of E that vanished, or a Gram matrix singular to round-off) by the
 * pseudo-inverse, which gives the least-norm solution. Not thread-safe: one per fit.
 */
final class MinimumStateSteps {
  /** Coordinates n (count). */
  private final int n;
  /** Lag roots nL (count). */
  private final int nl;
  /** Equations per element, 2 nk (count). */
  private final int rows;
  /** Projected rows X of element i n + j: 2 nk rows of nL, row-major (dimensionless, weighted). */
  private final double[][] x;
  /** Projected right side y of element i n + j (force coefficient units, weighted). */
  private final double[][] y;
  /** Gram matrix X^T X of element i n + j, nL x nL row-major. */
  private final double[][] gram;
  /** X^T y of element i n + j. */
  private final double[][] rhs;
  /** A1 = a1Base - a1Slope . c and A2 likewise, per element (force coefficient units). */
  private final double[] a1Base;
  private final double[] a2Base;
  private final double[][] a1Slope;
  private final double[][] a2Slope;
  /** Sum of the squared weighted targets: the weighted residual with every coefficient zero. */
  private final double targetSquares;
  /**
   * Size of the data: the root mean square over the fitted k of the Frobenius norm of Q - A0,
   * unweighted (force coefficient units).
   */
  private final double targetScale;
  /** Ridge weight &mu; of the penalised half-steps (weighted squared units per force coefficient unit). */
  private double ridge;

  /** Normal equations being built, nL x nL (dimensionless after scaling). */
  private final DMatrixRMaj normal;
  /** Copy of {@link #normal} that the Cholesky factorisation overwrites. */
  private final DMatrixRMaj factor;
  /** Right side of the normal equations, nL. */
  private final DMatrixRMaj right;
  /** Their solution, nL: a column of E or a row of D. */
  private final DMatrixRMaj solution;
  /** Scaling of the normal equations to a unit diagonal, 1 / sqrt(N_pp) (reciprocal units of N_pp). */
  private final double[] scale;
  private final LinearSolverDense<DMatrixRMaj> cholesky;
  private LinearSolverDense<DMatrixRMaj> pseudoInverse;

  /**
   * @param ks fitted reduced frequencies (dimensionless)
   * @param lagRe real part of the lag function l at k r
   * @param lagIm imaginary part of the lag function l at k r
   * @param targetRe Re (Q - A0) at k r of element (i, j)
   * @param targetIm Im Q at k r of element (i, j)
   * @param weights weight of the equations at k r of element (i, j), &gt; 0
   */
  MinimumStateSteps(double[] ks, double[][] lagRe, double[][] lagIm, double[][][] targetRe, double[][][] targetIm,
      double[][][] weights) {
    int nk = ks.length;
    this.n = targetRe[0].length;
    this.nl = lagRe[0].length;
    this.rows = 2 * nk;
    int elements = n * n;
    x = new double[elements][rows * nl];
    y = new double[elements][rows];
    gram = new double[elements][nl * nl];
    rhs = new double[elements][nl];
    a1Base = new double[elements];
    a2Base = new double[elements];
    a1Slope = new double[elements][nl];
    a2Slope = new double[elements][nl];
    double squares = 0;
    double scale2 = 0;
    double[] column = new double[nk];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        int e = i * n + j;
        for (int r = 0; r < nk; r++) {
          double w = weights[r][i][j];
          for (int l = 0; l < nl; l++) {
            x[e][r * nl + l] = w * lagRe[r][l];
            x[e][(nk + r) * nl + l] = w * lagIm[r][l];
          }
          y[e][r] = w * targetRe[r][i][j];
          y[e][nk + r] = w * targetIm[r][i][j];
          squares += y[e][r] * y[e][r] + y[e][nk + r] * y[e][nk + r];
          scale2 += targetRe[r][i][j] * targetRe[r][i][j] + targetIm[r][i][j] * targetIm[r][i][j];
        }
        // real rows: the column of A2 is -w k^2; imaginary rows: that of A1 is w k
        for (int r = 0; r < nk; r++) {
          column[r] = -weights[r][i][j] * ks[r] * ks[r];
        }
        a2Base[e] = project(e, 0, nk, column, a2Slope[e]);
        for (int r = 0; r < nk; r++) {
          column[r] = weights[r][i][j] * ks[r];
        }
        a1Base[e] = project(e, nk, nk, column, a1Slope[e]);
        for (int row = 0; row < rows; row++) {
          int at = row * nl;
          for (int p = 0; p < nl; p++) {
            double xp = x[e][at + p];
            rhs[e][p] += xp * y[e][row];
            for (int q = 0; q < nl; q++) {
              gram[e][p * nl + q] += xp * x[e][at + q];
            }
          }
        }
      }
    }
    targetSquares = squares;
    targetScale = Math.sqrt(scale2 / nk);
    normal = new DMatrixRMaj(nl, nl);
    factor = new DMatrixRMaj(nl, nl);
    right = new DMatrixRMaj(nl, 1);
    solution = new DMatrixRMaj(nl, 1);
    scale = new double[nl];
    cholesky = LinearSolverFactory_DDRM.chol(nl);
  }

  /**
   * Projects rows {@code from .. from + count - 1} of element e orthogonally to {@code column}
   * (twice, for round-off: classical Gram-Schmidt with re-orthogonalisation).
   *
   * @param slope receives the coefficient's dependence on c
   * @return the coefficient with c = 0
   */
  private double project(int e, int from, int count, double[] column, double[] slope) {
    double cc = 0;
    for (int r = 0; r < count; r++) {
      cc += column[r] * column[r];
    }
    if (cc == 0) {
      return 0;
    }
    double base = 0;
    for (int pass = 0; pass < 2; pass++) {
      double cy = 0;
      for (int r = 0; r < count; r++) {
        cy += column[r] * y[e][from + r];
      }
      cy /= cc;
      base += cy;
      for (int r = 0; r < count; r++) {
        y[e][from + r] -= cy * column[r];
      }
      for (int l = 0; l < nl; l++) {
        double cx = 0;
        for (int r = 0; r < count; r++) {
          cx += column[r] * x[e][(from + r) * nl + l];
        }
        cx /= cc;
        slope[l] += cx;
        for (int r = 0; r < count; r++) {
          x[e][(from + r) * nl + l] -= cx * column[r];
        }
      }
    }
    return base;
  }

  /** @return the number of coordinates n */
  int coordinates() {
    return n;
  }

  /** @return the number of lag roots nL */
  int lagCount() {
    return nl;
  }

  /** @return the size of the data, RMS over k of the Frobenius norm of Q - A0 (force coefficient units) */
  double targetScale() {
    return targetScale;
  }

  /**
   * Sets the ridge weight of the half-steps: each then minimises the weighted residual sum of
   * squares plus &mu; times the sum of the squares of the unknowns it solves for.
   *
   * @param mu &mu; &ge; 0 (weighted squared units per force coefficient unit)
   */
  void ridge(double mu) {
    ridge = mu;
  }

  /** @return the weighted residual sum of squares with every coefficient zero (&gt; 0 unless Q = A0) */
  double targetSquares() {
    return targetSquares;
  }

  /**
   * With D fixed, E: every column by its normal equations.
   *
   * @param d D, n x nL, read
   * @param e E, nL x n, written
   */
  void solveColumns(double[][] d, double[][] e) {
    for (int j = 0; j < n; j++) {
      clear();
      for (int i = 0; i < n; i++) {
        accumulate(i * n + j, d[i]);
      }
      solve();
      for (int l = 0; l < nl; l++) {
        e[l][j] = solution.data[l];
      }
    }
  }

  /**
   * With E fixed, D: every row by its normal equations.
   *
   * @param e E, nL x n, read
   * @param d D, n x nL, written
   * @param column workspace of nL
   */
  void solveRows(double[][] e, double[][] d, double[] column) {
    for (int i = 0; i < n; i++) {
      clear();
      for (int j = 0; j < n; j++) {
        for (int l = 0; l < nl; l++) {
          column[l] = e[l][j];
        }
        accumulate(i * n + j, column);
      }
      solve();
      System.arraycopy(solution.data, 0, d[i], 0, nl);
    }
  }

  /**
   * @param d D
   * @param e E
   * @param c workspace of nL
   * @return the weighted residual sum of squares of the fit with these D and E (and A1, A2 at their
   *     least-squares values for them)
   */
  double residual(double[][] d, double[][] e, double[] c) {
    double sum = 0;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        int el = i * n + j;
        lagCoefficients(d, e, i, j, c);
        double[] xe = x[el];
        double[] ye = y[el];
        for (int row = 0; row < rows; row++) {
          double f = 0;
          int at = row * nl;
          for (int l = 0; l < nl; l++) {
            f += xe[at + l] * c[l];
          }
          double diff = ye[row] - f;
          sum += diff * diff;
        }
      }
    }
    return sum;
  }

  /**
   * A1 and A2 at their least-squares values for D and E.
   *
   * @param a1 written, n x n
   * @param a2 written, n x n
   * @param c workspace of nL
   */
  void velocityAndAcceleration(double[][] d, double[][] e, double[][] a1, double[][] a2, double[] c) {
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        int el = i * n + j;
        lagCoefficients(d, e, i, j, c);
        double v1 = a1Base[el];
        double v2 = a2Base[el];
        for (int l = 0; l < nl; l++) {
          v1 -= a1Slope[el][l] * c[l];
          v2 -= a2Slope[el][l] * c[l];
        }
        a1[i][j] = v1;
        a2[i][j] = v2;
      }
    }
  }

  /**
   * Half the gradient and half the Hessian of the weighted residual sum of squares S in (D, E)
   * together, at the given D and E: with the parameters ordered D row by row (D[i][l] at i nL + l),
   * then E row by row (E[l][j] at n nL + l n + j), r<sub>ij</sub> = X<sub>ij</sub> c<sub>ij</sub> -
   * y<sub>ij</sub> the residual of element (i, j) and J its Jacobian, the gradient is
   * J<sup>T</sup>r and the Hessian J<sup>T</sup>J plus the second-order term: since
   * dc<sub>ij</sub>/dD[i][l] = E[l][j] u<sub>l</sub> and dc<sub>ij</sub>/dE[l][j] = D[i][l]
   * u<sub>l</sub> (u<sub>l</sub> the l-th unit vector), the only second derivative of c<sub>ij</sub>
   * is d<sup>2</sup>c<sub>ij,l</sub> / dD[i][l] dE[l][j] = 1, which adds (M<sub>ij</sub>
   * c<sub>ij</sub> - h<sub>ij</sub>)<sub>l</sub> there. Everything follows from each element's Gram
   * matrix and right side alone. The exact Hessian rather than Gauss-Newton's J<sup>T</sup>J alone,
   * because on these fits the residual is not small against the curvature along the valleys, where
   * Gauss-Newton converges only linearly (J. Nocedal and S. J. Wright, Numerical Optimization,
   * 2nd ed., 2006, sec. 10.3, from memory).
   *
   * @param d D
   * @param e E
   * @param hessian half the Hessian, 2 n nL x 2 n nL row-major, written
   * @param gradient half the gradient, 2 n nL, written
   * @param c workspace of nL
   * @param r workspace of nL
   */
  void newton(double[][] d, double[][] e, double[] hessian, double[] gradient, double[] c, double[] r) {
    int size = 2 * n * nl;
    int offset = n * nl;
    Arrays.fill(hessian, 0, size * size, 0.0);
    Arrays.fill(gradient, 0, size, 0.0);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        int el = i * n + j;
        double[] m = gram[el];
        lagCoefficients(d, e, i, j, c);
        for (int p = 0; p < nl; p++) {
          double v = -rhs[el][p];
          for (int q = 0; q < nl; q++) {
            v += m[p * nl + q] * c[q];
          }
          r[p] = v;
        }
        for (int p = 0; p < nl; p++) {
          int dp = i * nl + p;
          int ep = offset + p * n + j;
          double ej = e[p][j];
          double di = d[i][p];
          gradient[dp] += ej * r[p];
          gradient[ep] += di * r[p];
          hessian[dp * size + ep] += r[p];
          hessian[ep * size + dp] += r[p];
          for (int q = 0; q < nl; q++) {
            double mpq = m[p * nl + q];
            int dq = i * nl + q;
            int eq = offset + q * n + j;
            hessian[dp * size + dq] += ej * e[q][j] * mpq;
            hessian[ep * size + eq] += di * d[i][q] * mpq;
            double cross = ej * d[i][q] * mpq;
            hessian[dp * size + eq] += cross;
            hessian[eq * size + dp] += cross;
          }
        }
      }
    }
  }

  private void lagCoefficients(double[][] d, double[][] e, int i, int j, double[] c) {
    for (int l = 0; l < nl; l++) {
      c[l] = d[i][l] * e[l][j];
    }
  }

  private void clear() {
    Arrays.fill(normal.data, 0);
    Arrays.fill(right.data, 0);
  }

  /** Adds element el's equations with the fixed factor f: M .* f f^T and f .* h. */
  private void accumulate(int el, double[] f) {
    double[] m = gram[el];
    double[] h = rhs[el];
    double[] nd = normal.data;
    for (int p = 0; p < nl; p++) {
      double fp = f[p];
      if (fp == 0) {
        continue;
      }
      right.data[p] += fp * h[p];
      int at = p * nl;
      for (int q = 0; q < nl; q++) {
        nd[at + q] += fp * f[q] * m[at + q];
      }
    }
  }

  /** Solves the accumulated normal equations into {@link #solution}. */
  private void solve() {
    double[] nd = normal.data;
    for (int p = 0; p < nl; p++) {
      nd[p * nl + p] += ridge;
    }
    for (int p = 0; p < nl; p++) {
      double diag = nd[p * nl + p];
      scale[p] = diag > 0 ? 1 / Math.sqrt(diag) : 1.0;
    }
    for (int p = 0; p < nl; p++) {
      right.data[p] *= scale[p];
      for (int q = 0; q < nl; q++) {
        nd[p * nl + q] *= scale[p] * scale[q];
      }
    }
    boolean solved = false;
    System.arraycopy(nd, 0, factor.data, 0, nd.length);
    if (cholesky.setA(factor)) {
      cholesky.solve(right, solution);
      solved = finite(solution.data);
    }
    if (!solved) {
      if (pseudoInverse == null) {
        pseudoInverse = LinearSolverFactory_DDRM.pseudoInverse(true);
      }
      if (!pseudoInverse.setA(normal)) {
        throw illPosed();
      }
      pseudoInverse.solve(right, solution);
      if (!finite(solution.data)) {
        throw illPosed();
      }
    }
    for (int p = 0; p < nl; p++) {
      solution.data[p] *= scale[p];
    }
  }

  private static boolean finite(double[] v) {
    for (double a : v) {
      if (!Double.isFinite(a)) {
        return false;
      }
    }
    return true;
  }

  private InvalidInputException illPosed() {
    return new InvalidInputException("rfa.lag_roots",
        "lag roots far enough apart for the fitted reduced frequencies (well-posed least squares)",
        String.format(Locale.ROOT, "a singular minimum-state step with %d lag roots", nl));
  }
}
