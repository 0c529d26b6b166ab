package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.clearance.CheckKey;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.MarginOnsets;
import org.flexmargin.clearance.ModeFrequency;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.PointAssessor;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/**
 * The clearance driver with the demo's flight-control loop on three grid points, without the
 * closed-loop sweep: the loop margins come from the margin search at each point, the open-loop
 * solution is hand-made (every mode at its in-vacuo frequency, damping g = -0.04) and so are the
 * closed-loop roots (stable at the first two points, unstable at the third, with a refined onset
 * between them). Each point's checks are those of the assessor on the same loop, and every
 * refined margin onset is a root of its requirement's excess inside its bracket.
 */
class ClearanceLoopTest {
  static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
  static final Configuration CFG = DEMO.configurations().get(0);
  static final ConfigurationModel MODEL = ConfigurationModel.of(CFG);
  static final PlannedPath PATH = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 30, 60, 3));
  /** Onset refinement tolerance on airspeed (m/s EAS). */
  static final double TOL = 0.5;
  /** The open-loop solution ({@link #inVacuo()}), cheap enough to build once. */
  static final FlutterSolution OPEN = inVacuo();

  /** Every mode at its in-vacuo frequency at every grid point, g = -0.04 (zeta 0.02). */
  static FlutterSolution inVacuo() {
    int n = PATH.gridPoints();
    List<BranchCurve> branches = new ArrayList<>();
    for (ElasticMode m : MODEL.modes().modes()) {
      double[] t = new double[n], eas = new double[n], tas = new double[n], hz = new double[n], g = new double[n];
      double[] zeta = new double[n], k = new double[n];
      boolean[] ok = new boolean[n];
      for (int p = 0; p < n; p++) {
        t[p] = p;
        eas[p] = PATH.at(p).speedEasMps();
        tas[p] = PATH.at(p).speedTasMps();
        hz[p] = m.frequencyHz();
        g[p] = -0.04;
        zeta[p] = 0.02;
        k[p] = 0.1;
        ok[p] = true;
      }
      branches.add(new BranchCurve(m.name(), t, eas, tas, hz, g, zeta, k, ok));
    }
    return new FlutterSolution(FlutterMethodKind.PK, branches, List.of(), new SolverDiagnostics(0, 0, 0, 0, 0, 1, 0),
        List.of());
  }

  static LoopMarginResult marginsAt(double t, int seedPoint) {
    ServoLoop sl = ServoMargins.loopAt(MODEL, CFG, DEMO.loop(), PATH.at(t));
    return ServoMargins.withDefaults().at(sl, ServoMargins.seeds(OPEN, seedPoint), ServoMargins.bandTopHz(MODEL));
  }

  /** The closed-loop onset between grid points 1 and 2 (45 and 60 m/s EAS): t = 1.6, 54 m/s. */
  static FlutterCrossing closedLoopOnset() {
    return new FlutterCrossing(0, "wing_bending_1", CrossingKind.FLUTTER_ONSET, 1.6, PATH.at(1.6), 4, 0, 6, 1e-6);
  }

  /**
   * One assessment per test run (not shared between tests or set up beforehand, so that each
   * test exercises the driver itself).
   */
  @Test
  void theDriverWithTheLoop() {
    List<ServoPoint> points = new ArrayList<>();
    List<ClosedLoopPoint> roots = new ArrayList<>();
    for (int p = 0; p < PATH.gridPoints(); p++) {
      points.add(new ServoPoint(p, PATH.at(p), marginsAt(p, p), List.of(), List.of()));
      roots.add(new ClosedLoopPoint(p, PATH.at(p), List.of(new ClosedLoopRoot(p == 2 ? 0.1 : -0.5, 25,
          "wing_bending_1")), 8));
    }
    ServoResult servo = new ServoResult(points, new ClosedLoopResult(roots, List.of(closedLoopOnset()), "fit", 3, List.of(),
        List.of()));
    DivergenceResult none = new DivergenceResult(false, Double.NaN, Double.NaN, new double[0], Double.NaN, 0, "none");
    ClearanceResult result = new ClearanceSweep().assess(MODEL, CFG, DEMO.loop(), PATH, OPEN, none, servo,
        DEMO.requirements(), TOL);
    everyGridPointIsAssessedOnItsOwnLoopWithTheClosedLoopStability(servo, result);
    theClosedLoopStabilityOnsetIsTheRefinedCrossing(result);
    refinedMarginOnsetsAreRootsOfTheirExcessInsideTheirBrackets(result);
    everyRequirementIsRankedOnce(result);
  }

  /**
   * The onset refinement assesses only its requirement: a structural mode's check alone (no
   * margin search: the margins supplier fails if asked), or the margin checks alone; either way
   * the requirement's excess is exactly that of the full assessment at the same speed.
   */
  @Test
  void theRefinementAssessesItsOwnRequirementOnlyWithTheFullAssessmentsExcess() {
    double t = 0.5;
    ServoLoop sl = ServoMargins.loopAt(MODEL, CFG, DEMO.loop(), PATH.at(t));
    LoopMarginResult m = marginsAt(t, 0);
    double f1 = MODEL.modes().modes().stream().mapToDouble(ElasticMode::frequencyHz).min().orElseThrow();
    PointAssessment full = PointAssessor.assess(DEMO.requirements(), PATH.at(t).speedEasMps(), f1, m,
        ClosedLoopStability.NOT_CHECKED, modes(), sl.brokenLoop());
    int structural = 0;
    int margins = 0;
    for (CheckKey key : full.keys()) {
      boolean mode = key.kind() == CheckKind.STRUCTURAL_MODE;
      PointAssessment only = ClearanceSweep.onlyKey(key, DEMO.requirements(), PATH.at(t), modes(), sl,
          mode ? () -> {
            throw new AssertionError("a structural check needs no margins");
          } : () -> m);
      assertEquals(full.worstExcess(key).orElseThrow(), only.worstExcess(key).orElseThrow(), 0.0, key.toString());
      if (mode) {
        structural++;
        assertEquals(List.of(key), List.copyOf(only.keys()), "that mode's check alone");
        assertEquals(1, only.structuralModes().size());
      } else {
        margins++;
        assertTrue(only.structuralModes().isEmpty(), "no structural search for a margin check");
        assertTrue(only.keys().stream().noneMatch(k -> k.kind() == CheckKind.STRUCTURAL_MODE));
        // the bands still use the lowest mode frequency
        assertEquals(f1, only.firstAeroelasticFrequencyHz(), 0.0);
      }
    }
    assertEquals(MODEL.modes().modes().size(), structural);
    assertTrue(margins > 0);
  }

  static List<ModeFrequency> modes() {
    return MODEL.modes().modes().stream().map(m -> new ModeFrequency(m.name(), m.frequencyHz())).toList();
  }

  static void everyGridPointIsAssessedOnItsOwnLoopWithTheClosedLoopStability(ServoResult servo,
      ClearanceResult result) {
    double f1 = MODEL.modes().modes().stream().mapToDouble(ElasticMode::frequencyHz).min().orElseThrow();
    for (int p = 0; p < 3; p++) {
      ClosedLoopStability s = p == 2 ? ClosedLoopStability.UNSTABLE : ClosedLoopStability.STABLE;
      PointAssessment expected = PointAssessor.assess(DEMO.requirements(), PATH.at(p).speedEasMps(), f1,
          servo.points().get(p).margins(), s, modes(),
          ServoMargins.loopAt(MODEL, CFG, DEMO.loop(), PATH.at(p)).brokenLoop());
      PointAssessment got = result.points().get(p);
      assertEquals(expected.speedEasMps(), got.speedEasMps(), 0.0);
      assertEquals(expected.firstAeroelasticFrequencyHz(), got.firstAeroelasticFrequencyHz(), 0.0);
      assertEquals(s, got.closedLoopStability());
      assertEquals(expected.checks(), got.checks());
    }
  }

  static void theClosedLoopStabilityOnsetIsTheRefinedCrossing(ClearanceResult result) {
    MarginOnset m = result.marginOnsets().stream().filter(o -> o.key().kind() == CheckKind.CLOSED_LOOP_STABILITY)
        .findFirst().orElseThrow();
    assertEquals(PATH.at(1.6).speedEasMps(), m.condition().speedEasMps(), 0.0);
    assertEquals("closed-loop stability (wing_bending_1)", m.description());
    assertTrue(m.refined());
    // the closed-loop flutter search sees the same onset, below 1.15 V_L
    ClearanceCheck cl = result.flutter().checks().stream().filter(c -> c.kind() == CheckKind.FLUTTER_SPEED
        && c.subject().equals("closed_loop")).findFirst().orElseThrow();
    assertEquals(PATH.at(1.6).speedEasMps(), cl.achievedValue(), 0.0);
    assertFalse(result.passed());
    // closed-loop roots count in the least damping: s = 0.1 + 25i at 60 m/s EAS (below the demo's
    // V_L = 115 m/s EAS) has g_Vg = 2 * 0.1 / 25 = 0.008, a damping of -0.008
    ClearanceCheck damping = result.flutter().checks().stream().filter(c -> c.kind() == CheckKind.MINIMUM_DAMPING)
        .findFirst().orElseThrow();
    assertEquals(-0.008, damping.achievedValue(), 1e-15);
  }

  static void refinedMarginOnsetsAreRootsOfTheirExcessInsideTheirBrackets(ClearanceResult result) {
    List<MarginOnsets.Bracket> brackets = MarginOnsets.brackets(result.points());
    int checked = 0;
    for (MarginOnset o : result.marginOnsets()) {
      if (o.key().kind() == CheckKind.CLOSED_LOOP_STABILITY) {
        continue;
      }
      MarginOnsets.Bracket b = brackets.stream().filter(x -> x.key().equals(o.key())).findFirst().orElseThrow();
      double v = o.condition().speedEasMps();
      assertTrue(v >= b.passingSpeedEasMps() && v <= b.failingSpeedEasMps(), o.description());
      assertTrue(o.evaluations() > 0, o.description());
      // the description, required value and unit are those of the failing grid point's check
      int failing = b.failingSpeedEasMps() == 60 ? 2 : 1;
      ClearanceCheck fc = result.points().get(failing).checks().stream().filter(c -> c.key().equals(o.key()))
          .min((x, y) -> Double.compare(x.excess(), y.excess())).orElseThrow();
      assertEquals(fc.description(), o.description());
      assertEquals(fc.requiredValue(), o.requiredValue(), 0.0);
      assertEquals(fc.unit().symbol(), o.unit());
      if (!o.refined()) {
        assertEquals(b.failingSpeedEasMps(), v, 1e-9);
        continue;
      }
      // Brent's method stops with a bracket of at most 2 TOL around its answer: the excess changes
      // sign (or vanishes) between v - 2 TOL and v + 2 TOL, kept inside the grid bracket
      double left = excessAt(o.key(), Math.max(b.passingSpeedEasMps(), v - 2 * TOL), failing - 1);
      double right = excessAt(o.key(), Math.min(b.failingSpeedEasMps(), v + 2 * TOL), failing - 1);
      assertTrue(left * right <= 0, o.description() + ": " + left + ", " + right);
      checked++;
    }
    assertTrue(checked > 0, "no refined margin onset");
  }

  /** The requirement's worst excess at speed v inside grid interval [p, p + 1], seeded at p. */
  static double excessAt(CheckKey key, double v, int p) {
    double t = p + (v - PATH.at(p).speedEasMps()) / (PATH.at(p + 1).speedEasMps() - PATH.at(p).speedEasMps());
    double f1 = MODEL.modes().modes().stream().mapToDouble(ElasticMode::frequencyHz).min().orElseThrow();
    ServoLoop sl = ServoMargins.loopAt(MODEL, CFG, DEMO.loop(), PATH.at(t));
    return PointAssessor.assess(DEMO.requirements(), v, f1, marginsAt(t, p), ClosedLoopStability.NOT_CHECKED,
        modes(), sl.brokenLoop()).worstExcess(key).orElse(Double.NaN);
  }

  static void everyRequirementIsRankedOnce(ClearanceResult result) {
    long distinct = result.ranked().stream().map(r -> r.check().key()).distinct().count();
    assertEquals(result.ranked().size(), distinct);
    for (PointAssessment pa : result.points()) {
      for (CheckKey k : pa.keys()) {
        assertTrue(result.ranked().stream().anyMatch(r -> r.check().key().equals(k)), k.toString());
      }
    }
  }
}
