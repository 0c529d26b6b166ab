package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.SweepResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Charts drawn as soon as a configuration is analysed give the same report as charts drawn with
 * the whole report: the same chart files byte for byte and the same page (apart from the time it
 * was generated), whichever configurations were drawn early.
 */
class ConfigurationChartsTest {
  @TempDir Path tmp;

  @Test
  void chartsDrawnEarlyGiveTheSameReport() throws IOException {
    SharedResults.Solved demo = SharedResults.demo();
    SweepResult result = demo.result();
    ReportOptions options = ReportOptions.defaults();
    List<ConfigurationResult> cs = result.configurations();
    assertTrue(cs.size() >= 2, "the demo has two configurations");
    ConfigurationCharts first = ConfigurationCharts.draw(result.analysisCase(), result.pathDescription(), cs.get(0),
        options);
    assertEquals(cs.get(0).configuration(), first.configuration());
    Path whole = write(result, demo, Map.of(), "whole");
    Path some = write(result, demo, Map.of(first.configuration(), first), "some");
    Map<String, ConfigurationCharts> every = new java.util.HashMap<>();
    for (ConfigurationResult c : cs) {
      every.put(c.configuration(),
          ConfigurationCharts.draw(result.analysisCase(), result.pathDescription(), c, options));
    }
    Path all = write(result, demo, every, "all");
    for (Path other : List.of(some, all)) {
      assertSameCharts(whole.resolve(ReportWriter.CHARTS_FOLDER), other.resolve(ReportWriter.CHARTS_FOLDER));
      assertEquals(page(whole), page(other), other.toString());
    }
  }

  private Path write(SweepResult result, SharedResults.Solved demo, Map<String, ConfigurationCharts> early,
      String name) throws IOException {
    Path folder = Files.createDirectories(tmp.resolve(name));
    ReportWriter.write(folder, result, demo.findings(), "test", ReportOptions.defaults(), early);
    return folder;
  }

  private static void assertSameCharts(Path expected, Path actual) throws IOException {
    List<Path> files;
    try (Stream<Path> s = Files.list(expected)) {
      files = s.sorted().toList();
    }
    try (Stream<Path> s = Files.list(actual)) {
      assertEquals(files.size(), s.count(), "chart files");
    }
    assertTrue(files.size() > 20, "the demo's charts: " + files.size());
    for (Path f : files) {
      assertArrayEquals(Files.readAllBytes(f), Files.readAllBytes(actual.resolve(f.getFileName())),
          f.getFileName().toString());
    }
  }

  /** The page with the time it was generated left out. */
  private static String page(Path folder) throws IOException {
    return Files.readString(folder.resolve("report.html"), StandardCharsets.UTF_8)
        .replaceAll("\\d{4}-\\d\\d-\\d\\d[T ]\\d\\d:\\d\\d(:\\d\\d(\\.\\d+)?)?Z?( UTC)?", "TIME");
  }
}
