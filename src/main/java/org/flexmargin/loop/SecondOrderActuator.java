package org.flexmargin.loop;

/**
 * Second-order actuator wn^2/(s^2 + 2 zeta wn s + wn^2) with unit static gain, wn = 2 pi f_n.
 *
 * @param naturalFrequencyHz f_n, Hz (&gt; 0)
 * @param dampingRatio zeta (&gt; 0)
 */
public record SecondOrderActuator(double naturalFrequencyHz, double dampingRatio)
    implements LinearBlock {
  /** Validates (cheaply: the low-pass filter makes one per frequency it is evaluated at). */
  public SecondOrderActuator {
    StateSpace.require(Double.isFinite(naturalFrequencyHz) && naturalFrequencyHz > 0,
        "second_order_actuator.natural_frequency_hz", "a finite value > 0",
        naturalFrequencyHz);
    StateSpace.require(Double.isFinite(dampingRatio) && dampingRatio > 0,
        "second_order_actuator.damping_ratio", "a finite value > 0",
        dampingRatio);
  }

  private double wn() {
    return 2 * Math.PI * naturalFrequencyHz;
  }

  @Override
  public StateSpace stateSpace() {
    double w = wn();
    return new TransferFunctionBlock(new double[] {w * w},
        new double[] {1, 2 * dampingRatio * w, w * w}).stateSpace();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double w = wn();
    double dr = w * w - omegaRadPerS * omegaRadPerS;
    double di = 2 * dampingRatio * w * omegaRadPerS;
    double den = dr * dr + di * di;
    reIm[0] = w * w * dr / den;
    reIm[1] = -w * w * di / den;
  }
}
