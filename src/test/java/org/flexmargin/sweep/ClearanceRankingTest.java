package org.flexmargin.sweep;

import static org.flexmargin.sweep.InstabilityFindingsTest.ALL;
import static org.flexmargin.sweep.InstabilityFindingsTest.branch;
import static org.flexmargin.sweep.InstabilityFindingsTest.crossing;
import static org.flexmargin.sweep.InstabilityFindingsTest.point;
import static org.flexmargin.sweep.InstabilityFindingsTest.seaLevel;
import static org.flexmargin.sweep.InstabilityFindingsTest.solution;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.stream.Collectors;
import org.flexmargin.clearance.CheckKey;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.CheckUnit;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.FlutterClearance;
import org.flexmargin.clearance.FlutterClearanceRule;
import org.flexmargin.clearance.MarginOnsets;
import org.flexmargin.clearance.ModeFrequency;
import org.flexmargin.clearance.OnsetSearch;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.RequiredSense;
import org.flexmargin.clearance.Severity;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.SpeedRegime;
import org.junit.jupiter.api.Test;

/**
 * The pieces of the clearance driver that need no loop analysis, on hand-made checks at grid
 * speeds 50, 100, 150 m/s at sea level (EAS = TAS): which speed ranks each requirement, the least
 * damping of open- and closed-loop roots up to V_L, the mode frequencies between grid points and
 * the closed-loop stability onset inside a bracket. Expected values follow from the rules in the
 * Javadoc of {@link ClearanceSweep} and {@link RankedFinding}.
 */
class ClearanceRankingTest {
  static final ClearanceRequirements REQ = ClearanceWithoutLoopTest.REQ;

  static final CheckKey GAIN = new CheckKey(CheckKind.GAIN_INCREASE_MARGIN, "rigid_body");
  static final CheckKey PHASE = new CheckKey(CheckKind.PHASE_MARGIN, "rigid_body");
  static final CheckKey PHASE_AE = new CheckKey(CheckKind.PHASE_MARGIN, "aeroelastic");
  static final CheckKey MODE = new CheckKey(CheckKind.STRUCTURAL_MODE, "wing_bending");
  static final CheckKey STABILITY = new CheckKey(CheckKind.CLOSED_LOOP_STABILITY, "");

  /** An at-least check of a key: excess achieved - required. */
  static ClearanceCheck check(CheckKey key, double required, double achieved) {
    CheckUnit unit = switch (key.kind()) {
      case GAIN_INCREASE_MARGIN -> CheckUnit.DECIBEL;
      case CLOSED_LOOP_STABILITY -> CheckUnit.STABILITY;
      default -> CheckUnit.DEGREE;
    };
    return ClearanceCheck.of(key.kind(), key.subject(), key.kind().key() + " " + key.subject(),
        required, achieved, unit, RequiredSense.AT_LEAST, Double.NaN);
  }

  static PointAssessment at(double eas, ClearanceCheck... checks) {
    return new PointAssessment(eas, SpeedRegime.NORMAL_ENVELOPE, 3, ClosedLoopStability.NOT_CHECKED, List.of(checks),
        List.of());
  }

  static MarginOnset onset(CheckKey key, double eas) {
    return new MarginOnset(key, "onset", seaLevel(eas), 0, "", 3, true);
  }

  static Map<CheckKey, RankedFinding> byKey(List<RankedFinding> ranked) {
    return ranked.stream().collect(Collectors.toMap(r -> r.check().key(), r -> r));
  }

  /** The verdict of a met open-loop flutter search (no onset up to 200) and a given least damping. */
  static FlutterClearance flutterRule(double highestG) {
    return FlutterClearanceRule.assess(REQ, List.of(OnsetSearch.openLoop(OptionalDouble.empty(), 200)), highestG);
  }

