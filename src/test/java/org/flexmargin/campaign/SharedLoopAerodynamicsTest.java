package org.flexmargin.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.nio.file.Files;
import java.nio.file.Path;
import org.flexmargin.io.CampaignReader;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeTable;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Samples that perturb modal frequencies, damping and masses share the loop's interpolated
 * strip-theory forces, and their results are exactly those of a separate analysis.
 */
class SharedLoopAerodynamicsTest {
  @TempDir Path dir;

  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  /** Equal strips and shapes share one source; changed shapes get their own. */
  @Test
  void sharesOnlyWhereStripsAndShapesAreEqual() {
    Configuration cfg = DEMO.configurations().get(0);
    ModeTable table = (ModeTable) cfg.structure();
    ModeTable stiffer = new ModeTable(table.name(), table.modes().stream().map(m -> new ElasticMode(m.name(),
        1.1 * m.frequencyHz(), 0.5 * m.dampingRatio(), 2 * m.generalizedMassKg(), m.shapes())).toList());
    ElasticMode first = table.modes().get(0);
    java.util.Map<String, org.flexmargin.model.ShapeValue> scaled = new java.util.HashMap<>();
    first.shapes().forEach((k, v) -> scaled.put(k,
        new org.flexmargin.model.ShapeValue(2 * v.displacementM(), 2 * v.rotationRad())));
    java.util.List<ElasticMode> reshaped = new java.util.ArrayList<>(table.modes());
    reshaped.set(0, new ElasticMode(first.name(), first.frequencyHz(), first.dampingRatio(),
        first.generalizedMassKg(), scaled));
    SharedLoopAerodynamics shared = new SharedLoopAerodynamics();
    ConfigurationModel a = shared.modelOf(cfg);
    ConfigurationModel b = shared.modelOf(new Configuration(cfg.name(), stiffer, cfg.aero(), cfg.rigidBody()));
    ConfigurationModel c = shared.modelOf(new Configuration(cfg.name(), new ModeTable(table.name(), reshaped),
        cfg.aero(), cfg.rigidBody()));
    assertSame(a.loopAero(), b.loopAero());
    assertNotSame(a.loopAero(), c.loopAero());
    assertEquals(2, shared.size());
    // the model itself is that of the sample (its own modes and equations)
    assertEquals(1.1 * table.modes().get(0).frequencyHz(), b.modes().modes().get(0).frequencyHz(), 0.0);
  }

  /**
   * Task 2 of a demo campaign, run after task 1 on the same runner (so with task 1's loop
   * forces), gives exactly the outcome of a separate analysis of its case file.
   */
  @Test
  void aSampleWithSharedForcesEqualsASeparateAnalysis() throws Exception {
    for (String f : new String[] {"demo-case.json", "ridgeline-mc7-empty.csv", "ridgeline-mc7-full-payload.json"}) {
      Files.copy(Path.of("mode-tables/demo").resolve(f), dir.resolve(f));
    }
    Path file = dir.resolve("c.json");
    Files.writeString(file, """
        {"format": 1, "name": "shared", "base_case": "demo-case.json", "sweep_points": 12,
         "matrix": {"configurations": ["full_payload"]},
         "monte_carlo": {"samples": 3, "seed": 5, "parameters": [
           {"name": "f", "quantity": "modal_frequency",
            "distribution": {"normal": {"mean": 1.0, "standard_deviation": 0.03}}},
           {"name": "m", "quantity": "generalized_mass",
            "distribution": {"uniform": {"low": 0.95, "high": 1.05}}}]}}
        """);
    CampaignPlan plan = new CampaignPlan(CampaignReader.read(file));
    SampleRunner runner = new SampleRunner(plan, dir.resolve("demo-case.json"),
        Files.createDirectories(dir.resolve("scratch")));
    runner.run(1);
    SampleOutcome shared = runner.run(2);
    assertEquals(1, runner.sharedLoopSources());
    AnalysisCase c = CaseReader.read(runner.writeCase(2, Files.createDirectories(dir.resolve("again"))));
    SampleOutcome separate = SampleRunner.outcome(2, shared.cell(), shared.sample(), shared.draws(),
        CaseSweep.analyse(c.configurations().get(0), new PlannedPath(c.sweep()), c));
    assertEquals(separate.status(), shared.status());
    assertEquals(separate.governing(), shared.governing());
    assertEquals(separate.divergenceEasMps(), shared.divergenceEasMps(), 0.0);
    assertEquals(separate.openLoopFlutterEasMps(), shared.openLoopFlutterEasMps(), 0.0);
    assertEquals(separate.closedLoopOnsetEasMps(), shared.closedLoopOnsetEasMps(), 0.0);
    assertEquals(separate.marginOnsetEasMps(), shared.marginOnsetEasMps(), 0.0);
    assertArrayEquals(separate.margins().gainMarginDb(), shared.margins().gainMarginDb(), 0.0);
    assertArrayEquals(separate.margins().phaseMarginDeg(), shared.margins().phaseMarginDeg(), 0.0);
  }
}
