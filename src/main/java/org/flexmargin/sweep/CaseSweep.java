package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.DivergenceSolver;
import org.flexmargin.flutter.FlutterMethod;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.KMethod;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.flutter.StateSpaceMethod;
import org.flexmargin.loop.MarginOptions;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;

/**
 * Runs the analysis of every configuration of a case: divergence (direct and confirmed over the
 * sweep), the open-loop flutter sweep with refined crossings and, when the case has a loop, the
 * loop margins at every point and the closed-loop eigenvalues with their refined onsets. One
 * work-stealing pool of the given number of threads runs the configurations and, inside each,
 * the independent grid points of the loop stages and the onset brackets ({@link SweepParallel});
 * the flutter continuation is sequential along its path. Results do not depend on the number of
 * threads.
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
    return run(analysisCase, progress, r -> { });
  }

  /**
   * As {@link #run(AnalysisCase, SweepProgress)}, handing each configuration's result to
   * {@code ready} as soon as it is complete, on the worker thread that computed it and inside this
   * sweep's pool (so that work such as drawing that configuration's charts proceeds while the
   * other configurations compute, and its parallel streams use this sweep's threads). The results
   * do not depend on what {@code ready} does; an exception it throws ends the sweep.
   *
   * @param analysisCase validated case
   * @param progress told of every completed stage (from worker threads)
   * @param ready told of each configuration's result, from worker threads, in any order
   * @return results in case order
   */
  public SweepResult run(AnalysisCase analysisCase, SweepProgress progress,
      java.util.function.Consumer<ConfigurationResult> ready) {
    return run(analysisCase, progress, ready, () -> { });
  }

  /**
   * As {@link #run(AnalysisCase, SweepProgress, java.util.function.Consumer)}, also running
   * {@code alongside} (work that needs no sweep result, such as the report's time-domain check) in
   * the same pool, so that it fills the threads the sweep leaves idle without adding a thread:
   * at most this sweep's number of threads work at once. It is submitted first and is complete
   * when this method returns; an exception it throws ends the sweep.
   *
   * @param analysisCase validated case
   * @param progress told of every completed stage (from worker threads)
   * @param ready told of each configuration's result, from worker threads, in any order
   * @param alongside work run in the pool beside the configurations
   * @return results in case order
   */
  public SweepResult run(AnalysisCase analysisCase, SweepProgress progress,
      java.util.function.Consumer<ConfigurationResult> ready, Runnable alongside) {
    PlannedPath path = new PlannedPath(analysisCase.sweep());
    ForkJoinPool pool = new ForkJoinPool(threads);
    try {
      Future<?> beside = pool.submit(alongside);
      List<Future<ConfigurationResult>> futures = new ArrayList<>();
      for (Configuration c : analysisCase.configurations()) {
        futures.add(pool.submit(() -> {
          ConfigurationResult r = analyse(c, path, analysisCase, progress);
          ready.accept(r);
          return r;
        }));
      }
      List<ConfigurationResult> results = new ArrayList<>();
      for (Future<ConfigurationResult> f : futures) {
        results.add(f.get());
      }
      beside.get();
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

  /**
   * Runs other work (such as drawing the report's charts) on a work-stealing pool of this
   * sweep's number of threads, so that parallel streams inside it use that many threads.
   *
   * @param work the work; its unchecked exceptions and errors are rethrown unchanged
   * @return its result
   */
  public <T> T inPool(java.util.function.Supplier<T> work) {
    ForkJoinPool pool = new ForkJoinPool(threads);
    Object[] value = new Object[1];
    Throwable[] failure = new Throwable[1];
    try {
      pool.submit(() -> {
        try {
          value[0] = work.get();
        } catch (RuntimeException | Error e) {
          failure[0] = e;
        }
      }).join();
    } finally {
      pool.shutdown();
    }
    if (failure[0] instanceof RuntimeException re) {
      throw re;
    }
    if (failure[0] instanceof Error e) {
      throw e;
    }
    @SuppressWarnings("unchecked")
    T result = (T) value[0];
    return result;
  }

  /** Each re-solve splits every planned grid interval this many more times. */
  static final int REFINEMENT_FACTOR = 4;
  /** At most this many steps per planned interval after re-solves. */
  static final int MAX_REFINEMENT = 16;
  /** A re-solve is skipped when its grid would exceed this many points (the cost of the loop sweep). */
  static final int MAX_REFINED_POINTS = 600;

  /**
   * Adds the re-solve, the unreliability if tracking stayed in doubt, and the aerodynamic range
   * warnings to the solution's warnings.
   */
  static FlutterSolution withNotes(FlutterSolution f, PlannedPath planned, PlannedPath used,
      List<String> aeroRange) {
    List<String> notes = new ArrayList<>(aeroRange);
    if (used.subdivisions() > 1) {
      notes.add(String.format(Locale.ROOT, "mode tracking was in doubt on the planned grid: re-solved with every "
          + "interval split in %d (%d grid points)", used.subdivisions(), used.gridPoints()));
    }
    if (f.diagnostics().trackingTroubled()) {
      notes.add(String.format(Locale.ROOT, "UNRELIABLE: mode tracking is still in doubt from %.2f m/s EAS; findings "
          + "above %.2f m/s EAS are marked unreliable and no flutter-free speed is claimed beyond it",
          used.at(f.diagnostics().firstTroublePathParameter()).speedEasMps(),
          TrackingTrust.trustedUpToEasMps(f).orElse(Double.NaN)));
    }
    if (notes.isEmpty()) {
      return f;
    }
    notes.addAll(0, f.warnings());
    return new FlutterSolution(f.method(), f.branches(), f.crossings(), f.diagnostics(), notes);
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
    return analyse(ConfigurationModel.of(c), c, path, analysisCase, progress);
  }

  /**
   * Analyses one configuration along a path with a given model (for instance with the loop on the
   * exact aerodynamic source, {@link ConfigurationModel#withExactLoop()}).
   *
   * @param model the configuration's model
   * @param c configuration
   * @param path sweep path
   * @param analysisCase the case (options, loop, requirements)
   * @param progress told of each completed stage
   * @return the configuration's results
   */
  public static ConfigurationResult analyse(ConfigurationModel model, Configuration c, PlannedPath path,
      AnalysisCase analysisCase, SweepProgress progress) {
    return analyse(model, c, path, analysisCase, progress, MarginOptions.defaults());
  }

  /**
   * As {@link #analyse(ConfigurationModel, Configuration, PlannedPath, AnalysisCase, SweepProgress)}
   * with the loop margins' search settings given (a campaign sample, which reports neither the peak
   * gain nor the disk margin, leaves their refinement out; onsets and verdicts do not depend on it).
   *
   * @param model the configuration's model
   * @param c configuration
   * @param path sweep path
   * @param analysisCase the case (options, loop, requirements)
   * @param progress told of each completed stage
   * @param marginOptions the loop margins' search settings
   * @return the configuration's results
   */
  public static ConfigurationResult analyse(ConfigurationModel model, Configuration c, PlannedPath path,
      AnalysisCase analysisCase, SweepProgress progress, MarginOptions marginOptions) {
    return analyse(model, c, path, analysisCase, progress, new LoopDetail(marginOptions, true));
  }

  /**
   * As {@link #analyse(ConfigurationModel, Configuration, PlannedPath, AnalysisCase, SweepProgress,
   * MarginOptions)}, also saying whether the loop-at-a-time margins are computed (a campaign
   * sample reports none; nothing else depends on them, see {@link LoopDetail}).
   *
   * @param model the configuration's model
   * @param c configuration
   * @param path sweep path
   * @param analysisCase the case (options, loop, requirements)
   * @param progress told of each completed stage
   * @param detail the loop margins' search settings and whether the loop-at-a-time margins are computed
   * @return the configuration's results
   */
  public static ConfigurationResult analyse(ConfigurationModel model, Configuration c, PlannedPath path,
      AnalysisCase analysisCase, SweepProgress progress, LoopDetail detail) {
    MarginOptions marginOptions = detail.marginOptions();
    long start = System.nanoTime();
    AeroelasticSystem system = model.system();
    DivergenceSolver div = new DivergenceSolver();
    DivergenceResult divergence = div.solve(system);
    OptionalDouble confirmed = div.confirmOnPath(system, path);
    FlutterMethod method = switch (analysisCase.options().method()) {
      case K -> new KMethod();
      case STATE_SPACE -> new StateSpaceMethod();
      default -> new PkMethod();
    };
    PlannedPath planned = path;
    FlutterSolution flutter = method.solve(system, path, analysisCase.options());
    // tracking in doubt: re-solve with finer steps (x4, then x16) while the grid stays affordable
    for (int factor = REFINEMENT_FACTOR; flutter.diagnostics().trackingTroubled() && factor <= MAX_REFINEMENT
        && planned.refined(factor).gridPoints() <= MAX_REFINED_POINTS; factor *= REFINEMENT_FACTOR) {
      path = planned.refined(factor);
      flutter = method.solve(system, path, analysisCase.options());
    }
    flutter = withNotes(flutter, planned, path, AeroValidity.warnings(c, path));
    double[] f = model.modes().modes().stream().mapToDouble(ElasticMode::frequencyHz).toArray();
    double tasDiv = divergence.speedTasMps(path.at(0).densityKgPerM3());
    progress.stageDone(c.name(), "divergence and flutter");
    ServoResult servo = null;
    if (analysisCase.loop() != null) {
      ClosedLoopResult closed = new ClosedLoopSweep().analyse(model, c, analysisCase.loop(), path, flutter,
          analysisCase.options());
      progress.stageDone(c.name(), "closed loop");
      List<ServoPoint> margins = new ServoMargins(marginOptions, detail.pathMargins()).along(model, c, analysisCase.loop(), path, flutter,
          closed);
      progress.stageDone(c.name(), "loop margins");
      servo = new ServoResult(margins, closed);
    }
    ClearanceResult clearance = null;
    if (analysisCase.requirements() != null) {
      clearance = new ClearanceSweep(marginOptions).assess(model, c, analysisCase.loop(), path, flutter, divergence, servo,
          analysisCase.requirements(), Math.max(0.05, analysisCase.options().onsetSpeedToleranceMps()));
      progress.stageDone(c.name(), "clearance");
    }
    return new ConfigurationResult(c.name(), model.modes().modeNames(), f, system.aero().description(),
        divergence, confirmed, tasDiv, flutter, (System.nanoTime() - start) * 1e-9, servo, clearance);
  }
}
