package org.flexmargin.notch;

import org.flexmargin.loop.NotchFilter;

/**
 * One designed notch, N(s) = (s^2 + 2 zeta_z w s + w^2)/(s^2 + 2 zeta_p w s + w^2), w = 2 pi f_c.
 *
 * @param centreHz f_c, Hz
 * @param numeratorDampingRatio zeta_z
 * @param denominatorDampingRatio zeta_p
 * @param depthDb attenuation at the centre, -20 log10(zeta_z/zeta_p), dB (positive)
 * @param widthHz separation of the two half-depth frequencies 2 f_c sqrt(zeta_z zeta_p), Hz (the
 *     width of {@link NotchFilter})
 */
public record DesignedNotch(double centreHz, double numeratorDampingRatio, double denominatorDampingRatio,
    double depthDb, double widthHz) {
  /** @return the notch as a loop block */
  public NotchFilter filter() {
    return new NotchFilter(centreHz, numeratorDampingRatio, denominatorDampingRatio);
  }

  /** @return the record of a notch filter */
  public static DesignedNotch of(NotchFilter n) {
    return new DesignedNotch(n.centreFrequencyHz(), n.zeroDampingRatio(), n.poleDampingRatio(), -n.centreGainDb(),
        n.widthHz());
  }
}
