package org.flexmargin.cli;

import picocli.CommandLine.Option;

/** Which files a report writes for its charts (every command that writes a report with charts). */
final class ChartFileOptions {
  @Option(names = "--svg", negatable = true,
      description = "Also write an SVG copy of every chart beside its PNG (large files). Default: PNG only, "
          + "which --no-svg also asks for.")
  boolean svg;
}
