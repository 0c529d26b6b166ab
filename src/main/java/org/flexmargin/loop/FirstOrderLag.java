package org.flexmargin.loop;

/**
 * First-order lag 1/(tau s + 1) with unit static gain; phase -atan(w tau).
 *
 * @param timeConstantS tau, s (&gt; 0)
 */
public record FirstOrderLag(double timeConstantS) implements LinearBlock {
  /** Validates. */
  public FirstOrderLag {
    StateSpace.require(Double.isFinite(timeConstantS) && timeConstantS > 0,
        "first_order_lag.time_constant_s", "a finite value > 0", String.valueOf(timeConstantS));
  }

  /**
   * @param bandwidthRadPerS corner frequency 1/tau, rad/s (&gt; 0)
   * @return the lag
   */
  public static FirstOrderLag ofBandwidthRadPerS(double bandwidthRadPerS) {
    StateSpace.require(Double.isFinite(bandwidthRadPerS) && bandwidthRadPerS > 0,
        "first_order_lag.bandwidth_rad_per_s", "a finite value > 0",
        String.valueOf(bandwidthRadPerS));
    return new FirstOrderLag(1.0 / bandwidthRadPerS);
  }

  /**
   * @param bandwidthHz corner frequency 1/(2 pi tau), Hz (&gt; 0)
   * @return the lag
   */
  public static FirstOrderLag ofBandwidthHz(double bandwidthHz) {
    StateSpace.require(Double.isFinite(bandwidthHz) && bandwidthHz > 0,
        "first_order_lag.bandwidth_hz", "a finite value > 0", String.valueOf(bandwidthHz));
    return new FirstOrderLag(1.0 / (2 * Math.PI * bandwidthHz));
  }

  @Override
  public StateSpace stateSpace() {
    return new TransferFunctionBlock(new double[] {1}, new double[] {timeConstantS, 1})
        .stateSpace();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double x = omegaRadPerS * timeConstantS;
    double den = 1 + x * x;
    reIm[0] = 1 / den;
    reIm[1] = -x / den;
  }
}
