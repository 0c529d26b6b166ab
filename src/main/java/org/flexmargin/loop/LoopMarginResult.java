package org.flexmargin.loop;

import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Stability margins of a SISO broken loop L(j w) over [omegaMin, omegaMax], negative-feedback
 * convention (closed loop 1/(1 + L)). Crossings outside the analysed range are not known.
 *
 * <p>The classical margins (gain, phase, delay) describe the distance to the critical point -1 at
 * each crossing; they bound the stable gain/phase/delay interval only when the nominal closed
 * loop is stable (see {@link #closedLoopStability()}).
 *
 * @param omegaMinRadPerS low end of the analysed range, rad/s
 * @param omegaMaxRadPerS high end, rad/s
 * @param gainCrossovers every gain crossover found, ascending frequency
 * @param phaseCrossovers every phase crossover found, ascending frequency
 * @param diskMargin symmetric disk margin over the range
 * @param peakGain the largest |L| over the range
 * @param closedLoopStability nominal stability from the state space, when available
 * @param diagnostics grid and search statistics
 */
public record LoopMarginResult(double omegaMinRadPerS, double omegaMaxRadPerS,
    List<GainCrossover> gainCrossovers, List<PhaseCrossover> phaseCrossovers,
    DiskMargin diskMargin, PeakGain peakGain, ClosedLoopStability closedLoopStability,
    MarginDiagnostics diagnostics) {

  /** Copies the lists. */
  public LoopMarginResult {
    gainCrossovers = List.copyOf(gainCrossovers);
    phaseCrossovers = List.copyOf(phaseCrossovers);
  }

  /** @return the gain crossover with the smallest |phase margin|, if any */
  public Optional<GainCrossover> governingPhaseMargin() {
    return gainCrossovers.stream()
        .min(Comparator.comparingDouble(g -> Math.abs(g.phaseMarginDeg())));
  }

  /** @return the phase crossover with the smallest positive gain margin (|L| &lt; 1), if any */
  public Optional<PhaseCrossover> governingGainIncreaseMargin() {
    return phaseCrossovers.stream().filter(p -> p.direction() == MarginDirection.GAIN_INCREASE)
        .min(Comparator.comparingDouble(PhaseCrossover::gainMarginDb));
  }

  /**
   * @return the phase crossover with the gain-reduction margin (|L| &gt; 1, negative dB) closest to
   *     0 dB, if any
   */
  public Optional<PhaseCrossover> governingGainReductionMargin() {
    return phaseCrossovers.stream().filter(p -> p.direction() == MarginDirection.GAIN_REDUCTION)
        .max(Comparator.comparingDouble(PhaseCrossover::gainMarginDb));
  }

  /** @return the gain crossover with the smallest delay margin, if any */
  public Optional<GainCrossover> governingDelayMargin() {
    return gainCrossovers.stream().min(Comparator.comparingDouble(GainCrossover::delayMarginS));
  }

  /** @return the delay margin min over crossovers of (PM in rad)/w_c, s; empty if no crossover */
  public OptionalDouble delayMarginS() {
    return gainCrossovers.stream().mapToDouble(GainCrossover::delayMarginS).min();
  }
}
