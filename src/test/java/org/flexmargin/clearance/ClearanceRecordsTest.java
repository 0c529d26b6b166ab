package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The clearance records refuse incomplete or non-finite values with the field concerned, accept
 * their documented limits, and describe findings in words with the unit of the check.
 */
class ClearanceRecordsTest {

  private static void rejects(String field, Executable e) {
    InvalidInputException x = assertThrows(InvalidInputException.class, e);
    assertTrue(x.getMessage().contains(field), x.getMessage());
  }

  private static ClearanceCheck check(double required, double achieved, CheckUnit unit, double fHz) {
    return new ClearanceCheck(CheckKind.PHASE_MARGIN, "rigid_body", "phase margin at 1 Hz", required, achieved,
        unit, RequiredSense.AT_LEAST, fHz, (achieved - required) / 45);
  }

  @Test
  void checkKeysAndChecksNameTheMissingField() {
    rejects("kind", () -> new CheckKey(null, "x"));
    rejects("subject", () -> new CheckKey(CheckKind.PHASE_MARGIN, null));
    assertDoesNotThrow(() -> new CheckKey(CheckKind.PHASE_MARGIN, ""));
    rejects("check", () -> new ClearanceCheck(null, "s", "d", 1, 2, CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1, 0));
    rejects("check", () -> new ClearanceCheck(CheckKind.PHASE_MARGIN, "s", "d", 1, 2, null, RequiredSense.AT_LEAST,
        1, 0));
    rejects("check", () -> new ClearanceCheck(CheckKind.PHASE_MARGIN, "s", "d", 1, 2, CheckUnit.DEGREE, null, 1, 0));
    rejects("check.description", () -> new ClearanceCheck(CheckKind.PHASE_MARGIN, null, "d", 1, 2,
        CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1, 0));
    rejects("check.description", () -> new ClearanceCheck(CheckKind.PHASE_MARGIN, "s", null, 1, 2,
        CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1, 0));
    rejects("check.description", () -> new ClearanceCheck(CheckKind.PHASE_MARGIN, "s", " ", 1, 2,
        CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1, 0));
    rejects("check.values", () -> check(Double.NaN, 2, CheckUnit.DEGREE, 1));
    rejects("check.values", () -> check(45, Double.POSITIVE_INFINITY, CheckUnit.DEGREE, 1));
    rejects("check.frequency_hz", () -> check(45, 50, CheckUnit.DEGREE, -1e-9));
    rejects("check.frequency_hz", () -> check(45, 50, CheckUnit.DEGREE, Double.POSITIVE_INFINITY));
    assertDoesNotThrow(() -> check(45, 50, CheckUnit.DEGREE, 0.0));
    assertDoesNotThrow(() -> check(45, 50, CheckUnit.DEGREE, Double.NaN));
  }

  @Test
  void rankedFindingsNeedACheckASeverityAndASpeed() {
    ClearanceCheck c = check(45, 30, CheckUnit.DEGREE, 1.0);
    rejects("ranked_finding", () -> new RankedFinding(null, Severity.LOOP_MARGIN, 10));
    rejects("ranked_finding", () -> new RankedFinding(c, null, 10));
    rejects("ranked_finding.speed_eas_mps", () -> new RankedFinding(c, Severity.LOOP_MARGIN, -1e-9));
    rejects("ranked_finding.speed_eas_mps", () -> new RankedFinding(c, Severity.LOOP_MARGIN, Double.NaN));
    rejects("ranked_finding.speed_eas_mps",
        () -> new RankedFinding(c, Severity.LOOP_MARGIN, Double.POSITIVE_INFINITY));
    assertDoesNotThrow(() -> new RankedFinding(c, Severity.LOOP_MARGIN, 0.0));
  }

