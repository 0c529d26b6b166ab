package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.RequirementPresets;
import org.flexmargin.model.SpeedRegime;
import org.junit.jupiter.api.Test;

/**
 * The preset table and its lookup at every cell and every edge.
 *
 * <p>Expected values: MIL-F-9490D (6 Jun 1975) Table III as recalled in docs/validation.md 10.1 -
 * values from memory, moderate confidence, to be verified against the specification text (the
 * 6 dB / 45 deg headline is published): normal envelope 4.5 dB/30 deg below 0.06 Hz, 6 dB/45 deg
 * rigid body, 8 dB/60 deg aeroelastic; at V_L 3.0/20, 4.5/30, 6.0/45; at 1.15 V_L 0 dB/0 deg.
 * Exact comparisons: the lookup must return the stored cell, no arithmetic is involved.
 */
class RequirementLookupTest {
  /** Invented speeds: V0max 120 m/s, V_L 150 m/s EAS (1.15 V_L = 172.5 m/s). */
  private static final ClearanceRequirements PRESET =
      RequirementPresets.recalledMilitaryAndTransport(120, 150);
  private static final double F1_HZ = 4.0;

  private static void assertCell(double gmDb, double pmDeg, double fHz, double vEas) {
    MarginCell c = RequirementLookup.required(PRESET, fHz, F1_HZ, vEas).orElseThrow();
    assertEquals(gmDb, c.gainMarginDb(), 0.0, "GM at " + fHz + " Hz, " + vEas + " m/s");
    assertEquals(pmDeg, c.phaseMarginDeg(), 0.0, "PM at " + fHz + " Hz, " + vEas + " m/s");
  }

