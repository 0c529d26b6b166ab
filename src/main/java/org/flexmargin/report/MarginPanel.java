package org.flexmargin.report;

import java.awt.Font;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.MarginCell;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.SweepResult;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.style.Styler;

/**
 * The small margin-against-airspeed panel of the first screen: three charts side by side, every
 * configuration with a loop on each, so that a reviewer sees at once how the margins run with
 * airspeed: the smallest rigid-body gain margin (either direction, dB), the smallest rigid-body
 * phase margin (deg) and the highest structural peak loop gain over all modes (dB), each with its
 * requirement as a step line by speed regime and thin vertical lines at V0max and V_L. The full
 * charts, by band and by mode, are in the loop sections.
 */
public final class MarginPanel {
  private MarginPanel() {}

  /** Width of one panel chart, px (three fit the report column). */
  public static final int WIDTH_PX = 368;
  /** Height of one panel chart, px. */
  public static final int HEIGHT_PX = 250;
  /** Name of the requirement step series on every panel chart. */
  public static final String REQUIRED_SERIES = "required";

  /**
   * @param result the sweep
   * @param unit speed unit of the axis
   * @return the gain, phase and structural-peak panels; empty when no configuration has a loop
   */
  public static List<ReportChart> of(SweepResult result, SpeedAxisUnit unit) {
    List<MarginCharts.Data> data = new ArrayList<>();
    for (ConfigurationResult c : result.configurations()) {
      if (c.servo() != null && !c.servo().points().isEmpty()) {
        data.add(new MarginCharts.Data(result, c));
      }
    }
    if (data.isEmpty()) {
      return List.of();
    }
    List<double[]> gain = new ArrayList<>();
    List<double[]> phase = new ArrayList<>();
    List<double[]> peak = new ArrayList<>();
    for (MarginCharts.Data d : data) {
      double[] up = d.gain(true, FrequencyBand.RIGID_BODY);
      double[] down = d.gain(false, FrequencyBand.RIGID_BODY);
      double[] g = new double[up.length];
      for (int i = 0; i < g.length; i++) {
        g[i] = leastMagnitude(up[i], down[i]);
      }
      gain.add(g);
      phase.add(d.overCrossovers(FrequencyBand.RIGID_BODY, x -> Math.abs(x.phaseMarginDeg())));
      peak.add(highestPeak(d));
    }
    ClearanceRequirements req = result.analysisCase().requirements();
    List<ReportChart> out = new ArrayList<>();
    out.add(panel(result, data, gain, unit, "rigid-body gain margin (dB)", "panel-gain",
        req == null ? null : MarginCell::gainMarginDb, 0, MarginCharts.GAIN_AXIS_LIMIT_DB));
    out.add(panel(result, data, phase, unit, "rigid-body phase margin (deg)", "panel-phase",
        req == null ? null : MarginCell::phaseMarginDeg, 0, 180));
    out.add(panel(result, data, peak, unit, "highest structural peak |L| (dB)", "panel-structural",
        req == null ? null : cell -> req.structuralPeakLimitDb(), MarginCharts.PEAK_AXIS_FLOOR_DB, 40));
    return out;
  }

  /** @return the value of smaller magnitude (NaN ignored), as a magnitude */
  static double leastMagnitude(double a, double b) {
    if (Double.isNaN(a)) {
      return Math.abs(b);
    }
    if (Double.isNaN(b)) {
      return Math.abs(a);
    }
    return Math.min(Math.abs(a), Math.abs(b));
  }

  /** Highest structural peak over all modes at each point (clearance), else the overall loop peak. */
  private static double[] highestPeak(MarginCharts.Data d) {
    double[] out = MarginCharts.nan(d.eas.length);
    if (d.c.clearance() != null && !d.c.clearance().points().isEmpty()) {
      List<PointAssessment> pts = d.c.clearance().points();
      for (int i = 0; i < Math.min(pts.size(), out.length); i++) {
        for (StructuralModeAssessment s : pts.get(i).structuralModes()) {
          out[i] = Double.isNaN(out[i]) ? s.peakDb() : Math.max(out[i], s.peakDb());
        }
      }
    } else {
      for (int i = 0; i < out.length; i++) {
        out[i] = d.points.get(i).margins().peakGain().magnitudeDb();
      }
    }
    return out;
  }

