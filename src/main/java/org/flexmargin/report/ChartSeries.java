package org.flexmargin.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import org.flexmargin.model.ClearanceRequirements;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Building blocks shared by the loop and clearance charts: a styled chart, line and marker
 * series with unique names, the vertical speed-regime lines and tidy axis limits. Package
 * private; the public names of the series are constants of the chart classes.
 */
final class ChartSeries {
  private ChartSeries() {}

  /** Start of the name of the V0max line series. */
  static final String V0MAX_PREFIX = "V0max";
  /** Start of the name of the V_L line series. */
  static final String VL_PREFIX = "V_L";

  /**
   * @param title chart title
   * @param xTitle x-axis title with unit
   * @param yTitle y-axis title with unit
   * @return an empty chart in the house style
   */
  static XYChart chart(String title, String xTitle, String yTitle) {
    XYChart chart = ReportXYChart.of(new XYChartBuilder()
        .width(ReportStyle.CHART_WIDTH_PX)
        .height(ReportStyle.CHART_HEIGHT_PX)
        .title(title)
        .xAxisTitle(xTitle)
        .yAxisTitle(yTitle));
    ReportStyle.apply(chart);
    return chart;
  }

  /**
   * A chart against time in seconds. Its samples are equally spaced, so XChart puts the time ticks
   * on samples and tries label after label until they fit, writing the same sample's label once
   * per try and again for every layout pass; the labels are therefore written by {@link #timeLabel}
   * (a few hundred nanoseconds each) instead of XChart's general number format, which looks the
   * pattern up afresh for every label, and each time's label is kept once written.
   *
   * @param title chart title
   * @param yTitle y-axis title
   * @return the styled chart with the x axis titled "time (s)"
   */
  static XYChart timeChart(String title, String yTitle) {
    XYChart chart = chart(title, "time (s)", yTitle);
    chart.getStyler().setxAxisTickLabelsFormattingFunction(keptLabels(ChartSeries::timeLabel));
    return chart;
  }

  /**
   * @param label a label function
   * @return the same function, each value's label written once and then kept (for one chart: not
   *     thread-safe, as a chart is drawn by one thread at a time)
   */
  static Function<Double, String> keptLabels(Function<Double, String> label) {
    Map<Double, String> kept = new HashMap<>();
    return v -> kept.computeIfAbsent(v, label);
  }

  /**
   * @param seconds a time (s)
   * @return the time rounded to the microsecond (half away from zero), trailing zeros removed,
   *     plain notation, no sign on zero: "0.17", "3.4", "12"
   */
  static String timeLabel(Double seconds) {
    if (seconds == null || !Double.isFinite(seconds)) {
      return "";
    }
    BigDecimal r = BigDecimal.valueOf(seconds).setScale(TIME_LABEL_DECIMALS, RoundingMode.HALF_UP);
    return r.signum() == 0 ? "0" : r.stripTrailingZeros().toPlainString();
  }

  /** Decimals of a time label (microseconds: finer than any simulation step of a flight-control loop). */
  static final int TIME_LABEL_DECIMALS = 6;

  /** Adds a line series without markers; NaN values are gaps. */
  static XYSeries line(XYChart chart, Set<String> used, String name, double[] x, double[] y, Color color,
      BasicStroke stroke) {
    XYSeries s = chart.addSeries(unique(name, used), x, y);
    s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
    s.setMarker(SeriesMarkers.NONE);
    s.setLineColor(color);
    s.setLineStyle(stroke);
    return s;
  }

  /** Adds a marker-only series. */
  static XYSeries markers(XYChart chart, Set<String> used, String name, double[] x, double[] y, Color color,
      Marker marker) {
    XYSeries s = chart.addSeries(unique(name, used), x, y);
    s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
    s.setMarker(marker);
    s.setMarkerColor(color);
    return s;
  }

  /**
   * Vertical lines at V0max, V_L and the extended speed (factor x V_L) where they lie inside the
   * plotted speed range; a note for each one outside.
   *
   * @param chart chart
   * @param used series names taken
   * @param req requirements table
   * @param unit speed axis unit
   * @param xRange plotted speed range, display unit
   * @param yRange plotted y range
   * @param notes notes to extend
   */
  static void regimeLines(XYChart chart, Set<String> used, ClearanceRequirements req, SpeedAxisUnit unit,
      double[] xRange, double[] yRange, List<String> notes) {
    regimeLines(chart, used, req, unit, xRange, yRange, notes, true);
  }