  @Test
  void everyCellOfTheRecalledTable() {
    // MIL-F-9490D Table III, from memory (docs/validation.md 10.1). Rows: 0.03 Hz, 1 Hz, 10 Hz.
    double[] f = {0.03, 1.0, 10.0};
    double[] v = {100, 140, 160};
    double[][] gm = {{4.5, 3.0, 0}, {6.0, 4.5, 0}, {8.0, 6.0, 0}};
    double[][] pm = {{30, 20, 0}, {45, 30, 0}, {60, 45, 0}};
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        assertCell(gm[i][j], pm[i][j], f[i], v[j]);
      }
    }
    assertTrue(RequirementLookup.required(PRESET, 1.0, F1_HZ, 180).isEmpty(), "beyond 1.15 V_L");
  }

  @Test
  void bandEdgesBelongToTheHigherBand() {
    assertEquals(FrequencyBand.LOW_FREQUENCY, RequirementLookup.band(Math.nextDown(0.06), F1_HZ));
    assertEquals(FrequencyBand.RIGID_BODY, RequirementLookup.band(0.06, F1_HZ));
    assertEquals(FrequencyBand.RIGID_BODY, RequirementLookup.band(Math.nextDown(F1_HZ), F1_HZ));
    assertEquals(FrequencyBand.AEROELASTIC, RequirementLookup.band(F1_HZ, F1_HZ));
    assertEquals(FrequencyBand.LOW_FREQUENCY, RequirementLookup.band(0.0, F1_HZ));
    // first aeroelastic mode at or below 0.06 Hz: aeroelastic takes precedence, no rigid band
    assertEquals(FrequencyBand.AEROELASTIC, RequirementLookup.band(0.05, 0.05));
    assertEquals(FrequencyBand.LOW_FREQUENCY, RequirementLookup.band(0.04, 0.05));
    assertEquals(FrequencyBand.AEROELASTIC, RequirementLookup.band(0.06, 0.05));
    // the cells at the edges, normal envelope (from memory, as above)
    assertCell(4.5, 30, Math.nextDown(0.06), 100);
    assertCell(6.0, 45, 0.06, 100);
    assertCell(6.0, 45, Math.nextDown(F1_HZ), 100);
    assertCell(8.0, 60, F1_HZ, 100);
  }

  @Test
  void speedEdgesBelongToTheLowerRegime() {
    double ext = PRESET.extendedSpeedEasMps();
    assertEquals(172.5, ext, 1e-12); // 1.15 x 150, derived; 1e-12 covers the binary 1.15
    assertEquals(SpeedRegime.NORMAL_ENVELOPE, RequirementLookup.regime(PRESET, 0));
    assertEquals(SpeedRegime.NORMAL_ENVELOPE, RequirementLookup.regime(PRESET, 120));
    assertEquals(SpeedRegime.UP_TO_LIMIT_SPEED, RequirementLookup.regime(PRESET, Math.nextUp(120.0)));
    assertEquals(SpeedRegime.UP_TO_LIMIT_SPEED, RequirementLookup.regime(PRESET, 150));
    assertEquals(SpeedRegime.UP_TO_115_LIMIT_SPEED,
        RequirementLookup.regime(PRESET, Math.nextUp(150.0)));
    assertEquals(SpeedRegime.UP_TO_115_LIMIT_SPEED, RequirementLookup.regime(PRESET, ext));
    assertEquals(SpeedRegime.BEYOND, RequirementLookup.regime(PRESET, Math.nextUp(ext)));
    // rigid-body row at each speed edge (from memory, as above)
    assertCell(6.0, 45, 1.0, 120);
    assertCell(4.5, 30, 1.0, Math.nextUp(120.0));
    assertCell(4.5, 30, 1.0, 150);
    assertCell(0, 0, 1.0, Math.nextUp(150.0));
    assertCell(0, 0, 1.0, ext);
    assertTrue(RequirementLookup.required(PRESET, 1.0, F1_HZ, Math.nextUp(ext)).isEmpty());
  }

  @Test
  void equalOperatingAndLimitSpeedsLeaveNoUpToLimitRegime() {
    ClearanceRequirements r = RequirementPresets.recalledMilitaryAndTransport(150, 150);
    assertEquals(SpeedRegime.NORMAL_ENVELOPE, RequirementLookup.regime(r, 150));
    assertEquals(SpeedRegime.UP_TO_115_LIMIT_SPEED, RequirementLookup.regime(r, Math.nextUp(150.0)));
  }

  @Test
  void presetSaysWhereItComesFrom() {
    assertTrue(PRESET.recalledPreset());
    String s = PRESET.source();
    for (String part : List.of("from memory", "MIL-F-9490D", "MIL-A-8870C", "14 CFR/CS 25.629",
        "verified against the edition", "overridable")) {
      assertTrue(s.contains(part), () -> "source lacks " + part + ": " + s);
    }
    // MIL-A-8870C 1.15 V_L and g 0.03 (from memory, docs/validation.md 10.3); common practice -6 dB,
    // 60 deg, 10 % (docs/validation.md 10.2).
    assertEquals(1.15, PRESET.flutterSpeedFactor());
    assertEquals(0.03, PRESET.minimumDampingG());
    assertEquals(-6.0, PRESET.structuralPeakLimitDb());
    assertEquals(60.0, PRESET.phaseStabilisationMarginDeg());
    assertEquals(0.10, PRESET.frequencyUncertainty());
    assertEquals(9, PRESET.margins().size());
  }

  @Test
  void tableIsValidated() {
    assertEquals("limit_speed_eas_mps", assertThrows(InvalidInputException.class,
        () -> RequirementPresets.recalledMilitaryAndTransport(150, 140)).fieldPath());
    List<MarginCell> cells = new ArrayList<>(PRESET.margins());
    cells.remove(4);
    InvalidInputException missing = assertThrows(InvalidInputException.class,
        () -> new ClearanceRequirements(120, 150, 1.15, cells, -6, 60, 0.1, 1.15, 0.03, "x",
            false));
    assertEquals("margins", missing.fieldPath());
    cells.add(cells.get(0));
    InvalidInputException twice = assertThrows(InvalidInputException.class,
        () -> new ClearanceRequirements(120, 150, 1.15, cells, -6, 60, 0.1, 1.15, 0.03, "x",
            false));
    assertTrue(twice.getMessage().contains("a second cell"), twice.getMessage());
    assertThrows(InvalidInputException.class, () -> new MarginCell(FrequencyBand.RIGID_BODY,
        SpeedRegime.BEYOND, 6, 45));
    assertThrows(InvalidInputException.class, () -> new MarginCell(FrequencyBand.RIGID_BODY,
        SpeedRegime.NORMAL_ENVELOPE, -1, 45));
    assertThrows(InvalidInputException.class, () -> RequirementLookup.band(1, 0));
    assertThrows(InvalidInputException.class, () -> RequirementLookup.regime(PRESET, -1));
    // withCell replaces exactly one cell
    ClearanceRequirements r = PRESET.withCell(new MarginCell(FrequencyBand.AEROELASTIC,
        SpeedRegime.NORMAL_ENVELOPE, 9, 50));
    assertEquals(9, r.cell(FrequencyBand.AEROELASTIC, SpeedRegime.NORMAL_ENVELOPE).gainMarginDb());
    assertEquals(6, r.cell(FrequencyBand.RIGID_BODY, SpeedRegime.NORMAL_ENVELOPE).gainMarginDb());
  }
}
