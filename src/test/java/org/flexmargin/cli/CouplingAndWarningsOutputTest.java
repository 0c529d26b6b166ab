package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What a user sees of the mode coupling's origin (check) and of input warnings (results.json and
 * the report's first screen).
 */
class CouplingAndWarningsOutputTest {

  private static final Path IO = Path.of("src/test/resources/io");
  private static final Path DEMO = Path.of("mode-tables/demo");

  /** Copies the files into dir; returns the copy of the first. */
  private static Path copied(Path from, Path dir, String... files) throws IOException {
    for (String f : files) {
      Files.copy(from.resolve(f), dir.resolve(f));
    }
    return dir.resolve(files[0]);
  }

  @Test
  void checkNamesTheOriginOfEveryModesCoupling() {
    CliRun r = CliRun.of("check", DEMO.resolve("demo-case.json").toString());
    assertEquals(FlexMargin.EXIT_OK, r.code(), r.err());
    assertTrue(r.out().matches("(?s).*\\n\\s+wing_bending_1\\s+supplied\\s.*"), r.out());
    assertTrue(r.out().matches("(?s).*\\n\\s+tailplane_bending_1\\s+computed from strips\\s.*"), r.out());
    assertTrue(r.out().contains("computed from the strips (quasi-steady) for modes [tailplane_bending_1, "
        + "wing_bending_3, wing_torsion_2]"), r.out());
    assertTrue(r.out().contains("strips give CL_alpha"), r.out());
  }

  @Test
  void anElevatorOnAnUnplacedStripIsABadInputAtItsLine(@TempDir Path dir) throws IOException {
    Path c = copied(DEMO, dir, "demo-case.json", "ridgeline-mc7-full-payload.json", "ridgeline-mc7-empty.csv");
    int line = BadInputCampaignTest.mutate(c, "\"elastic_axis_aft_of_cg_m\": 6.0,", "");
    CliRun r = CliRun.of("check", c.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code(), r.out());
    assertTrue(r.err().contains(":" + (line + 1) + ": configurations[0].aero.strip_theory.strips[12]"
        + ".elevator_chord_fraction"), r.err());
    assertFalse(r.err().contains("Exception"), r.err());
  }

  @Test
  void inputWarningsReachResultsAndTheReportsFirstScreen(@TempDir Path dir) throws IOException {
    Path c = copied(IO, dir, "good-case.json", "good-modes.json", "good-forces.json");
    int line = BadInputCampaignTest.mutate(c, "\"width_m\": 1.0,", "\"width_m\": 25.0,");
    Path out = dir.resolve("out");
    CliRun r = CliRun.of("sweep", c.toString(), "--out", out.toString(), "--quiet", "--no-svg");
    assertEquals(FlexMargin.EXIT_OK, r.code(), r.err());
    JsonNode warnings = new ObjectMapper().readTree(out.resolve("results.json").toFile()).get("input_warnings");
    assertEquals(1, warnings.size(), warnings.toString());
    JsonNode w = warnings.get(0);
    assertEquals("configurations[0].aero.strip_theory.strips[0].width_m", w.get("field").asText());
    assertEquals(line, w.get("line").asInt());
    assertTrue(w.get("text").asText().contains("outside the usual range [0.001, 20] m"), w.toString());
    String html = Files.readString(out.resolve("report.html"));
    int strip = html.indexOf("id=\"verdict\"");
    int list = html.indexOf("id=\"input-warnings\"");
    assertTrue(strip >= 0 && list > strip, "input warnings after the verdict strip");
    assertTrue(html.indexOf("strips[0].width_m: 25.0 m is outside the usual range", list) > list, "warning text listed");
  }
}
