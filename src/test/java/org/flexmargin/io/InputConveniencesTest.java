package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.SpeedSweep;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the reader forgives and what it suggests: "did you mean" for a mistyped key or word, words
 * in any case, air density instead of altitude, and {@code filters} and {@code requirements} given
 * as file references. Each fails on the first release (unknown key without a suggestion, "EAS"
 * refused, density unknown, a text value where a list or object was expected).
 */
class InputConveniencesTest {
  private static final Path IO = Path.of("src/test/resources/io");

  private static Path copy(Path dir) throws IOException {
    for (String f : List.of("good-case.json", "good-loop-case.json", "good-modes.json", "good-forces.json")) {
      Files.copy(IO.resolve(f), dir.resolve(f));
    }
    return dir;
  }

  private static void replace(Path file, String from, String to) throws IOException {
    String text = Files.readString(file);
    assertTrue(text.contains(from), "test set-up: <" + from + "> not in " + file);
    Files.writeString(file, text.replace(from, to));
  }

  @Test
  void aMistypedKeyGetsASuggestion(@TempDir Path dir) throws IOException {
    Path c = copy(dir).resolve("good-case.json");
    replace(c, "\"width_m\": 1.0, \"semichord_m\": 0.5", "\"widht_m\": 1.0, \"semichord_m\": 0.5");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertEquals("configurations[0].aero.strip_theory.strips[0].widht_m", e.fieldPath());
    assertEquals("unknown key \"widht_m\" (did you mean \"width_m\"?)", e.found());
  }

  @Test
  void aMistypedWordGetsASuggestionAndAFarOneNone() {
    assertEquals("state_space", Suggest.closest("state-space", List.of("pk", "k", "state_space")));
    assertEquals("normal_accelerometer",
        Suggest.closest("normal_accelerometr", List.of("pitch_rate_gyro", "normal_accelerometer")));
    assertEquals(null, Suggest.closest("banana", List.of("pk", "k", "state_space")));
    // Optimal string alignment: a transposition is one edit (Damerau 1964).
    assertEquals(1, Suggest.distance("widht", "width"));
    assertEquals(3, Suggest.distance("kitten", "sitting"));
  }

  @Test
  void wordsAreReadInAnyCase(@TempDir Path dir) throws IOException {
    Path c = copy(dir).resolve("good-case.json");
    replace(c, "\"speed_kind\": \"eas\"", "\"speed_kind\": \"EAS\"");
    replace(c, "\"method\": \"k\"", "\"method\": \"State_Space\"");
    AnalysisCase a = CaseReader.read(c);
    assertEquals(AirspeedKind.EQUIVALENT, ((SpeedSweep) a.sweep()).kind());
    assertEquals(FlutterMethodKind.STATE_SPACE, a.options().method());
  }

  @Test
  void aWrongWordListsTheAllowedOnesAndSuggestsOne(@TempDir Path dir) throws IOException {
    Path c = copy(dir).resolve("good-case.json");
    replace(c, "\"speed_kind\": \"eas\"", "\"speed_kind\": \"ea\"");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertEquals("sweep.speed_kind", e.fieldPath());
    assertEquals("\"eas\" or \"tas\"", e.expected());
    assertTrue(e.found().contains("did you mean \"eas\"?"), e.found());
  }

  @Test
  void airDensityMayStandInsteadOfAltitude(@TempDir Path dir) throws IOException {
    Path c = copy(dir).resolve("good-case.json");
    // 0.90925 kg/m^3 is the standard density at 3 000 m (US Standard Atmosphere 1976, Table I,
    // 9.0925e-1, from memory; tolerance: the table's five figures); the reader's bisection must
    // land within 1 mm of 3 000 m.
    replace(c, "\"altitude_ft\": 10000", "\"density_kg_per_m3\": " + StandardAtmosphere.densityKgPerM3(3000.0));
    SpeedSweep s = (SpeedSweep) CaseReader.read(c).sweep();
    assertEquals(3000.0, s.altitudeM(), 1e-3);
    assertEquals(0.90925, StandardAtmosphere.densityKgPerM3(3000.0), 5e-6);

    replace(c, "\"density_kg_per_m3\"", "\"altitude_m\": 0, \"density_kg_per_m3\"");
    InputFileException both = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertTrue(both.expected().contains("exactly one of altitude_m, altitude_ft, density_kg_per_m3"), both.expected());
  }

  @Test
  void aDensityOutsideTheAtmosphereIsRefused(@TempDir Path dir) throws IOException {
    Path c = copy(dir).resolve("good-case.json");
    replace(c, "\"altitude_ft\": 10000", "\"density_kg_per_m3\": 1.99");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertEquals("sweep.density_kg_per_m3", e.fieldPath());
    assertTrue(e.expected().contains("an air density in ["), e.expected());
  }

  @Test
  void filtersMayBeAFileOfTheirOwn(@TempDir Path dir) throws IOException {
    Path d = copy(dir);
    Path c = d.resolve("good-loop-case.json");
    Files.writeString(d.resolve("gyro-filters.json"), """
        {"format": 1, "description": "invented",
         "filters": [{"notch": {"centre_hz": 7.4, "numerator_damping_ratio": 0.02, "denominator_damping_ratio": 0.4}}]}
        """);
    String text = Files.readString(c);
    int start = text.indexOf("\"filters\": [");
    int end = text.indexOf("],", start) + 1;
    Files.writeString(c, text.substring(0, start) + "\"filters\": \"gyro-filters.json\"" + text.substring(end));
    AnalysisCase a = CaseReader.read(c);
    NotchFilterSpec n = (NotchFilterSpec) a.loop().paths().get(0).filters().get(0);
    assertEquals(7.4, n.centreHz(), 0.0);
    assertTrue(a.inputs().stream().anyMatch(f -> f.path().equals("gyro-filters.json")), a.inputs().toString());

    // the fragment notch-design writes: the entry of this path's index is taken, its sensor checked
    Files.writeString(d.resolve("gyro-filters.json"), """
        {"format": 1, "case": "loop-case", "feasible": true, "paths": [
          {"path_index": 0, "sensor": "gyro", "filters": [
            {"notch": {"centre_hz": 18.6, "numerator_damping_ratio": 0.03, "denominator_damping_ratio": 0.5}}]}]}
        """);
    n = (NotchFilterSpec) CaseReader.read(c).loop().paths().get(0).filters().get(0);
    assertEquals(18.6, n.centreHz(), 0.0);

    replace(d.resolve("gyro-filters.json"), "\"gyro\"", "\"accel\"");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertEquals("gyro-filters.json", Path.of(e.file()).getFileName().toString());
    assertEquals("paths[0].sensor", e.fieldPath());
  }

  @Test
  void requirementsMayBeAFileOfTheirOwn(@TempDir Path dir) throws IOException {
    Path d = copy(dir);
    Files.copy(IO.resolve("requirements/good-preset.json"), d.resolve("reqs.json"));
    Path c = d.resolve("good-case.json");
    replace(c, "\"options\":", "\"requirements\": \"reqs.json\",\n  \"options\":");
    AnalysisCase a = CaseReader.read(c);
    assertEquals(150.0, a.requirements().limitSpeedEasMps(), 0.0);
    assertEquals(-8.0, a.requirements().structuralPeakLimitDb(), 0.0);

    replace(d.resolve("reqs.json"), "\"preset\"", "\"prest\"");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertEquals("reqs.json", Path.of(e.file()).getFileName().toString());
    assertTrue(e.found().contains("did you mean \"preset\"?"), e.found());
  }
}
