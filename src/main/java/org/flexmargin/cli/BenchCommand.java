package org.flexmargin.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.NearestEigenvalue;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.sweep.CaseSweep;
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
    description = {"Print timing figures: the demo (sweep and report; CPU, wall and peak memory; "
        + "threads 1, 2, 4; 55 and 550 sweep points), p-k sweep (8 to 64 modes, 200 speeds), closed-loop "
        + "eigenvalues (about 150 and 300 states, 200 speeds; one root tracked from the previous speed against the "
        + "full solve), broken-loop frequency response "
        + "(2000 frequencies x 200 speeds, 20 and 40 modes: direct, Hessenberg, dense), doublet-lattice "
        + "influence matrix and LU (1,000 boxes); on request, the time of a real campaign of a demo-sized case, projected to 10,000 samples."},
    footer = {"", "Examples:", "  flexmargin bench", "  flexmargin bench pk --modes 10,30",
        "  flexmargin bench demo", "  flexmargin bench closed-loop", "  flexmargin bench loop-response --speeds 50",
        "  flexmargin bench campaign", "  flexmargin bench campaign --samples 10000"})
final class BenchCommand implements Callable<Integer> {
  @Parameters(index = "0", arity = "0..1", defaultValue = "all",
      description = "Which benchmark: demo, pk, closed-loop, loop-response, lattice or all (default); "
          + "campaign (a real campaign of a demo-sized case, timed and projected to 10,000 samples; not part of all).")
  String which = "all";

  @Option(names = "--modes", split = ",", description = "p-k mode counts. Default: ${DEFAULT-VALUE}.")
  int[] modes = {8, 16, 32, 64};

  @Option(names = "--speeds", description = "Speeds per sweep. Default: ${DEFAULT-VALUE}.")
  int speeds = 200;

  @Option(names = "--strips", description = "Aerodynamic strips. Default: ${DEFAULT-VALUE}.")
  int strips = 40;

  @Option(names = "--repeats", description = "Timed repeats after warm-up. Default: ${DEFAULT-VALUE}.")
  int repeats = 3;

