package org.flexmargin.loop;

/**
 * Proportional-plus-integral control law kp + ki/s = (kp s + ki)/s.
 *
 * @param proportionalGain kp (finite)
 * @param integralGainPerS ki, 1/s (finite)
 */
public record ProportionalIntegral(double proportionalGain, double integralGainPerS)
    implements LinearBlock {
  /** Validates. */
  public ProportionalIntegral {
    StateSpace.require(Double.isFinite(proportionalGain),
        "proportional_integral.proportional_gain", "a finite gain",
        String.valueOf(proportionalGain));
    StateSpace.require(Double.isFinite(integralGainPerS),
        "proportional_integral.integral_gain_per_s", "a finite gain",
        String.valueOf(integralGainPerS));
  }

  @Override
  public StateSpace stateSpace() {
    return new TransferFunctionBlock(new double[] {proportionalGain, integralGainPerS},
        new double[] {1, 0}).stateSpace();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    reIm[0] = proportionalGain;
    reIm[1] = -integralGainPerS / omegaRadPerS;
  }
}
