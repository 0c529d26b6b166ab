package org.flexmargin.report;

import java.awt.Font;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.sweep.ClosedLoopPoint;
import org.flexmargin.sweep.ClosedLoopResult;
import org.flexmargin.sweep.ClosedLoopRoot;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.SweepResult;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Charts of the closed-loop (aeroservoelastic) eigenvalues along the sweep: the root locus in the
 * s-plane coloured by airspeed, and closed-loop V-g and V-f diagrams (damping g and frequency of
 * the labelled closed-loop roots against EAS) to read beside the open-loop ones.
 *
 * <p>Root locus: Re s (1/s) against frequency Im s / 2 pi (Hz), upper half plane. The axes are zoomed on the
 * structural region: Im s up to 1.15 x the highest in-vacuo mode frequency, Re s from
 * {@link #LOCUS_MAX_DAMPING_RATIO} x that height on the left to just right of the rightmost root;
 * roots outside (fast actuator, filter and aerodynamic-lag roots) are counted in a note. Lines of
 * constant damping ratio zeta = 0 (the stability boundary) and zeta = g_limit / 2 (the damping
 * limit, g ~ 2 zeta) are drawn.
 */
public final class ClosedLoopCharts {
  private ClosedLoopCharts() {}

  /** Number of airspeed colour bins of the root locus. */
  public static final int SPEED_BINS = 6;
  /** Left edge of the root-locus window as a damping ratio at the top of the window. */
  public static final double LOCUS_MAX_DAMPING_RATIO = 0.12;
  /** Name of the zeta = 0 line. */
  public static final String ZETA_ZERO_SERIES = "\u03b6 = 0 (stability boundary)";
  /** Label of roots not drawn as lines in the closed-loop V-g and V-f charts. */
  public static final String CONTROL_LOOP_LABEL = "control loop";

  /**
   * @param dampingLimitG damping limit g
   * @return name of the damping-limit line of the root locus
   */
  public static String zetaLimitSeries(double dampingLimitG) {
    return String.format(Locale.ROOT, "\u03b6 = %.4g (limit g = %.3g)", dampingLimitG / 2, dampingLimitG);
  }

  /**
   * @param kind crossing kind
   * @return name of a closed-loop crossing marker series
   */
  public static String markerSeries(CrossingKind kind) {
    return "closed-loop " + FlutterCharts.markerSeries(kind);
  }

  /**
   * @param lo bin low edge, display unit
   * @param hi bin high edge, display unit
   * @param unit display unit
   * @return name of a root-locus speed bin series
   */
  public static String binSeries(double lo, double hi, SpeedAxisUnit unit) {
    return String.format(Locale.ROOT, "EAS %.0f to %.0f %s", lo, hi, unit.symbol());
  }

  /**
   * @param result the sweep
   * @param c one configuration with loop results
   * @param unit speed unit
   * @return root locus, closed-loop V-g, closed-loop V-f (empty without a loop)
   */
  public static List<ReportChart> of(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit) {
    if (c.servo() == null) {
      return List.of();
    }
    return List.of(rootLocus(result, c, unit), vg(result, c, unit, true), vg(result, c, unit, false));
  }

  /**
   * @param result the sweep
   * @param c one configuration with loop results
   * @param unit speed unit of the colour bins
   * @return the root locus chart
   */
  public static ReportChart rootLocus(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit) {
    ClosedLoopResult cl = c.servo().closedLoop();
    double limitG = result.analysisCase().options().dampingLimitG();
    double fTop = 0;
    for (double f : c.modeFrequenciesHz()) {
      fTop = Math.max(fTop, f);
    }
    // y in Hz like every other chart; the window is set in rad/s (omega = 2 pi f) on the real axis
    double yMaxHz = 1.15 * (fTop > 0 ? fTop : 10);
    yMaxHz = Math.ceil(yMaxHz / FlutterCharts.niceStep(yMaxHz / 10)) * FlutterCharts.niceStep(yMaxHz / 10);
    double yMax = 2 * Math.PI * yMaxHz;
    double maxRe = 0;
    for (ClosedLoopPoint p : cl.points()) {
      for (ClosedLoopRoot r : p.roots()) {
        if (r.imagRadPerS() <= yMax) {
          maxRe = Math.max(maxRe, r.realPerS());
        }
      }
    }
    double xLo = -LOCUS_MAX_DAMPING_RATIO * yMax;
    double xHi = Math.max(maxRe, 0) + 0.02 * yMax;
    double step = FlutterCharts.niceStep((xHi - xLo) / 10);
    xLo = Math.floor(xLo / step) * step;
    xHi = Math.ceil(xHi / step) * step;

    XYChart chart = ChartSeries.chart(c.configuration() + ": closed-loop root locus along the sweep",
        "real part Re s (1/s)", "frequency Im s / 2 pi (Hz)");
    chart.getStyler().setXAxisMin(xLo).setXAxisMax(xHi).setYAxisMin(0.0).setYAxisMax(yMaxHz);
    chart.getStyler().setMarkerSize(6);
    chart.getStyler().setXAxisDecimalPattern("0.#");
    chart.getStyler().setYAxisDecimalPattern("0");
    Set<String> used = new HashSet<>();
    double[] eas = FlutterCharts.easRange(result);
    int left = 0;
    int above = 0;
    int total = 0;
    for (int b = 0; b < SPEED_BINS; b++) {
      double lo = eas[0] + (eas[1] - eas[0]) * b / SPEED_BINS;
      double hi = eas[0] + (eas[1] - eas[0]) * (b + 1) / SPEED_BINS;
      List<double[]> pts = new ArrayList<>();
      for (ClosedLoopPoint p : cl.points()) {
        double v = p.condition().speedEasMps();
        boolean in = b == SPEED_BINS - 1 ? v >= lo && v <= hi + 1e-9 : v >= lo && v < hi;
        if (b == 0 && v < lo) {
          in = true;
        }
        if (!in) {
          continue;
        }
        for (ClosedLoopRoot r : p.roots()) {
          total++;
          if (r.realPerS() < xLo) {
            left++;
          } else if (r.frequencyHz() > yMaxHz) {
            above++;
          } else {
            pts.add(new double[] {r.realPerS(), r.frequencyHz()});
          }
        }
      }
      double[] x = new double[Math.max(pts.size(), 1)];
      double[] y = new double[x.length];
      if (pts.isEmpty()) {
        x[0] = Double.NaN;
        y[0] = Double.NaN;
      }
      for (int i = 0; i < pts.size(); i++) {
        x[i] = pts.get(i)[0];
        y[i] = pts.get(i)[1];
      }
      ChartSeries.markers(chart, used, binSeries(unit.fromMps(lo), unit.fromMps(hi), unit), x, y,
          ReportStyle.speedRamp((b + 0.5) / SPEED_BINS), SeriesMarkers.CIRCLE);
    }
    ChartSeries.line(chart, used, ZETA_ZERO_SERIES, new double[] {0, 0}, new double[] {0, yMaxHz},
        ReportStyle.ZERO_LINE, ReportStyle.referenceStroke(1.6f, null));
    if (limitG > 0) {
      double z = limitG / 2;
      double slope = z / Math.sqrt(1 - z * z);
      ChartSeries.line(chart, used, zetaLimitSeries(limitG), new double[] {0, -slope * yMax},
          new double[] {0, yMaxHz}, ReportStyle.LIMIT_LINE, ReportStyle.referenceStroke(1.6f, new float[] {8f, 5f}));
    }
    Map<CrossingKind, List<FlutterCrossing>> byKind = byKind(cl.crossings());
    List<FlutterCrossing> onsets = byKind.getOrDefault(CrossingKind.FLUTTER_ONSET, List.of());
    if (!onsets.isEmpty()) {
      double[] x = new double[onsets.size()];
      double[] y = new double[onsets.size()];
      for (int i = 0; i < x.length; i++) {
        y[i] = onsets.get(i).frequencyHz();
        // a root crossing the axis twice at nearly the same frequency: stack its labels downwards
        int stacked = 0;
        for (int k = 0; k < i; k++) {
          if (Math.abs(y[k] - y[i]) < 0.05 * yMaxHz) {
            stacked++;
          }
        }
        chart.addAnnotation(new AnnotationText(String.format(Locale.ROOT, "%.1f %s", unit.fromMps(
            onsets.get(i).condition().speedEasMps()), unit.symbol()), x[i] + 0.075 * (xHi - xLo),
            y[i] - stacked * 0.045 * yMaxHz, false));
      }
      ChartSeries.markers(chart, used, markerSeries(CrossingKind.FLUTTER_ONSET), x, y, ReportStyle.ONSET,
          SeriesMarkers.DIAMOND);
      // the dots of the locus hide a marker of their own size: ring each onset with a larger outline
      double hx = 0.018 * (xHi - xLo);
      double hy = 0.03 * yMaxHz;
      double[] ox = new double[6 * x.length];
      double[] oy = new double[6 * x.length];
      for (int i = 0; i < x.length; i++) {
        double[] px = {x[i] - hx, x[i], x[i] + hx, x[i], x[i] - hx, Double.NaN};
        double[] py = {y[i], y[i] + hy, y[i], y[i] - hy, y[i], Double.NaN};
        System.arraycopy(px, 0, ox, 6 * i, 6);
        System.arraycopy(py, 0, oy, 6 * i, 6);
      }
      ChartSeries.line(chart, used, markerSeries(CrossingKind.FLUTTER_ONSET) + " (outline)", ox, oy,
          ReportStyle.ONSET, ReportStyle.referenceStroke(2.2f, null)).setShowInLegend(false);
      chart.getStyler().setAnnotationTextFont(new Font(Font.SANS_SERIF, Font.BOLD, 12));
      chart.getStyler().setAnnotationTextFontColor(ReportStyle.ONSET);
    }
    List<String> notes = new ArrayList<>();
    notes.add(String.format(Locale.ROOT, "Zoomed on the structural region: Re s from %.3g to %.3g 1/s, Im s up to "
        + "%.4g Hz (1.15 x the highest in-vacuo mode frequency). %d of %d roots lie further left (well-damped "
        + "actuator, filter, delay and aerodynamic-lag roots) and %d above; they are not drawn.",
        xLo, xHi, yMaxHz, left, total, above));
    notes.add("Colours: airspeed bins on a ramp from pale gold (lowest speed) to deep violet (highest); one dot per "
        + "closed-loop root and grid point. Roots on the real axis are aperiodic.");
    if (!onsets.isEmpty()) {
      notes.add("Diamonds on the imaginary axis: refined closed-loop flutter onsets (root on zeta = 0), with their "
          + "speeds.");
    }
    return new ReportChart("root-locus-" + ResultFiles.fileSafe(c.configuration()),
        "Closed-loop eigenvalues s at every grid point of the sweep, coloured by equivalent airspeed, with the "
            + "lines of zero damping and of the damping limit.", chart, notes);
  }

  /** Name of the legend entry of the grouped loop roots (rigid body with the loop, short period, others). */
  public static final String LOOP_ROOTS_SERIES = "rigid-body and loop roots";

  /**
   * Closed-loop V-g (damping) or V-f (frequency): every root followed from speed to speed
   * ({@link RootTracks}), one line per structural mode named after its open-loop parent, the
   * other roots in one grey group with one legend entry.
   */
  private static ReportChart vg(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit, boolean damping) {
    ClosedLoopResult cl = c.servo().closedLoop();
    double limitG = result.analysisCase().options().dampingLimitG();
    List<ClosedLoopPoint> pts = cl.points();
    int n = pts.size();
    int omittedControl = 0;
    double controlMaxRe = Double.NEGATIVE_INFINITY;
    int real = 0;
    for (ClosedLoopPoint p : pts) {
      for (ClosedLoopRoot r : p.roots()) {
        if (r.label().equals(CONTROL_LOOP_LABEL)) {
          omittedControl++;
          controlMaxRe = Math.max(controlMaxRe, r.realPerS());
        } else if (r.imagRadPerS() == 0) {
          real++;
        }
      }
    }
    List<RootTracks.Track> tracks = RootTracks.of(pts, c.modeNames(), c.modeFrequenciesHz());
    double[] easX = new double[n];
    for (int i = 0; i < n; i++) {
      easX[i] = pts.get(i).condition().speedEasMps();
    }
    double[] xr = FlutterCharts.easRange(result);
    double[] x = ChartSeries.speeds(easX, unit);
    List<double[]> ys = new ArrayList<>();
    List<double[]> curves = new ArrayList<>();
    List<RootTracks.Track> drawn = new ArrayList<>();
    int hidden = 0;
    for (RootTracks.Track t : tracks) {
      double[] y = damping ? t.dampingG() : t.frequencyHz();
      int finite = 0;
      for (double v : y) {
        finite += Double.isFinite(v) ? 1 : 0;
      }
      if (finite < 2) {
        hidden++; // present at one grid point only: no line to draw
        continue;
      }
      curves.add(y);
      drawn.add(t);
      if (t.structural() || damping) {
        ys.add(y);
      }
    }
    double[] yr;
    if (damping) {
      yr = FlutterCharts.dampingRange(ys, limitG);
    } else {
      // the frequency axis follows the structural roots; loop roots above them run off the top
      yr = ChartSeries.range(ys, new double[] {0}, 0, Double.POSITIVE_INFINITY);
      yr[0] = 0;
    }
    XYChart chart = ChartSeries.chart(c.configuration() + ": closed-loop " + (damping ? "damping (V-g)"
        : "frequency (V-f)") + ", state space", unit.axisTitle(),
        damping ? "damping g (V-g convention, negative = stable)" : "frequency (Hz)");
    chart.getStyler().setXAxisMin(unit.fromMps(xr[0])).setXAxisMax(unit.fromMps(xr[1]));
    chart.getStyler().setYAxisMin(yr[0]).setYAxisMax(yr[1]);
    chart.getStyler().setXAxisDecimalPattern("0.#");
    chart.getStyler().setYAxisDecimalPattern(damping ? "0.0#" : "0.#");
    Set<String> used = new HashSet<>();
    List<String> clipped = new ArrayList<>();
    int loopClipped = 0;
    boolean loopLegend = false;
    // loop roots first, so that the structural lines are drawn over them
    for (int pass = 0; pass < 2; pass++) {
      for (int k = 0; k < drawn.size(); k++) {
        RootTracks.Track t = drawn.get(k);
        if (t.structural() != (pass == 1)) {
          continue;
        }
        double[] y = curves.get(k);
        int[] out = ChartSeries.outside(y, yr[0], yr[1]);
        if (t.structural()) {
          int ci = c.modeNames().indexOf(t.name());
          if (out[0] + out[1] > 0) {
            clipped.add(t.name() + ": " + (out[0] + out[1]));
          }
          ChartSeries.line(chart, used, t.name(), x, y, ReportStyle.seriesColor(ci), ReportStyle.seriesStroke(ci));
        } else {
          loopClipped += out[0] + out[1];
          ChartSeries.line(chart, used, LOOP_ROOTS_SERIES, x, y, ReportStyle.LOOP_ROOT,
              ReportStyle.referenceStroke(1.3f, null)).setShowInLegend(!loopLegend);
          loopLegend = true;
        }
      }
    }
    double x0 = unit.fromMps(xr[0]);
    double x1 = unit.fromMps(xr[1]);
    List<String> notes = new ArrayList<>();
    if (damping) {
      // named on the plot, not in the legend, to keep the legend to the roots and markers
      ChartSeries.line(chart, used, FlutterCharts.ZERO_LINE_SERIES, new double[] {x0, x1}, new double[] {0, 0},
          ReportStyle.ZERO_LINE, ReportStyle.referenceStroke(1.6f, null)).setShowInLegend(false);
      double dy = 0.025 * (yr[1] - yr[0]);
      chart.addAnnotation(new AnnotationText("g = 0", x0 + 0.03 * (x1 - x0), dy, false));
      if (limitG > 0) {
        ChartSeries.line(chart, used, FlutterCharts.limitLineSeries(limitG), new double[] {x0, x1},
            new double[] {-limitG, -limitG}, ReportStyle.LIMIT_LINE,
            ReportStyle.referenceStroke(1.6f, new float[] {8f, 5f})).setShowInLegend(false);
        chart.addAnnotation(new AnnotationText(String.format(Locale.ROOT, "limit g = %.3f", -limitG),
            x0 + 0.06 * (x1 - x0), -limitG - dy, false));
      }
    }
    if (c.clearance() != null) {
      ChartSeries.regimeLines(chart, used, result.analysisCase().requirements(), unit,
          new double[] {x0, x1}, yr, notes, false);
    }
    FlutterCharts.crossingMarkers(chart, used, cl.crossings(), unit, damping, new double[] {x0, x1}, yr,
        ClosedLoopCharts::markerSeries);
    long loopTracks = drawn.stream().filter(t -> !t.structural()).count();
    notes.add("Each line is one closed-loop root followed from speed to speed (nearest root at the next grid point), "
        + "named after the open-loop mode it starts from; " + loopTracks + " other roots (rigid body with the loop, "
        + "short period, second roots near a mode) are drawn thin grey as \"" + LOOP_ROOTS_SERIES + "\".");
    if (omittedControl > 0) {
      notes.add(String.format(Locale.ROOT, "%d \"%s\" roots (actuator, sensors, filters, delay, aerodynamic lags) "
          + "are not drawn as lines; their largest real part is %.4g 1/s. Their crossings, if any, are still "
          + "marked.", omittedControl, CONTROL_LOOP_LABEL, controlMaxRe));
    }
    if (real > 0) {
      notes.add(real + " root-points are on the real axis (aperiodic, g infinite) and are not drawn; they are in the "
          + "root locus and in results.json.");
    }
    if (hidden > 0) {
      notes.add(hidden + " roots appear at a single grid point only and have no line.");
    }
    if (!clipped.isEmpty() || loopClipped > 0) {
      notes.add("Points outside the plotted range (per line): " + String.join(", ", clipped)
          + (loopClipped > 0 ? (clipped.isEmpty() ? "" : ", ") + "loop roots: " + loopClipped : "") + ".");
    }
    String stem = (damping ? "cl-vg-" : "cl-vf-") + ResultFiles.fileSafe(c.configuration());
    String caption = damping
        ? "Closed-loop damping g of every root against equivalent airspeed (with the flight control loop; "
            + "compare with the open-loop V-g above). Markers at the refined closed-loop crossings, labelled with "
            + "their speed."
        : "Closed-loop frequency of every root against equivalent airspeed; markers at the refined closed-loop "
            + "crossings.";
    return new ReportChart(stem, caption, chart, notes);
  }

  private static Map<CrossingKind, List<FlutterCrossing>> byKind(List<FlutterCrossing> crossings) {
    Map<CrossingKind, List<FlutterCrossing>> out = new EnumMap<>(CrossingKind.class);
    for (FlutterCrossing x : crossings) {
      out.computeIfAbsent(x.kind(), k -> new ArrayList<>()).add(x);
    }
    return out;
  }
}
