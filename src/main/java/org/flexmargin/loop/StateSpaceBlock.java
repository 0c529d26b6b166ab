package org.flexmargin.loop;

/**
 * A SISO {@link StateSpace} used as a block; its response is the state-space frequency response
 * (Hessenberg method). Thread-safe: every call uses its own small workspace.
 *
 * @param system a one-input one-output system
 */
public record StateSpaceBlock(StateSpace system) implements LinearBlock {
  /** Validates. */
  public StateSpaceBlock {
    StateSpace.require(system != null && system.isSiso(), "state_space_block.system",
        "a one-input one-output system", system == null ? "null"
            : system.outputCount() + " x " + system.inputCount());
  }

  @Override
  public StateSpace stateSpace() {
    return system;
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double[] re = new double[1];
    double[] im = new double[1];
    new FrequencyResponseEvaluator(system).evaluate(omegaRadPerS, re, im);
    reIm[0] = re[0];
    reIm[1] = im[0];
  }
}
