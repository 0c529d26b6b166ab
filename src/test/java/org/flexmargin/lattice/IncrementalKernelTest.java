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

  @Test
  void numeratorsAgreeWithKernelBuiltFromQuadrature() {
    // the kernel assembled from its definition (Rodden, Taylor and McIntosh, J. Aircraft 35(5),
    // 1998, as written in the IncrementalKernel class comment) with I1 and 3 I2 from Commons Math
    // Gauss-Legendre quadrature, against the fast evaluation (shared sums, one phase, the exact
    // sqrt(1 + u1^2) = (R - M x0) / (beta^2 r1)); points ahead of and behind the sending point
    // (u1 > 0 and u1 < 0), planar and non-planar, M = 0 and 0.6. Tolerance 2e-3: the 1e-3 of the
    // integrals above, times |T1| <= 1 and |T2*| <= 0.5 here
    double[] out = new double[24];
    double kbar = 1.2, yl = 0.6, cosDg = 0.8, sinDg = 0.6;
    for (double mach : new double[] {0, 0.6}) {
      for (double x0 : new double[] {-1.5, 0.4, 3}) {
        for (double zl : new double[] {0, 0.3}) {
          double beta2 = 1 - mach * mach;
          double r1 = Math.hypot(yl, zl);
          double r = Math.sqrt(x0 * x0 + beta2 * r1 * r1);
          double k1 = kbar * r1;
          double u1 = (mach * r - x0) / (beta2 * r1);
          double q = Math.sqrt(1 + u1 * u1);
          double[] i1 = quadrature(u1, k1, 1.5);
          double[] i2 = quadrature(u1, k1, 2.5);
          double er = Math.cos(k1 * u1), ei = -Math.sin(k1 * u1);
          double mr = mach * r1 / r;
          double k1r = -i1[0] - mr * er / q, k1i = -i1[1] - mr * ei / q;
          double a = k1 * mach * mach * r1 * r1 / (r * r * q);
          double b = mr * (q * q * beta2 * r1 * r1 / (r * r) + 2 + mach * r1 * u1 / r) / (q * q * q);
          double k2r = 3 * i2[0] - a * ei + b * er, k2i = 3 * i2[1] + a * er + b * ei;
          double xr = Math.cos(kbar * x0), xi = -Math.sin(kbar * x0);
          double t1 = cosDg, t2 = zl * (zl * cosDg - yl * sinDg);
          double p1r = (k1r * xr - k1i * xi - (-1 - x0 / r)) * t1;
          double p1i = (k1r * xi + k1i * xr) * t1;
          double k20 = 2 + x0 / r * (2 + beta2 * r1 * r1 / (r * r));
          double p2r = (k2r * xr - k2i * xi - k20) * t2;
          double p2i = (k2r * xi + k2i * xr) * t2;
          IncrementalKernel.evaluate(x0, yl, zl, cosDg, sinDg, kbar, mach, xr, xi, out);
          String at = "M " + mach + " x0 " + x0 + " z " + zl;
          assertEquals(p1r, out[0], 2e-3, "Re P1 " + at);
          assertEquals(p1i, out[1], 2e-3, "Im P1 " + at);
          assertEquals(p2r, out[2], 2e-3, "Re P2 " + at);
          assertEquals(p2i, out[3], 2e-3, "Im P2 " + at);
        }
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
    double[] out = new double[24];
    for (double mach : new double[] {0, 0.5, 0.85}) {
      for (double x0 : new double[] {-2, -0.1, 0.3, 5}) {
        IncrementalKernel.evaluate(x0, 0.7, 0.4, 0.9, Math.sqrt(1 - 0.81), 0, mach, 1, 0, out);
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
    double[] near = new double[24];
    double[] on = new double[24];
    double cs = Math.cos(1.3 * 0.8), sn = -Math.sin(1.3 * 0.8);
    IncrementalKernel.evaluate(0.8, 1e-7, 0, 1, 0, 1.3, 0.3, cs, sn, near);
    IncrementalKernel.evaluate(0.8, 0, 0, 1, 0, 1.3, 0.3, cs, sn, on);
    assertEquals(-2 * (Math.cos(1.3 * 0.8) - 1), on[0], 1e-15);
    assertEquals(2 * Math.sin(1.3 * 0.8), on[1], 1e-15);
    assertEquals(on[0], near[0], 1e-3);
    assertEquals(on[1], near[1], 1e-3);
  }
}