  @Option(names = "--samples", description = "Samples of the campaign benchmark's real campaign (at least 2; "
      + "10000 measures the projected campaign itself). Default: ${DEFAULT-VALUE}.")
  int samples = 400;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    out.printf(Locale.ROOT, "flexmargin benchmarks (invented uniform-wing scenarios), Java %s, %d processors%n",
        System.getProperty("java.version"), Runtime.getRuntime().availableProcessors());
    if (which.equals("all") || which.equals("demo")) {
      demo(out);
    }
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
      CampaignBench.run(out, samples);
    }
    out.flush();
    return FlexMargin.EXIT_OK;
  }

  /** Process CPU time (s), all threads. */
  static double cpuSeconds() {
    return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
        .getProcessCpuTime() * 1e-9;
  }

  /** @return the peak resident set of this process (MB) where the system reports it, else NaN */
  static double peakRssMb() {
    try {
      for (String line : java.nio.file.Files.readAllLines(java.nio.file.Path.of("/proc/self/status"))) {
        if (line.startsWith("VmHWM:")) {
          return Double.parseDouble(line.replaceAll("[^0-9]", "")) / 1024.0;
        }
      }
    } catch (java.io.IOException | RuntimeException e) {
      return Double.NaN;
    }
    return Double.NaN;
  }

  /** Wall and CPU seconds of one piece of work. */
  private record Timed(double wallS, double cpuS) {
    static Timed of(Runnable work) {
      double c0 = cpuSeconds();
      long t0 = System.nanoTime();
      work.run();
      return new Timed((System.nanoTime() - t0) * 1e-9, cpuSeconds() - c0);
    }
  }

  /** The demo with the sweep plan's number of points changed (and only the first configuration if asked). */
  private static AnalysisCase demoWith(AnalysisCase c, int points, boolean firstOnly) {
    SpeedSweep s = (SpeedSweep) c.sweep();
    return new AnalysisCase(c.format(), c.name(), c.description(),
        firstOnly ? c.configurations().subList(0, 1) : c.configurations(),
        new SpeedSweep(s.altitudeM(), s.kind(), s.fromMps(), s.toMps(), points), c.options(), c.inputs(), c.loop(),
        c.requirements(), c.warnings());
  }

  private void demo(PrintWriter out) {
    AnalysisCase demo = DemoCommand.bundledCase();
    int processors = Runtime.getRuntime().availableProcessors();
    Timed cold = Timed.of(BenchCommand::runDemoCommand);
    out.printf(Locale.ROOT, "demo (the demo command: 2 configurations, 55 points, loop, clearance, time-domain check, "
        + "results and report, PNG charts): first run in this JVM (with compilation) %.2f s wall, %.2f s CPU%n",
        cold.wallS(), cold.cpuS());
    for (int w = 0; w < 2; w++) {
      runDemoCommand();
    }
    Timed whole = Timed.of(BenchCommand::runDemoCommand);
    Timed sweep = Timed.of(() -> new CaseSweep(processors).run(demo, n -> { }));
    out.printf(Locale.ROOT, "  after warm-up, %d threads: %.2f s wall, %.2f s CPU (of which the sweep %.2f s wall, "
        + "%.2f s CPU; time-domain check, results and report the rest); peak resident memory of this process "
        + "%.0f MB%n", processors, whole.wallS(), whole.cpuS(), sweep.wallS(), sweep.cpuS(), peakRssMb());
    double oneThread = 0;
    for (int t : new int[] {1, 2, 4}) {
      Timed s = Timed.of(() -> new CaseSweep(t).run(demo, n -> { }));
      oneThread = t == 1 ? s.wallS() : oneThread;
      out.printf(Locale.ROOT, "  sweep only, --threads %d: %.2f s wall, %.2f s CPU, speed-up %.2f%n", t, s.wallS(),
          s.cpuS(), oneThread / s.wallS());
    }
    double[] perPoint = new double[2];
    int[] counts = {55, 550};
    for (int i = 0; i < 2; i++) {
      AnalysisCase c = demoWith(demo, counts[i], true);
      Timed s = Timed.of(() -> new CaseSweep(1).run(c, n -> { }));
      perPoint[i] = s.cpuS() / counts[i];
      out.printf(Locale.ROOT, "  sweep of one configuration, %d points, 1 thread: %.2f s CPU, %.1f ms per point%n",
          counts[i], s.cpuS(), perPoint[i] * 1e3);
    }
    out.printf(Locale.ROOT, "  cost per point and configuration from the difference: %.1f ms (linear in points "
        + "if it equals the figures above)%n", (perPoint[1] * counts[1] - perPoint[0] * counts[0])
            / (counts[1] - counts[0]) * 1e3);
  }

  /** Runs {@code flexmargin demo --quiet} in this JVM into a scratch folder, as a user would. */
  private static void runDemoCommand() {
    java.nio.file.Path dir = null;
    try {
      dir = java.nio.file.Files.createTempDirectory("flexmargin-bench");
      java.io.StringWriter sink = new java.io.StringWriter();
      int code = FlexMargin.execute(new String[] {"demo", "--quiet", "--out", dir.resolve("demo").toString()},
          new PrintWriter(sink), new PrintWriter(sink));
      if (code != FlexMargin.EXIT_OK && code != FlexMargin.EXIT_REQUIREMENTS_VIOLATED) {
        throw new IllegalStateException("the demo ended with exit code " + code + ": " + sink);
      }
    } catch (java.io.IOException e) {
      throw new java.io.UncheckedIOException(e);
    } finally {
      deleteTree(dir);
    }
  }

  /**
   * Deletes a scratch folder and everything in it, quietly: one left behind under the system's
   * temporary folder is harmless.
   *
   * @param dir the folder, or null (nothing to do)
   */
  static void deleteTree(java.nio.file.Path dir) {
    if (dir == null) {
      return;
    }
    try (var files = java.nio.file.Files.walk(dir)) {
      files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
    } catch (java.io.IOException e) {
      // scratch folder under the system temporary folder: left for the system to clean
    }
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
      StateSpace cl = ServoMargins.loopAt(model, cfg, loop, path.at(w % speeds)).closedLoop(rational);
      cl.eigenvalues();
      ejmlEigenvalues(cl.a());
    }
    resetPeaks();
    long t0 = System.nanoTime();
    double buildSeconds = 0;
    double trackSeconds = 0;
    double ejmlSeconds = 0;
    int tracked = 0;
    double[] previous = null;
    for (int p = 0; p < speeds; p++) {
      long b0 = System.nanoTime();
      StateSpace cl = ServoMargins.loopAt(model, cfg, loop, path.at(p)).closedLoop(rational);
      buildSeconds += (System.nanoTime() - b0) * 1e-9;
      Eigenvalues e = cl.eigenvalues();
      long j0 = System.nanoTime();
      ejmlEigenvalues(cl.a());
      ejmlSeconds += (System.nanoTime() - j0) * 1e-9;
      if (previous != null) {
        long k0 = System.nanoTime();
        tracked += NearestEigenvalue.near(cl.a(), previous[0], previous[1]).converged() ? 1 : 0;
        trackSeconds += (System.nanoTime() - k0) * 1e-9;
      }
      previous = leastStable(e);
    }
    double total = (System.nanoTime() - t0) * 1e-9 - trackSeconds - ejmlSeconds;
    double full = (total - buildSeconds) / speeds;
    double ejml = ejmlSeconds / speeds;
    double one = trackSeconds / (speeds - 1);
    out.printf(Locale.ROOT,
        "closed-loop eigenvalues: %d modes, %d lags, %d states: %.1f ms per speed (%.1f ms assembly, "
            + "%.1f ms balanced double-shift QR eigenvalues, O(n^3)), %d speeds in %.2f s; peak heap %.0f MB%n",
        modeCount, lags, states, total / speeds * 1e3, buildSeconds / speeds * 1e3,
        full * 1e3, speeds, total, peakHeapMb());
    out.printf(Locale.ROOT,
        "  eigenvalues of the same matrices: EJML general eigen-decomposition %.1f ms per speed, "
            + "balanced double-shift QR %.1f ms per speed (%.1fx faster)%n",
        ejml * 1e3, full * 1e3, ejml / full);
    out.printf(Locale.ROOT,
        "  one root tracked from the previous speed (shifted inverse iteration, as each onset refinement step "
            + "now does): %.2f ms per speed vs %.1f ms for the full solve (%.1fx faster; settled at %d of %d "
            + "speeds); the %d roots of the upper half plane tracked one by one would cost about %.0f ms, so "
            + "grid points keep the full solve%n",
        one * 1e3, full * 1e3, full / one, tracked, speeds - 1, (states + 1) / 2, (states + 1) / 2 * one * 1e3);
  }

  /** EJML's general real eigen-decomposition, eigenvalues only: the reference timing. */
  private static void ejmlEigenvalues(DMatrixRMaj a) {
    EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(a.numRows, false);
    if (!eig.decompose(a)) {
      throw new ArithmeticException("EJML eigen-decomposition of the " + a.numRows + "-state matrix failed");
    }
  }

  /** @return {re, im} of the eigenvalue with the largest real part (upper half plane) */
  private static double[] leastStable(Eigenvalues e) {
    double[] best = {Double.NaN, Double.NaN};
    for (int i = 0; i < e.size(); i++) {
      if (e.imagAt(i) >= 0 && !(e.realAt(i) <= best[0])) {
        best[0] = e.realAt(i);
        best[1] = e.imagAt(i);
      }
    }
    return best;
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
