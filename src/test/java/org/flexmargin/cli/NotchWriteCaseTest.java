package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.NotchFilterSpec;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code notch-design --write-case}: the design flows back into a case file that reads as a case,
 * carries exactly the designed filters and the original tables, and never replaces a file unasked.
 * One short design (demo up to 70 m/s EAS, every sixth point) serves all checks.
 */
class NotchWriteCaseTest {
  private static final String DEMO = "mode-tables/demo/demo-case.json";

  private static CliRun run(String... args) {
    return CliRun.of(args);
  }

  private static String[] design(Path outDir, String... more) {
    List<String> args = new java.util.ArrayList<>(List.of("notch-design", DEMO, "--out", outDir.toString(),
        "--max-eas", "70", "--stride", "6", "--quiet"));
    args.addAll(List.of(more));
    return args.toArray(String[]::new);
  }

  @Test
  void theDesignIsWrittenIntoACopyOfTheCase(@TempDir Path tmp) throws Exception {
    Path updated = tmp.resolve("cases").resolve("mc7-notched.json");
    CliRun r = run(design(tmp.resolve("nd"), "--write-case", updated.toString()));
    assertEquals(0, r.code(), r.err());
    AnalysisCase original = CaseReader.read(Path.of(DEMO));
    AnalysisCase copy = CaseReader.read(updated);
    // same tables (references rewritten for the new folder), same everything but the filters
    assertEquals(original.inputs().subList(1, original.inputs().size()).stream().map(f -> f.sha256()).toList(),
        copy.inputs().subList(1, copy.inputs().size()).stream().map(f -> f.sha256()).toList());
    assertEquals(original.sweep(), copy.sweep());
    assertEquals(original.requirements(), copy.requirements());
    JsonNode fragment = new ObjectMapper().readTree(tmp.resolve("nd").resolve("notch-filters.json").toFile());
    JsonNode designJson = new ObjectMapper().readTree(tmp.resolve("nd").resolve("notch-design.json").toFile());
    for (JsonNode p : fragment.get("paths")) {
      List<FilterSpec> filters = copy.loop().paths().get(p.get("path_index").asInt()).filters();
      assertEquals(p.get("filters").size(), filters.size());
      int notches = 0;
      for (int i = 0; i < filters.size(); i++) {
        if (filters.get(i) instanceof NotchFilterSpec n) {
          JsonNode want = p.get("filters").get(i).get("notch");
          assertEquals(want.get("centre_hz").asDouble(), n.centreHz(), 0.0);
          assertEquals(want.get("numerator_damping_ratio").asDouble(), n.numeratorDampingRatio(), 0.0);
          notches++;
        }
      }
      assertEquals(designJson.get("notches").size(), notches);
    }
    // the users' width key is the -3 dB width, wider than the half-depth width of the same notch
    for (JsonNode n : designJson.get("notches")) {
      assertTrue(n.get("width_3db_hz").asDouble() > n.get("half_depth_width_hz").asDouble(), n.toString());
      assertFalse(n.has("width_hz"));
    }
    // the discrete-time sections: one per notch, the centre depth kept exactly by the pre-warping
    // (Oppenheim & Schafer, Discrete-Time Signal Processing, section 7.1.2), checked as sweep judges
    JsonNode discrete = designJson.get("discrete_sections");
    assertEquals(0.0125, discrete.get("sample_period_s").asDouble(), 0.0);
    assertEquals(designJson.get("notches").size(), discrete.get("sections").size());
    for (JsonNode s : discrete.get("sections")) {
      assertEquals(s.get("continuous_centre_gain_db").asDouble(), s.get("centre_gain_db").asDouble(), 1e-9);
      assertEquals(1.0, s.get("denominator").get(0).asDouble(), 0.0);
      assertEquals(3, s.get("numerator").size());
    }
    assertTrue(discrete.get("check_passes").asBoolean(), discrete.toString());
    JsonNode discreteFragment = new ObjectMapper().readTree(tmp.resolve("nd").resolve("notch-filters-discrete.json")
        .toFile());
    JsonNode first = discreteFragment.get("paths").get(0).get("filters").get(0).get("discrete");
    assertEquals(discrete.get("sections").get(0).get("numerator"), first.get("numerator"));
    // nothing else beside the written case
    try (var s = Files.list(updated.getParent())) {
      assertEquals(1, s.count());
    }

    // an existing file is not replaced unasked, the input case included; checked before the design
    Path input = tmp.resolve("cases").resolve("own.json");
    Files.writeString(input, Files.readString(updated));
    String before = Files.readString(input);
    CliRun refused = run("notch-design", input.toString(), "--write-case", input.toString(), "--out",
        tmp.resolve("nd2").toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, refused.code(), refused.err());
    assertTrue(refused.err().contains("--overwrite"), refused.err());
    assertEquals(before, Files.readString(input));
    assertFalse(Files.exists(tmp.resolve("nd2")), "refused before the design");

    assertEquals(FlexMargin.EXIT_BAD_INPUT, run("notch-design", DEMO, "--check-only", "--write-case",
        tmp.resolve("x.json").toString()).code(), "a check has no design to write");
  }
}
