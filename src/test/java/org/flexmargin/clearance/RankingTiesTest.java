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

  /** A structural peak check on one mode: limit -6 dB, found {@code peakDb}. */
  private static ClearanceCheck peak(String mode, double peakDb) {
    return ClearanceCheck.of(CheckKind.STRUCTURAL_MODE, mode, "structural peak", -6, peakDb, CheckUnit.DECIBEL,
        RequiredSense.AT_MOST, 20.0);
  }

  @Test
  void findingsEqualButForRoundOffAreOrderedBySubjectWhateverTheirLastDigits() {
    // two modes failing by the same 3 dB, one of them a last-bit different: the order must not
    // depend on which one round-off makes a hair worse
    double worse = Math.nextUp(-3.0);
    for (double[] found : new double[][] {{-3.0, worse}, {worse, -3.0}}) {
      ClearanceCheck tail = peak("tailplane_bending_1", found[0]);
      ClearanceCheck fuselage = peak("fuselage_bending_2", found[1]);
      assertEquals(List.of(fuselage, tail), sorted(RankedFinding.of(tail, 80, VL), RankedFinding.of(fuselage, 80, VL)));
      assertEquals(fuselage, new FlutterClearance(VL, 1.15 * VL, List.of(tail, fuselage)).governing().orElseThrow());
      assertEquals(fuselage, new FlutterClearance(VL, 1.15 * VL, List.of(fuselage, tail)).governing().orElseThrow());
    }
    // a real difference (1e-6 of the excess) still ranks by excess: the tail's peak is higher
    ClearanceCheck tail = peak("tailplane_bending_1", -3.0 + 3e-6);
    ClearanceCheck fuselage = peak("fuselage_bending_2", -3.0);
    assertEquals(List.of(tail, fuselage), sorted(RankedFinding.of(fuselage, 80, VL), RankedFinding.of(tail, 80, VL)));
  }

  @Test
  void rankingKeysKeepNineSignificantDigits() {
    assertEquals(0.123456789, ClearanceCheck.rankingKey(0.1234567891234), 0.0);
    assertEquals(-123.456789, ClearanceCheck.rankingKey(-123.4567890004), 0.0);
    assertEquals(0.0, ClearanceCheck.rankingKey(0.0), 0.0);
    assertEquals(ClearanceCheck.rankingKey(1.0), ClearanceCheck.rankingKey(Math.nextUp(1.0)), 0.0);
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
