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
  /** The campaign's target elapsed time, minutes. */
  static final int TARGET_MINUTES = 10;

  /**
   * A campaign's cost projected from the CPU time of one sample: the samples keep every core
   * busy, so the campaign's elapsed time is its total CPU time shared by the cores. (The elapsed
   * time of one sample is no base: its sweep points already run on all the cores, so dividing
   * it by the cores again would count them twice.)
   *
   * @param cpuPerSampleS CPU time of one sample, all threads, s (&gt;= 0)
   * @param cores cores the campaign runs on (&gt;= 1)
   */
  record Projection(double cpuPerSampleS, int cores) {
    Projection {
      if (!(cpuPerSampleS >= 0) || cores < 1) {
        throw new IllegalArgumentException("need CPU time >= 0 and at least one core, got " + cpuPerSampleS
            + " s and " + cores);
      }
    }

    /** @return CPU time of the whole campaign, h */
    double cpuHours() {
      return PROJECTED_SAMPLES * cpuPerSampleS / 3600;
    }

    /** @return elapsed time of the campaign with every core busy, h */
    double elapsedHours() {
      return cpuHours() / cores;
    }

    /** @return the CPU time per sample that meets the target exactly, s */
    double targetCpuPerSampleS() {
      return TARGET_MINUTES * 60.0 * cores / PROJECTED_SAMPLES;
    }

    /** @return projected elapsed time over the target (below 1: met) */
    double ratioToTarget() {
      return elapsedHours() * 60 / TARGET_MINUTES;
    }

    /** @return "met with a factor F to spare" or "missed by a factor F" */
    String verdict() {
      double r = ratioToTarget();
      return r <= 1 ? String.format(Locale.ROOT, "met with a factor %.2f to spare", 1 / r)
          : String.format(Locale.ROOT, "missed by a factor %.2f", r);
    }
  }

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
      Projection p = new Projection(cpuPerSample, cores);
      out.printf(Locale.ROOT, "campaign: notched demo full_payload, 8 modes, loop and requirements, 28 points; %d samples "
          + "after warm-up: %.2f s elapsed and %.3f s CPU per sample (all threads of the process: a sample's sweep "
          + "points already run on every core)%n", n, perSample, cpuPerSample);
      out.printf(Locale.ROOT, "  projected %d-sample campaign on %d core(s): %.1f h of CPU, %.2f h elapsed with every "
          + "core busy; the %d-min target needs %.3f s CPU per sample: %s%n", PROJECTED_SAMPLES, cores,
          p.cpuHours(), p.elapsedHours(), TARGET_MINUTES, p.targetCpuPerSampleS(), p.verdict());
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
