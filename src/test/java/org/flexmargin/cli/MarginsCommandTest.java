package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code flexmargin margins}: the bundled loops, the measured overlay, bad input. */
class MarginsCommandTest {
  private static final String PITCH = "mode-tables/loops/ridgeline-pitch-loop.json";
  private static final String GROUND = "mode-tables/loops/ridgeline-ground-test.csv";
  private static final String TYPE1 = "mode-tables/loops/textbook-type1.json";

  /** K/(s(s+1)(s+2)), K = 2: gain margin 20 log10(6/K) = 9.542 dB (closed form); no table, exit 0. */
  @Test
  void textbookLoopWritesItsMargins(@TempDir Path dir) throws Exception {
    Path out = dir.resolve("type1");
    CliRun r = CliRun.of("margins", TYPE1, "--out", out.toString());
    assertEquals(FlexMargin.EXIT_OK, r.code(), r.err());
    assertTrue(r.out().contains("gain margin +9.54 dB"), r.out());
    JsonNode root = new ObjectMapper().readTree(out.resolve("results.json").toFile());
    double gm = root.get("responses").get(0).get("phase_crossovers").get(0).get("gain_margin_db").asDouble();
    assertEquals(20 * Math.log10(3), gm, 1e-9);
    for (String f : new String[] {"report.html", "margins.csv", "response-model.csv", "charts/nichols.png",
        "charts/bode-gain.png", "charts/bode-phase.png"}) {
      assertTrue(Files.isRegularFile(out.resolve(f)), f);
    }
    assertTrue(Files.readString(out.resolve("report.html")).contains("Cautions"));
    assertEquals(List.of(), svgFiles(out), "PNG only by default");
  }

  @Test
  void svgCopiesOnlyWhenAsked(@TempDir Path dir) throws Exception {
    Path out = dir.resolve("type1");
    CliRun r = CliRun.of("margins", TYPE1, "--out", out.toString(), "--quiet", "--svg");
    assertEquals(FlexMargin.EXIT_OK, r.code(), r.err());
    assertEquals(List.of("bode-gain.svg", "bode-phase.svg", "nichols.svg"), svgFiles(out));
    assertTrue(Files.readString(out.resolve("charts/nichols.svg")).contains("<svg"));
    assertTrue(Files.readString(out.resolve("report.html")).contains("charts/nichols.svg"), "the page names the copy");
    r = CliRun.of("margins", TYPE1, "--out", out.toString(), "--quiet", "--no-svg");
    assertEquals(FlexMargin.EXIT_OK, r.code(), r.err());
    assertEquals(List.of(), svgFiles(out));
  }

  private static List<String> svgFiles(Path out) throws IOException {
    try (Stream<Path> s = Files.list(out.resolve("charts"))) {
      return s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".svg")).sorted().toList();
    }
  }

  /**
   * The bundled pitch loop passes; the invented ground-test response beside it fails its fuselage
   * bending peak (the test's mode is lower and less damped than the model's): exit 3, both judged.
   */
  @Test
  void measuredResponseIsJudgedBesideTheModel(@TempDir Path dir) throws Exception {
    Path out = dir.resolve("pitch");
    CliRun r = CliRun.of("margins", PITCH, "--measured", GROUND, "--out", out.toString(), "--no-svg");
    assertEquals(FlexMargin.EXIT_REQUIREMENTS_VIOLATED, r.code(), r.err());
    assertTrue(r.out().contains("model, 0.01000 to 40.00 Hz: PASS"), r.out());
    assertTrue(r.out().contains("measured, 0.1000 to 40.00 Hz: FAIL"), r.out());
    JsonNode root = new ObjectMapper().readTree(out.resolve("results.json").toFile());
    assertEquals(2, root.get("responses").size());
    assertEquals("failed", root.get("responses").get(1).get("structural_modes").get(0).get("status").asText());
    assertEquals("", r.err());
  }

  @Test
  void badLoopFileExitsTwoWithFileLineAndFieldAndWritesNothing(@TempDir Path dir) throws Exception {
    Path bad = dir.resolve("bad.json");
    Files.writeString(bad, "{\n  \"format\": 1,\n  \"name\": \"bad\",\n  \"zeros_poles_gain\": {\n"
        + "    \"poles\": [0, [-1, -2]],\n    \"gain\": 1\n  }\n}\n");
    Path out = dir.resolve("out");
    CliRun r = CliRun.of("margins", bad.toString(), "--out", out.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code());
    assertTrue(r.err().contains("bad.json:5"), r.err());
    assertTrue(r.err().contains("zeros_poles_gain.poles[1]"), r.err());
    assertFalse(r.err().contains("\tat "), r.err());
    assertFalse(Files.exists(out));

    Path two = dir.resolve("two.json");
    Files.writeString(two, "{\"format\": 1, \"name\": \"two\", \"transfer_function\": {\"numerator\": [1], "
        + "\"denominator\": [1, 1]}, \"state_space\": {\"a\": [[-1]], \"b\": [1], \"c\": [1]}}");
    CliRun r2 = CliRun.of("margins", two.toString(), "--out", out.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r2.code());
    assertTrue(r2.err().contains("two.json:1"), r2.err());

    Path csv = dir.resolve("m.csv");
    Files.writeString(csv, "# test\nfrequency_hz,gain_db,phase_deg\n1,0,-90\n2,-3,-100\n1.5,-4,-120\n");
    CliRun r3 = CliRun.of("margins", TYPE1, "--measured", csv.toString(), "--out", out.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r3.code());
    assertTrue(r3.err().contains("m.csv:5: frequency_hz[2]"), r3.err());
    assertFalse(Files.exists(out));
  }
}