  private static ReportChart panel(SweepResult result, List<MarginCharts.Data> data, List<double[]> values,
      SpeedAxisUnit unit, String title, String stem, java.util.function.ToDoubleFunction<MarginCell> required,
      double floor, double ceiling) {
    XYChart chart = ReportXYChart.of(new XYChartBuilder().width(WIDTH_PX).height(HEIGHT_PX).title(title)
        .xAxisTitle("EAS (" + unit.symbol() + ")").yAxisTitle(""));
    ReportStyle.apply(chart);
    chart.getStyler().setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 13));
    chart.getStyler().setAxisTitleFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
    chart.getStyler().setAxisTickLabelsFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
    chart.getStyler().setLegendFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
    chart.getStyler().setLegendPosition(Styler.LegendPosition.OutsideS);
    chart.getStyler().setLegendLayout(Styler.LegendLayout.Horizontal);
    chart.getStyler().setLegendPadding(4);
    chart.getStyler().setLegendSeriesLineLength(18);
    chart.getStyler().setChartPadding(6);
    chart.getStyler().setXAxisDecimalPattern("0");
    chart.getStyler().setYAxisDecimalPattern("0");
    double[] xr = MarginCharts.xRange(data.get(0), unit);
    ClearanceRequirements req = result.analysisCase().requirements();
    List<double[]> all = new ArrayList<>(values);
    double[][] steps = null;
    if (required != null && req != null) {
      double[] eas = FlutterCharts.easRange(result);
      steps = MarginCharts.requirementSteps(req, stem.equals("panel-structural") ? null : FrequencyBand.RIGID_BODY,
          eas[0], eas[1], unit, required);
      all.add(steps[1]);
    }
    double[] yr = ChartSeries.range(all, new double[] {floor < 0 ? 0 : floor}, floor, ceiling);
    chart.getStyler().setXAxisMin(xr[0]).setXAxisMax(xr[1]).setYAxisMin(yr[0]).setYAxisMax(yr[1]);
    Set<String> used = new HashSet<>();
    List<String> notes = new ArrayList<>();
    for (int k = 0; k < data.size(); k++) {
      double[] y = values.get(k);
      int[] o = ChartSeries.outside(y, yr[0], yr[1]);
      if (o[0] + o[1] > 0) {
        notes.add(data.get(k).c.configuration() + ": " + (o[0] + o[1]) + " points of " + title + " off the plot.");
      }
      ChartSeries.line(chart, used, data.get(k).c.configuration(), ChartSeries.speeds(data.get(k).eas, unit),
          MarginCharts.hasData(y) ? y : MarginCharts.nan(y.length), ReportStyle.seriesColor(k),
          ReportStyle.seriesStroke(0));
    }
    if (steps != null && steps[0].length > 0) {
      ChartSeries.line(chart, used, REQUIRED_SERIES, steps[0], steps[1], ReportStyle.REQUIREMENT,
          ReportStyle.referenceStroke(2.2f, new float[] {2f, 3f}));
    }
    if (req != null) {
      double[] at = {req.maxOperatingSpeedEasMps(), req.limitSpeedEasMps()};
      for (double v : at) {
        double x = unit.fromMps(v);
        if (x >= xr[0] && x <= xr[1]) {
          ChartSeries.line(chart, used, "regime " + x, new double[] {x, x}, new double[] {yr[0], yr[1]},
              ReportStyle.REGIME_LINE, ReportStyle.referenceStroke(1f, new float[] {2f, 3f})).setShowInLegend(false);
        }
      }
    }
    return new ReportChart(stem, title, chart, notes);
  }
}
