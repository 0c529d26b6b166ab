package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import java.util.List;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.flexmargin.loop.StateSpace;
import org.junit.jupiter.api.Test;

/**
 * Describing functions of saturation and of the rate limiter against their published formulas
 * and against the simulated nonlinear actuator; a rate-limited loop whose predicted limit cycle
 * is found in simulation.
 */
class DescribingFunctionsTest {

  @Test
  void saturationMatchesTheFirstHarmonicOfTheClippedSine() {
    // published formula (Gelb & Vander Velde 1968, ch. 2) against Commons Math Gauss-Legendre
    // quadrature of (1/(pi A)) int_0^{2pi} sat(A sin t) sin t dt, split at the clipping corners
    GaussIntegratorFactory f = new GaussIntegratorFactory();
    double a = 1.0;
    for (double amp : new double[] {1.2, 2.0, 5.0, 40.0}) {
      double corner = Math.asin(a / amp);
      double[] edges = {0, corner, Math.PI - corner, Math.PI};
      double sum = 0;
      for (int i = 0; i < 3; i++) {
        sum += f.legendre(30, edges[i], edges[i + 1])
            .integrate(t -> Math.max(-a, Math.min(a, amp * Math.sin(t))) * Math.sin(t));
      }
      double numeric = 2 * sum / (Math.PI * amp); // half-wave symmetry
      // tolerance: smooth pieces, 30-point rule exact to rounding
      assertEquals(numeric, DescribingFunctions.saturation(amp, a), 1e-13, "A = " + amp);
    }
    assertEquals(1.0, DescribingFunctions.saturation(0.5, a), 0.0);
  }

  @Test
  void rateLimiterInFullSaturationIsDudasTriangleFormula() {
    // Duda 1997 (J. Guidance, Control and Dynamics 20(3)): N = (4/pi) r e^{-j acos(pi r/2)} for
    // omega >= 1.862 omega_on (formula recalled from memory, consistent with the triangle-wave
    // derivation in the class comment); our integration over the two pieces must reproduce it
    for (double r : new double[] {0.05, 0.2, 0.4, 0.53}) {
      double[] n = DescribingFunctions.rateLimiter(r);
      double mag = 4 / Math.PI * r;
      double lag = Math.acos(Math.PI * r / 2);
      assertEquals(mag * Math.cos(lag), n[0], 1e-13, "re at r = " + r);
      assertEquals(-mag * Math.sin(lag), n[1], 1e-13, "im at r = " + r);
    }
    // continuity where the following segment vanishes (r = 0.537, omega = 1.862 omega_on)
    double r0 = DescribingFunctions.TRIANGLE_ONSET_RATIO;
    double[] below = DescribingFunctions.rateLimiter(r0 - 1e-9);
    double[] above = DescribingFunctions.rateLimiter(r0 + 1e-9);
    assertEquals(below[0], above[0], 1e-6);
    assertEquals(below[1], above[1], 1e-6);
    assertEquals(1.862, 1 / r0, 5e-4);
  }

  @Test
  void rateLimiterMatchesTheSimulatedActuator() {
    // A first-order actuator of 3000 rad/s with rate limit R driven by A sin(omega t): the first
    // harmonic of its simulated (Dormand-Prince) steady output against N. Tolerance 0.01: the
    // actuator's own lag (omega / 3000 = 0.002 rad) and its finite gain near the corners.
    double omega = 2 * Math.PI;
    double amp = 1.0;
    double w = 3000;
    StateSpace act = StateSpace.of(new double[][] {{-w}}, new double[][] {{w}},
        new double[][] {{1}, {0}}, new double[][] {{0}, {1}});
    for (double r : new double[] {0.3, 0.7, 0.9}) {
      double rate = r * amp * omega;
      LimitedActuatorSystem spec = new LimitedActuatorSystem(act, 0, -1, w, 0, 1, -1);
      double dt = 1e-3;
      int steps = 3000;
      LimitedActuatorSimulation.Result res = LimitedActuatorSimulation.run(spec,
          new ActuatorLimits(rate, Double.POSITIVE_INFINITY), dt, steps,
          List.of(t -> amp * Math.sin(omega * t)), null);
      double[] y = res.history().values()[0];
      // last full period (1 s = 1000 samples), trapezoid = exact for trigonometric sums of period
      double b1 = 0;
      double a1 = 0;
      for (int k = steps - 1000; k < steps; k++) {
        double t = k * dt;
        b1 += y[k] * Math.sin(omega * t) * dt * 2;
        a1 += y[k] * Math.cos(omega * t) * dt * 2;
      }
      double[] n = DescribingFunctions.rateLimiter(r);
      assertEquals(n[0], b1 / amp, 0.01, "re at r = " + r);
      assertEquals(n[1], a1 / amp, 0.01, "im at r = " + r);
      assertTrue(res.diagnostics().acceptedSteps() > 0);
    }
  }

