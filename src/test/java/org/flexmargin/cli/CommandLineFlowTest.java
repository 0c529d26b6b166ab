package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.InputFile;
import org.flexmargin.report.ReportFolder;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line's handling of the output folder, threads, cost, the bundled demo, help texts and
 * the requirements file. Sweeps here use the fast typical section (61 points, two modes).
 */
class CommandLineFlowTest {
  private static final String LPW = "mode-tables/validation/typical-section-lpw.json";
  private static final String DEMO = "mode-tables/demo/demo-case.json";

  private static CliRun run(String... args) {
    return CliRun.of(args);
  }

  /** @return true if the help text lists the option (a line starting with it, after the short name) */
  private static boolean listsOption(String help, String option) {
    return help.lines().map(String::strip).anyMatch(l -> l.startsWith(option) || l.matches("-\\w, " + option + "\\b.*"));
  }

  private static long entries(Path dir) throws IOException {
    try (Stream<Path> s = Files.list(dir)) {
      return s.count();
    }
  }

  @Test
  void outNamingAnExistingFileIsRefusedBeforeAnyWorkAndTheFileKept(@TempDir Path tmp) throws IOException {
    Path file = tmp.resolve("results.txt");
    Files.writeString(file, "mine");
    CliRun r = run("sweep", LPW, "--out", file.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code(), r.err());
    assertTrue(r.err().contains("not a folder"), r.err());
    assertFalse(r.out().contains("estimated cost"), "refused before the estimate and the sweep");
    assertEquals("mine", Files.readString(file));
    assertEquals(1, entries(tmp));
  }

