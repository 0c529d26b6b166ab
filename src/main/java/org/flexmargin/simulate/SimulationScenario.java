package org.flexmargin.simulate;

import java.util.List;
import org.flexmargin.model.InvalidInputException;

/**
 * What to simulate at one point. Immutable; validated on construction.
 *
 * @param closure open or closed loop
 * @param pilotInput pilot command at the elevator command (rad), or null for none
 * @param gustPeakVelocityMps peak velocity of the 1-cosine gusts (m/s), 0 for none
 * @param gradientLengthsM gradient lengths H of the gusts (m), each &gt; 0
 * @param turbulence continuous turbulence, or null for none
 * @param sensorNoise band-limited noise on the sensors in the random-response run (with the
 *     turbulence, or alone), or null for none
 * @param limits actuator limits (infinite for none)
 * @param durationS length of each deterministic run (s), &gt; 0
 * @param stepS output and exact-discretisation step (s), &gt; 0
 * @param turbulenceDurationS length of the turbulence record (s), &gt; 0
 * @param seed seed of the turbulence generator
 * @param penetration wing-to-tail delay of gusts and turbulence, or null (the whole aircraft
 *     meets the gust at once)
 * @param limitCycles whether to predict (and check by simulation) rate-limit limit cycles when
 *     the rate is limited and the loop closed
 * @param liftGrowth quasi-steady or unsteady rigid-body lift for every run
 */
public record SimulationScenario(LoopClosure closure, InputSignal pilotInput, double gustPeakVelocityMps,
    List<Double> gradientLengthsM, Turbulence turbulence, SensorNoise sensorNoise, ActuatorLimits limits, double durationS, double stepS,
    double turbulenceDurationS, long seed, GustPenetration penetration, boolean limitCycles, LiftGrowth liftGrowth) {
  /** Validates and copies. */
  public SimulationScenario {
    if (closure == null) {
      throw new InvalidInputException("loop", "open or closed", "nothing");
    }
    if (liftGrowth == null) {
      throw new InvalidInputException("lift_growth", "quasi_steady or unsteady", "nothing");
    }
    gradientLengthsM = List.copyOf(gradientLengthsM);
    for (int i = 0; i < gradientLengthsM.size(); i++) {
      double h = gradientLengthsM.get(i);
      if (!(h > 0) || !Double.isFinite(h)) {
        throw new InvalidInputException("gradient_lengths_m[" + i + "]", "a finite length > 0 m", String.valueOf(h));
      }
    }
    if (!Double.isFinite(gustPeakVelocityMps)) {
      throw new InvalidInputException("gust_peak_velocity_mps", "a finite value", String.valueOf(gustPeakVelocityMps));
    }
    positive("duration_s", durationS);
    positive("step_s", stepS);
    positive("turbulence_duration_s", turbulenceDurationS);
    if (stepS > durationS / 10) {
      throw new InvalidInputException("step_s", "at most a tenth of the duration (" + durationS / 10 + " s)",
          String.valueOf(stepS));
    }
    if (limits == null) {
      throw new InvalidInputException("actuator_limits", "limits (infinite for none)", "nothing");
    }
  }

  /** A scenario with quasi-steady lift; the parameters as in the canonical constructor. */
  public SimulationScenario(LoopClosure closure, InputSignal pilotInput, double gustPeakVelocityMps,
      List<Double> gradientLengthsM, Turbulence turbulence, SensorNoise sensorNoise, ActuatorLimits limits,
      double durationS, double stepS, double turbulenceDurationS, long seed, GustPenetration penetration,
      boolean limitCycles) {
    this(closure, pilotInput, gustPeakVelocityMps, gradientLengthsM, turbulence, sensorNoise, limits, durationS, stepS,
        turbulenceDurationS, seed, penetration, limitCycles, LiftGrowth.QUASI_STEADY);
  }

  /** @return number of output steps of a deterministic run */
  public int steps() {
    return (int) Math.round(durationS / stepS);
  }

  /** @return true if a random-response run (turbulence and/or sensor noise) is asked for */
  public boolean hasRandomInputs() {
    return turbulence != null || sensorNoise != null;
  }

  /** @return true if the gusts are to be run */
  public boolean hasGusts() {
    return gustPeakVelocityMps != 0 && !gradientLengthsM.isEmpty();
  }

  private static void positive(String field, double v) {
    if (!(v > 0) || !Double.isFinite(v)) {
      throw new InvalidInputException(field, "a finite value > 0", String.valueOf(v));
    }
  }
}
