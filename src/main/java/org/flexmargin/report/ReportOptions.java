package org.flexmargin.report;

/**
 * How the human-readable report is drawn.
 *
 * @param chartSpeedUnit unit of the airspeed axis of the charts (data stay in m/s)
 * @param vectorCharts whether to write an SVG copy of every chart beside the PNG
 */
public record ReportOptions(SpeedAxisUnit chartSpeedUnit, boolean vectorCharts) {
  /** Validates. */
  public ReportOptions {
    if (chartSpeedUnit == null) {
      throw new IllegalArgumentException("chart speed unit is required");
    }
  }

  /** @return EAS axis in m/s, SVG copies written */
  public static ReportOptions defaults() {
    return new ReportOptions(SpeedAxisUnit.METRES_PER_SECOND, true);
  }
}
