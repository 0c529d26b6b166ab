package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.flexmargin.clearance.Severity;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.Instability;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The verdict of the invented demo drone as a reviewer reads it: the loop makes the full-payload
 * closed loop unstable inside the normal envelope (V0max = 100 m/s EAS), so that instability, not
 * the least damping or the open-loop flutter at 140 m/s, governs; results.json states the ranking
 * rule beside it, and the report headline names the lowest unstable speed (open or closed loop).
 */
class DemoVerdictTest {
  @TempDir static Path tmp;
  static JsonNode json;
  static String html;

  @BeforeAll
  static void write() throws IOException {
    SharedResults.Solved demo = SharedResults.demo();
    ResultFiles.write(tmp, demo.result(), demo.findings(), "test");
    ReportWriter.write(tmp, demo.result(), demo.findings(), "test");
    json = new ObjectMapper().readTree(tmp.resolve("results.json").toFile());
    html = Files.readString(tmp.resolve("report.html"), StandardCharsets.UTF_8);
  }

  @Test
  void closedLoopInstabilityInsideTheEnvelopeGoverns() {
    ConfigurationResult full = SharedResults.demo().result().configurations().get(0);
    Instability lowest = full.lowestInstability().orElseThrow();
    assertTrue(lowest.closedLoop(), "lowest unstable speed is closed loop: " + lowest.describe());
    double v0max = SharedResults.demo().result().analysisCase().requirements().maxOperatingSpeedEasMps();
    assertTrue(lowest.speedEasMps() < v0max, "inside the normal envelope: " + lowest.describe());
    assertTrue(full.lowestOpenLoopFlutter().orElseThrow().speedEasMps() > lowest.speedEasMps());

    JsonNode clearance = json.at("/configurations/0/clearance");
    JsonNode governing = clearance.get("governing");
    assertEquals(Severity.CLOSED_LOOP_INSTABILITY.key(), governing.get("severity").asText());
    assertEquals(1, governing.get("severity_rank").asInt());
    assertFalse(governing.get("passed").asBoolean());
    // the governing speed is the lowest closed-loop onset itself (same number, written twice)
    assertEquals(lowest.speedEasMps(), governing.get("speed_eas_mps").asDouble(), 1e-9);
    assertEquals(lowest.speedEasMps(), json.at("/configurations/0/lowest_unstable_speed/any/speed_eas_mps")
        .asDouble(), 1e-9);
    assertEquals(Severity.RULE, clearance.get("ranking_rule").asText());
    JsonNode failures = clearance.get("failures_ranked");
    for (int i = 1; i < failures.size(); i++) {
      int a = failures.get(i - 1).get("severity_rank").asInt();
      int b = failures.get(i).get("severity_rank").asInt();
      assertTrue(a < b || a == b && failures.get(i - 1).get("speed_eas_mps").asDouble()
          <= failures.get(i).get("speed_eas_mps").asDouble(), "ranked order at " + i);
    }
  }

  @Test
  void findingNamesSayWhichRequirementIsNoLongerMet() {
    // the first release called these "structural mode lost", "gain increase margin lost", which
    // reads as a tracking failure
    for (Finding f : SharedResults.demo().findings()) {
      assertFalse(f.what().contains("lost"), f.what());
    }
    assertTrue(SharedResults.demo().findings().stream()
        .anyMatch(f -> f.what().equals("structural mode not stabilised")), "structural onset named");
  }

  @Test
  void reportHeadlineNamesTheLowestUnstableSpeed() {
    ConfigurationResult full = SharedResults.demo().result().configurations().get(0);
    String speed = String.format(java.util.Locale.ROOT, "%.2f", full.lowestInstability().orElseThrow().speedEasMps());
    int at = html.indexOf("lowest unstable speed (open or closed loop)");
    assertTrue(at >= 0, "headline wording");
    String headline = html.substring(at, html.indexOf("</p>", at));
    assertTrue(headline.contains(speed) && headline.contains("closed-loop"), headline);
    assertTrue(html.contains("Governing finding (severity 1 of 5, closed-loop instability inside the envelope)"),
        "clearance verdict names the severity");
  }
}
