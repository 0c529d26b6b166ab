package org.flexmargin.model;

/**
 * Where the unsteady generalized aerodynamic forces of a configuration come from: strip theory
 * with Theodorsen's function, a user table of Q(ik) at one Mach number or at several, or lifting
 * surfaces (doublet lattice).
 */
public sealed interface AeroSpec permits StripTheorySpec, GafTable, MachGafTable, LatticeSpec {
  /**
   * The same aerodynamic data with the forces of its sweeps taken at another Mach number, where
   * they depend on it: lifting surfaces and tables at several Mach numbers move their sweep Mach
   * number to {@code mach}, clamped into their tabulated range (a sweep outside that range is
   * warned about by the sweep). Strip theory and a table at one Mach number do not depend on Mach
   * and are returned unchanged.
   *
   * @param mach Mach number (dimensionless)
   * @return the data with its forces at {@code mach}
   */
  default AeroSpec atMach(double mach) {
    return this;
  }
}
