package org.flexmargin.loop;

/**
 * Where a one-parameter family of broken loops L(j w; t) passes through the critical point:
 * solves 1 + L(j w; t) = 0 (two real equations) for the parameter t (e.g. a path parameter along
 * an airspeed sweep) and the frequency w, by Newton's method with a central-difference Jacobian.
 * At the solution the closed loop 1/(1 + L) has a pole exactly on the imaginary axis at j w: it is
 * the exact stability boundary of the family, independent of any rational approximation of L.
 *
 * <p>Steps are limited to a quarter of the allowed parameter range and 20 % of w; the iteration
 * stops when both the step and |1 + L| are small, and reports failure (no convergence, the
 * parameter leaving its range, a singular Jacobian) instead of a guess. Stateless.
 */
public final class CriticalPointSolver {
  /** |1 + L| accepted at convergence. */
  public static final double RESIDUAL_TOLERANCE = 1e-9;

  private static final double RELATIVE_OMEGA_STEP = 1e-6;
  private static final double OMEGA_TOLERANCE = 1e-10;

  private CriticalPointSolver() {}

  /** The family: the broken loop at parameter t. */
  @FunctionalInterface
  public interface Family {
    /**
     * @param parameter t
     * @return L(j w; t) as a frequency function (negative-feedback convention)
     */
    SisoFrequencyFunction at(double parameter);
  }

  /**
   * Result of the search.
   *
   * @param parameter t at the critical point (the last iterate when not converged)
   * @param omegaRadPerS w at the critical point, rad/s
   * @param residual |1 + L(j w; t)| at the returned point
   * @param iterations Newton iterations
   * @param converged true when the step and the residual met their tolerances
   * @param remark why the search failed, empty when it converged
   */
  public record Solution(double parameter, double omegaRadPerS, double residual, int iterations,
      boolean converged, String remark) {}

  /**
   * @param family L(j w; t)
   * @param parameter0 starting t (e.g. the onset of a rational model)
   * @param omega0RadPerS starting w, rad/s (&gt; 0)
   * @param parameterMin lowest allowed t
   * @param parameterMax highest allowed t (&gt; parameterMin)
   * @param parameterTolerance convergence tolerance on t
   * @param maxIterations iteration cap (&gt;= 1)
   * @return the critical point, or the reason none was found
   */
  public static Solution solve(Family family, double parameter0, double omega0RadPerS,
      double parameterMin, double parameterMax, double parameterTolerance, int maxIterations) {
    StateSpace.require(family != null, "critical_point.family", "a loop family", "null");
    StateSpace.require(Double.isFinite(omega0RadPerS) && omega0RadPerS > 0,
        "critical_point.omega0_rad_per_s", "a finite value > 0", String.valueOf(omega0RadPerS));
    StateSpace.require(parameterMax > parameterMin && parameter0 >= parameterMin
        && parameter0 <= parameterMax, "critical_point.parameter0", "a value in ["
        + parameterMin + ", " + parameterMax + "]", String.valueOf(parameter0));
    StateSpace.require(parameterTolerance > 0 && maxIterations >= 1,
        "critical_point.tolerance", "tolerance > 0 and at least one iteration",
        parameterTolerance + ", " + maxIterations);
    double range = parameterMax - parameterMin;
    double ht = Math.max(1e-7 * range, 1e-9);
    double t = parameter0;
    double w = omega0RadPerS;
    double[] v = new double[2];
    double[] r = residual(family.at(t), w, v);
    for (int it = 1; it <= maxIterations; it++) {
      double tLo = Math.max(parameterMin, t - ht);
      double tHi = Math.min(parameterMax, t + ht);
      double[] rtHi = residual(family.at(tHi), w, v);
      double[] rtLo = residual(family.at(tLo), w, v);
      SisoFrequencyFunction here = family.at(t);
      double hw = RELATIVE_OMEGA_STEP * w;
      double[] rwHi = residual(here, w + hw, v);
      double[] rwLo = residual(here, w - hw, v);
      double a11 = (rtHi[0] - rtLo[0]) / (tHi - tLo);
      double a21 = (rtHi[1] - rtLo[1]) / (tHi - tLo);
      double a12 = (rwHi[0] - rwLo[0]) / (2 * hw);
      double a22 = (rwHi[1] - rwLo[1]) / (2 * hw);
      double det = a11 * a22 - a12 * a21;
      if (!(Math.abs(det) > 1e-300) || !Double.isFinite(det)) {
        return new Solution(t, w, Math.hypot(r[0], r[1]), it, false,
            "the loop's critical-point equations are singular (the loop does not cross -1 here)");
      }
      double dt = -(a22 * r[0] - a12 * r[1]) / det;
      double dw = -(-a21 * r[0] + a11 * r[1]) / det;
      double scale = Math.max(1, Math.max(Math.abs(dt) / (0.25 * range),
          Math.abs(dw) / (0.2 * w)));
      dt /= scale;
      dw /= scale;
      double tNext = Math.min(parameterMax, Math.max(parameterMin, t + dt));
      boolean clamped = tNext != t + dt;
      t = tNext;
      w += dw;
      if (!(w > 0) || !Double.isFinite(w)) {
        return new Solution(t, w, Double.NaN, it, false,
            "the frequency of the critical point went to zero (no oscillatory crossing of -1)");
      }
      r = residual(family.at(t), w, v);
      double res = Math.hypot(r[0], r[1]);
      if (clamped && (t == parameterMin || t == parameterMax) && res > RESIDUAL_TOLERANCE) {
        if (Math.abs(dt) < parameterTolerance) {
          return new Solution(t, w, res, it, false,
              "the exact loop does not reach -1 inside the searched speed range");
        }
      }
      if (scale == 1 && Math.abs(dt) <= parameterTolerance && Math.abs(dw) <= OMEGA_TOLERANCE * w
          && res <= RESIDUAL_TOLERANCE) {
        return new Solution(t, w, res, it, true, "");
      }
      if (res <= RESIDUAL_TOLERANCE * 1e-3) {
        return new Solution(t, w, res, it, true, "");
      }
    }
    return new Solution(t, w, Math.hypot(r[0], r[1]), maxIterations, false,
        "Newton's method did not converge in " + maxIterations + " iterations");
  }

  private static double[] residual(SisoFrequencyFunction loop, double w, double[] v) {
    loop.response(w, v);
    return new double[] {1 + v[0], v[1]};
  }
}
