package org.flexmargin.loop;

import java.util.List;

/**
 * A SISO linear block of a control loop with two faces: an exact frequency function (used for
 * frequency responses and margins, so that pure delays and sample-and-hold are exact) and a
 * finite-dimensional state-space realisation (used for closed-loop eigenvalues, where a delay is
 * replaced by its Padé approximation). For rational blocks the two describe the same transfer
 * function; for {@link PureDelay} and {@link ZeroOrderHold} the state space is an approximation
 * documented by the block.
 */
public interface LinearBlock extends SisoFrequencyFunction {
  /** @return a one-input one-output state-space realisation */
  StateSpace stateSpace();

  /** @return the eigenvalues of the state space (grid seeds for margin searches) */
  @Override
  default Eigenvalues knownPoles() {
    return stateSpace().eigenvalues();
  }

  /**
   * Series composition: this block followed by {@code next}.
   *
   * @param next downstream block
   * @return the composition (product of responses, series of state spaces)
   */
  default LinearBlock then(LinearBlock next) {
    return new SeriesBlock(List.of(this, next));
  }
}
