package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.DivergenceSolver;
import org.flexmargin.flutter.FlutterMethod;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.KMethod;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.flutter.StateSpaceMethod;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;

/**
 * Runs the analysis of every configuration of a case: divergence (direct and confirmed over the
 * sweep), the open-loop flutter sweep with refined crossings and, when the case has a loop, the
 * loop margins at every point and the closed-loop eigenvalues with their refined onsets. Configurations run in parallel on
 * the given number of threads; each analysis is sequential along its path (continuation).
 */
public final class CaseSweep {
  private final int threads;

  /** @param threads worker threads, &gt;= 1 */
  public CaseSweep(int threads) {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be >= 1, got " + threads);
    }
    this.threads = threads;
  }

  /**
   * @param analysisCase validated case
   * @param configurationDone told of each configuration when all its stages are done
   * @return results in case order
   */
  public SweepResult run(AnalysisCase analysisCase, java.util.function.Consumer<String> configurationDone) {
    int stages = SweepProgress.stagesPerConfiguration(analysisCase);
    java.util.Map<String, Integer> done = new java.util.concurrent.ConcurrentHashMap<>();
    return run(analysisCase, (c, stage) -> {
      if (done.merge(c, 1, Integer::sum) == stages) {
        configurationDone.accept(c);
      }
    });
  }

  /**
   * @param analysisCase validated case
   * @param progress told of every completed stage (from worker threads)
   * @return results in case order
   */
  public SweepResult run(AnalysisCase analysisCase, SweepProgress progress) {
    PlannedPath path = new PlannedPath(analysisCase.sweep());
    ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, analysisCase.configurations().size()));
    try {
      List<Future<ConfigurationResult>> futures = new ArrayList<>();
      for (Configuration c : analysisCase.configurations()) {
        futures.add(pool.submit(() -> {
          return analyse(c, path, analysisCase, progress);
        }));
      }
      List<ConfigurationResult> results = new ArrayList<>();
      for (Future<ConfigurationResult> f : futures) {
        results.add(f.get());
      }
      return new SweepResult(analysisCase, path.describe(), results);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("sweep interrupted", e);
    } catch (ExecutionException e) {
      if (e.getCause() instanceof RuntimeException re) {
        throw re;
      }
      throw new IllegalStateException(e.getCause());
    } finally {
      pool.shutdownNow();
    }
  }

  /** Analyses one configuration along a path, without progress reports. */
  public static ConfigurationResult analyse(Configuration c, PlannedPath path, AnalysisCase analysisCase) {
    return analyse(c, path, analysisCase, SweepProgress.NONE);
  }

  /**
   * Analyses one configuration along a path.
   *
   * @param c configuration
   * @param path sweep path
   * @param analysisCase the case (options, loop, requirements)
   * @param progress told of each completed stage
   * @return the configuration's results
   */
  public static ConfigurationResult analyse(Configuration c, PlannedPath path, AnalysisCase analysisCase,
      SweepProgress progress) {
    long start = System.nanoTime();
    ConfigurationModel model = ConfigurationModel.of(c);
    AeroelasticSystem system = model.system();
    DivergenceSolver div = new DivergenceSolver();
    DivergenceResult divergence = div.solve(system);
    OptionalDouble confirmed = div.confirmOnPath(system, path);
    FlutterMethod method = switch (analysisCase.options().method()) {
      case K -> new KMethod();
      case STATE_SPACE -> new StateSpaceMethod();
      default -> new PkMethod();
    };
    FlutterSolution flutter = method.solve(system, path, analysisCase.options());
    double[] f = model.modes().modes().stream().mapToDouble(ElasticMode::frequencyHz).toArray();
    double tasDiv = divergence.speedTasMps(path.at(0).densityKgPerM3());
    progress.stageDone(c.name(), "divergence and flutter");
    ServoResult servo = null;
    if (analysisCase.loop() != null) {
      ClosedLoopResult closed = new ClosedLoopSweep().analyse(model, c, analysisCase.loop(), path, flutter,
          analysisCase.options());
      progress.stageDone(c.name(), "closed loop");
      List<ServoPoint> margins = ServoMargins.withDefaults().along(model, c, analysisCase.loop(), path, flutter,
          closed);
      progress.stageDone(c.name(), "loop margins");
      servo = new ServoResult(margins, closed);
    }
    ClearanceResult clearance = null;
    if (analysisCase.requirements() != null) {
      clearance = new ClearanceSweep().assess(model, c, analysisCase.loop(), path, flutter, divergence, servo,
          analysisCase.requirements(), Math.max(0.05, analysisCase.options().onsetSpeedToleranceMps()));
      progress.stageDone(c.name(), "clearance");
    }
    return new ConfigurationResult(c.name(), model.modes().modeNames(), f, system.aero().description(),
        divergence, confirmed, tasDiv, flutter, (System.nanoTime() - start) * 1e-9, servo, clearance);
  }
}
