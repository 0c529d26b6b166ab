package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.complex.Complex;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * The bilinear transform and digital filters against closed forms (docs/validation.md, "Digital
 * filters and the bilinear transform").
 */
class DiscreteFilterTest {
  private static final double T = 1.0 / 80;

  /**
   * Tustin of the first-order lag a/(s + a): H(z) = (aT/2)(1 + z^-1) / ((1 + aT/2) - (1 - aT/2)
   * z^-1) (Franklin, Powell &amp; Workman, Digital Control of Dynamic Systems, 3rd ed., section
   * 6.3.1, Tustin's method; from memory, and derived by substitution). Tolerance 1e-14: a few
   * roundings of coefficients of order one.
   */
  @Test
  void tustinOfFirstOrderLagMatchesTheTextbookClosedForm() {
    double a = 10;
    double[][] ba = BilinearTransform.toDiscrete(new double[] {a}, new double[] {1, a}, T, 0);
    double d = 1 + a * T / 2;
    assertArrayEquals(new double[] {a * T / 2 / d, a * T / 2 / d}, ba[0], 1e-14);
    assertArrayEquals(new double[] {1, -(1 - a * T / 2) / d}, ba[1], 1e-14);
  }

  /**
   * Second-order notch pre-warped at its centre w: with c = w / tan(w T / 2) and D = c^2 + 2 zeta_p
   * w c + w^2, b = (c^2 + 2 zeta_z w c + w^2, 2 (w^2 - c^2), c^2 - 2 zeta_z w c + w^2) / D, a = (D,
   * 2 (w^2 - c^2), c^2 - 2 zeta_p w c + w^2) / D (derived: s = c (1 - z^-1)/(1 + z^-1) substituted
   * and multiplied by (1 + z^-1)^2). Tolerance 1e-13 relative to coefficients of order one.
   */
  @Test
  void prewarpedNotchCoefficientsMatchTheClosedForm() {
    NotchFilter n = new NotchFilter(18.6, 0.02, 0.3);
    double w = 2 * Math.PI * 18.6;
    DiscreteFilter d = NotchFilters.discrete(n, T);
    double c = w / Math.tan(w * T / 2);
    double den = c * c + 2 * 0.3 * w * c + w * w;
    assertArrayEquals(new double[] {(c * c + 2 * 0.02 * w * c + w * w) / den, 2 * (w * w - c * c) / den,
        (c * c - 2 * 0.02 * w * c + w * w) / den}, d.numerator(), 1e-13);
    assertArrayEquals(new double[] {1, 2 * (w * w - c * c) / den, (c * c - 2 * 0.3 * w * c + w * w) / den},
        d.denominator(), 1e-13);
  }

  /**
   * Pre-warping maps the notch centre exactly (Oppenheim &amp; Schafer, Discrete-Time Signal
   * Processing, section 7.1.2: the unit circle maps to w = c tan(W T / 2), equal to W at the
   * pre-warping frequency): at the centre the discrete notch has the continuous centre gain
   * zeta_z/zeta_p and zero phase. Tolerance 1e-12: cancellation in the numerator near its zero.
   */
  @Test
  void prewarpingKeepsTheCentreGainAndPhaseExactly() {
    for (double fc : new double[] {3.0, 7.4, 18.6, 30.0}) {
      NotchFilter n = new NotchFilter(fc, 0.05, 0.5);
      DiscreteFilter d = NotchFilters.discrete(n, T);
      double[] v = new double[2];
      d.response(2 * Math.PI * fc, v);
      assertEquals(0.1, Math.hypot(v[0], v[1]), 1e-12, "gain at the centre " + fc);
      assertEquals(0.0, Math.atan2(v[1], v[0]), 1e-11, "phase at the centre " + fc);
    }
    // without pre-warping the centre moves to (2/T) atan(w T / 2) (the same map, derived)
    NotchFilter n = new NotchFilter(30.0, 0.05, 0.5);
    DiscreteFilter plain = DiscreteFilter.bilinear(NotchFilters.transferFunction(n), T, 0);
    double w = 2 * Math.PI * 30;
    double moved = 2 / T * Math.atan(w * T / 2);
    double[] v = new double[2];
    plain.response(moved, v);
    assertEquals(0.1, Math.hypot(v[0], v[1]), 1e-12);
  }

  /** The response is H(z) at z = e^{j w T}, checked with Commons Math complex arithmetic. */
  @Test
  void responseIsTheDifferenceEquationOnTheUnitCircle() {
    DiscreteFilter d = new DiscreteFilter(new double[] {0.2, -0.1, 0.05}, new double[] {1.0, -0.6, 0.25}, T);
    for (double w : new double[] {0.5, 10, 100, 240}) {
      Complex zi = new Complex(Math.cos(-w * T), Math.sin(-w * T));
      Complex num = new Complex(0.2).add(zi.multiply(-0.1)).add(zi.multiply(zi).multiply(0.05));
      Complex den = new Complex(1.0).add(zi.multiply(-0.6)).add(zi.multiply(zi).multiply(0.25));
      Complex h = num.divide(den);
      double[] v = new double[2];
      d.response(w, v);
      assertEquals(h.getReal(), v[0], 1e-14);
      assertEquals(h.getImaginary(), v[1], 1e-14);
    }
  }

  /**
   * The inverse Tustin map undoes the plain Tustin map, and the continuous equivalent agrees with
   * the discrete response at w = (2/T) tan(W T / 2). Tolerance 1e-10: polynomial coefficients of
   * size up to (2/T)^2 = 25 600 and their cancellation.
   */
  @Test
  void continuousEquivalentInvertsTheTransform() {
    TransferFunctionBlock h = new TransferFunctionBlock(new double[] {1, 20, 900}, new double[] {1, 60, 900});
    DiscreteFilter d = DiscreteFilter.bilinear(h, T, 0);
    TransferFunctionBlock back = d.continuousEquivalent();
    double scale = back.denominator()[0];
    double[] num = back.numerator();
    double[] den = back.denominator();
    for (int i = 0; i < 3; i++) {
      assertEquals(h.numerator()[i], num[i] / scale, 1e-10 * Math.max(1, Math.abs(h.numerator()[i])));
      assertEquals(h.denominator()[i], den[i] / scale, 1e-10 * Math.max(1, Math.abs(h.denominator()[i])));
    }
    double bigW = 150;
    double[] vd = new double[2];
    double[] vc = new double[2];
    d.response(bigW, vd);
    back.response(2 / T * Math.tan(bigW * T / 2), vc);
    assertEquals(vc[0], vd[0], 1e-12);
    assertEquals(vc[1], vd[1], 1e-12);
  }

  @Test
  void badCoefficientsAreRefusedWithTheirField() {
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> new DiscreteFilter(new double[] {1}, new double[] {0, 1}, T));
    assertEquals("discrete.denominator", e.fieldPath());
    assertThrows(InvalidInputException.class,
        () -> BilinearTransform.toDiscrete(new double[] {1}, new double[] {1, 1}, T, Math.PI / T));
  }
}
