package org.flexmargin.loop;

import java.util.List;
import org.flexmargin.model.InvalidInputException;

/**
 * Blocks in series, first to last: response = product of the responses, state space = series
 * connection of the state spaces (states in block order).
 *
 * @param blocks at least one block, applied in list order
 */
public record SeriesBlock(List<LinearBlock> blocks) implements LinearBlock {
  /** Validates and copies. */
  public SeriesBlock {
    if (blocks == null || blocks.isEmpty()) {
      // the found value is written out only on failure: a series is built for every loop path
      // at every sweep point, and the blocks' descriptions are long
      throw new InvalidInputException("series.blocks", "at least one block", String.valueOf(blocks));
    }
    for (LinearBlock b : blocks) {
      StateSpace.require(b != null, "series.blocks", "non-null blocks", "null");
    }
    blocks = List.copyOf(blocks);
  }

  /**
   * @param blocks blocks in signal-flow order
   * @return their series composition
   */
  public static SeriesBlock of(LinearBlock... blocks) {
    return new SeriesBlock(List.of(blocks));
  }

  @Override
  public StateSpace stateSpace() {
    StateSpace s = blocks.get(0).stateSpace();
    for (int i = 1; i < blocks.size(); i++) {
      s = s.series(blocks.get(i).stateSpace());
    }
    return s;
  }

  /** @return the sum of the blocks' delays, s */
  @Override
  public double pureDelayS() {
    double tau = 0;
    for (LinearBlock b : blocks) {
      tau += b.pureDelayS();
    }
    return tau;
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double pr = 1;
    double pi = 0;
    for (LinearBlock b : blocks) {
      b.response(omegaRadPerS, reIm);
      double t = pr * reIm[0] - pi * reIm[1];
      pi = pr * reIm[1] + pi * reIm[0];
      pr = t;
    }
    reIm[0] = pr;
    reIm[1] = pi;
  }
}