  @Test
  void eachRequirementRanksAtItsFirstFailureOrWhereItIsTightest() {
    List<PointAssessment> points = List.of(
        // gain: 3, 1 dB of room, then 2 dB short; phase: 15, 5, 5 deg of room (tightest first at
        // 100); the structural mode fails from the first point, by more at the second
        at(50, check(GAIN, 6, 9), check(PHASE, 45, 60), check(MODE, 60, 50), check(PHASE_AE, 30, 40)),
        at(100, check(GAIN, 6, 7), check(PHASE, 45, 50), check(MODE, 60, 20), check(PHASE_AE, 30, 40)),
        at(150, check(GAIN, 6, 4), check(PHASE, 45, 50), check(MODE, 60, 10), check(PHASE_AE, 30, 20),
            check(STABILITY, 1, 0)));
    List<MarginOnset> onsets = List.of(
        onset(GAIN, 80), // outside the bracket (100, 150]: ignored
        onset(PHASE, 140), // another requirement: ignored for the gain
        onset(PHASE, 80), // a met requirement ranks where it is tightest, whatever onsets it has
        onset(GAIN, 130),
        onset(PHASE_AE, 150), onset(PHASE_AE, 120)); // the first inside the bracket counts
    ClearanceSweep.DampingPeak damping = new ClearanceSweep.DampingPeak(-0.05, 100, Double.NaN);
    Map<CheckKey, RankedFinding> r = byKey(ClearanceSweep.rank(points, onsets, flutterRule(-0.05), damping, 150));

    assertEquals(130, r.get(GAIN).speedEasMps(), 0.0);
    assertEquals(4, r.get(GAIN).check().achievedValue(), 0.0);
    assertEquals(Severity.LOOP_MARGIN, r.get(GAIN).severity());
    assertEquals(100, r.get(PHASE).speedEasMps(), 0.0);
    assertEquals(50, r.get(PHASE).check().achievedValue(), 0.0);
    assertTrue(r.get(PHASE).check().passed());
    assertEquals(50, r.get(MODE).speedEasMps(), 0.0);
    assertEquals(50, r.get(MODE).check().achievedValue(), 0.0);
    assertEquals(Severity.STRUCTURAL_COUPLING, r.get(MODE).severity());
    assertEquals(150, r.get(PHASE_AE).speedEasMps(), 0.0);
    assertEquals(150, r.get(STABILITY).speedEasMps(), 0.0);
    // unstable at 150 = V_L: inside the envelope
    assertEquals(Severity.CLOSED_LOOP_INSTABILITY, r.get(STABILITY).severity());
    // the flutter rule's checks follow: a met speed check at its achieved value, the met damping
    // check where damping is least
    assertEquals(200, r.get(new CheckKey(CheckKind.FLUTTER_SPEED, "open_loop")).speedEasMps(), 0.0);
    assertEquals(100, r.get(new CheckKey(CheckKind.MINIMUM_DAMPING, "")).speedEasMps(), 0.0);
    assertEquals(7, r.size());
    // with V_L = 120 the same instability at 150 lies beyond the envelope
    assertEquals(Severity.AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED, byKey(ClearanceSweep.rank(points, onsets,
        flutterRule(-0.05), damping, 120)).get(STABILITY).severity());
  }

  @Test
  void aFailedDampingCheckRanksWhereRootsFirstFallBelowTheMinimum() {
    ClearanceSweep.DampingPeak damping = new ClearanceSweep.DampingPeak(-0.01, 140, 90);
    Map<CheckKey, RankedFinding> r = byKey(ClearanceSweep.rank(List.of(), List.of(), flutterRule(-0.01), damping,
        150));
    RankedFinding d = r.get(new CheckKey(CheckKind.MINIMUM_DAMPING, ""));
    assertFalse(d.check().passed());
    assertEquals(90, d.speedEasMps(), 0.0);
    assertEquals(2, r.size());
  }

  @Test
  void dampingPeakKeepsTheHighestGAndTheFirstSpeedBelowTheMinimum() {
    // limit g_Vg = -0.03: -0.02 is below the minimum damping, -0.03 is not
    ClearanceSweep.DampingPeak d = new ClearanceSweep.DampingPeak(-1, 50, Double.NaN)
        .add(-0.03, 60, -0.03)
        .add(-0.02, 120, -0.03)
        .add(-0.025, 80, -0.03)
        .add(-0.04, 70, -0.03)
        .add(-0.02, 130, -0.03); // as high as the peak, but later: the peak stays where it was first
    assertEquals(-0.02, d.highestG(), 0.0);
    assertEquals(120, d.highestAtEasMps(), 0.0);
    assertEquals(80, d.firstBelowMinimumEasMps(), 0.0);
  }

