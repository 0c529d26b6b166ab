package org.flexmargin.simulate;

import java.util.List;

/**
 * Everything a simulation at one point produced. Immutable.
 *
 * @param point the point (configuration, condition, fit)
 * @param scenario what was simulated
 * @param closedLoopMaxRealPartPerS largest real part of the linear closed-loop (or open-loop)
 *     eigenvalues (1/s); positive means the linear system diverges
 * @param pilot the pilot-input run, or null
 * @param pilotDiagnostics integration diagnostics of the pilot run (null when integrated exactly)
 * @param gusts one peak summary per gradient length (empty if none)
 * @param worstGust the history of the gust with the largest peak normal acceleration, or null
 * @param turbulence exact and simulated RMS in turbulence, or null (none asked, or unstable)
 * @param limitCycles rate-limit limit cycles predicted on the exact loop (empty if none or no
 *     rate limit)
 * @param limitCycleChecks simulation checks of the predictions, in words
 * @param notes assumptions and warnings in words
 */
public record SimulationResult(SimulationPoint point, SimulationScenario scenario, double closedLoopMaxRealPartPerS,
    TimeHistory pilot, IntegrationDiagnostics pilotDiagnostics, List<GustPeak> gusts, TimeHistory worstGust,
    RandomResponse.Result turbulence, List<RateLimitCycle.Prediction> limitCycles, List<String> limitCycleChecks,
    List<String> notes) {
  /** Copies. */
  public SimulationResult {
    gusts = List.copyOf(gusts);
    limitCycles = List.copyOf(limitCycles);
    limitCycleChecks = List.copyOf(limitCycleChecks);
    notes = List.copyOf(notes);
  }

  /**
   * Peaks of one 1-cosine gust run.
   *
   * @param gradientLengthM H (m)
   * @param peakLoadFactorG largest |normal acceleration| at the first accelerometer (g), NaN if
   *     there is none
   * @param peakElevatorRateRadPerS largest |elevator rate| (rad/s)
   * @param peakElevatorRad largest |elevator| (rad)
   * @param peakPitchRateRadPerS largest |rigid pitch rate| (rad/s)
   * @param timeOfPeakS time of the peak normal acceleration (s)
   */
  public record GustPeak(double gradientLengthM, double peakLoadFactorG, double peakElevatorRateRadPerS,
      double peakElevatorRad, double peakPitchRateRadPerS, double timeOfPeakS) {}
}
