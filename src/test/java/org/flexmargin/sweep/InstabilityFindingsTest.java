package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/**
 * The lowest instabilities, the trusted range of mode tracking and the findings table, built from
 * hand-made solver results (a few grid points at sea level, where EAS = TAS), so that every value
 * follows from the definitions in the classes' Javadoc.
 */
class InstabilityFindingsTest {

  /** Sea level, US Standard Atmosphere 1976 (rho0 = 1.225 kg/m^3 makes EAS = TAS exactly). */
  static FlightCondition seaLevel(double tas) {
    return new FlightCondition(0, 1.225, 101325, 288.15, 340.294, tas);
  }

  /** A branch over grid speeds 50, 100, 150, 200 m/s with the given damping and convergence. */
  static BranchCurve branch(String name, double[] g, boolean[] converged) {
    double[] v = {50, 100, 150, 200};
    return new BranchCurve(name, new double[] {0, 1, 2, 3}, v, v, new double[] {3, 3.1, 3.2, 3.3}, g,
        new double[] {0, 0, 0, 0}, new double[] {0.1, 0.1, 0.1, 0.1}, converged);
  }

  static final boolean[] ALL = {true, true, true, true};

  static FlutterCrossing crossing(String mode, CrossingKind kind, double tas, double hz, double thresholdG) {
    return new FlutterCrossing(0, mode, kind, tas / 50 - 1, seaLevel(tas), hz, thresholdG, 5, 1e-6);
  }

  static FlutterSolution solution(FlutterMethodKind method, List<BranchCurve> branches, List<FlutterCrossing> crossings,
      double firstTrouble) {
    return new FlutterSolution(method, branches, crossings,
        new SolverDiagnostics(10, 20, 2, 0, 1e-12, 0.99, 0, firstTrouble), List.of());
  }

  static final DivergenceResult NO_DIVERGENCE = new DivergenceResult(false, Double.NaN, Double.NaN, new double[0],
      Double.NaN, 0, "no divergence: aerodynamic stiffness stabilising");

  static ConfigurationResult result(DivergenceResult d, FlutterSolution f, ServoResult servo) {
    return new ConfigurationResult("clean", List.of("bending", "torsion"), new double[] {3, 9}, "strips", d,
        OptionalDouble.empty(), Double.NaN, f, 0.1, servo, null);
  }

  static ServoResult servo(List<ClosedLoopPoint> points, List<FlutterCrossing> crossings) {
    return new ServoResult(List.of(), new ClosedLoopResult(points, crossings, "fit", points.size(), List.of(),
        List.of()));
  }

  static ClosedLoopPoint point(double tas, ClosedLoopRoot... roots) {
    return new ClosedLoopPoint(tas / 50 - 1, seaLevel(tas), List.of(roots), 4);
  }

