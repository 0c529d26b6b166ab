package org.flexmargin.report;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import org.flexmargin.clearance.LoopFileCheck;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.SpeedRegime;
import org.flexmargin.report.LoopResponseCharts.ChosenSpeed;
import org.flexmargin.report.LoopResponseCharts.Response;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Bode gain, Bode phase and Nichols charts of a loop given on its own ({@code flexmargin margins}),
 * in the style of the sweep report's loop charts: the model (or the file's measured response) as
 * a solid line, a measured response beside it as markers on a thin line, the margin exclusion
 * regions of the rigid-body and aeroelastic bands around every critical point, the mode bands.
 */
public final class LoopFileCharts {
  private LoopFileCharts() {}

  /** Points of the log-frequency grid of a model curve. */
  public static final int GRID_POINTS = 600;
  /** Points added over each structural mode's band. */
  public static final int MODE_POINTS = 120;

  /**
   * L sampled for the charts: the table's own frequencies for a measured response, else a grid
   * uniform in log f over the analysed range, denser over every mode band.
   *
   * @param file the loop file
   * @param r one analysis
   * @param measured whether the response is a table (sampled at its rows)
   * @param tableHz the table's frequencies (used when {@code measured})
   * @return the sampled response, phase continuous
   */
  public static Response sample(LoopFile file, LoopFileCheck.Result r, boolean measured, double[] tableHz) {
    double[] f;
    if (measured) {
      f = java.util.Arrays.stream(tableHz)
          .filter(x -> x >= r.minFrequencyHz() && x <= r.maxFrequencyHz()).toArray();
    } else {
      TreeSet<Double> grid = new TreeSet<>();
      logSpace(grid, r.minFrequencyHz(), r.maxFrequencyHz(), GRID_POINTS);
      for (LoopFile.Mode m : file.modes()) {
        logSpace(grid, Math.max(r.minFrequencyHz(), 0.7 * m.frequencyHz()),
            Math.min(r.maxFrequencyHz(), 1.3 * m.frequencyHz()), MODE_POINTS);
      }
      f = grid.stream().mapToDouble(Double::doubleValue).toArray();
    }
    return LoopResponseCharts.sample(new ChosenSpeed(r.label(), file.speedEasMps()), true, r.loop(), f);
  }

  private static void logSpace(TreeSet<Double> out, double lo, double hi, int n) {
    if (!(hi > lo)) {
      return;
    }
    for (int i = 0; i < n; i++) {
      out.add(lo * Math.pow(hi / lo, (double) i / (n - 1)));
    }
  }

  /**
   * @param file the loop file
   * @param rs the sampled responses, the file's own first
   * @param measured which of them are tables (drawn with markers)
   * @return Bode gain, Bode phase and Nichols charts
   */
  public static List<ReportChart> of(LoopFile file, List<Response> rs, List<Boolean> measured) {
    return List.of(bodeGain(file, rs, measured), bodePhase(file, rs, measured), nichols(file, rs, measured));
  }

  private static void draw(XYChart chart, Set<String> used, List<Response> rs, List<Boolean> measured, boolean nichols,
      boolean gain) {
    chart.getStyler().setMarkerSize(4);
    for (int i = 0; i < rs.size(); i++) {
      Response r = rs.get(i);
      double[] x = nichols ? r.phaseDeg() : r.frequencyHz();
      double[] y = gain || nichols ? LoopResponseCharts.finite(r.gainDb()) : r.phaseDeg();
      XYSeries s = ChartSeries.line(chart, used, r.speed().label(), x, y, ReportStyle.seriesColor(i),
          ReportStyle.seriesStroke(0));
      if (measured.get(i)) {
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setMarkerColor(ReportStyle.seriesColor(i));
        s.setLineStyle(ReportStyle.referenceStroke(1.0f, null));
      }
    }
  }

  private static void modeBands(XYChart chart, Set<String> used, LoopFile file, double[] yr, double u) {
    boolean first = true;
    for (LoopFile.Mode m : file.modes()) {
      double lo = m.frequencyHz() * (1 - u);
      double hi = m.frequencyHz() * (1 + u);
      XYSeries s = ChartSeries.line(chart, used, String.format(Locale.ROOT, "mode bands f (1 +- %.2g)", u),
          new double[] {lo, lo, hi, hi, lo}, new double[] {yr[0], yr[1], yr[1], yr[0], yr[0]},
          ReportStyle.LIMIT_LINE, ReportStyle.referenceStroke(0.8f, new float[] {2f, 3f}));
      s.setShowInLegend(first);
      first = false;
    }
  }