  @Test
  void leastDampingOfOpenAndClosedLoopRootsUpToTheLimitSpeed() {
    // open loop: g_Vg = -0.025 at 150 m/s (below the minimum from 150); closed loop at 100 m/s:
    // s = -0.2 + 20i has g_Vg = 2 Re/Im = -0.02 (highest, below the minimum from 100). Ignored: a
    // real root (unstable but not oscillatory, g = +inf), a root whose frequency is at the 1e-6
    // rad/s floor, and a point beyond V_L
    BranchCurve open = branch("bending", new double[] {-0.1, -0.05, -0.025, 0.5}, ALL);
    FlutterSolution f = solution(FlutterMethodKind.PK, List.of(open), List.of(), Double.NaN);
    ServoResult servo = InstabilityFindingsTest.servo(List.of(
        point(50, new ClosedLoopRoot(-1, 20, "bending"), new ClosedLoopRoot(0.5, 0, "rigid"),
            new ClosedLoopRoot(0.1, 1e-6, "slow")),
        point(100, new ClosedLoopRoot(-0.2, 20, "bending")),
        point(150, new ClosedLoopRoot(-0.5, 20, "bending")), // g -0.05, at V_L: counted, not highest
        point(200, new ClosedLoopRoot(1, 20, "bending"))), List.of());
    ClearanceSweep.DampingPeak d = ClearanceSweep.highestG(f, servo, REQ);
    assertEquals(-0.02, d.highestG(), 1e-15);
    assertEquals(100, d.highestAtEasMps(), 0.0);
    assertEquals(100, d.firstBelowMinimumEasMps(), 0.0);
    // without the loop: the open-loop root alone
    ClearanceSweep.DampingPeak o = ClearanceSweep.highestG(f, null, REQ);
    assertEquals(-0.025, o.highestG(), 0.0);
    assertEquals(150, o.firstBelowMinimumEasMps(), 0.0);
    // a closed-loop root exactly at V_L counts: s = 0.1 + 20i at 150 m/s has g_Vg = 0.01
    ServoResult atLimit = InstabilityFindingsTest.servo(List.of(point(150, new ClosedLoopRoot(0.1, 20, "bending"))),
        List.of());
    assertEquals(0.01, ClearanceSweep.highestG(f, atLimit, REQ).highestG(), 1e-15);
  }

  @Test
  void modeFrequenciesBetweenGridPoints() {
    // branch frequencies 3, 3.1, 3.2, 3.3 Hz at grid points 0..3: linear in the path parameter
    BranchCurve a = branch("bending", new double[] {-0.1, -0.1, -0.1, -0.1}, ALL);
    BranchCurve gap = branch("torsion", new double[] {-0.1, -0.1, -0.1, -0.1},
        new boolean[] {true, false, true, true});
    BranchCurve still = new BranchCurve("rigid", new double[] {0, 1, 2, 3}, new double[] {50, 100, 150, 200},
        new double[] {50, 100, 150, 200}, new double[] {0, 0, 0, 0}, new double[4], new double[4], new double[4],
        ALL);
    FlutterSolution f = solution(FlutterMethodKind.PK, List.of(a, gap, still), List.of(), Double.NaN);
    List<ModeFrequency> at = ClearanceSweep.modesAt(f, 1.5);
    // a zero frequency (non-oscillatory root) is no structural mode
    assertEquals(List.of("bending", "torsion"), at.stream().map(ModeFrequency::name).toList());
    assertEquals(3.15, at.get(0).frequencyHz(), 1e-12);
    // unconverged at grid point 1: the converged neighbour is used unchanged
    assertEquals(3.2, at.get(1).frequencyHz(), 0.0);
    assertEquals(3.0, ClearanceSweep.modesAt(f, 0.5).get(1).frequencyHz(), 0.0);
    assertEquals(3.025, ClearanceSweep.modesAt(f, 0.25).get(0).frequencyHz(), 1e-12);
    // the last grid point has no next one
    assertEquals(3.3, ClearanceSweep.modesAt(f, 3).get(0).frequencyHz(), 0.0);
    assertEquals(3.0, ClearanceSweep.modesAt(f, 0).get(0).frequencyHz(), 0.0);
  }

  static ServoPoint servoPoint(double eas) {
    return new ServoPoint(eas / 50 - 1, seaLevel(eas), null, List.of(), List.of());
  }

