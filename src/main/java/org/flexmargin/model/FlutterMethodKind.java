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
  K
}
