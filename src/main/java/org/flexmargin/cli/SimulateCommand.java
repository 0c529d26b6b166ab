package org.flexmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.io.CaseReader;
import org.flexmargin.io.GustSection;
import org.flexmargin.io.GustSectionReader;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.report.ReportFolder;
import org.flexmargin.report.ResultFiles;
import org.flexmargin.report.SimulationFiles;
import org.flexmargin.simulate.ActuatorLimits;
import org.flexmargin.simulate.AircraftSimulation;
import org.flexmargin.simulate.GustPenetration;
import org.flexmargin.simulate.InputSignal;
import org.flexmargin.simulate.LiftGrowth;
import org.flexmargin.simulate.LoopClosure;
import org.flexmargin.simulate.RandomResponse;
import org.flexmargin.simulate.RateLimitCycle;
import org.flexmargin.simulate.SimulationPoint;
import org.flexmargin.simulate.SimulationResult;
import org.flexmargin.simulate.SensorNoise;
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
        "  flexmargin simulate mode-tables/demo/demo-case.json --speed-eas 60 --gust-mps 10 --lift-growth unsteady",
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

  @Option(names = "--sensor-noise", paramLabel = "SENSOR=RMS",
      description = "Band-limited white noise on a sensor, RMS in its signal's unit (rad/s, g or rad); repeat for "
          + "several sensors. Applies to the random-response run (with or without --turbulence).")
  java.util.Map<String, Double> sensorNoise = new java.util.LinkedHashMap<>();

  @Option(names = "--sensor-noise-hz", paramLabel = "F",
      description = "Corner of the sensor noise's first-order band, Hz (default: ${DEFAULT-VALUE}).")
  double sensorNoiseHz = 100;

  @Option(names = "--penetration-m", paramLabel = "D",
      description = "Gust penetration: the tailplane meets gusts and turbulence D m after the wing (delay D / V_TAS); "
          + "needs --downwash-gradient and --elevator-effectiveness (default: the case's gusts section, else no "
          + "penetration). Each of the three options overrides the case's value.")
  Double penetrationM;

  @Option(names = "--downwash-gradient", paramLabel = "E",
      description = "d epsilon / d alpha at the tailplane, in [0, 1) (with --penetration-m).")
  Double downwashGradient;

  @Option(names = "--elevator-effectiveness", paramLabel = "T",
      description = "tau_e = d alpha_tail / d delta, in (0, 1.5] (with --penetration-m): the tailplane's share of "
          + "the angle-of-attack forces is the elevator's times (1 - E) / T.")
  Double elevatorEffectiveness;

  @Option(names = "--lift-growth", paramLabel = "KIND",
      description = "Rigid-body lift growth: quasi_steady (forces follow w/V and alpha at once) or unsteady (gust "
          + "angle through Kuessner's function, angle of attack through Wagner's; default: the case's gusts "
          + "section, else quasi_steady).")
  String liftGrowth;

  @Option(names = "--rate-limit-deg-s", paramLabel = "R", description = "Actuator rate limit, deg/s (default: the case's actuator rate_limit_deg_s, else none).")
  Double rateLimitDegS;

  @Option(names = "--position-limit-deg", paramLabel = "P", description = "Actuator position limit, deg (default: the case's actuator position_limit_deg, else none).")
  Double positionLimitDeg;

  @Option(names = "--no-limits", description = "Ignore the case's actuator rate and position limits (linear actuator).")
  boolean noLimits;

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
    GustSection gusts = GustSectionReader.read(caseFile);
    gusts.warnings().forEach(w -> spec.commandLine().getErr().println("flexmargin: warning: " + w.message()));
    SimulationScenario scenario = scenario(c.loop(), gusts);
    SimulationPoint point = SimulationPoint.of(ConfigurationModel.of(conf), conf, c.loop(),
        StandardAtmosphere.atEquivalentSpeed(alt, eas), c.options().rationalFit());
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

  private SimulationScenario scenario(LoopSpec loop, GustSection gusts) {
    ActuatorSpec actuator = loop.actuator();
    List<String> sensorNames = loop.sensors().stream().map(SensorSpec::name).toList();
    for (String name : sensorNoise.keySet()) {
      if (!sensorNames.contains(name)) {
        throw new InvalidInputException("--sensor-noise", "a sensor of the loop: one of " + sensorNames, name);
      }
    }
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
        rateLimitDegS != null ? Math.toRadians(rateLimitDegS)
            : noLimits ? Double.POSITIVE_INFINITY : actuator.rateLimitRadPerS(),
        positionLimitDeg != null ? Math.toRadians(positionLimitDeg)
            : noLimits ? Double.POSITIVE_INFINITY : actuator.positionLimitRad());
    List<Double> gradients = gradientM.isEmpty() ? AircraftSimulation.standardGradientLengthsM() : gradientM;
    SensorNoise noise = sensorNoise.isEmpty() ? null : new SensorNoise(sensorNoise, sensorNoiseHz);
    return new SimulationScenario(openLoop ? LoopClosure.OPEN : LoopClosure.CLOSED, pilot, gustMps, gradients, t,
        noise, limits, durationS, stepS, turbulenceS, seed, penetration(gusts), true, liftGrowth(gusts));
  }

  /** The lift growth of the option, else of the case, else quasi-steady. */
  private LiftGrowth liftGrowth(GustSection gusts) {
    if (liftGrowth != null) {
      return LiftGrowth.of("--lift-growth", liftGrowth);
    }
    return gusts.liftGrowth() == null ? LiftGrowth.QUASI_STEADY : LiftGrowth.of("gusts.lift_growth", gusts.liftGrowth());
  }

  /** Gust penetration from the options, each overriding the case's value. */
  private GustPenetration penetration(GustSection gusts) {
    boolean inCase = gusts.hasPenetration();
    Double d = penetrationM != null ? penetrationM : inCase ? Double.valueOf(gusts.wingToTailM()) : null;
    Double e = downwashGradient != null ? downwashGradient : inCase ? Double.valueOf(gusts.downwashGradient()) : null;
    Double t = elevatorEffectiveness != null ? elevatorEffectiveness
        : inCase ? Double.valueOf(gusts.elevatorEffectiveness()) : null;
    if (d == null) {
      if (e != null || t != null) {
        throw new InvalidInputException("--penetration-m", "the wing-to-tail distance (with --downwash-gradient and "
            + "--elevator-effectiveness, or all three in the case's gusts section)", "nothing");
      }
      return null;
    }
    if (e == null) {
      throw new InvalidInputException("--downwash-gradient", "d epsilon / d alpha at the tail, in [0, 1)", "nothing");
    }
    if (t == null) {
      throw new InvalidInputException("--elevator-effectiveness", "tau_e in (0, 1.5]", "nothing");
    }
    return new GustPenetration(d, e, t);
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
        s.add(d.acceptedSteps() == 0
            ? String.format(Locale.ROOT, "  %d exact steps (the actuator stayed clear of its limits), no integrated "
                + "step", d.exactSteps())
            : String.format(Locale.ROOT, "  %d exact steps clear of the actuator's limits; Dormand-Prince near and at "
                + "them: %d steps (%.2e to %.2e s, mean %.2e s), %d evaluations, tolerances %.0e relative / %.0e "
                + "absolute", d.exactSteps(), d.acceptedSteps(), d.smallestStepS(), d.largestStepS(), d.meanStepS(),
                d.evaluations(), d.relativeTolerance(), d.absoluteTolerance()));
      }
    }
    if (!r.gusts().isEmpty()) {
      GustPenetration pen = r.scenario().penetration();
      s.add(String.format(Locale.ROOT, "1-cosine gusts of %.2f m/s (%s lift growth; %s):",
          r.scenario().gustPeakVelocityMps(), r.scenario().liftGrowth().word(), pen == null ? "no penetration"
              : String.format(Locale.ROOT, "tailplane %.2f m behind the wing, downwash gradient %.2f, elevator "
                  + "effectiveness %.2f", pen.wingToTailM(), pen.downwashGradient(), pen.elevatorEffectiveness())));
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
    if (r.scenario().hasRandomInputs()) {
      if (r.turbulence() == null) {
        s.add("random response: no stationary response (the linear system is unstable)");
      } else {
        RandomResponse.Result t = r.turbulence();
        Turbulence tu = r.scenario().turbulence();
        s.add(tu == null ? String.format(Locale.ROOT, "sensor noise alone, %.0f s record, seed %d",
            r.scenario().turbulenceDurationS(), r.scenario().seed())
            : String.format(Locale.ROOT, "turbulence: %s, sigma %.2f m/s, L %.1f m, %.0f s record, seed %d%s",
            tu.spectrum().name().toLowerCase(Locale.ROOT), tu.sigmaMps(), tu.scaleLengthM(),
            r.scenario().turbulenceDurationS(), r.scenario().seed(),
            r.scenario().sensorNoise() == null ? "" : ", with sensor noise"));
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
    if (Double.isFinite(r.scenario().limits().rateLimitRadPerS()) && r.scenario().closure() == LoopClosure.CLOSED) {
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
