package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FitWeighting;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RationalFitForm;
import org.flexmargin.model.RationalFitSettings;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The optional {@code rational_fit} section of a case file: every key read as written, defaults
 * without it, and each bad value refused with file, line, field path, expected and found. The good
 * loop case of the test resources gets the section on a line of its own ahead of its {@code loop}.
 */
class RationalFitSectionTest {
  private static final Path DIR = Path.of("src/test/resources/io");

  private static Path caseWith(Path dir, String section) throws IOException {
    for (String f : List.of("good-loop-case.json", "good-modes.json", "good-forces.json")) {
      Files.copy(DIR.resolve(f), dir.resolve(f));
    }
    Path c = dir.resolve("good-loop-case.json");
    String text = Files.readString(c);
    int at = text.indexOf("  \"loop\": {");
    Files.writeString(c, text.substring(0, at) + "  \"rational_fit\": " + section + ",\n" + text.substring(at));
    return c;
  }

  private static int lineOfSection(Path c) throws IOException {
    List<String> lines = Files.readAllLines(c);
    for (int i = 0; i < lines.size(); i++) {
      if (lines.get(i).contains("\"rational_fit\"")) {
        return i + 1;
      }
    }
    throw new AssertionError("no rational_fit section");
  }

  @Test
  void withoutTheSectionTheSettingsAreTheDefaults() {
    AnalysisCase c = CaseReader.read(DIR.resolve("good-loop-case.json"));
    RationalFitSettings s = c.options().rationalFit();
    assertEquals(RationalFitSettings.defaults(), s);
    assertEquals(RationalFitForm.ROGER, s.form());
    assertEquals(RationalFitSettings.AUTOMATIC, s.lagCount());
    assertNull(s.lagRoots());
    assertEquals(0.0, s.minReducedFrequency(), 0.0);
    assertTrue(s.automaticRange());
    assertEquals(31, s.points());
    assertEquals(FitWeighting.UNIFORM, s.weighting());
  }

  @Test
  void everyKeyIsReadAsWritten(@TempDir Path dir) throws IOException {
    Path a = caseWith(Files.createDirectory(dir.resolve("a")), "{\"method\": \"minimum_state\", \"lag_count\": 10, "
        + "\"reduced_frequency_range\": [0.01, 2.5], \"points\": 41, \"weighting\": \"inverse_magnitude\"}");
    RationalFitSettings s = CaseReader.read(a).options().rationalFit();
    assertEquals(RationalFitForm.MINIMUM_STATE, s.form());
    assertEquals(10, s.lagCount());
    assertEquals(10, s.lagCountFor(3));
    assertEquals(0.01, s.minReducedFrequency(), 0.0);
    assertEquals(2.5, s.maxReducedFrequency(), 0.0);
    assertEquals(41, s.points());
    assertEquals(FitWeighting.INVERSE_MAGNITUDE, s.weighting());
    Path b = caseWith(Files.createDirectory(dir.resolve("b")), "{\"method\": \"roger\", \"lag_roots\": [0.05, 0.3]}");
    RationalFitSettings r = CaseReader.read(b).options().rationalFit();
    assertEquals(RationalFitForm.ROGER, r.form());
    assertArrayEquals(new double[] {0.05, 0.3}, r.lagRoots(), 0.0);
    assertEquals(2, r.lagCountFor(7));
    assertTrue(r.automaticRange());
    // an empty section is the defaults
    Path e = caseWith(Files.createDirectory(dir.resolve("e")), "{}");
    assertEquals(RationalFitSettings.defaults(), CaseReader.read(e).options().rationalFit());
    // the section does not disturb the other options
    assertEquals(CaseReader.read(DIR.resolve("good-loop-case.json")).options().method(),
        CaseReader.read(e).options().method());
  }

  @Test
  void automaticLagCountsFollowTheForm() {
    RationalFitSettings roger = RationalFitSettings.defaults();
    assertEquals(4, roger.lagCountFor(8));
    RationalFitSettings ms = new RationalFitSettings(RationalFitForm.MINIMUM_STATE, RationalFitSettings.AUTOMATIC,
        null, 0.0, Double.NaN, 31, FitWeighting.UNIFORM);
    assertEquals(4, ms.lagCountFor(2));
    assertEquals(16, ms.lagCountFor(8));
    assertEquals(24, ms.lagCountFor(20), "at most 24");
    assertEquals(1.5, ms.maxReducedFrequencyOr(1.5), 0.0);
    RationalFitSettings given = new RationalFitSettings(RationalFitForm.ROGER, 3, null, 0.0, 2.0, 31,
        FitWeighting.UNIFORM);
    assertEquals(2.0, given.maxReducedFrequencyOr(1.5), 0.0);
  }

