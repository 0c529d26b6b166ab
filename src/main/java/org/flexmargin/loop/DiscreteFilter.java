package org.flexmargin.loop;

import java.util.Arrays;

/**
 * A digital filter as the flight computer runs it: the discrete transfer function
 *
 * <pre>
 *   H(z) = (b0 + b1 z^-1 + ... + bn z^-n) / (a0 + a1 z^-1 + ... + am z^-m)
 * </pre>
 *
 * at sample period T. Its frequency response is evaluated exactly on the unit circle, z = e^{j w
 * T}, so the margins see the filter the software implements (its response repeats above the
 * Nyquist frequency pi/T like any sampled filter's; the zero-order hold of the loop is a separate
 * {@link ZeroOrderHold}). The state space (for closed-loop eigenvalues) is the continuous
 * equivalent by the inverse Tustin map ({@link BilinearTransform#toContinuous}), which agrees with
 * H(e^{j W T}) at w = (2/T) tan(W T / 2): like the Padé delay, an approximation for the
 * eigenvalue face only, close below a quarter of the sample rate.
 *
 * @param numerator b0..bn, ascending powers of z^-1 (at least one, finite)
 * @param denominator a0..am, ascending powers of z^-1 (a0 != 0, finite)
 * @param samplePeriodS T, s (&gt; 0)
 */
public record DiscreteFilter(double[] numerator, double[] denominator, double samplePeriodS)
    implements LinearBlock {

  /** Validates and copies. */
  public DiscreteFilter {
    StateSpace.require(numerator != null && numerator.length > 0, "discrete.numerator",
        "at least one coefficient", numerator == null ? "nothing" : "an empty list");
    StateSpace.require(denominator != null && denominator.length > 0 && denominator[0] != 0,
        "discrete.denominator", "coefficients with a0 != 0",
        denominator == null ? "nothing" : Arrays.toString(denominator));
    for (double v : numerator) {
      StateSpace.require(Double.isFinite(v), "discrete.numerator", "finite coefficients", v);
    }
    for (double v : denominator) {
      StateSpace.require(Double.isFinite(v), "discrete.denominator", "finite coefficients", v);
    }
    StateSpace.require(Double.isFinite(samplePeriodS) && samplePeriodS > 0, "sample_period_s",
        "a finite value > 0", samplePeriodS);
    numerator = numerator.clone();
    denominator = denominator.clone();
  }

  /**
   * The bilinear transform of a continuous filter, pre-warped at w0 ({@link
   * BilinearTransform#toDiscrete}).
   *
   * @param continuous the continuous filter
   * @param samplePeriodS T, s
   * @param prewarpRadPerS w0, rad/s (0: plain Tustin)
   * @return the discrete filter, a0 = 1
   */
  public static DiscreteFilter bilinear(TransferFunctionBlock continuous, double samplePeriodS,
      double prewarpRadPerS) {
    double[][] ba = BilinearTransform.toDiscrete(continuous.numerator(), continuous.denominator(),
        samplePeriodS, prewarpRadPerS);
    return new DiscreteFilter(ba[0], ba[1], samplePeriodS);
  }

  @Override
  public double[] numerator() {
    return numerator.clone();
  }

  @Override
  public double[] denominator() {
    return denominator.clone();
  }

  /** @return the continuous equivalent (inverse Tustin), the face used for eigenvalues */
  public TransferFunctionBlock continuousEquivalent() {
    double[][] c = BilinearTransform.toContinuous(numerator, denominator, samplePeriodS);
    return new TransferFunctionBlock(c[0], c[1]);
  }

  @Override
  public StateSpace stateSpace() {
    return continuousEquivalent().stateSpace();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double theta = omegaRadPerS * samplePeriodS;
    double nr = 0;
    double ni = 0;
    for (int k = 0; k < numerator.length; k++) {
      nr += numerator[k] * Math.cos(k * theta);
      ni -= numerator[k] * Math.sin(k * theta);
    }
    double dr = 0;
    double di = 0;
    for (int k = 0; k < denominator.length; k++) {
      dr += denominator[k] * Math.cos(k * theta);
      di -= denominator[k] * Math.sin(k * theta);
    }
    double den = dr * dr + di * di;
    reIm[0] = (nr * dr + ni * di) / den;
    reIm[1] = (ni * dr - nr * di) / den;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof DiscreteFilter d && Arrays.equals(numerator, d.numerator)
        && Arrays.equals(denominator, d.denominator) && samplePeriodS == d.samplePeriodS;
  }

  @Override
  public int hashCode() {
    return 31 * (31 * Arrays.hashCode(numerator) + Arrays.hashCode(denominator))
        + Double.hashCode(samplePeriodS);
  }

  @Override
  public String toString() {
    return "DiscreteFilter[" + Arrays.toString(numerator) + " / " + Arrays.toString(denominator)
        + ", T = " + samplePeriodS + " s]";
  }
}
