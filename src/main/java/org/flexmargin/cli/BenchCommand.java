package org.flexmargin.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.ServoMargins;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code flexmargin bench}: timing figures on invented uniform-wing scenarios (see
 * {@link BenchScenario}): the p-k sweep, closed-loop eigenvalues, and the broken-loop frequency
 * response by three routes.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
    description = {"Print timing figures: p-k sweep (10 and 30 modes, 200 speeds), closed-loop "
        + "eigenvalues (about 150 and 300 states, 200 speeds), broken-loop frequency response "
        + "(2000 frequencies x 200 speeds, 20 and 40 modes: direct, Hessenberg, dense), doublet-lattice "
        + "influence matrix and LU (1,000 boxes)."},
    footer = {"", "Examples:", "  flexmargin bench", "  flexmargin bench pk --modes 10,30",
        "  flexmargin bench closed-loop", "  flexmargin bench loop-response --speeds 50"})
final class BenchCommand implements Callable<Integer> {
  @Parameters(index = "0", arity = "0..1", defaultValue = "all",
      description = "Which benchmark: pk, closed-loop, loop-response, lattice or all (default); campaign "
          + "(per-sample cost of a demo-sized campaign; not part of all).")
  String which = "all";

  @Option(names = "--modes", split = ",", description = "p-k mode counts. Default: ${DEFAULT-VALUE}.")
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
    out.printf(Locale.ROOT, "flexmargin benchmarks (invented uniform-wing scenarios), Java %s, %d processors%n",
        System.getProperty("java.version"), Runtime.getRuntime().availableProcessors());
    if (which.equals("all") || which.equals("pk")) {
      pk(out);
    }
    if (which.equals("all") || which.equals("closed-loop")) {
      closedLoop(out, 20, 4);
      closedLoop(out, 40, 5);
    }
    if (which.equals("all") || which.equals("loop-response")) {
      loopResponse(out, 20);
      loopResponse(out, 40);
    }
    if (which.equals("all") || which.equals("lattice")) {
      LatticeBench.run(out, repeats);
    }
    if (which.equals("campaign")) {
      CampaignBench.run(out, repeats);
    }
    out.flush();
    return FlexMargin.EXIT_OK;
  }

  private PlannedPath path() {
    return new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 50, 250, speeds));
  }

  private void pk(PrintWriter out) {
    out.printf(Locale.ROOT, "p-k sweep: %d speeds (sea level, 50-250 m/s TAS), %d strips%n", speeds, strips);
    PlannedPath path = path();
    AnalysisOptions options = AnalysisOptions.defaults();
    for (int m : modes) {
      AeroelasticSystem sys = ConfigurationModel.of(BenchScenario.configuration(m, strips)).system();
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
          "  %2d modes: best %.3f s, mean %.3f s per sweep (%.2f ms per speed); %d root solves, "
              + "%.2f iterations per root, %d full eigen-solves (start-up), %d step halvings, "
              + "%d crossings; peak heap %.0f MB%n",
          sys.size(), best, sum / repeats, best / speeds * 1e3, d.rootSolves(),
          (double) d.iterations() / Math.max(1, d.rootSolves()), d.fullEigenSolves(), d.stepHalvings(),
          last.crossings().size(), peakHeapMb());
    }
  }

  private void closedLoop(PrintWriter out, int modeCount, int lags) {
    Configuration cfg = BenchScenario.configuration(modeCount, strips);
    LoopSpec loop = BenchScenario.loop(strips);
    ConfigurationModel model = ConfigurationModel.of(cfg);
    RationalFit fit = RogerApproximation.fit(model.system().aero(), 3.0, lags);
    RationalAerodynamics rational = RationalAerodynamics.of(fit);
    PlannedPath path = path();
    int states = ServoMargins.loopAt(model, cfg, loop, path.at(0)).closedLoop(rational).stateCount();
    for (int w = 0; w < 20; w++) {
      ServoMargins.loopAt(model, cfg, loop, path.at(w % speeds)).closedLoop(rational).eigenvalues();
    }
    resetPeaks();
    long t0 = System.nanoTime();
    double buildSeconds = 0;
    for (int p = 0; p < speeds; p++) {
      long b0 = System.nanoTime();
      StateSpace cl = ServoMargins.loopAt(model, cfg, loop, path.at(p)).closedLoop(rational);
      buildSeconds += (System.nanoTime() - b0) * 1e-9;
      cl.eigenvalues();
    }
    double total = (System.nanoTime() - t0) * 1e-9;
    out.printf(Locale.ROOT,
        "closed-loop eigenvalues: %d modes, %d lags, %d states: %.1f ms per speed (%.1f ms assembly, "
            + "%.1f ms EJML real eigen-decomposition, O(n^3)), %d speeds in %.2f s; peak heap %.0f MB%n",
        modeCount, lags, states, total / speeds * 1e3, buildSeconds / speeds * 1e3,
        (total - buildSeconds) / speeds * 1e3, speeds, total, peakHeapMb());
  }

  private void loopResponse(PrintWriter out, int modeCount) {
    int nf = 2000;
    int lags = 4;
    Configuration cfg = BenchScenario.configuration(modeCount, strips);
    LoopSpec loop = BenchScenario.loop(strips);
    ConfigurationModel model = ConfigurationModel.of(cfg);
    RationalAerodynamics rational = RationalAerodynamics.of(RogerApproximation.fit(model.system().aero(), 3.0, lags));
    double[] w = new double[nf];
    for (int i = 0; i < nf; i++) {
      w[i] = 2 * Math.PI * 0.01 * Math.pow(100.0 / 0.01, i / (double) (nf - 1));
    }
    PlannedPath path = path();
    double[] v = new double[2];
    // warm-up
    for (int p = 0; p < 5; p++) {
      SisoFrequencyFunction l = ServoMargins.loopAt(model, cfg, loop, path.at(p)).brokenLoop();
      for (double x : w) {
        l.response(x, v);
      }
    }
    resetPeaks();
    long t0 = System.nanoTime();
    for (int p = 0; p < speeds; p++) {
      SisoFrequencyFunction l = ServoMargins.loopAt(model, cfg, loop, path.at(p)).brokenLoop();
      for (double x : w) {
        l.response(x, v);
      }
    }
    double direct = (System.nanoTime() - t0) * 1e-9 / speeds;
    double heapDirect = peakHeapMb();
    ServoLoop servo = ServoMargins.loopAt(model, cfg, loop, path.at(speeds / 2));
    StateSpace chain = servo.openChain(rational);
    chain.frequencyResponse(w);
    long t1 = System.nanoTime();
    int hessRepeats = 5;
    for (int r = 0; r < hessRepeats; r++) {
      ServoMargins.loopAt(model, cfg, loop, path.at(r)).openChain(rational).frequencyResponse(w);
    }
    double hess = (System.nanoTime() - t1) * 1e-9 / hessRepeats;
    int subset = 100;
    double[] ws = new double[subset];
    for (int i = 0; i < subset; i++) {
      ws[i] = w[i * (nf / subset)];
    }
    chain.frequencyResponseDenseLu(ws);
    long t2 = System.nanoTime();
    chain.frequencyResponseDenseLu(ws);
    double dense = (System.nanoTime() - t2) * 1e-9 * nf / subset;
    double flops = 8.0 * Math.pow(2 + modeCount, 3) / 3 * nf;
    out.printf(Locale.ROOT,
        "broken-loop response, %d modes (%d-state chain), %d frequencies: direct modal solve %.1f ms per speed "
            + "(~%.0f Mflop of (2+m) complex LU, %.2f Gflop/s); Hessenberg state space %.1f ms per speed; "
            + "dense complex LU on the full state %.1f ms per speed (from %d frequencies, extrapolated); "
            + "dense/Hessenberg %.0fx; peak heap %.0f MB%n",
        modeCount, chain.stateCount(), nf, direct * 1e3, flops / 1e6, flops / direct / 1e9, hess * 1e3,
        dense * 1e3, subset, dense / hess, heapDirect);
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