  @Test
  void predictedLimitCycleIsTheThresholdSeenInSimulation() {
    // Loop: ideal rate limiter (first-order actuator of 2000 rad/s, rate limit R = 1) driving
    // G(s) = K / (s (s + 1)), K = 10, unity negative feedback: linearly stable for any K, but
    // harmonic balance predicts an oscillation (here about A = 0.58 at 2.73 rad/s, in the
    // partly-saturated regime). Such a cycle separates decaying from growing motion: simulated
    // from an initial error below it the loop settles, above it the oscillation grows. We bisect
    // the initial error to the threshold and measure the nearly sustained oscillation there:
    // frequency within 10 %, amplitude within 20 % of the prediction (the describing function
    // keeps only the first harmonic; common practice for its accuracy).
    double k = 10.0;
    double rate = 1.0;
    double w = 2000;
    List<RateLimitCycle.Prediction> predictions = RateLimitCycle.predict((om, reIm) -> {
      // L = K / (j om (1 + j om) (1 + j om / w))
      double[] f = mul(mul(new double[] {0, om}, new double[] {1, om}), new double[] {1, om / w});
      double den = f[0] * f[0] + f[1] * f[1];
      reIm[0] = k * f[0] / den;
      reIm[1] = -k * f[1] / den;
    }, rate, 0.05, 50, 400);
    assertEquals(1, predictions.size(), predictions.toString());
    RateLimitCycle.Prediction p = predictions.get(0);
    // states: y, y', delta; outputs: the limiter's input -y, and y
    StateSpace sys = StateSpace.of(new double[][] {{0, 1, 0}, {0, -1, k}, {-w, 0, -w}},
        new double[][] {{0}, {0}, {0}}, new double[][] {{-1, 0, 0}, {1, 0, 0}}, new double[][] {{0}, {0}});
    LimitedActuatorSystem spec = new LimitedActuatorSystem(sys, 2, -1, w, 0, 0, -1);
    ActuatorLimits limits = new ActuatorLimits(rate, Double.POSITIVE_INFINITY);
    double dt = 0.002;
    int steps = 6000;
    double lo = 0.2 * p.amplitude();
    double hi = 3 * p.amplitude();
    assertTrue(grows(spec, limits, dt, steps, hi) && !grows(spec, limits, dt, steps, lo), "bracket");
    for (int i = 0; i < 30; i++) {
      double mid = 0.5 * (lo + hi);
      if (grows(spec, limits, dt, steps, mid)) {
        hi = mid;
      } else {
        lo = mid;
      }
    }
    double[] y = LimitedActuatorSimulation.run(spec, limits, dt, steps, Collections.singletonList(null),
        new double[] {lo, 0, 0}).history().values()[1];
    // the near-threshold oscillation between 3 s and 12 s
    double max = 0;
    int crossings = 0;
    double first = Double.NaN;
    double last = Double.NaN;
    for (int i = 1500; i < steps; i++) {
      max = Math.max(max, Math.abs(y[i]));
      if (y[i] < 0 && y[i + 1] >= 0) {
        double t = (i + y[i] / (y[i] - y[i + 1])) * dt;
        if (crossings == 0) {
          first = t;
        }
        last = t;
        crossings++;
      }
    }
    assertTrue(crossings >= 3, "no sustained oscillation at the threshold: " + crossings + " crossings");
    double omegaSim = 2 * Math.PI * (crossings - 1) / (last - first);
    assertEquals(p.omegaRadPerS(), omegaSim, 0.10 * p.omegaRadPerS(), "frequency");
    assertEquals(p.amplitude(), max, 0.20 * p.amplitude(), "amplitude");
  }

  /** True if the motion from initial error y0 is larger over the last third than y0. */
  private static boolean grows(LimitedActuatorSystem spec, ActuatorLimits limits, double dt, int steps, double y0) {
    double[] y = LimitedActuatorSimulation.run(spec, limits, dt, steps, Collections.singletonList(null),
        new double[] {y0, 0, 0}).history().values()[1];
    double max = 0;
    for (int i = 2 * steps / 3; i <= steps; i++) {
      max = Math.max(max, Math.abs(y[i]));
    }
    return max > y0;
  }

  private static double[] mul(double[] x, double[] y) {
    return new double[] {x[0] * y[0] - x[1] * y[1], x[0] * y[1] + x[1] * y[0]};
  }
}
