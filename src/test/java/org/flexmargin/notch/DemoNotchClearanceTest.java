package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.report.SharedResults;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * The demo end to end: its starting loop fails the structural-coupling requirements; the notch
 * set designed against the case's own requirements table makes every configuration pass, as
 * judged independently by the full sweep and clearance (not by the optimiser).
 */
class DemoNotchClearanceTest {
  @Test
  void designedNotchesTurnTheFailingDemoIntoAPassingOne() {
    AnalysisCase demo = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    PlannedPath path = new PlannedPath(demo.sweep());
    // the starting loop's sweep is the one the report tests share (computed once per test run)
    List<ConfigurationResult> starting = SharedResults.demo().result().configurations();
    assertEquals(demo.configurations().size(), starting.size());
    for (ConfigurationResult r : starting) {
      assertFalse(r.clearance().passed(),
          "the demo's starting loop is meant to fail in " + r.configuration());
    }
    NotchDesignResult design = new NotchDesigner().design(demo, NotchDesignSpec.forRequirements(demo.requirements()));
    assertTrue(design.feasible(), "no feasible notch set: " + design.reasons());
    AnalysisCase notched = new AnalysisCase(demo.format(), demo.name(), demo.description(), demo.configurations(),
        demo.sweep(), demo.options(), demo.inputs(), design.designedLoop(), demo.requirements());
    for (Configuration c : notched.configurations()) {
      ConfigurationResult r = CaseSweep.analyse(c, path, notched);
      assertTrue(r.clearance().passed(), c.name() + " still fails: " + r.clearance().governing());
    }
  }
}
