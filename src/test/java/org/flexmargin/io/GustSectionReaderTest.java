package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The optional {@code gusts} section of a case file: read by {@link GustSectionReader} and checked
 * by {@link CaseReader#read} for every command. The good loop case of the test resources gets the
 * section inserted on line 51, ahead of its {@code loop}; values read must equal those written.
 */
class GustSectionReaderTest {
  private static final Path DIR = Path.of("src/test/resources/io");

  private static Path caseWith(Path dir, String section, String overrides) throws IOException {
    for (String f : List.of("good-loop-case.json", "good-modes.json", "good-forces.json")) {
      Files.copy(DIR.resolve(f), dir.resolve(f));
    }
    Path c = dir.resolve("good-loop-case.json");
    String text = Files.readString(c);
    int at = text.indexOf("  \"loop\": {");
    String head = text.substring(0, at);
    if (overrides != null) {
      head = head.replace("  \"configurations\": [", "  \"plausibility_overrides\": " + overrides + ",\n  \"configurations\": [");
    }
    Files.writeString(c, head + "  \"gusts\": " + section + ",\n" + text.substring(at));
    return c;
  }

  private static int lineOfGusts(Path c) throws IOException {
    List<String> lines = Files.readAllLines(c);
    for (int i = 0; i < lines.size(); i++) {
      if (lines.get(i).contains("\"gusts\"")) {
        return i + 1;
      }
    }
    throw new AssertionError("no gusts section");
  }

  @Test
  void readsTheSection(@TempDir Path dir) throws IOException {
    Path c = caseWith(dir, "{\"wing_to_tail_m\": 5.85, \"downwash_gradient\": 0.4, \"elevator_effectiveness\": 0.5, "
        + "\"lift_growth\": \"Unsteady\"}", null);
    GustSection g = GustSectionReader.read(c);
    assertTrue(g.hasPenetration());
    assertEquals(5.85, g.wingToTailM(), 0.0);
    assertEquals(0.4, g.downwashGradient(), 0.0);
    assertEquals(0.5, g.elevatorEffectiveness(), 0.0);
    assertEquals("unsteady", g.liftGrowth());
    assertTrue(g.warnings().isEmpty());
    CaseReader.read(c);
  }

  @Test
  void liftGrowthAloneAndNoSection(@TempDir Path dir) throws IOException {
    GustSection g = GustSectionReader.read(caseWith(dir, "{\"lift_growth\": \"quasi_steady\"}", null));
    assertEquals("quasi_steady", g.liftGrowth());
    assertEquals(false, g.hasPenetration());
    assertSame(GustSection.NONE, GustSectionReader.read(DIR.resolve("good-loop-case.json")));
    assertNull(GustSection.NONE.liftGrowth());
  }

  @Test
  void badValuesGiveFileLinePathExpectedAndFound(@TempDir Path dir) throws IOException {
    String[][] cases = {
        {"{\"wing_to_tail_m\": 5, \"downwash_gradient\": 1.0, \"elevator_effectiveness\": 0.5}",
            "gusts.downwash_gradient", "a value in [0, 1)", "1.0"},
        {"{\"wing_to_tail_m\": 5, \"downwash_gradient\": -0.1, \"elevator_effectiveness\": 0.5}",
            "gusts.downwash_gradient", "a value in [0, 1)", "-0.1"},
        {"{\"wing_to_tail_m\": 5, \"downwash_gradient\": 0.4, \"elevator_effectiveness\": 0}",
            "gusts.elevator_effectiveness", "a value in (0, 1.5]", "0.0"},
        {"{\"wing_to_tail_m\": 5, \"downwash_gradient\": 0.4, \"elevator_effectiveness\": 1.6}",
            "gusts.elevator_effectiveness", "a value in (0, 1.5]", "1.6"},
        {"{\"wing_to_tail_m\": -2, \"downwash_gradient\": 0.4, \"elevator_effectiveness\": 0.5}",
            "gusts.wing_to_tail_m", "a finite distance >= 0 m", "-2.0"},
        {"{\"wing_to_tail_m\": 5, \"downwash_gradient\": 0.4}",
            "gusts", "wing_to_tail_m, downwash_gradient and elevator_effectiveness together (gust penetration) "
            + "or none of them", "only some of them"},
        {"{\"lift_growth\": \"wagner\"}", "gusts.lift_growth", "\"quasi_steady\" or \"unsteady\"", "the text \"wagner\""},
    };
    for (int i = 0; i < cases.length; i++) {
      Path sub = Files.createDirectory(dir.resolve("c" + i));
      Path c = caseWith(sub, cases[i][0], null);
      for (Runnable read : List.<Runnable>of(() -> GustSectionReader.read(c), () -> CaseReader.read(c))) {
        InputFileException e = assertThrows(InputFileException.class, read::run, cases[i][0]);
        assertEquals(c.toString(), e.file());
        assertEquals(lineOfGusts(c), e.line(), cases[i][0]);
        assertEquals(cases[i][1], e.fieldPath());
        assertEquals(cases[i][2], e.expected());
        assertTrue(e.found().startsWith(cases[i][3]), e.found());
      }
    }
  }

  @Test
  void unknownKeysAndImplausibleDistancesAreRefused(@TempDir Path dir) throws IOException {
    Path c = caseWith(Files.createDirectory(dir.resolve("a")), "{\"tail_arm_m\": 5}", null);
    InputFileException e = assertThrows(InputFileException.class, () -> GustSectionReader.read(c));
    assertTrue(e.fieldPath().startsWith("gusts"), e.fieldPath());
    // 600 m is beyond the plausible range [0, 500] m unless the case lifts it (then a warning)
    String far = "{\"wing_to_tail_m\": 600, \"downwash_gradient\": 0.4, \"elevator_effectiveness\": 0.5}";
    Path d = caseWith(Files.createDirectory(dir.resolve("b")), far, null);
    InputFileException implausible = assertThrows(InputFileException.class, () -> GustSectionReader.read(d));
    assertEquals("gusts.wing_to_tail_m", implausible.fieldPath());
    assertTrue(implausible.expected().contains("[0, 500]"), implausible.expected());
    Path lifted = caseWith(Files.createDirectory(dir.resolve("c")), far, "[\"gusts.wing_to_tail_m\"]");
    GustSection g = GustSectionReader.read(lifted);
    assertEquals(600, g.wingToTailM(), 0.0);
    assertEquals(1, g.warnings().size());
    // 45 m is plausible but outside the usual range [0, 40] m: read with a warning
    Path unusual = caseWith(Files.createDirectory(dir.resolve("e")),
        "{\"wing_to_tail_m\": 45, \"downwash_gradient\": 0.4, \"elevator_effectiveness\": 0.5}", null);
    GustSection u = GustSectionReader.read(unusual);
    assertEquals(1, u.warnings().size());
    assertTrue(u.warnings().get(0).text().contains("usual range [0, 40]"), u.warnings().get(0).text());
  }

  @Test
  void theRecordRefusesWhatTheReaderRefuses() {
    assertThrows(InvalidInputException.class, () -> new GustSection(Double.POSITIVE_INFINITY, 0.4, 0.5, null, List.of()));
    assertThrows(InvalidInputException.class, () -> new GustSection(5, Double.NaN, 0.5, null, List.of()));
    assertThrows(InvalidInputException.class, () -> new GustSection(5, 0.4, Double.NaN, null, List.of()));
    assertThrows(InvalidInputException.class, () -> new GustSection(Double.NaN, Double.NaN, 0.5, null, List.of()));
    assertThrows(InvalidInputException.class, () -> new GustSection(Double.NaN, 0.4, Double.NaN, null, List.of()));
    assertThrows(InvalidInputException.class, () -> new GustSection(Double.NaN, Double.NaN, Double.NaN, "x", List.of()));
    // the limits themselves: 0 m, downwash 0, effectiveness 1.5
    assertEquals(1.5, new GustSection(0, 0, 1.5, "unsteady", List.of()).elevatorEffectiveness(), 0.0);
  }
}