  private static ReportChart bodeGain(LoopFile file, List<Response> rs, List<Boolean> measured) {
    XYChart chart = ChartSeries.chart(file.name() + ": gain of the broken loop", "frequency (Hz)",
        "gain 20 log10 |L| (dB)");
    chart.getStyler().setXAxisLogarithmic(true);
    Set<String> used = new HashSet<>();
    List<double[]> ys = new ArrayList<>();
    rs.forEach(r -> ys.add(r.gainDb()));
    double limit = peakLimit(file);
    double[] yr = ChartSeries.range(ys, new double[] {0, limit}, LoopResponseCharts.GAIN_AXIS_FLOOR_DB,
        LoopResponseCharts.GAIN_AXIS_CEILING_DB);
    chart.getStyler().setYAxisMin(yr[0]).setYAxisMax(yr[1]);
    draw(chart, used, rs, measured, false, true);
    double[] fx = xRange(rs);
    ChartSeries.line(chart, used, "0 dB", fx, new double[] {0, 0}, ReportStyle.ZERO_LINE,
        ReportStyle.referenceStroke(1.0f, null));
    ChartSeries.line(chart, used, String.format(Locale.ROOT, "structural peak limit %.3g dB", limit), fx,
        new double[] {limit, limit}, ReportStyle.REQUIREMENT, ReportStyle.referenceStroke(1.4f, new float[] {8f, 4f}));
    modeBands(chart, used, file, yr, uncertainty(file));
    List<String> notes = notes(rs, measured);
    clip(notes, rs, yr);
    return new ReportChart("bode-gain", "Gain of L(j w) against frequency: " + words(rs, measured)
        + "; the structural peak limit and the band of every structural mode.", chart, notes);
  }

  private static ReportChart bodePhase(LoopFile file, List<Response> rs, List<Boolean> measured) {
    XYChart chart = ChartSeries.chart(file.name() + ": phase of the broken loop", "frequency (Hz)",
        "phase arg L (deg, continuous)");
    chart.getStyler().setXAxisLogarithmic(true);
    Set<String> used = new HashSet<>();
    double[] pr = LoopResponseCharts.phaseRange(rs);
    chart.getStyler().setYAxisMin(pr[0]).setYAxisMax(pr[1]);
    chart.getStyler().setYAxisDecimalPattern("0");
    draw(chart, used, rs, measured, false, false);
    double[] fx = xRange(rs);
    boolean first = true;
    for (double p : LoopResponseCharts.criticalPhases(pr)) {
      ChartSeries.line(chart, used, LoopResponseCharts.CRITICAL_PHASE_SERIES, fx, new double[] {p, p},
          ReportStyle.ZERO_LINE, ReportStyle.referenceStroke(1.0f, new float[] {6f, 3f})).setShowInLegend(first);
      first = false;
    }
    modeBands(chart, used, file, pr, uncertainty(file));
    List<String> notes = notes(rs, measured);
    notes.add("Phase unwrapped continuously along frequency.");
    return new ReportChart("bode-phase", "Phase of L(j w) against frequency: " + words(rs, measured)
        + "; dashed: -180 deg + k 360 deg.", chart, notes);
  }

  private static ReportChart nichols(LoopFile file, List<Response> rs, List<Boolean> measured) {
    XYChart chart = ChartSeries.chart(file.name() + ": Nichols chart of the broken loop",
        "phase arg L (deg, continuous)", "gain 20 log10 |L| (dB)");
    Set<String> used = new HashSet<>();
    double[][] cells = cells(file);
    List<double[]> ys = new ArrayList<>();
    rs.forEach(r -> ys.add(r.gainDb()));
    double gm = Math.max(cells[0][0], cells[1][0]);
    double[] yr = ChartSeries.range(ys, new double[] {gm + 3, -gm - 3}, LoopResponseCharts.GAIN_AXIS_FLOOR_DB,
        LoopResponseCharts.GAIN_AXIS_CEILING_DB);
    double[] xr = LoopResponseCharts.phaseRange(rs);
    chart.getStyler().setXAxisMin(xr[0]).setXAxisMax(xr[1]);
    chart.getStyler().setYAxisMin(yr[0]).setYAxisMax(yr[1]);
    chart.getStyler().setXAxisDecimalPattern("0");
    chart.getStyler().setYAxisDecimalPattern("0");
    draw(chart, used, rs, measured, true, true);
    String[] bands = {"rigid-body band", "aeroelastic band"};
    float[][] dash = {null, {7f, 4f}};
    for (int b = 0; b < 2; b++) {
      boolean first = true;
      for (double p : LoopResponseCharts.criticalPhases(xr)) {
        double[][] d = LoopResponseCharts.exclusionRegion(cells[b][0], cells[b][1], p);
        ChartSeries.line(chart, used, LoopResponseCharts.exclusionSeries(cells[b][0], cells[b][1]) + ", " + bands[b],
            d[0], d[1], ReportStyle.REQUIREMENT, ReportStyle.referenceStroke(b == 0 ? 2.6f : 1.8f, dash[b]))
            .setShowInLegend(first);
        first = false;
      }
    }
    double[] cp = LoopResponseCharts.criticalPhases(xr);
    ChartSeries.markers(chart, used, LoopResponseCharts.CRITICAL_POINT_SERIES, cp, new double[cp.length],
        ReportStyle.ZERO_LINE, SeriesMarkers.CROSS);
    List<String> notes = notes(rs, measured);
    notes.add(String.format(Locale.ROOT, "Exclusion regions around every critical point: solid, the rigid-body band "
        + "(+-%.3g dB, +-%.3g deg); dashed, the aeroelastic band (+-%.3g dB, +-%.3g deg)%s.", cells[0][0],
        cells[0][1], cells[1][0], cells[1][1], file.requirements() != null
            ? ", the cells of the requirements table at " + file.speedEasMps() + " m/s EAS"
            : " (common practice; no requirements table)"));
    clip(notes, rs, yr);
    return new ReportChart("nichols", "Nichols chart (gain against phase) of L(j w): " + words(rs, measured)
        + "; red diamonds: the margin exclusion regions around the critical points.", chart, notes);
  }

