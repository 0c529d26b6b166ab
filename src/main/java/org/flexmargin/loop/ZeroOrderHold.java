package org.flexmargin.loop;

/**
 * Zero-order hold of a sampled-data channel with sample period T, seen from continuous time:
 *
 * <pre>
 *   ZOH(j w) = (1 - e^{-j w T}) / (j w T) = sinc(w T / 2) e^{-j w T/2},  sinc(x) = sin(x)/x
 * </pre>
 *
 * i.e. a delay of T/2 and the magnitude droop sinc(w T/2) (e.g. 0.9936 at 5 Hz and -0.77 dB at
 * 18.5 Hz with T = 1/80 s). The frequency response is exact. The state space is the same
 * function with e^{-sT} replaced by its [n/n] Padé approximation P(-sT)/P(sT) ({@link PadeOrder}):
 *
 * <pre>
 *   ZOH(s) ~ (1 - P(-x)/P(x)) / x = 2 (c_1 + c_3 x^2 + c_5 x^4 + ...) / P(x),   x = s T
 * </pre>
 *
 * (the even terms of P cancel), n states, unit static gain, strictly proper. Unlike a Padé
 * approximation of the T/2 delay alone it keeps the droop, so the closed-loop eigenvalues and the
 * exact broken loop describe the same hold (order 2: within 0.05 dB and 0.6 deg of the exact
 * hold up to w T = 1.5, see the tests). Computational delay (typically one frame) is a separate
 * {@link PureDelay}.
 *
 * @param samplePeriodS T, s (&gt; 0)
 * @param order Padé order of e^{-sT} in the state-space approximation (= its number of states)
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
    // 2 (c_1 + c_3 x^2 + ...)/P(x), x = s T, descending powers: index n - k holds x^k
    double[] c = order.coefficients();
    int n = order.degree();
    double[] num = new double[n + 1];
    for (int k = 1; k <= n; k += 2) {
      num[n - (k - 1)] = 2 * c[k];
    }
    return PureDelay.timeScaled(num, order.descendingCoefficients(), samplePeriodS);
  }

  /** @return T/2, s: the hold's phase is exactly -w T/2 between the zeros of its droop */
  @Override
  public double pureDelayS() {
    return samplePeriodS / 2;
  }

  /** @return none: the exact hold has no poles */
  @Override
  public Eigenvalues knownPoles() {
    return Eigenvalues.none();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double x = omegaRadPerS * samplePeriodS / 2;
    double sinc = x == 0 ? 1.0 : Math.sin(x) / x;
    reIm[0] = sinc * Math.cos(x);
    reIm[1] = -sinc * Math.sin(x);
  }
}
