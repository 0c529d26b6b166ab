package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.GZIPInputStream;
import java.util.zip.GZIPOutputStream;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Regression guard: the results of the bundled demo and of the validation cases stay what they
 * were when the golden files were recorded, to 1e-9 relative (absolute floor 1e-9 in each field's
 * own unit). Speed work must not move an answer; an intended change of an answer (an accuracy
 * improvement, a corrected model) re-records the files with
 * {@code scripts/record-golden-results.sh} and says why in its commit message. The tolerance
 * leaves room for the last-bit differences of the platform's elementary functions; anything a
 * changed algorithm moves shows up.
 */
class GoldenResultsTest {
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final Path GOLDEN = Path.of("src/test/resources/golden");
  /** Set to true (system property) to re-record the golden files instead of comparing. */
  private static final boolean RECORD = Boolean.getBoolean("flexmargin.golden.record");

  @ParameterizedTest
  @ValueSource(strings = {"mode-tables/demo/demo-case.json", "mode-tables/validation/typical-section-lpw.json",
      "mode-tables/validation/goland-wing.json", "mode-tables/validation/megson-divergence.json"})
  void resultsMatchTheRecordedOnes(String caseFile, @TempDir Path tmp) throws IOException {
    SharedResults.Solved s = SharedResults.solve(caseFile);
    ResultFiles.write(tmp, s.result(), s.findings(), "test");
    JsonNode now = JSON.readTree(tmp.resolve("results.json").toFile());
    String name = Path.of(caseFile).getFileName().toString().replace(".json", "") + "-results.json.gz";
    Path golden = GOLDEN.resolve(name);
    if (RECORD) {
      Files.createDirectories(GOLDEN);
      try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(golden))) {
        Files.copy(tmp.resolve("results.json"), out);
      }
    }
    assertTrue(Files.isRegularFile(golden), "golden file missing: " + golden);
    JsonNode recorded;
    try (InputStream in = new GZIPInputStream(Files.newInputStream(golden))) {
      recorded = JSON.readTree(in);
    }
    List<String> diff = JsonTreeDiff.between(recorded, now, 1e-9, 1e-9);
    assertEquals(List.of(), diff, caseFile + ": results moved from the recorded ones (recorded vs now)");
    // the comparison is not vacuous: the tree holds the sweep's points
    assertTrue(now.path("configurations").size() > 0 && new PlannedPath(s.result().analysisCase().sweep())
        .gridPoints() > 1);
  }
}
