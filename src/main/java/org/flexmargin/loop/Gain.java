package org.flexmargin.loop;

/**
 * A static gain k (no states).
 *
 * @param gain finite gain k (dimensionless or in the units that link the connected signals)
 */
public record Gain(double gain) implements LinearBlock {
  /** Validates. */
  public Gain {
    StateSpace.require(Double.isFinite(gain), "gain.gain", "a finite gain", gain);
  }

  @Override
  public StateSpace stateSpace() {
    return StateSpace.staticGain(gain);
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    reIm[0] = gain;
    reIm[1] = 0.0;
  }
}
