package org.flexmargin.model;

/**
 * Where the unsteady generalized aerodynamic forces of a configuration come from: strip theory
 * with Theodorsen's function, or a user table of Q(ik).
 */
public sealed interface AeroSpec permits StripTheorySpec, GafTable, LatticeSpec {}
