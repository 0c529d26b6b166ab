package org.flexmargin.model;

/**
 * One configuration of the aircraft (a fuel or payload state): its structure and aerodynamics.
 *
 * @param name unique configuration name
 * @param structure mode table or built-in validation structure
 * @param aero aerodynamic data; {@code null} only for built-in structures, which carry their own
 *     strip geometry
 */
public record Configuration(String name, StructureSpec structure, AeroSpec aero) {
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
  }
}
