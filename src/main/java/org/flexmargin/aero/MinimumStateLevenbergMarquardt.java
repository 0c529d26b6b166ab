package org.flexmargin.aero;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * Damped Newton steps on D and E together for the minimum-state fit, with Levenberg's and
 * Marquardt's damping (K. Levenberg, "A method for the solution of certain non-linear problems in
 * least squares", Quart. Appl. Math. 2, 1944; D. W. Marquardt, "An algorithm for least-squares
 * estimation of nonlinear parameters", J. SIAM 11(2), 1963; both from memory).
 *
 * <p>Alternating least squares moves D with E held and E with D held; where the valley of the
 * residual runs obliquely to both (D and E changing together, as when two lag terms trade their
 * shares of an element), each half-step can only zigzag across it, and the residual creeps down by
 * parts in a million per iteration. The Newton model of the joint problem ({@link
 * MinimumStateSteps#newton}, the Hessian H exact) sees the coupling and steps along the valley.
 * The step solves (H + &mu; I + &lambda; diag(H + &mu; I)) &delta; = -(g + &mu; x) for the
 * penalised residual of {@link MinimumStateApproximation} (g half the gradient, x the parameters).
 * The diagonal of H is that of J<sup>T</sup>J plus &mu; and never negative; Marquardt's scaling by
 * it is indifferent to how each lag term's size is split between D and E. Where H is not positive
 * definite (away from a minimum) the Cholesky factorisation fails and &lambda; grows until it is.
 * A step is taken only if it lowers the penalised residual; otherwise &lambda; grows fourfold and
 * the step is tried again, up to {@value #TRIALS} times; after a step taken &lambda; shrinks
 * threefold, so that near the minimum the step tends to Newton's and converges quadratically. So
 * a step never raises the penalised residual. Not thread-safe: one per fit.
 */
final class MinimumStateLevenbergMarquardt {
  /** Damping &lambda; of the first step (dimensionless: relative to the diagonal). */
  static final double INITIAL_DAMPING = 1e-3;
  /** Smallest damping kept after steps taken (dimensionless). */
  private static final double MIN_DAMPING = 1e-12;
  /** Most trial steps per call. */
  static final int TRIALS = 12;
  /** Diagonal entries below this fraction of the largest are damped as that size. */
  private static final double DIAGONAL_FLOOR = 1e-14;

  private final MinimumStateSteps steps;
  private final int n;
  private final int nl;
  private final int size;
  /** Half the Hessian of the penalised residual (weighted squared units per squared parameter unit). */
  private final double[] hessian;
  /** Half its gradient. */
  private final double[] gradient;
  private final DMatrixRMaj damped;
  private final DMatrixRMaj right;
  private final DMatrixRMaj step;
  private final double[][] trialD;
  private final double[][] trialE;
  private final double[] c;
  private final double[] r;
  private final LinearSolverDense<DMatrixRMaj> cholesky;
  /** Current damping &lambda; (dimensionless). */
  private double damping = INITIAL_DAMPING;

  /** @param steps the problem's half-steps, whose Gram matrices give the normal equations */
  MinimumStateLevenbergMarquardt(MinimumStateSteps steps) {
    this.steps = steps;
    this.n = steps.coordinates();
    this.nl = steps.lagCount();
    this.size = 2 * n * nl;
    hessian = new double[size * size];
    gradient = new double[size];
    damped = new DMatrixRMaj(size, size);
    right = new DMatrixRMaj(size, 1);
    step = new DMatrixRMaj(size, 1);
    trialD = new double[n][nl];
    trialE = new double[nl][n];
    c = new double[nl];
    r = new double[nl];
    cholesky = LinearSolverFactory_DDRM.chol(size);
  }

  /**
   * Tries to lower the penalised residual F = S + &mu; (|D|<sup>2</sup> + |E|<sup>2</sup>) (S the
   * weighted residual sum of squares, |.| the Frobenius norm) from D and E by a damped Newton step.
   *
   * @param d D, replaced by the step's when it is taken
   * @param e E, likewise
   * @param current F at D and E
   * @param mu &mu; &ge; 0
   * @return F after the call: below {@code current} when a step was taken, else {@code current} (D
   *     and E untouched)
   */
  double improve(double[][] d, double[][] e, double current, double mu) {
    steps.newton(d, e, hessian, gradient, c, r);
    double largest = 0;
    for (int p = 0; p < size; p++) {
      hessian[p * size + p] += mu;
      largest = Math.max(largest, hessian[p * size + p]);
      right.data[p] = -gradient[p] - mu * parameter(d, e, p);
    }
    double floor = DIAGONAL_FLOOR * largest;
    for (int trial = 0; trial < TRIALS; trial++) {
      System.arraycopy(hessian, 0, damped.data, 0, size * size);
      for (int p = 0; p < size; p++) {
        damped.data[p * size + p] += damping * Math.max(hessian[p * size + p], floor);
      }
      if (cholesky.setA(damped)) {
        cholesky.solve(right, step);
        double f = trial(d, e, mu);
        if (f < current) {
          copy(trialD, d);
          copy(trialE, e);
          damping = Math.max(damping / 3, MIN_DAMPING);
          return f;
        }
      }
      damping *= 4;
    }
    return current;
  }

  /** @return parameter p of the ordering of {@link MinimumStateSteps#newton} */
  private double parameter(double[][] d, double[][] e, int p) {
    int offset = n * nl;
    return p < offset ? d[p / nl][p % nl] : e[(p - offset) / n][(p - offset) % n];
  }

  /**
   * @param d D
   * @param e E
   * @return |D|<sup>2</sup> + |E|<sup>2</sup>, the sum of the squares of their entries
   */
  static double squares(double[][] d, double[][] e) {
    double sum = 0;
    for (double[][] m : new double[][][] {d, e}) {
      for (double[] row : m) {
        for (double v : row) {
          sum += v * v;
        }
      }
    }
    return sum;
  }

  /** @return F at D and E moved by {@link #step} (NaN never lowers it) */
  private double trial(double[][] d, double[][] e, double mu) {
    double[] st = step.data;
    for (int i = 0; i < n; i++) {
      for (int l = 0; l < nl; l++) {
        trialD[i][l] = d[i][l] + st[i * nl + l];
      }
    }
    int offset = n * nl;
    for (int l = 0; l < nl; l++) {
      for (int j = 0; j < n; j++) {
        trialE[l][j] = e[l][j] + st[offset + l * n + j];
      }
    }
    return steps.residual(trialD, trialE, c) + mu * squares(trialD, trialE);
  }

  private static void copy(double[][] from, double[][] to) {
    for (int i = 0; i < from.length; i++) {
      System.arraycopy(from[i], 0, to[i], 0, from[i].length);
    }
  }
}
