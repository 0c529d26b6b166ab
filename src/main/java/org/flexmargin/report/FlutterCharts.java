package org.flexmargin.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Findings;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.SweepResult;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The V-g and V-f diagrams of one configuration: damping g (V-g convention, negative = stable)
 * and frequency of every tracked root against equivalent airspeed, one line per mode, with the
 * refined damping crossings marked, the g = 0 and damping-limit lines and the divergence speed.
 *
 * <p>Points where a root did not converge, and non-oscillating roots (g infinite), are left as
 * gaps. The g axis is limited to a band around the stability boundary ({@link #G_AXIS_FLOOR} to
 * {@link #G_AXIS_CEILING} at most) so that heavily damped or aperiodic roots do not squash the
 * region that matters; every such limitation is stated in the chart's notes.
 *
 * <p>Series names: each mode's name; the crossing markers {@link Findings#label(CrossingKind)};
 * the reference lines {@link #ZERO_LINE_SERIES}, {@link #limitLineSeries(double)} and a name
 * starting with {@link #DIVERGENCE_SERIES_PREFIX}.
 */
public final class FlutterCharts {
  private FlutterCharts() {}

  /** Lowest g the V-g axis may show (dimensionless); lower values run off the plot. */
  public static final double G_AXIS_FLOOR = -0.6;
  /** Highest g the V-g axis may show (dimensionless). */
  public static final double G_AXIS_CEILING = 0.6;
  /** Name of the g = 0 line series. */
  public static final String ZERO_LINE_SERIES = "g = 0 (stability boundary)";
  /** Start of the name of the divergence-speed line series. */
  public static final String DIVERGENCE_SERIES_PREFIX = "divergence";

  /**
   * @param dampingLimitG damping limit g (positive number)
   * @return name of the damping-limit line series
   */
  public static String limitLineSeries(double dampingLimitG) {
    return String.format(Locale.ROOT, "g = %.3f (damping limit)", -dampingLimitG);
  }

  /**
   * @param kind crossing kind
   * @return name of the marker series of that kind (the findings table's words)
   */
  public static String markerSeries(CrossingKind kind) {
    return Findings.label(kind);
  }

  /**
   * @param result the sweep (options, path)
   * @param c one configuration of it
   * @param unit unit of the airspeed axis
   * @return the V-g chart then the V-f chart
   */
  public static List<ReportChart> of(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit) {
    return List.of(dampingChart(result, c, unit), frequencyChart(result, c, unit));
  }

  /**
   * @param result the sweep (options, path)
   * @param c one configuration of it
   * @param unit unit of the airspeed axis
   * @return the V-g diagram (damping g against EAS)
   */
  public static ReportChart dampingChart(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit) {
    return build(result, c, unit, true);
  }

  /**
   * @param result the sweep (options, path)
   * @param c one configuration of it
   * @param unit unit of the airspeed axis
   * @return the V-f diagram (frequency against EAS)
   */
  public static ReportChart frequencyChart(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit) {
    return build(result, c, unit, false);
  }

  private static ReportChart build(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit, boolean damping) {
    FlutterSolution s = c.flutter();
    double limitG = result.analysisCase().options().dampingLimitG();
    String method = methodWords(s.method());
    double[] easRangeMps = easRange(result);
    double xMin = unit.fromMps(easRangeMps[0]);
    double xMax = unit.fromMps(easRangeMps[1]);
    List<String> notes = new ArrayList<>();

    double[] yRange = damping
        ? dampingRange(s, easRangeMps, limitG)
        : frequencyRange(s, easRangeMps);

    String what = damping ? "damping (V-g)" : "frequency (V-f)";
    XYChart chart = ReportXYChart.of(new XYChartBuilder()
        .width(ReportStyle.CHART_WIDTH_PX)
        .height(ReportStyle.CHART_HEIGHT_PX)
        .title(c.configuration() + ": " + what + ", " + method)
        .xAxisTitle(unit.axisTitle())
        .yAxisTitle(damping ? "damping g (V-g convention, negative = stable)" : "frequency (Hz)"));
    ReportStyle.apply(chart);
    chart.getStyler().setXAxisMin(xMin).setXAxisMax(xMax);
    chart.getStyler().setYAxisMin(yRange[0]).setYAxisMax(yRange[1]);
    chart.getStyler().setYAxisDecimalPattern(damping ? "0.0#" : "0.#");
    chart.getStyler().setXAxisDecimalPattern("0.#");

    Set<String> used = new HashSet<>();
    Map<String, Integer> unconverged = new LinkedHashMap<>();
    Map<String, Integer> aperiodic = new LinkedHashMap<>();
    Map<String, Integer> below = new LinkedHashMap<>();
    Map<String, Integer> above = new LinkedHashMap<>();
    List<BranchCurve> branches = s.branches();
    for (int m = 0; m < branches.size(); m++) {
      BranchCurve b = branches.get(m);
      double[] eas = b.speedEasMps();
      double[] g = b.dampingG();
      double[] f = b.frequencyHz();
      boolean[] ok = b.converged();
      double[] x = new double[b.size()];
      double[] y = new double[b.size()];
      for (int i = 0; i < b.size(); i++) {
        x[i] = unit.fromMps(eas[i]);
        double v = damping ? g[i] : f[i];
        boolean inX = eas[i] >= easRangeMps[0] && eas[i] <= easRangeMps[1];
        if (!ok[i]) {
          y[i] = Double.NaN;
          count(unconverged, b.name(), inX);
        } else if (damping && !Double.isFinite(g[i])) {
          y[i] = Double.NaN;
          count(aperiodic, b.name(), inX);
        } else if (!Double.isFinite(v)) {
          y[i] = Double.NaN;
          count(unconverged, b.name(), inX);
        } else {
          y[i] = v;
          count(below, b.name(), inX && v < yRange[0]);
          count(above, b.name(), inX && v > yRange[1]);
        }
      }
      XYSeries series = chart.addSeries(unique(b.name(), used), x, y);
      series.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
      series.setMarker(SeriesMarkers.NONE);
      series.setLineColor(ReportStyle.seriesColor(m));
      series.setLineStyle(ReportStyle.seriesStroke(m));
    }

    if (damping) {
      line(chart, used, ZERO_LINE_SERIES, new double[] {xMin, xMax}, new double[] {0, 0},
          ReportStyle.ZERO_LINE, ReportStyle.referenceStroke(1.6f, null));
      if (limitG > 0) {
        line(chart, used, limitLineSeries(limitG), new double[] {xMin, xMax}, new double[] {-limitG, -limitG},
            ReportStyle.LIMIT_LINE, ReportStyle.referenceStroke(1.6f, new float[] {8f, 5f}));
      }
    }
    DivergenceResult d = c.divergence();
    if (d.found() && d.speedEasMps() >= easRangeMps[0] && d.speedEasMps() <= easRangeMps[1]) {
      double xd = unit.fromMps(d.speedEasMps());
      line(chart, used, String.format(Locale.ROOT, "%s %.1f %s EAS", DIVERGENCE_SERIES_PREFIX, xd, unit.symbol()),
          new double[] {xd, xd}, new double[] {yRange[0], yRange[1]},
          ReportStyle.DIVERGENCE_LINE, ReportStyle.referenceStroke(2f, new float[] {12f, 4f, 3f, 4f}));
    } else if (d.found()) {
      notes.add(String.format(Locale.ROOT, "Divergence at %.1f %s EAS lies outside the plotted range (%.1f to %.1f %s).",
          unit.fromMps(d.speedEasMps()), unit.symbol(), xMin, xMax, unit.symbol()));
    } else {
      notes.add("No static divergence found for this configuration.");
    }

    int outside = crossingMarkers(chart, used, s.crossings(), unit, damping, new double[] {xMin, xMax}, yRange,
        FlutterCharts::markerSeries);
    if (outside > 0) {
      notes.add(outside + (outside == 1 ? " crossing lies" : " crossings lie")
          + " outside the plotted speed range and cannot be marked; see the findings table.");
    }
    ClearanceRequirements req = result.analysisCase().requirements();
    if (req != null) {
      ChartSeries.regimeLines(chart, used, req, unit, new double[] {xMin, xMax}, yRange, notes, false);
    }

    if (damping) {
      describe(notes, below, "lie below g = " + fmt(yRange[0]) + " (strongly damped) and run off the bottom of the plot");
      describe(notes, above, "lie above g = " + fmt(yRange[1]) + " (strongly unstable) and run off the top of the plot");
      describe(notes, aperiodic, "are non-oscillating roots (g infinite in the V-g convention) and are left as gaps");
    } else {
      describe(notes, above, "lie above " + fmt(yRange[1]) + " Hz and run off the plot");
    }
    describe(notes, unconverged, "did not converge and are left as gaps");
    if (s.method() == FlutterMethodKind.K) {
      notes.add("k method: g is the artificial structural damping that makes the motion harmonic; "
          + "only its zero crossings are physical, and the curves between them are not a damping history.");
    }
    String caption = damping
        ? "Damping g of every mode against equivalent airspeed (" + result.pathDescription() + "). Lines at g = 0 and at "
            + "the damping limit g = " + fmt(-limitG) + "; markers at the refined crossings."
        : "Frequency of every mode against equivalent airspeed (" + result.pathDescription()
            + "); markers at the refined damping crossings, at the frequency of the root there.";
    String stem = (damping ? "vg-" : "vf-") + ResultFiles.fileSafe(c.configuration());
    return new ReportChart(stem, caption, chart, notes);
  }

  /**
   * Marks refined crossings, one marker series per kind, and labels every flutter onset with its
   * speed and unit just above and to the right of its marker (labels of onsets close together
   * stack upwards).
   *
   * @param chart chart
   * @param used series names taken
   * @param crossings the crossings
   * @param unit speed unit
   * @param damping V-g (y = threshold g) or V-f (y = frequency, Hz)
   * @param xRange plotted speed range, display unit
   * @param yRange plotted y range
   * @param name series name of a kind
   * @return number of crossings outside the plotted speed range
   */
  static int crossingMarkers(XYChart chart, Set<String> used, List<FlutterCrossing> crossings, SpeedAxisUnit unit,
      boolean damping, double[] xRange, double[] yRange, java.util.function.Function<CrossingKind, String> name) {
    Map<CrossingKind, List<FlutterCrossing>> byKind = new EnumMap<>(CrossingKind.class);
    for (FlutterCrossing x : crossings) {
      byKind.computeIfAbsent(x.kind(), k -> new ArrayList<>()).add(x);
    }
    int outside = 0;
    double spanX = xRange[1] - xRange[0];
    double spanY = yRange[1] - yRange[0];
    for (Map.Entry<CrossingKind, List<FlutterCrossing>> e : byKind.entrySet()) {
      List<FlutterCrossing> xs = e.getValue();
      double[] mx = new double[xs.size()];
      double[] my = new double[xs.size()];
      for (int i = 0; i < xs.size(); i++) {
        mx[i] = unit.fromMps(xs.get(i).condition().speedEasMps());
        my[i] = damping ? xs.get(i).thresholdG() : xs.get(i).frequencyHz();
        if (mx[i] < xRange[0] || mx[i] > xRange[1]) {
          outside++;
        }
      }
      XYSeries series = chart.addSeries(unique(name.apply(e.getKey()), used), mx, my);
      series.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
      series.setMarker(marker(e.getKey()));
      series.setMarkerColor(markerColor(e.getKey()));
      if (e.getKey() != CrossingKind.FLUTTER_ONSET) {
        continue;
      }
      List<double[]> placed = new ArrayList<>();
      for (int i = 0; i < mx.length; i++) {
        String text = String.format(Locale.ROOT, "%.1f %s", mx[i], unit.symbol());
        // the text is centred on its anchor: half its width (about 0.55 em per character at 12 px on a
        // plot about 900 px wide) to the right of a small gap puts its left edge beside the marker
        double lx = mx[i] + spanX * (0.008 + 0.5 * text.length() * 7.0 / 900);
        double ly = my[i] + 0.045 * spanY;
        for (double[] p : placed) {
          if (Math.abs(p[0] - lx) < 0.08 * spanX && Math.abs(p[1] - ly) < 0.045 * spanY) {
            ly = p[1] + 0.05 * spanY;
          }
        }
        placed.add(new double[] {lx, ly});
        chart.addAnnotation(new AnnotationText(text, lx, Math.min(ly, yRange[1] - 0.03 * spanY), false));
      }
    }
    chart.getStyler().setAnnotationTextFont(new java.awt.Font(java.awt.Font.SANS_SERIF, java.awt.Font.BOLD, 12));
    chart.getStyler().setAnnotationTextFontColor(ReportStyle.ZERO_LINE);
    return outside;
  }

  /** @return [min, max] EAS over the grid points of the sweep path (m/s) */
  static double[] easRange(SweepResult result) {
    PlannedPath path = new PlannedPath(result.analysisCase().sweep());
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int i = 0; i < path.gridPoints(); i++) {
      double v = path.at(i).speedEasMps();
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
    if (!(hi > lo)) {
      hi = lo + 1.0;
    }
    return new double[] {lo, hi};
  }

  /** g axis: the data in range, always including 0 and -limit, padded, limited, rounded. */
  private static double[] dampingRange(FlutterSolution s, double[] easRange, double limitG) {
    List<double[]> ys = new ArrayList<>();
    for (BranchCurve b : s.branches()) {
      double[] eas = b.speedEasMps();
      double[] g = b.dampingG();
      boolean[] ok = b.converged();
      double[] y = new double[b.size()];
      for (int i = 0; i < b.size(); i++) {
        y[i] = ok[i] && eas[i] >= easRange[0] && eas[i] <= easRange[1] ? g[i] : Double.NaN;
      }
      ys.add(y);
    }
    return dampingRange(ys, limitG);
  }

  /**
   * @param values damping values g (non-finite ignored)
   * @param limitG damping limit
   * @return g axis limits: the data, always including 0 and -limit, padded, limited to
   *     [{@link #G_AXIS_FLOOR}, {@link #G_AXIS_CEILING}], rounded
   */
  static double[] dampingRange(List<double[]> values, double limitG) {
    double lo = -limitG;
    double hi = 0.0;
    for (double[] g : values) {
      for (double v : g) {
        if (Double.isFinite(v)) {
          lo = Math.min(lo, v);
          hi = Math.max(hi, v);
        }
      }
    }
    double floor = Math.min(G_AXIS_FLOOR, -limitG - 0.1);
    lo = Math.max(lo, floor);
    hi = Math.min(hi, G_AXIS_CEILING);
    double pad = 0.06 * (hi - lo);
    lo = Math.max(lo - pad, floor);
    hi = Math.min(hi + pad, G_AXIS_CEILING);
    double step = niceStep((hi - lo) / 20);
    return new double[] {Math.floor(lo / step + 1e-9) * step, Math.ceil(hi / step - 1e-9) * step};
  }

  /** Frequency axis: 0 to the highest plotted frequency, padded and rounded. */
  private static double[] frequencyRange(FlutterSolution s, double[] easRange) {
    double hi = 0.0;
    for (BranchCurve b : s.branches()) {
      double[] eas = b.speedEasMps();
      double[] f = b.frequencyHz();
      boolean[] ok = b.converged();
      for (int i = 0; i < b.size(); i++) {
        if (ok[i] && Double.isFinite(f[i]) && eas[i] >= easRange[0] && eas[i] <= easRange[1]) {
          hi = Math.max(hi, f[i]);
        }
      }
    }
    if (!(hi > 0)) {
      hi = 1.0;
    }
    hi *= 1.03;
    double step = niceStep(hi / 8);
    return new double[] {0.0, Math.ceil(hi / step) * step};
  }

  /** @return 1, 2 or 5 times a power of ten, at least {@code raw} */
  static double niceStep(double raw) {
    double p = Math.pow(10, Math.floor(Math.log10(raw)));
    double r = raw / p;
    return (r <= 1 ? 1 : r <= 2 ? 2 : r <= 5 ? 5 : 10) * p;
  }

  private static void line(XYChart chart, Set<String> used, String name, double[] x, double[] y, Color color,
      BasicStroke stroke) {
    XYSeries series = chart.addSeries(unique(name, used), x, y);
    series.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
    series.setMarker(SeriesMarkers.NONE);
    series.setLineColor(color);
    series.setLineStyle(stroke);
  }

  static Marker marker(CrossingKind k) {
    return switch (k) {
      case FLUTTER_ONSET -> SeriesMarkers.DIAMOND;
      case FLUTTER_RECOVERY -> SeriesMarkers.TRIANGLE_DOWN;
      case DAMPING_BELOW_LIMIT -> SeriesMarkers.SQUARE;
      case DAMPING_ABOVE_LIMIT -> SeriesMarkers.TRIANGLE_UP;
    };
  }

  static Color markerColor(CrossingKind k) {
    return switch (k) {
      case FLUTTER_ONSET -> ReportStyle.ONSET;
      case FLUTTER_RECOVERY -> ReportStyle.RECOVERY;
      case DAMPING_BELOW_LIMIT -> ReportStyle.BELOW_LIMIT;
      case DAMPING_ABOVE_LIMIT -> ReportStyle.ABOVE_LIMIT;
    };
  }

  /** @return the method in words, e.g. "p-k method" */
  static String methodWords(FlutterMethodKind m) {
    return m.label() + " method";
  }

  private static String unique(String name, Set<String> used) {
    String n = name;
    for (int i = 2; !used.add(n); i++) {
      n = name + " (" + i + ")";
    }
    return n;
  }

  private static void count(Map<String, Integer> counts, String mode, boolean yes) {
    if (yes) {
      counts.merge(mode, 1, Integer::sum);
    }
  }

  private static void describe(List<String> notes, Map<String, Integer> counts, String what) {
    if (counts.isEmpty()) {
      return;
    }
    List<String> parts = new ArrayList<>();
    int total = 0;
    for (Map.Entry<String, Integer> e : counts.entrySet()) {
      parts.add(e.getKey() + ": " + e.getValue());
      total += e.getValue();
    }
    String points = total + (total == 1 ? " point" : " points");
    String of = counts.size() == 1 ? " of " + counts.keySet().iterator().next() : " (" + String.join(", ", parts) + ")";
    notes.add(points + of + " " + what + ".");
  }

  private static String fmt(double v) {
    return String.format(Locale.ROOT, "%.2f", v);
  }
}
