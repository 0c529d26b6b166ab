package org.flexmargin.loop;

/**
 * A phase crossover, arg L(j w_p) = -180 deg (mod 360), of a broken-loop response (negative
 * feedback).
 *
 * @param omegaRadPerS w_p, rad/s
 * @param frequencyHz w_p / (2 pi), Hz
 * @param magnitude |L(j w_p)|
 * @param gainMarginDb -20 log10 |L(j w_p)|, dB: positive = allowed gain increase, negative =
 *     allowed gain reduction
 * @param direction which way the gain must move to reach -1
 */
public record PhaseCrossover(double omegaRadPerS, double frequencyHz, double magnitude,
    double gainMarginDb, MarginDirection direction) {
  /** Validates. */
  public PhaseCrossover {
    StateSpace.require(omegaRadPerS > 0 && Double.isFinite(omegaRadPerS),
        "phase_crossover.omega_rad_per_s", "a finite value > 0", String.valueOf(omegaRadPerS));
    StateSpace.require(Math.abs(frequencyHz * 2 * Math.PI - omegaRadPerS) <= 1e-12 * omegaRadPerS,
        "phase_crossover.frequency_hz", "omega / (2 pi)", String.valueOf(frequencyHz));
    StateSpace.require(direction != null, "phase_crossover.direction", "a direction", "null");
  }
}