  /**
   * As {@link #regimeLines(XYChart, Set, ClearanceRequirements, SpeedAxisUnit, double[], double[], List)};
   * without legend entries the lines are named by a short label at their top instead (V0max, V_L,
   * 1.15 V_L), which keeps the legend of busy charts short.
   *
   * @param inLegend whether the lines get legend entries
   */
  static void regimeLines(XYChart chart, Set<String> used, ClearanceRequirements req, SpeedAxisUnit unit,
      double[] xRange, double[] yRange, List<String> notes, boolean inLegend) {
    double[] speeds = {req.maxOperatingSpeedEasMps(), req.limitSpeedEasMps(), req.extendedSpeedEasMps()};
    String[] names = regimeLineNames(req, unit);
    float[][] dash = {{2f, 3f}, {10f, 4f}, {10f, 3f, 2f, 3f}};
    for (int i = 0; i < 3; i++) {
      double x = unit.fromMps(speeds[i]);
      if (x >= xRange[0] && x <= xRange[1]) {
        line(chart, used, names[i], new double[] {x, x}, new double[] {yRange[0], yRange[1]},
            ReportStyle.REGIME_LINE, ReportStyle.referenceStroke(1.4f, dash[i])).setShowInLegend(inLegend);
        if (!inLegend) {
          String label = names[i].substring(0, names[i].indexOf(" = "));
          chart.addAnnotation(new AnnotationText(label, x + 0.012 * (xRange[1] - xRange[0]) + 0.004 * label.length()
              * (xRange[1] - xRange[0]), yRange[1] - 0.035 * (yRange[1] - yRange[0]), false));
        }
      } else {
        notes.add(names[i] + " lies outside the plotted speed range.");
      }
    }
  }

  /**
   * @param req requirements table
   * @param unit display unit
   * @return the names of the V0max, V_L and factor x V_L line series
   */
  static String[] regimeLineNames(ClearanceRequirements req, SpeedAxisUnit unit) {
    return new String[] {
      String.format(Locale.ROOT, "%s = %.1f %s EAS", V0MAX_PREFIX, unit.fromMps(req.maxOperatingSpeedEasMps()),
          unit.symbol()),
      String.format(Locale.ROOT, "%s = %.1f %s EAS", VL_PREFIX, unit.fromMps(req.limitSpeedEasMps()), unit.symbol()),
      String.format(Locale.ROOT, "%.4g %s = %.1f %s EAS", req.extendedSpeedFactor(), VL_PREFIX,
          unit.fromMps(req.extendedSpeedEasMps()), unit.symbol())
    };
  }

  /** @return the name, or the name with " (2)", " (3)"... if taken; records it as taken */
  static String unique(String name, Set<String> used) {
    String n = name;
    for (int i = 2; !used.add(n); i++) {
      n = name + " (" + i + ")";
    }
    return n;
  }

  /**
   * Axis limits around data: padded by 6 % of the span, widened to include {@code include},
   * limited to [floor, ceiling], rounded outwards to a tidy step.
   *
   * @param values data (NaN and infinities ignored)
   * @param include values that must be inside (e.g. requirement values)
   * @param floor lowest allowed limit
   * @param ceiling highest allowed limit
   * @return [low, high]
   */
  static double[] range(List<double[]> values, double[] include, double floor, double ceiling) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (double[] a : values) {
      for (double v : a) {
        if (Double.isFinite(v)) {
          lo = Math.min(lo, v);
          hi = Math.max(hi, v);
        }
      }
    }
    for (double v : include) {
      if (Double.isFinite(v)) {
        lo = Math.min(lo, v);
        hi = Math.max(hi, v);
      }
    }
    if (!Double.isFinite(lo)) {
      lo = 0;
      hi = 1;
    }
    lo = Math.max(lo, floor);
    hi = Math.min(hi, ceiling);
    if (!(hi > lo)) {
      hi = lo + 1;
    }
    double pad = 0.06 * (hi - lo);
    lo = Math.max(lo - pad, floor);
    hi = Math.min(hi + pad, ceiling);
    double step = FlutterCharts.niceStep((hi - lo) / 10);
    return new double[] {Math.floor(lo / step + 1e-9) * step, Math.ceil(hi / step - 1e-9) * step};
  }

  /**
   * Counts values outside [lo, hi] (finite only).
   *
   * @param y values
   * @param lo low limit
   * @param hi high limit
   * @return {below, above}
   */
  static int[] outside(double[] y, double lo, double hi) {
    int below = 0;
    int above = 0;
    for (double v : y) {
      if (Double.isFinite(v)) {
        if (v < lo) {
          below++;
        } else if (v > hi) {
          above++;
        }
      }
    }
    return new int[] {below, above};
  }

  /** @return x converted to the display unit */
  static double[] speeds(double[] easMps, SpeedAxisUnit unit) {
    double[] out = new double[easMps.length];
    for (int i = 0; i < out.length; i++) {
      out[i] = unit.fromMps(easMps[i]);
    }
    return out;
  }

  /** @return a list of one array, for {@link #range} */
  static List<double[]> of(double[]... arrays) {
    return new ArrayList<>(List.of(arrays));
  }
}
