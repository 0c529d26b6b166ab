package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * The second-order actuator and low-pass refuse bad values with the value in the message (written
 * out only when refused), and the low-pass answers as the actuator of the same frequency and
 * damping: |H(j wn)| = 1 / (2 zeta) at the natural frequency.
 */
class ActuatorMessageTest {
  @Test
  void refusedValuesAreNamedWithTheirValue() {
    InvalidInputException f = assertThrows(InvalidInputException.class, () -> new SecondOrderActuator(-3.0, 0.7));
    assertEquals("second_order_actuator.natural_frequency_hz: expected a finite value > 0, found -3.0", f.getMessage());
    InvalidInputException z = assertThrows(InvalidInputException.class, () -> new SecondOrderActuator(12, Double.NaN));
    assertEquals("second_order_actuator.damping_ratio: expected a finite value > 0, found NaN", z.getMessage());
    assertThrows(InvalidInputException.class, () -> new SecondOrderActuator(Double.POSITIVE_INFINITY, 0.7));
    assertThrows(InvalidInputException.class, () -> new SecondOrderActuator(12, 0));
  }

  @Test
  void lowPassAtItsCutoff() {
    // H(s) = wn^2 / (s^2 + 2 zeta wn s + wn^2) at s = j wn: wn^2 / (2 zeta wn^2 j) = -j / (2 zeta)
    double[] h = new double[2];
    SecondOrderLowPass.butterworth(10).response(2 * Math.PI * 10, h);
    // Butterworth zeta = 1/sqrt(2): -j / sqrt(2); round-off of a few operations on O(1) numbers
    assertEquals(0, h[0], 1e-15);
    assertEquals(-Math.sqrt(0.5), h[1], 1e-15);
  }
}
