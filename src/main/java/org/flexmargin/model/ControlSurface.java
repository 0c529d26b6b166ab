package org.flexmargin.model;

/**
 * A trailing-edge control surface of a doublet-lattice surface (an elevator, a flap, an aileron):
 * the boxes of {@code surface} aft of the hinge line, between two span fractions, rotate as one
 * rigid flap about the hinge line. Positive deflection is trailing edge down.
 *
 * <p>The hinge line runs at the same fraction of the local chord from root to tip (so it is swept
 * like the surface). Span fractions are measured from the surface's root chord (0) to its tip chord
 * (1). Example: {@code hingeChordFraction = 0.75}, span fractions 0.2 to 1 on a surface of 8
 * chordwise and 10 spanwise boxes move the two aftmost boxes of the eight outer box strips. The
 * hinge and the span limits must fall on box edges ({@link LatticeSpec} checks this).
 *
 * <p>Several entries with the same name form one control surface that deflects as a whole (for
 * example the elevator halves of a tailplane given as two surfaces).
 *
 * @param name control-surface name (one column of the forces)
 * @param surface name of the lifting surface that carries it
 * @param hingeChordFraction hinge line position as a fraction of the local chord, in (0, 1)
 * @param fromSpanFraction inner span limit as a fraction of the surface span from the root, [0, 1)
 * @param toSpanFraction outer span limit, (fromSpanFraction, 1]
 */
public record ControlSurface(
    String name, String surface, double hingeChordFraction, double fromSpanFraction, double toSpanFraction) {
  /** Validates. */
  public ControlSurface {
    Checks.name("name", name);
    Checks.name("surface", surface);
    Checks.finite("hinge_chord_fraction", hingeChordFraction);
    if (hingeChordFraction <= 0 || hingeChordFraction >= 1) {
      throw new InvalidInputException("hinge_chord_fraction", "a chord fraction between 0 and 1 (exclusive)",
          String.valueOf(hingeChordFraction));
    }
    Checks.inRange("span_fractions[0]", fromSpanFraction, 0, 1);
    Checks.inRange("span_fractions[1]", toSpanFraction, 0, 1);
    if (toSpanFraction <= fromSpanFraction) {
      throw new InvalidInputException("span_fractions", "an inner fraction below the outer fraction",
          fromSpanFraction + " to " + toSpanFraction);
    }
  }
}