  @Test
  void outBelowAFileSaysWhy(@TempDir Path tmp) throws IOException {
    Path file = tmp.resolve("results.txt");
    Files.writeString(file, "mine");
    CliRun r = run("sweep", LPW, "--out", file.resolve("report").toString(), "--quiet");
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code());
    assertTrue(r.err().contains("is a regular file, not a folder, so nothing can be created below it"), r.err());
    assertFalse(r.err().contains("\tat "));
  }

  @Test
  void threadsBelowOneAreBadInput() {
    for (String n : new String[] {"0", "-1"}) {
      CliRun r = run("sweep", LPW, "--threads", n, "--out", "/nonexistent-never-written");
      assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code(), n + ": " + r.err());
      assertTrue(r.err().contains("--threads: expected a whole number of threads >= 1, found " + n), r.err());
    }
  }

  @Test
  void aWriteFailureHasItsOwnExitCode(@TempDir Path tmp) throws IOException {
    // /proc accepts no new folders, not even from root: a portable stand-in for a read-only disk
    Path target = Path.of("/proc", "flexmargin-output-test");
    boolean writable;
    try {
      Files.createTempDirectory(Path.of("/proc"), "probe");
      writable = true;
    } catch (IOException | UnsupportedOperationException e) {
      writable = false;
    }
    assumeTrue(!writable && Files.isDirectory(Path.of("/proc")), "needs a folder that refuses writes");
    CliRun r = run("sweep", LPW, "--out", target.toString(), "--quiet", "--threads", "1");
    assertEquals(FlexMargin.EXIT_WRITE_FAILED, r.code(), r.err());
    assertTrue(r.err().contains("output not written"), r.err());
    assertFalse(r.err().contains("internal error"), r.err());
  }

  @Test
  void checkPrintsTheEstimatedCostAndIgnoresNoOptionItLists() {
    CliRun r = run("check", DEMO);
    assertEquals(0, r.code(), r.err());
    assertTrue(r.out().contains("estimated cost: 2 configuration(s) x 55 grid points, up to 8 modes"), r.out());
    CliRun help = run("check", "--help");
    for (String ignored : List.of("--threads", "--speed-unit", "--[no-]svg", "--force", "--out")) {
      assertFalse(listsOption(help.out(), ignored), "check does not use " + ignored + ":\n" + help.out());
    }
    CliRun quiet = run("check", DEMO, "--quiet");
    assertEquals(0, quiet.code());
    assertEquals("", quiet.out(), "--quiet leaves only errors");
    CliRun notch = run("notch-design", "--help");
    for (String ignored : List.of("--threads", "--speed-unit", "--[no-]svg", "--force")) {
      assertFalse(listsOption(notch.out(), ignored), "notch-design does not use " + ignored);
    }
    CliRun sweep = run("sweep", "--help");
    for (String used : List.of("--threads", "--speed-unit", "--[no-]svg", "--force", "--requirements", "--out")) {
      assertTrue(listsOption(sweep.out(), used), "sweep lists " + used);
    }
  }

  @Test
  void aRunAboveTheCostLimitIsRefusedUnlessForced(@TempDir Path tmp) throws IOException {
    Path big = tmp.resolve("big-case.json");
    Files.writeString(big, Files.readString(Path.of(DEMO)).replace("\"points\": 55", "\"points\": 100000"));
    for (Path table : List.of(Path.of("mode-tables/demo/ridgeline-mc7-full-payload.json"),
        Path.of("mode-tables/demo/ridgeline-mc7-empty.csv"))) {
      Files.copy(table, tmp.resolve(table.getFileName()));
    }
    Path out = tmp.resolve("report");
    CliRun r = run("sweep", big.toString(), "--out", out.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code(), r.err());
    assertTrue(r.err().contains("estimated cost: expected at most " + CostEstimate.LIMIT_TEXT
        + " (give --force to run anyway)"), r.err());
    assertTrue(r.out().contains("x 100000 grid points"), r.out());
    assertFalse(Files.exists(out));
    CliRun check = run("check", big.toString());
    assertTrue(check.out().contains("sweep refuses this case unless --force is given"), check.out());
  }

  @Test
  void costEstimateScales() {
    CostEstimate demo = new CostEstimate(List.of(CostEstimate.stages("a", 8, 55, true, true),
        CostEstimate.stages("b", 8, 55, true, true)));
    // the demo takes about 10 to 25 s of computing on this project's 2-core machine (measured)
    assertTrue(demo.cpuSeconds() > 3 && demo.cpuSeconds() < 60, "demo " + demo.cpuSeconds());
    assertFalse(demo.overLimit());
    assertEquals(demo.cpuSeconds() / 2, demo.wallSeconds(2), 1e-9, "two equal configurations on two threads");
    // 200 modes at the demo's 55 points, and a million points of a two-mode section: both refused
    assertTrue(new CostEstimate(List.of(CostEstimate.stages("m200", 200, 55, true, true))).overLimit());
    assertTrue(new CostEstimate(List.of(CostEstimate.stages("p1e6", 2, 1_000_000, false, false))).overLimit());
    assertEquals("12 min", CostEstimate.duration(720));
  }

  @Test
  void theProgressBarWeighsStagesByTheirCost() {
    CostEstimate.Stages s = CostEstimate.stages("full_payload", 8, 55, true, true);
    StringWriter sink = new StringWriter();
    ProgressBar bar = new ProgressBar(new PrintWriter(sink), new CostEstimate(List.of(s)), true);
    bar.stageDone("full_payload", "divergence and flutter");
    // counting stages would say 25 %; the flutter stage is a small part of the demo's work (about
    // 12 % since the loop's forces are interpolated)
    assertTrue(bar.fractionDone() < 0.15, "after flutter: " + bar.fractionDone());
    bar.stageDone("full_payload", "loop margins");
    bar.stageDone("full_payload", "closed loop");
    assertTrue(bar.fractionDone() < 1, "not complete before the last stage");
    bar.stageDone("full_payload", "clearance");
    assertEquals(1.0, bar.fractionDone(), 0.0);
    assertTrue(sink.toString().contains("100%"), sink.toString());
  }

  @Test
  void theDemoIsInsideTheJarAndWritesToAGitIgnoredFolder() throws Exception {
    for (String name : DemoCommand.FILES) {
      try (InputStream in = DemoCommand.class.getResourceAsStream(DemoCommand.RESOURCE_FOLDER + name)) {
        assertTrue(in != null, name + " bundled");
        assertTrue(java.util.Arrays.equals(Files.readAllBytes(Path.of("mode-tables/demo", name)), in.readAllBytes()),
            name + " is the same file as in mode-tables/demo");
      }
    }
    try (Stream<Path> s = Files.list(Path.of("mode-tables/demo"))) {
      assertEquals(DemoCommand.FILES.size(), s.count(), "every demo file is bundled");
    }
    AnalysisCase bundled = DemoCommand.bundledCase();
    AnalysisCase onDisk = CaseReader.read(Path.of(DEMO));
    assertEquals(onDisk.inputs().stream().map(InputFile::sha256).toList(),
        bundled.inputs().stream().map(InputFile::sha256).toList());
    assertTrue(bundled.inputs().get(0).path().startsWith("(bundled demo) demo-case.json"), bundled.inputs().toString());
    assertFalse(DemoCommand.DEFAULT_OUT.equals(Path.of("reports", "ridgeline-mc7-demo")),
        "the committed sample is never the default target");
    Process git = new ProcessBuilder("git", "check-ignore", "-q", DemoCommand.DEFAULT_OUT.resolve("report.html").toString())
        .redirectErrorStream(true).start();
    int ignored = git.waitFor();
    assumeTrue(ignored != 128, "inside a git work tree");
    assertEquals(0, ignored, "git ignores the demo's default output folder");
  }

  @Test
  void sweepTakesARequirementsFile(@TempDir Path tmp) throws IOException {
    // flutter of this section at 393.1 m/s EAS (sea level; references in docs/validation.md):
    // with V_L = 400 m/s EAS it misses 1.15 V_L = 460 m/s, with V_L = 150 m/s it clears 172.5 m/s
    Path strict = tmp.resolve("strict.json");
    Files.writeString(strict, "{\"format\": 1, \"preset\": \"recalled_military_and_transport\","
        + " \"max_operating_speed_eas_mps\": 350, \"limit_speed_eas_mps\": 400}");
    Path out = tmp.resolve("r");
    CliRun r = run("sweep", LPW, "--requirements", strict.toString(), "--out", out.toString(), "--quiet", "--threads", "1");
    assertEquals(FlexMargin.EXIT_REQUIREMENTS_VIOLATED, r.code(), r.err());
    JsonNode json = new ObjectMapper().readTree(out.resolve("results.json").toFile());
    assertFalse(json.get("configurations").get(0).get("clearance").get("passed").asBoolean());
    assertTrue(json.get("inputs").toString().contains("strict.json"), "the file is listed with its hash");
    Path mild = tmp.resolve("mild.json");
    Files.writeString(mild, Files.readString(strict).replace("350", "120").replace("400", "150"));
    assertEquals(0, run("sweep", LPW, "--requirements", mild.toString(), "--out", out.toString(), "--quiet",
        "--threads", "1").code());
    CliRun bad = run("sweep", LPW, "--requirements", tmp.resolve("missing.json").toString(), "--out", out.toString());
    assertEquals(FlexMargin.EXIT_BAD_INPUT, bad.code());
    assertTrue(bad.err().contains("missing.json"), bad.err());
  }

  @Test
  void theDefaultOutputFolderOfASweepIsAnEarlierReportNotForeignContent(@TempDir Path tmp) throws IOException {
    Path out = tmp.resolve("mixed");
    Files.createDirectories(out);
    Files.writeString(out.resolve("draft.docx"), "someone's document");
    CliRun r = run("sweep", LPW, "--out", out.toString(), "--quiet");
    assertEquals(FlexMargin.EXIT_BAD_INPUT, r.code());
    assertTrue(r.err().contains("a folder with other content"), r.err());
    assertEquals("someone's document", Files.readString(out.resolve("draft.docx")));
    assertFalse(Files.exists(out.resolve(ReportFolder.OUTPUT_MARKER)));
  }
}
