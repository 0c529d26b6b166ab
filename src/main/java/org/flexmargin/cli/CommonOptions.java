package org.flexmargin.cli;

import picocli.CommandLine.Option;

/** Options shared by the analysis commands. */
final class CommonOptions {
  @Option(names = "--quiet", description = "No progress or summary on the terminal; errors only.")
  boolean quiet;

  @Option(names = "--debug", description = "Print stack traces of errors.")
  boolean debug;

  @Option(names = "--threads", paramLabel = "N",
      description = "Worker threads for configurations (default: available processors).")
  int threads = Runtime.getRuntime().availableProcessors();
}
