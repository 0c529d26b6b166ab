package org.flexmargin.model;

/**
 * One configuration of the aircraft (a fuel or payload state): its structure and aerodynamics.
 *
 * @param name unique configuration name
 * @param structure mode table or built-in validation structure
 * @param aero aerodynamic data; {@code null} only for built-in structures, which carry their own
 *     strip geometry
 * @param rigidBody rigid-body short-period data with the modes' coupling; {@code null} for an
 *     open-loop (flutter and divergence only) analysis
 */
public record Configuration(String name, StructureSpec structure, AeroSpec aero, RigidBody rigidBody) {
  /** Validates that a mode-table structure has aerodynamic data. */
  public Configuration {
    Checks.name("name", name);
    if (structure == null) {
      throw new InvalidInputException("structure", "a mode table or a built-in structure", "nothing");
    }
    if (structure instanceof ModeTable && aero == null) {
      throw new InvalidInputException("aero", "strip theory or a force table for a mode table", "nothing");
    }
    if (!(structure instanceof ModeTable) && aero != null) {
      throw new InvalidInputException(
          "aero", "no aero section (built-in structures carry their own strips)", "an aero section");
    }
    if (rigidBody != null && structure instanceof ModeTable mt) {
      for (String mode : rigidBody.modeCoupling().keySet()) {
        if (!mt.modeNames().contains(mode)) {
          throw new InvalidInputException("rigid_body.mode_coupling", "a mode of table \"" + mt.name() + "\"",
              "\"" + mode + "\"");
        }
      }
    }
  }

  /**
   * @param mach Mach number (dimensionless)
   * @return this configuration with its forces taken at {@code mach} ({@link AeroSpec#atMach})
   */
  public Configuration atMach(double mach) {
    return aero == null ? this : new Configuration(name, structure, aero.atMach(mach), rigidBody);
  }

  /** Open-loop configuration without rigid-body data. */
  public Configuration(String name, StructureSpec structure, AeroSpec aero) {
    this(name, structure, aero, null);
  }
}