  static MarginOnset stabilityOnset(FlutterCrossing... crossings) {
    ServoResult servo = new ServoResult(List.of(servoPoint(50), servoPoint(100), servoPoint(150)),
        new ClosedLoopResult(List.of(point(50)), List.of(crossings), "fit", 0, List.of(), List.of()));
    MarginOnsets.Bracket b = new MarginOnsets.Bracket(STABILITY, 100, 150, 1, -1);
    return ClearanceSweep.stabilityOnset(b, servo, List.of(), REQ);
  }

  @Test
  void closedLoopStabilityOnsetIsTheRefinedCrossingInsideTheBracket() {
    // crossing() gives 5 root solves and the condition at its speed
    MarginOnset m = stabilityOnset(crossing("torsion", CrossingKind.FLUTTER_RECOVERY, 110, 4, 0),
        crossing("bending", CrossingKind.FLUTTER_ONSET, 90, 3, 0),
        crossing("bending", CrossingKind.FLUTTER_ONSET, 125, 3, 0));
    assertEquals(STABILITY, m.key());
    assertEquals("closed-loop stability (bending)", m.description());
    assertEquals(125, m.condition().speedEasMps(), 0.0);
    assertEquals(5, m.evaluations());
    assertTrue(m.refined());
    assertEquals(0.0, m.requiredValue(), 0.0);
    assertEquals("", m.unit());
    // the bracket's ends count, to a rounding tolerance of 1e-9 m/s
    assertTrue(stabilityOnset(crossing("a", CrossingKind.FLUTTER_ONSET, 100 - 5e-10, 3, 0)).refined());
    assertTrue(stabilityOnset(crossing("a", CrossingKind.FLUTTER_ONSET, 150 + 5e-10, 3, 0)).refined());
    assertFalse(stabilityOnset(crossing("a", CrossingKind.FLUTTER_ONSET, 100 - 1e-7, 3, 0)).refined());
    assertFalse(stabilityOnset(crossing("a", CrossingKind.FLUTTER_ONSET, 150 + 1e-7, 3, 0)).refined());
    // none inside: the failing grid point, not refined
    MarginOnset grid = stabilityOnset();
    assertFalse(grid.refined());
    assertEquals(0, grid.evaluations());
    assertEquals("closed-loop stability", grid.description());
    assertEquals(150, grid.condition().speedEasMps(), 0.0);
  }

  @Test
  void bracketSpeedsAreGridPoints() {
    List<PointAssessment> points = List.of(at(50), at(100), at(150));
    assertEquals(0, ClearanceSweep.indexOfSpeed(points, 50));
    assertEquals(2, ClearanceSweep.indexOfSpeed(points, 150));
    IllegalStateException e = assertThrows(IllegalStateException.class,
        () -> ClearanceSweep.indexOfSpeed(points, 75));
    assertEquals("bracket speed 75.0 is not a grid point", e.getMessage());
  }

  @Test
  void resultVerdictGoverningFindingAndCopies() {
    FlutterClearance met = flutterRule(-0.05);
    PointAssessment ok = at(50, check(GAIN, 6, 9));
    PointAssessment bad = at(100, check(GAIN, 6, 4));
    List<RankedFinding> ranked = ClearanceSweep.rank(List.of(ok, bad), List.of(), met,
        new ClearanceSweep.DampingPeak(-0.05, 50, Double.NaN), 150);
    ClearanceResult failed = new ClearanceResult(List.of(ok, bad), List.of(), met, "table", ranked);
    assertFalse(failed.passed());
    assertEquals(GAIN, failed.governing().orElseThrow().key());
    assertSame(failed.ranked().get(0), failed.governingFinding().orElseThrow());
    assertEquals(List.of(GAIN), failed.failures().stream().map(x -> x.check().key()).toList());
    assertEquals(Severity.RULE, failed.rankingRule());
    assertTrue(new ClearanceResult(List.of(ok), List.of(), met, "table", List.of()).passed());
    assertFalse(new ClearanceResult(List.of(ok), List.of(), flutterRule(0.01), "table", List.of()).passed());
    ClearanceResult empty = new ClearanceResult(List.of(), List.of(), met, "table", List.of());
    assertTrue(empty.governingFinding().isEmpty());
    assertTrue(empty.governing().isEmpty());
    // the ranked list is sorted on construction, whatever order it is given in
    List<RankedFinding> reversed = new java.util.ArrayList<>(ranked);
    java.util.Collections.reverse(reversed);
    assertEquals(GAIN, new ClearanceResult(List.of(), List.of(), met, "t", reversed).governing().orElseThrow().key());
  }
}
