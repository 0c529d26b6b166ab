package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
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
    List<String> diff = new ArrayList<>();
    compare(results(one.result(), tmp.resolve("one")), results(four, tmp.resolve("four")), "", 0.0, 0.0, diff);
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
    List<String> diff = new ArrayList<>();
    // tolerance: 1e-6 relative (the interpolant is checked to 1e-8 of the largest force entry;
    // margins, onsets and peaks move by about 1e-7 relative on the demo), with an absolute floor of
    // 1e-6 in the field's own unit (deg, dB, m/s, Hz) for values that are zero to rounding, such as
    // phase distances of 1e-10 deg
    compare(results(new SweepResult(demo, desc, List.of(exact)), tmp.resolve("exact")),
        results(new SweepResult(demo, desc, List.of(interpolated)), tmp.resolve("interp")), "", 1e-6, 1e-6, diff);
    assertEquals(List.of(), diff, "interpolated loop against the exact one");
  }

  /** Compares two JSON trees; numbers to rel/abs tolerance; skips run times and solver residuals. */
  private static void compare(JsonNode a, JsonNode b, String at, double rel, double abs, List<String> diff) {
    if (a.isObject()) {
      Iterator<Map.Entry<String, JsonNode>> it = a.fields();
      while (it.hasNext()) {
        Map.Entry<String, JsonNode> e = it.next();
        String key = e.getKey();
        if (key.equals("generated_utc") || key.equals("elapsed_s") || key.equals("tool_version")
            || (rel > 0 && key.contains("residual"))) {
          continue;
        }
        compare(e.getValue(), b.path(key), at + "/" + key, rel, abs, diff);
      }
      if (a.size() != b.size()) {
        diff.add(at + ": " + a.size() + " vs " + b.size() + " keys");
      }
    } else if (a.isArray()) {
      if (a.size() != b.size()) {
        diff.add(at + ": " + a.size() + " vs " + b.size() + " elements");
        return;
      }
      for (int i = 0; i < a.size(); i++) {
        compare(a.get(i), b.get(i), at + "[" + i + "]", rel, abs, diff);
      }
    } else if (a.isNumber() && b.isNumber()) {
      double x = a.asDouble();
      double y = b.asDouble();
      if (Math.abs(x - y) > Math.max(abs, rel * Math.max(Math.abs(x), Math.abs(y)))) {
        diff.add(at + ": " + x + " vs " + y);
      }
    } else if (!a.equals(b)) {
      diff.add(at + ": " + a + " vs " + b);
    }
    if (diff.size() > 40) {
      throw new AssertionError("many differences, first: " + diff.subList(0, 10));
    }
  }
}
