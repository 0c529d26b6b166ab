package org.flexmargin.loop;

/**
 * Conversions of a {@link NotchFilter}: its transfer function, and the discrete-time second-order
 * section that flight software runs, by the bilinear transform pre-warped at the notch centre (so
 * that the discrete notch has exactly the continuous centre frequency and centre depth;
 * {@link BilinearTransform}). Stateless.
 */
public final class NotchFilters {
  private NotchFilters() {}

  /**
   * @param n a notch
   * @return (s^2 + 2 zeta_z w s + w^2) / (s^2 + 2 zeta_p w s + w^2), w = 2 pi f_c
   */
  public static TransferFunctionBlock transferFunction(NotchFilter n) {
    double w = 2 * Math.PI * n.centreFrequencyHz();
    return new TransferFunctionBlock(new double[] {1, 2 * n.zeroDampingRatio() * w, w * w},
        new double[] {1, 2 * n.poleDampingRatio() * w, w * w});
  }

  /**
   * @param n a notch whose centre lies below the Nyquist frequency 1/(2T)
   * @param samplePeriodS T, s (&gt; 0)
   * @return the discrete section b0 + b1 z^-1 + b2 z^-2 over 1 + a1 z^-1 + a2 z^-2, pre-warped at
   *     the centre
   */
  public static DiscreteFilter discrete(NotchFilter n, double samplePeriodS) {
    return DiscreteFilter.bilinear(transferFunction(n), samplePeriodS, 2 * Math.PI * n.centreFrequencyHz());
  }
}
