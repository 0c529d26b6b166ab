package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RequirementPresets;
import org.junit.jupiter.api.Test;

/**
 * The rule "V_F,EAS &gt;= 1.15 V_L and g &lt;= -0.03 for every root up to V_L" (MIL-A-8870C,
 * from memory; 15 % EAS also 14 CFR/CS 25.629(b)(1); docs/validation.md 10.3), in the
 * V-g sign convention (g negative = stable), at its edges.
 */
class FlutterClearanceRuleTest {
  /** Invented: V0max 120, V_L 150 m/s EAS; 1.15 V_L = 172.5 m/s. */
  private static final ClearanceRequirements REQ =
      RequirementPresets.recalledMilitaryAndTransport(120, 150);
  private static final double REQUIRED = REQ.requiredFlutterSpeedEasMps();

  private static FlutterClearance rule(OptionalDouble open, double top, double g) {
    return FlutterClearanceRule.assess(REQ, List.of(OnsetSearch.openLoop(open, top)), g);
  }

  private static ClearanceCheck check(FlutterClearance c, CheckKind kind) {
    return c.checks().stream().filter(x -> x.kind() == kind).findFirst().orElseThrow();
  }

  @Test
  void requiredSpeedIsFifteenPercentAboveLimitSpeed() {
    // 1.15 x 150 = 172.5 (derived); 1e-12 covers the binary representation of 1.15
    assertEquals(172.5, REQUIRED, 1e-12);
  }

  @Test
  void onsetExactlyAtTheRequiredSpeedPassesAndJustBelowFails() {
    assertTrue(rule(OptionalDouble.of(REQUIRED), 250, -0.05).passed());
    FlutterClearance below = rule(OptionalDouble.of(Math.nextDown(REQUIRED)), 250, -0.05);
    assertFalse(below.passed());
    ClearanceCheck v = check(below, CheckKind.FLUTTER_SPEED);
    assertFalse(v.passed());
    assertEquals(v, below.governing().orElseThrow());
    FlutterClearance low = rule(OptionalDouble.of(160), 250, -0.05);
    assertEquals(160 - REQUIRED, check(low, CheckKind.FLUTTER_SPEED).excess(), 1e-12);
  }

  @Test
  void noOnsetClearsOnlyIfTheAnalysisReachedTheRequiredSpeed() {
    assertTrue(rule(OptionalDouble.empty(), REQUIRED, -0.05).passed());
    FlutterClearance shortRange = rule(OptionalDouble.empty(), 170, -0.05);
    ClearanceCheck v = check(shortRange, CheckKind.FLUTTER_SPEED);
    assertFalse(v.passed());
    assertEquals(170.0, v.achievedValue(), 0.0);
    assertTrue(v.description().contains("no flutter found"), v.description());
  }

  @Test
  void dampingEdgeIsMinusPointZeroThree() {
    // g <= -0.03 passes (V-g: g ~ -2 zeta, so zeta >= 1.5 %); -0.0299 fails; 0 (neutral) fails.
    assertTrue(check(rule(OptionalDouble.empty(), 200, -0.03), CheckKind.MINIMUM_DAMPING)
        .passed());
    ClearanceCheck d = check(rule(OptionalDouble.empty(), 200, -0.0299),
        CheckKind.MINIMUM_DAMPING);
    assertFalse(d.passed());
    assertEquals(-0.03, d.requiredValue(), 0.0);
    assertEquals(-0.0001, d.excess(), 1e-15);
    assertFalse(rule(OptionalDouble.empty(), 200, 0.0).passed());
  }

  @Test
  void openAndClosedLoopAreBothChecked() {
    FlutterClearance c = FlutterClearanceRule.assess(REQ, List.of(
        OnsetSearch.openLoop(OptionalDouble.of(190), 250),
        OnsetSearch.closedLoop(OptionalDouble.of(165), 250)), -0.04);
    assertFalse(c.passed());
    assertEquals(3, c.checks().size());
    assertEquals("closed_loop", c.governing().orElseThrow().subject());
    assertThrows(InvalidInputException.class, () -> FlutterClearanceRule.assess(REQ, List.of(
        OnsetSearch.openLoop(OptionalDouble.of(190), 250),
        OnsetSearch.openLoop(OptionalDouble.of(190), 250)), -0.04));
    assertThrows(InvalidInputException.class,
        () -> OnsetSearch.openLoop(OptionalDouble.of(260), 250));
  }
}
