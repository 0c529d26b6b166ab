package org.flexmargin.campaign;

/**
 * Verdict of one campaign sample. Only {@link #PASS} counts as cleared.
 *
 * <p>Example: a sample whose sweep found closed-loop flutter at 90 m/s EAS inside V_L = 115 m/s
 * is {@link #FAIL}; one that met every requirement but whose mode tracking stayed in doubt is
 * {@link #UNRELIABLE} (no clearance is claimed for it).
 */
public enum SampleStatus {
  /** Every requirement met, tracking trusted. */
  PASS,
  /** A requirement violated. */
  FAIL,
  /** No requirement violated, but mode tracking still in doubt: not cleared. */
  UNRELIABLE,
  /** The base case has no requirements table: results without a verdict, not cleared. */
  NOT_JUDGED,
  /** The sample could not be computed (bad perturbed input or numerical failure): not cleared. */
  ERROR
}
