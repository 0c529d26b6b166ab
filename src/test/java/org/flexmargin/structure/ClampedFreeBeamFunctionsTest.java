package org.flexmargin.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

class ClampedFreeBeamFunctionsTest {

  @Test
  void rootsMatchHandbookValues() {
    // Blevins, Formulas for Natural Frequency and Mode Shape, table 8-1, clamped-free beam
    // lambda_i = beta_i L; values from memory. The tabulated values carry 9 significant digits,
    // so 1e-8 absolute is the rounding of the table, not of the solver.
    assertEquals(1.87510407, ClampedFreeBeamFunctions.rootBetaL(1), 1e-8);
    assertEquals(4.69409113, ClampedFreeBeamFunctions.rootBetaL(2), 1e-8);
    assertEquals(7.85475744, ClampedFreeBeamFunctions.rootBetaL(3), 1e-8);
    assertEquals(10.99554073, ClampedFreeBeamFunctions.rootBetaL(4), 1e-8);
  }

  @Test
  void highRootsApproachTheAsymptote() {
    // closed-form asymptote: with x0 = (2n-1) pi/2 (Blevins table 8-1, "(2i-1) pi/2 for
    // i > 5", from memory), cos(x0 + d) = -(-1)^(n+1) d and 1/cosh x0 = 2 e^-x0, so
    // d = (-1)^(n+1) 2 e^-x0 + O(e^-2x0). For n >= 6, e^-2x0 < 1e-14, so 1e-12 absolute is
    // rounding of a value up to ~124.
    for (int n = 6; n <= 40; n++) {
      double x0 = (2 * n - 1) * Math.PI / 2;
      double d = (n % 2 == 1 ? 2 : -2) * Math.exp(-x0);
      assertEquals(x0 + d, ClampedFreeBeamFunctions.rootBetaL(n), 1e-12, "n=" + n);
    }
  }

  @Test
  void boundaryConditionsAndTipValue() {
    // closed form: clamped root phi(0) = phi'(0) = 0, free tip phi''(L) = 0, and with this
    // normalisation |phi(L)| = 2 (Blevins table 8-1). Tolerance 1e-10 relative to the function
    // scale (1 for phi, beta for phi', beta^2 for phi'') covers rounding of the stable form.
    double length = 3.0;
    ClampedFreeBeamFunctions f = new ClampedFreeBeamFunctions(length, 30);
    for (int n = 0; n < 30; n++) {
      double b = f.betaPerM(n);
      assertEquals(0.0, f.value(n, 0.0), 1e-10, "phi(0) n=" + n);
      assertEquals(0.0, f.slope(n, 0.0) / b, 1e-10, "phi'(0) n=" + n);
      assertEquals(0.0, f.curvature(n, length) / (b * b), 1e-10, "phi''(L) n=" + n);
      assertEquals(2.0, Math.abs(f.value(n, length)), 1e-10, "|phi(L)| n=" + n);
    }
  }

  @Test
  void functionsAreOrthogonalUnderAnIndependentIntegrator() {
    // closed form (Blevins table 8-1 normalisation): int_0^L phi_m phi_n dy = L delta_mn and
    // int_0^L phi_m'' phi_n'' dy = beta_n^4 L delta_mn. Integrated here with Commons Math's
    // adaptive Gauss-Legendre integrator, independent of the fixed composite rule of the main
    // code. Tolerance 1e-9 relative: the integrator is asked for 1e-12.
    double length = 2.0;
    int count = 8;
    ClampedFreeBeamFunctions f = new ClampedFreeBeamFunctions(length, count);
    // absolute accuracy requested: 1e-12 of each integral's scale (off-diagonal ones are ~0)
    IterativeLegendreGaussIntegrator massIntegrator =
        new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-12 * length);
    for (int m = 0; m < count; m++) {
      for (int n = m; n < count; n++) {
        final int mm = m;
        final int nn = n;
        double mass = massIntegrator.integrate(1_000_000, y -> f.value(mm, y) * f.value(nn, y), 0, length);
        double b4 = Math.pow(f.betaPerM(n), 4);
        double scale = Math.sqrt(Math.pow(f.betaPerM(m), 4) * b4) * length;
        IterativeLegendreGaussIntegrator stiffIntegrator =
            new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-12 * scale);
        double stiff =
            stiffIntegrator.integrate(
                1_000_000, y -> f.curvature(mm, y) * f.curvature(nn, y), 0, length);
        assertEquals(m == n ? length : 0.0, mass, 1e-9 * length, "mass m=" + m + " n=" + n);
        assertEquals(m == n ? b4 * length : 0.0, stiff, 1e-9 * scale, "stiff m=" + m + " n=" + n);
      }
    }
  }

  @Test
  void slopeAndCurvatureAreDerivatives() {
    // independent check of the hand-derived derivative formulas: central differences of the
    // function values, h = 1e-5 L; truncation O(h^2 beta^3) and rounding O(eps/h) stay below 1e-6
    // relative to beta resp. beta^2 for the first five functions.
    double length = 1.5;
    ClampedFreeBeamFunctions f = new ClampedFreeBeamFunctions(length, 5);
    double h = 1e-5 * length;
    for (int n = 0; n < 5; n++) {
      double b = f.betaPerM(n);
      for (double y = 0.1; y < length - 0.05; y += 0.17) {
        double d1 = (f.value(n, y + h) - f.value(n, y - h)) / (2 * h);
        assertEquals(d1, f.slope(n, y), 1e-6 * b);
        double d2 = (f.slope(n, y + h) - f.slope(n, y - h)) / (2 * h);
        assertEquals(d2, f.curvature(n, y), 1e-6 * b * b);
      }
    }
    assertTrue(f.count() == 5);
  }
}
