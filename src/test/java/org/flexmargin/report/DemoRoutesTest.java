package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Findings;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.SweepProgress;
import org.flexmargin.sweep.SweepResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo's results do not depend on the number of threads, and the loop on interpolated strip
 * theory (the default) agrees with the loop on the exact source (docs/validation.md,
 * "Reduced-frequency interpolant"). The one-thread interpolated run is the shared demo sweep.
 */
class DemoRoutesTest {
  private static final ObjectMapper JSON = new ObjectMapper();

  private static JsonNode results(SweepResult r, Path dir) throws IOException {
    Files.createDirectories(dir);
    ResultFiles.write(dir, r, Findings.of(r, new PlannedPath(r.analysisCase().sweep()).at(0)), "test");
    return JSON.readTree(dir.resolve("results.json").toFile());
  }

  @Test
  void resultsAreTheSameForOneAndFourThreads(@TempDir Path tmp) throws IOException {
    SharedResults.Solved one = SharedResults.demo();
    SweepResult four = new CaseSweep(4).run(one.result().analysisCase(), n -> { });
    List<String> diff = JsonTreeDiff.between(results(one.result(), tmp.resolve("one")),
        results(four, tmp.resolve("four")), 0.0, 0.0);
    assertEquals(List.of(), diff, "bit-identical results expected");
  }

  @Test
  void interpolatedLoopAgreesWithTheExactSourceOnTheDemo(@TempDir Path tmp) throws IOException {
    SharedResults.Solved shared = SharedResults.demo();
    AnalysisCase demo = shared.result().analysisCase();
    Configuration full = demo.configurations().get(0);
    PlannedPath path = new PlannedPath(demo.sweep());
    ConfigurationModel exactModel = ConfigurationModel.of(full).withExactLoop();
    assertTrue(ConfigurationModel.of(full).loopAero().interpolated(), "the demo's loop uses the interpolant");
    ConfigurationResult exact = CaseSweep.analyse(exactModel, full, path, demo, SweepProgress.NONE);
    ConfigurationResult interpolated = shared.result().configurations().get(0);
    String desc = shared.result().pathDescription();
    // tolerance: 1e-6 relative (the interpolant is checked to 1e-8 of the largest force entry;
    // margins, onsets and peaks move by about 1e-7 relative on the demo), with an absolute floor of
    // 1e-6 in the field's own unit (deg, dB, m/s, Hz) for values that are zero to rounding, such as
    // phase distances of 1e-10 deg
    List<String> diff = JsonTreeDiff.between(results(new SweepResult(demo, desc, List.of(exact)), tmp.resolve("exact")),
        results(new SweepResult(demo, desc, List.of(interpolated)), tmp.resolve("interp")), 1e-6, 1e-6);
    assertEquals(List.of(), diff, "interpolated loop against the exact one");
  }
}
