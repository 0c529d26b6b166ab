package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.junit.jupiter.api.Test;

/**
 * The reduced-frequency interpolant against closed forms and against the exact strip-theory
 * source it tabulates (docs/validation.md, "Reduced-frequency interpolant").
 */
class ReducedFrequencyInterpolantTest {

  /** A 1 x 1 source Q(ik) = f(k) (real), valid for every k. */
  private static AeroSource scalar(DoubleUnaryOperator f) {
    return new FunctionForces(1, 1.0, 0.0, Double.POSITIVE_INFINITY,
        (k, out) -> out.set(0, 0, f.applyAsDouble(k), 0.0), "test");
  }

  private static double at(AeroSource s, double k) {
    ZMatrixRMaj q = new ZMatrixRMaj(1, 1);
    s.forces(k, q);
    return q.getReal(0, 0);
  }

  @Test
  void midpointErrorOfTheApparentMassTermIsTheLagrangeRemainder() {
    // f(k) = k^2 = exp(2u), u = ln k. The cubic through the nodes at u_m + h (-3/2, -1/2, 1/2, 3/2)
    // has weights (-1/16, 9/16, 9/16, -1/16) at u_m, so the relative error there is exactly
    // 1 - (9/8 cosh h - 1/8 cosh 3h) = (3/8) h^4 + O(h^6) (derived; the h^4 term is Abramowitz and
    // Stegun, Handbook of Mathematical Functions, 25.2.14 with n = 3, f'''' = 16 f, t = 1/2).
    double h = 0.0125;
    ReducedFrequencyInterpolant q = new ReducedFrequencyInterpolant(scalar(k -> k * k), 1e-3, 10.0, h, 1e-6);
    double expected = 1 - (9.0 / 8 * Math.cosh(h) - 1.0 / 8 * Math.cosh(3 * h));
    assertEquals(0.375 * Math.pow(h, 4), expected, 1e-3 * expected, "series of the closed form");
    // tolerance: the computed error is a difference of O(1) numbers, rounding 1e-16 on 1e-8 is 1e-8
    // relative; 1e-4 leaves room for the midpoint's own rounding of exp and log
    assertEquals(expected, q.worstRelativeError(), 1e-4 * expected);
    assertEquals(0, q.exactIntervals());
    // and between nodes the error never exceeds the midpoint's (|(t+1)t(t-1)(t-2)| peaks at t = 1/2)
    Random random = new Random(7);
    for (int i = 0; i < 2000; i++) {
      double k = 1e-3 * Math.exp(random.nextDouble() * Math.log(1e4));
      double rel = Math.abs(at(q, k) - k * k) / (k * k);
      assertTrue(rel <= 1.01 * expected, () -> "k " + k + ": relative error " + rel);
    }
  }

  @Test
  void intervalsAcrossAKinkAreEvaluatedExactly() {
    // 1 + |k - 1| has a kink at k = 1 that no cubic follows: the intervals whose four nodes straddle
    // it fail the midpoint check and are evaluated exactly; the others keep the interpolation
    DoubleUnaryOperator kink = k -> 1 + Math.abs(k - 1);
    ReducedFrequencyInterpolant q = new ReducedFrequencyInterpolant(scalar(kink), 0.1, 10.0, 0.01, 1e-8);
    assertTrue(q.exactIntervals() >= 1 && q.exactIntervals() <= 3, "intervals near the kink: " + q.exactIntervals());
    assertEquals(kink.applyAsDouble(1.0001), at(q, 1.0001), 0.0, "exact beside the kink");
    assertEquals(kink.applyAsDouble(0.9999), at(q, 0.9999), 0.0, "exact beside the kink");
    // outside the interpolated range the exact source answers, bit for bit
    assertEquals(kink.applyAsDouble(0.05), at(q, 0.05), 0.0);
    assertEquals(kink.applyAsDouble(20.0), at(q, 20.0), 0.0);
    assertEquals(kink.applyAsDouble(0.0), at(q, 0.0), 0.0);
    // away from the kink the line k (= e^u, remainder about (3/128) h^4 relative, 2e-10 here) is
    // interpolated well inside the tolerance
    assertEquals(kink.applyAsDouble(3.3), at(q, 3.3), 1e-8 * 3.3);
  }

  @Test
  void stripTheoryOfATaperedWingFollowsTheExactSource() {
    // three strips of different semichord (three Theodorsen evaluations per k in the exact source),
    // heave and pitch coordinates; reference: StripTheoryAero itself (checked against Theodorsen,
    // NACA Report 496, in StripTheoryAeroTest)
    StripTheorySpec spec = new StripTheorySpec(0.45, List.of(
        new Strip("root", 1.0, 0.6, -0.3, 2 * Math.PI),
        new Strip("mid", 1.0, 0.45, -0.2, 5.8),
        new Strip("tip", 0.8, 0.3, -0.1, 5.2)));
    StripTheoryAero exact = new StripTheoryAero(spec, StripTheoryAeroTest.heavePitch("root", "mid", "tip"));
    double tol = 1e-8;
    ReducedFrequencyInterpolant q = new ReducedFrequencyInterpolant(exact, 1e-5, 20.0, 0.0125, tol);
    assertEquals(0, q.exactIntervals(), "Theodorsen's function is smooth for k > 0");
    assertTrue(q.worstRelativeError() < tol, "worst midpoint error " + q.worstRelativeError());
    ZMatrixRMaj a = new ZMatrixRMaj(2, 2);
    ZMatrixRMaj b = new ZMatrixRMaj(2, 2);
    Random random = new Random(11);
    double worst = 0;
    for (int i = 0; i < 3000; i++) {
      double k = 1e-5 * Math.exp(random.nextDouble() * Math.log(2e6));
      exact.forces(k, a);
      q.forces(k, b);
      double scale = 0;
      double err = 0;
      for (int e = 0; e < 8; e += 2) {
        scale = Math.max(scale, Math.hypot(a.data[e], a.data[e + 1]));
        err = Math.max(err, Math.hypot(a.data[e] - b.data[e], a.data[e + 1] - b.data[e + 1]));
      }
      worst = Math.max(worst, err / scale);
    }
    // tolerance: the midpoint is where the remainder's polynomial factor peaks, so random points
    // stay below the midpoint check's tolerance (factor 2 for the variation of f'''' in a stencil)
    assertTrue(worst < 2 * tol, "worst relative error at random k: " + worst);
  }

  @Test
  void refusesRangesOutsideTheSource() {
    AeroSource s = scalar(k -> k);
    assertThrows(IllegalArgumentException.class, () -> new ReducedFrequencyInterpolant(s, 0.0, 1.0, 0.01, 1e-8));
    assertThrows(IllegalArgumentException.class, () -> new ReducedFrequencyInterpolant(s, 1.0, 0.5, 0.01, 1e-8));
    assertThrows(IllegalArgumentException.class, () -> new ReducedFrequencyInterpolant(s, 0.1, 1.0, 0.0, 1e-8));
    assertThrows(IllegalArgumentException.class, () -> new ReducedFrequencyInterpolant(s, 0.1, 1.0, 0.01, 0.0));
  }
}
