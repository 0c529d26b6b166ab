package org.flexmargin.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.InertiaAxis;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.UniformCantileverWing;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code flexmargin bench}: times the p-k sweep (continuation tracking, refined crossings) on
 * uniform cantilever wings of the Goland proportions with strip theory, at several mode counts.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
    description = "Time the p-k sweep at 10 and 30 modes (strip theory, 200 speeds) and print figures.",
    footer = {"", "Example:", "  flexmargin bench --modes 10,30 --speeds 200"})
final class BenchCommand implements Callable<Integer> {
  @Option(names = "--modes", split = ",", description = "Mode counts (even; half bending, half torsion). Default: ${DEFAULT-VALUE}.")
  int[] modes = {10, 30};

  @Option(names = "--speeds", description = "Speeds per sweep. Default: ${DEFAULT-VALUE}.")
  int speeds = 200;

  @Option(names = "--strips", description = "Aerodynamic strips. Default: ${DEFAULT-VALUE}.")
  int strips = 40;

  @Option(names = "--repeats", description = "Timed repeats after warm-up. Default: ${DEFAULT-VALUE}.")
  int repeats = 3;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    out.printf(Locale.ROOT, "p-k sweep benchmark: %d speeds (sea level, 50-250 m/s TAS), %d strips, "
        + "Java %s, %d processors%n", speeds, strips, System.getProperty("java.version"),
        Runtime.getRuntime().availableProcessors());
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 50, 250, speeds));
    AnalysisOptions options = AnalysisOptions.defaults();
    for (int m : modes) {
      int half = Math.max(1, m / 2);
      UniformCantileverWing wing = new UniformCantileverWing(6.096, 1.8288, 0.33, 0.43, 35.71, 8.64,
          InertiaAxis.ELASTIC_AXIS, 9.77e6, 0.987e6, 2 * Math.PI, half, m - half, strips, 0.0);
      AeroelasticSystem sys = ConfigurationModel.of(new Configuration("bench", wing, null)).system();
      PkMethod pk = new PkMethod();
      for (int w = 0; w < 2; w++) {
        pk.solve(sys, path, options);
      }
      resetPeaks();
      double best = Double.MAX_VALUE;
      double sum = 0;
      FlutterSolution last = null;
      for (int r = 0; r < repeats; r++) {
        long t0 = System.nanoTime();
        last = pk.solve(sys, path, options);
        double s = (System.nanoTime() - t0) * 1e-9;
        best = Math.min(best, s);
        sum += s;
      }
      SolverDiagnostics d = last.diagnostics();
      out.printf(Locale.ROOT,
          "%2d modes: best %.3f s, mean %.3f s per sweep (%.2f ms per speed); %d root solves, "
              + "%.2f iterations per root, %d full eigen-solves (start-up), %d step halvings, "
              + "%d crossings; peak heap %.0f MB%n",
          sys.size(), best, sum / repeats, best / speeds * 1e3, d.rootSolves(),
          (double) d.iterations() / Math.max(1, d.rootSolves()), d.fullEigenSolves(), d.stepHalvings(),
          last.crossings().size(), peakHeapMb());
    }
    return FlexMargin.EXIT_OK;
  }

  private static void resetPeaks() {
    System.gc();
    for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
      p.resetPeakUsage();
    }
  }

  private static double peakHeapMb() {
    long sum = 0;
    for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
      if (p.getType() == MemoryType.HEAP) {
        sum += p.getPeakUsage().getUsed();
      }
    }
    return sum / 1048576.0;
  }
}
