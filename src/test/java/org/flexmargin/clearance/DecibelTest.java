package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

class DecibelTest {
  @Test
  void tableMarginsAsGainFactors() {
    // docs/validation.md 10.1, derived from 20 log10: 3 dB = x1.4125, 4.5 dB = x1.6788,
    // 6 dB = x1.9953, 8 dB = x2.5119. The reference rounds to 4 decimals: tolerance 5e-5.
    assertEquals(1.4125, Decibel.toRatio(3), 5e-5);
    assertEquals(1.6788, Decibel.toRatio(4.5), 5e-5);
    assertEquals(1.9953, Decibel.toRatio(6), 5e-5);
    assertEquals(2.5119, Decibel.toRatio(8), 5e-5);
    // a gain-reduction margin of -6 dB is the factor 1/1.9953 = 0.50119
    assertEquals(1 / 1.9953, Decibel.toRatio(-6), 5e-5);
    // exact: 20 dB per decade
    assertEquals(10.0, Decibel.toRatio(20), 1e-14);
    assertEquals(-40.0, Decibel.fromRatio(0.01), 1e-12);
    // round trip to round-off (a few ulps of the values involved)
    for (double db : new double[] {-60, -6, 0, 4.5, 8, 40}) {
      assertEquals(db, Decibel.fromRatio(Decibel.toRatio(db)), 1e-12);
    }
  }

  @Test
  void refusesNonPositiveRatios() {
    assertThrows(InvalidInputException.class, () -> Decibel.fromRatio(0));
    assertThrows(InvalidInputException.class, () -> Decibel.fromRatio(-1));
    assertThrows(InvalidInputException.class, () -> Decibel.toRatio(Double.NaN));
  }
}
