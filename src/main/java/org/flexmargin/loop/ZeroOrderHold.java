package org.flexmargin.loop;

/**
 * Zero-order hold of a sampled-data channel with sample period T, seen from continuous time:
 *
 * <pre>
 *   ZOH(j w) = (1 - e^{-j w T}) / (j w T) = sinc(w T / 2) e^{-j w T/2},  sinc(x) = sin(x)/x
 * </pre>
 *
 * i.e. a delay of T/2 and the magnitude droop sinc(w T/2) (e.g. 0.9936 at 5 Hz with T = 1/80 s).
 * The frequency response is exact. <b>The state space approximates the hold by a Padé
 * approximation of the T/2 delay only</b>: its phase matches -w T/2 up to the Padé error but its
 * magnitude is 1 at every frequency, so the droop is omitted (small well below the Nyquist
 * frequency pi/T). Computational delay (typically one frame) is a separate {@link PureDelay}.
 *
 * @param samplePeriodS T, s (&gt; 0)
 * @param order Padé order of the state-space approximation of the T/2 delay
 */
public record ZeroOrderHold(double samplePeriodS, PadeOrder order) implements LinearBlock {
  /** Validates. */
  public ZeroOrderHold {
    StateSpace.require(Double.isFinite(samplePeriodS) && samplePeriodS > 0,
        "zero_order_hold.sample_period_s", "a finite value > 0", String.valueOf(samplePeriodS));
    StateSpace.require(order != null, "zero_order_hold.order", "a Padé order", "null");
  }

  @Override
  public StateSpace stateSpace() {
    return PureDelay.pade(samplePeriodS / 2, order);
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double x = omegaRadPerS * samplePeriodS / 2;
    double sinc = x == 0 ? 1.0 : Math.sin(x) / x;
    reIm[0] = sinc * Math.cos(x);
    reIm[1] = -sinc * Math.sin(x);
  }
}
