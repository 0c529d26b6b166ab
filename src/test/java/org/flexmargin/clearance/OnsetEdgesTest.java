package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.RequirementPresets;
import org.flexmargin.model.SpeedRegime;
import org.junit.jupiter.api.Test;

/**
 * Onset brackets and flutter checks at their edges: an excess of exactly zero is met (so a
 * bracket starts there and never ends there), and a search whose tracking was in doubt claims no
 * flutter-free speed beyond its trusted range. Margin-vs-speed here is linear and known exactly:
 * a phase margin of 50 - V/10 deg against 45 deg is met up to V = 50 m/s.
 */
class OnsetEdgesTest {
  /** Invented: V0max 120 m/s, V_L 150 m/s EAS; 1.15 V_L = 172.5 m/s. */
  private static final ClearanceRequirements REQ =
      RequirementPresets.recalledMilitaryAndTransport(120, 150);
  private static final CheckKey PM = new CheckKey(CheckKind.PHASE_MARGIN, "rigid_body");

  /** A point at speed v with a phase margin of 50 - v/10 deg (exact in binary for the v used). */
  private static PointAssessment at(double v) {
    ClearanceCheck pm = ClearanceCheck.of(CheckKind.PHASE_MARGIN, "rigid_body", "phase margin", 45, 50 - v / 10,
        CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1.0);
    return new PointAssessment(v, SpeedRegime.NORMAL_ENVELOPE, 3.0, ClosedLoopStability.NOT_CHECKED, List.of(pm),
        List.of());
  }

  @Test
  void aZeroExcessStartsABracketAndNeverEndsOne() {
    // 40, 50, 60 m/s: excess 1, 0, -1 deg. The crossing is met at 50 (0 >= 0), failed at 60.
    List<MarginOnsets.Bracket> br = MarginOnsets.brackets(List.of(at(40), at(50), at(60)));
    assertEquals(List.of(new MarginOnsets.Bracket(PM, 50, 60, 0.0, -1.0)), br);
    // 30 -> 40 -> 50 only approaches the limit: no bracket
    assertTrue(MarginOnsets.brackets(List.of(at(30), at(40), at(50))).isEmpty());
    // a key missing at one end gives no bracket
    PointAssessment empty = new PointAssessment(60, SpeedRegime.NORMAL_ENVELOPE, 3.0,
        ClosedLoopStability.NOT_CHECKED, List.of(), List.of());
    assertTrue(MarginOnsets.brackets(List.of(at(50), empty)).isEmpty());
    assertTrue(MarginOnsets.brackets(List.of(at(60))).isEmpty());
  }

  @Test
  void theExcessAlongSpeedIsTheLinearMargin() {
    var e = MarginOnsets.excessAlongSpeed(OnsetEdgesTest::at, PM);
    assertEquals(0.0, e.applyAsDouble(50), 0.0);
    assertEquals(-1.5, e.applyAsDouble(65), 0.0);
    assertTrue(Double.isNaN(MarginOnsets.excessAlongSpeed(OnsetEdgesTest::at,
        new CheckKey(CheckKind.PHASE_MARGIN, "aeroelastic")).applyAsDouble(50)), "no such check: NaN");
  }

  @Test
  void worstNormalisedExcessIsTheSmallestOfTheChecks() {
    // phase 45 deg at 0 m/s -> (50 - 45)/45; stability unstable -> -1 / 1
    ClearanceCheck st = ClearanceCheck.of(CheckKind.CLOSED_LOOP_STABILITY, "", "nominal closed-loop stability", 0,
        -1, CheckUnit.STABILITY, RequiredSense.AT_LEAST, Double.NaN);
    PointAssessment p = new PointAssessment(0, SpeedRegime.NORMAL_ENVELOPE, 3.0, ClosedLoopStability.UNSTABLE,
        List.of(at(0).checks().get(0), st), List.of());
    assertEquals(-1.0, p.worstNormalisedExcess().getAsDouble(), 0.0);
    assertEquals(5.0 / 45.0, at(0).worstNormalisedExcess().getAsDouble(), 1e-15);
    assertTrue(new PointAssessment(200, SpeedRegime.BEYOND, 3.0, ClosedLoopStability.NOT_CHECKED, List.of(),
        List.of()).worstNormalisedExcess().isEmpty());
  }

  @Test
  void aSearchInDoubtClaimsOnlyItsTrustedRange() {
    // tracking trusted up to 180 m/s >= 172.5: passes, and says it is unreliable above 180
    OnsetSearch doubt = OnsetSearch.trustedUpTo(OnsetSearch.CLOSED_LOOP, OptionalDouble.of(190), 180);
    ClearanceCheck c = FlutterClearanceRule.assess(REQ, List.of(doubt), -0.05).checks().get(0);
    assertEquals(180.0, c.achievedValue(), 0.0);
    assertTrue(c.passed());
    assertTrue(c.description().startsWith("closed loop: UNRELIABLE, mode tracking in doubt above 180.0 m/s EAS"),
        c.description());
    // trusted only up to 170 m/s: fails by 2.5 m/s
    ClearanceCheck low = FlutterClearanceRule.assess(REQ,
        List.of(OnsetSearch.trustedUpTo(OnsetSearch.OPEN_LOOP, OptionalDouble.empty(), 170)), -0.05).checks().get(0);
    assertFalse(low.passed());
    assertEquals(-2.5, low.excess(), 1e-12);
    assertTrue(low.description().contains("UNRELIABLE"), low.description());
  }
}
