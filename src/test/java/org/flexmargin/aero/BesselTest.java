package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;

/** Validation of {@link Bessel} against tables, quadrature, an identity and another library. */
class BesselTest {

  /**
   * Abramowitz &amp; Stegun, Handbook of Mathematical Functions (1964), Table 9.1, ten decimals;
   * values from memory. Tolerance 1e-10: the table rounds to 5e-11, plus margin.
   */
  @Test
  void matchesAbramowitzStegunTable91() {
    double[][] rows = {
      // x, J0, J1, Y0, Y1
      {1.0, 0.7651976866, 0.4400505857, 0.0882569642, -0.7812128213},
      {2.0, 0.2238907791, 0.5767248078, 0.5103756726, -0.1070324315},
      {5.0, -0.1775967713, -0.3275791376, -0.3085176252, 0.1478631434},
      {10.0, -0.2459357645, 0.0434727462, 0.0556711673, 0.2490154242},
    };
    for (double[] r : rows) {
      double x = r[0];
      assertEquals(r[1], Bessel.j0(x), 1e-10, "J0 at " + x);
      assertEquals(r[2], Bessel.j1(x), 1e-10, "J1 at " + x);
      assertEquals(r[3], Bessel.y0(x), 1e-10, "Y0 at " + x);
      assertEquals(r[4], Bessel.y1(x), 1e-10, "Y1 at " + x);
    }
  }

  /**
   * First zeros, Abramowitz &amp; Stegun Table 9.5 (values from memory, 16 significant digits).
   * At a simple zero |f(x0 + d)| is about |f'| d with |f'| &lt; 1 and d about 1 ulp (4e-16), so
   * 1e-14 leaves room for the function's own rounding error.
   */
  @Test
  void vanishesAtTabulatedFirstZeros() {
    assertEquals(0.0, Bessel.j0(2.404825557695773), 1e-14, "j_{0,1}");
    assertEquals(0.0, Bessel.j1(3.831705970207512), 1e-14, "j_{1,1}");
    assertEquals(0.0, Bessel.y0(0.8935769662791675), 1e-14, "y_{0,1}");
    assertEquals(0.0, Bessel.y1(2.197141326031017), 1e-14, "y_{1,1}");
  }

  /**
   * Independent evaluation by Commons Math Gauss-Legendre quadrature of the integral
   * representations A&amp;S 9.1.21 (Bessel's integral) and 9.1.22, on a grid that crosses both
   * switch-over arguments (2 and 25) of the implementation. The quadrature is converged to about
   * 1e-14 relative on each piece; 1e-11 absolute allows for the summation of up to 2000 pieces
   * (and stays below the 1e-10 of the tabulated checks).
   */
  @Test
  void matchesQuadratureOfIntegralRepresentations() {
    double[] xs = {
      1e-4, 1e-3, 0.01, 0.1, 0.3, 0.7, 1.0, 1.5, 1.99, 2.0, 2.01, 3.0, 4.5, 6.0, 8.5, 12.0, 16.0,
      20.0, 24.9, 25.0, 25.1, 33.0, 50.0, 75.0, 150.0, 400.0, 1000.0
    };
    for (double x : xs) {
      double[] jy = new double[2];
      for (int n = 0; n <= 1; n++) {
        Bessel.evaluate(n, x, jy);
        assertEquals(BesselQuadrature.j(n, x), jy[0], 1e-11, "J" + n + " at " + x);
        assertEquals(BesselQuadrature.y(n, x), jy[1], 1e-11, "Y" + n + " at " + x);
      }
    }
  }

