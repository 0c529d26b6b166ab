package org.flexmargin.model;

import java.util.List;

/**
 * A loop given on its own (the input of {@code flexmargin margins}): the broken loop L in one of
 * the forms of {@link OpenLoopData}, the delay and sample-and-hold in series with it, the
 * frequency range of the analysis, the structural modes whose peaks are checked, and an optional
 * requirements table with the airspeed that picks its regime.
 *
 * <p>Example: a pitch loop measured on the ground ({@code speedEasMps} 0, so the normal-envelope
 * margins apply), with a 6 ms computation delay already in the measurement ({@code delayS} 0) and
 * its structural modes at 7.5 and 18.5 Hz.
 *
 * @param name name for the output folder (letters, digits, '.', '_', '-')
 * @param description free text (may be empty)
 * @param loop the broken loop L, negative-feedback convention
 * @param delayS pure delay in series with L, s (&gt;= 0)
 * @param samplePeriodS sample period of a zero-order hold in series with L, s (&gt;= 0; 0: none)
 * @param minFrequencyHz low end of the analysis, Hz (&gt; 0)
 * @param maxFrequencyHz high end of the analysis, Hz (&gt; low end)
 * @param modes structural modes whose peaks are checked (may be empty)
 * @param firstAeroelasticFrequencyHz edge between the rigid-body and aeroelastic bands, Hz (&gt; 0),
 *     or NaN to take the lowest of {@code modes}
 * @param speedEasMps equivalent airspeed of the loop, picks the requirements' regime, m/s (&gt;= 0)
 * @param requirements the requirements table, or null for margins without a verdict
 * @param inputs provenance of every file read, the loop file first
 * @param warnings input warnings (values outside their usual range)
 */
public record LoopFile(String name, String description, OpenLoopData loop, double delayS, double samplePeriodS,
    double minFrequencyHz, double maxFrequencyHz, List<Mode> modes, double firstAeroelasticFrequencyHz,
    double speedEasMps, ClearanceRequirements requirements, List<InputFile> inputs, List<InputWarning> warnings) {

  /**
   * A structural mode of the loop.
   *
   * @param name mode name (non-blank)
   * @param frequencyHz frequency, Hz (&gt; 0)
   */
  public record Mode(String name, double frequencyHz) {
    /** Validates. */
    public Mode {
      Checks.name("name", name);
      Checks.positive("frequency_hz", frequencyHz);
    }
  }

  /** Validates and copies. */
  public LoopFile {
    Checks.name("name", name);
    description = description == null ? "" : description;
    if (loop == null) {
      throw new InvalidInputException("loop", "one of transfer_function, zeros_poles_gain, state_space, "
          + "measured_response", "nothing");
    }
    Checks.nonNegative("delay_s", delayS);
    Checks.nonNegative("sample_period_s", samplePeriodS);
    Checks.positive("frequency_range_hz[0]", minFrequencyHz);
    Checks.positive("frequency_range_hz[1]", maxFrequencyHz);
    if (!(maxFrequencyHz > minFrequencyHz)) {
      throw new InvalidInputException("frequency_range_hz", "a range [low, high] with high > low",
          "[" + minFrequencyHz + ", " + maxFrequencyHz + "]");
    }
    modes = modes == null ? List.of() : List.copyOf(modes);
    if (!Double.isNaN(firstAeroelasticFrequencyHz)) {
      Checks.positive("first_aeroelastic_frequency_hz", firstAeroelasticFrequencyHz);
    }
    Checks.nonNegative("speed_eas_mps", speedEasMps);
    if (requirements != null && Double.isNaN(firstAeroelasticFrequencyHz) && modes.isEmpty()) {
      throw new InvalidInputException("first_aeroelastic_frequency_hz",
          "the band edge of the requirements (this key, or structural_modes whose lowest gives it)", "neither");
    }
    inputs = inputs == null ? List.of() : List.copyOf(inputs);
    warnings = warnings == null ? List.of() : List.copyOf(warnings);
  }

  /** @return the rigid-body / aeroelastic band edge, Hz: the given one, else the lowest mode, else NaN */
  public double bandEdgeHz() {
    if (!Double.isNaN(firstAeroelasticFrequencyHz)) {
      return firstAeroelasticFrequencyHz;
    }
    return modes.stream().mapToDouble(Mode::frequencyHz).min().orElse(Double.NaN);
  }
}
