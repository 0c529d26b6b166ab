package org.flexmargin.notch;

import java.util.List;

/**
 * An existing notch set checked over configurations, sweep points and the frequency uncertainty.
 *
 * @param caseName the case
 * @param spec the settings used
 * @param passes true if every structural peak meets the limit and every rigid-body margin the
 *     requirement at every sample
 * @param peaks worst structural peak per mode over all samples
 * @param worstPhaseMarginDeg smallest rigid-body phase margin over all samples (sampled estimate), deg
 * @param worstGainIncreaseMarginDb smallest rigid-body gain-increase margin, dB
 * @param worstGainReductionMarginDb gain-reduction margin nearest 0 dB, dB
 * @param violations requirements missed
 * @param margins rigid-body margins at a few speeds per configuration (nominal frequencies),
 *     recomputed independently ({@link MarginComparison#before()} and {@code after()} are the same
 *     loop here)
 */
public record RobustnessCheckResult(String caseName, NotchDesignSpec spec, boolean passes, List<ModePeak> peaks,
    double worstPhaseMarginDeg, double worstGainIncreaseMarginDb, double worstGainReductionMarginDb,
    List<ConstraintViolation> violations, List<MarginComparison> margins) {
  /** Copies. */
  public RobustnessCheckResult {
    peaks = List.copyOf(peaks);
    violations = List.copyOf(violations);
    margins = List.copyOf(margins);
  }
}
