package org.flexmargin.notch;

import java.util.List;
import org.flexmargin.sweep.ClearanceResult;

/**
 * The case's own filters judged against its requirements table by the same code as {@code sweep}
 * (frequency bands, speed regimes, modal-frequency uncertainty band, gain- or phase-stabilisation
 * rule, severity ranking), so that both commands give the same verdict on every mode and band.
 *
 * @param caseName the case
 * @param spec the settings used (peak limit and frequency uncertainty applied to the table)
 * @param passes true if every configuration meets every requirement
 * @param configurations one verdict per configuration, in case order
 * @param requirementsSource where the requirement values come from
 */
public record RobustnessCheckResult(String caseName, NotchDesignSpec spec, boolean passes,
    List<ConfigurationVerdict> configurations, String requirementsSource) {
  /** Copies. */
  public RobustnessCheckResult {
    configurations = List.copyOf(configurations);
  }

  /**
   * One configuration's verdict.
   *
   * @param configuration configuration name
   * @param clearance the clearance result, exactly as {@code sweep} computes it
   */
  public record ConfigurationVerdict(String configuration, ClearanceResult clearance) {}
}
