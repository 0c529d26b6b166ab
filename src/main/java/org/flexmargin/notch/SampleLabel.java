package org.flexmargin.notch;

/**
 * Where a loop sample was taken.
 *
 * @param configuration configuration name (or a label of a constructed loop)
 * @param gridPoint sweep grid point index (0 for a constructed loop)
 * @param speedEasMps equivalent airspeed, m/s (NaN for a constructed loop)
 * @param altitudeM altitude, m (NaN for a constructed loop)
 * @param shiftFactor factor applied to every elastic mode frequency (1 = nominal)
 */
public record SampleLabel(String configuration, int gridPoint, double speedEasMps, double altitudeM,
    double shiftFactor) {
  /** Validates. */
  public SampleLabel {
    if (configuration == null || configuration.isBlank()) {
      throw new org.flexmargin.model.InvalidInputException("sample.configuration", "a name", "nothing");
    }
    if (!(shiftFactor > 0)) {
      throw new org.flexmargin.model.InvalidInputException("sample.shift_factor", "a factor > 0",
          String.valueOf(shiftFactor));
    }
  }
}
