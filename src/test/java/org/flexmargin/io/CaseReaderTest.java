package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.StripTheorySpec;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** One test per kind of input error, each asserting file, line, field path, expected and found. */
class CaseReaderTest {
  private static final Path DIR = Path.of("src/test/resources/io");

  private static InputFileException fails(Executable e) {
    return assertThrows(InputFileException.class, e);
  }

  private static InputFileException failsCase(String file) {
    return fails(() -> CaseReader.read(DIR.resolve(file)));
  }

  private static InputFileException failsTable(String file) {
    return fails(() -> CaseReader.readModeTable(DIR.resolve(file)));
  }

  private static void assertHas(String message, String... parts) {
    for (String p : parts) {
      assertTrue(message.contains(p), () -> "message <" + message + "> lacks <" + p + ">");
    }
  }

  @Test
  void readsAGoodCaseWithUnitConversionsAndDefaults() {
    AnalysisCase c = CaseReader.read(DIR.resolve("good-case.json"));
    assertEquals("small-case", c.name());
    assertEquals(2, c.configurations().size());
    ModeTable t = (ModeTable) c.configurations().get(0).structure();
    // g = 2 zeta (Fung, An Introduction to the Theory of Aeroelasticity): g 0.03 -> zeta 0.015.
    assertEquals(0.015, t.modes().get(1).dampingRatio(), 1e-15);
    assertEquals(2, ((StripTheorySpec) c.configurations().get(0).aero()).strips().size());
    GafTable gaf = assertInstanceOf(GafTable.class, c.configurations().get(1).aero());
    assertEquals(3, gaf.count());
    // The same mode table read once: one object, one provenance entry.
    assertTrue(c.configurations().get(1).structure() == t);
    SpeedSweep s = (SpeedSweep) c.sweep();
    // 1 ft = 0.3048 m and 1 kt = 1852/3600 m/s, exact by international definition.
    assertEquals(3048.0, s.altitudeM(), 1e-9);
    assertEquals(100 * 1852.0 / 3600.0, s.fromMps(), 1e-12);
    assertEquals(300 * 1852.0 / 3600.0, s.toMps(), 1e-12);
    assertEquals(AirspeedKind.EQUIVALENT, s.kind());
    assertEquals(FlutterMethodKind.K, c.options().method());
    assertEquals(50, c.options().kMethodPoints());
    assertEquals(0.03, c.options().dampingLimitG()); // default kept
    assertEquals(3, c.inputs().size());
    assertEquals("good-modes.json", c.inputs().get(1).path());
    assertEquals("good-forces.json", c.inputs().get(2).path());
    assertEquals(64, c.inputs().get(0).sha256().length());
  }

  @Test
  void malformedJsonGivesJacksonLineAndColumn() {
    InputFileException e = failsCase("bad-malformed.json");
    assertEquals(5, e.line()); // the trailing comma before } on line 5
    // the field path names where the parser stopped: after the value of mode_table
    assertHas(e.getMessage(), "bad-malformed.json:5: configurations[0].mode_table: expected well-formed JSON",
        "column");
  }

  @Test
  void unknownKeyListsTheAllowedOnes() {
    InputFileException e = failsCase("bad-unknown-key.json");
    assertEquals(6, e.line());
    assertEquals("optoins", e.fieldPath());
    assertHas(e.getMessage(), "bad-unknown-key.json:6: optoins: expected one of the keys format, name,",
        "options", "found unknown key \"optoins\"");
  }

  @Test
  void missingRequiredKey() {
    InputFileException e = failsCase("bad-missing-key.json");
    assertEquals("sweep.speed_kind", e.fieldPath());
    assertEquals(5, e.line()); // the line of the enclosing sweep object
    assertHas(e.getMessage(), "expected \"eas\" or \"tas\"", "found nothing (required key missing)");
  }

  @Test
  void wrongType() {
    InputFileException e = failsCase("bad-wrong-type.json");
    assertEquals("sweep.from_mps", e.fieldPath());
    assertHas(e.getMessage(), ":5: sweep.from_mps: expected a number, found the text \"ten\"");
  }

  @Test
  void nonPositiveFrequencyIsWrappedFromTheModelWithItsLine() {
    InputFileException e = failsTable("bad-modes-frequency.json");
    assertEquals(13, e.line());
    assertHas(e.getMessage(),
        "bad-modes-frequency.json:13: modes[1].frequency_hz: expected a finite value > 0, found -3.0");
  }

  @Test
  void nonFiniteAndZeroMass() {
    InputFileException inf = failsTable("bad-modes-infinite-mass.json");
    assertHas(inf.getMessage(), ":8: modes[0].generalized_mass_kg: expected a finite value > 0, found Infinity");
    InputFileException zero = failsTable("bad-modes-zero-mass.json");
    assertHas(zero.getMessage(), ":8: modes[0].generalized_mass_kg: expected a finite value > 0, found 0");
  }

  @Test
  void bothDampingsGiven() {
    InputFileException e = failsTable("bad-modes-both-dampings.json");
    assertEquals("modes[0].structural_damping_g", e.fieldPath());
    assertHas(e.getMessage(), ":8:", "exactly one of damping_ratio, structural_damping_g",
        "both \"damping_ratio\" and \"structural_damping_g\"");
  }

  @Test
  void stationsDifferBetweenModes() {
    InputFileException e = failsTable("bad-modes-stations.json");
    assertEquals("modes[1].shapes", e.fieldPath());
    assertEquals(7, e.line());
    assertHas(e.getMessage(), "the same stations as modes[0]", "found missing s2");
  }

