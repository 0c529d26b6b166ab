package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.flexmargin.ase.FlightControlLaw;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.LoopSpec;

/**
 * The rate-saturation line of each sweep point: the smallest sinusoidal command amplitude, at the
 * most critical structural frequency, that drives the actuator to its rate limit.
 *
 * <p>With F(j w) the exact forward chain from the loop input (the actuator command, where the loop
 * is broken) to the elevator (hold, computational delay, actuator) and R the rate limit, a
 * command A sin(w t) moves the elevator at |j w F(j w)| A in the steady state, so the line is
 * A_open = R / (w |F(j w)|). With the loop closed, a signal injected at the same point reaches the
 * command as 1 / (1 + L(j w)) of itself; at a phase crossover L = -|L|, so the injection
 * amplitude that saturates is A_closed = A_open |1 - |L||.
 *
 * <p>The critical frequency is the phase crossover in the aeroelastic band (at or above the
 * first elastic mode's frequency) with the smallest |gain margin|: the structural crossing closest
 * to the critical point, where the closed loop amplifies most. Without one, the highest structural
 * peak of the clearance assessment is used (then A_closed is not known). A_closed exists only
 * where the closed loop is stable (a steady state); elsewhere it is not given. Stateless.
 */
public final class RateSaturation {
  private RateSaturation() {}

  /**
   * The line at one point.
   *
   * @param frequencyHz critical structural frequency (Hz)
   * @param basis how the frequency was chosen, in words
   * @param loopMagnitude |L(j w)| at that frequency (NaN when not known)
   * @param elevatorPerCommand |F(j w)|, elevator per unit command (rad/rad)
   * @param commandAmplitudeRad A_open: command amplitude at the broken loop's input that reaches
   *     the rate limit (rad)
   * @param closedLoopInjectionAmplitudeRad A_closed: amplitude injected at the actuator command
   *     with the loop closed that reaches the rate limit (rad; NaN when not known)
   */
  public record Line(double frequencyHz, String basis, double loopMagnitude, double elevatorPerCommand,
      double commandAmplitudeRad, double closedLoopInjectionAmplitudeRad) {}

  /**
   * Lines at every grid point of a configuration.
   *
   * @param c the configuration's results (with a loop)
   * @param loop the loop (its actuator gives the rate limit)
   * @return one entry per loop point; empty entries where no structural frequency is known; an
   *     empty list when the actuator has no rate limit or the configuration no loop
   */
  public static List<Optional<Line>> along(ConfigurationResult c, LoopSpec loop) {
    if (c.servo() == null || loop == null || !loop.actuator().hasRateLimit()) {
      return List.of();
    }
    LinearBlock forward = FlightControlLaw.of(loop, 0.0).forward();
    List<Optional<Line>> out = new ArrayList<>();
    for (int i = 0; i < c.servo().points().size(); i++) {
      PointAssessment pa = c.clearance() != null && i < c.clearance().points().size()
          ? c.clearance().points().get(i) : null;
      boolean stable = c.servo().closedLoop().points().get(i).maxRealPart() < 0;
      out.add(at(c.servo().points().get(i), firstAeroelasticHz(c, i), pa, forward, loop.actuator(), stable));
    }
    return out;
  }

  /**
   * The line at one point.
   *
   * @param point loop margins at the point
   * @param firstAeroelasticHz lower edge of the aeroelastic band (Hz)
   * @param assessment the clearance assessment at the point, or null
   * @param forward forward chain from the actuator command to the elevator
   * @param actuator the actuator with its rate limit
   * @param closedLoopStable whether the closed loop is stable at the point
   * @return the line, or empty if no structural frequency is known
   */
  public static Optional<Line> at(ServoPoint point, double firstAeroelasticHz, PointAssessment assessment,
      LinearBlock forward, ActuatorSpec actuator, boolean closedLoopStable) {
    PhaseCrossover critical = null;
    for (PhaseCrossover pc : point.margins().phaseCrossovers()) {
      if (pc.frequencyHz() >= firstAeroelasticHz
          && (critical == null || Math.abs(pc.gainMarginDb()) < Math.abs(critical.gainMarginDb()))) {
        critical = pc;
      }
    }
    double hz;
    double magnitude;
    String basis;
    if (critical != null) {
      hz = critical.frequencyHz();
      magnitude = critical.magnitude();
      // two decimals of dB beside three of |L| (0.001 in |L| is 0.009 dB); a margin that rounds to
      // zero is written without a sign
      double marginDb = Math.abs(critical.gainMarginDb()) < 0.005 ? 0.0 : critical.gainMarginDb();
      basis = String.format(Locale.ROOT, "structural phase crossover closest to -1 (|L| = %.3f, gain margin %.2f dB)",
          magnitude, marginDb);
    } else {
      StructuralModeAssessment peak = null;
      if (assessment != null) {
        for (StructuralModeAssessment s : assessment.structuralModes()) {
          if (peak == null || s.peakDb() > peak.peakDb()) {
            peak = s;
          }
        }
      }
      if (peak == null) {
        return Optional.empty();
      }
      hz = peak.peakFrequencyHz();
      magnitude = Double.NaN;
      basis = String.format(Locale.ROOT, "highest structural peak, mode %s (%.1f dB); no structural phase crossover",
          peak.modeName(), peak.peakDb());
    }
    double w = 2 * Math.PI * hz;
    double[] v = new double[2];
    forward.response(w, v);
    double gain = Math.hypot(v[0], v[1]);
    double open = actuator.rateLimitRadPerS() / (w * gain);
    double closed = open * Math.abs(1 - magnitude);
    if (!closedLoopStable) {
      closed = Double.NaN;
      basis += "; closed loop unstable here: no steady state with the loop closed";
    }
    return Optional.of(new Line(hz, basis, magnitude, gain, open, closed));
  }

  /**
   * The lowest elastic-mode frequency at grid point i: the clearance's value when assessed there,
   * else the lowest converged open-loop root frequency (as the clearance computes it), else the
   * lowest in-vacuo frequency.
   *
   * @param c the configuration's results
   * @param i grid point
   * @return the frequency (Hz)
   */
  public static double firstAeroelasticHz(ConfigurationResult c, int i) {
    if (c.clearance() != null && i < c.clearance().points().size()) {
      return c.clearance().points().get(i).firstAeroelasticFrequencyHz();
    }
    double f = Double.POSITIVE_INFINITY;
    for (BranchCurve b : c.flutter().branches()) {
      if (i < b.size() && b.converged()[i] && b.frequencyHz()[i] > 0) {
        f = Math.min(f, b.frequencyHz()[i]);
      }
    }
    if (Double.isInfinite(f)) {
      for (double v : c.modeFrequenciesHz()) {
        f = Math.min(f, v);
      }
    }
    return Double.isInfinite(f) ? 1.0 : f;
  }
}
