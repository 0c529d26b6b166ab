package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The envelope command: files, the matched Mach numbers in them, and bad input. */
class EnvelopeCommandTest {
  private static final Path DIR = Path.of("src/test/resources/lattice");

  @Test
  void writesTheMatchedBoundaryAndItsChart(@TempDir Path tmp) throws IOException {
    Path out = tmp.resolve("env");
    CliRun r = CliRun.of("envelope", DIR.resolve("envelope-case.json").toString(), "--out", out.toString());
    assertEquals(0, r.code(), r.err());
    for (String f : List.of("envelope.csv", "envelope.png", "envelope.txt")) {
      assertTrue(Files.size(out.resolve(f)) > 0, f);
    }
    assertTrue(r.out().contains("flutter at altitude"), r.out());
    assertTrue(r.out().contains("ground vibration testing"), "cautions in the output");
    // every converged constant-altitude point: the Mach number of its forces equals its own
    List<String> rows = Files.readAllLines(out.resolve("envelope.csv"));
    int matched = 0;
    for (String row : rows.subList(1, rows.size())) {
      String[] f = row.split(",");
      if (f[1].endsWith("_at_altitude") && f[2].equals("true")) {
        assertEquals(Double.parseDouble(f[9]), Double.parseDouble(f[4]), 1e-4, row);
        matched++;
      }
    }
    assertTrue(matched >= 4, "flutter and divergence at the listed altitudes: " + matched);
  }

  @Test
  void aCaseWithoutAnEnvelopeSectionIsBadInput(@TempDir Path tmp) throws IOException {
    Files.copy(DIR.resolve("wing-modes.json"), tmp.resolve("wing-modes.json"));
    Files.copy(DIR.resolve("lattice-case.json"), tmp.resolve("case.json"));
    CliRun r = CliRun.of("envelope", tmp.resolve("case.json").toString(), "--out", tmp.resolve("o").toString());
    assertEquals(2, r.code());
    assertTrue(r.err().contains("case.json") && r.err().contains("envelope section"), r.err());
    assertFalse(r.err().contains("\tat "), "no stack trace");
    assertFalse(Files.exists(tmp.resolve("o")), "nothing written");
    String text = Files.readString(DIR.resolve("envelope-case.json")).replace("\"dive_speed_eas_mps\": 110",
        "\"dive_speed_eas_mps\": -1");
    Files.writeString(tmp.resolve("bad.json"), text);
    CliRun bad = CliRun.of("envelope", tmp.resolve("bad.json").toString(), "--out", tmp.resolve("o").toString());
    assertEquals(2, bad.code());
    assertTrue(bad.err().contains("envelope.dive_speed_eas_mps"), bad.err());
  }
}
