package org.flexmargin.model;

/**
 * One flat trapezoidal lifting surface (a wing panel, a tailplane, a canard) divided into boxes
 * for the doublet-lattice method. The root and tip chords are streamwise (parallel to x); the
 * leading edges and chords fix sweep, taper and dihedral: for example a root leading edge at
 * (0, 0, 0) with chord 2 m and a tip leading edge at (1, 5, 0.2) with chord 1 m is a panel of 5 m
 * span, leading-edge sweep atan(1/5) = 11.3 deg, taper ratio 0.5 and dihedral atan(0.2/5) =
 * 2.3 deg. The root need not be inboard of the tip; the surface normal is chosen with a positive z
 * component (for a vertical surface, pointing to -y).
 *
 * @param name surface name, unique within the lattice
 * @param rootLeadingEdge leading edge of the root chord (m)
 * @param rootChordM root chord (m), &gt; 0
 * @param tipLeadingEdge leading edge of the tip chord (m); must differ from the root in y or z
 * @param tipChordM tip chord (m), &gt; 0
 * @param chordwiseBoxes number of boxes along the chord, 1 to 200
 * @param spanwiseBoxes number of boxes along the span, 1 to 500 (equal widths)
 */
public record LiftingSurface(
    String name,
    SurfacePoint rootLeadingEdge,
    double rootChordM,
    SurfacePoint tipLeadingEdge,
    double tipChordM,
    int chordwiseBoxes,
    int spanwiseBoxes) {
  /** Largest plausible chord (m). */
  public static final double MAX_CHORD_M = 100;

  /** Validates. */
  public LiftingSurface {
    Checks.name("name", name);
    if (rootLeadingEdge == null) {
      throw new InvalidInputException("root_leading_edge_m", "a point [x, y, z] (m)", "none");
    }
    if (tipLeadingEdge == null) {
      throw new InvalidInputException("tip_leading_edge_m", "a point [x, y, z] (m)", "none");
    }
    Checks.positive("root_chord_m", rootChordM);
    Checks.positive("tip_chord_m", tipChordM);
    // no aircraft surface has a chord above 100 m; beyond it a value is a slipped unit or exponent
    Checks.inRange("root_chord_m", rootChordM, 0, MAX_CHORD_M);
    Checks.inRange("tip_chord_m", tipChordM, 0, MAX_CHORD_M);
    Checks.inRange("chordwise_boxes", chordwiseBoxes, 1, 200);
    Checks.inRange("spanwise_boxes", spanwiseBoxes, 1, 500);
    double dy = tipLeadingEdge.yM() - rootLeadingEdge.yM();
    double dz = tipLeadingEdge.zM() - rootLeadingEdge.zM();
    if (Math.hypot(dy, dz) < 1e-9 * Math.max(rootChordM, tipChordM)) {
      throw new InvalidInputException(
          "tip_leading_edge_m", "a tip away from the root in y or z (a span > 0)", "zero span");
    }
  }

  /** @return the span of the surface in its own plane (m) */
  public double spanM() {
    return Math.hypot(
        tipLeadingEdge.yM() - rootLeadingEdge.yM(), tipLeadingEdge.zM() - rootLeadingEdge.zM());
  }

  /** @return the planform area in the surface's own plane (m^2) */
  public double areaM2() {
    return 0.5 * (rootChordM + tipChordM) * spanM();
  }
}
