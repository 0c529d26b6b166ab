package org.flexmargin.model;

import java.util.List;

/**
 * User tables of generalized aerodynamic forces Q(ik, M) at several Mach numbers (the user's own
 * panel-method runs), interpolated across Mach numbers as {@link MachForceTable#atMach} says:
 * beta Q, beta = sqrt(1 - M^2), linear in M between neighbouring tables, the nearest table
 * outside the tabulated range.
 *
 * <p>A sweep at one Mach number (a constant-Mach plan) takes the forces at its own Mach number
 * ({@link #atMach}); any other sweep takes them at {@code machNumber}.
 *
 * @param machNumber Mach number (dimensionless) of the forces for sweeps that are not at one Mach
 *     number; within the tabulated Mach range
 * @param forces the tables; their columns are the modes (the rows), no control surfaces
 */
public record MachGafTable(double machNumber, MachForceTable forces) implements AeroSpec {
  /** Validates. */
  public MachGafTable {
    if (forces == null) {
      throw new InvalidInputException("mach_numbers", "force tables at one or more Mach numbers", "none");
    }
    if (!forces.columnNames().equals(forces.rowNames())) {
      throw new InvalidInputException("modes", "the same modes as rows and columns " + forces.rowNames(),
          forces.columnNames().toString());
    }
    Checks.finite("mach", machNumber);
    if (machNumber < forces.lowestMach() || machNumber > forces.highestMach()) {
      throw new InvalidInputException("mach", "a Mach number within the tabulated mach_numbers "
          + forces.lowestMach() + " to " + forces.highestMach(), String.valueOf(machNumber));
    }
  }

  /** @return the mode names (rows and columns), in order */
  public List<String> modeNames() {
    return forces.rowNames();
  }

  /** @return the forces at {@link #machNumber}, interpolated across the tables */
  public GafTable table() {
    return forces.atMach(machNumber);
  }

  /**
   * @param mach a Mach number (dimensionless)
   * @return the same tables with the forces taken at {@code mach}, clamped into the tabulated range
   */
  @Override
  public MachGafTable atMach(double mach) {
    return new MachGafTable(Math.min(Math.max(mach, forces.lowestMach()), forces.highestMach()), forces);
  }
}
