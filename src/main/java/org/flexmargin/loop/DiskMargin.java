package org.flexmargin.loop;

/**
 * Symmetric (sigma = 0) disk margin of a SISO loop (Seiler, Packard &amp; Gahinet, "An
 * introduction to disk margins", IEEE Control Systems Magazine 40(5):78-95, 2020).
 *
 * <p>The loop stays stable for every multiplicative perturbation L -&gt; f L with f in the disk
 * D(alpha) = {(1 + delta/2)/(1 - delta/2) : |delta| &lt; alpha}, where
 *
 * <pre>
 *   alpha = 1 / max_w |S - T| / 2 = 1 / max_w |(1 - L) / (2 (1 + L))|,
 *   S = 1/(1 + L), T = L/(1 + L)
 * </pre>
 *
 * (S - T = (1 - L)/(1 + L)). The disk crosses the real axis at the gains (2 - alpha)/(2 + alpha)
 * and (2 + alpha)/(2 - alpha) and guarantees simultaneous-free phase variations of +-2
 * atan(alpha/2). Meaningful only when the nominal closed loop is stable.
 *
 * @param alpha disk size (&gt;= 0; alpha &gt;= 2 means an unbounded gain-increase margin)
 * @param omegaRadPerS frequency of the maximum of |S - T|/2, rad/s (the critical frequency)
 * @param frequencyHz the same in Hz
 * @param gainLower (2 - alpha)/(2 + alpha), the smallest gain factor tolerated (0 if alpha &gt;= 2)
 * @param gainUpper (2 + alpha)/(2 - alpha), the largest gain factor (infinite if alpha &gt;= 2)
 * @param gainLowerDb 20 log10 gainLower, dB
 * @param gainUpperDb 20 log10 gainUpper, dB
 * @param phaseMarginDeg 2 atan(alpha/2), deg (both signs tolerated)
 */
public record DiskMargin(double alpha, double omegaRadPerS, double frequencyHz,
    double gainLower, double gainUpper, double gainLowerDb, double gainUpperDb,
    double phaseMarginDeg) {

  /**
   * @param alpha disk size (&gt;= 0)
   * @param omegaRadPerS critical frequency, rad/s
   * @return the margin with its implied gain interval and phase
   */
  public static DiskMargin ofAlpha(double alpha, double omegaRadPerS) {
    StateSpace.require(alpha >= 0 && !Double.isNaN(alpha), "disk_margin.alpha", ">= 0",
        String.valueOf(alpha));
    double lo = alpha >= 2 ? 0.0 : (2 - alpha) / (2 + alpha);
    double hi = alpha >= 2 ? Double.POSITIVE_INFINITY : (2 + alpha) / (2 - alpha);
    return new DiskMargin(alpha, omegaRadPerS, omegaRadPerS / (2 * Math.PI), lo, hi,
        20 * Math.log10(lo), 20 * Math.log10(hi), Math.toDegrees(2 * Math.atan(alpha / 2)));
  }

  /**
   * Disk size whose symmetric gain interval is [1/g, g] for g = 10^(gainDb/20): alpha = 2 (g -
   * 1)/(g + 1) (inverse of the upper intercept above).
   *
   * @param gainDb symmetric gain margin, dB (&gt; 0)
   * @return alpha
   */
  public static double alphaForSymmetricGainDb(double gainDb) {
    StateSpace.require(gainDb > 0 && Double.isFinite(gainDb), "disk_margin.gain_db",
        "a finite value > 0", String.valueOf(gainDb));
    double g = Math.pow(10, gainDb / 20);
    return 2 * (g - 1) / (g + 1);
  }
}
