package org.flexmargin.simulate;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

/**
 * Whether an actuator with limits stays linear over a step: every limited quantity (the command
 * against the position limit, the position against its stop, the rate against the rate limit)
 * is a linear function g = h x + e u of the state and input; over a step it is bounded through
 * its cubic Hermite interpolant from its values and slopes at both ends (slope g' = h (A x + B u)
 * + e u'), which must stay within (1 - {@link #MARGIN}) of the limit. The cubic's error is at
 * most T^4 max|g''''| / 384 (cubic Hermite interpolation error, e.g. Burden &amp; Faires,
 * <i>Numerical Analysis</i>, sec. 3.4); for a signal of the system's own dynamics g'''' is about
 * rho^4 |g|, rho the largest eigenvalue magnitude, so the margin covers that error while
 * (rho T)^4 / 384 is at most half of it ({@link #resolves}). Immutable.
 */
final class ActuatorGuard {
  /** Fraction of each limit kept clear (-). */
  static final double MARGIN = 0.05;

  private final SparseRows rowX;
  private final SparseRows rowU;
  private final SparseRows slopeX;
  private final SparseRows slopeU;
  private final double[] limit;

  private ActuatorGuard(List<double[]> rowX, List<double[]> rowU, List<Double> limit, DMatrixRMaj a,
      DMatrixRMaj b) {
    int q = limit.size();
    this.limit = new double[q];
    DMatrixRMaj hx = new DMatrixRMaj(q, a.numCols);
    DMatrixRMaj hu = new DMatrixRMaj(q, b.numCols);
    for (int i = 0; i < q; i++) {
      this.limit[i] = limit.get(i);
      System.arraycopy(rowX.get(i), 0, hx.data, i * a.numCols, a.numCols);
      System.arraycopy(rowU.get(i), 0, hu.data, i * b.numCols, b.numCols);
    }
    DMatrixRMaj ha = new DMatrixRMaj(q, a.numCols);
    DMatrixRMaj hb = new DMatrixRMaj(q, b.numCols);
    CommonOps_DDRM.mult(hx, a, ha);
    CommonOps_DDRM.mult(hx, b, hb);
    this.rowX = SparseRows.of(hx);
    this.rowU = SparseRows.of(hu);
    this.slopeX = SparseRows.of(ha);
    this.slopeU = SparseRows.of(hb);
  }

  /**
   * @param spec the system and its actuator
   * @param limits the limits (an infinite limit guards nothing)
   * @return the guard
   */
  static ActuatorGuard of(LimitedActuatorSystem spec, ActuatorLimits limits) {
    var system = spec.system();
    int n = system.stateCount();
    int cmd = spec.commandOutput();
    double[] commandX = row(system.c(), cmd);
    double[] commandU = row(system.d(), cmd);
    List<double[]> rx = new ArrayList<>();
    List<double[]> ru = new ArrayList<>();
    List<Double> lim = new ArrayList<>();
    double p = limits.positionLimitRad();
    double r = limits.rateLimitRadPerS();
    if (Double.isFinite(p)) {
      rx.add(commandX);
      ru.add(commandU);
      lim.add(p);
      rx.add(unit(n, spec.positionState()));
      ru.add(new double[commandU.length]);
      lim.add(p);
    }
    if (Double.isFinite(r)) {
      if (spec.rateState() < 0) {
        double w = spec.omegaRadPerS();
        double[] x = new double[n];
        double[] u = new double[commandU.length];
        for (int j = 0; j < n; j++) {
          x[j] = w * commandX[j];
        }
        x[spec.positionState()] -= w;
        for (int j = 0; j < u.length; j++) {
          u[j] = w * commandU[j];
        }
        rx.add(x);
        ru.add(u);
      } else {
        rx.add(unit(n, spec.rateState()));
        ru.add(new double[commandU.length]);
      }
      lim.add(r);
    }
    return new ActuatorGuard(rx, ru, lim, system.a(), system.b());
  }

