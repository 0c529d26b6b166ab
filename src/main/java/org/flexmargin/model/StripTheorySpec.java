package org.flexmargin.model;

import java.util.List;

/**
 * Strip-theory aerodynamics: Theodorsen's two-dimensional unsteady theory applied strip by strip.
 *
 * @param referenceSemichordM reference semichord b_ref (m) that defines the reduced frequency
 *     k = omega b_ref / V
 * @param strips the strips, at least one; either every strip has a {@link StripPlacement} or none
 */
public record StripTheorySpec(double referenceSemichordM, List<Strip> strips) implements AeroSpec {
  /** Validates and copies. */
  public StripTheorySpec {
    Checks.positive("reference_semichord_m", referenceSemichordM);
    strips = Checks.nonEmpty("strips", strips);
    boolean placed = strips.get(0).placement() != null;
    for (int s = 1; s < strips.size(); s++) {
      if ((strips.get(s).placement() != null) != placed) {
        throw new InvalidInputException("strips[" + s + "].elastic_axis_aft_of_cg_m",
            "the strip placement on every strip or on none (strips[0] " + (placed ? "has" : "has none") + ")",
            placed ? "none" : "a placement");
      }
    }
  }

  /** @return true when every strip has a placement, so that the coupling can be computed */
  public boolean placed() {
    return strips.get(0).placement() != null;
  }
}
