package org.flexmargin.simulate;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.loop.StateSpace;

/**
 * Runs a {@link SimulationScenario} at a {@link SimulationPoint}: the pilot input and each
 * 1-cosine gust (exact discretisation when the actuator has no limits; with limits, exact steps
 * while the actuator is clear of them and Dormand-Prince near and at them),
 * continuous turbulence (linear: exact RMS beside the simulated one), and the rate-limit
 * limit-cycle prediction on the exact loop with its check by simulation. Stateless.
 */
public final class AircraftSimulation {
  /** Scan range of the limit-cycle prediction (Hz). */
  private static final double CYCLE_MIN_HZ = 0.05;
  private static final double CYCLE_MAX_HZ = 60;

  private AircraftSimulation() {}

  /**
   * @param point the point
   * @param scenario what to simulate
   * @return the results
   */
  public static SimulationResult run(SimulationPoint point, SimulationScenario scenario) {
    AircraftSimulationModel model = point.model(scenario.closure(), scenario.penetration(), scenario.liftGrowth());
    Eigenvalues eigenvalues = model.system().eigenvalues();
    double maxRe = eigenvalues.maxRealPart();
    List<String> notes = new ArrayList<>(point.servo().plant().assumptions());
    notes.add("aerodynamics for the time domain: " + point.fitDescription());
    notes.addAll(point.fitWarnings());
    notes.add("hold and delay ahead of the actuator as Pade approximations, as in the closed-loop eigenvalues");
    String forces = liftGrowthNote(scenario.liftGrowth(), point.referenceChordM() / 2);
    if (scenario.penetration() == null || scenario.penetration().wingToTailM() == 0) {
      notes.add("gusts act on the whole aircraft at once (no penetration delay) as an angle of attack w/V; " + forces);
    } else {
      notes.add("gusts act as an angle of attack w/V; " + forces + "; "
          + scenario.penetration().describe(point.condition().speedTasMps(),
              AircraftSimulationModel.maxOmega(point.servo().plant().stateSpace(point.rational()))));
    }
    if (maxRe > 0) {
      notes.add(String.format(Locale.ROOT, "the linear %s loop is UNSTABLE at this point (largest real part "
          + "%.3f 1/s): responses grow; no stationary turbulence response exists",
          scenario.closure() == LoopClosure.CLOSED ? "closed" : "open", maxRe));
    }
    boolean limited = !scenario.limits().none();
    int steps = scenario.steps();
    LimitedActuatorSimulation.Prepared prepared = limited
        ? LimitedActuatorSimulation.prepare(model.limited(), scenario.limits(), scenario.stepS(), eigenvalues)
        : null;
    TimeHistory pilot = null;
    IntegrationDiagnostics pilotDiag = null;
    if (scenario.pilotInput() != null) {
      InputSignal in = scenario.pilotInput();
      if (limited) {
        LimitedActuatorSimulation.Result r = LimitedActuatorSimulation.run(prepared, steps,
            List.of(in::value, t -> 0.0), null);
        pilot = r.history();
        pilotDiag = r.diagnostics();
      } else {
        pilot = LinearSimulation.run(model.system(), scenario.stepS(), steps, List.of(in::value, t -> 0.0), null, null);
      }
    }
    List<SimulationResult.GustPeak> peaks = new ArrayList<>();
    TimeHistory worst = null;
    double worstLoad = -1;
    if (scenario.hasGusts()) {
      ExactDiscretization disc = limited ? null : ExactDiscretization.of(model.system(), scenario.stepS());
      for (double h : scenario.gradientLengthsM()) {
        InputSignal g = new InputSignal.OneMinusCosineGust(scenario.gustPeakVelocityMps(), h, model.speedTasMps(),
            0.1);
        List<DoubleUnaryOperator> inputs = List.of(t -> 0.0, g::value);
        TimeHistory hist = limited
            ? LimitedActuatorSimulation.run(prepared, steps, inputs, null).history()
            : LinearSimulation.run(model.system(), disc, steps, inputs, null, null);
        SimulationResult.GustPeak peak = peakOf(h, hist);
        peaks.add(peak);
        double load = Double.isNaN(peak.peakLoadFactorG()) ? peak.peakPitchRateRadPerS() : peak.peakLoadFactorG();
        if (load > worstLoad) {
          worstLoad = load;
          worst = hist;
        }
      }
    }
    RandomResponse.Result turbulence = null;
    if (scenario.hasRandomInputs() && maxRe < 0) {
      int n = (int) Math.round(scenario.turbulenceDurationS() / scenario.stepS());
      StateSpace random = model.withRandomInputs(scenario.turbulence(), scenario.sensorNoise());
      int[] sources = new int[random.inputCount() - 1];
      for (int i = 0; i < sources.length; i++) {
        sources[i] = i + 1;
      }
      turbulence = RandomResponse.run(random, sources, scenario.stepS(), n, scenario.seed());
      if (limited) {
        notes.add("random-response RMS is that of the linear system (actuator limits not applied there)");
      }
      if (scenario.sensorNoise() != null) {
        SensorNoise sn = scenario.sensorNoise();
        notes.add(String.format(Locale.ROOT, "sensor noise in the random-response run: %s, white to %.1f Hz "
            + "(first order), independent; the sensor outputs are the measured signals", sn.rmsBySensor(),
            sn.bandwidthHz()));
      }
    }
    List<RateLimitCycle.Prediction> cycles = new ArrayList<>();
    List<String> checks = new ArrayList<>();
    if (scenario.limitCycles() && Double.isFinite(scenario.limits().rateLimitRadPerS())
        && scenario.closure() == LoopClosure.CLOSED) {
      SisoFrequencyFunction loop = point.servo().brokenLoop();
      cycles.addAll(RateLimitCycle.predict(loop, scenario.limits().rateLimitRadPerS(), 2 * Math.PI * CYCLE_MIN_HZ,
          2 * Math.PI * CYCLE_MAX_HZ, 600));
      for (RateLimitCycle.Prediction p : cycles) {
        checks.add(maxRe < 0 ? check(model, scenario, p, eigenvalues)
            : "not checked by simulation: the linear loop is already unstable at this point");
      }
      notes.add("limit-cycle prediction: rate limiter at the actuator command, the rest of the loop (actuator "
          + "included) exact in the frequency domain");
    }
    return new SimulationResult(point, scenario, maxRe, pilot, pilotDiag, peaks, worst, turbulence, cycles, checks,
        notes);
  }

