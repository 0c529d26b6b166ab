package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.RequirementPresets;
import org.flexmargin.model.SpeedRegime;
import org.junit.jupiter.api.Test;

/** Requirements files: good ones with conversions and overrides, one test per kind of error. */
class RequirementsReaderTest {
  private static final Path DIR = Path.of("src/test/resources/io/requirements");
  /** 1 kt = 1852/3600 m/s, exact by international definition. */
  private static final double KT = 1852.0 / 3600.0;

  private static InputFileException fails(String file) {
    return assertThrows(InputFileException.class, () -> RequirementsReader.read(DIR.resolve(file)));
  }

  private static void assertHas(String message, String... parts) {
    for (String p : parts) {
      assertTrue(message.contains(p), () -> "message <" + message + "> lacks <" + p + ">");
    }
  }

  @Test
  void presetWithOverridesAndKnots() {
    ClearanceRequirements r = RequirementsReader.read(DIR.resolve("good-preset.json"));
    assertEquals(240 * KT, r.maxOperatingSpeedEasMps(), 1e-12);
    assertEquals(150.0, r.limitSpeedEasMps(), 0.0);
    assertTrue(r.recalledPreset());
    // the overridden cell, and an untouched preset cell (MIL-F-9490D from memory: 6 dB/45 deg)
    assertEquals(9.0, r.cell(FrequencyBand.AEROELASTIC, SpeedRegime.NORMAL_ENVELOPE).gainMarginDb());
    assertEquals(50.0, r.cell(FrequencyBand.AEROELASTIC, SpeedRegime.NORMAL_ENVELOPE)
        .phaseMarginDeg());
    assertEquals(6.0, r.cell(FrequencyBand.RIGID_BODY, SpeedRegime.NORMAL_ENVELOPE).gainMarginDb());
    assertEquals(-8.0, r.structuralPeakLimitDb());
    assertEquals(60.0, r.phaseStabilisationMarginDeg()); // preset value kept
    assertHas(r.source(), RequirementPresets.RECALLED_MILITARY_AND_TRANSPORT_SOURCE,
        "Overridden by", "aeroelastic/normal_envelope", "structural_peak_limit_db",
        "Invented test table");
  }

  @Test
  void fullTableWithoutPreset() {
    ClearanceRequirements r = RequirementsReader.read(DIR.resolve("good-full.json"));
    assertFalse(r.recalledPreset());
    assertEquals(250 * KT, r.limitSpeedEasMps(), 1e-12);
    assertEquals(3.0, r.cell(FrequencyBand.AEROELASTIC, SpeedRegime.UP_TO_115_LIMIT_SPEED)
        .gainMarginDb());
    assertEquals(25.0, r.cell(FrequencyBand.LOW_FREQUENCY, SpeedRegime.UP_TO_LIMIT_SPEED)
        .phaseMarginDeg());
    assertEquals(1.2, r.extendedSpeedFactor());
    assertEquals(45.0, r.phaseStabilisationMarginDeg());
    assertEquals(0.15, r.frequencyUncertainty());
    assertEquals(1.2, r.flutterSpeedFactor());
    assertEquals(0.02, r.minimumDampingG());
    assertEquals(-6.0, r.structuralPeakLimitDb()); // default, common practice
    assertHas(r.source(), "given in full", "good-full.json");
  }

  @Test
  void unknownKeyListsTheAllowedOnes() {
    InputFileException e = fails("bad-unknown-key.json");
    assertEquals(6, e.line());
    assertEquals("flutter_margin", e.fieldPath());
    assertHas(e.expected(), "flutter_speed_factor", "minimum_damping_g");
    assertHas(e.found(), "unknown key \"flutter_margin\"");
    assertHas(e.getMessage(), "bad-unknown-key.json:6: flutter_margin: expected");
  }

