package org.flexmargin.loop;

/**
 * Sampled frequency response of a p-output, m-input system: G_ij(j w_k) for every frequency k,
 * output i and input j. Immutable (arrays are copied in and out).
 */
public final class FrequencyResponse {
  private final double[] omegaRadPerS;
  private final int outputs;
  private final int inputs;
  private final double[] re;
  private final double[] im;

  /**
   * @param omegaRadPerS frequencies, rad/s
   * @param outputs p
   * @param inputs m
   * @param re real parts, index (k p + i) m + j
   * @param im imaginary parts, same layout
   */
  public FrequencyResponse(double[] omegaRadPerS, int outputs, int inputs, double[] re,
      double[] im) {
    int size = omegaRadPerS.length * outputs * inputs;
    StateSpace.require(re.length == size && im.length == size, "frequency_response",
        size + " values", re.length + " and " + im.length);
    this.omegaRadPerS = omegaRadPerS.clone();
    this.outputs = outputs;
    this.inputs = inputs;
    this.re = re.clone();
    this.im = im.clone();
  }

  /** @return the frequencies, rad/s */
  public double[] omegaRadPerS() {
    return omegaRadPerS.clone();
  }

  /** @return number of frequencies */
  public int size() {
    return omegaRadPerS.length;
  }

  /** @return number of outputs p */
  public int outputCount() {
    return outputs;
  }

  /** @return number of inputs m */
  public int inputCount() {
    return inputs;
  }

  /**
   * @param k frequency index
   * @param output output index i
   * @param input input index j
   * @return Re G_ij(j w_k)
   */
  public double real(int k, int output, int input) {
    return re[(k * outputs + output) * inputs + input];
  }

  /**
   * @param k frequency index
   * @param output output index i
   * @param input input index j
   * @return Im G_ij(j w_k)
   */
  public double imag(int k, int output, int input) {
    return im[(k * outputs + output) * inputs + input];
  }

  /**
   * @param k frequency index
   * @param output output index
   * @param input input index
   * @return |G_ij(j w_k)|
   */
  public double magnitude(int k, int output, int input) {
    return Math.hypot(real(k, output, input), imag(k, output, input));
  }

  /**
   * @param k frequency index
   * @param output output index
   * @param input input index
   * @return arg G_ij(j w_k), rad, in (-pi, pi]
   */
  public double phaseRad(int k, int output, int input) {
    return Math.atan2(imag(k, output, input), real(k, output, input));
  }

  /** @return Re G(j w_k) of a SISO response, over all k */
  public double[] sisoReal() {
    requireSiso();
    return re.clone();
  }

  /** @return Im G(j w_k) of a SISO response, over all k */
  public double[] sisoImag() {
    requireSiso();
    return im.clone();
  }

  private void requireSiso() {
    StateSpace.require(outputs == 1 && inputs == 1, "frequency_response", "a SISO response",
        outputs + " x " + inputs);
  }
}
