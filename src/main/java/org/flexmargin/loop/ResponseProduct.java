package org.flexmargin.loop;

/**
 * The product F(j w) B(j w) of a frequency function (for example a {@link MeasuredResponse}) and
 * a block in series with it (a delay, a zero-order hold, a filter not in the measurement). Its
 * pure delay is the sum of both, its known poles are the block's.
 *
 * @param function the frequency function F
 * @param block the block B
 */
public record ResponseProduct(SisoFrequencyFunction function, LinearBlock block)
    implements SisoFrequencyFunction {
  /** Validates. */
  public ResponseProduct {
    StateSpace.require(function != null && block != null, "response_product",
        "a frequency function and a block", "nothing");
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    function.response(omegaRadPerS, reIm);
    double ar = reIm[0];
    double ai = reIm[1];
    block.response(omegaRadPerS, reIm);
    double br = reIm[0];
    double bi = reIm[1];
    reIm[0] = ar * br - ai * bi;
    reIm[1] = ar * bi + ai * br;
  }

  @Override
  public double pureDelayS() {
    return function.pureDelayS() + block.pureDelayS();
  }

  @Override
  public Eigenvalues knownPoles() {
    return function.knownPoles().concat(block.knownPoles());
  }
}
