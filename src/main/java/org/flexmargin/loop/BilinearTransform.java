package org.flexmargin.loop;

/**
 * The bilinear (Tustin) transform between a continuous transfer function H(s) and a discrete one
 * H(z) at sample period T, with optional frequency pre-warping:
 *
 * <pre>
 *   s = c (1 - z^-1) / (1 + z^-1),   c = 2/T  (plain Tustin)   or   c = w0 / tan(w0 T / 2)
 * </pre>
 *
 * (Oppenheim &amp; Schafer, <i>Discrete-Time Signal Processing</i>, section 7.1.2; Franklin, Powell
 * &amp; Workman, <i>Digital Control of Dynamic Systems</i>, chapter 6). The unit circle z = e^{j W
 * T} maps onto the imaginary axis at w = c tan(W T / 2), so with pre-warping at w0 the discrete
 * filter has at w0 exactly the response the continuous one has at w0 (a notch keeps its centre and
 * its centre depth); other frequencies are compressed towards the Nyquist frequency pi/T.
 *
 * <p>Discrete coefficients are in ascending powers of z^-1, {@code {b0, b1, b2}} meaning b0 + b1
 * z^-1 + b2 z^-2, normalised so that a0 = 1 (the form flight software implements as the difference
 * equation y_k = b0 u_k + b1 u_{k-1} + b2 u_{k-2} - a1 y_{k-1} - a2 y_{k-2}). Continuous
 * coefficients are in descending powers of s, as in {@link TransferFunctionBlock}. Stateless.
 */
public final class BilinearTransform {
  private BilinearTransform() {}

  /**
   * Discrete numerator and denominator of a continuous transfer function.
   *
   * @param numerator continuous numerator, descending powers of s
   * @param denominator continuous denominator, descending powers of s (degree &gt;= numerator's)
   * @param samplePeriodS T, s (&gt; 0)
   * @param prewarpRadPerS w0, rad/s, where the responses agree exactly; 0 for plain Tustin (c =
   *     2/T, exact at w = 0 only); must lie below the Nyquist frequency pi/T
   * @return {b, a}: ascending powers of z^-1, a[0] = 1
   */
  public static double[][] toDiscrete(double[] numerator, double[] denominator, double samplePeriodS,
      double prewarpRadPerS) {
    new TransferFunctionBlock(numerator, denominator);
    StateSpace.require(Double.isFinite(samplePeriodS) && samplePeriodS > 0, "sample_period_s",
        "a finite value > 0", String.valueOf(samplePeriodS));
    StateSpace.require(Double.isFinite(prewarpRadPerS) && prewarpRadPerS >= 0
        && prewarpRadPerS * samplePeriodS < Math.PI, "prewarp_rad_per_s",
        "a frequency >= 0 below the Nyquist frequency " + Math.PI / samplePeriodS + " rad/s",
        String.valueOf(prewarpRadPerS));
    double c = prewarpRadPerS == 0 ? 2 / samplePeriodS
        : prewarpRadPerS / Math.tan(prewarpRadPerS * samplePeriodS / 2);
    int n = denominator.length - 1;
    double[] b = substitute(numerator, n, c);
    double[] a = substitute(denominator, n, c);
    StateSpace.require(a[0] != 0, "bilinear_transform", "a continuous denominator without a pole at s = -c",
        "a[0] = 0 (a pole at s = -" + c + " maps to z = infinity)");
    double a0 = a[0];
    for (int i = 0; i <= n; i++) {
      b[i] /= a0;
      a[i] /= a0;
    }
    return new double[][] {b, a};
  }

  /**
   * Sum over p_i c^(n-i') (1 - x)^(n-i') (1 + x)^(i') with i' the power of s of coefficient i,
   * i.e. the polynomial P(s) (1 + x)^n with s = c (1 - x)/(1 + x), ascending powers of x = z^-1.
   */
  private static double[] substitute(double[] p, int n, double c) {
    double[] out = new double[n + 1];
    int deg = p.length - 1;
    for (int i = 0; i < p.length; i++) {
      int power = deg - i;
      addBinomialProduct(p[i] * Math.pow(c, power), power, n, 1, out);
    }
    return out;
  }

  /**
   * Continuous equivalent of a discrete transfer function by the inverse plain Tustin map z^-1 =
   * (1 - s T/2)/(1 + s T/2): the two responses agree at w_c = (2/T) tan(W T/2) for the discrete
   * frequency W, and stable discrete poles map to stable continuous poles.
   *
   * @param b discrete numerator, ascending powers of z^-1
   * @param a discrete denominator, ascending powers of z^-1 (a0 != 0)
   * @param samplePeriodS T, s (&gt; 0)
   * @return {numerator, denominator} in descending powers of s
   */
  public static double[][] toContinuous(double[] b, double[] a, double samplePeriodS) {
    StateSpace.require(Double.isFinite(samplePeriodS) && samplePeriodS > 0, "sample_period_s",
        "a finite value > 0", String.valueOf(samplePeriodS));
    int n = Math.max(b.length, a.length) - 1;
    double k = samplePeriodS / 2;
    double[] num = new double[n + 1];
    double[] den = new double[n + 1];
    accumulate(b, n, k, num);
    accumulate(a, n, k, den);
    double[] numDesc = Polynomials.trimLeading(Polynomials.reversed(num), 1e-13);
    double[] denDesc = Polynomials.trimLeading(Polynomials.reversed(den), 1e-13);
    StateSpace.require(numDesc.length <= denDesc.length, "discrete_filter",
        "a filter without a pole at z = -1 (the Nyquist frequency), which has no proper continuous equivalent",
        "denominator " + java.util.Arrays.toString(a));
    return new double[][] {numDesc, denDesc};
  }

  /** Adds sum_k q_k (1 - k s)^k (1 + k s)^(n-k), ascending powers of s, to out. */
  private static void accumulate(double[] q, int n, double halfT, double[] out) {
    for (int i = 0; i < q.length; i++) {
      addBinomialProduct(q[i], i, n, halfT, out);
    }
  }

  /** Adds scale (1 - h x)^m (1 + h x)^(n-m), ascending powers of x, to out (length n + 1). */
  private static void addBinomialProduct(double scale, int m, int n, double h, double[] out) {
    double[] term = Polynomials.multiply(Polynomials.binomialPower(1, -h, m), Polynomials.binomialPower(1, h, n - m));
    for (int k = 0; k <= n; k++) {
      out[k] += scale * term[k];
    }
  }
}
