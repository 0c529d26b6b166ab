package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.flexmargin.model.Coefficients;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.MeasuredTable;
import org.flexmargin.model.OpenLoopData;
import org.junit.jupiter.api.Test;

/**
 * Frequency functions built from others (products, tables, polynomials, discrete filters, the
 * digital effects of a loop file), checked against closed forms evaluated with Commons Math
 * complex arithmetic.
 */
class LoopFunctionsTest {

  private static Complex at(SisoFrequencyFunction f, double w) {
    double[] v = new double[2];
    f.response(w, v);
    return new Complex(v[0], v[1]);
  }

  /**
   * (1/(1 + 0.5 s)) e^{-0.2 s}: the product of a lag and a delay, evaluated directly as
   * exp(-0.2 j w)/(1 + 0.5 j w). Round-off only: 1e-14.
   */
  @Test
  void productOfAFunctionAndABlockIsTheComplexProduct() {
    FirstOrderLag lag = new FirstOrderLag(0.5);
    ResponseProduct p = new ResponseProduct(lag, new PureDelay(0.2, PadeOrder.ORDER_2));
    for (double w : new double[] {0.3, 2, 11}) {
      Complex ref = new Complex(0, -0.2 * w).exp().divide(new Complex(1, 0.5 * w));
      Complex got = at(p, w);
      assertEquals(ref.getReal(), got.getReal(), 1e-14);
      assertEquals(ref.getImaginary(), got.getImaginary(), 1e-14);
    }
    // a hold of T = 0.1 s counts T/2 = 0.05 s of delay, the block 0.2 s more
    ResponseProduct q = new ResponseProduct(new ZeroOrderHold(0.1, PadeOrder.ORDER_2),
        new PureDelay(0.2, PadeOrder.ORDER_2));
    assertEquals(0.25, q.pureDelayS(), 1e-15);
    // the lag's single pole -1/tau = -2, then the actuator's pair: three poles in that order
    ResponseProduct r = new ResponseProduct(lag, new SecondOrderActuator(10, 0.5));
    Eigenvalues poles = r.knownPoles();
    assertEquals(3, poles.size());
    assertEquals(-2, poles.realAt(0), 1e-12);
    assertThrows(InvalidInputException.class, () -> new ResponseProduct(null, lag));
    assertThrows(InvalidInputException.class, () -> new ResponseProduct(lag, null));
  }

  /** Concatenation keeps the order of both lists. */
  @Test
  void eigenvaluesConcatenate() {
    Eigenvalues a = new Eigenvalues(new double[] {-1}, new double[] {0});
    Eigenvalues b = new Eigenvalues(new double[] {-2, -2}, new double[] {3, -3});
    Eigenvalues ab = a.concat(b);
    assertArrayEquals(new double[] {-1, -2, -2}, ab.real(), 0.0);
    assertArrayEquals(new double[] {0, 3, -3}, ab.imag(), 0.0);
  }

  /**
   * Roots -1 +- 2j give s^2 + 2 s + 5; with the real root 3, (s - 3)(s^2 + 2 s + 5) = s^3 - s^2 - s
   * - 15 (expanded by hand).
   */
  @Test
  void polynomialsFromRootsAndTrimming() {
    assertArrayEquals(new double[] {1, 2, 5},
        Polynomials.fromRoots(new double[] {-1}, new double[] {2}, "p"), 0.0);
    assertArrayEquals(new double[] {1, -1, -1, -15},
        Polynomials.fromRoots(new double[] {3, -1}, new double[] {0, 2}, "p"), 0.0);
    assertThrows(InvalidInputException.class,
        () -> Polynomials.fromRoots(null, new double[0], "p"));
    assertThrows(InvalidInputException.class,
        () -> Polynomials.fromRoots(new double[0], null, "p"));
    assertThrows(InvalidInputException.class,
        () -> Polynomials.fromRoots(new double[1], new double[2], "p"));
    assertThrows(InvalidInputException.class,
        () -> Polynomials.fromRoots(new double[] {Double.NaN}, new double[1], "p"));
    assertThrows(InvalidInputException.class,
        () -> Polynomials.fromRoots(new double[1], new double[] {Double.POSITIVE_INFINITY}, "p"));
    // a leading value exactly at the tolerance (1e-13 x 1) is removed, one just above is kept
    assertArrayEquals(new double[] {1, 2}, Polynomials.trimLeading(new double[] {1e-13, 1, 2}, 1e-13), 0.0);
    assertArrayEquals(new double[] {2e-13, 1}, Polynomials.trimLeading(new double[] {2e-13, 1}, 1e-13), 0.0);
    // the tolerance is relative to the largest coefficient: 1e-13 <= 1e-13 x 4
    assertArrayEquals(new double[] {4}, Polynomials.trimLeading(new double[] {1e-13, 4}, 1e-13), 0.0);
    // all zero: one coefficient is kept
    assertArrayEquals(new double[] {0}, Polynomials.trimLeading(new double[] {0, 0, 0}, 1e-13), 0.0);
    assertArrayEquals(new double[] {3, 2, 1}, Polynomials.reversed(new double[] {1, 2, 3}), 0.0);
  }

