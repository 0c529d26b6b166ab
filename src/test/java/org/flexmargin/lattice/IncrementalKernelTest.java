package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/** The kernel integrals against Commons Math quadrature and the kernel's steady limit. */
class IncrementalKernelTest {
  @Test
  void exponentialSumFollowsItsFunction() {
    // closed form 1 - u / sqrt(1 + u^2); the sum was fitted to it (docs/lifting-surfaces.md):
    // 2e-4 bounds the 1.2e-4 fit error with margin
    double worst = 0;
    for (double u = 0; u <= 2000; u += u < 10 ? 0.001 : 0.5) {
      double exact = 1 - u / Math.sqrt(1 + u * u);
      worst = Math.max(worst, Math.abs(IncrementalKernel.approximation(u) - exact));
    }
    assertTrue(worst < 2e-4, "largest error " + worst);
    assertEquals(1.0, IncrementalKernel.approximation(0), 1e-9, "exact at u = 0 by construction");
  }

  @Test
  void integralsAgreeWithGaussLegendreQuadrature() {
    // independent check: Commons Math Gauss-Legendre over [u1, u1 + 400] in unit pieces; the
    // tail beyond is below 1/(2 * 400^2) = 3e-6. Tolerance 1e-3: the 1.2e-4 error of the
    // exponential sum, integrated over about 1/p_1 = 55 in u and multiplied by k1 <= 3, stays
    // well inside it (observed 3e-4 at most)
    double[] out = new double[8];
    for (double u1 : new double[] {-3, -0.5, 0, 0.7, 4}) {
      for (double k1 : new double[] {0.1, 1, 3}) {
        IncrementalKernel.integrals(u1, k1, out);
        double[] i1 = quadrature(u1, k1, 1.5);
        double[] i2 = quadrature(u1, k1, 2.5);
        String at = "u1 " + u1 + " k1 " + k1;
        assertEquals(i1[0], out[0], 1e-3, "Re I1 " + at);
        assertEquals(i1[1], out[1], 1e-3, "Im I1 " + at);
        assertEquals(3 * i2[0], out[2], 1e-3, "Re 3I2 " + at);
        assertEquals(3 * i2[1], out[3], 1e-3, "Im 3I2 " + at);
      }
    }
  }

  private static double[] quadrature(double u1, double k1, double power) {
    IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(16, 1e-12, 1e-14);
    double re = 0, im = 0;
    for (double a = u1; a < u1 + 400; a += 1) {
      DoubleUnaryOperator m = u -> Math.pow(1 + u * u, -power);
      re += gl.integrate(100000, u -> Math.cos(k1 * u) * m.applyAsDouble(u), a, a + 1);
      im += gl.integrate(100000, u -> -Math.sin(k1 * u) * m.applyAsDouble(u), a, a + 1);
    }
    return new double[] {re, im};
  }

  @Test
  void incrementVanishesInSteadyFlow() {
    // closed form: at omega = 0, K1 = -1 - x0/R and K2 = 2 + (x0/R)(2 + beta^2 r1^2/R^2) exactly
    // (derivation in docs/lifting-surfaces.md), so both numerators are zero; 1e-12 is rounding
    double[] out = new double[8];
    for (double mach : new double[] {0, 0.5, 0.85}) {
      for (double x0 : new double[] {-2, -0.1, 0.3, 5}) {
        IncrementalKernel.evaluate(x0, 0.7, 0.4, 0.9, Math.sqrt(1 - 0.81), 0, mach, out);
        for (int c = 0; c < 4; c++) {
          assertEquals(0, out[c], 1e-12, "M " + mach + " x0 " + x0 + " component " + c);
        }
      }
    }
  }

  @Test
  void onTheSendingStreamlineOnlyTheWakeTermRemains() {
    // limit r1 -> 0 behind the line: K1 -> -2 (I1 -> integral over the whole line = 2), so
    // P1 = -2 (exp(-i w x0 / U) - 1); ahead of it P1 = 0. Compare a point at r1 = 1e-7 (the
    // general formula) with the limit; 1e-3 covers the O(r1 k) remainder and the exponential sum's error
    double[] near = new double[8];
    double[] on = new double[8];
    IncrementalKernel.evaluate(0.8, 1e-7, 0, 1, 0, 1.3, 0.3, near);
    IncrementalKernel.evaluate(0.8, 0, 0, 1, 0, 1.3, 0.3, on);
    assertEquals(-2 * (Math.cos(1.3 * 0.8) - 1), on[0], 1e-15);
    assertEquals(2 * Math.sin(1.3 * 0.8), on[1], 1e-15);
    assertEquals(on[0], near[0], 1e-3);
    assertEquals(on[1], near[1], 1e-3);
  }
}
