package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A sweep whose mode tracking stays in doubt after re-solving ends with its own exit code (5), not
 * with 0: the typical section of Lee, Price &amp; Wong (case file in mode-tables/validation) swept
 * with three points from 10 to 5000 m/s, far beyond the plausible airspeed range, which the case
 * lifts on purpose with {@code plausibility_overrides}. The first release exited 0 on this sweep
 * and reported no flutter, although the section flutters at 393.1 m/s (derived, exact Theodorsen;
 * docs/validation.md).
 */
class UnreliableFindingsExitTest {
  @Test
  void trackingInDoubtEndsWithExitFiveAndSaysWhy(@TempDir Path tmp) throws IOException {
    String lpw = Files.readString(Path.of("mode-tables/validation/typical-section-lpw.json"));
    String coarse = lpw.replaceFirst("\"from_mps\": [0-9.]+", "\"from_mps\": 10")
        .replaceFirst("\"to_mps\": [0-9.]+", "\"to_mps\": 5000")
        .replaceFirst("\"points\": [0-9]+", "\"points\": 3")
        .replaceFirst("\\{", "{\n  \"plausibility_overrides\": [\"sweep.speed_mps\"],");
    Path file = tmp.resolve("coarse.json");
    Files.writeString(file, coarse);
    CliRun r = CliRun.of("sweep", file.toString(), "--out", tmp.resolve("out").toString(), "--no-svg");
    assertEquals(FlexMargin.EXIT_UNRELIABLE, r.code(), r.out() + r.err());
    String all = r.out() + r.err();
    assertTrue(all.contains("UNRELIABLE"), all);
    assertTrue(all.contains("beyond the plausible range") || all.contains("plausibility"), all);
  }
}
