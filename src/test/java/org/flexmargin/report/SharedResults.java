package org.flexmargin.report;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.Findings;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.SweepResult;

/**
 * Sweeps of the bundled cases computed once per test run (one test JVM) and shared by the report
 * tests and the demo's end-to-end notch test (the demo sweep with its loop and clearance is the
 * most expensive computation of the suite). Results are immutable records.
 */
public final class SharedResults {
  private SharedResults() {}

  /** A solved case and its findings table. */
  public record Solved(SweepResult result, List<Finding> findings) {}

  private static final Map<String, Solved> CACHE = new HashMap<>();

  /** @return the invented demo drone (two configurations, loop, requirements table) */
  public static Solved demo() {
    return solve("mode-tables/demo/demo-case.json");
  }

  /** @return the Lee, Price &amp; Wong typical section (open loop, no requirements) */
  public static Solved lpw() {
    return solve("mode-tables/validation/typical-section-lpw.json");
  }

  public static synchronized Solved solve(String file) {
    return CACHE.computeIfAbsent(file, f -> {
      AnalysisCase c = CaseReader.read(Path.of(f));
      SweepResult r = new CaseSweep(1).run(c, n -> { });
      return new Solved(r, Findings.of(r, new PlannedPath(c.sweep()).at(0)));
    });
  }
}
