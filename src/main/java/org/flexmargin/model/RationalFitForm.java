package org.flexmargin.model;

/**
 * The form of a rational approximation of the generalized aerodynamic forces Q(p), p = s b / V.
 *
 * <p>Example: with n = 8 coordinates and 4 lag roots, {@link #ROGER} needs 4 x 8 = 32 aerodynamic
 * states; {@link #MINIMUM_STATE} with 16 lag roots has rank-one lag matrices and is fitted by
 * alternating least squares.
 */
public enum RationalFitForm {
  /**
   * Roger's form, A0 + A1 p + A2 p^2 + sum_l A_{l+2} p / (p + beta_l) with full lag matrices,
   * fitted element by element by linear least squares.
   */
  ROGER,
  /**
   * Karpel's minimum-state form, A0 + A1 p + A2 p^2 + D (p I - R)^-1 E p: rank-one lag matrices,
   * fitted by alternating least squares.
   */
  MINIMUM_STATE;

  /** @return the form's key in a case file: "roger" or "minimum_state" */
  public String word() {
    return this == ROGER ? "roger" : "minimum_state";
  }
}
