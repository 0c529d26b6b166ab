package org.flexmargin.cli;

import picocli.CommandLine.Option;

/** Options shared by the analysis commands. */
final class CommonOptions {
  @Option(names = "--quiet", description = "No progress or summary on the terminal; errors only.")
  boolean quiet;

  @Option(names = "--debug", description = "Print stack traces of errors.")
  boolean debug;

  @Option(names = "--speed-unit", paramLabel = "UNIT",
      description = "Speed axis of the report's charts: mps or kt (default: ${DEFAULT-VALUE}); tables show both.")
  String speedUnit = "mps";

  @Option(names = "--no-svg", description = "Write the report's charts as PNG only (SVG copies are large).")
  boolean noSvg;

  @Option(names = "--threads", paramLabel = "N",
      description = "Worker threads for configurations (default: available processors).")
  int threads = Runtime.getRuntime().availableProcessors();
}
