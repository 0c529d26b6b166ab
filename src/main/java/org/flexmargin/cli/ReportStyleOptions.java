package org.flexmargin.cli;

import org.flexmargin.model.InvalidInputException;
import org.flexmargin.report.ReportOptions;
import org.flexmargin.report.SpeedAxisUnit;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Options of the HTML report and its charts (commands that write one: sweep, demo). */
final class ReportStyleOptions {
  @Option(names = "--speed-unit", paramLabel = "UNIT",
      description = "Speed axis of the report's charts: mps or kt (default: ${DEFAULT-VALUE}); tables show both.")
  String speedUnit = "mps";

  @Mixin ChartFileOptions chartFiles = new ChartFileOptions();

  /** @return the report options; bad input (exit 2) for an unknown unit */
  ReportOptions reportOptions() {
    SpeedAxisUnit unit = switch (speedUnit) {
      case "mps" -> SpeedAxisUnit.METRES_PER_SECOND;
      case "kt" -> SpeedAxisUnit.KNOTS;
      default -> throw new InvalidInputException("--speed-unit", "mps or kt", "\"" + speedUnit + "\"");
    };
    return new ReportOptions(unit, chartFiles.svg);
  }
}
