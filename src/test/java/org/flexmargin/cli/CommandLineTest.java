package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The command line as a user meets it: exit codes, messages, files written or not. */
class CommandLineTest {

  private static CliRun run(String... args) {
    return CliRun.of(args);
  }

  @Test
  void checkSummarisesAValidCase() {
    CliRun r = run("check", "mode-tables/validation/goland-wing.json");
    assertEquals(0, r.code(), r.err());
    assertTrue(r.out().contains("configuration goland: 8 elastic modes"), r.out());
    assertTrue(r.out().contains("sha256"), r.out());
    assertTrue(r.out().contains("input is valid."));
  }

  @Test
  void badInputGivesExitTwoAClearMessageAndNoStackTrace(@TempDir Path tmp) {
    Path out = tmp.resolve("report");
    CliRun r = run("sweep", "src/test/resources/io/bad-station.json", "--out", out.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code());
    assertTrue(r.err().contains("bad input"), r.err());
    assertTrue(r.err().contains("bad-station.json:13: configurations[0].aero.strip_theory.strips[1].station"), r.err());
    assertFalse(r.err().contains("\tat "), "no stack trace without --debug: " + r.err());
    assertFalse(Files.exists(out), "nothing may be written for bad input");
  }

  @Test
  void debugShowsTheStackTrace() {
    CliRun r = run("check", "src/test/resources/io/bad-malformed.json", "--debug");
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code());
    assertTrue(r.err().contains("\tat "), r.err());
  }

  @Test
  void missingFileAndUnknownOptionAreBadInput() {
    assertEquals(FlexMargin.EXIT_BAD_INPUT, run("check", "no/such/case.json").code());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, run("sweep", "--no-such-option", "x.json").code());
  }

  @Test
  void sweepWritesResultsWhoseFindingsMatchTheTable(@TempDir Path tmp) throws IOException {
    Path out = tmp.resolve("lpw");
    CliRun r = run("sweep", "mode-tables/validation/typical-section-lpw.json", "--out", out.toString(), "--threads", "1");
    assertEquals(0, r.code(), r.err());
    assertTrue(r.out().contains("flutter onset"), r.out());
    assertTrue(r.out().contains("Analysis only"), "cautions in the summary");
    JsonNode json = new ObjectMapper().readTree(out.resolve("results.json").toFile());
    JsonNode onset = null;
    for (JsonNode f : json.get("findings")) {
      if (f.get("finding").asText().equals("flutter onset")) {
        onset = f;
      }
    }
    assertTrue(onset != null);
    // elastic axis at the quarter chord: no aerodynamic moment at k = 0, so no divergence
    // (closed form); a regression against rounding-level roots of the defective K^-1 Q(0)
    assertEquals("no divergence", json.get("findings").get(0).get("finding").asText());
    // U* = 6.2566 (derived, docs/validation.md §5.1) with omega_alpha = 2 pi 10 rad/s and b = 1 m
    assertEquals(6.2566 * 20 * Math.PI, onset.get("speed_tas_mps").asDouble(), 1e-3 * 6.2566 * 20 * Math.PI);
    assertTrue(r.out().contains(String.format(java.util.Locale.ROOT, "%.2f", onset.get("speed_tas_mps").asDouble())));
    assertTrue(Files.exists(out.resolve("findings.csv")));
    assertTrue(Files.exists(out.resolve("branches-lpw.csv")) || Files.list(out).anyMatch(
        p -> p.getFileName().toString().startsWith("branches-")));
    assertEquals(3, json.get("cautions").size());
    try (Stream<Path> siblings = Files.list(tmp)) {
      assertEquals(1, siblings.count(), "no temporary folders left beside the report");
    }
  }

  @Test
  void demoWithFailingRequirementsExitsWithThree() throws IOException {
    CliRun r = DemoRun.result();
    assertEquals(FlexMargin.EXIT_REQUIREMENTS_VIOLATED, r.code(), r.err());
    JsonNode json = new ObjectMapper().readTree(DemoRun.folder().resolve("results.json").toFile());
    assertFalse(json.get("configurations").get(0).get("clearance").get("passed").asBoolean());
    assertTrue(Files.exists(DemoRun.folder().resolve("margins-full_payload.csv")));
  }

  @Test
  void everyCommandHasHelpWithExamples() {
    for (String cmd : new String[] {"check", "sweep", "demo", "bench"}) {
      CliRun r = run(cmd, "--help");
      assertEquals(0, r.code());
      assertTrue(r.out().contains("Example"), cmd + " help lacks examples");
    }
  }

  @Test
  void topLevelHelpAndHelpCommandListEveryCommand() {
    String[] names = {"check", "sweep", "demo", "bench", "notch-design", "margins", "simulate", "campaign",
        "envelope"};
    for (String[] args : new String[][] {{"--help"}, {"help"}, {}}) {
      CliRun r = run(args);
      for (String name : names) {
        assertTrue(r.out().contains("  " + name + " ") || r.out().contains("  " + name + "\n"),
            String.join(" ", args) + " does not list " + name + ":\n" + r.out());
      }
    }
    CliRun help = run("help", "sweep");
    assertEquals(0, help.code());
    assertTrue(help.out().contains("Usage: flexmargin sweep"), help.out());
    CliRun typo = run("chek", "case.json");
    assertEquals(FlexMargin.EXIT_BAD_INPUT, typo.code());
    assertTrue(typo.err().contains("check"), "a mistyped command suggests the right one: " + typo.err());
  }

  @Test
  void onlyTheNamedSubcommandIsBuilt() {
    assertEquals(java.util.List.of(CheckCommand.class), FlexMargin.subcommandsFor(new String[] {"check", "x"}));
    assertEquals(10, FlexMargin.subcommandsFor(new String[] {"help", "check"}).size());
    assertEquals(10, FlexMargin.subcommandsFor(new String[] {"--version"}).size());
    assertEquals(10, FlexMargin.subcommandsFor(new String[0]).size());
  }
}
