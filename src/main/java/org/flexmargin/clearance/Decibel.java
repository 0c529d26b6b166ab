package org.flexmargin.clearance;

import org.flexmargin.model.InvalidInputException;

/**
 * Conversion between a gain ratio and decibels, dB = 20 log10(ratio) (amplitude ratio). Example:
 * 6 dB is a factor 10^(6/20) = 1.9953; -6 dB is 0.50119.
 */
public final class Decibel {
  private Decibel() {}

  /**
   * @param db gain in dB (finite)
   * @return the amplitude ratio 10^(db/20)
   */
  public static double toRatio(double db) {
    if (!Double.isFinite(db)) {
      throw new InvalidInputException("gain_db", "a finite number", String.valueOf(db));
    }
    return Math.pow(10, db / 20);
  }

  /**
   * @param ratio amplitude ratio (&gt; 0, finite)
   * @return 20 log10(ratio), dB
   */
  public static double fromRatio(double ratio) {
    if (!(ratio > 0) || !Double.isFinite(ratio)) {
      throw new InvalidInputException("gain_ratio", "a finite value > 0", String.valueOf(ratio));
    }
    return 20 * Math.log10(ratio);
  }
}
