package org.flexmargin.campaign.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.campaign.CampaignPlan;
import org.flexmargin.campaign.CampaignStore;
import org.flexmargin.campaign.LocalEngine;
import org.flexmargin.campaign.SampleOutcome;
import org.flexmargin.campaign.SampleRunner;
import org.flexmargin.io.CampaignReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Spark in local mode gives byte for byte the per-sample results of the local engine. */
class SparkEngineTest {
  @TempDir Path dir;

  @Test
  void sparkLocalModeMatchesTheLocalEngine() throws Exception {
    Files.writeString(dir.resolve("modes.json"), """
        {"format": 1, "name": "two", "description": "test section, invented",
         "modes": [
          {"name": "bending", "frequency_hz": 4.0, "damping_ratio": 0.01, "generalized_mass_kg": 2.0,
           "shapes": {"s1": {"displacement_m": 1.0, "rotation_rad": -0.1}}},
          {"name": "torsion", "frequency_hz": 10.0, "damping_ratio": 0.01, "generalized_mass_kg": 1.0,
           "shapes": {"s1": {"displacement_m": 0.2, "rotation_rad": 1.0}}}]}
        """);
    Files.writeString(dir.resolve("case.json"), """
        {"format": 1, "name": "two-mode", "description": "test section, invented",
         "configurations": [{"name": "only", "mode_table": "modes.json",
           "aero": {"strip_theory": {"reference_semichord_m": 0.5,
             "strips": [{"station": "s1", "width_m": 1.0, "semichord_m": 0.5, "elastic_axis_a": -0.2,
                         "lift_slope_per_rad": 6.283185307179586}]}}}],
         "sweep": {"kind": "speed", "altitude_m": 0, "speed_kind": "eas", "from_mps": 10, "to_mps": 60, "points": 5}}
        """);
    Path campaign = dir.resolve("campaign.json");
    Files.writeString(campaign, """
        {"format": 1, "name": "spark-check", "base_case": "case.json",
         "matrix": {"flight_conditions": [{"name": "sl", "altitude_m": 0}, {"name": "h3000", "altitude_m": 3000}]},
         "monte_carlo": {"samples": 8, "seed": 5, "parameters": [
           {"name": "f", "quantity": "modal_frequency", "distribution": {"normal": {"mean": 1, "standard_deviation": 0.05}}},
           {"name": "m", "quantity": "generalized_mass", "modes": ["torsion"],
            "distribution": {"log_normal": {"median": 1, "log_standard_deviation": 0.1}}}]}}
        """);
    CampaignPlan plan = new CampaignPlan(CampaignReader.read(campaign));
    Path local = dir.resolve("local");
    try (CampaignStore store = new CampaignStore(local, plan, "k")) {
      SampleRunner runner = new SampleRunner(plan, dir.resolve("case.json"), Files.createTempDirectory(dir, "s"));
      store.writeSorted(new LocalEngine(2).run(runner, store, (d, t) -> { }));
    }
    Path spark = dir.resolve("spark");
    System.setProperty("spark.master", "local[2]");
    try (CampaignStore store = new CampaignStore(spark, plan, "k")) {
      List<SampleOutcome> all = SparkEngine.run(campaign, plan, store);
      store.writeSorted(all);
    } finally {
      System.clearProperty("spark.master");
    }
    assertArrayEquals(Files.readAllBytes(local.resolve("samples.csv")), Files.readAllBytes(spark.resolve("samples.csv")));
    assertArrayEquals(Files.readAllBytes(local.resolve("margins.csv")), Files.readAllBytes(spark.resolve("margins.csv")));
    try (var files = Files.list(spark.resolve("samples.parquet"))) {
      assertTrue(files.anyMatch(f -> f.getFileName().toString().endsWith(".parquet")));
    }
  }
}
