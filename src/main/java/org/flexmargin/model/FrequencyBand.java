package org.flexmargin.model;

/**
 * Frequency band of a margin requirement, by the frequency f of the crossing concerned (Hz)
 * against the fixed low-frequency edge 0.06 Hz and the frequency of the first aeroelastic mode
 * f_1, which comes from the analysis (the lowest elastic mode frequency at the speed concerned).
 * An edge frequency belongs to the higher band; if f_1 &lt;= 0.06 Hz the aeroelastic band takes
 * precedence and the rigid-body band is empty.
 *
 * <p>Worked example: with f_1 = 4.0 Hz, f = 0.05 Hz is {@code LOW_FREQUENCY}; 0.06 Hz and 3.99 Hz
 * are {@code RIGID_BODY}; 4.0 Hz and 12 Hz are {@code AEROELASTIC}.
 */
public enum FrequencyBand {
  /** f &lt; 0.06 Hz (and f &lt; f_1). */
  LOW_FREQUENCY,
  /** 0.06 Hz &lt;= f &lt; f_1. */
  RIGID_BODY,
  /** f &gt;= f_1, the first aeroelastic mode frequency. */
  AEROELASTIC;

  /** Upper edge of {@link #LOW_FREQUENCY}, Hz (MIL-F-9490D table as recalled, references 1.1). */
  public static final double LOW_FREQUENCY_EDGE_HZ = 0.06;

  /** @return the lower_snake_case name used in input and result files */
  public String key() {
    return name().toLowerCase(java.util.Locale.ROOT);
  }
}
