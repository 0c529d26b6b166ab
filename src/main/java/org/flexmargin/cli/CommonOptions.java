package org.flexmargin.cli;

import picocli.CommandLine.Option;

/** Terminal options shared by every analysis command (each honours both). */
final class CommonOptions {
  @Option(names = "--quiet", description = "No progress or summary on the terminal; errors only.")
  boolean quiet;

  @Option(names = "--debug", description = "Print stack traces of errors.")
  boolean debug;
}
