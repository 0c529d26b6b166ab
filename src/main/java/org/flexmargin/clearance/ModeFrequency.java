package org.flexmargin.clearance;

import org.flexmargin.model.Checks;

/**
 * A structural mode at the speed concerned: its name and its current (coupled) frequency.
 *
 * @param name mode name (non-blank)
 * @param frequencyHz current frequency, Hz (&gt; 0)
 */
public record ModeFrequency(String name, double frequencyHz) {
  /** Validates. */
  public ModeFrequency {
    Checks.name("name", name);
    Checks.positive("frequency_hz", frequencyHz);
  }
}
