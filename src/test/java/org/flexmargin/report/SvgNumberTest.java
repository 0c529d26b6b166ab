package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The SVG coordinate text against {@link BigDecimal} rounding of the exact binary value to three
 * decimals, half away from zero (HALF_UP in BigDecimal's words), trailing zeros stripped, plain
 * notation.
 */
class SvgNumberTest {
  /** BigDecimal's text of the same rounding; "-0" cannot arise from it but a rounded-away negative can. */
  private static String reference(double v) {
    BigDecimal r = new BigDecimal(v).setScale(SvgNumber.DECIMALS, RoundingMode.HALF_UP);
    return r.signum() == 0 ? "0" : r.stripTrailingZeros().toPlainString();
  }

  @Test
  void binaryFractionsMatchBigDecimal() {
    // k/64 and k/1024 are exact in binary and so is their product with 1000 (k * 15.625,
    // k * 0.9765625, below 2^53): no rounding happens before the rounding to three decimals,
    // and k/1024 includes exact ties at the fourth decimal (e.g. 0.0625 * 1000 = 62.5)
    for (int k = -200_000; k <= 200_000; k += 7) {
      double a = k / 64.0;
      double b = k / 1024.0;
      assertEquals(reference(a), SvgNumber.format(a), "k/64 with k=" + k);
      assertEquals(reference(b), SvgNumber.format(b), "k/1024 with k=" + k);
    }
  }

  @Test
  void randomValuesMatchBigDecimalAwayFromTies() {
    Random r = new Random(20261203L);
    int compared = 0;
    for (int i = 0; i < 200_000; i++) {
      double v = (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(13) - 4);
      double scaled = Math.abs(v) * 1000;
      // the product with 1000 is rounded to double (half an ulp) before the rounding to
      // thousandths: within a few ulps of a tie the two roundings may legitimately differ, so
      // those values are left out
      if (Math.abs(scaled - Math.floor(scaled) - 0.5) < 4 * Math.ulp(scaled)) {
        continue;
      }
      assertEquals(reference(v), SvgNumber.format(v), "v=" + v);
      compared++;
    }
    assertTrue(compared > 190_000, "almost all values compared: " + compared);
  }

  @Test
  void edgeCases() {
    assertEquals("0", SvgNumber.format(0.0));
    assertEquals("0", SvgNumber.format(-0.0), "no minus sign on zero");
    assertEquals("0", SvgNumber.format(-0.0004), "rounds to zero without a sign");
    assertEquals("-0.001", SvgNumber.format(-0.0005), "half away from zero");
    assertEquals("0.001", SvgNumber.format(0.0005));
    assertEquals("1100", SvgNumber.format(1100.0));
    assertEquals("0", SvgNumber.format(1e-7), "never in exponent notation");
    assertEquals("123456789.5", SvgNumber.format(123456789.5), "never in exponent notation");
    assertEquals("1000000000000", SvgNumber.format(SvgNumber.LIMIT), "largest writable value");
    assertEquals("-2.05", SvgNumber.format(-2.05));
    assertEquals("7.008", SvgNumber.format(7.008));
  }

  @Test
  void nonFiniteAndHugeValuesAreRefused() {
    for (double v : new double[] {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 2e12, -2e12}) {
      assertFalse(SvgNumber.writable(v), "not writable: " + v);
      assertThrows(IllegalArgumentException.class, () -> SvgNumber.format(v));
    }
    assertTrue(SvgNumber.writable(-SvgNumber.LIMIT));
  }
}
