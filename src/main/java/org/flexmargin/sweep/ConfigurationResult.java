package org.flexmargin.sweep;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterSolution;

/**
 * Open-loop results of one configuration.
 *
 * @param configuration configuration name
 * @param modeNames elastic mode names, in order
 * @param modeFrequenciesHz in-vacuo frequencies (Hz)
 * @param aeroDescription one line on the aerodynamic source
 * @param divergence static divergence (rigid body restrained)
 * @param divergenceConfirmedPa q_D found independently by the determinant sign change over the
 *     sweep (Pa), empty if the sweep does not reach divergence
 * @param divergenceTasAtSweepStartMps divergence TAS at the first sweep point's altitude (m/s)
 * @param flutter flutter solution (curves, crossings, diagnostics)
 * @param elapsedSeconds wall time of this configuration's analysis (s)
 * @param servo loop margins and closed-loop results; {@code null} when the case has no loop
 * @param clearance verdict against the requirements table; {@code null} when the case has none
 */
public record ConfigurationResult(
    String configuration,
    List<String> modeNames,
    double[] modeFrequenciesHz,
    String aeroDescription,
    DivergenceResult divergence,
    OptionalDouble divergenceConfirmedPa,
    double divergenceTasAtSweepStartMps,
    FlutterSolution flutter,
    double elapsedSeconds,
    ServoResult servo,
    ClearanceResult clearance) {
  /** Copies. */
  public ConfigurationResult {
    modeNames = List.copyOf(modeNames);
    modeFrequenciesHz = modeFrequenciesHz.clone();
  }

  /** Open-loop result without a loop. */
  public ConfigurationResult(String configuration, List<String> modeNames, double[] modeFrequenciesHz,
      String aeroDescription, DivergenceResult divergence, OptionalDouble divergenceConfirmedPa,
      double divergenceTasAtSweepStartMps, FlutterSolution flutter, double elapsedSeconds) {
    this(configuration, modeNames, modeFrequenciesHz, aeroDescription, divergence, divergenceConfirmedPa,
        divergenceTasAtSweepStartMps, flutter, elapsedSeconds, null, null);
  }

  /**
   * @return the lowest open-loop (controls fixed) flutter onset, or a root already unstable at the
   *     first sweep point
   */
  public Optional<Instability> lowestOpenLoopFlutter() {
    return Instabilities.openLoop(this);
  }

  /** @return the lowest closed-loop instability; empty without a loop or when none was found */
  public Optional<Instability> lowestClosedLoopInstability() {
    return Instabilities.closedLoop(this);
  }

  /** @return static divergence (rigid body restrained) as an instability, if found */
  public Optional<Instability> divergenceInstability() {
    return Instabilities.divergence(this);
  }

  /**
   * @return the lowest airspeed at which the aircraft is unstable in any way found: open-loop
   *     flutter, closed-loop instability or divergence
   */
  public Optional<Instability> lowestInstability() {
    return Instabilities.lowest(this);
  }

  @Override
  public double[] modeFrequenciesHz() {
    return modeFrequenciesHz.clone();
  }
}
