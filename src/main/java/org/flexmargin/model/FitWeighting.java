package org.flexmargin.model;

/**
 * How the equations of a rational fit are weighted across the fitted reduced frequencies.
 *
 * <p>Example: an element with |Q(0.1 i)| = 2 and |Q(1.5 i)| = 20 m^2. {@link #UNIFORM} weights
 * both frequencies alike, so an error of 0.1 m^2 costs the same at either; {@link
 * #INVERSE_MAGNITUDE} divides each equation by the element's modulus there (floored at 5 % of its
 * largest), so the same 0.1 m^2 costs ten times more at k = 0.1, where it is a 5 % error.
 */
public enum FitWeighting {
  /** Every fitted reduced frequency alike (absolute error of each element). */
  UNIFORM,
  /** Each equation divided by |Q_ij(ik)| at its frequency (relative error at each frequency). */
  INVERSE_MAGNITUDE;

  /** @return the weighting's key in a case file: "uniform" or "inverse_magnitude" */
  public String word() {
    return this == UNIFORM ? "uniform" : "inverse_magnitude";
  }
}
