package org.flexmargin.loop;

/**
 * An integrator k/s.
 *
 * @param gainPerS integral gain k, 1/s (finite, non-zero)
 */
public record Integrator(double gainPerS) implements LinearBlock {
  /** Validates. */
  public Integrator {
    StateSpace.require(Double.isFinite(gainPerS) && gainPerS != 0, "integrator.gain_per_s",
        "a finite non-zero gain", String.valueOf(gainPerS));
  }

  private TransferFunctionBlock tf() {
    return new TransferFunctionBlock(new double[] {gainPerS}, new double[] {1, 0});
  }

  @Override
  public StateSpace stateSpace() {
    return tf().stateSpace();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    reIm[0] = 0.0;
    reIm[1] = -gainPerS / omegaRadPerS;
  }
}
