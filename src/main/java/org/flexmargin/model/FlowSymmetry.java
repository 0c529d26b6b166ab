package org.flexmargin.model;

/**
 * Symmetry of the flow about the aircraft's plane of symmetry y = 0 for the doublet-lattice
 * method. With {@link #SYMMETRIC} or {@link #ANTISYMMETRIC} only the starboard half (y &gt;= 0) is
 * given and its mirror image is added with the same or the opposite load; for example a half wing
 * from y = 0 to 5 m with {@code SYMMETRIC} is a 10 m wing moving symmetrically (heave, pitch,
 * symmetric bending).
 */
public enum FlowSymmetry {
  /** Surfaces as given, no image. */
  NONE,
  /** Mirror image with the same load: symmetric motion. */
  SYMMETRIC,
  /** Mirror image with opposite load: antisymmetric motion (roll, antisymmetric bending). */
  ANTISYMMETRIC
}
