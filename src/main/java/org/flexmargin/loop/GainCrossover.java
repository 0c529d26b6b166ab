package org.flexmargin.loop;

/**
 * A gain crossover |L(j w_c)| = 1 of a broken-loop response (negative feedback, closed loop
 * 1/(1 + L)).
 *
 * @param omegaRadPerS w_c, rad/s
 * @param frequencyHz w_c / (2 pi), Hz
 * @param phaseDeg unwrapped phase of L at w_c, deg (branch fixed by the principal value at the
 *     low end of the analysed range)
 * @param phaseMarginDeg 180 + phase, wrapped into (-180, 180], deg
 * @param delayMarginS smallest added delay tau &gt;= 0 that puts L e^{-j w_c tau} on -1:
 *     (phase margin in rad, wrapped into [0, 2 pi)) / w_c, s
 */
public record GainCrossover(double omegaRadPerS, double frequencyHz, double phaseDeg,
    double phaseMarginDeg, double delayMarginS) {
  /** Validates. */
  public GainCrossover {
    StateSpace.require(omegaRadPerS > 0 && Double.isFinite(omegaRadPerS),
        "gain_crossover.omega_rad_per_s", "a finite value > 0", String.valueOf(omegaRadPerS));
    StateSpace.require(Math.abs(frequencyHz * 2 * Math.PI - omegaRadPerS) <= 1e-12 * omegaRadPerS,
        "gain_crossover.frequency_hz", "omega / (2 pi)", String.valueOf(frequencyHz));
    StateSpace.require(phaseMarginDeg > -180 && phaseMarginDeg <= 180,
        "gain_crossover.phase_margin_deg", "a value in (-180, 180]",
        String.valueOf(phaseMarginDeg));
  }
}
