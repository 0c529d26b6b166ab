package org.flexmargin.clearance;

/** Which side of the required value passes. */
public enum RequiredSense {
  /** Passes if achieved &gt;= required; excess = achieved - required. */
  AT_LEAST,
  /** Passes if achieved &lt;= required; excess = required - achieved. */
  AT_MOST
}