  /**
   * Wronskian J1(x) Y0(x) - J0(x) Y1(x) = 2/(pi x), Abramowitz &amp; Stegun 9.1.16 (closed form),
   * on 600 logarithmically spaced arguments from 1e-4 to 1e3. Relative 1e-12: the products carry
   * a few ulps each and no cancellation greater than a factor of about ten.
   */
  @Test
  void satisfiesWronskian() {
    int count = 600;
    for (int i = 0; i <= count; i++) {
      double x = Math.pow(10.0, -4.0 + 7.0 * i / count);
      double wronskian = Bessel.j1(x) * Bessel.y0(x) - Bessel.j0(x) * Bessel.y1(x);
      double expected = 2.0 / (Math.PI * x);
      assertEquals(expected, wronskian, 1e-12 * expected, "Wronskian at " + x);
    }
  }

  /**
   * Against Commons Math 3.6.1 {@code BesselJ} (a port of W. J. Cody's RJBESL, an independent
   * implementation). Tolerance 1e-13 absolute: both are near double precision.
   */
  @Test
  void firstKindMatchesCommonsMath() {
    for (int i = 1; i <= 2000; i++) {
      double x = 0.05 * i * (1.0 + 0.001 * (i % 7)); // irregular spacing, 0.05 to 100
      assertEquals(BesselJ.value(0, x), Bessel.j0(x), 1e-13, "J0 at " + x);
      assertEquals(BesselJ.value(1, x), Bessel.j1(x), 1e-13, "J1 at " + x);
    }
  }

  /**
   * Leading terms of the ascending series A&amp;S 9.1.10, 9.1.13 and 9.1.11 (closed form): J0 ~ 1
   * - x^2/4, J1 ~ x/2, Y0 ~ (2/pi)(ln(x/2) + gamma), Y1 ~ -2/(pi x) + (x/pi)(ln(x/2) + gamma -
   * 1/2); at x = 1e-6 the neglected terms are below 1e-12 relative (Y0: x^2 ln x against ln x;
   * Y1: x^3 ln x against 1/x).
   */
  @Test
  void approachesSmallArgumentForms() {
    double x = 1e-6;
    assertEquals(1.0 - x * x / 4, Bessel.j0(x), 1e-15);
    assertEquals(x / 2, Bessel.j1(x), 1e-12 * x / 2);
    double y0 = (2 / Math.PI) * (Math.log(x / 2) + Bessel.EULER_GAMMA);
    assertEquals(y0, Bessel.y0(x), 1e-12 * Math.abs(y0));
    double y1 = -2 / (Math.PI * x) + (x / Math.PI) * (Math.log(x / 2) + Bessel.EULER_GAMMA - 0.5);
    assertEquals(y1, Bessel.y1(x), 1e-12 * Math.abs(y1));
  }

  /** The pieces of the implementation join without a step (regression guard; 1e-14 absolute). */
  @Test
  void continuousAcrossMethodSwitchOvers() {
    for (double edge : new double[] {2.0, 25.0}) {
      double below = Math.nextDown(edge);
      double above = Math.nextUp(edge);
      for (int n = 0; n <= 1; n++) {
        double[] lo = new double[2];
        double[] hi = new double[2];
        Bessel.evaluate(n, below, lo);
        Bessel.evaluate(n, above, hi);
        assertEquals(lo[0], hi[0], 1e-14, "J" + n + " across " + edge);
        assertEquals(lo[1], hi[1], 1e-14, "Y" + n + " across " + edge);
      }
    }
  }

  @Test
  void handlesSpecialArguments() {
    assertEquals(1.0, Bessel.j0(0.0));
    assertEquals(0.0, Bessel.j1(0.0));
    assertEquals(Double.NEGATIVE_INFINITY, Bessel.y0(0.0));
    assertEquals(Double.NEGATIVE_INFINITY, Bessel.y1(0.0));
    assertEquals(0.0, Bessel.y1(Double.POSITIVE_INFINITY));
    assertTrue(Double.isNaN(Bessel.y0(Double.NaN)));
    assertThrows(IllegalArgumentException.class, () -> Bessel.y0(-1.0));
    assertThrows(IllegalArgumentException.class, () -> Bessel.evaluate(2, 1.0, new double[2]));
    assertThrows(IllegalArgumentException.class, () -> Bessel.evaluate(0, 1.0, new double[1]));
  }
}
