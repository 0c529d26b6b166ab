package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.PointList;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.SplineGroup;
import org.flexmargin.model.SplineKind;
import org.flexmargin.model.SplinePoint;
import org.flexmargin.model.SurfacePoint;
import org.flexmargin.model.SweepPoint;
import org.junit.jupiter.api.Test;

/**
 * Which Mach number each kind of aerodynamics is checked against, the edges of the accepted
 * ranges, and the full wording of a warning. Sea-level sweep 50, 100, 150 m/s: Mach 0.147, 0.294,
 * 0.441 with a = 340.294 m/s (US Standard Atmosphere 1976, from memory).
 */
class AeroValidityTest {
  static final PlannedPath PATH = new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 150, 3));

  /** A sea-level path through the given Mach numbers (true airspeed M a0). */
  static PlannedPath throughMach(double... machs) {
    double a0 = StandardAtmosphere.speedOfSoundMps(0);
    List<SweepPoint> pts = new java.util.ArrayList<>();
    for (double m : machs) {
      pts.add(new SweepPoint(0, m * a0, AirspeedKind.TRUE));
    }
    return new PlannedPath(new PointList(pts));
  }

  static Configuration lattice(double mach) {
    LiftingSurface wing = new LiftingSurface("wing", new SurfacePoint(0, 0, 0), 1, new SurfacePoint(0, 10, 0), 1,
        2, 4);
    LatticeSpec spec = new LatticeSpec(0.5, mach, FlowSymmetry.SYMMETRIC, List.of(wing), List.of(new SplineGroup(
        SplineKind.BEAM, List.of("wing"), List.of(new SplinePoint("root", 0.5, 0), new SplinePoint("tip", 0.5, 10)))),
        new double[] {0, 0.1});
    return new Configuration("lattice", MachTablesSweepTest.pitchMode(), spec);
  }

  @Test
  void eachKindOfForcesIsCheckedAgainstItsOwnMachNumber() {
    Configuration strip = new Configuration("section", MatchedPointsTest.SECTION, null);
    assertEquals(AeroValidity.warnings(Double.NaN, PATH), AeroValidity.warnings(strip, PATH));
    assertEquals(AeroValidity.warnings(0.3, PATH), AeroValidity.warnings(MatchedPointsEdgesTest.pitchAt(0.3), PATH));
    String tables = AeroValidity.warnings(new Configuration("tables", MachTablesSweepTest.pitchMode(),
        MachTablesSweepTest.prandtlGlauertTables(0.3, 0.3, 0.7)), PATH).get(0);
    assertTrue(tables.startsWith("aerodynamics outside their range: the force tables are interpolated to Mach 0.300 "
        + "(accepted within +-0.05)"), tables);
    String lattice = AeroValidity.warnings(lattice(0.3), PATH).get(0);
    assertTrue(lattice.startsWith("aerodynamics outside their range: the lifting-surface forces are used at the "
        + "lattice's Mach number 0.300 (accepted within +-0.05)"), lattice);
    // a table at the path's middle Mach number with the whole path within 0.05: no warning
    assertTrue(AeroValidity.warnings(MatchedPointsEdgesTest.pitchAt(0.294),
        throughMach(0.26, 0.294, 0.33)).isEmpty());
  }

  @Test
  void theAcceptedRangesIncludeTheirEdges() {
    // strip theory to Mach 0.3; tables within 0.05 of their Mach number (1e-4 either side of the
    // edges, far above rounding of M = V / a)
    assertTrue(AeroValidity.warnings(Double.NaN, throughMach(0.1, 0.2999)).isEmpty());
    assertEquals(1, AeroValidity.warnings(Double.NaN, throughMach(0.1, 0.3001)).size());
    assertTrue(AeroValidity.warnings(0.2, throughMach(0.1501, 0.2499)).isEmpty());
    assertEquals(1, AeroValidity.warnings(0.2, throughMach(0.1499, 0.2)).size());
    assertEquals(1, AeroValidity.warnings(0.2, throughMach(0.2, 0.2501)).size());
  }

  @Test
  void fromMachOneThePrandtlGlauertFactorIsNotQuoted() {
    // V = a gives Mach a / a = 1 exactly (the interpolation from 0.6 a is exact there, Sterbenz), where
    // 1 / sqrt(1 - M^2) is infinite
    String w = AeroValidity.warnings(Double.NaN, throughMach(0.6, 1)).get(0);
    assertTrue(w.contains("reaches Mach 1.000"), w);
    assertTrue(w.endsWith("the flow is supersonic there and the results have no physical meaning in dimensional "
        + "terms"), w);
  }

  @Test
  void theStripTheoryWarningInFull() {
    // Prandtl-Glauert at Mach 0.441: 1 / sqrt(1 - 0.441^2) = 1.114, about 11 %
    assertEquals(List.of("aerodynamics outside their range: strip theory with Theodorsen's function is "
        + "incompressible (taken as valid to Mach 0.30), but the sweep reaches Mach 0.441 at 150.00 m/s EAS and is "
        + "beyond Mach 0.30 from the grid point at 150.00 m/s EAS; compressibility would raise the lift slope by "
        + "about 11 % there (Prandtl-Glauert)"), AeroValidity.warnings(Double.NaN, PATH));
    // first outside in path order (Mach 0.32) and highest (0.44) named apart
    String w = AeroValidity.warnings(Double.NaN, throughMach(0.1, 0.32, 0.44, 0.2)).get(0);
    double a0 = StandardAtmosphere.speedOfSoundMps(0);
    assertTrue(w.contains(String.format(java.util.Locale.ROOT, "reaches Mach 0.440 at %.2f m/s EAS", 0.44 * a0)), w);
    assertTrue(w.contains(String.format(java.util.Locale.ROOT, "from the grid point at %.2f m/s EAS", 0.32 * a0)), w);
    // the table warning names the lowest and highest Mach numbers wherever they lie, and the
    // first point outside 0.25 to 0.35 in path order (Mach 0.2, not the lowest)
    String t = AeroValidity.warnings(0.3, throughMach(0.2, 0.1, 0.44, 0.3)).get(0);
    assertTrue(t.contains("runs from Mach 0.100 to 0.440"), t);
    assertTrue(t.contains(String.format(java.util.Locale.ROOT, "first outside at %.2f m/s EAS)", 0.2 * a0)), t);
  }
}
