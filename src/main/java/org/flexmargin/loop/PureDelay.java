package org.flexmargin.loop;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

/**
 * Pure time delay e^{-s tau}. The frequency response is exact, e^{-j w tau}; the state space is
 * the diagonal Padé approximation of the chosen order ({@link PadeOrder}), all-pass with phase
 * error that grows with w tau (about 0.08 deg at w tau = 1 for order 2; see the tests).
 *
 * <p>The realisation is built for tau = 1 in controllable canonical form and time-scaled
 * (A/tau, B/tau), so the companion coefficients stay O(1)-O(10^5) whatever tau is.
 *
 * @param delayS tau, s (&gt;= 0)
 * @param order Padé order of the state-space approximation
 */
public record PureDelay(double delayS, PadeOrder order) implements LinearBlock {
  /** Validates. */
  public PureDelay {
    StateSpace.require(Double.isFinite(delayS) && delayS >= 0, "delay.delay_s",
        "a finite value >= 0", String.valueOf(delayS));
    StateSpace.require(order != null, "delay.order", "a Padé order", "null");
  }

  @Override
  public StateSpace stateSpace() {
    return pade(delayS, order);
  }

  /** @return tau, s */
  @Override
  public double pureDelayS() {
    return delayS;
  }

  /** @return none: e^{-s tau} has no poles (those of the Padé realisation are not seeds) */
  @Override
  public Eigenvalues knownPoles() {
    return Eigenvalues.none();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    reIm[0] = Math.cos(omegaRadPerS * delayS);
    reIm[1] = -Math.sin(omegaRadPerS * delayS);
  }

  /** Padé realisation of e^{-s tau}; a unit static gain for tau = 0. */
  static StateSpace pade(double tau, PadeOrder order) {
    if (tau == 0) {
      return StateSpace.staticGain(1.0);
    }
    // P(-x)/P(x), x = s tau, descending powers: index n - k holds x^k
    double[] den = order.descendingCoefficients();
    double[] num = den.clone();
    for (int k = 1; k <= order.degree(); k += 2) {
      num[order.degree() - k] = -num[order.degree() - k];
    }
    return timeScaled(num, den, tau);
  }

  /**
   * Realisation of N(s tau)/D(s tau): controllable canonical form of N(x)/D(x) (descending powers
   * of x), time-scaled (A/tau, B/tau) so that the coefficients stay O(1) whatever tau is.
   */
  static StateSpace timeScaled(double[] num, double[] den, double tau) {
    StateSpace unit = StateSpace.fromTransferFunction(num, den);
    DMatrixRMaj a = unit.a();
    DMatrixRMaj b = unit.b();
    CommonOps_DDRM.scale(1.0 / tau, a);
    CommonOps_DDRM.scale(1.0 / tau, b);
    return StateSpace.of(a, b, unit.c(), unit.d());
  }
}
