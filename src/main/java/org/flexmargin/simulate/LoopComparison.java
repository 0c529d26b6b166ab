package org.flexmargin.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.ConfigurationModel;

/**
 * A short time-domain check for the report: a pilot doublet and 1-cosine gusts at V0max of the
 * requirements table, on the first configuration, with the case's loop and (when given) with a
 * proposed loop (e.g. the designed notches), actuator rate and position limits of the case
 * applied. Kept cheap: one configuration model shared by both loops, a 4 s run, three gradient
 * lengths, no limit-cycle search. Immutable.
 *
 * @param configurationName configuration simulated
 * @param condition flight condition (V0max at the sweep's altitude)
 * @param description the inputs, in words
 * @param variants one result per loop, the case's first
 */
public record LoopComparison(String configurationName, FlightCondition condition, String description,
    List<Variant> variants) {
  /** Doublet amplitude (rad): 1 deg. */
  public static final double DOUBLET_RAD = Math.toRadians(1.0);
  /** Doublet pulse width (s). */
  public static final double PULSE_S = 0.5;
  /** Peak gust velocity (m/s, TAS). */
  public static final double GUST_MPS = 10.0;
  /** Gradient lengths (m): the ends and the middle of the 9 to 107 m range. */
  public static final List<Double> GRADIENTS_M = List.of(9.0, 31.0, 107.0);
  /** Run length (s) and output step (s). */
  public static final double DURATION_S = 4.0;
  static final double STEP_S = 0.002;

  /** Copies. */
  public LoopComparison {
    variants = List.copyOf(variants);
  }

  /**
   * One loop's results.
   *
   * @param label e.g. "case loop" or "designed notches"
   * @param result the simulation
   */
  public record Variant(String label, SimulationResult result) {}

  /**
   * @param c the case (with a loop and requirements)
   * @param proposed a proposed loop to compare, or null
   * @param proposedLabel its label
   * @return the comparison
   * @throws IllegalArgumentException if the case has no loop or no requirements table
   */
  public static LoopComparison of(AnalysisCase c, LoopSpec proposed, String proposedLabel) {
    return of(c, new SharedModels(), proposed, proposedLabel);
  }

  /**
   * As {@link #of(AnalysisCase, LoopSpec, String)}, with the first configuration's model taken from
   * the run's shared models (so that the report's loop charts reuse it).
   *
   * @param c the case (with a loop and requirements)
   * @param models the run's models
   * @param proposed a proposed loop to compare, or null
   * @param proposedLabel its label
   * @return the comparison
   * @throws IllegalArgumentException if the case has no loop or no requirements table
   */
  public static LoopComparison of(AnalysisCase c, SharedModels models, LoopSpec proposed, String proposedLabel) {
    if (c.loop() == null || c.requirements() == null) {
      throw new IllegalArgumentException("a time-domain check needs a loop and a requirements table (for V0max)");
    }
    Configuration conf = c.configurations().get(0);
    double altitude = c.sweep() instanceof SpeedSweep s ? s.altitudeM() : 0.0;
    FlightCondition fc = StandardAtmosphere.atEquivalentSpeed(altitude, c.requirements().maxOperatingSpeedEasMps());
    ConfigurationModel model = models.of(conf);
    ActuatorLimits limits = new ActuatorLimits(c.loop().actuator().rateLimitRadPerS(),
        c.loop().actuator().positionLimitRad());
    SimulationScenario scenario = new SimulationScenario(LoopClosure.CLOSED,
        new InputSignal.Doublet(DOUBLET_RAD, 0.1, PULSE_S), GUST_MPS, GRADIENTS_M, null, null, limits, DURATION_S, STEP_S,
        1.0, 1, null, false);
    List<Variant> variants = new ArrayList<>();
    variants.add(new Variant("case loop", AircraftSimulation.run(SimulationPoint.of(model, conf, c.loop(), fc, c.options().rationalFit()),
        scenario)));
    if (proposed != null) {
      variants.add(new Variant(proposedLabel, AircraftSimulation.run(SimulationPoint.of(model, conf, proposed, fc, c.options().rationalFit()),
          scenario)));
    }
    String text = String.format(Locale.ROOT, "%s at V0max = %.1f m/s EAS (%.1f m/s TAS, %.0f m): %.0f deg doublet "
        + "(%.1f s pulses) at the elevator command; 1-cosine gusts of %.0f m/s over H = %s m, the worst kept; "
        + "actuator rate limit %s, position limit %s; loop closed",
        conf.name(), fc.speedEasMps(), fc.speedTasMps(), fc.altitudeM(), Math.toDegrees(DOUBLET_RAD), PULSE_S,
        GUST_MPS, GRADIENTS_M.stream().map(h -> String.format(Locale.ROOT, "%.0f", h)).toList(),
        limit(limits.rateLimitRadPerS(), "deg/s"), limit(limits.positionLimitRad(), "deg"));
    return new LoopComparison(conf.name(), fc, text, variants);
  }

  private static String limit(double rad, String unit) {
    return Double.isFinite(rad) ? String.format(Locale.ROOT, "%.0f %s", Math.toDegrees(rad), unit) : "none";
  }
}