  /**
   * Excites the loop with three cycles of the predicted frequency at 0.7 and 1.3 times the
   * predicted amplitude (injected at the elevator command) and compares the free oscillation of
   * the elevator command afterwards.
   */
  private static String check(AircraftSimulationModel model, SimulationScenario scenario, RateLimitCycle.Prediction p,
      Eigenvalues eigenvalues) {
    double[] after = new double[2];
    double[] factors = {0.7, 1.3};
    double period = 2 * Math.PI / p.omegaRadPerS();
    double dt = Math.min(scenario.stepS(), period / 40);
    double burst = 3 * period;
    double total = burst + Math.max(12 * period, 2.0);
    int steps = (int) Math.ceil(total / dt);
    int cmd = model.system().outputNames().indexOf(AircraftSimulationModel.ELEVATOR_COMMAND);
    LimitedActuatorSimulation.Prepared prepared = LimitedActuatorSimulation.prepare(model.limited(), scenario.limits(),
        dt, eigenvalues);
    for (int i = 0; i < 2; i++) {
      double a = factors[i] * p.amplitude();
      DoubleUnaryOperator in = t -> t < burst ? a * Math.sin(p.omegaRadPerS() * t) : 0.0;
      TimeHistory h = LimitedActuatorSimulation.run(prepared, steps, List.of(in, t -> 0.0), null).history();
      double[] u = h.values()[cmd];
      double max = 0;
      for (int k = (int) (steps - 3 * period / dt); k <= steps; k++) {
        max = Math.max(max, Math.abs(u[k]));
      }
      after[i] = max;
    }
    boolean below = after[0] < 0.7 * p.amplitude();
    boolean above = !(after[1] <= 0.7 * p.amplitude());
    String verdict = below && above ? "confirmed: motion below it decays, above it persists or grows"
        : (!above ? "refuted: the motion decays from above the predicted amplitude too"
            : "refuted: the motion persists from below the predicted amplitude too");
    String beyond = p.amplitude() > scenario.limits().positionLimitRad()
        ? "; the amplitude exceeds the position limit, so the loop saturates in position (for an unstable "
            + "airframe: departure) before such a cycle forms"
        : "";
    return String.format(Locale.ROOT,
        "after excitation at 0.7x / 1.3x the command oscillates at %s / %s deg; %s%s", amplitude(after[0], p),
        amplitude(after[1], p), verdict, beyond);
  }

  private static String amplitude(double value, RateLimitCycle.Prediction p) {
    return !(value < 1e3 * p.amplitude()) ? "unbounded" : String.format(Locale.ROOT, "%.3f", Math.toDegrees(value));
  }

  private static SimulationResult.GustPeak peakOf(double h, TimeHistory hist) {
    int accel = -1;
    for (int i = 0; i < hist.names().size(); i++) {
      if (hist.names().get(i).startsWith("sensor_") && hist.names().get(i).endsWith("_g")) {
        accel = i;
        break;
      }
    }
    double load = Double.NaN;
    double when = Double.NaN;
    if (accel >= 0) {
      String name = hist.names().get(accel);
      int k = hist.peakIndex(name);
      load = Math.abs(hist.values()[accel][k]);
      when = hist.timesS()[k];
    }
    return new SimulationResult.GustPeak(h, load, peak(hist, AircraftSimulationModel.ELEVATOR_RATE),
        peak(hist, AircraftSimulationModel.ELEVATOR), peak(hist, AircraftSimulationModel.PITCH_RATE), when);
  }

  private static double peak(TimeHistory h, String name) {
    return Math.abs(h.channel(name)[h.peakIndex(name)]);
  }

  private static String liftGrowthNote(LiftGrowth growth, double semichordM) {
    if (growth == LiftGrowth.QUASI_STEADY) {
      return "quasi-steady forces (no unsteady lift growth)";
    }
    return String.format(Locale.ROOT, "unsteady lift growth: gust angle through %s, angle of attack through %s "
        + "(2-D indicial functions on the whole rigid-body angle-of-attack force, reduced time V t / b, "
        + "b = %.3f m); elastic forces keep their rational fit", IndicialLift.KUSSNER.name(),
        IndicialLift.WAGNER.name(), semichordM);
  }

  /** @return the standard gradient lengths of a sweep of discrete gusts: 9 to 107 m (CS-25.341) */
  public static List<Double> standardGradientLengthsM() {
    List<Double> out = new ArrayList<>();
    for (int i = 0; i < 6; i++) {
      out.add(9.0 * Math.pow(107.0 / 9.0, i / 5.0));
    }
    return Collections.unmodifiableList(out);
  }
}
