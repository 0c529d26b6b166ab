package org.flexmargin.sweep;

/**
 * Receives progress of a case sweep, stage by stage (called from worker threads; implementations
 * must be thread-safe). Stages of a configuration: divergence and flutter, then with a loop the
 * loop margins and the closed loop, then with requirements the clearance.
 */
@FunctionalInterface
public interface SweepProgress {
  /**
   * @param configuration configuration name
   * @param stage the stage just completed, in words
   */
  void stageDone(String configuration, String stage);

  /** Ignores progress. */
  SweepProgress NONE = (c, s) -> { };

  /** @return number of stages a configuration of this case goes through */
  static int stagesPerConfiguration(org.flexmargin.model.AnalysisCase analysisCase) {
    return 1 + (analysisCase.loop() != null ? 2 : 0) + (analysisCase.requirements() != null ? 1 : 0);
  }
}
