package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.simulate.LoopComparison;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo's report (invented data) carries the rate-saturation line of every loop point (its
 * actuator has a 60 deg/s rate limit) and, when asked, the time-domain check at V0max.
 */
class SimulationReportTest {

  @Test
  void everyLoopPointHasItsRateSaturationLineAndTheReportItsChecks(@TempDir Path tmp) throws Exception {
    SharedResults.Solved demo = SharedResults.demo();
    ResultFiles.write(tmp, demo.result(), demo.findings(), "test");
    LoopComparison check = LoopComparison.of(demo.result().analysisCase(), null, "none");
    ReportWriter.write(tmp, demo.result(), demo.findings(), "test",
        ReportOptions.defaults().withTimeDomainCheck(check));
    JsonNode root = new ObjectMapper().readTree(tmp.resolve("results.json").toFile());
    double rate = Math.toRadians(60);
    for (JsonNode c : root.get("configurations")) {
      for (JsonNode p : c.get("loop").get("points")) {
        JsonNode line = p.get("rate_saturation");
        assertTrue(line != null && line.isObject(), "rate_saturation at " + p.get("speed_eas_mps"));
        double f = line.get("frequency_hz").asDouble();
        double gain = line.get("elevator_per_command").asDouble();
        // definition: w |F| A = R
        assertEquals(rate, 2 * Math.PI * f * gain * line.get("command_amplitude_rad").asDouble(), 1e-9 * rate);
      }
    }
    List<String> csv = Files.readAllLines(tmp.resolve("margins-full_payload.csv"));
    assertTrue(csv.get(0).endsWith("rate_saturation_injection_amplitude_rad"), csv.get(0));
    assertEquals(csv.get(0).split(",", -1).length, csv.get(1).split(",", -1).length);
    String html = Files.readString(tmp.resolve("report.html"));
    assertTrue(html.contains("Actuator rate saturation at the critical structural frequency"));
    assertTrue(html.contains("id=\"time-domain-check\""));
    for (String chart : List.of("time-doublet-sensors", "time-doublet-elevator-rate", "time-gust-sensors",
        "time-gust-elevator-rate")) {
      assertTrue(Files.isRegularFile(tmp.resolve("charts").resolve(chart + ".png")), chart);
    }
    // the check states the closed loop's stability at the demo's V0max (full payload) as its
    // eigenvalues give it
    double maxRe = check.variants().get(0).result().closedLoopMaxRealPartPerS();
    assertTrue(html.contains(maxRe < 0 ? ">stable</td>" : "UNSTABLE (Re s ="), "max Re s " + maxRe);
  }
}
