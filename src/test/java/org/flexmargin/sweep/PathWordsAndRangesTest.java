package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.PointList;
import org.flexmargin.model.RequirementPresets;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.SweepPoint;
import org.junit.jupiter.api.Test;

/**
 * Refined sweep paths and their descriptions, the aerodynamic-range warnings on descending and
 * constant-Mach paths, the start status of the findings at its edges, and the stage count.
 */
class PathWordsAndRangesTest {

  @Test
  void refinedPathSplitsEveryInterval() {
    PlannedPath p = new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 150, 3));
    assertEquals(1, p.subdivisions());
    assertEquals("speed sweep at 0 m, EAS 50.0 to 150.0 m/s, 3 points", p.describe());
    PlannedPath fine = p.refined(4);
    assertEquals(4, fine.subdivisions());
    // (3 - 1) x 4 + 1 grid points; refined point 4 is planned point 1
    assertEquals(9, fine.gridPoints());
    assertEquals(p.at(1).speedEasMps(), fine.at(4).speedEasMps(), 1e-12);
    assertEquals(62.5, fine.at(1).speedEasMps(), 1e-12);
    assertEquals("speed sweep at 0 m, EAS 50.0 to 150.0 m/s, 3 points, re-solved with every interval split in 4",
        fine.describe());
    assertEquals(8, fine.refined(2).subdivisions());
    assertEquals(1, p.refined(1).subdivisions());
    assertThrows(IllegalArgumentException.class, () -> p.refined(0));
    // the parameter may stray by rounding (1e-9) beyond the ends, not more
    assertEquals(50, p.at(-1e-10).speedEasMps(), 1e-9);
    assertEquals(150, p.at(2 + 1e-10).speedEasMps(), 1e-9);
    assertThrows(IllegalArgumentException.class, () -> p.at(-1e-8));
    assertThrows(IllegalArgumentException.class, () -> p.at(2 + 1e-8));
    assertEquals("path parameter 2.5 outside [0, 2]", assertThrows(IllegalArgumentException.class,
        () -> p.at(2.5)).getMessage());
  }

  @Test
  void descriptionsOfEveryPlan() {
    assertEquals("speed sweep at 3000 m, TAS 80.0 to 120.0 m/s, 5 points",
        new PlannedPath(new SpeedSweep(3000, AirspeedKind.TRUE, 80, 120, 5)).describe());
    assertEquals("Mach 0.600 from 10000 m to 0 m, 5 points", new PlannedPath(new MachSweep(0.6, 10000, 0, 5)).describe());
    PlannedPath list = new PlannedPath(new PointList(List.of(new SweepPoint(0, 100, AirspeedKind.TRUE),
        new SweepPoint(2000, 200, AirspeedKind.TRUE), new SweepPoint(4000, 150, AirspeedKind.TRUE))));
    assertEquals("3 listed flight points", list.describe());
    // between the second and third point: altitude and TAS linear in the parameter
    assertEquals(3000, list.at(1.5).altitudeM(), 1e-9);
    assertEquals(175, list.at(1.5).speedTasMps(), 1e-9);
    assertEquals(4000, list.at(2).altitudeM(), 1e-9);
  }

  /**
   * A descending list of sea-level points, 150, 100, 50 m/s (Mach 0.441 to 0.147 with a = 340.294 m/s, US
   * Standard Atmosphere 1976 sea level, from memory): the warnings name the highest and lowest Mach
   * numbers wherever they lie on the path, and the first point outside the range in path order.
   */
  @Test
  void warningsNameTheExtremesOfADescendingSweep() {
    PlannedPath down = new PlannedPath(new PointList(List.of(new SweepPoint(0, 150, AirspeedKind.TRUE),
        new SweepPoint(0, 100, AirspeedKind.TRUE), new SweepPoint(0, 50, AirspeedKind.TRUE))));
    String strip = AeroValidity.warnings(Double.NaN, down).get(0);
    assertTrue(strip.contains("reaches Mach 0.441 at 150.00 m/s EAS"), strip);
    assertTrue(strip.contains("from the grid point at 150.00 m/s EAS"), strip);
    String table = AeroValidity.warnings(0.3, down).get(0);
    assertTrue(table.contains("the force table holds at Mach 0.300 (accepted within +-0.05), but the sweep runs from "
        + "Mach 0.147 to 0.441 (first outside at 150.00 m/s EAS)"), table);
    String lattice = AeroValidity.warnings(0.3, down, "the lattice holds at Mach").get(0);
    assertTrue(lattice.startsWith("aerodynamics outside their range: the lattice holds at Mach 0.300"), lattice);
    // constant Mach 0.6 from 10 000 m down to sea level: every point is outside, the first one
    // (10 000 m, lowest EAS) is named both as the first and, Mach being equal everywhere, as the
    // highest
    PlannedPath mach = new PlannedPath(new MachSweep(0.6, 10000, 0, 3));
    double firstEas = mach.at(0).speedEasMps();
    String m = AeroValidity.warnings(Double.NaN, mach).get(0);
    assertTrue(m.contains(String.format(java.util.Locale.ROOT, "reaches Mach 0.600 at %.2f m/s EAS", firstEas)), m);
    // Prandtl-Glauert at Mach 0.6: 1 / 0.8 = 1.25, i.e. 25 %
    assertTrue(m.contains("about 25 %"), m);
  }

  /** Hand-made results as in InstabilityFindingsTest: the start status at its edges. */
  @Test
  void startStatusAtItsEdges() {
    boolean[] all = InstabilityFindingsTest.ALL;
    // g = 0 exactly is not unstable, but it is below the damping limit
    BranchCurve neutral = InstabilityFindingsTest.branch("bending", new double[] {0, 0.01, 0.02, 0.03}, all);
    BranchCurve empty = new BranchCurve("none", new double[0], new double[0], new double[0], new double[0],
        new double[0], new double[0], new double[0], new boolean[0]);
    FlutterSolution f = InstabilityFindingsTest.solution(FlutterMethodKind.PK, List.of(empty, neutral), List.of(),
        Double.NaN);
    ServoResult s = InstabilityFindingsTest.servo(List.of(InstabilityFindingsTest.point(50,
        new ClosedLoopRoot(0, 3, "on the axis"))), List.of());
    ConfigurationResult r = InstabilityFindingsTest.result(InstabilityFindingsTest.NO_DIVERGENCE, f, s);
    AnalysisCase c = new AnalysisCase(1, "case", "", List.of(new Configuration("clean", MatchedPointsTest.SECTION,
        null)), new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 200, 4), AnalysisOptions.defaults(), List.of());
    List<Finding> all2 = Findings.of(new SweepResult(c, "path", List.of(r)), InstabilityFindingsTest.seaLevel(50));
    // a closed-loop root on the imaginary axis is not unstable
    assertEquals(List.of("no divergence", "damping below limit at start"), all2.stream().map(Finding::what).toList());
  }

  @Test
  void stagesPerConfiguration() {
    List<Configuration> cs = List.of(new Configuration("clean", MatchedPointsTest.SECTION, null));
    SpeedSweep sweep = new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 200, 4);
    // flutter only; with requirements one more (the clearance)
    assertEquals(1, SweepProgress.stagesPerConfiguration(new AnalysisCase(1, "a", "", cs, sweep,
        AnalysisOptions.defaults(), List.of())));
    assertEquals(2, SweepProgress.stagesPerConfiguration(new AnalysisCase(1, "a", "", cs, sweep,
        AnalysisOptions.defaults(), List.of(), null, RequirementPresets.recalledMilitaryAndTransport(120, 150))));
    // a configuration without rigid-body data has no mode couplings
    assertTrue(ModeCouplings.of(cs.get(0)).isEmpty());
  }
}