  @Test
  void findingsAreDescribedWithTheirUnitAndSense() {
    RankedFinding failed = new RankedFinding(check(45, 30, CheckUnit.DEGREE, 1.0), Severity.LOOP_MARGIN, 61.5);
    assertFalse(failed.check().passed());
    assertEquals("severity " + Severity.LOOP_MARGIN.rank() + " of " + Severity.values().length + " ("
        + Severity.LOOP_MARGIN.words() + ") from 61.50 m/s EAS: phase margin at 1 Hz "
        + "(required at least 45.00 deg, achieved 30.00 deg)", failed.describe());
    RankedFinding met = new RankedFinding(new ClearanceCheck(CheckKind.STRUCTURAL_MODE, "m", "peak", -6, -9,
        CheckUnit.DECIBEL, RequiredSense.AT_MOST, 4.0, 0.5), Severity.STRUCTURAL_COUPLING, 40);
    assertTrue(met.check().passed());
    assertEquals("met; closest to its limit at 40.00 m/s EAS: peak (required at most -6.000 dB, achieved -9.000 dB)",
        met.describe());
    RankedFinding unstable = new RankedFinding(new ClearanceCheck(CheckKind.CLOSED_LOOP_STABILITY, "", "stability",
        0, -1, CheckUnit.STABILITY, RequiredSense.AT_LEAST, Double.NaN, -1), Severity.CLOSED_LOOP_INSTABILITY, 70);
    assertTrue(unstable.describe().endsWith("stability (required stable, found unstable)"), unstable.describe());
    RankedFinding g = new RankedFinding(new ClearanceCheck(CheckKind.MINIMUM_DAMPING, "", "damping", 0.03, 0.05,
        CheckUnit.DAMPING_G, RequiredSense.AT_LEAST, 2.0, 0.4), Severity.DAMPING_LIMIT, 20);
    assertTrue(g.describe().contains("required at least 0.03000 g, achieved 0.05000 g"), g.describe());
    assertEquals("damping_limit", Severity.DAMPING_LIMIT.key());
    assertEquals("phase_margin", CheckKind.PHASE_MARGIN.key());
  }

  @Test
  void onsetSearchesKeepOnsetsWithinTheAnalysedRange() {
    rejects("onset_eas_mps", () -> new OnsetSearch("open_loop", null, 100));
    rejects("onset_eas_mps", () -> new OnsetSearch("open_loop", OptionalDouble.of(100.001), 100));
    assertDoesNotThrow(() -> new OnsetSearch("open_loop", OptionalDouble.of(100.0), 100));
    OnsetSearch within = OnsetSearch.trustedUpTo("open_loop", OptionalDouble.of(80), 80);
    assertEquals(80.0, within.onsetEasMps().getAsDouble(), 0.0);
    assertFalse(within.trackingInDoubt());
    OnsetSearch beyond = OnsetSearch.trustedUpTo("open_loop", OptionalDouble.of(80.5), 80);
    assertTrue(beyond.onsetEasMps().isEmpty());
    assertTrue(beyond.trackingInDoubt());
    assertEquals(80.0, beyond.highestAnalysedEasMps(), 0.0);
    assertTrue(OnsetSearch.trustedUpTo("open_loop", OptionalDouble.empty(), 80).trackingInDoubt());
  }

  @Test
  void bandsAndRegimesRefuseNonFiniteValues() {
    rejects("frequency_hz", () -> RequirementLookup.band(Double.NaN, 2));
    rejects("frequency_hz", () -> RequirementLookup.band(-0.1, 2));
    rejects("frequency_hz", () -> RequirementLookup.band(Double.POSITIVE_INFINITY, 2));
    rejects("first_aeroelastic_frequency_hz", () -> RequirementLookup.band(1, 0));
    rejects("first_aeroelastic_frequency_hz", () -> RequirementLookup.band(1, Double.POSITIVE_INFINITY));
    assertEquals(FrequencyBand.AEROELASTIC, RequirementLookup.band(2.0, 2.0));
    assertEquals(FrequencyBand.RIGID_BODY, RequirementLookup.band(FrequencyBand.LOW_FREQUENCY_EDGE_HZ, 2.0));
    assertEquals(FrequencyBand.LOW_FREQUENCY, RequirementLookup.band(0.0, 2.0));
  }
}
