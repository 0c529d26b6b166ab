package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.loop.FirstOrderLag;
import org.flexmargin.loop.Gain;
import org.flexmargin.loop.Integrator;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.LoopMargins;
import org.flexmargin.loop.SeriesBlock;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RequirementPresets;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Every entry point of the clearance package refuses missing or non-finite input with its own
 * field name, before any arithmetic could fail with another message.
 */
class ClearanceInputGuardsTest {
  /** Invented: V0max 120 m/s, V_L 150 m/s EAS. */
  private static final ClearanceRequirements REQ =
      RequirementPresets.recalledMilitaryAndTransport(120, 150);
  private static final LinearBlock LOOP = SeriesBlock.of(new Gain(0.5), new Integrator(1),
      new FirstOrderLag(1), new FirstOrderLag(0.5));
  private static final LoopMarginResult MARGINS = new LoopMargins().analyse(LOOP, 0.01, 100);
  private static final List<ModeFrequency> MODES = List.of(new ModeFrequency("wing bending", 5.0));

  private static void rejects(String field, Executable e) {
    assertEquals(field, assertThrows(InvalidInputException.class, e).fieldPath());
  }

  @Test
  void checksNeedAKindAUnitAndASense() {
    rejects("check", () -> new ClearanceCheck(null, "s", "d", 1, 2, CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1,
        0.2));
    rejects("check", () -> new ClearanceCheck(CheckKind.PHASE_MARGIN, "s", "d", 1, 2, null, RequiredSense.AT_LEAST,
        1, 0.2));
    rejects("check", () -> new ClearanceCheck(CheckKind.PHASE_MARGIN, "s", "d", 1, 2, CheckUnit.DEGREE, null, 1,
        0.2));
  }

  @Test
  void pointAssessmentNeedsItsInputs() {
    rejects("assessment", () -> PointAssessor.assess(REQ, 100, 3, null, List.of(), LOOP));
    rejects("assessment", () -> PointAssessor.assess(null, 100, 3, MARGINS, List.of(), LOOP));
    rejects("assessment", () -> PointAssessor.assess(REQ, 100, 3, MARGINS, null, List.of(), LOOP));
    rejects("assessment", () -> PointAssessor.assess(REQ, 100, 3, MARGINS, ClosedLoopStability.STABLE, null,
        LOOP));
    rejects("assessment", () -> PointAssessor.assess(REQ, 100, 3, null, ClosedLoopStability.STABLE, List.of(),
        LOOP));
    rejects("first_aeroelastic_frequency_hz", () -> PointAssessor.assess(REQ, 100, 0, MARGINS, List.of(), LOOP));
    rejects("loop", () -> PointAssessor.assess(REQ, 100, 3, MARGINS, MODES, null));
    // beyond the modes' regimes the loop is still required when modes are given
    rejects("loop", () -> PointAssessor.assess(REQ, 160, 3, MARGINS, MODES, null));
  }

  @Test
  void speedsAndRatiosMustBeFinite() {
    rejects("speed_eas_mps", () -> RequirementLookup.regime(REQ, Double.POSITIVE_INFINITY));
    rejects("speed_eas_mps", () -> RequirementLookup.regime(REQ, Double.NaN));
    rejects("gain_ratio", () -> Decibel.fromRatio(Double.POSITIVE_INFINITY));
    rejects("gain_ratio", () -> Decibel.fromRatio(Double.NaN));
    rejects("gain_db", () -> Decibel.toRatio(Double.NEGATIVE_INFINITY));
  }

  @Test
  void onsetHelpersNeedTheirInputs() {
    rejects("sweep", () -> MarginOnsets.brackets(null));
    CheckKey key = new CheckKey(CheckKind.PHASE_MARGIN, "rigid_body");
    rejects("excess", () -> MarginOnsets.excessAlongSpeed(null, key));
    rejects("excess", () -> MarginOnsets.excessAlongSpeed(v -> null, null));
  }

  @Test
  void flutterRuleNeedsRequirementsSearchesAndAFiniteDamping() {
    List<OnsetSearch> one = List.of(OnsetSearch.openLoop(OptionalDouble.empty(), 200));
    rejects("flutter_clearance", () -> FlutterClearanceRule.assess(null, one, -0.05));
    rejects("flutter_clearance", () -> FlutterClearanceRule.assess(REQ, null, -0.05));
    rejects("flutter_clearance", () -> FlutterClearanceRule.assess(REQ, List.of(), -0.05));
    rejects("highest_damping_g", () -> FlutterClearanceRule.assess(REQ, one, Double.NaN));
    rejects("highest_damping_g", () -> FlutterClearanceRule.assess(REQ, one, Double.POSITIVE_INFINITY));
    rejects("divergence_eas_mps", () -> FlutterClearanceRule.assess(REQ, one, -0.05, OptionalDouble.of(0)));
    assertTrue(FlutterClearanceRule.assess(REQ, one, -0.05).passed());
  }
}
