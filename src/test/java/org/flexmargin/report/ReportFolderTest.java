package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The output folder never destroys what is not ours and leaves nothing half-written behind. */
class ReportFolderTest {

  private static Path write(Path target, String text) {
    return ReportFolder.writeAtomically(target, f -> Files.writeString(f.resolve("results.json"), text));
  }

  private static List<String> names(Path dir) throws IOException {
    try (Stream<Path> s = Files.list(dir)) {
      return s.map(p -> p.getFileName().toString()).sorted().collect(Collectors.toList());
    }
  }

  /** An owner record of a process that has ended: a child we start and wait for. */
  private static String deadOwner() throws Exception {
    Process p = new ProcessBuilder("true").start();
    p.waitFor();
    long pid = p.pid();
    // the process has been reaped; its pid is free (a reuse would carry another start time)
    return "pid=" + pid + "\nstart=2000-01-01T00:00:00Z\n";
  }

  @Test
  void anExistingRegularFileIsRefusedAndKept(@TempDir Path tmp) throws IOException {
    Path file = tmp.resolve("notes.txt");
    Files.writeString(file, "the user's own notes");
    InvalidInputException e = assertThrows(InvalidInputException.class, () -> write(file, "{}"));
    assertTrue(e.getMessage().contains("--out"), e.getMessage());
    assertTrue(e.getMessage().contains("not a folder"), e.getMessage());
    assertEquals("the user's own notes", Files.readString(file));
    assertEquals(List.of("notes.txt"), names(tmp), "nothing else created");
  }

  @Test
  void aTargetBelowARegularFileSaysWhy(@TempDir Path tmp) throws IOException {
    Path file = tmp.resolve("data.csv");
    Files.writeString(file, "1,2");
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> ReportFolder.checkTarget(file.resolve("sub").resolve("report")));
    assertTrue(e.getMessage().contains(file + " is a regular file, not a folder"), e.getMessage());
  }

  @Test
  void aFolderWithOtherContentIsRefusedButAnEarlierReportIsReplaced(@TempDir Path tmp) throws IOException {
    Path home = tmp.resolve("home");
    Files.createDirectories(home);
    Files.writeString(home.resolve("thesis.tex"), "years of work");
    assertThrows(InvalidInputException.class, () -> write(home, "{}"));
    assertEquals("years of work", Files.readString(home.resolve("thesis.tex")));

    Path report = tmp.resolve("report");
    write(report, "first");
    assertTrue(Files.exists(report.resolve(ReportFolder.OUTPUT_MARKER)), "our folders carry the marker");
    write(report, "second");
    assertEquals("second", Files.readString(report.resolve("results.json")));
    assertFalse(Files.exists(report.resolve(ReportFolder.OWNER_FILE)), "no owner file in a finished report");
    // a first-release report (results.json, no marker) is recognised too
    Path legacy = tmp.resolve("legacy");
    Files.createDirectories(legacy);
    Files.writeString(legacy.resolve("results.json"), "old");
    write(legacy, "new");
    assertEquals("new", Files.readString(legacy.resolve("results.json")));
    assertEquals(List.of("home", "legacy", "report"), names(tmp), "no temporary folders left");
  }

  @Test
  void staleFoldersOfEndedRunsAreCleanedAndNothingElse(@TempDir Path tmp) throws Exception {
    String dead = deadOwner();
    Path staleTmp = Files.createDirectories(tmp.resolve(".tmp-report-111"));
    Files.writeString(staleTmp.resolve(ReportFolder.OWNER_FILE), dead);
    Files.writeString(staleTmp.resolve("big.png"), "x".repeat(1000));
    // killed between the two renames: the previous report sits at its old name, target missing
    Path staleOld = Files.createDirectories(tmp.resolve(".old-previous-222"));
    Files.writeString(staleOld.resolve(ReportFolder.OWNER_FILE), dead);
    Files.writeString(staleOld.resolve("results.json"), "the previous report");
    // not ours: no owner file
    Path foreign = Files.createDirectories(tmp.resolve(".tmp-someone-else"));
    Files.writeString(foreign.resolve("keep.txt"), "keep");
    // ours, but its process (this one) still runs
    Path live = Files.createDirectories(tmp.resolve(".tmp-running-333"));
    Files.writeString(live.resolve(ReportFolder.OWNER_FILE), ReportFolder.ownerRecord());
    // this process's pid with another start time: the pid was reused, the owner is gone
    Path reused = Files.createDirectories(tmp.resolve(".old-reused-444"));
    Files.writeString(reused.resolve(ReportFolder.OWNER_FILE),
        "pid=" + ProcessHandle.current().pid() + "\nstart=2000-01-01T00:00:00Z\n");
    Files.createDirectories(tmp.resolve("reused"));
    Files.writeString(tmp.resolve("reused").resolve(ReportFolder.OUTPUT_MARKER), "");
    // a file, not a folder, with a matching name
    Files.writeString(tmp.resolve(".tmp-file-555"), "a file");

    write(tmp.resolve("report"), "{}");

    assertEquals(List.of(".tmp-file-555", ".tmp-running-333", ".tmp-someone-else", "previous", "report", "reused"),
        names(tmp));
    assertEquals("the previous report", Files.readString(tmp.resolve("previous").resolve("results.json")),
        "an old folder whose target is missing is put back");
    assertFalse(Files.exists(tmp.resolve("previous").resolve(ReportFolder.OWNER_FILE)));
    assertEquals("keep", Files.readString(foreign.resolve("keep.txt")));
    assertTrue(Files.exists(live.resolve(ReportFolder.OWNER_FILE)));
  }

  @Test
  void aWriteFailureKeepsThePreviousReportAndLeavesNothingBehind(@TempDir Path tmp) throws IOException {
    Path report = tmp.resolve("report");
    write(report, "previous");
    OutputWriteException e = assertThrows(OutputWriteException.class, () -> ReportFolder.writeAtomically(report, f -> {
      Files.writeString(f.resolve("results.json"), "half");
      throw new IOException("No space left on device");
    }));
    assertTrue(e.getMessage().contains("No space left on device"), e.getMessage());
    assertEquals("previous", Files.readString(report.resolve("results.json")));
    assertEquals(List.of("report"), names(tmp));
  }

  @Test
  void aSingleFileIsWrittenAtomicallyAndNotOverwrittenUnlessAllowed(@TempDir Path tmp) throws IOException {
    Path file = tmp.resolve("case.json");
    ReportFolder.writeFileAtomically(file, "--write-case", "one", false, p -> { });
    assertEquals("one", Files.readString(file));
    assertThrows(InvalidInputException.class,
        () -> ReportFolder.writeFileAtomically(file, "--write-case", "two", false, p -> { }));
    assertThrows(IllegalStateException.class, () -> ReportFolder.writeFileAtomically(file, "--write-case", "bad", true,
        p -> {
          throw new IllegalStateException("rejected by the check");
        }));
    assertEquals("one", Files.readString(file), "a rejected file never takes the name");
    ReportFolder.writeFileAtomically(file, "--write-case", "three", true, p -> { });
    assertEquals("three", Files.readString(file));
    assertEquals(List.of("case.json"), names(tmp));
  }
}
