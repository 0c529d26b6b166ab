package org.flexmargin.cli;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** How much work a sweep may do and on how many threads (commands that sweep: sweep, demo). */
final class WorkOptions {
  @Spec(Spec.Target.MIXEE) CommandSpec spec;

  int threads = Runtime.getRuntime().availableProcessors();

  @Option(names = "--force",
      description = "Run even when the estimated cost is above the limit (" + CostEstimate.LIMIT_TEXT + ").")
  boolean force;

  /**
   * @param n worker threads for configurations; at least 1 (bad input, exit 2, otherwise)
   */
  @Option(names = "--threads", paramLabel = "N",
      description = "Worker threads for configurations, at least 1 (default: available processors).")
  void setThreads(int n) {
    if (n < 1) {
      throw new ParameterException(spec.commandLine(),
          "--threads: expected a whole number of threads >= 1, found " + n);
    }
    threads = n;
  }
}
