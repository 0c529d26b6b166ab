package org.flexmargin.sweep;

import static org.flexmargin.sweep.InstabilityFindingsTest.ALL;
import static org.flexmargin.sweep.InstabilityFindingsTest.NO_DIVERGENCE;
import static org.flexmargin.sweep.InstabilityFindingsTest.branch;
import static org.flexmargin.sweep.InstabilityFindingsTest.crossing;
import static org.flexmargin.sweep.InstabilityFindingsTest.solution;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.Severity;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.RequirementPresets;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;

/**
 * The flutter clearance rule of a case without a flight-control loop, judged on hand-made
 * open-loop results over grid speeds 50, 100, 150, 200 m/s at sea level (EAS = TAS). With V_L =
 * 150 m/s EAS, the recalled preset asks for no flutter up to 1.15 V_L = 172.5 m/s EAS and a
 * damping g of at least 0.03 up to V_L, i.e. a V-g value g_Vg &lt;= -0.03 (class comments of the
 * rule and the requirements table); every expected value below follows from those definitions.
 */
class ClearanceWithoutLoopTest {
  static final ClearanceRequirements REQ = RequirementPresets.recalledMilitaryAndTransport(120, 150);
  static final PlannedPath PATH = new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 200, 4));

  static ClearanceResult assess(FlutterSolution f, DivergenceResult d) {
    return new ClearanceSweep().assess(null, null, null, PATH, f, d, null, REQ, 0.05);
  }

  static ClearanceCheck check(ClearanceResult r, CheckKind kind) {
    return r.flutter().checks().stream().filter(c -> c.kind() == kind).findFirst().orElseThrow();
  }

  static RankedFinding ranked(ClearanceResult r, CheckKind kind) {
    return r.ranked().stream().filter(x -> x.check().kind() == kind).findFirst().orElseThrow();
  }

  @Test
  void failingFlutterDivergenceAndDampingAreRankedBySeverityThenSpeed() {
    // bending peaks at g_Vg = -0.02 exactly at V_L (150); its +0.01 at 200 m/s lies beyond V_L.
    // torsion is below the minimum (g_Vg > -0.03) already at 50 m/s, so the damping check ranks at
    // 50 m/s although the least damping occurs at 150 m/s. An unconverged point and a NaN point
    // with larger g are ignored.
    BranchCurve bending = branch("bending", new double[] {-0.1, -0.05, -0.02, 0.01}, ALL);
    BranchCurve torsion = branch("torsion", new double[] {-0.025, -0.04, -0.06, -0.08}, ALL);
    BranchCurve lost = branch("lost", new double[] {-0.5, 0.5, Double.NaN, -0.5},
        new boolean[] {true, false, true, true});
    List<FlutterCrossing> xs = List.of(
        crossing("bending", CrossingKind.FLUTTER_RECOVERY, 60, 3.0, 0),
        crossing("torsion", CrossingKind.FLUTTER_ONSET, 190, 4.0, 0),
        crossing("bending", CrossingKind.DAMPING_BELOW_LIMIT, 110, 3.1, -0.03),
        crossing("bending", CrossingKind.FLUTTER_ONSET, 160, 3.2, 0));
    DivergenceResult d = new DivergenceResult(true, 12250, 141.42, new double[] {1, 0}, 1e-12, 0, "");
    ClearanceResult r = assess(solution(FlutterMethodKind.PK, List.of(bending, torsion, lost), xs, Double.NaN), d);

    assertTrue(r.points().isEmpty());
    assertTrue(r.marginOnsets().isEmpty());
    assertEquals(REQ.source(), r.requirementsSource());
    assertFalse(r.passed());
    // lowest onset (recoveries and damping crossings are no onsets): 160 < 172.5, fails
    ClearanceCheck speed = check(r, CheckKind.FLUTTER_SPEED);
    assertEquals("open_loop", speed.subject());
    assertEquals(160, speed.achievedValue(), 0.0);
    assertEquals(172.5, speed.requiredValue(), 1e-12);
    assertFalse(speed.passed());
    assertEquals(141.42, check(r, CheckKind.DIVERGENCE_SPEED).achievedValue(), 0.0);
    ClearanceCheck damping = check(r, CheckKind.MINIMUM_DAMPING);
    assertEquals(0.02, damping.achievedValue(), 1e-15);
    assertFalse(damping.passed());
    // ranking speeds: onset speeds for flutter and divergence, first speed below the minimum
    assertEquals(160, ranked(r, CheckKind.FLUTTER_SPEED).speedEasMps(), 0.0);
    assertEquals(141.42, ranked(r, CheckKind.DIVERGENCE_SPEED).speedEasMps(), 0.0);
    assertEquals(50, ranked(r, CheckKind.MINIMUM_DAMPING).speedEasMps(), 0.0);
    // severity 2 (divergence before flutter: lower speed), then the damping limit (5)
    assertEquals(List.of(CheckKind.DIVERGENCE_SPEED, CheckKind.FLUTTER_SPEED, CheckKind.MINIMUM_DAMPING),
        r.ranked().stream().map(x -> x.check().kind()).toList());
    assertEquals(Severity.AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED, r.ranked().get(1).severity());
    assertEquals(Severity.DAMPING_LIMIT, r.ranked().get(2).severity());
    assertEquals(CheckKind.DIVERGENCE_SPEED, r.governing().orElseThrow().kind());
    assertEquals(3, r.failures().size());
  }

  @Test
  void aCleanSweepPassesAndRanksTheDampingWhereItIsLeast() {
    // no onset: the achieved flutter speed is the top of the path (200 >= 172.5); no divergence
    // check at all; least damping g_Vg = -0.035 at 100 m/s (the -0.03 at 200 lies beyond V_L)
    BranchCurve bending = branch("bending", new double[] {-0.1, -0.035, -0.04, -0.03}, ALL);
    BranchCurve torsion = branch("torsion", new double[] {-0.06, -0.05, -0.045, -0.02}, ALL);
    ClearanceResult r = assess(solution(FlutterMethodKind.PK, List.of(bending, torsion), List.of(), Double.NaN),
        NO_DIVERGENCE);
    assertTrue(r.passed());
    assertTrue(r.failures().isEmpty());
    assertEquals(2, r.flutter().checks().size());
    assertTrue(r.flutter().checks().stream().noneMatch(c -> c.kind() == CheckKind.DIVERGENCE_SPEED));
    assertEquals(200, check(r, CheckKind.FLUTTER_SPEED).achievedValue(), 0.0);
    assertTrue(check(r, CheckKind.FLUTTER_SPEED).description().contains("no flutter found up to 200"));
    assertEquals(0.035, check(r, CheckKind.MINIMUM_DAMPING).achievedValue(), 1e-15);
    assertEquals(100, ranked(r, CheckKind.MINIMUM_DAMPING).speedEasMps(), 0.0);
    assertEquals(200, ranked(r, CheckKind.FLUTTER_SPEED).speedEasMps(), 0.0);
    // met requirements rank closest to the limit first: damping (0.035 - 0.03) / 0.03 = 0.167
    // against flutter (200 - 172.5) / 172.5 = 0.159 (normalised excess, ClearanceCheck.of)
    assertEquals(List.of(CheckKind.FLUTTER_SPEED, CheckKind.MINIMUM_DAMPING),
        r.ranked().stream().map(x -> x.check().kind()).toList());
  }

  @Test
  void aRootExactlyAtTheMinimumDampingIsNotBelowIt() {
    // g_Vg = -0.03 at 50 m/s meets the minimum exactly (both edges pass); -0.02 at 100 m/s does
    // not, so the first speed below the minimum is 100 and the least damping 0.02 is found there
    BranchCurve b = branch("bending", new double[] {-0.03, -0.02, -0.1, -0.1}, ALL);
    ClearanceResult r = assess(solution(FlutterMethodKind.PK, List.of(b), List.of(), Double.NaN), NO_DIVERGENCE);
    assertEquals(100, ranked(r, CheckKind.MINIMUM_DAMPING).speedEasMps(), 0.0);
    assertFalse(check(r, CheckKind.MINIMUM_DAMPING).passed());
    BranchCurve edge = branch("bending", new double[] {-0.03, -0.05, -0.1, -0.1}, ALL);
    ClearanceResult met = assess(solution(FlutterMethodKind.PK, List.of(edge), List.of(), Double.NaN),
        NO_DIVERGENCE);
    assertTrue(check(met, CheckKind.MINIMUM_DAMPING).passed());
    assertEquals(50, ranked(met, CheckKind.MINIMUM_DAMPING).speedEasMps(), 0.0);
  }

  @Test
  void withoutAnyRootUpToTheLimitSpeedTheDampingHasNothingToFail() {
    // no branch at all: the least damping starts at g_Vg = -1 (achieved 1) ranked at 0 m/s; a branch
    // whose points all lie beyond V_L (here V_L = 40 m/s) ranks at its first speed
    ClearanceResult none = assess(solution(FlutterMethodKind.PK, List.of(), List.of(), Double.NaN), NO_DIVERGENCE);
    assertEquals(1.0, check(none, CheckKind.MINIMUM_DAMPING).achievedValue(), 0.0);
    assertEquals(0.0, ranked(none, CheckKind.MINIMUM_DAMPING).speedEasMps(), 0.0);
    ClearanceRequirements low = RequirementPresets.recalledMilitaryAndTransport(30, 40);
    BranchCurve b = branch("bending", new double[] {0.1, 0.1, 0.1, 0.1}, ALL);
    ClearanceResult beyond = new ClearanceSweep().assess(null, null, null, PATH,
        solution(FlutterMethodKind.PK, List.of(b), List.of(), Double.NaN), NO_DIVERGENCE, null, low, 0.05);
    assertEquals(1.0, check(beyond, CheckKind.MINIMUM_DAMPING).achievedValue(), 0.0);
    assertEquals(50, ranked(beyond, CheckKind.MINIMUM_DAMPING).speedEasMps(), 0.0);
  }

  @Test
  void trackingInDoubtClaimsNoFlutterFreeSpeedBeyondTheTrustedRange() {
    // trouble at path parameter 2.5: trusted to grid point 1 (100 m/s, TrackingTrust)
    BranchCurve b = branch("bending", new double[] {-0.1, -0.1, -0.1, -0.1}, ALL);
    ClearanceResult beyond = assess(solution(FlutterMethodKind.PK, List.of(b),
        List.of(crossing("bending", CrossingKind.FLUTTER_ONSET, 160, 3.2, 0)), 2.5), NO_DIVERGENCE);
    ClearanceCheck doubt = check(beyond, CheckKind.FLUTTER_SPEED);
    assertEquals(100, doubt.achievedValue(), 0.0);
    assertTrue(doubt.description().contains("UNRELIABLE"), doubt.description());
    assertFalse(doubt.passed());
    // an onset inside the trusted range counts as found
    ClearanceResult inside = assess(solution(FlutterMethodKind.PK, List.of(b),
        List.of(crossing("bending", CrossingKind.FLUTTER_ONSET, 90, 3.2, 0)), 2.5), NO_DIVERGENCE);
    assertEquals(90, check(inside, CheckKind.FLUTTER_SPEED).achievedValue(), 0.0);
    assertFalse(check(inside, CheckKind.FLUTTER_SPEED).description().contains("UNRELIABLE"));
  }
}