  /**
   * @param spectralRadiusPerS largest eigenvalue magnitude of the system (1/s)
   * @param periodS the step T (s)
   * @return true if the cubic's error (rho T)^4 / 384 is at most half the margin
   */
  static boolean resolves(double spectralRadiusPerS, double periodS) {
    return Math.pow(spectralRadiusPerS * periodS, 4) / 384 <= MARGIN / 2;
  }

  /**
   * @param x state
   * @param u input
   * @return true if every limited quantity is within (1 - MARGIN) of its limit at this instant
   */
  boolean inside(double[] x, double[] u) {
    for (int i = 0; i < limit.length; i++) {
      if (!(Math.abs(value(i, x, u)) <= (1 - MARGIN) * limit[i])) {
        return false;
      }
    }
    return true;
  }

  /**
   * @param x0 state at the start
   * @param u0 input at the start
   * @param du0 input rate at the start (unit of the input per s)
   * @param x1 state at the end
   * @param u1 input at the end
   * @param du1 input rate at the end
   * @param periodS T (s)
   * @return true if every limited quantity's cubic over the step stays within (1 - MARGIN) of
   *     its limit
   */
  boolean insideOver(double[] x0, double[] u0, double[] du0, double[] x1, double[] u1, double[] du1,
      double periodS) {
    for (int i = 0; i < limit.length; i++) {
      double g0 = value(i, x0, u0);
      double g1 = value(i, x1, u1);
      double d0 = periodS * slopeU.rowTimes(i, u0, slopeX.rowTimes(i, x0, rowU.rowTimes(i, du0, 0)));
      double d1 = periodS * slopeU.rowTimes(i, u1, slopeX.rowTimes(i, x1, rowU.rowTimes(i, du1, 0)));
      if (!(maxAbsCubic(g0, d0, g1, d1) <= (1 - MARGIN) * limit[i])) {
        return false;
      }
    }
    return true;
  }

  /**
   * @return the largest |p(s)| for s in [0, 1] of the cubic with p(0) = g0, p'(0) = d0, p(1) = g1,
   *     p'(1) = d1
   */
  static double maxAbsCubic(double g0, double d0, double g1, double d1) {
    double c2 = 3 * (g1 - g0) - 2 * d0 - d1;
    double c3 = 2 * (g0 - g1) + d0 + d1;
    double max = Math.max(Math.abs(g0), Math.abs(g1));
    // p'(s) = d0 + 2 c2 s + 3 c3 s^2
    double qa = 3 * c3;
    double qb = 2 * c2;
    if (qa == 0) {
      return qb == 0 ? max : Math.max(max, interior(g0, d0, c2, c3, -d0 / qb));
    }
    double disc = qb * qb - 4 * qa * d0;
    if (disc < 0) {
      return max;
    }
    double root = Math.sqrt(disc);
    max = Math.max(max, interior(g0, d0, c2, c3, (-qb + root) / (2 * qa)));
    return Math.max(max, interior(g0, d0, c2, c3, (-qb - root) / (2 * qa)));
  }

  /** @return |p(s)| for s strictly inside (0, 1), else 0 */
  private static double interior(double g0, double d0, double c2, double c3, double s) {
    return s > 0 && s < 1 ? Math.abs(g0 + s * (d0 + s * (c2 + s * c3))) : 0.0;
  }

  /** @return limited quantity i: h x + e u */
  private double value(int i, double[] x, double[] u) {
    return rowU.rowTimes(i, u, rowX.rowTimes(i, x, 0));
  }

  private static double[] row(DMatrixRMaj m, int i) {
    double[] r = new double[m.numCols];
    System.arraycopy(m.data, i * m.numCols, r, 0, m.numCols);
    return r;
  }

  private static double[] unit(int n, int i) {
    double[] r = new double[n];
    r[i] = 1;
    return r;
  }
}
