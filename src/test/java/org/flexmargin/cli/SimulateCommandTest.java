package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code simulate} as a user meets it. */
class SimulateCommandTest {

  private static String[] run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = FlexMargin.execute(args, new PrintWriter(out), new PrintWriter(err));
    return new String[] {String.valueOf(code), out.toString(), err.toString()};
  }

  @Test
  void simulatesTheDemoAndWritesItsFiles(@TempDir Path tmp) throws Exception {
    Path out = tmp.resolve("sim");
    String[] r = run("simulate", "mode-tables/demo/demo-case.json", "--speed-eas", "50", "--duration-s", "1.5",
        "--gust-mps", "5", "--gradient-m", "20,60", "--turbulence", "dryden", "--turbulence-s", "20", "--step-s",
        "0.005", "--no-limits", "--out", out.toString());
    assertEquals("0", r[0], r[2]);
    assertTrue(r[1].contains("worst gust: H ="), r[1]);
    assertTrue(r[1].contains("exact RMS"), r[1]);
    assertTrue(r[1].contains("Analysis only"), r[1]);
    for (String f : new String[] {"pilot-input.csv", "gust-peaks.csv", "worst-gust.csv", "turbulence-rms.csv",
        "summary.txt", "charts/doublet-elevator.png", "charts/worst-gust-sensors.png"}) {
      assertTrue(Files.isRegularFile(out.resolve(f)), f);
    }
    String header = Files.readAllLines(out.resolve("pilot-input.csv")).get(0);
    assertTrue(header.startsWith("time_s,sensor_"), header);
    assertTrue(header.contains("elevator_rate_rad_per_s"), header);
  }

  @Test
  void theIntegratorLineCountsExactAndIntegratedSteps(@TempDir Path tmp) {
    // the demo's actuator has a 60 deg/s rate limit that a one-degree doublet at 60 m/s EAS reaches:
    // most steps are exact, the ones at the limit integrated, and the line says both
    String[] r = run("simulate", "mode-tables/demo/demo-case.json", "--speed-eas", "60", "--duration-s", "1.5",
        "--out", tmp.resolve("sim").toString());
    assertEquals("0", r[0], r[2]);
    assertTrue(r[1].matches("(?s).*\\n  \\d+ exact steps clear of the actuator's limits; Dormand-Prince near and at "
        + "them: [1-9]\\d* steps .*"), r[1]);
  }

  @Test
  void badOptionGivesExitTwoAndWritesNothing(@TempDir Path tmp) {
    Path out = tmp.resolve("sim");
    String[] r = run("simulate", "mode-tables/demo/demo-case.json", "--input", "wiggle", "--out", out.toString());
    assertEquals("2", r[0], r[1] + r[2]);
    assertTrue(r[2].contains("--input") && r[2].contains("wiggle"), r[2]);
    assertFalse(r[2].contains("at org."), r[2]);
    assertFalse(Files.exists(out));
  }

  @Test
  void penetrationWithoutItsAerodynamicsGivesExitTwo(@TempDir Path tmp) {
    Path out = tmp.resolve("sim");
    String[] r = run("simulate", "mode-tables/demo/demo-case.json", "--penetration-m", "6", "--downwash-gradient",
        "0.4", "--out", out.toString());
    assertEquals("2", r[0], r[1] + r[2]);
    assertTrue(r[2].contains("--elevator-effectiveness"), r[2]);
    assertFalse(Files.exists(out));
  }

  @Test
  void noiseOnAnUnknownSensorGivesExitTwo(@TempDir Path tmp) {
    Path out = tmp.resolve("sim");
    String[] r = run("simulate", "mode-tables/demo/demo-case.json", "--sensor-noise", "gyro2=0.001", "--out",
        out.toString());
    assertEquals("2", r[0], r[1] + r[2]);
    assertTrue(r[2].contains("--sensor-noise") && r[2].contains("gyro2") && r[2].contains("pitch_rate"), r[2]);
    assertFalse(Files.exists(out));
  }
}
