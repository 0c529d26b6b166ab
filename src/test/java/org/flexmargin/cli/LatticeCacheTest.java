package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The lattice force cache from the command line: written once, reused, renewed on change. */
class LatticeCacheTest {
  private static final Path DIR = Path.of("src/test/resources/lattice");

  @Test
  void secondRunReadsTheCacheAndAChangeRenewsIt(@TempDir Path tmp) throws IOException {
    Files.copy(DIR.resolve("wing-modes.json"), tmp.resolve("wing-modes.json"));
    String base = Files.readString(DIR.resolve("lattice-case.json"))
        .replace("\"mach\": 0.3,", "\"mach\": 0.3, \"mach_numbers\": [0.3, 0.5], \"force_cache_file\": \"forces.bin\","
            + " \"elevator_control\": \"flap\", \"control_surfaces\": [{\"name\": \"flap\", \"surface\": \"wing\","
            + " \"hinge_chord_fraction\": 0.75}],");
    Path file = tmp.resolve("case.json");
    Files.writeString(file, base);
    CliRun first = CliRun.of("check", file.toString());
    assertEquals(0, first.code(), first.err());
    assertTrue(first.err().contains("lattice forces computed in"), first.err());
    assertTrue(first.err().contains("no cache file yet"), first.err());
    assertTrue(Files.exists(tmp.resolve("forces.bin")));
    assertTrue(first.out().contains("Mach 0.300 (table 0.300 to 0.500)"), first.out());
    assertTrue(first.out().contains("elevator \"flap\" (steady)"), first.out());
    CliRun second = CliRun.of("check", file.toString());
    assertEquals(0, second.code(), second.err());
    assertTrue(second.err().contains("lattice forces read from"), second.err());
    assertEquals(first.out(), second.out(), "same forces, same description");
    Files.writeString(file, base.replace("[0.3, 0.5]", "[0.3, 0.6]"));
    CliRun third = CliRun.of("check", file.toString());
    assertTrue(third.err().contains("computed for other inputs"), third.err());
  }
}
