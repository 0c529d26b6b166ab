package org.flexmargin.report;

/**
 * Writes a coordinate of an SVG chart in plain decimal notation rounded to a thousandth of a
 * pixel (half away from zero), without trailing zeros, without a minus sign on zero and never in
 * exponent notation: 12.5, -0.125, 3, 1100.004. A thousandth of a pixel is far below anything a
 * screen or a printer shows, and the fixed-point arithmetic is fast and the same on every machine.
 */
final class SvgNumber {
  private SvgNumber() {}

  /** Fractional digits kept. */
  static final int DECIMALS = 3;
  /** 10^DECIMALS. */
  private static final long SCALE = 1000;
  /** Largest magnitude written (px); coordinates of a chart of a few thousand pixels are far below it. */
  static final double LIMIT = 1e12;

  /**
   * @param v a coordinate or length (px)
   * @return whether {@link #append} can write it: finite and of magnitude at most {@link #LIMIT}
   */
  static boolean writable(double v) {
    return Math.abs(v) <= LIMIT;
  }

  /**
   * Appends a value.
   *
   * @param out where to write
   * @param v value (px), {@link #writable} (not NaN, not infinite, at most {@link #LIMIT})
   * @return {@code out}
   * @throws IllegalArgumentException if {@code v} is not writable
   */
  static StringBuilder append(StringBuilder out, double v) {
    if (!writable(v)) {
      throw new IllegalArgumentException("coordinate out of range for a chart: " + v);
    }
    long scaled = Math.round(Math.abs(v) * SCALE);
    if (scaled != 0 && v < 0) {
      out.append('-');
    }
    out.append(scaled / SCALE);
    long frac = scaled % SCALE;
    if (frac != 0) {
      out.append('.');
      long digit = SCALE / 10;
      while (frac != 0) {
        out.append((char) ('0' + frac / digit));
        frac %= digit;
        digit /= 10;
      }
    }
    return out;
  }

  /**
   * @param v value (px), {@link #writable}
   * @return the text {@link #append} writes
   */
  static String format(double v) {
    return append(new StringBuilder(16), v).toString();
  }
}
