package org.flexmargin.model;

/**
 * Where the quasi-steady coupling of an elastic mode with the short period and the elevator comes
 * from. Example: the demo gives {@code wing_bending_1} its own coefficients ({@link #SUPPLIED});
 * its strips carry positions, so the modes it leaves out get coefficients summed over the strips
 * ({@link #STRIPS}); a force-table case without coefficients has {@link #NONE} (zero coupling,
 * stated in the results).
 */
public enum CouplingOrigin {
  /** Coefficients given by the user in {@code rigid_body.mode_coupling}. */
  SUPPLIED("supplied"),
  /** Computed by quasi-steady strip theory from the placed strips. */
  STRIPS("computed from strips"),
  /** Neither supplied nor computable: taken as zero. */
  NONE("zero (assumed)");

  private final String label;

  CouplingOrigin(String label) {
    this.label = label;
  }

  /** @return the words used in output and results */
  public String label() {
    return label;
  }
}
