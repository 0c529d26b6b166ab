package org.flexmargin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.stream.Stream;
import org.flexmargin.campaign.CampaignPlan;
import org.flexmargin.campaign.SampleRunner;
import org.flexmargin.io.CampaignReader;

/**
 * {@code flexmargin bench campaign}: the cost of one Monte Carlo sample of a demo-sized campaign
 * (the bundled demo's notched case, full-payload configuration, 8 modes, loop and requirements, 28 sweep points,
 * modal uncertainty), and the projected time of a 10 000-sample campaign on this machine.
 */
final class CampaignBench {
  private CampaignBench() {}

  /** Samples of the projected campaign. */
  static final int PROJECTED_SAMPLES = 10_000;

  static void run(PrintWriter out, int repeats) {
    Path dir = null;
    try {
      dir = Files.createTempDirectory("flexmargin-bench-campaign-");
      DemoCommand.unpack(dir);
      Path file = dir.resolve("bench-campaign.json");
      Files.writeString(file, """
          {"format": 1, "name": "bench-campaign", "base_case": "demo-case-notched.json", "sweep_points": 28,
           "matrix": {"configurations": ["full_payload"]},
           "monte_carlo": {"samples": %d, "seed": 1, "parameters": [
             {"name": "f", "quantity": "modal_frequency",
              "distribution": {"normal": {"mean": 1.0, "standard_deviation": 0.03}}},
             {"name": "z", "quantity": "modal_damping",
              "distribution": {"log_normal": {"median": 1.0, "log_standard_deviation": 0.3}}},
             {"name": "m", "quantity": "generalized_mass",
              "distribution": {"uniform": {"low": 0.95, "high": 1.05}}}]}}
          """.formatted(PROJECTED_SAMPLES));
      CampaignPlan plan = new CampaignPlan(CampaignReader.read(file));
      Path scratch = Files.createDirectories(dir.resolve("scratch"));
      SampleRunner runner = new SampleRunner(plan, dir.resolve("demo-case.json"), scratch);
      runner.run(0);
      int n = Math.max(2, repeats);
      double c0 = BenchCommand.cpuSeconds();
      long t0 = System.nanoTime();
      for (int t = 1; t <= n; t++) {
        runner.run(t);
      }
      double perSample = (System.nanoTime() - t0) * 1e-9 / n;
      double cpuPerSample = (BenchCommand.cpuSeconds() - c0) / n;
      int cores = Runtime.getRuntime().availableProcessors();
      out.printf(Locale.ROOT, "campaign: notched demo full_payload, 8 modes, loop and requirements, 28 points; %d samples "
          + "after warm-up: %.2f s per sample on one thread, %.2f s CPU per sample (all threads of the process; "
          + "%.2f s CPU would run %d samples in 10 min on %d core(s))%n", n, perSample, cpuPerSample,
          600.0 * cores / PROJECTED_SAMPLES, PROJECTED_SAMPLES, cores);
      out.printf(Locale.ROOT, "  projected %d-sample campaign: %.1f h of computing, %.1f h on %d core(s)%n",
          PROJECTED_SAMPLES, PROJECTED_SAMPLES * perSample / 3600, PROJECTED_SAMPLES * perSample / 3600 / cores,
          cores);
    } catch (IOException e) {
      throw new UncheckedIOException("could not set up the campaign benchmark: " + e.getMessage(), e);
    } finally {
      if (dir != null) {
        try (Stream<Path> s = Files.walk(dir)) {
          s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
          // a temporary folder left behind is harmless
        }
      }
    }
  }
}
