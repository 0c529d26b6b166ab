package org.flexmargin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.lang.management.CompilationMXBean;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;
import org.flexmargin.campaign.CampaignPlan;
import org.flexmargin.campaign.CampaignStore;
import org.flexmargin.campaign.LocalEngine;
import org.flexmargin.campaign.SampleOutcome;
import org.flexmargin.campaign.SampleRunner;
import org.flexmargin.campaign.SampleStatus;
import org.flexmargin.io.CampaignReader;

/**
 * {@code flexmargin bench campaign}: runs a real Monte Carlo campaign of a demo-sized case (the
 * bundled demo's notched case, full-payload configuration, 8 modes, loop and requirements, 28 sweep
 * points, modal uncertainty) through the same engine as {@code flexmargin campaign}: every core,
 * each sample appended to a result file as it finishes. It times the whole run from a cold start of
 * the analysis (the compiler's warm-up included) and projects a 10 000-sample campaign from it.
 */
final class CampaignBench {
  private CampaignBench() {}

  /** Samples of the projected campaign. */
  static final int PROJECTED_SAMPLES = 10_000;
  /** The campaign's target elapsed time, minutes. */
  static final int TARGET_MINUTES = 10;

  /**
   * A 10 000-sample campaign's elapsed time projected linearly from a measured run of fewer
   * samples on the same cores. The measured run includes the compiler's warm-up, which a longer
   * campaign spreads over more samples, so the projection errs on the long side; a run of
   * {@link #PROJECTED_SAMPLES} samples is the measurement itself.
   *
   * @param samples samples of the measured run (&gt;= 1)
   * @param elapsedS elapsed time of the measured run, s (&gt;= 0)
   */
  record Projection(int samples, double elapsedS) {
    Projection {
      if (samples < 1 || !(elapsedS >= 0) || Double.isInfinite(elapsedS)) {
        throw new IllegalArgumentException("need at least one sample and a finite elapsed time >= 0, got "
            + samples + " samples in " + elapsedS + " s");
      }
    }

    /** @return projected elapsed time of {@link #PROJECTED_SAMPLES} samples, min */
    double projectedMinutes() {
      return elapsedS / samples * PROJECTED_SAMPLES / 60;
    }

    /** @return projected elapsed time over the target (below 1: met) */
    double ratioToTarget() {
      return projectedMinutes() / TARGET_MINUTES;
    }

    /** @return "met with a factor F to spare" or "missed by a factor F" */
    String verdict() {
      double r = ratioToTarget();
      return r <= 1 ? String.format(Locale.ROOT, "met with a factor %.2f to spare", 1 / r)
          : String.format(Locale.ROOT, "missed by a factor %.2f", r);
    }
  }

  /**
   * @param out where the figures go
   * @param samples Monte Carlo samples of the measured campaign (&gt;= 2)
   */
  static void run(PrintWriter out, int samples) {
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
          """.formatted(Math.max(2, samples)));
      CampaignPlan plan = new CampaignPlan(CampaignReader.read(file));
      Path scratch = Files.createDirectories(dir.resolve("scratch"));
      SampleRunner runner = new SampleRunner(plan, dir.resolve("demo-case.json"), scratch);
      int cores = Runtime.getRuntime().availableProcessors();
      int total = plan.taskCount();
      AtomicLong half = new AtomicLong();
      CompilationMXBean jit = ManagementFactory.getCompilationMXBean();
      long jit0 = jit.isCompilationTimeMonitoringSupported() ? jit.getTotalCompilationTime() : -1;
      double c0 = BenchCommand.cpuSeconds();
      long t0 = System.nanoTime();
      List<SampleOutcome> outcomes;
      try (CampaignStore store = new CampaignStore(dir.resolve("out"), plan, "bench")) {
        outcomes = new LocalEngine(cores).run(runner, store, (done, all) -> {
          if (done == all / 2) {
            half.set(System.nanoTime());
          }
        });
      }
      double elapsed = (System.nanoTime() - t0) * 1e-9;
      double cpu = BenchCommand.cpuSeconds() - c0;
      long jitMs = jit0 < 0 ? -1 : jit.getTotalCompilationTime() - jit0;
      long errors = outcomes.stream().filter(o -> o.status() == SampleStatus.ERROR).count();
      double secondHalfS = (System.nanoTime() - half.get()) * 1e-9;
      int secondHalf = total - total / 2;
      Projection p = new Projection(total, elapsed);
      Projection steady = new Projection(secondHalf, secondHalfS);
      out.printf(Locale.ROOT, "campaign: notched demo full_payload, 8 modes, loop and requirements, 28 points; a real "
          + "campaign of %d samples on %d core(s), each sample appended to its result file as it finishes: %.1f s "
          + "elapsed, %.1f s of CPU (%.3f s per sample; the compilers' own time %s)%s%n", total, cores, elapsed, cpu,
          cpu / total, jitMs < 0 ? "not reported" : String.format(Locale.ROOT, "%.1f s", jitMs * 1e-3),
          errors == 0 ? "" : "; " + errors + " sample(s) failed");
      out.printf(Locale.ROOT, "  projected %d-sample campaign: %.1f min from the whole run (compiler warm-up "
          + "included), %.1f min at the rate of its second half (%d samples in %.1f s); the %d-min target: %s "
          + "(%s at the second half's rate)%n", PROJECTED_SAMPLES, p.projectedMinutes(), steady.projectedMinutes(),
          secondHalf, secondHalfS, TARGET_MINUTES, p.verdict(), steady.verdict());
    } catch (IOException e) {
      throw new UncheckedIOException("could not set up the campaign benchmark: " + e.getMessage(), e);
    } finally {
      BenchCommand.deleteTree(dir);
    }
  }
}