  /** @return {{gain dB, phase deg} rigid-body, {gain dB, phase deg} aeroelastic} at the file's regime */
  static double[][] cells(LoopFile file) {
    ClearanceRequirements req = file.requirements();
    SpeedRegime regime = req == null ? null : org.flexmargin.clearance.RequirementLookup.regime(req, file.speedEasMps());
    if (req == null || regime == SpeedRegime.BEYOND) {
      double[] d = {LoopResponseCharts.DEFAULT_EXCLUSION_GAIN_DB, LoopResponseCharts.DEFAULT_EXCLUSION_PHASE_DEG};
      return new double[][] {d, d.clone()};
    }
    MarginCell rigid = req.cell(FrequencyBand.RIGID_BODY, regime);
    MarginCell aero = req.cell(FrequencyBand.AEROELASTIC, regime);
    return new double[][] {{rigid.gainMarginDb(), rigid.phaseMarginDeg()}, {aero.gainMarginDb(), aero.phaseMarginDeg()}};
  }

  private static double peakLimit(LoopFile file) {
    return file.requirements() == null ? ClearanceRequirements.DEFAULT_STRUCTURAL_PEAK_LIMIT_DB
        : file.requirements().structuralPeakLimitDb();
  }

  private static double uncertainty(LoopFile file) {
    return file.requirements() == null ? ClearanceRequirements.DEFAULT_FREQUENCY_UNCERTAINTY
        : file.requirements().frequencyUncertainty();
  }

  private static double[] xRange(List<Response> rs) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = 0;
    for (Response r : rs) {
      double[] f = r.frequencyHz();
      lo = Math.min(lo, f[0]);
      hi = Math.max(hi, f[f.length - 1]);
    }
    return new double[] {lo, hi};
  }

  private static String words(List<Response> rs, List<Boolean> measured) {
    List<String> w = new ArrayList<>();
    for (int i = 0; i < rs.size(); i++) {
      w.add(rs.get(i).speed().label() + (measured.get(i) ? " (table rows as markers)" : " (solid)"));
    }
    return String.join(", ", w);
  }

  private static List<String> notes(List<Response> rs, List<Boolean> measured) {
    List<String> n = new ArrayList<>();
    for (int i = 0; i < rs.size(); i++) {
      Response r = rs.get(i);
      n.add(String.format(Locale.ROOT, "%s: %d %s from %.4g to %.4g Hz.", r.speed().label(), r.frequencyHz().length,
          measured.get(i) ? "table rows" : "exact evaluations, uniform in log f and denser over every mode band",
          r.frequencyHz()[0], r.frequencyHz()[r.frequencyHz().length - 1]));
    }
    return n;
  }

  private static void clip(List<String> notes, List<Response> rs, double[] yr) {
    int out = 0;
    for (Response r : rs) {
      int[] o = ChartSeries.outside(r.gainDb(), yr[0], yr[1]);
      out += o[0] + o[1];
    }
    if (out > 0) {
      notes.add(String.format(Locale.ROOT, "%d gain values lie outside the plotted range [%.0f, %.0f] dB.", out,
          yr[0], yr[1]));
    }
  }
}
