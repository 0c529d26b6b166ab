package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flexmargin.model.InvalidInputException;
import org.flexmargin.report.ReportOptions;
import org.flexmargin.report.SpeedAxisUnit;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** The report options of sweep and demo: chart speed unit, SVG copies only when asked. */
class ReportStyleOptionsTest {
  @Command(name = "holder")
  static final class Holder {
    @Mixin ReportStyleOptions style;
  }

  private static ReportOptions parse(String... args) {
    Holder h = new Holder();
    new CommandLine(h).parseArgs(args);
    return h.style.reportOptions();
  }

  @Test
  void pngOnlyAndMetresPerSecondByDefault() {
    ReportOptions o = parse();
    assertFalse(o.vectorCharts());
    assertEquals(SpeedAxisUnit.METRES_PER_SECOND, o.chartSpeedUnit());
  }

  @Test
  void svgWhenAskedAndNoSvgStillAccepted() {
    assertTrue(parse("--svg").vectorCharts());
    assertFalse(parse("--no-svg").vectorCharts());
    // one option with two spellings: giving both is a usage error, as for any repeated option
    assertThrows(CommandLine.OverwrittenOptionException.class, () -> parse("--svg", "--no-svg"));
  }

  @Test
  void speedUnitKnotsOrBadInput() {
    assertEquals(SpeedAxisUnit.KNOTS, parse("--speed-unit", "kt", "--svg").chartSpeedUnit());
    assertThrows(InvalidInputException.class, () -> parse("--speed-unit", "mph"));
  }
}