  @Test
  void trackingIsTrustedToTheLastGridPointBeforeTheFirstTrouble() {
    BranchCurve b = branch("bending", new double[] {-0.1, -0.1, -0.1, -0.1}, ALL);
    // clean tracking (NaN): no limit
    FlutterSolution clean = solution(FlutterMethodKind.PK, List.of(b), List.of(), Double.NaN);
    assertTrue(TrackingTrust.trustedUpToEasMps(clean).isEmpty());
    assertFalse(TrackingTrust.unreliableAt(clean, 1e6));
    // trouble without branches: nothing to bound
    assertTrue(TrackingTrust.trustedUpToEasMps(solution(FlutterMethodKind.PK, List.of(), List.of(), 1.5)).isEmpty());
    // trouble between grid points 2 and 3: trusted to grid point 1 (100 m/s), the last before
    // the interval that holds the trouble starts
    FlutterSolution mid = solution(FlutterMethodKind.PK, List.of(b), List.of(), 2.5);
    assertEquals(100, TrackingTrust.trustedUpToEasMps(mid).getAsDouble(), 0.0);
    assertTrue(TrackingTrust.unreliableAt(mid, 100.001));
    assertFalse(TrackingTrust.unreliableAt(mid, 100));
    // a parameter a rounding error below a grid point counts as that grid point
    assertEquals(100, TrackingTrust.trustedUpToEasMps(solution(FlutterMethodKind.PK, List.of(b), List.of(),
        2 - 1e-12)).getAsDouble(), 0.0);
    assertEquals(50, TrackingTrust.trustedUpToEasMps(solution(FlutterMethodKind.PK, List.of(b), List.of(),
        1.999)).getAsDouble(), 0.0);
    // at the first point: trusted to the first point only; beyond the end: the last point
    assertEquals(50, TrackingTrust.trustedUpToEasMps(solution(FlutterMethodKind.PK, List.of(b), List.of(), 0))
        .getAsDouble(), 0.0);
    assertEquals(50, TrackingTrust.trustedUpToEasMps(solution(FlutterMethodKind.PK, List.of(b), List.of(), 1))
        .getAsDouble(), 0.0);
    assertEquals(200, TrackingTrust.trustedUpToEasMps(solution(FlutterMethodKind.PK, List.of(b), List.of(), 9))
        .getAsDouble(), 0.0);
    assertEquals(150, result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(b), List.of(), 3), null)
        .trackingTrustedUpToEasMps().getAsDouble(), 0.0);
  }

  @Test
  void lowestOpenLoopFlutterIsTheLowestOnsetOrARootUnstableAtTheStart() {
    BranchCurve stable = branch("bending", new double[] {-0.1, -0.05, 0.01, 0.02}, ALL);
    List<FlutterCrossing> xs = List.of(
        crossing("torsion", CrossingKind.FLUTTER_ONSET, 170, 4.5, 0),
        crossing("bending", CrossingKind.FLUTTER_ONSET, 140, 3.15, 0),
        crossing("bending", CrossingKind.DAMPING_BELOW_LIMIT, 110, 3.1, -0.03),
        crossing("bending", CrossingKind.FLUTTER_RECOVERY, 90, 3.0, 0));
    ConfigurationResult r = result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(stable), xs, Double.NaN),
        null);
    Instability i = r.lowestOpenLoopFlutter().orElseThrow();
    assertEquals(Instability.Kind.OPEN_LOOP_FLUTTER, i.kind());
    assertEquals("bending", i.mode());
    assertEquals(140, i.speedEasMps(), 0.0);
    assertEquals(3.15, i.frequencyHz(), 0.0);
    assertFalse(i.atSweepStart());
    assertTrue(i.reliable());
    assertEquals(i, r.lowestInstability().orElseThrow());
    assertTrue(r.lowestClosedLoopInstability().isEmpty());
    assertTrue(r.divergenceInstability().isEmpty());
    // the same onsets beyond the trusted range (trouble at parameter 1.5: trusted to 50 m/s)
    Instability doubt = result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(stable), xs, 1.5), null)
        .lowestOpenLoopFlutter().orElseThrow();
    assertEquals(140, doubt.speedEasMps(), 0.0);
    assertFalse(doubt.reliable());
    assertFalse(doubt.atSweepStart());
    // a root unstable at the first point (g > 0) lies below every onset; the p-k and state-space
    // methods report it, the k method (no true damping off the flutter point) does not
    BranchCurve unstable = branch("torsion", new double[] {0.002, 0.01, 0.02, 0.03}, ALL);
    Instability start = result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(stable, unstable), xs,
        Double.NaN), null).lowestOpenLoopFlutter().orElseThrow();
    assertEquals("torsion", start.mode());
    assertEquals(50, start.speedEasMps(), 0.0);
    assertEquals(3, start.frequencyHz(), 0.0);
    assertTrue(start.atSweepStart());
    assertTrue(start.reliable());
    assertEquals(140, result(NO_DIVERGENCE, solution(FlutterMethodKind.K, List.of(stable, unstable), xs, Double.NaN),
        null).lowestOpenLoopFlutter().orElseThrow().speedEasMps(), 0.0);
    // neither a neutral root (g = 0) nor an unconverged first point counts as unstable
    BranchCurve neutral = branch("torsion", new double[] {0, 0.01, 0.02, 0.03}, ALL);
    BranchCurve lost = branch("torsion", new double[] {0.5, 0.01, 0.02, 0.03}, new boolean[] {false, true, true, true});
    for (BranchCurve b : List.of(neutral, lost)) {
      assertEquals(140, result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(b), xs, Double.NaN), null)
          .lowestOpenLoopFlutter().orElseThrow().speedEasMps(), 0.0);
    }
    // a branch without points has no start
    BranchCurve empty = new BranchCurve("none", new double[0], new double[0], new double[0], new double[0],
        new double[0], new double[0], new double[0], new boolean[0]);
    assertEquals(140, result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(empty, stable), xs, Double.NaN),
        null).lowestOpenLoopFlutter().orElseThrow().speedEasMps(), 0.0);
    // no onset at all
    assertTrue(result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(stable), List.of(), Double.NaN), null)
        .lowestOpenLoopFlutter().isEmpty());
  }

  @Test
  void lowestClosedLoopInstabilityPrefersARefinedOnsetAtOrBelowTheFirstUnstablePoint() {
    FlutterSolution open = solution(FlutterMethodKind.PK, List.of(), List.of(), Double.NaN);
    ClosedLoopPoint p0 = point(50, new ClosedLoopRoot(-1, 20, "bending"), new ClosedLoopRoot(-2, 0, "rigid"));
    ClosedLoopPoint p1 = point(100, new ClosedLoopRoot(0.5, 20, "bending"), new ClosedLoopRoot(0.8, 0, "rigid"));
    ClosedLoopPoint p2 = point(150, new ClosedLoopRoot(0.7, 20, "bending"), new ClosedLoopRoot(1.0, 0, "rigid"));
    // no refined onset: the first unstable point, kind from its worst root (real: divergent root)
    Instability grid = result(NO_DIVERGENCE, open, servo(List.of(p0, p1, p2), List.of()))
        .lowestClosedLoopInstability().orElseThrow();
    assertEquals(Instability.Kind.CLOSED_LOOP_DIVERGENT_ROOT, grid.kind());
    assertEquals("rigid", grid.mode());
    assertEquals(100, grid.speedEasMps(), 0.0);
    assertEquals(0, grid.frequencyHz(), 0.0);
    assertFalse(grid.atSweepStart());
    // a refined onset below the first unstable point wins, and one exactly at it too
    for (double v : new double[] {85, 100}) {
      Instability refined = result(NO_DIVERGENCE, open, servo(List.of(p0, p1, p2),
          List.of(crossing("bending", CrossingKind.FLUTTER_ONSET, v, 3.2, 0))))
          .lowestClosedLoopInstability().orElseThrow();
      assertEquals(Instability.Kind.CLOSED_LOOP_FLUTTER, refined.kind());
      assertEquals(v, refined.speedEasMps(), 0.0);
      assertEquals(3.2, refined.frequencyHz(), 0.0);
    }
    // one above it does not (a real root went unstable first); recoveries are no onsets
    Instability above = result(NO_DIVERGENCE, open, servo(List.of(p0, p1, p2), List.of(
        crossing("bending", CrossingKind.FLUTTER_ONSET, 120, 3.2, 0),
        crossing("bending", CrossingKind.FLUTTER_RECOVERY, 60, 3.2, 0)))).lowestClosedLoopInstability().orElseThrow();
    assertEquals(100, above.speedEasMps(), 0.0);
    // an oscillatory worst root unstable from the first point
    ClosedLoopPoint q0 = point(50, new ClosedLoopRoot(0.3, 6 * Math.PI, "torsion"), new ClosedLoopRoot(-2, 0, "rigid"));
    Instability first = result(NO_DIVERGENCE, open, servo(List.of(q0, p1), List.of())).lowestClosedLoopInstability()
        .orElseThrow();
    assertEquals(Instability.Kind.CLOSED_LOOP_FLUTTER, first.kind());
    assertEquals("torsion", first.mode());
    assertEquals(3, first.frequencyHz(), 1e-15);
    assertTrue(first.atSweepStart());
    // a root exactly on the imaginary axis is not unstable; a stable loop with a refined onset
    // beyond the grid gives that onset; a stable loop without one gives nothing
    ClosedLoopPoint neutral = point(50, new ClosedLoopRoot(0, 20, "bending"));
    assertTrue(result(NO_DIVERGENCE, open, servo(List.of(neutral), List.of())).lowestClosedLoopInstability()
        .isEmpty());
    assertEquals(180, result(NO_DIVERGENCE, open, servo(List.of(p0), List.of(
        crossing("bending", CrossingKind.FLUTTER_ONSET, 180, 3.2, 0)))).lowestClosedLoopInstability().orElseThrow()
        .speedEasMps(), 0.0);
  }

  @Test
  void lowestInstabilityOfAllThree() {
    DivergenceResult d = new DivergenceResult(true, 12250, 141.42, new double[] {1, 0}, 1e-12, 0, "");
    FlutterSolution f = solution(FlutterMethodKind.PK, List.of(),
        List.of(crossing("torsion", CrossingKind.FLUTTER_ONSET, 160, 4, 0)), Double.NaN);
    ConfigurationResult r = result(d, f, servo(List.of(point(50, new ClosedLoopRoot(-1, 1, "a"))),
        List.of(crossing("bending", CrossingKind.FLUTTER_ONSET, 150, 3, 0))));
    Instability div = r.divergenceInstability().orElseThrow();
    assertEquals(Instability.Kind.DIVERGENCE, div.kind());
    assertEquals("-", div.mode());
    assertEquals(141.42, div.speedEasMps(), 0.0);
    assertTrue(div.reliable());
    assertEquals(div, r.lowestInstability().orElseThrow());
    assertEquals(150, r.lowestClosedLoopInstability().orElseThrow().speedEasMps(), 0.0);
    ConfigurationResult noDiv = result(NO_DIVERGENCE, f, r.servo());
    assertEquals(Instability.Kind.CLOSED_LOOP_FLUTTER, noDiv.lowestInstability().orElseThrow().kind());
    assertEquals(Optional.empty(), result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(), List.of(),
        Double.NaN), null).lowestInstability());
  }

  static SweepResult sweep(ConfigurationResult... r) {
    AnalysisCase c = new AnalysisCase(1, "case", "", List.of(new Configuration("clean", MatchedPointsTest.SECTION,
        null)), new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 200, 4), AnalysisOptions.defaults(), List.of());
    return new SweepResult(c, "path", List.of(r));
  }

  @Test
  void findingsInOrderOfAirspeedWithTheirWords() {
    // divergence at q = 12 250 Pa: TAS = sqrt(2 q / rho) = sqrt(20 000) = 141.42 m/s at sea level
    // (derived), Mach 141.42 / 340.294
    DivergenceResult d = new DivergenceResult(true, 12250, 141.4, new double[] {1, 0}, 1e-12, 0, "");
    BranchCurve lowDamping = branch("bending", new double[] {-0.02, -0.01, 0.01, 0.02}, ALL);
    BranchCurve wellDamped = branch("torsion", new double[] {-0.03, -0.04, -0.05, -0.06}, ALL);
    List<FlutterCrossing> xs = List.of(
        crossing("bending", CrossingKind.FLUTTER_ONSET, 125, 3.15, 0),
        crossing("bending", CrossingKind.DAMPING_BELOW_LIMIT, 75, 3.05, 0.03));
    FlutterSolution f = solution(FlutterMethodKind.PK, List.of(lowDamping, wellDamped), xs, 2.5);
    ConfigurationResult r = new ConfigurationResult("clean", List.of("bending", "torsion"), new double[] {3, 9},
        "strips", d, OptionalDouble.of(12260), 141.4, f, 0.1, null, null);
    List<Finding> all = Findings.of(sweep(r), seaLevel(50));
    assertEquals(List.of("damping below limit at start", "damping below limit", Findings.TRACKING_IN_DOUBT,
        "flutter onset" + Findings.UNRELIABLE, "divergence"), all.stream().map(Finding::what).toList());
    Finding start = all.get(0);
    assertEquals("bending", start.mode());
    assertEquals(50, start.speedEasMps(), 0.0);
    assertEquals(3, start.frequencyHz(), 0.0);
    assertEquals("damping g = 0.0200 at the first sweep point (V-g g = -0.0200)", start.remark());
    assertEquals("damping g = -0.030 reached (V-g g = 0.030; p-k method)", all.get(1).remark());
    assertEquals(75, all.get(1).speedEasMps(), 0.0);
    assertEquals(75 / 340.294, all.get(1).mach(), 1e-15);
    assertEquals(3.05, all.get(1).frequencyHz(), 0.0);
    Finding trust = all.get(2);
    assertEquals(100, trust.speedEasMps(), 0.0);
    assertTrue(Double.isNaN(trust.speedTasMps()));
    Finding onset = all.get(3);
    assertEquals("mode tracking in doubt here even after re-solving with finer steps; damping g = 0 reached "
        + "(p-k method)", onset.remark());
    Finding div = all.get(4);
    assertEquals(141.4, div.speedEasMps(), 0.0);
    assertEquals(Math.sqrt(20000), div.speedTasMps(), 1e-12);
    assertEquals(Math.sqrt(20000) / 340.294, div.mach(), 1e-12);
    assertEquals(0, div.frequencyHz(), 0.0);
    assertEquals("rigid body restrained; confirmed in sweep (q 12260.0 Pa)", div.remark());
    assertEquals("clean", div.configuration());
  }

  @Test
  void findingsWithoutDivergenceWithAnUnstableStartAndAClosedLoop() {
    BranchCurve unstable = branch("torsion", new double[] {0.01, 0.02, 0.03, 0.04}, ALL);
    FlutterCrossing clOnset = crossing("bending", CrossingKind.FLUTTER_ONSET, 120, 3.3, 0);
    ServoResult s = servo(List.of(point(50, new ClosedLoopRoot(0.25, 4 * Math.PI, "torsion"),
        new ClosedLoopRoot(-1, 2, "rigid"))), List.of(clOnset));
    ConfigurationResult r = result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(unstable), List.of(),
        Double.NaN), s);
    List<Finding> all = Findings.of(sweep(r), seaLevel(50));
    // the "no divergence" line has no speed and sorts first
    assertEquals(List.of("no divergence", Findings.OPEN_LOOP_UNSTABLE_AT_START, Findings.CLOSED_LOOP_UNSTABLE_AT_START,
        "closed-loop flutter onset"), all.stream().map(Finding::what).toList());
    assertEquals(NO_DIVERGENCE.note(), all.get(0).remark());
    assertTrue(Double.isNaN(all.get(0).speedEasMps()));
    assertEquals(0, all.get(0).altitudeM(), 0.0);
    Finding cl = all.get(2);
    assertEquals("torsion", cl.mode());
    assertEquals(2, cl.frequencyHz(), 1e-15);
    assertEquals("root 0.250 +12.566i 1/s at the first sweep point", cl.remark());
    assertTrue(Findings.isClosedLoopInstability(cl));
    assertEquals("damping g = 0 reached (closed-loop state space)", all.get(3).remark());
    assertEquals(3.3, all.get(3).frequencyHz(), 0.0);
    // the k method reports no start status; a well-damped start none either
    ConfigurationResult k = result(NO_DIVERGENCE, solution(FlutterMethodKind.K, List.of(unstable), List.of(),
        Double.NaN), null);
    assertEquals(List.of("no divergence"), Findings.of(sweep(k), seaLevel(50)).stream().map(Finding::what).toList());
    BranchCurve damped = branch("torsion", new double[] {-0.0300001, 0.02, 0.03, 0.04}, ALL);
    ConfigurationResult ok = result(NO_DIVERGENCE, solution(FlutterMethodKind.PK, List.of(damped), List.of(),
        Double.NaN), null);
    assertEquals(1, Findings.of(sweep(ok), seaLevel(50)).size());
    // divergence beyond the sweep
    DivergenceResult far = new DivergenceResult(true, 50000, 285.7, new double[] {1, 0}, 1e-12, 0, "");
    ConfigurationResult beyond = result(far, solution(FlutterMethodKind.PK, List.of(), List.of(), Double.NaN), null);
    assertEquals("rigid body restrained; beyond the sweep", Findings.of(sweep(beyond), seaLevel(50)).get(0).remark());
  }
}
