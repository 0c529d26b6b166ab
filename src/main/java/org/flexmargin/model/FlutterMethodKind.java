package org.flexmargin.model;

/** Which open-loop flutter solution method a sweep uses. */
public enum FlutterMethodKind {
  /**
   * p-k method (Hassig, J. Aircraft 8(11), 1971): true damping and frequency of each root at each
   * speed, aerodynamics evaluated at the root's own reduced frequency.
   */
  PK,
  /**
   * k method (V-g): artificial structural damping g needed for harmonic motion at each reduced
   * frequency; the damping is meaningful only where it crosses zero.
   */
  K,
  /**
   * State-space eigenvalues with the aerodynamics in Roger's rational form (aerodynamic lag
   * states): the model the closed loop uses, as a cross-check of p-k.
   */
  STATE_SPACE;

  /** @return the method's name in reports: "p-k", "k" or "state-space" */
  public String label() {
    return switch (this) {
      case PK -> "p-k";
      case K -> "k";
      case STATE_SPACE -> "state-space";
    };
  }
}
