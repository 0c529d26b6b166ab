package org.flexmargin.notch;

/**
 * The loop with one candidate notch set at every sample. Arrays are indexed [sample] or [sample]
 * [mode] (mode order of {@link LoopSamples#modeNames()}); values are copied out.
 *
 * @param peakDb structural peak max |L| over each mode's band, dB (NaN where a sample lacks the mode)
 * @param peakHz frequency of that peak, Hz
 * @param phaseLossDeg -arg(prod N(j w_c)) at the worst rigid-body crossover w_c of the loop without
 *     the designed notches, deg, positive = lag (0 where there is no rigid crossover)
 * @param phaseLossCrossoverHz the crossover of that worst loss, Hz (NaN if none)
 * @param phaseMarginDeg smallest rigid-body phase margin with the notches, deg (+infinity if no
 *     rigid gain crossover)
 * @param gainIncreaseMarginDb smallest rigid-body gain-increase margin, dB (+infinity if none)
 * @param gainReductionMarginDb gain-reduction margin closest to 0 dB (negative), dB (-infinity if
 *     none)
 */
public record SampleEvaluation(double[][] peakDb, double[][] peakHz, double[] phaseLossDeg,
    double[] phaseLossCrossoverHz, double[] phaseMarginDeg, double[] gainIncreaseMarginDb,
    double[] gainReductionMarginDb) {
  /** Copies. */
  public SampleEvaluation {
    peakDb = deep(peakDb);
    peakHz = deep(peakHz);
    phaseLossDeg = phaseLossDeg.clone();
    phaseLossCrossoverHz = phaseLossCrossoverHz.clone();
    phaseMarginDeg = phaseMarginDeg.clone();
    gainIncreaseMarginDb = gainIncreaseMarginDb.clone();
    gainReductionMarginDb = gainReductionMarginDb.clone();
  }

  private static double[][] deep(double[][] a) {
    double[][] out = new double[a.length][];
    for (int i = 0; i < a.length; i++) {
      out[i] = a[i].clone();
    }
    return out;
  }

  @Override
  public double[][] peakDb() {
    return deep(peakDb);
  }

  @Override
  public double[][] peakHz() {
    return deep(peakHz);
  }

  @Override
  public double[] phaseLossDeg() {
    return phaseLossDeg.clone();
  }

  @Override
  public double[] phaseLossCrossoverHz() {
    return phaseLossCrossoverHz.clone();
  }

  @Override
  public double[] phaseMarginDeg() {
    return phaseMarginDeg.clone();
  }

  @Override
  public double[] gainIncreaseMarginDb() {
    return gainIncreaseMarginDb.clone();
  }

  @Override
  public double[] gainReductionMarginDb() {
    return gainReductionMarginDb.clone();
  }

  /** @return the largest phase loss over samples, deg */
  public double worstPhaseLossDeg() {
    double w = 0;
    for (double v : phaseLossDeg) {
      w = Math.max(w, v);
    }
    return w;
  }
}