  @Test
  void duplicateKey() {
    InputFileException e = failsTable("bad-modes-duplicate-key.json");
    assertHas(e.getMessage(), ":4: modes[0].frequency_hz: expected each key at most once",
        "a second \"frequency_hz\"");
  }

  @Test
  void inconsistentMatrixSize() {
    InputFileException e = fails(() -> CaseReader.readForceTable(DIR.resolve("bad-forces-size.json")));
    assertEquals("real[1][1]", e.fieldPath());
    assertEquals(8, e.line());
    assertHas(e.getMessage(), "expected 2 columns, found 3 columns");
  }

  @Test
  void unsortedAndDuplicateReducedFrequencies() {
    InputFileException u = fails(() -> CaseReader.readForceTable(DIR.resolve("bad-forces-unsorted.json")));
    assertHas(u.getMessage(), ":6: reduced_frequencies[2]: expected strictly increasing values",
        "found 0.3 after 0.5");
    InputFileException d = fails(() -> CaseReader.readForceTable(DIR.resolve("bad-forces-duplicate.json")));
    assertHas(d.getMessage(), "reduced_frequencies[2]", "found 0.5 after 0.5");
  }

  @Test
  void forceTableModesMustMatchTheModeTable() {
    InputFileException e = failsCase("bad-case-force-modes.json");
    assertEquals("bad-forces-modes.json", Path.of(e.file()).getFileName().toString());
    assertEquals(6, e.line());
    assertHas(e.getMessage(), "modes: expected the modes of mode table \"two-modes\" in order [bending, torsion]",
        "found [torsion, bending]");
  }

  @Test
  void unknownStationOfAStrip() {
    InputFileException e = failsCase("bad-station.json");
    assertEquals("configurations[0].aero.strip_theory.strips[1].station", e.fieldPath());
    assertEquals(13, e.line());
    assertHas(e.getMessage(), "expected a station of mode table \"two-modes\" (s1, s2)", "found \"s3\"");
  }

  @Test
  void emptySpeedRange() {
    InputFileException e = failsCase("bad-inverted-range.json");
    assertEquals("sweep.to_mps", e.fieldPath());
    assertEquals(10, e.line());
    assertHas(e.getMessage(), "expected a speed above the sweep's first speed 150.0 m/s",
        "an empty or inverted range");
  }

  @Test
  void altitudeOutsideTheAtmosphereModel() {
    InputFileException e = failsCase("bad-altitude.json");
    assertEquals(7, e.line());
    assertHas(e.getMessage(), "sweep.altitude_m: expected a geometric altitude in [-5000.0, 86000.0] m",
        "found 90000 m");
  }

  @Test
  void unreadableFiles() {
    InputFileException e = failsCase("bad-missing-file.json");
    assertEquals("configurations[0].mode_table", e.fieldPath());
    assertEquals(5, e.line());
    assertHas(e.getMessage(), "expected a readable file, found no such file", "no-such-table.json");
    InputFileException top = failsCase("does-not-exist.json");
    assertHas(top.getMessage(), "does-not-exist.json: expected a readable file, found no such file");
    InputFileException dir = fails(() -> CaseReader.read(DIR));
    assertHas(dir.getMessage(), "found a directory");
  }

  @Test
  void requirementsSectionIsReadAndChecked() {
    // preset "none" needs every speed and margin cell: the first missing one is reported in place
    InputFileException e = failsCase("bad-requirements.json");
    assertTrue(e.fieldPath().startsWith("requirements"), e.fieldPath());
    assertEquals(6, e.line());
  }

  @Test
  void laterFormatIsRejected() {
    InputFileException e = failsCase("bad-format.json");
    assertHas(e.getMessage(), ":2: format: expected format 1", "found 2");
  }

  @Test
  void modelValidationIsWrappedWithFileAndLine() {
    InputFileException dup = failsCase("bad-duplicate-config.json");
    assertEquals("configurations[1].name", dup.fieldPath());
    assertEquals(6, dup.line());
    assertHas(dup.getMessage(), "expected a unique configuration name, found duplicate \"a\"");
    InputFileException opt = failsCase("bad-option.json");
    assertEquals("options.damping_limit_g", opt.fieldPath());
    assertEquals(7, opt.line());
    assertHas(opt.getMessage(), "expected a value in [0.0, 1.0], found 1.5");
  }

  @Test
  void csvTableEqualsTheJsonTable() {
    ModeTable json = CaseReader.readModeTable(DIR.resolve("good-modes.json"));
    ModeTable csv = CaseReader.readModeTable(DIR.resolve("good-modes.csv"));
    assertEquals(json, csv);
  }

  @Test
  void csvErrors() {
    InputFileException num = failsTable("bad-csv-number.csv");
    assertHas(num.getMessage(), "bad-csv-number.csv:4: bending.shapes.s2.displacement_m: expected a number",
        "found \"1,0\"");
    InputFileException rep = failsTable("bad-csv-repeat.csv");
    assertHas(rep.getMessage(), ":4: bending.frequency_hz: expected an empty cell or the value on the mode's first row (line 3)");
    InputFileException fmt = failsTable("bad-csv-noformat.csv");
    assertHas(fmt.getMessage(), ":1: format: expected a '# format=1' line");
    InputFileException col = failsTable("bad-csv-column.csv");
    assertHas(col.getMessage(), ":2: column 4: expected one of the columns mode,", "found \"mass_kg\"");
    InputFileException f = failsTable("bad-csv-frequency.csv");
    assertHas(f.getMessage(), ":4: torsion.frequency_hz: expected a finite value > 0, found -3.0");
  }
}
