package org.flexmargin.campaign;

import java.util.Arrays;

/**
 * Sample percentiles by linear interpolation between order statistics (Hyndman and Fan 1996,
 * definition 7; the default of R and of spreadsheet PERCENTILE): with the n values sorted,
 * h = (n - 1) p and the percentile is x[floor h] + (h - floor h)(x[floor h + 1] - x[floor h]).
 * Infinite values sort to their ends: +infinity (an onset beyond the sweep) last, -infinity (a margin
 * lost to an unstable closed loop) first; a percentile that reaches one of them is that infinity.
 */
public final class Percentiles {
  private Percentiles() {}

  /**
   * @param values the sample (NaN not allowed; infinities allowed), not changed
   * @param p probability in [0, 1]
   * @return the p-quantile, NaN for an empty sample
   */
  public static double of(double[] values, double p) {
    if (!(p >= 0 && p <= 1)) {
      throw new IllegalArgumentException("p must be in [0, 1], got " + p);
    }
    if (values.length == 0) {
      return Double.NaN;
    }
    double[] x = values.clone();
    Arrays.sort(x);
    double h = (x.length - 1) * p;
    int lo = (int) Math.floor(h);
    double frac = h - lo;
    if (frac == 0 || lo + 1 >= x.length) {
      return x[lo];
    }
    if (x[lo] == Double.NEGATIVE_INFINITY) {
      return Double.NEGATIVE_INFINITY;
    }
    if (x[lo + 1] == Double.POSITIVE_INFINITY) {
      return Double.POSITIVE_INFINITY;
    }
    return x[lo] + frac * (x[lo + 1] - x[lo]);
  }
}
