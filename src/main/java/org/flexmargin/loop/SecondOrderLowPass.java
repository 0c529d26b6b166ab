package org.flexmargin.loop;

/**
 * Second-order low-pass filter wc^2/(s^2 + 2 zeta wc s + wc^2), wc = 2 pi f_c, unit static gain.
 * With zeta = 1/sqrt(2) (Butterworth) |H(j wc)| = 1/sqrt(2) (-3.01 dB) and phase -90 deg at wc.
 *
 * @param cutoffFrequencyHz f_c, Hz (&gt; 0)
 * @param dampingRatio zeta (&gt; 0)
 */
public record SecondOrderLowPass(double cutoffFrequencyHz, double dampingRatio)
    implements LinearBlock {
  /** Validates. */
  public SecondOrderLowPass {
    StateSpace.require(Double.isFinite(cutoffFrequencyHz) && cutoffFrequencyHz > 0,
        "low_pass.cutoff_frequency_hz", "a finite value > 0", String.valueOf(cutoffFrequencyHz));
    StateSpace.require(Double.isFinite(dampingRatio) && dampingRatio > 0,
        "low_pass.damping_ratio", "a finite value > 0", String.valueOf(dampingRatio));
  }

  /**
   * @param cutoffFrequencyHz f_c, Hz
   * @return the second-order Butterworth low-pass (zeta = 1/sqrt(2))
   */
  public static SecondOrderLowPass butterworth(double cutoffFrequencyHz) {
    return new SecondOrderLowPass(cutoffFrequencyHz, Math.sqrt(0.5));
  }

  private SecondOrderActuator sameForm() {
    return new SecondOrderActuator(cutoffFrequencyHz, dampingRatio);
  }

  @Override
  public StateSpace stateSpace() {
    return sameForm().stateSpace();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    sameForm().response(omegaRadPerS, reIm);
  }
}
