package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.flexmargin.campaign.TinyCampaign;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code flexmargin campaign}: files written, resumption, bad input. */
class CampaignCommandTest {
  @TempDir Path dir;

  @Test
  void runsWritesEverythingAndResumes() throws Exception {
    Path campaign = TinyCampaign.write(dir, 4, 0.05, 3);
    Path out = dir.resolve("run");
    CliRun first = CliRun.of("campaign", campaign.toString(), "--out", out.toString(), "--threads", "2");
    // no requirements in the case: samples are not judged, so none is cleared: exit 3
    assertEquals(3, first.code(), first.err());
    assertTrue(first.out().contains("all samples"), first.out());
    assertTrue(first.out().contains("Cautions"), first.out());
    for (String f : new String[] {"samples.csv", "margins.csv", "summary.json", "campaign.html",
        "charts/first-problem.png"}) {
      assertTrue(Files.exists(out.resolve(f)), f);
    }
    String summary = Files.readString(out.resolve("summary.json"));
    assertTrue(summary.contains("\"probability_of_clearance\" : 0.0"), summary);
    byte[] samples = Files.readAllBytes(out.resolve("samples.csv"));
    assertEquals(1 + 8, Files.readAllLines(out.resolve("samples.csv")).size());
    CliRun again = CliRun.of("campaign", campaign.toString(), "--out", out.toString());
    assertEquals(3, again.code(), again.err());
    assertTrue(again.out().contains("resuming: 8 sample(s) already done"), again.out());
    assertArrayEquals(samples, Files.readAllBytes(out.resolve("samples.csv")));
    // the two worst samples (worst_samples 2) are case files that sweep reads and runs
    java.util.List<Path> cases;
    try (var s = Files.list(out.resolve("worst"))) {
      cases = s.filter(p -> !p.toString().endsWith("-modes.json")).toList();
    }
    assertEquals(2, cases.size(), cases.toString());
    CliRun sweep = CliRun.of("sweep", cases.get(0).toString(), "--out",
        dir.resolve("sweep").toString(), "--quiet");
    assertEquals(0, sweep.code(), sweep.err());
  }

  @Test
  void badInputNamesFileLineAndFieldAndWritesNothing() throws Exception {
    Path campaign = TinyCampaign.write(dir, 4, 0.05, 3);
    Files.writeString(campaign, Files.readString(campaign).replace("\"matrix\": {",
        "\"matrix\": {\"configurations\": [\"only\", \"missing\"],"));
    Path out = dir.resolve("run");
    CliRun r = CliRun.of("campaign", campaign.toString(), "--out", out.toString());
    assertEquals(2, r.code(), r.err());
    assertTrue(r.err().contains("campaign.json"), r.err());
    assertTrue(r.err().contains("matrix.configurations[1]"), r.err());
    assertTrue(r.err().contains("campaign.json:2:"), r.err()); // line 2 of the file
    assertFalse(r.err().contains("at org."), "no stack trace without --debug");
    assertFalse(Files.exists(out));
  }

  @Test
  void refusesAFolderWithOtherFiles() throws Exception {
    Path campaign = TinyCampaign.write(dir, 2, 0.05, 3);
    Path out = Files.createDirectories(dir.resolve("busy"));
    Files.writeString(out.resolve("notes.txt"), "mine");
    CliRun r = CliRun.of("campaign", campaign.toString(), "--out", out.toString(), "--quiet");
    assertEquals(2, r.code(), r.err());
    assertTrue(r.err().contains("--out"), r.err());
    assertEquals(1, Files.list(out).count());
  }
}
