package org.flexmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.report.ReportFolder;
import org.flexmargin.report.ResultFiles;
import org.flexmargin.report.SimulationFiles;
import org.flexmargin.simulate.ActuatorLimits;
import org.flexmargin.simulate.AircraftSimulation;
import org.flexmargin.simulate.InputSignal;
import org.flexmargin.simulate.LoopClosure;
import org.flexmargin.simulate.RandomResponse;
import org.flexmargin.simulate.RateLimitCycle;
import org.flexmargin.simulate.SimulationPoint;
import org.flexmargin.simulate.SimulationResult;
import org.flexmargin.simulate.SimulationScenario;
import org.flexmargin.simulate.Turbulence;
import org.flexmargin.simulate.TurbulenceSpectrum;
import org.flexmargin.sweep.ConfigurationModel;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code flexmargin simulate CASE}: time-domain simulation at one flight point. */
@Command(name = "simulate", mixinStandardHelpOptions = true,
    description = {"Simulate the flexible aircraft with its loop in the time domain at one flight point: a pilot "
        + "input at the elevator command, 1-cosine gusts over a range of gradient lengths, continuous turbulence "
        + "(exact RMS beside the simulated one), actuator rate and position limits, and the rate-limit "
        + "limit-cycle prediction checked by simulation.",
        "Writes CSV time histories, gust peaks, the turbulence RMS table, charts and summary.txt into the output "
            + "folder. Exit 0 when done (3 if the linear loop is unstable at the point)."},
    footer = {"", "Examples:",
        "  flexmargin simulate mode-tables/demo/demo-case.json --speed-eas 100 --input doublet --amplitude-deg 1",
        "  flexmargin simulate mode-tables/demo/demo-case.json --speed-eas 60 --gust-mps 10 --turbulence dryden",
        "  flexmargin simulate mode-tables/demo/demo-case.json --speed-eas 60 --rate-limit-deg-s 40 "
            + "--position-limit-deg 20 --input 3211"})
final class SimulateCommand implements Callable<Integer> {
  @Parameters(index = "0", paramLabel = "CASE", description = "Case file (JSON) with a loop.")
  Path caseFile;

  @Option(names = "--configuration", paramLabel = "NAME", description = "Configuration (default: the first).")
  String configuration;

  @Option(names = "--speed-eas", paramLabel = "M/S",
      description = "Equivalent airspeed, m/s (default: V0max of the requirements table).")
  Double speedEasMps;

  @Option(names = "--altitude", paramLabel = "M",
      description = "Altitude, m (default: the sweep's altitude, else 0).")
  Double altitudeM;

  @Option(names = "--open-loop", description = "Leave the loop open (the law's output is recorded, not used).")
  boolean openLoop;

  @Option(names = "--input", paramLabel = "KIND",
      description = "Pilot input at the elevator command: none, step, doublet, 3211, sweep (default: ${DEFAULT-VALUE}).")
  String input = "doublet";

  @Option(names = "--amplitude-deg", paramLabel = "DEG", description = "Pilot input amplitude, deg (default: ${DEFAULT-VALUE}).")
  double amplitudeDeg = 1.0;

  @Option(names = "--pulse-s", paramLabel = "S",
      description = "Doublet pulse width or 3-2-1-1 unit, s (default: ${DEFAULT-VALUE}).")
  double pulseS = 0.5;

  @Option(names = "--sweep-hz", paramLabel = "F0,F1", split = ",",
      description = "Frequency sweep range, Hz (default: 0.2,20).")
  List<Double> sweepHz = new ArrayList<>(List.of(0.2, 20.0));

  @Option(names = "--gust-mps", paramLabel = "U",
      description = "Peak velocity of the 1-cosine gusts, m/s up (default: no gusts).")
  double gustMps;

  @Option(names = "--gradient-m", paramLabel = "H", split = ",",
      description = "Gust gradient lengths, m (default: six from 9 to 107 m).")
  List<Double> gradientM = new ArrayList<>();

  @Option(names = "--turbulence", paramLabel = "KIND", description = "Continuous turbulence: dryden or von_karman.")
  String turbulence;

  @Option(names = "--sigma-mps", paramLabel = "S", description = "RMS vertical gust velocity, m/s (default: ${DEFAULT-VALUE}).")
  double sigmaMps = 1.0;

  @Option(names = "--scale-m", paramLabel = "L", description = "Turbulence scale length, m (default: ${DEFAULT-VALUE}).")
  double scaleM = 533.4;

  @Option(names = "--turbulence-s", paramLabel = "S",
      description = "Length of the turbulence record, s (default: ${DEFAULT-VALUE}).")
  double turbulenceS = 120;

  @Option(names = "--seed", paramLabel = "N", description = "Seed of the turbulence generator (default: ${DEFAULT-VALUE}).")
  long seed = 1;

  @Option(names = "--rate-limit-deg-s", paramLabel = "R", description = "Actuator rate limit, deg/s (default: none).")
  Double rateLimitDegS;

  @Option(names = "--position-limit-deg", paramLabel = "P", description = "Actuator position limit, deg (default: none).")
  Double positionLimitDeg;