  private static MeasuredResponse table() {
    return new MeasuredResponse(new MeasuredTable("t", new double[] {1, 2, 4},
        new double[] {0, -6, -12}, new double[] {-90, -120, -150}));
  }

  /**
   * A table is evaluated at its rows exactly, accepted a few ulps outside (1e-12 relative, the
   * documented allowance for grid end points) and unknown (NaN) beyond.
   */
  @Test
  void measuredTableEdges() {
    MeasuredResponse m = table();
    assertEquals(1.0, m.minFrequencyHz(), 0.0);
    assertEquals(4.0, m.maxFrequencyHz(), 0.0);
    assertEquals(3, m.size());
    assertEquals("MeasuredResponse[3 points, 1.0 to 4.0 Hz]", m.toString());
    // first row: 0 dB, -90 deg, i.e. -j
    Complex first = at(m, 2 * Math.PI);
    assertEquals(0, first.getReal(), 1e-15);
    assertEquals(-1, first.getImaginary(), 1e-15);
    Complex justBelow = at(m, 2 * Math.PI * (1 - 5e-13));
    assertEquals(-1, justBelow.getImaginary(), 1e-15);
    assertTrue(Double.isNaN(at(m, 2 * Math.PI * (1 - 2e-12)).getReal()));
    Complex justAbove = at(m, 2 * Math.PI * 4 * (1 + 5e-13));
    // -12 dB at -150 deg
    assertEquals(Math.pow(10, -12.0 / 20), justAbove.abs(), 1e-12);
    assertTrue(Double.isNaN(at(m, 2 * Math.PI * 4 * (1 + 2e-12)).getImaginary()));
    assertTrue(Double.isNaN(at(m, Double.NaN).getReal()));
    assertThrows(InvalidInputException.class, () -> new MeasuredResponse(null));
  }

  /** Tustin of 1/(s + 1): T = 0.1 s, plain, gives (b0 + b0 z^-1)/(1 + a1 z^-1) with b0 = T/(2 + T). */
  @Test
  void discreteFilterValueSemanticsAndContinuousFace() {
    TransferFunctionBlock lag = new TransferFunctionBlock(new double[] {1}, new double[] {1, 1});
    DiscreteFilter f = DiscreteFilter.bilinear(lag, 0.1, 0);
    DiscreteFilter g = DiscreteFilter.bilinear(lag, 0.1, 0);
    assertEquals(0.1 / 2.1, f.numerator()[0], 1e-15);
    assertEquals(f, g);
    assertEquals(f.hashCode(), g.hashCode());
    assertNotEquals(f, DiscreteFilter.bilinear(lag, 0.2, 0));
    assertNotEquals(f.hashCode(), DiscreteFilter.bilinear(lag, 0.2, 0).hashCode());
    assertNotEquals(f, new DiscreteFilter(f.numerator(), new double[] {1, 0}, 0.1));
    assertNotEquals(f, new DiscreteFilter(new double[] {1}, f.denominator(), 0.1));
    assertNotEquals(f, "a filter");
    assertEquals(new DiscreteFilter(new double[] {1, 2}, new double[] {1}, 0.5).toString(),
        "DiscreteFilter[[1.0, 2.0] / [1.0], T = 0.5 s]");
    // the inverse Tustin map returns the continuous pole s = -1
    Eigenvalues poles = f.stateSpace().eigenvalues();
    assertEquals(1, poles.size());
    assertEquals(-1, poles.realAt(0), 1e-12);
  }

