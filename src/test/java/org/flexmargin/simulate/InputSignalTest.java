package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/** Shapes of the input histories against their definitions. */
class InputSignalTest {

  @Test
  void oneMinusCosineGustPeaksAtTheGradientLength() {
    // definition (CS-25.341(a)): U/2 (1 - cos(pi x / H)), peak U at x = H, zero from x = 2 H on
    InputSignal g = new InputSignal.OneMinusCosineGust(10.0, 30.0, 120.0, 1.0);
    assertEquals(0.0, g.value(1.0), 0.0);
    assertEquals(10.0, g.value(1.0 + 30.0 / 120.0), 1e-12);
    assertEquals(5.0, g.value(1.0 + 15.0 / 120.0), 1e-12);
    assertEquals(0.0, g.value(1.0 + 60.0 / 120.0 + 1e-9), 0.0);
    assertEquals(1.5, g.endS(), 1e-12);
  }

  @Test
  void multistepHasItsThreeTwoOneOneSigns() {
    InputSignal m = new InputSignal.Multistep3211(2.0, 0.5, 0.1);
    double[] expected = {0, 2, 2, 2, -2, -2, 2, -2, 0};
    for (int k = 0; k < expected.length; k++) {
      // sample in the middle of each unit, starting one unit before the start
      assertEquals(expected[k], m.value(0.5 + (k - 1 + 0.5) * 0.1), 0.0, "unit " + k);
    }
    InputSignal d = new InputSignal.Doublet(1.0, 0.0, 0.3);
    assertEquals(1.0, d.value(0.1), 0.0);
    assertEquals(-1.0, d.value(0.4), 0.0);
    assertEquals(0.0, d.value(0.7), 0.0);
  }

  @Test
  void sweepFrequencyRisesExponentially() {
    // zero crossings of sin(phi): phi(t) = 2 pi f0 D (e^{t ln(f1/f0)/D} - 1) / ln(f1/f0), so the
    // time of the n-th crossing is D ln(1 + n ln(f1/f0) / (2 f0 D)) / ln(f1/f0)  (derived)
    double f0 = 0.5;
    double f1 = 20;
    double dur = 10;
    InputSignal s = new InputSignal.FrequencySweep(1.0, 0.0, dur, f0, f1);
    double r = Math.log(f1 / f0);
    for (int n = 1; n < 40; n += 7) {
      double t = dur * Math.log(1 + n * r / (2 * f0 * dur)) / r;
      assertEquals(0.0, s.value(t), 1e-9, "crossing " + n);
    }
    assertThrows(InvalidInputException.class, () -> new InputSignal.FrequencySweep(1.0, 0.0, dur, 5, 2));
  }
}