  @Option(names = "--duration-s", paramLabel = "S", description = "Length of each run, s (default: ${DEFAULT-VALUE}).")
  double durationS = 10;

  @Option(names = "--step-s", paramLabel = "S", description = "Output step, s (default: ${DEFAULT-VALUE}).")
  double stepS = 0.002;

  @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: reports/<case name>/simulate).")
  Path out;

  @Mixin CommonOptions common;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    PrintWriter pw = spec.commandLine().getOut();
    AnalysisCase c = LatticeCache.prepare(CaseReader.read(caseFile), spec.commandLine().getErr(), common.quiet);
    if (c.loop() == null) {
      throw new InvalidInputException("loop", "a flight-control loop (simulate needs one)", "none");
    }
    Configuration conf = c.configurations().get(0);
    if (configuration != null) {
      conf = c.configurations().stream().filter(x -> x.name().equals(configuration)).findFirst()
          .orElseThrow(() -> new InvalidInputException("--configuration", "one of "
              + c.configurations().stream().map(Configuration::name).toList(), configuration));
    }
    double eas;
    if (speedEasMps != null) {
      eas = speedEasMps;
    } else if (c.requirements() != null) {
      eas = c.requirements().maxOperatingSpeedEasMps();
    } else {
      throw new InvalidInputException("--speed-eas", "a speed (the case has no requirements table for V0max)",
          "nothing");
    }
    if (!(eas > 0)) {
      throw new InvalidInputException("--speed-eas", "a speed > 0 m/s", String.valueOf(eas));
    }
    double alt = altitudeM != null ? altitudeM : (c.sweep() instanceof SpeedSweep s ? s.altitudeM() : 0.0);
    SimulationScenario scenario = scenario();
    SimulationPoint point = SimulationPoint.of(ConfigurationModel.of(conf), conf, c.loop(),
        StandardAtmosphere.atEquivalentSpeed(alt, eas));
    SimulationResult r = AircraftSimulation.run(point, scenario);
    List<String> summary = summary(c.name(), r);
    Path target = out != null ? out : Path.of("reports", ResultFiles.fileSafe(c.name()), "simulate");
    String title = String.format(Locale.ROOT, "%s, %.0f m/s EAS", conf.name(), eas);
    Path written = ReportFolder.writeAtomically(target, folder -> SimulationFiles.write(folder, r, summary, title));
    if (!common.quiet) {
      summary.forEach(pw::println);
      pw.println();
      pw.println("written to " + written);
      Tables.cautions(pw);
    }
    return r.closedLoopMaxRealPartPerS() > 0 ? FlexMargin.EXIT_REQUIREMENTS_VIOLATED : FlexMargin.EXIT_OK;
  }

  private SimulationScenario scenario() {
    double amp = Math.toRadians(amplitudeDeg);
    InputSignal pilot = switch (input.toLowerCase(Locale.ROOT)) {
      case "none" -> null;
      case "step" -> new InputSignal.Step(amp, 0.1);
      case "doublet" -> new InputSignal.Doublet(amp, 0.1, pulseS);
      case "3211" -> new InputSignal.Multistep3211(amp, 0.1, pulseS);
      case "sweep" -> {
        if (sweepHz.size() != 2) {
          throw new InvalidInputException("--sweep-hz", "two frequencies F0,F1", String.valueOf(sweepHz));
        }
        yield new InputSignal.FrequencySweep(amp, 0.1, Math.max(durationS - 0.2, 1), sweepHz.get(0), sweepHz.get(1));
      }
      default -> throw new InvalidInputException("--input", "none, step, doublet, 3211 or sweep", input);
    };
    Turbulence t = null;
    if (turbulence != null) {
      TurbulenceSpectrum kind = switch (turbulence.toLowerCase(Locale.ROOT).replace('-', '_')) {
        case "dryden" -> TurbulenceSpectrum.DRYDEN;
        case "von_karman", "vonkarman" -> TurbulenceSpectrum.VON_KARMAN;
        default -> throw new InvalidInputException("--turbulence", "dryden or von_karman", turbulence);
      };
      t = new Turbulence(kind, sigmaMps, scaleM);
    }
    ActuatorLimits limits = new ActuatorLimits(
        rateLimitDegS == null ? Double.POSITIVE_INFINITY : Math.toRadians(rateLimitDegS),
        positionLimitDeg == null ? Double.POSITIVE_INFINITY : Math.toRadians(positionLimitDeg));
    List<Double> gradients = gradientM.isEmpty() ? AircraftSimulation.standardGradientLengthsM() : gradientM;
    return new SimulationScenario(openLoop ? LoopClosure.OPEN : LoopClosure.CLOSED, pilot, gustMps, gradients, t,
        limits, durationS, stepS, turbulenceS, seed);
  }

  private static List<String> summary(String caseName, SimulationResult r) {
    List<String> s = new ArrayList<>();
    SimulationPoint p = r.point();
    s.add(String.format(Locale.ROOT, "case %s: simulation of %s at %.1f m/s EAS (%.1f m/s TAS), %.0f m, loop %s",
        caseName, p.configurationName(), p.condition().speedEasMps(), p.condition().speedTasMps(),
        p.condition().altitudeM(), r.scenario().closure().name().toLowerCase(Locale.ROOT)));
    s.add(String.format(Locale.ROOT, "linear system: largest eigenvalue real part %.4f 1/s (%s)",
        r.closedLoopMaxRealPartPerS(), r.closedLoopMaxRealPartPerS() < 0 ? "stable" : "UNSTABLE"));
    if (r.pilot() != null) {
      s.add("pilot input: " + r.scenario().pilotInput().describe() + " (rad at the elevator command)");
      s.add(peaks(r.pilot()));
      if (r.pilotDiagnostics() != null) {
        var d = r.pilotDiagnostics();
        s.add(String.format(Locale.ROOT, "  Dormand-Prince: %d steps (%.2e to %.2e s, mean %.2e s), %d evaluations, "
            + "tolerances %.0e relative / %.0e absolute", d.acceptedSteps(), d.smallestStepS(), d.largestStepS(),
            d.meanStepS(), d.evaluations(), d.relativeTolerance(), d.absoluteTolerance()));
      }
    }
    if (!r.gusts().isEmpty()) {
      s.add(String.format(Locale.ROOT, "1-cosine gusts of %.2f m/s:", r.scenario().gustPeakVelocityMps()));
      s.add(String.format(Locale.ROOT, "  %10s %12s %14s %12s %14s", "H m", "peak load g", "elev rate deg/s",
          "elevator deg", "pitch rate deg/s"));
      SimulationResult.GustPeak worst = null;
      for (SimulationResult.GustPeak g : r.gusts()) {
        s.add(String.format(Locale.ROOT, "  %10.1f %12.4f %14.3f %12.4f %14.4f", g.gradientLengthM(),
            g.peakLoadFactorG(), Math.toDegrees(g.peakElevatorRateRadPerS()), Math.toDegrees(g.peakElevatorRad()),
            Math.toDegrees(g.peakPitchRateRadPerS())));
        if (worst == null || g.peakLoadFactorG() > worst.peakLoadFactorG()) {
          worst = g;
        }
      }
      s.add(String.format(Locale.ROOT, "  worst gust: H = %.1f m (peak load %.4f g at %.3f s)",
          worst.gradientLengthM(), worst.peakLoadFactorG(), worst.timeOfPeakS()));
    }
    if (r.scenario().turbulence() != null) {
      if (r.turbulence() == null) {
        s.add("turbulence: no stationary response (the linear system is unstable)");
      } else {
        RandomResponse.Result t = r.turbulence();
        Turbulence tu = r.scenario().turbulence();
        s.add(String.format(Locale.ROOT, "turbulence: %s, sigma %.2f m/s, L %.1f m, %.0f s record, seed %d",
            tu.spectrum().name().toLowerCase(Locale.ROOT), tu.sigmaMps(), tu.scaleLengthM(),
            r.scenario().turbulenceDurationS(), r.scenario().seed()));
        s.add(String.format(Locale.ROOT, "  %-40s %12s %12s %12s", "output", "exact RMS", "simulated", "95% +/-"));
        for (int o = 0; o < t.names().size(); o++) {
          String n = t.names().get(o);
          if (n.startsWith("sensor_") || n.startsWith("elevator") || n.startsWith("gust")) {
            s.add(String.format(Locale.ROOT, "  %-40s %12.5g %12.5g %12.2g", n, t.exactRms()[o], t.simulatedRms()[o],
                t.rmsHalfWidth95(o)));
          }
        }
      }
    }
    if (Double.isFinite(r.scenario().limits().rateLimitRadPerS())) {
      if (r.limitCycles().isEmpty()) {
        s.add("rate-limit limit cycle: none predicted between 0.05 and 60 Hz (describing function on the exact loop)");
      }
      for (int i = 0; i < r.limitCycles().size(); i++) {
        RateLimitCycle.Prediction c = r.limitCycles().get(i);
        s.add(String.format(Locale.ROOT, "rate-limit limit cycle predicted: %.3f deg at %.2f Hz (|L| = %.2f); %s",
            Math.toDegrees(c.amplitude()), c.frequencyHz(), c.loopMagnitude(), r.limitCycleChecks().get(i)));
      }
    }
    s.add("notes:");
    for (String n : r.notes()) {
      s.add("  - " + n);
    }
    return s;
  }

  private static String peaks(org.flexmargin.simulate.TimeHistory h) {
    StringBuilder sb = new StringBuilder("  peaks:");
    for (String n : h.names()) {
      if (n.startsWith("sensor_") || n.startsWith("elevator")) {
        double v = h.channel(n)[h.peakIndex(n)];
        String unit = n.endsWith("_g") ? "g" : (n.endsWith("_rad_per_s") ? "deg/s" : "deg");
        double shown = unit.equals("g") ? v : Math.toDegrees(v);
        sb.append(String.format(Locale.ROOT, " %s %.4g %s;", n.replaceAll("_(g|rad|rad_per_s)$", ""), shown, unit));
      }
    }
    return sb.toString();
  }
}
