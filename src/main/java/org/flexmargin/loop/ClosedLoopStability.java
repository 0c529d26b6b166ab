package org.flexmargin.loop;

/** Nominal closed-loop stability of 1/(1 + L), when it could be checked. */
public enum ClosedLoopStability {
  /** All eigenvalues of the unity negative-feedback state space have negative real part. */
  STABLE,
  /** At least one closed-loop eigenvalue has real part &gt;= 0. */
  UNSTABLE,
  /** Only a frequency function was given; stability was not checked. */
  NOT_CHECKED
}