  @Test
  void presetIsRequiredAndNamed() {
    InputFileException e = fails("bad-preset.json");
    assertEquals(3, e.line());
    assertEquals("preset", e.fieldPath());
    assertHas(e.expected(), "\"recalled_military_and_transport\" or \"none\"");
    assertHas(e.found(), "the text \"military\"");
    InputFileException m = fails("bad-missing-preset.json");
    assertEquals("preset", m.fieldPath());
    assertHas(m.found(), "required key missing");
  }

  @Test
  void unknownBandIsReportedAtItsEntry() {
    InputFileException e = fails("bad-band.json");
    assertEquals(8, e.line());
    assertEquals("margins[1].band", e.fieldPath());
    assertHas(e.expected(), "\"low_frequency\", \"rigid_body\" or \"aeroelastic\"");
    assertHas(e.found(), "\"structural\"");
  }

  @Test
  void cellGivenTwice() {
    InputFileException e = fails("bad-duplicate-cell.json");
    assertEquals(8, e.line());
    assertEquals("margins[1]", e.fieldPath());
    assertHas(e.found(), "a second cell for band rigid_body and regime normal_envelope");
  }

  @Test
  void fullTableMissingACell() {
    InputFileException e = fails("bad-missing-cell.json");
    assertEquals(6, e.line());
    assertEquals("margins", e.fieldPath());
    assertHas(e.found(), "no cell for band rigid_body and regime up_to_limit_speed");
  }

  @Test
  void limitSpeedBelowTopOfEnvelope() {
    InputFileException e = fails("bad-speed-order.json");
    assertEquals(5, e.line());
    assertEquals("limit_speed_eas_mps", e.fieldPath());
    assertHas(e.expected(), "a limit speed >= the top of the normal envelope (160.0 m/s EAS)");
    assertHas(e.found(), "150.0 m/s EAS");
  }

  @Test
  void recordValidationIsLocatedAtTheKey() {
    InputFileException e = fails("bad-uncertainty.json");
    assertEquals(6, e.line());
    assertEquals("frequency_uncertainty", e.fieldPath());
    assertHas(e.expected(), "a value in [0.0, 0.5]");
    assertEquals("0.7", e.found());
    InputFileException m = fails("bad-negative-margin.json");
    assertEquals(7, m.line());
    assertEquals("margins[0].gain_margin_db", m.fieldPath());
    assertEquals("-3.0", m.found());
  }

  @Test
  void speedGivenInTwoUnits() {
    InputFileException e = fails("bad-both-speeds.json");
    assertEquals(5, e.line());
    assertEquals("max_operating_speed_eas_kt", e.fieldPath());
    assertHas(e.found(), "both \"max_operating_speed_eas_mps\" and \"max_operating_speed_eas_kt\"");
  }

  @Test
  void otherFormatVersionsAreRefused() {
    InputFileException e = fails("bad-format.json");
    assertEquals(2, e.line());
    assertEquals("format", e.fieldPath());
    assertEquals("2", e.found());
  }

  @Test
  void missingFileIsReported() {
    InputFileException e = fails("no-such-file.json");
    assertEquals(0, e.line());
    assertEquals("no such file", e.found());
  }

  @Test
  void sectionOfACaseFileCarriesItsPath() {
    Path good = DIR.resolve("section-good.json");
    JsonField g = JsonInput.parse(SourceFile.read(good, good.toString())).root()
        .optional("requirements");
    ClearanceRequirements r = RequirementsReader.readSection(g);
    assertEquals(120.0, r.maxOperatingSpeedEasMps());
    assertTrue(r.recalledPreset());
    Path bad = DIR.resolve("section-in-case.json");
    JsonField b = JsonInput.parse(SourceFile.read(bad, bad.toString())).root()
        .optional("requirements");
    InputFileException e = assertThrows(InputFileException.class,
        () -> RequirementsReader.readSection(b));
    assertEquals(9, e.line());
    assertEquals("requirements.margins[0].regime", e.fieldPath());
    assertHas(e.expected(), "\"normal_envelope\", \"up_to_limit_speed\" or \"up_to_115_limit_speed\"");
    assertHas(e.found(), "\"beyond\"");
  }
}
