package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Finite but absurd values, as a hostile or careless user writes them: {@code check} refuses each
 * at read time naming file, line and key (first release: accepted, then exit 1 deep inside the
 * solvers, an internal matrix name without file or line, or a full report); unusual values are
 * read with a warning; {@code plausibility_overrides} lifts a plausible range on request.
 */
class BadInputCampaignTest {
  private static final Path IO = Path.of("src/test/resources/io");


  /** Copies the small test inputs into {@code dir}; returns the copy of {@code caseName}. */
  private static Path copyInputs(Path dir, String caseName) throws IOException {
    for (String f : List.of("good-case.json", "good-loop-case.json", "good-modes.json", "good-forces.json",
        "good-modes.csv")) {
      Files.copy(IO.resolve(f), dir.resolve(f));
    }
    return dir.resolve(caseName);
  }

  /** Replaces the first {@code from} by {@code to} in {@code file}; returns the 1-based line of the change. */
  static int mutate(Path file, String from, String to) throws IOException {
    String text = Files.readString(file);
    int at = text.indexOf(from);
    assertTrue(at >= 0, "test set-up: <" + from + "> not in " + file);
    Files.writeString(file, text.substring(0, at) + to + text.substring(at + from.length()));
    return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
  }

  @ParameterizedTest(name = "{0}: {2} -> {3}")
  @CsvSource(delimiter = '|', value = {
      "good-case.json  | good-case.json  | \"semichord_m\": 0.5,                | \"semichord_m\": 1e308,          | configurations[0].aero.strip_theory.strips[0].semichord_m",
      "good-case.json  | good-case.json  | \"width_m\": 1.0,                    | \"width_m\": 1e6,                | configurations[0].aero.strip_theory.strips[0].width_m",
      "good-case.json  | good-case.json  | \"to_kt\": 300                       | \"to_kt\": 1e308                 | sweep.to_kt",
      "good-case.json  | good-modes.json | \"generalized_mass_kg\": 10.0        | \"generalized_mass_kg\": 1e-300  | modes[0].generalized_mass_kg",
      "good-case.json  | good-modes.json | \"frequency_hz\": 4.0                | \"frequency_hz\": 1e308          | modes[0].frequency_hz",
      "good-loop-case.json | good-loop-case.json | \"proportional_gain\": 0.3   | \"proportional_gain\": 1e308     | loop.paths[0].proportional_gain",
      "good-loop-case.json | good-loop-case.json | \"pitch_inertia_kg_m2\": 2600 | \"pitch_inertia_kg_m2\": 1e308  | configurations[0].rigid_body.pitch_inertia_kg_m2",
      "good-loop-case.json | good-loop-case.json | \"lever_arm_m\": -2.5         | \"lever_arm_m\": 1e9             | loop.sensors[0].lever_arm_m",
  })
  void absurdValuesAreRefusedByCheckWithFileLineAndKey(String caseName, String target, String from, String to,
      String path, @TempDir Path dir) throws IOException {
    Path c = copyInputs(dir, caseName);
    int line = mutate(dir.resolve(target), from, to);
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code(), r.out() + r.err());
    assertTrue(r.err().contains(target + ":" + line + ": " + path + ": expected a value in the plausible range"),
        r.err());
    assertFalse(r.err().contains("\tat "), r.err());
  }

  @Test
  void bendingStiffnessOfABuiltInWingIsCheckedToo(@TempDir Path dir) throws IOException {
    Path c = dir.resolve("goland.json");
    Files.copy(Path.of("mode-tables/validation/goland-wing.json"), c);
    int line = mutate(c, "9770000.0", "1e308");
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code(), r.err());
    assertTrue(r.err().contains("goland.json:" + line
        + ": configurations[0].uniform_wing.bending_stiffness_n_m2: expected a value in the plausible range"), r.err());
  }

  @Test
  void aMassMatrixThatIsNotPositiveDefiniteNamesTheInputKeys(@TempDir Path dir) throws IOException {
    // Goland section: m d^2 = 35.71 x (0.10 x 1.8288)^2 = 1.194 kg m, so 1.0 kg m about the elastic
    // axis is less than the parallel-axis term alone (derived).
    Path c = dir.resolve("goland.json");
    Files.copy(Path.of("mode-tables/validation/goland-wing.json"), c);
    int line = mutate(c, "\"pitch_inertia_kg_m\": 8.64", "\"pitch_inertia_kg_m\": 1.0");
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code(), r.err());
    assertTrue(r.err().contains("goland.json:" + line + ": configurations[0].uniform_wing.pitch_inertia_kg_m"), r.err());
    for (String key : List.of("mass_per_length_kg_per_m", "mass_axis_chord_fraction", "elastic_axis_chord_fraction",
        "chord_m", "positive definite")) {
      assertTrue(r.err().contains(key), r.err());
    }
    assertFalse(r.err().contains(": mass_kg"), r.err());
  }

  @Test
  void anUnusualValueIsReadWithAWarningNamingItsRange(@TempDir Path dir) throws IOException {
    Path c = copyInputs(dir, "good-case.json");
    int line = mutate(c, "\"width_m\": 1.0,", "\"width_m\": 25.0,");
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(FlexMargin.EXIT_OK, r.code(), r.err());
    assertTrue(r.err().contains("warning: " + c + ":" + line
        + ": configurations[0].aero.strip_theory.strips[0].width_m: 25.0 m is outside the usual range [0.001, 20] m"),
        r.err());
  }

  @Test
  void anOverrideLiftsAPlausibleRangeWithAWarning(@TempDir Path dir) throws IOException {
    Path c = copyInputs(dir, "good-case.json");
    mutate(c, "\"width_m\": 1.0,", "\"width_m\": 800.0,");
    mutate(c, "\"configurations\":", "\"plausibility_overrides\": [\"strip.width_m\"],\n  \"configurations\":");
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(FlexMargin.EXIT_OK, r.code(), r.err());
    assertTrue(r.err().contains("800.0 m is outside the plausible range [0, 500] m of strip.width_m; accepted"),
        r.err());
  }

  @Test
  void overridesAreCheckedThemselves(@TempDir Path dir) throws IOException {
    Path c = copyInputs(dir, "good-case.json");
    int line = mutate(c, "\"configurations\":", "\"plausibility_overrides\": [\"strip.widht_m\"],\n  \"configurations\":");
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code());
    assertTrue(r.err().contains(":" + line + ": plausibility_overrides[0]"), r.err());
    assertTrue(r.err().contains("(did you mean \"strip.width_m\"?)"), r.err());
    mutate(c, "strip.widht_m", "mode.damping_ratio");
    r = CliRun.of("check", c.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code());
    assertTrue(r.err().contains("a physical limit, which no override lifts"), r.err());
  }
}
