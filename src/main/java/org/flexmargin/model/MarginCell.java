package org.flexmargin.model;

/**
 * One cell of the margin requirements table: the gain and phase margins required of a loop
 * crossing in one frequency band at one speed regime. Both margins are required in both
 * directions ("+-"): a gain increase and a gain reduction of {@code gainMarginDb}, a phase lead
 * and a phase lag of {@code phaseMarginDeg}. 0 dB and 0 deg mean "stable at nominal gain and
 * phase".
 *
 * @param band frequency band of the crossing
 * @param regime speed regime; never {@link SpeedRegime#BEYOND} (no requirement there)
 * @param gainMarginDb required gain margin, dB (finite, &gt;= 0)
 * @param phaseMarginDeg required phase margin, deg (in [0, 180))
 */
public record MarginCell(FrequencyBand band, SpeedRegime regime, double gainMarginDb,
    double phaseMarginDeg) {
  /** Validates. */
  public MarginCell {
    if (band == null) {
      throw new InvalidInputException("band", "a frequency band", "nothing");
    }
    if (regime == null || regime == SpeedRegime.BEYOND) {
      throw new InvalidInputException("regime",
          "normal_envelope, up_to_limit_speed or up_to_115_limit_speed",
          regime == null ? "nothing" : regime.key());
    }
    Checks.nonNegative("gain_margin_db", gainMarginDb);
    if (!(phaseMarginDeg >= 0 && phaseMarginDeg < 180)) {
      throw new InvalidInputException("phase_margin_deg", "a value in [0, 180)",
          String.valueOf(phaseMarginDeg));
    }
  }
}
