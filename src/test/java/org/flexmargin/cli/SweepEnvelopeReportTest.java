package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The sweep command shows the matched-point envelope in report.html when the case has one. */
class SweepEnvelopeReportTest {
  private static final Path DIR = Path.of("src/test/resources/lattice");

  @Test
  void aCaseWithAnEnvelopeSectionGetsTheEnvelopeInItsReport(@TempDir Path tmp) throws IOException {
    Path out = tmp.resolve("r");
    CliRun r = CliRun.of("sweep", DIR.resolve("envelope-case.json").toString(), "--out", out.toString(), "--quiet");
    assertEquals(0, r.code(), r.err());
    String page = Files.readString(out.resolve("report.html"));
    assertTrue(page.contains("<section id=\"envelope\">"), "envelope section");
    assertTrue(page.contains("flutter at altitude") && page.contains("divergence at mach"), "its table");
    assertTrue(Files.size(out.resolve("charts/envelope.png")) > 1000);
  }

  @Test
  void anInvalidEnvelopeSectionStopsTheSweepBeforeAnyComputation(@TempDir Path tmp) throws IOException {
    Files.copy(DIR.resolve("wing-modes.json"), tmp.resolve("wing-modes.json"));
    String text = Files.readString(DIR.resolve("envelope-case.json")).replace("\"dive_speed_eas_mps\": 110",
        "\"dive_speed_eas_mps\": -1");
    Files.writeString(tmp.resolve("bad.json"), text);
    CliRun bad = CliRun.of("sweep", tmp.resolve("bad.json").toString(), "--out", tmp.resolve("o").toString());
    assertEquals(2, bad.code());
    assertTrue(bad.err().contains("envelope.dive_speed_eas_mps"), bad.err());
    assertFalse(Files.exists(tmp.resolve("o")), "nothing written");
  }
}
