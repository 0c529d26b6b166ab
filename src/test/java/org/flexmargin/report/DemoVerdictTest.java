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
import java.util.regex.Matcher;
import java.util.regex.Pattern;
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

  /** "required at least 0.03 g, achieved -0.0204 g": sense, required, achieved. */
  private static final Pattern PAIR = Pattern.compile(
      "required (at least|at most) (-?[0-9.]+(?:[eE][-+]?[0-9]+)?)[^,]*, achieved (-?[0-9.]+(?:[eE][-+]?[0-9]+)?)");

  /** Whether the printed pair reads as met; equal printed values read either way (rounding). */
  private static void assertReadsAs(boolean passed, String text) {
    Matcher m = PAIR.matcher(text);
    assertTrue(m.find(), "a required/achieved pair in: " + text);
    double required = Double.parseDouble(m.group(2));
    double achieved = Double.parseDouble(m.group(3));
    if (required == achieved) {
      return;
    }
    boolean readsMet = m.group(1).equals("at least") ? achieved > required : achieved < required;
    assertEquals(passed, readsMet, "printed pair contradicts its verdict: " + text);
  }

  @Test
  void everyPrintedRequiredAchievedPairAgreesWithItsVerdict() {
    // the first release printed the damping requirement as "required -0.0300 g" beside
    // "g at least 0.030", and a failing "achieved 0.0204 g against -0.0300 g"
    int checked = 0;
    for (ConfigurationResult c : SharedResults.demo().result().configurations()) {
      for (var r : c.clearance().ranked()) {
        if (r.check().unit() != org.flexmargin.clearance.CheckUnit.STABILITY) {
          assertReadsAs(r.check().passed(), r.describe());
          checked++;
        }
      }
    }
    // the report: every list item and paragraph of the verdicts, and the requirement table rows
    String text = html.replaceAll("<span[^>]*>|</span>|<strong>|</strong>", "");
    Matcher li = Pattern.compile("<li>(pass|fail): (.*?)</li>").matcher(text);
    while (li.find()) {
      assertReadsAs(li.group(1).equals("pass"), li.group(2));
      checked++;
    }
    Matcher gov = Pattern.compile("(Governing finding|Closest to its limit)([^<]*)").matcher(text);
    while (gov.find()) {
      if (gov.group(2).contains("required at")) {
        assertReadsAs(gov.group(1).startsWith("Closest"), gov.group(2));
        checked++;
      }
    }
    Matcher row = Pattern.compile("<tr><td>[^<]*</td><td>(pass at all|fail at)[^<]*</td><td[^>]*>[^<]*</td>"
        + "<td[^>]*>(at least|at most) ([^<]*)</td><td[^>]*>([^<]*)</td>").matcher(text);
    int rows = 0;
    while (row.find()) {
      assertReadsAs(row.group(1).startsWith("pass"), "required " + row.group(2) + " " + row.group(3) + ", achieved "
          + row.group(4));
      rows++;
    }
    assertTrue(rows > 0, "requirement table rows found");
    assertTrue(checked > 10, "pairs checked: " + checked);
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
    int at = html.indexOf(speed);
    assertTrue(at >= 0, "the page quotes the lowest unstable speed " + speed);
    assertTrue(html.contains("closed-loop instability inside the envelope") || html.contains("closed-loop flutter"),
        "the page says the governing instability is closed loop");
  }

  @Test
  void aMarginThatRoundsToZeroIsShownWithoutASign() {
    // full_payload's worst loop margin is a gain-reduction margin of a few hundredths of a dB
    // below zero: shown to 0.1 dB it is 0.0, never -0.0 (the requirement table's "+-0.0 dB" is a
    // tolerance of zero, not a signed value)
    for (String signed : new String[] {"achieved -0.0 ", "gain margin -0.0 ", "gain margin -0.00 "}) {
      int at = html.indexOf(signed);
      assertEquals(-1, at, () -> "a signed zero in the report: "
          + html.substring(Math.max(0, at - 200), Math.min(html.length(), at + 40)));
    }
    assertTrue(html.contains("achieved 0.0 dB"), "the worst loop margin of full_payload");
  }
}
