package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The severity ranking of failed requirements (docs/verdict.md): severity first, lowest airspeed
 * second; a closed-loop instability inside the envelope governs even when another check has a
 * worse normalised excess or starts at a lower speed.
 */
class SeverityRankingTest {
  /** Invented limit speed V_L, m/s EAS. */
  private static final double VL = 115.0;

  private static final ClearanceCheck STABILITY = ClearanceCheck.of(CheckKind.CLOSED_LOOP_STABILITY, "",
      "nominal closed-loop stability", 0, -1, CheckUnit.STABILITY, RequiredSense.AT_LEAST, Double.NaN);
  private static final ClearanceCheck DAMPING = ClearanceCheck.of(CheckKind.MINIMUM_DAMPING, "",
      "least damping up to V_L", -0.03, 0.02, CheckUnit.DAMPING_G, RequiredSense.AT_MOST, Double.NaN);
  private static final ClearanceCheck PEAK = ClearanceCheck.of(CheckKind.STRUCTURAL_MODE, "fuselage_bending_2",
      "structural mode: gain stabilisation", -6, -2, CheckUnit.DECIBEL, RequiredSense.AT_MOST, 18.5);
  private static final ClearanceCheck GAIN = ClearanceCheck.of(CheckKind.GAIN_INCREASE_MARGIN, "aeroelastic",
      "gain margin", 6, 4, CheckUnit.DECIBEL, RequiredSense.AT_LEAST, 18.5);
  private static final ClearanceCheck OPEN_FLUTTER = ClearanceCheck.of(CheckKind.FLUTTER_SPEED,
      OnsetSearch.OPEN_LOOP, "open loop flutter onset", 132.25, 120, CheckUnit.METRE_PER_SECOND_EAS,
      RequiredSense.AT_LEAST, Double.NaN);

  @Test
  void closedLoopInstabilityInsideTheEnvelopeGovernsOverWorseNormalisedExcess() {
    // damping: excess -0.05 g over a scale 0.03 -> -1.67; stability: -1 over 1 -> -1 (derived):
    // the first release took the smaller normalised excess (damping) as governing
    assertTrue(DAMPING.normalisedExcess() < STABILITY.normalisedExcess());
    List<RankedFinding> r = new ArrayList<>(List.of(RankedFinding.of(DAMPING, 50, VL),
        RankedFinding.of(PEAK, 36, VL), RankedFinding.of(GAIN, 36, VL), RankedFinding.of(OPEN_FLUTTER, 120, VL),
        RankedFinding.of(STABILITY, 62, VL)));
    r.sort(RankedFinding.ORDER);
    assertEquals(List.of(Severity.CLOSED_LOOP_INSTABILITY, Severity.AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED,
        Severity.STRUCTURAL_COUPLING, Severity.LOOP_MARGIN, Severity.DAMPING_LIMIT),
        r.stream().map(RankedFinding::severity).toList());
    assertEquals(STABILITY, r.get(0).check());
  }

  @Test
  void closedLoopInstabilityAboveTheLimitSpeedRanksWithFlutterBelowTheMarginSpeed() {
    assertEquals(Severity.CLOSED_LOOP_INSTABILITY, RankedFinding.severityOf(STABILITY, VL, VL));
    assertEquals(Severity.AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED,
        RankedFinding.severityOf(STABILITY, VL + 0.01, VL));
    ClearanceCheck closedFlutter = ClearanceCheck.of(CheckKind.FLUTTER_SPEED, OnsetSearch.CLOSED_LOOP,
        "closed loop flutter onset", 132.25, 62, CheckUnit.METRE_PER_SECOND_EAS, RequiredSense.AT_LEAST, Double.NaN);
    assertEquals(Severity.CLOSED_LOOP_INSTABILITY, RankedFinding.severityOf(closedFlutter, 62, VL));
    assertEquals(Severity.AEROELASTIC_INSTABILITY_BELOW_MARGIN_SPEED,
        RankedFinding.severityOf(OPEN_FLUTTER, 62, VL), "open-loop flutter is severity 2 wherever it lies");
  }

  @Test
  void sameSeverityIsRankedByLowestSpeedAndMetChecksComeLast() {
    ClearanceCheck peak2 = ClearanceCheck.of(CheckKind.STRUCTURAL_MODE, "tailplane_bending_1",
        "structural mode: gain stabilisation", -6, 3, CheckUnit.DECIBEL, RequiredSense.AT_MOST, 30);
    ClearanceCheck met = ClearanceCheck.of(CheckKind.PHASE_MARGIN, "rigid_body", "phase margin", 45, 45.5,
        CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1.0);
    List<RankedFinding> r = new ArrayList<>(List.of(RankedFinding.of(met, 40, VL), RankedFinding.of(peak2, 80, VL),
        RankedFinding.of(PEAK, 36, VL)));
    r.sort(RankedFinding.ORDER);
    assertEquals(List.of(PEAK, peak2, met), r.stream().map(RankedFinding::check).toList());
    assertTrue(r.get(0).describe().startsWith("severity 3 of 5"), r.get(0).describe());
    assertTrue(r.get(2).describe().startsWith("met;"), r.get(2).describe());
  }
}
