package org.flexmargin.clearance;

import java.util.Optional;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.SpeedRegime;

/**
 * Finds the band, the regime and the required margins for a crossing.
 *
 * <p>Edges: a frequency on a band edge belongs to the higher band (0.06 Hz is rigid-body, the
 * first aeroelastic mode frequency itself is aeroelastic); a speed on a regime edge belongs to the
 * lower regime (V0max is normal envelope, V_L is up-to-limit-speed, factor x V_L is
 * up-to-1.15-limit-speed). If the first aeroelastic frequency is at or below 0.06 Hz, every
 * frequency at or above it is aeroelastic and the rigid-body band is empty.
 */
public final class RequirementLookup {
  private RequirementLookup() {}

  /**
   * @param frequencyHz crossing frequency, Hz (finite, &gt;= 0)
   * @param firstAeroelasticFrequencyHz lowest elastic mode frequency at the speed concerned, Hz
   *     (&gt; 0)
   * @return the band of the crossing
   */
  public static FrequencyBand band(double frequencyHz, double firstAeroelasticFrequencyHz) {
    if (!(frequencyHz >= 0) || !Double.isFinite(frequencyHz)) {
      throw new InvalidInputException("frequency_hz", "a finite value >= 0",
          String.valueOf(frequencyHz));
    }
    if (!(firstAeroelasticFrequencyHz > 0) || !Double.isFinite(firstAeroelasticFrequencyHz)) {
      throw new InvalidInputException("first_aeroelastic_frequency_hz", "a finite value > 0",
          String.valueOf(firstAeroelasticFrequencyHz));
    }
    if (frequencyHz >= firstAeroelasticFrequencyHz) {
      return FrequencyBand.AEROELASTIC;
    }
    return frequencyHz < FrequencyBand.LOW_FREQUENCY_EDGE_HZ ? FrequencyBand.LOW_FREQUENCY
        : FrequencyBand.RIGID_BODY;
  }

  /**
   * @param requirements the table (speeds V0max, V_L and the extended factor)
   * @param speedEasMps equivalent airspeed, m/s (finite, &gt;= 0)
   * @return the regime of that speed
   */
  public static SpeedRegime regime(ClearanceRequirements requirements, double speedEasMps) {
    if (!(speedEasMps >= 0) || !Double.isFinite(speedEasMps)) {
      throw new InvalidInputException("speed_eas_mps", "a finite value >= 0",
          String.valueOf(speedEasMps));
    }
    if (speedEasMps <= requirements.maxOperatingSpeedEasMps()) {
      return SpeedRegime.NORMAL_ENVELOPE;
    }
    if (speedEasMps <= requirements.limitSpeedEasMps()) {
      return SpeedRegime.UP_TO_LIMIT_SPEED;
    }
    if (speedEasMps <= requirements.extendedSpeedEasMps()) {
      return SpeedRegime.UP_TO_115_LIMIT_SPEED;
    }
    return SpeedRegime.BEYOND;
  }

  /**
   * @param requirements the table
   * @param frequencyHz crossing frequency, Hz
   * @param firstAeroelasticFrequencyHz lowest elastic mode frequency, Hz
   * @param speedEasMps equivalent airspeed, m/s
   * @return the required gain margin (dB) and phase margin (deg), or empty beyond factor x V_L
   *     where no margin is required
   */
  public static Optional<MarginCell> required(ClearanceRequirements requirements,
      double frequencyHz, double firstAeroelasticFrequencyHz, double speedEasMps) {
    FrequencyBand b = band(frequencyHz, firstAeroelasticFrequencyHz);
    SpeedRegime r = regime(requirements, speedEasMps);
    return r == SpeedRegime.BEYOND ? Optional.empty() : Optional.of(requirements.cell(b, r));
  }
}
