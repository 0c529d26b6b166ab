package org.flexmargin.model;

import java.util.List;

/**
 * Strip-theory aerodynamics: Theodorsen's two-dimensional unsteady theory applied strip by strip.
 *
 * @param referenceSemichordM reference semichord b_ref (m) that defines the reduced frequency
 *     k = omega b_ref / V
 * @param strips the strips, at least one
 */
public record StripTheorySpec(double referenceSemichordM, List<Strip> strips) implements AeroSpec {
  /** Validates and copies. */
  public StripTheorySpec {
    Checks.positive("reference_semichord_m", referenceSemichordM);
    strips = Checks.nonEmpty("strips", strips);
  }
}