  @Test
  void badValuesGiveFileLinePathExpectedAndFound(@TempDir Path dir) throws IOException {
    String[][] cases = {
        {"{\"method\": \"pade\"}", "rational_fit.method", "\"roger\" or \"minimum_state\"", "the text \"pade\""},
        {"{\"lag_count\": 25}", "rational_fit.lag_count", "an integer from 0 to 24 for the roger form", "25"},
        {"{\"method\": \"minimum_state\", \"lag_count\": 0}", "rational_fit.lag_count",
            "an integer from 1 to 24 for the minimum_state form", "0"},
        {"{\"lag_roots\": [0.1, 0.1]}", "rational_fit.lag_roots[1]", "a value distinct from lag_roots[0] = 0.1", "0.1"},
        {"{\"lag_roots\": [0.1, 0]}", "rational_fit.lag_roots[1]", "a finite value > 0", "0.0"},
        {"{\"lag_count\": 3, \"lag_roots\": [0.1]}", "rational_fit.lag_roots",
            "at most one of lag_count, lag_roots (the lag roots)", "both \"lag_count\" and \"lag_roots\""},
        {"{\"reduced_frequency_range\": [1.0, 0.5]}", "rational_fit.reduced_frequency_range[1]",
            "a finite value above the lowest reduced frequency 1.0", "0.5"},
        {"{\"reduced_frequency_range\": [1.0]}", "rational_fit.reduced_frequency_range",
            "two reduced frequencies [lowest, highest]", "1 values"},
        {"{\"points\": 2}", "rational_fit.points", "an integer from 3 to 400", "2"},
        {"{\"weighting\": \"relative\"}", "rational_fit.weighting", "\"uniform\", \"element\" or \"inverse_magnitude\"",
            "the text \"relative\""},
    };
    for (int i = 0; i < cases.length; i++) {
      Path c = caseWith(Files.createDirectory(dir.resolve("c" + i)), cases[i][0]);
      InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c), cases[i][0]);
      assertEquals(c.toString(), e.file());
      assertEquals(lineOfSection(c), e.line(), cases[i][0]);
      assertEquals(cases[i][1], e.fieldPath(), cases[i][0]);
      assertEquals(cases[i][2], e.expected(), cases[i][0]);
      assertTrue(e.found().startsWith(cases[i][3]), cases[i][0] + ": " + e.found());
    }
  }

  @Test
  void unknownKeysAndImplausibleFrequenciesAreRefused(@TempDir Path dir) throws IOException {
    Path c = caseWith(Files.createDirectory(dir.resolve("a")), "{\"lags\": 4}");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(c));
    assertTrue(e.fieldPath().startsWith("rational_fit"), e.fieldPath());
    // 150 is beyond the plausible range [0, 100] of a reduced frequency; 12 is plausible but unusual
    Path d = caseWith(Files.createDirectory(dir.resolve("b")), "{\"reduced_frequency_range\": [0, 150]}");
    InputFileException implausible = assertThrows(InputFileException.class, () -> CaseReader.read(d));
    assertEquals("rational_fit.reduced_frequency_range[1]", implausible.fieldPath());
    assertTrue(implausible.expected().contains("[0, 100]"), implausible.expected());
    Path u = caseWith(Files.createDirectory(dir.resolve("c")), "{\"lag_roots\": [0.1, 12]}");
    AnalysisCase unusual = CaseReader.read(u);
    assertTrue(unusual.warnings().stream().anyMatch(w -> w.text().contains("usual range [0, 10]")),
        unusual.warnings().toString());
  }

  @Test
  void theRecordRefusesWhatTheReaderRefuses() {
    assertThrows(InvalidInputException.class, () -> new RationalFitSettings(null, -1, null, 0, Double.NaN, 31,
        FitWeighting.UNIFORM));
    assertThrows(InvalidInputException.class, () -> new RationalFitSettings(RationalFitForm.ROGER, -1, null, 0,
        Double.NaN, 31, null));
    assertThrows(InvalidInputException.class, () -> new RationalFitSettings(RationalFitForm.ROGER, -2, null, 0,
        Double.NaN, 31, FitWeighting.UNIFORM));
    assertThrows(InvalidInputException.class, () -> new RationalFitSettings(RationalFitForm.ROGER, -1, null, -0.1,
        Double.NaN, 31, FitWeighting.UNIFORM));
    assertThrows(InvalidInputException.class, () -> new RationalFitSettings(RationalFitForm.ROGER, -1, null, 0,
        Double.POSITIVE_INFINITY, 31, FitWeighting.UNIFORM));
    assertThrows(InvalidInputException.class, () -> new RationalFitSettings(RationalFitForm.MINIMUM_STATE, -1,
        new double[0], 0, Double.NaN, 31, FitWeighting.UNIFORM));
    assertThrows(InvalidInputException.class, () -> new RationalFitSettings(RationalFitForm.ROGER, -1, null, 0,
        Double.NaN, 401, FitWeighting.UNIFORM));
    // copies in and out
    double[] roots = {0.1, 0.4};
    RationalFitSettings s = new RationalFitSettings(RationalFitForm.ROGER, -1, roots, 0, Double.NaN, 31,
        FitWeighting.UNIFORM);
    roots[0] = 9;
    s.lagRoots()[1] = 9;
    assertArrayEquals(new double[] {0.1, 0.4}, s.lagRoots(), 0.0);
    assertEquals(s, new RationalFitSettings(RationalFitForm.ROGER, -1, new double[] {0.1, 0.4}, 0, Double.NaN, 31,
        FitWeighting.UNIFORM));
    assertEquals(s.hashCode(), new RationalFitSettings(RationalFitForm.ROGER, -1, new double[] {0.1, 0.4}, 0,
        Double.NaN, 31, FitWeighting.UNIFORM).hashCode());
  }
}
