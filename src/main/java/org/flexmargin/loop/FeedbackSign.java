package org.flexmargin.loop;

/**
 * Sign with which a feedback path is summed into the input of the forward path.
 *
 * <p>With forward path G and feedback path H, {@link #NEGATIVE} gives the closed loop
 * G/(1 + GH) (input e = r - H y) and {@link #POSITIVE} gives G/(1 - GH) (input e = r + H y).
 */
public enum FeedbackSign {
  /** e = r - H y; closed loop G/(1 + GH). The usual convention of loop-margin analysis. */
  NEGATIVE(-1.0),
  /** e = r + H y; closed loop G/(1 - GH). */
  POSITIVE(1.0);

  private final double factor;

  FeedbackSign(double factor) {
    this.factor = factor;
  }

  /** @return -1 for {@link #NEGATIVE}, +1 for {@link #POSITIVE} */
  public double factor() {
    return factor;
  }
}
