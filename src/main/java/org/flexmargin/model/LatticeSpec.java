package org.flexmargin.model;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
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
 * @param machNumbers the Mach numbers of the force table (strictly increasing, each in [0, 0.95]);
 *     {@code mach} must lie within their range. Sweeps at one Mach number and matched-point
 *     envelopes interpolate in it ({@link MachForceTable#atMach})
 * @param controlSurfaces hinged box groups (possibly empty); each adds a column to the forces
 * @param elevatorControl name of the control surface that is the loop's elevator, or null
 * @param forceCacheFile file that keeps the computed forces between runs, or null for none
 * @param precomputed forces computed earlier for exactly this lattice and mode table (read from
 *     the cache file by the caller), or null
 */
public record LatticeSpec(
    double referenceSemichordM,
    double mach,
    FlowSymmetry symmetry,
    List<LiftingSurface> surfaces,
    List<SplineGroup> splines,
    double[] reducedFrequencies,
    double[] machNumbers,
    List<ControlSurface> controlSurfaces,
    String elevatorControl,
    Path forceCacheFile,
    MachForceTable precomputed) implements AeroSpec {
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
    machNumbers = machNumbers == null ? new double[] {mach} : machNumbers.clone();
    for (int i = 0; i < machNumbers.length; i++) {
      Checks.inRange("mach_numbers[" + i + "]", machNumbers[i], 0, 0.95);
      if (i > 0 && machNumbers[i] <= machNumbers[i - 1]) {
        throw new InvalidInputException("mach_numbers[" + i + "]", "strictly increasing values",
            machNumbers[i] + " after " + machNumbers[i - 1]);
      }
    }
    if (machNumbers.length == 0 || mach < machNumbers[0] - 1e-12 || mach > machNumbers[machNumbers.length - 1] + 1e-12) {
      throw new InvalidInputException("mach", "a Mach number within the listed mach_numbers",
          mach + (machNumbers.length == 0 ? " with an empty list" : " outside " + machNumbers[0] + " to "
              + machNumbers[machNumbers.length - 1]));
    }
    controlSurfaces = controlSurfaces == null ? List.of() : List.copyOf(controlSurfaces);
    checkControls(surfaces, controlSurfaces);
    if (elevatorControl != null
        && controlSurfaces.stream().noneMatch(c -> c.name().equals(elevatorControl))) {
      throw new InvalidInputException("elevator_control", "the name of one of the control surfaces "
          + controlNames(controlSurfaces), "\"" + elevatorControl + "\"");
    }
  }

  /**
   * The earlier form: one Mach number, no control surfaces, no cache.
   *
   * @param referenceSemichordM reference semichord (m)
   * @param mach Mach number of the forces
   * @param symmetry image about y = 0
   * @param surfaces the lifting surfaces
   * @param splines the splines
   * @param reducedFrequencies the k values of the forces
   */
  public LatticeSpec(double referenceSemichordM, double mach, FlowSymmetry symmetry,
      List<LiftingSurface> surfaces, List<SplineGroup> splines, double[] reducedFrequencies) {
    this(referenceSemichordM, mach, symmetry, surfaces, splines, reducedFrequencies, null, List.of(), null,
        null, null);
  }

  /** Hinges and span limits on box edges of a named surface. */
  private static void checkControls(List<LiftingSurface> surfaces, List<ControlSurface> controls) {
    Map<String, LiftingSurface> byName = new HashMap<>();
    surfaces.forEach(s -> byName.put(s.name(), s));
    for (int i = 0; i < controls.size(); i++) {
      ControlSurface c = controls.get(i);
      String path = "control_surfaces[" + i + "]";
      LiftingSurface s = byName.get(c.surface());
      if (s == null) {
        throw new InvalidInputException(path + ".surface", "one of the surfaces " + byName.keySet(),
            "\"" + c.surface() + "\"");
      }
      onEdge(path + ".hinge_chord_fraction", c.hingeChordFraction(), s.chordwiseBoxes(), "chordwise");
      onEdge(path + ".span_fractions[0]", c.fromSpanFraction(), s.spanwiseBoxes(), "spanwise");
      onEdge(path + ".span_fractions[1]", c.toSpanFraction(), s.spanwiseBoxes(), "spanwise");
    }
  }

  private static void onEdge(String path, double fraction, int boxes, String direction) {
    double edges = fraction * boxes;
    if (Math.abs(edges - Math.rint(edges)) > 1e-6) {
      throw new InvalidInputException(path, "a box edge: a multiple of 1/" + boxes + " (" + boxes + " "
          + direction + " boxes)", String.valueOf(fraction));
    }
  }

  private static Set<String> controlNames(List<ControlSurface> controls) {
    Set<String> names = new java.util.LinkedHashSet<>();
    controls.forEach(c -> names.add(c.name()));
    return names;
  }

  /** @return the control-surface names in order of first appearance (one force column each) */
  public List<String> controlNames() {
    return List.copyOf(controlNames(controlSurfaces));
  }

  /** @return a copy of the Mach numbers of the force table */
  @Override
  public double[] machNumbers() {
    return machNumbers.clone();
  }

  /**
   * @param forces forces computed for this lattice (from the cache file or just now)
   * @return the same lattice with the forces attached
   */
  public LatticeSpec withPrecomputed(MachForceTable forces) {
    return new LatticeSpec(referenceSemichordM, mach, symmetry, surfaces, splines, reducedFrequencies,
        machNumbers, controlSurfaces, elevatorControl, forceCacheFile, forces);
  }

  /**
   * @param sweepMach a Mach number (dimensionless)
   * @return the same lattice with its forces taken at {@code sweepMach}, clamped into the range of
   *     {@link #machNumbers()}
   */
  @Override
  public LatticeSpec atMach(double sweepMach) {
    double m = Math.min(Math.max(sweepMach, machNumbers[0]), machNumbers[machNumbers.length - 1]);
    return new LatticeSpec(referenceSemichordM, m, symmetry, surfaces, splines, reducedFrequencies,
        machNumbers, controlSurfaces, elevatorControl, forceCacheFile, precomputed);
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
