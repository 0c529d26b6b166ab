package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The normalised excess of the structural-mode check, which ranks the governing requirement, in
 * closed form from its definition (see {@link PointAssessor}): max((limit - peak) / max(|limit|,
 * 1 dB), (distance - margin) / max(margin, 5 deg)). Tolerance 1e-12: two divisions.
 */
class StructuralCheckExcessTest {

  private static StructuralModeAssessment mode(double peakDb, double distanceDeg, double limitDb,
      double marginDeg, StructuralStabilisation status) {
    return new StructuralModeAssessment("wing_bending", 4.0, 3.6, 4.4, peakDb, 4.1, distanceDeg,
        3.9, limitDb, marginDeg, status, 100);
  }

  @Test
  void gainStabilisedModeIsRankedByItsGainTerm() {
    // peak -10 dB against -6 dB: (-6 + 10)/6 = 2/3; phase term (20 - 60)/60 = -2/3
    ClearanceCheck c = PointAssessor.structuralCheck(
        mode(-10, 20, -6, 60, StructuralStabilisation.GAIN_STABILISED), 0.1, "");
    assertEquals(2.0 / 3.0, c.normalisedExcess(), 1e-12);
    assertEquals(-6, c.requiredValue(), 0.0);
    assertEquals(-10, c.achievedValue(), 0.0);
    assertEquals(CheckUnit.DECIBEL, c.unit());
    assertEquals(RequiredSense.AT_MOST, c.sense());
    assertEquals(4.1, c.frequencyHz(), 0.0);
    // a peak 1 dB higher must rank worse (smaller excess): (-6 + 9)/6 = 1/2
    ClearanceCheck worse = PointAssessor.structuralCheck(
        mode(-9, 20, -6, 60, StructuralStabilisation.GAIN_STABILISED), 0.1, "");
    assertEquals(0.5, worse.normalisedExcess(), 1e-12);
  }

  @Test
  void nearZeroLimitsUseTheLeastScale() {
    // limit 0 dB: scale max(0, 1 dB) = 1 -> (0 - 0.5)/1 = -0.5; phase term (2 - 3)/5 = -0.2 wins
    ClearanceCheck c = PointAssessor.structuralCheck(
        mode(0.5, 2, 0, 3, StructuralStabilisation.FAILED), 0.1, "");
    assertEquals(-0.2, c.normalisedExcess(), 1e-12);
    // phase term far below: (0 - 60)/60 = -1; gain term (0 - 0.5)/1 = -0.5 governs
    ClearanceCheck g = PointAssessor.structuralCheck(
        mode(0.5, 0, 0, 60, StructuralStabilisation.FAILED), 0.1, "");
    assertEquals(-0.5, g.normalisedExcess(), 1e-12);
  }

  @Test
  void phaseStabilisedModeReportsItsPhaseDistance() {
    // peak +3 dB above -6 dB: gain term (-6 - 3)/6 = -1.5; phase term (75 - 60)/60 = 0.25
    ClearanceCheck c = PointAssessor.structuralCheck(
        mode(3, 75, -6, 60, StructuralStabilisation.PHASE_STABILISED), 0.1, " (normal envelope)");
    assertEquals(0.25, c.normalisedExcess(), 1e-12);
    assertEquals(60, c.requiredValue(), 0.0);
    assertEquals(75, c.achievedValue(), 0.0);
    assertEquals(CheckUnit.DEGREE, c.unit());
    assertEquals(RequiredSense.AT_LEAST, c.sense());
    assertEquals(3.9, c.frequencyHz(), 0.0);
    assertTrue(c.description().contains("phase stabilisation"), c.description());
    assertTrue(c.description().endsWith(" (normal envelope)"), c.description());
    assertTrue(c.description().contains("at 4.000 Hz +- 10.0 %"), c.description());
  }
}
