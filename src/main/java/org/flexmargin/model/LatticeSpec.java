package org.flexmargin.model;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Lifting-surface aerodynamics by the doublet-lattice method: the surfaces, the flight Mach
 * number, the flow symmetry and the splines that move the surfaces with the mode shapes.
 *
 * @param referenceSemichordM reference semichord b_ref (m) defining k = omega b_ref / V
 * @param mach Mach number of the forces, in [0, 0.95] (linear subsonic theory)
 * @param symmetry image about y = 0
 * @param surfaces the lifting surfaces, names unique
 * @param splines the splines; every surface in exactly one
 * @param reducedFrequencies the k values at which the forces are computed and then interpolated,
 *     at least two, strictly increasing, &gt;= 0
 */
public record LatticeSpec(
    double referenceSemichordM,
    double mach,
    FlowSymmetry symmetry,
    List<LiftingSurface> surfaces,
    List<SplineGroup> splines,
    double[] reducedFrequencies) implements AeroSpec {
  /** Largest number of boxes over all surfaces: 6,000 boxes need about 1.2 GB for the complex
   * influence matrix and its LU factors. */
  public static final int MAX_BOXES = 6000;

  /** Validates and copies. */
  public LatticeSpec {
    Checks.positive("reference_semichord_m", referenceSemichordM);
    // wings and tails of aircraft have semichords below about ten metres (see the semichord range)
    Checks.inRange("reference_semichord_m", referenceSemichordM, 0, PlausibleRange.SEMICHORD.plausibleMax());
    Checks.inRange("mach", mach, 0, 0.95);
    if (symmetry == null) {
      throw new InvalidInputException("symmetry", "none, symmetric or antisymmetric", "none");
    }
    surfaces = Checks.nonEmpty("surfaces", surfaces);
    splines = Checks.nonEmpty("splines", splines);
    int boxes = surfaces.stream().mapToInt(s -> s.chordwiseBoxes() * s.spanwiseBoxes()).sum();
    if (boxes > MAX_BOXES) {
      throw new InvalidInputException("surfaces",
          "at most " + MAX_BOXES + " boxes in all (the influence matrix and its factorisation need "
              + "about 32 bytes per box squared)", boxes + " boxes");
    }
    if (reducedFrequencies == null || reducedFrequencies.length < 2) {
      throw new InvalidInputException("reduced_frequencies", "at least two reduced frequencies",
          reducedFrequencies == null ? "none" : reducedFrequencies.length + "");
    }
    reducedFrequencies = reducedFrequencies.clone();
    for (int i = 0; i < reducedFrequencies.length; i++) {
      Checks.inRange("reduced_frequencies[" + i + "]", reducedFrequencies[i], 0, 20);
      if (i > 0 && reducedFrequencies[i] <= reducedFrequencies[i - 1]) {
        throw new InvalidInputException("reduced_frequencies[" + i + "]",
            "strictly increasing values", reducedFrequencies[i] + " after " + reducedFrequencies[i - 1]);
      }
    }
    Set<String> names = new HashSet<>();
    for (int i = 0; i < surfaces.size(); i++) {
      if (!names.add(surfaces.get(i).name())) {
        throw new InvalidInputException(
            "surfaces[" + i + "].name", "a unique surface name", "\"" + surfaces.get(i).name() + "\" again");
      }
    }
    Set<String> splined = new HashSet<>();
    for (int g = 0; g < splines.size(); g++) {
      List<String> s = splines.get(g).surfaces();
      for (int i = 0; i < s.size(); i++) {
        String path = "splines[" + g + "].surfaces[" + i + "]";
        if (!names.contains(s.get(i))) {
          throw new InvalidInputException(path, "one of the surfaces " + names, "\"" + s.get(i) + "\"");
        }
        if (!splined.add(s.get(i))) {
          throw new InvalidInputException(path, "a surface in one spline only", "\"" + s.get(i) + "\" again");
        }
      }
    }
    for (int i = 0; i < surfaces.size(); i++) {
      if (!splined.contains(surfaces.get(i).name())) {
        throw new InvalidInputException(
            "surfaces[" + i + "]", "a surface moved by one of the splines",
            "\"" + surfaces.get(i).name() + "\" in no spline");
      }
    }
  }

  /** @return a copy of the reduced frequencies */
  @Override
  public double[] reducedFrequencies() {
    return reducedFrequencies.clone();
  }

  /** @return total number of boxes */
  public int boxCount() {
    return surfaces.stream().mapToInt(s -> s.chordwiseBoxes() * s.spanwiseBoxes()).sum();
  }
}