  @Test
  void discreteFilterCoefficientsAreValidated() {
    assertThrows(InvalidInputException.class, () -> new DiscreteFilter(null, new double[] {1}, 0.1));
    assertThrows(InvalidInputException.class, () -> new DiscreteFilter(new double[0], new double[] {1}, 0.1));
    assertThrows(InvalidInputException.class, () -> new DiscreteFilter(new double[] {1}, null, 0.1));
    assertThrows(InvalidInputException.class, () -> new DiscreteFilter(new double[] {1}, new double[0], 0.1));
    assertThrows(InvalidInputException.class, () -> new DiscreteFilter(new double[] {1}, new double[] {0, 1}, 0.1));
    assertThrows(InvalidInputException.class,
        () -> new DiscreteFilter(new double[] {Double.NaN}, new double[] {1}, 0.1));
    assertThrows(InvalidInputException.class,
        () -> new DiscreteFilter(new double[] {1}, new double[] {1, Double.NaN}, 0.1));
    assertThrows(InvalidInputException.class, () -> new DiscreteFilter(new double[] {1}, new double[] {1}, 0));
    assertThrows(InvalidInputException.class,
        () -> new DiscreteFilter(new double[] {1}, new double[] {1}, Double.NaN));
    TransferFunctionBlock lag = new TransferFunctionBlock(new double[] {1}, new double[] {1, 1});
    assertThrows(InvalidInputException.class, () -> BilinearTransform.toDiscrete(lag.numerator(),
        lag.denominator(), 0, 0));
    assertThrows(InvalidInputException.class, () -> BilinearTransform.toDiscrete(lag.numerator(),
        lag.denominator(), 0.1, -1));
    // pre-warping exactly at the Nyquist frequency pi/T is refused
    assertThrows(InvalidInputException.class, () -> BilinearTransform.toDiscrete(lag.numerator(),
        lag.denominator(), 0.1, Math.PI / 0.1));
    assertThrows(InvalidInputException.class,
        () -> BilinearTransform.toContinuous(new double[] {1}, new double[] {1}, 0));
    // a pole at z = -1 has no proper continuous equivalent
    assertThrows(InvalidInputException.class,
        () -> BilinearTransform.toContinuous(new double[] {1}, new double[] {1, 1}, 0.1));
  }

  private static LoopFile file(double delayS, double samplePeriodS) {
    return new LoopFile("t", "", new OpenLoopData.TransferFunction(new Coefficients(new double[] {1},
        new double[] {1, 1})), delayS, samplePeriodS, 0.01, 10, List.of(), Double.NaN, 0, null,
        List.of(), List.of());
  }

  @Test
  void digitalEffectsOfALoopFile() {
    assertNull(OpenLoops.digitalEffects(file(0, 0), PadeOrder.ORDER_2));
    assertInstanceOf(ZeroOrderHold.class, OpenLoops.digitalEffects(file(0, 0.01), PadeOrder.ORDER_2));
    assertInstanceOf(PureDelay.class, OpenLoops.digitalEffects(file(0.02, 0), PadeOrder.ORDER_2));
    LinearBlock both = OpenLoops.digitalEffects(file(0.02, 0.01), PadeOrder.ORDER_2);
    assertInstanceOf(SeriesBlock.class, both);
    // T/2 of the hold plus the delay
    assertEquals(0.025, both.pureDelayS(), 1e-15);
    assertInstanceOf(TransferFunctionBlock.class, OpenLoops.modelLoop(file(0, 0), PadeOrder.ORDER_2));
  }

  /** A static gain has no states, hence no eigenvalues. */
  @Test
  void aStaticGainHasNoEigenvalues() {
    assertEquals(0, StateSpace.staticGain(2.5).eigenvalues().size());
  }
}
