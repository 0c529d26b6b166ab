package org.flexmargin.sweep;

import java.util.List;

/**
 * What one notch filter of the loop delivers at one sweep point: its attenuation at each
 * structural mode's current frequency and the phase it costs at the rigid-body gain crossover.
 *
 * @param path index of the feedback path carrying the notch
 * @param sensor the path's sensor
 * @param centreHz notch centre (Hz)
 * @param depthDb depth at the centre (dB, negative)
 * @param modes attenuation at each mode's current (p-k) frequency
 * @param crossoverHz rigid-body gain crossover frequency (Hz); NaN when the loop has none
 * @param phaseLossDeg phase lag of the notch at that crossover (deg, positive = lag); NaN without
 *     crossover
 */
public record NotchCheck(
    int path, String sensor, double centreHz, double depthDb, List<ModeAttenuation> modes,
    double crossoverHz, double phaseLossDeg) {
  /** Copies. */
  public NotchCheck {
    modes = List.copyOf(modes);
  }

  /**
   * @param mode mode name
   * @param frequencyHz the mode's current frequency (Hz)
   * @param attenuationDb notch gain there (dB; negative = attenuation)
   */
  public record ModeAttenuation(String mode, double frequencyHz, double attenuationDb) {}
}
