package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code sweep} (here through {@code demo}, the sweep of the bundled case) and {@code notch-design
 * --check-only} judge the invented demo drone by one
 * definition of frequency bands, speed regimes, modal-frequency uncertainty and the
 * phase-stabilisation rule: every requirement of every configuration (each structural mode, each
 * margin kind in each band, the flutter, divergence, damping and stability checks) gets the same
 * verdict, the same required and achieved values and the same ranking speed from both commands.
 * The first release disagreed: fuselage bending 1 was phase-stabilised in one and failed by
 * +2.64 dB in the other, and the rigid-body gain margin was 28.7 dB in one and "none" in the other.
 */
class VerdictAgreementTest {

  private static int run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = FlexMargin.execute(args, new PrintWriter(out), new PrintWriter(err));
    assertTrue(err.toString().isEmpty() || code != 1, err.toString());
    return code;
  }

  /** configuration | requirement | subject -> the entry. */
  private static Map<String, JsonNode> byKey(JsonNode configurations, String name, String list) {
    Map<String, JsonNode> out = new TreeMap<>();
    for (JsonNode c : configurations) {
      JsonNode l = list.isEmpty() ? c.get("requirements") : c.at(list);
      for (JsonNode r : l) {
        JsonNode before = out.put(c.get(name).asText() + " | " + r.get("requirement").asText() + " | "
            + r.get("subject").asText(), r);
        assertEquals(null, before, "one entry per requirement");
      }
    }
    return out;
  }

  @Test
  void sweepAndFilterCheckGiveTheSameVerdictOnEveryModeAndBand(@TempDir Path tmp) throws IOException {
    String demo = "mode-tables/demo/demo-case.json";
    // the demo command is the sweep of the bundled demo case (one shared run, see DemoRun)
    assertEquals(FlexMargin.EXIT_REQUIREMENTS_VIOLATED, DemoRun.result().code(), DemoRun.result().err());
    assertEquals(FlexMargin.EXIT_REQUIREMENTS_VIOLATED, run("notch-design", demo, "--check-only", "--out",
        tmp.resolve("n").toString(), "--quiet"));
    ObjectMapper m = new ObjectMapper();
    JsonNode sweep = m.readTree(DemoRun.folder().resolve("results.json").toFile()).get("configurations");
    JsonNode check = m.readTree(tmp.resolve("n/notch-check.json").toFile()).get("configurations");
    Map<String, JsonNode> a = byKey(sweep, "name", "/clearance/requirements");
    Map<String, JsonNode> b = byKey(check, "name", "");
    assertEquals(a.keySet(), b.keySet(), "the same requirements in both");
    assertTrue(a.keySet().stream().anyMatch(k -> k.contains("structural_mode | fuselage_bending_1")), "per mode");
    assertTrue(a.keySet().stream().anyMatch(k -> k.contains("gain_increase_margin | rigid_body")), "per band");
    for (Map.Entry<String, JsonNode> e : a.entrySet()) {
      JsonNode x = e.getValue();
      JsonNode y = b.get(e.getKey());
      assertEquals(x.get("passed").asBoolean(), y.get("passed").asBoolean(), e.getKey());
      assertEquals(x.get("description").asText(), y.get("description").asText(), e.getKey());
      // notch-check.json prints 6 significant digits: relative 1e-5 covers the rounding
      for (String f : new String[] {"required", "achieved", "speed_eas_mps"}) {
        double u = x.get(f).asDouble();
        assertEquals(u, y.get(f).asDouble(), 1e-5 * Math.max(1.0, Math.abs(u)), e.getKey() + " " + f);
      }
    }
    for (int i = 0; i < sweep.size(); i++) {
      assertEquals(sweep.get(i).at("/clearance/passed").asBoolean(), check.get(i).get("passed").asBoolean());
    }
  }
}
