package org.flexmargin.notch;

import org.flexmargin.loop.NotchFilter;

/**
 * One designed notch, N(s) = (s^2 + 2 zeta_z w s + w^2)/(s^2 + 2 zeta_p w s + w^2), w = 2 pi f_c.
 *
 * @param centreHz f_c, Hz
 * @param numeratorDampingRatio zeta_z
 * @param denominatorDampingRatio zeta_p
 * @param depthDb attenuation at the centre, -20 log10(zeta_z/zeta_p), dB (positive)
 * @param minus3DbWidthHz the usual width: separation of the two -3 dB frequencies
 *     2 f_c sqrt(zeta_p^2 - 2 zeta_z^2), Hz ({@link NotchFilter#minus3DbWidthHz}; NaN if no deeper
 *     than 3 dB)
 * @param halfDepthWidthHz separation of the two frequencies where the attenuation is half the
 *     centre depth in dB, 2 f_c sqrt(zeta_z zeta_p), Hz ({@link NotchFilter#widthHz}; narrower)
 */
public record DesignedNotch(double centreHz, double numeratorDampingRatio, double denominatorDampingRatio,
    double depthDb, double minus3DbWidthHz, double halfDepthWidthHz) {
  /** @return the notch as a loop block */
  public NotchFilter filter() {
    return new NotchFilter(centreHz, numeratorDampingRatio, denominatorDampingRatio);
  }

  /** @return the record of a notch filter */
  public static DesignedNotch of(NotchFilter n) {
    return new DesignedNotch(n.centreFrequencyHz(), n.zeroDampingRatio(), n.poleDampingRatio(), -n.centreGainDb(),
        n.minus3DbWidthHz(), n.widthHz());
  }
}
