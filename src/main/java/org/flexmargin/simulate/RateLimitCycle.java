package org.flexmargin.simulate;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.loop.SisoFrequencyFunction;

/**
 * Limit cycles predicted by the describing function of a rate limiter in a loop: with L(j omega)
 * the rest of the loop seen from the limiter (negative-feedback convention) and N the limiter's
 * describing function, an oscillation of amplitude A and frequency omega at the limiter's input
 * satisfies 1 + N(A, omega) L(j omega) = 0 (harmonic balance; e.g. Slotine &amp; Li, <i>Applied
 * Nonlinear Control</i>, ch. 5; for rate limiters Duda 1997, see {@link DescribingFunctions}).
 *
 * <p>N depends on A and omega only through r = R / (A omega), so for each omega the magnitude
 * condition |N(r)| = 1 / |L| fixes r (|N| rises from 0 to 1 with r), and the phase condition arg N
 * + arg L = -pi (mod 2 pi) is a scalar function of omega, scanned on a logarithmic grid and refined
 * by Brent's method. Predictions are approximate (the describing function keeps only the first
 * harmonic); the simulation confirms or refutes them. Stateless.
 */
public final class RateLimitCycle {
  private RateLimitCycle() {}

  /**
   * A predicted limit cycle.
   *
   * @param omegaRadPerS frequency (rad/s)
   * @param amplitude amplitude at the limiter's input (unit of the limited signal, e.g. rad)
   * @param onsetRatio r = R / (A omega)
   * @param loopMagnitude |L(j omega)|
   */
  public record Prediction(double omegaRadPerS, double amplitude, double onsetRatio, double loopMagnitude) {
    /** @return frequency (Hz) */
    public double frequencyHz() {
      return omegaRadPerS / (2 * Math.PI);
    }
  }

  /**
   * @param loop L(j omega), the loop seen from the limiter (not thread-safe functions are fine)
   * @param rateLimit R (unit of the limited signal per second)
   * @param minOmegaRadPerS low end of the scan (rad/s)
   * @param maxOmegaRadPerS high end of the scan (rad/s)
   * @param points grid points of the scan (&gt;= 2)
   * @return predictions, by increasing frequency (empty if none)
   */
  public static List<Prediction> predict(SisoFrequencyFunction loop, double rateLimit, double minOmegaRadPerS,
      double maxOmegaRadPerS, int points) {
    double[] reIm = new double[2];
    double[] omega = new double[points];
    double[] residual = new double[points];
    for (int i = 0; i < points; i++) {
      omega[i] = minOmegaRadPerS * Math.pow(maxOmegaRadPerS / minOmegaRadPerS, i / (points - 1.0));
      residual[i] = phaseResidual(loop, omega[i], reIm);
    }
    List<Prediction> out = new ArrayList<>();
    BrentSolver brent = new BrentSolver(1e-12, 1e-10);
    for (int i = 0; i + 1 < points; i++) {
      double fa = residual[i];
      double fb = residual[i + 1];
      if (Double.isNaN(fa) || Double.isNaN(fb) || fa * fb > 0 || Math.abs(fa - fb) > Math.PI / 2) {
        continue;
      }
      double w = brent.solve(200, x -> phaseResidual(loop, x, new double[2]), omega[i], omega[i + 1]);
      loop.response(w, reIm);
      double mag = Math.hypot(reIm[0], reIm[1]);
      double r = ratioForMagnitude(1 / mag);
      out.add(new Prediction(w, rateLimit / (r * w), r, mag));
    }
    return out;
  }

  /** wrap(arg N(r(omega)) + arg L + pi), NaN where |L| &lt;= 1 (no amplitude balances the gain). */
  private static double phaseResidual(SisoFrequencyFunction loop, double omega, double[] reIm) {
    loop.response(omega, reIm);
    double mag = Math.hypot(reIm[0], reIm[1]);
    if (!(mag > 1)) {
      return Double.NaN;
    }
    double[] n = DescribingFunctions.rateLimiter(ratioForMagnitude(1 / mag));
    double phase = Math.atan2(n[1], n[0]) + Math.atan2(reIm[1], reIm[0]) + Math.PI;
    return Math.IEEEremainder(phase, 2 * Math.PI);
  }

  /** r with |N(r)| = target, 0 &lt; target &lt; 1. */
  static double ratioForMagnitude(double target) {
    return new BrentSolver(1e-14, 1e-13).solve(300, r -> {
      double[] n = DescribingFunctions.rateLimiter(r);
      return Math.hypot(n[0], n[1]) - target;
    }, 1e-12, 1.0);
  }
}
