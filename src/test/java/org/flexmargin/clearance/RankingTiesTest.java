package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The ranking order at its ties (docs/verdict.md): met requirements are ordered by normalised
 * excess alone, whatever their severity or speed; failed ones of equal severity and speed by
 * normalised excess. Normalised excesses are derived by hand: excess / max(|required|, least scale).
 */
class RankingTiesTest {
  /** Invented limit speed V_L, m/s EAS. */
  private static final double VL = 115.0;

  private static ClearanceCheck phase(double achievedDeg) {
    return ClearanceCheck.of(CheckKind.PHASE_MARGIN, "rigid_body", "phase margin", 45, achievedDeg,
        CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1.0);
  }

  private static List<ClearanceCheck> sorted(RankedFinding... findings) {
    List<RankedFinding> r = new ArrayList<>(List.of(findings));
    r.sort(RankedFinding.ORDER);
    return r.stream().map(RankedFinding::check).toList();
  }

  @Test
  void metRequirementsAreOrderedByNormalisedExcessOnly() {
    // stable loop: excess +1 over scale 1 -> normalised 1; phase margin 50 deg against 45: 5/45 = 0.111
    ClearanceCheck stable = ClearanceCheck.of(CheckKind.CLOSED_LOOP_STABILITY, "", "nominal closed-loop stability",
        0, 1, CheckUnit.STABILITY, RequiredSense.AT_LEAST, Double.NaN);
    ClearanceCheck pm = phase(50);
    assertEquals(1.0, stable.normalisedExcess(), 0.0);
    assertEquals(5.0 / 45.0, pm.normalisedExcess(), 1e-15);
    // the stability check has the more serious severity (1) and the lower speed, yet is further
    // from its limit: the phase margin comes first
    assertEquals(List.of(pm, stable), sorted(RankedFinding.of(stable, 30, VL), RankedFinding.of(pm, 100, VL)));
    assertEquals(List.of(pm, stable), sorted(new RankedFinding(stable, Severity.CLOSED_LOOP_INSTABILITY, 30),
        new RankedFinding(pm, Severity.DAMPING_LIMIT, 30)));
  }

  @Test
  void failedRequirementsOfEqualSeverityAndSpeedAreOrderedByNormalisedExcess() {
    // 40 deg: -5/45 = -0.111; 30 deg: -15/45 = -0.333 (worse)
    ClearanceCheck near = phase(40);
    ClearanceCheck far = phase(30);
    assertEquals(List.of(far, near), sorted(RankedFinding.of(near, 80, VL), RankedFinding.of(far, 80, VL)));
    // a lower speed still comes before a worse excess
    assertEquals(List.of(near, far), sorted(RankedFinding.of(far, 80, VL), RankedFinding.of(near, 79, VL)));
  }

  @Test
  void aMetStabilityCheckReadsStable() {
    ClearanceCheck stable = ClearanceCheck.of(CheckKind.CLOSED_LOOP_STABILITY, "", "nominal closed-loop stability",
        0, 1, CheckUnit.STABILITY, RequiredSense.AT_LEAST, Double.NaN);
    assertEquals("met; closest to its limit at 30.00 m/s EAS: nominal closed-loop stability "
        + "(required stable, found stable)", RankedFinding.of(stable, 30, VL).describe());
  }

  @Test
  void everySeverityHasItsOwnWords() {
    assertEquals(List.of("closed-loop instability inside the envelope",
        "flutter or divergence below the required margin speed", "structural-coupling stabilisation not met",
        "loop margin below requirement", "damping limit not met"),
        java.util.Arrays.stream(Severity.values()).map(Severity::words).toList());
    assertTrue(Severity.RULE.contains("(5) damping limits"));
  }
}
