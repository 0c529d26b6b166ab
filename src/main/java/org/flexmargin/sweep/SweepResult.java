package org.flexmargin.sweep;

import java.util.List;
import org.flexmargin.model.AnalysisCase;

/**
 * Open-loop results of a whole case: one result per configuration, plus the path description.
 *
 * @param analysisCase the analysed case (inputs and provenance)
 * @param pathDescription one line describing the sweep
 * @param configurations per-configuration results in case order
 */
public record SweepResult(
    AnalysisCase analysisCase, String pathDescription, List<ConfigurationResult> configurations) {
  /** Copies. */
  public SweepResult {
    configurations = List.copyOf(configurations);
  }
}
