package org.flexmargin.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.ToDoubleFunction;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.RequirementLookup;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.MarginDirection;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.SpeedRegime;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.MarginOnset;
import org.flexmargin.sweep.ServoPoint;
import org.flexmargin.sweep.SweepResult;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Loop margins against equivalent airspeed, one chart each: gain margins (dB, gain increase and
 * gain reduction), phase margin (deg), delay margin (s) and the structural peak loop gain of
 * every mode over its frequency-uncertainty band (dB). Every margin is the governing one at each
 * grid point within its frequency band (smallest gain-increase margin, gain-reduction margin
 * closest to 0 dB, smallest |phase margin|, smallest delay margin), from the exact broken-loop
 * response of the sweep.
 *
 * <p>With a requirements table the charts carry the required values as step lines that change
 * at V0max, V_L and factor x V_L (none beyond), vertical lines at those speeds, and markers at the
 * refined margin-onset speeds of the clearance ({@link MarginOnset}). The requirements table sets
 * no delay margin; that chart has no requirement line.
 */
public final class MarginCharts {
  private MarginCharts() {}

  /** Gain-margin axis limits, dB: values beyond run off the plot (stated in a note). */
  public static final double GAIN_AXIS_LIMIT_DB = 30.0;
  /** Lowest structural peak shown, dB. */
  public static final double PEAK_AXIS_FLOOR_DB = -40.0;
  /** Name of the margin-onset marker series. */
  public static final String ONSET_SERIES = "margin onset (refined)";
  /** Name of the structural peak limit series. */
  public static final String PEAK_LIMIT_SERIES = "structural peak limit";
  /** Name of the overall peak gain series (charts without a requirements table). */
  public static final String OVERALL_PEAK_SERIES = "peak |L| over the analysed band";

  /**
   * @param increase gain increase (true) or reduction
   * @param band frequency band
   * @return name of the achieved gain margin series
   */
  public static String gainSeries(boolean increase, FrequencyBand band) {
    return "gain " + (increase ? "increase" : "reduction") + " margin, " + bandWords(band) + " band";
  }

  /**
   * @param band frequency band
   * @return name of the required gain margin step lines (+GM, a gap, then -GM)
   */
  public static String requiredGainSeries(FrequencyBand band) {
    return "required +-GM, " + bandWords(band) + " band";
  }

  /**
   * @param band frequency band
   * @return name of the achieved phase margin series
   */
  public static String phaseSeries(FrequencyBand band) {
    return "phase margin, " + bandWords(band) + " band";
  }

  /**
   * @param band frequency band
   * @return name of the required phase margin step line
   */
  public static String requiredPhaseSeries(FrequencyBand band) {
    return "required PM, " + bandWords(band) + " band";
  }

  /**
   * @param band frequency band
   * @return name of the delay margin series
   */
  public static String delaySeries(FrequencyBand band) {
    return "delay margin, " + bandWords(band) + " band";
  }

  /**
   * @param result the sweep
   * @param c one configuration, with loop results ({@code c.servo() != null})
   * @param unit speed axis unit
   * @return gain margin, phase margin, delay margin and structural peak charts
   */
  public static List<ReportChart> of(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit) {
    if (c.servo() == null) {
      return List.of();
    }
    Data d = new Data(result, c);
    return List.of(gainChart(d, unit), phaseChart(d, unit), delayChart(d, unit), peakChart(d, unit));
  }

  /** Governing margins per grid point, per band. */
  static final class Data {
    final SweepResult result;
    final ConfigurationResult c;
    final ClearanceRequirements req;
    final double[] eas;
    final double[] firstAeroHz;
    final List<ServoPoint> points;

    Data(SweepResult result, ConfigurationResult c) {
      this.result = result;
      this.c = c;
      this.req = c.clearance() == null ? null : result.analysisCase().requirements();
      this.points = c.servo().points();
      int n = points.size();
      eas = new double[n];
      firstAeroHz = new double[n];
      for (int i = 0; i < n; i++) {
        eas[i] = points.get(i).condition().speedEasMps();
        firstAeroHz[i] = firstAeroelasticHz(c, i);
      }
    }

    /** Value per point of a margin in one band: NaN where the band has no such crossing. */
    double[] gain(boolean increase, FrequencyBand band) {
      double[] out = new double[eas.length];
      for (int i = 0; i < out.length; i++) {
        double best = Double.NaN;
        for (PhaseCrossover pc : points.get(i).margins().phaseCrossovers()) {
          boolean inc = pc.direction() == MarginDirection.GAIN_INCREASE;
          if (inc != increase || RequirementLookup.band(pc.frequencyHz(), firstAeroHz[i]) != band) {
            continue;
          }
          double v = pc.gainMarginDb();
          if (Double.isNaN(best) || (increase ? v < best : v > best)) {
            best = v;
          }
        }
        out[i] = best;
      }
      return out;
    }

    double[] overCrossovers(FrequencyBand band, ToDoubleFunction<GainCrossover> value) {
      double[] out = new double[eas.length];
      for (int i = 0; i < out.length; i++) {
        double best = Double.NaN;
        for (GainCrossover gc : points.get(i).margins().gainCrossovers()) {
          if (RequirementLookup.band(gc.frequencyHz(), firstAeroHz[i]) == band) {
            double v = value.applyAsDouble(gc);
            best = Double.isNaN(best) ? v : Math.min(best, v);
          }
        }
        out[i] = best;
      }
      return out;
    }

    /**
     * Requirements of these kinds that fail somewhere along the sweep without a refined onset
     * (failing from the first assessed point, or a check that exists only where it fails).
     *
     * @return {words, speed EAS m/s of the first failing grid point} per requirement
     */
    List<Object[]> failingWithoutOnset(Set<CheckKind> kinds) {
      List<Object[]> out = new ArrayList<>();
      if (c.clearance() == null) {
        return out;
      }
      Set<org.flexmargin.clearance.CheckKey> seen = new java.util.HashSet<>();
      for (MarginOnset m : c.clearance().marginOnsets()) {
        seen.add(m.key());
      }
      for (PointAssessment p : c.clearance().points()) {
        for (org.flexmargin.clearance.ClearanceCheck k : p.checks()) {
          if (kinds.contains(k.kind()) && !k.passed() && seen.add(k.key())) {
            out.add(new Object[] {ClearanceSections.requirementWords(k.key()), p.speedEasMps()});
          }
        }
      }
      return out;
    }

    List<MarginOnset> onsets(Set<CheckKind> kinds) {
      if (c.clearance() == null) {
        return List.of();
      }
      return c.clearance().marginOnsets().stream().filter(m -> kinds.contains(m.key().kind())).toList();
    }
  }

  /**
   * The lowest elastic-mode frequency at grid point i: the clearance's value when assessed there,
   * else the lowest converged open-loop root frequency (as the clearance computes it), else the
   * lowest in-vacuo frequency.
   */
  static double firstAeroelasticHz(ConfigurationResult c, int i) {
    return org.flexmargin.sweep.RateSaturation.firstAeroelasticHz(c, i);
  }

  private static ReportChart gainChart(Data d, SpeedAxisUnit unit) {
    List<String> notes = new ArrayList<>();
    Map<String, double[]> curves = new LinkedHashMap<>();
    Map<String, Color> colors = new LinkedHashMap<>();
    Map<String, BasicStroke> strokes = new LinkedHashMap<>();
    List<double[]> all = new ArrayList<>();
    List<double[]> required = new ArrayList<>();
    Map<String, double[][]> reqLines = new LinkedHashMap<>();
    double[] xr = xRange(d, unit);
    for (FrequencyBand band : FrequencyBand.values()) {
      double[] inc = d.gain(true, band);
      double[] red = d.gain(false, band);
      boolean any = hasData(inc) || hasData(red);
      if (!any && band != FrequencyBand.RIGID_BODY) {
        continue;
      }
      int ci = bandColorIndex(band);
      curves.put(gainSeries(true, band), inc);
      curves.put(gainSeries(false, band), red);
      colors.put(gainSeries(true, band), ReportStyle.seriesColor(ci));
      colors.put(gainSeries(false, band), ReportStyle.seriesColor(ci));
      strokes.put(gainSeries(true, band), ReportStyle.seriesStroke(0));
      strokes.put(gainSeries(false, band), ReportStyle.referenceStroke(2.2f, new float[] {7f, 4f}));
      all.add(inc);
      all.add(red);
      if (!hasData(inc) && !hasData(red)) {
        notes.add("No phase crossover in the " + bandWords(band) + " band at any grid point.");
      }
      if (d.req != null) {
        double[][] up = requirementSteps(d.req, band, d.eas[0], d.eas[d.eas.length - 1], unit,
            cell -> cell.gainMarginDb());
        double[][] down = requirementSteps(d.req, band, d.eas[0], d.eas[d.eas.length - 1], unit,
            cell -> -cell.gainMarginDb());
        // +GM and -GM as one series with a gap between them: one legend entry per band
        double[][] both = new double[2][up[0].length + 1 + down[0].length];
        for (int k = 0; k < 2; k++) {
          System.arraycopy(up[k], 0, both[k], 0, up[k].length);
          both[k][up[k].length] = Double.NaN;
          System.arraycopy(down[k], 0, both[k], up[k].length + 1, down[k].length);
        }
        reqLines.put(requiredGainSeries(band), both);
        colors.put(requiredGainSeries(band), ReportStyle.seriesColor(ci));
        required.add(up[1]);
        required.add(down[1]);
      }
    }
    double[] yr = ChartSeries.range(all, concat(required), -GAIN_AXIS_LIMIT_DB, GAIN_AXIS_LIMIT_DB);
    XYChart chart = ChartSeries.chart(d.c.configuration() + ": gain margins against airspeed", unit.axisTitle(),
        "gain margin (dB; + gain increase, - gain reduction)");
    return finish(d, unit, chart, xr, yr, curves, colors, strokes, reqLines, notes,
        d.onsets(EnumSet.of(CheckKind.GAIN_INCREASE_MARGIN, CheckKind.GAIN_REDUCTION_MARGIN)), null,
        "margins-gain-", "Governing gain margins of the broken loop at every grid point, by frequency band "
            + "(solid: gain increase, dashed: gain reduction)" + reqWords(d) + ".", "0.#",
        EnumSet.of(CheckKind.GAIN_INCREASE_MARGIN, CheckKind.GAIN_REDUCTION_MARGIN));
  }

  private static ReportChart phaseChart(Data d, SpeedAxisUnit unit) {
    List<String> notes = new ArrayList<>();
    Map<String, double[]> curves = new LinkedHashMap<>();
    Map<String, Color> colors = new LinkedHashMap<>();
    Map<String, BasicStroke> strokes = new LinkedHashMap<>();
    Map<String, double[][]> reqLines = new LinkedHashMap<>();
    List<double[]> all = new ArrayList<>();
    List<double[]> required = new ArrayList<>();
    double[] xr = xRange(d, unit);
    for (FrequencyBand band : FrequencyBand.values()) {
      double[] pm = d.overCrossovers(band, g -> Math.abs(g.phaseMarginDeg()));
      if (!hasData(pm) && band != FrequencyBand.RIGID_BODY) {
        continue;
      }
      int ci = bandColorIndex(band);
      putCurve(curves, colors, strokes, phaseSeries(band), pm, ci);
      all.add(pm);
      if (!hasData(pm)) {
        notes.add("No gain crossover in the " + bandWords(band) + " band at any grid point.");
      }
      if (d.req != null) {
        double[][] r = requirementSteps(d.req, band, d.eas[0], d.eas[d.eas.length - 1], unit,
            MarginCell::phaseMarginDeg);
        reqLines.put(requiredPhaseSeries(band), r);
        colors.put(requiredPhaseSeries(band), ReportStyle.seriesColor(ci));
        required.add(r[1]);
      }
    }
    double[] yr = ChartSeries.range(all, concat(required), 0, 180);
    yr[0] = 0;
    XYChart chart = ChartSeries.chart(d.c.configuration() + ": phase margin against airspeed", unit.axisTitle(),
        "phase margin |PM| (deg)");
    return finish(d, unit, chart, xr, yr, curves, colors, strokes, reqLines, notes,
        d.onsets(EnumSet.of(CheckKind.PHASE_MARGIN)), null, "margins-phase-",
        "Smallest phase margin (either direction) of the broken loop at every grid point, by frequency band"
            + reqWords(d) + ".", "0", EnumSet.of(CheckKind.PHASE_MARGIN));
  }

  private static ReportChart delayChart(Data d, SpeedAxisUnit unit) {
    List<String> notes = new ArrayList<>();
    Map<String, double[]> curves = new LinkedHashMap<>();
    Map<String, Color> colors = new LinkedHashMap<>();
    Map<String, BasicStroke> strokes = new LinkedHashMap<>();
    List<double[]> all = new ArrayList<>();
    double[] xr = xRange(d, unit);
    for (FrequencyBand band : FrequencyBand.values()) {
      double[] dm = d.overCrossovers(band, GainCrossover::delayMarginS);
      for (int i = 0; i < dm.length; i++) {
        // milliseconds, the unit delays are specified in; a logarithmic axis cannot show 0
        dm[i] = dm[i] > 0 ? 1000 * dm[i] : Double.NaN;
      }
      if (!hasData(dm) && band != FrequencyBand.RIGID_BODY) {
        continue;
      }
      int ci = bandColorIndex(band);
      putCurve(curves, colors, strokes, delaySeries(band), dm, ci);
      all.add(dm);
    }
    double lo = Double.POSITIVE_INFINITY;
    double hi = 0;
    for (double[] a : all) {
      for (double v : a) {
        if (Double.isFinite(v)) {
          lo = Math.min(lo, v);
          hi = Math.max(hi, v);
        }
      }
    }
    if (!(hi > 0)) {
      lo = 1;
      hi = 1000;
    }
    double[] yr = {Math.pow(10, Math.floor(Math.log10(lo))), Math.pow(10, Math.ceil(Math.log10(hi)))};
    if (yr[1] <= yr[0]) {
      yr[1] = 10 * yr[0];
    }
    notes.add("The requirements table sets no delay margin; the chart shows the achieved values only. "
        + "Delay margin = phase margin (rad, taken in [0, 2 pi)) / crossover frequency (rad/s), shown in ms.");
    XYChart chart = ChartSeries.chart(d.c.configuration() + ": delay margin against airspeed", unit.axisTitle(),
        "delay margin (ms, logarithmic)");
    chart.getStyler().setYAxisLogarithmic(true);
    return finish(d, unit, chart, xr, yr, curves, colors, strokes, Map.of(), notes, List.of(), null,
        "margins-delay-", "Smallest delay margin of the broken loop at every grid point, by frequency band.", null,
        EnumSet.noneOf(CheckKind.class));
  }

  private static ReportChart peakChart(Data d, SpeedAxisUnit unit) {
    List<String> notes = new ArrayList<>();
    Map<String, double[]> curves = new LinkedHashMap<>();
    Map<String, Color> colors = new LinkedHashMap<>();
    Map<String, BasicStroke> strokes = new LinkedHashMap<>();
    Map<String, double[][]> reqLines = new LinkedHashMap<>();
    List<double[]> all = new ArrayList<>();
    double[] xr = xRange(d, unit);
    Map<String, double[]> modePeaks = new LinkedHashMap<>();
    if (d.c.clearance() != null && !d.c.clearance().points().isEmpty()) {
      List<PointAssessment> pts = d.c.clearance().points();
      for (int i = 0; i < pts.size(); i++) {
        for (StructuralModeAssessment s : pts.get(i).structuralModes()) {
          double[] a = modePeaks.computeIfAbsent(s.modeName(), k -> nan(pts.size()));
          a[i] = s.peakDb();
        }
      }
      int m = 0;
      for (String name : d.c.modeNames()) {
        double[] a = modePeaks.get(name);
        if (a != null) {
          curves.put(name, a);
          colors.put(name, ReportStyle.seriesColor(m));
          strokes.put(name, ReportStyle.seriesStroke(m));
          all.add(a);
        }
        m++;
      }
      for (Map.Entry<String, double[]> e : modePeaks.entrySet()) {
        if (!curves.containsKey(e.getKey())) {
          curves.put(e.getKey(), e.getValue());
          colors.put(e.getKey(), ReportStyle.seriesColor(m));
          strokes.put(e.getKey(), ReportStyle.seriesStroke(m++));
          all.add(e.getValue());
        }
      }
      notes.add(String.format(Locale.ROOT, "Peak of 20 log10 |L| over each mode's band f (1 +- %.3g %%), f the "
          + "mode's current frequency; assessed in the normal envelope and up to V_L only (the table asks for "
          + "stability alone beyond V_L), so the lines end at V_L.", 100 * d.req.frequencyUncertainty()));
      double[][] lim = requirementSteps(d.req, null, d.eas[0], d.eas[d.eas.length - 1], unit,
          cell -> d.req.structuralPeakLimitDb());
      reqLines.put(PEAK_LIMIT_SERIES, lim);
      colors.put(PEAK_LIMIT_SERIES, ReportStyle.REQUIREMENT);
      all.add(lim[1]);
      notes.add(String.format(Locale.ROOT, "A mode whose peak exceeds the %.3g dB limit may still pass by phase "
          + "stabilisation (loop phase at least %.3g deg from -180 deg wherever |L| is above the limit); "
          + "see the per-speed table.", d.req.structuralPeakLimitDb(), d.req.phaseStabilisationMarginDeg()));
    } else {
      double[] a = new double[d.eas.length];
      for (int i = 0; i < a.length; i++) {
        a[i] = d.points.get(i).margins().peakGain().magnitudeDb();
      }
      curves.put(OVERALL_PEAK_SERIES, a);
      colors.put(OVERALL_PEAK_SERIES, ReportStyle.seriesColor(0));
      strokes.put(OVERALL_PEAK_SERIES, ReportStyle.seriesStroke(0));
      all.add(a);
      notes.add("No requirements table: the structural peak per mode is assessed only against a table; the chart "
          + "shows the largest |L| over the whole analysed band instead.");
    }
    double[] yr = ChartSeries.range(all, new double[] {0}, PEAK_AXIS_FLOOR_DB, 40);
    XYChart chart = ChartSeries.chart(d.c.configuration() + ": structural peak loop gain against airspeed",
        unit.axisTitle(), "peak loop gain 20 log10 |L| (dB)");
    List<MarginOnset> onsets = d.onsets(EnumSet.of(CheckKind.STRUCTURAL_MODE));
    double[] onsetY = new double[onsets.size()];
    for (int i = 0; i < onsets.size(); i++) {
      double[] a = modePeaks.get(onsets.get(i).key().subject());
      onsetY[i] = a == null ? d.req.structuralPeakLimitDb()
          : interpolate(d.eas, a, onsets.get(i).condition().speedEasMps());
    }
    ReportChart out = finish(d, unit, chart, xr, yr, curves, colors, strokes, reqLines, notes, onsets, onsetY,
        "margins-structural-", "Peak broken-loop gain near every structural mode at every grid point"
            + reqWords(d) + "; onset markers sit on the failing mode's curve.", "0",
        EnumSet.of(CheckKind.STRUCTURAL_MODE));
    stabilisationOverlays(d, out.chart(), unit, colors);
    return out;
  }

  /** Name of the overlay marking phase-stabilised stretches of the structural peak curves. */
  public static final String PHASE_STABILISED_SERIES = "phase-stabilised (wide pale band)";
  /** Name of the markers of mode-points that fail the structural rule. */
  public static final String STRUCTURAL_FAILED_SERIES = "fails gain and phase stabilisation";

  /**
   * Over the structural peak curves: a wide pale band of the mode's colour where the mode passes by
   * phase stabilisation only (its peak may be above the limit there), and a cross at every point
   * where it fails both, so that a reader never takes a phase-stabilised stretch for a failure or
   * the other way round. One legend entry each.
   */
  private static void stabilisationOverlays(Data d, XYChart chart, SpeedAxisUnit unit, Map<String, Color> colors) {
    if (d.c.clearance() == null || d.c.clearance().points().isEmpty()) {
      return;
    }
    List<PointAssessment> pts = d.c.clearance().points();
    double[] x = ChartSeries.speeds(d.eas, unit);
    Map<String, double[]> phase = new LinkedHashMap<>();
    List<double[]> failed = new ArrayList<>();
    for (int i = 0; i < Math.min(pts.size(), x.length); i++) {
      for (StructuralModeAssessment s : pts.get(i).structuralModes()) {
        if (s.status() == org.flexmargin.clearance.StructuralStabilisation.PHASE_STABILISED) {
          phase.computeIfAbsent(s.modeName(), k -> nan(x.length))[i] = s.peakDb();
        } else if (s.status() == org.flexmargin.clearance.StructuralStabilisation.FAILED) {
          failed.add(new double[] {x[i], s.peakDb()});
        }
      }
    }
    Set<String> used = new HashSet<>(chart.getSeriesMap().keySet());
    boolean first = true;
    for (Map.Entry<String, double[]> e : phase.entrySet()) {
      Color base = colors.getOrDefault(e.getKey(), ReportStyle.REGIME_LINE);
      double[] y = e.getValue();
      Color pale = new Color(base.getRed(), base.getGreen(), base.getBlue(), 70);
      // a wide pale line over the stretch; the round marker shows a stretch of a single grid point too
      XYSeries band = ChartSeries.line(chart, used, PHASE_STABILISED_SERIES + " " + e.getKey(), x, e.getValue(), pale,
          new BasicStroke(11f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
      band.setShowInLegend(false);
      band.setMarker(SeriesMarkers.CIRCLE);
      band.setMarkerColor(pale);
      if (first) {
        ChartSeries.line(chart, used, PHASE_STABILISED_SERIES, new double[] {Double.NaN}, new double[] {Double.NaN},
            new Color(0x80, 0x80, 0x80, 90), new BasicStroke(11f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        first = false;
      }
    }
    if (!failed.isEmpty()) {
      double[] fx = new double[failed.size()];
      double[] fy = new double[failed.size()];
      for (int i = 0; i < fx.length; i++) {
        fx[i] = failed.get(i)[0];
        fy[i] = failed.get(i)[1];
      }
      ChartSeries.markers(chart, used, STRUCTURAL_FAILED_SERIES, fx, fy, ReportStyle.REQUIREMENT, SeriesMarkers.CROSS);
    }
  }

  /** Adds curves, requirement lines, regime lines, onset markers and the notes, and wraps up. */
  private static ReportChart finish(Data d, SpeedAxisUnit unit, XYChart chart, double[] xr, double[] yr,
      Map<String, double[]> curves, Map<String, Color> colors, Map<String, BasicStroke> strokes,
      Map<String, double[][]> reqLines, List<String> notes, List<MarginOnset> onsets, double[] onsetY,
      String stemPrefix, String caption, String yPattern, Set<CheckKind> kinds) {
    chart.getStyler().setXAxisMin(xr[0]).setXAxisMax(xr[1]);
    chart.getStyler().setYAxisMin(yr[0]).setYAxisMax(yr[1]);
    chart.getStyler().setXAxisDecimalPattern("0.#");
    if (yPattern != null) {
      chart.getStyler().setYAxisDecimalPattern(yPattern);
    }
    Set<String> used = new HashSet<>();
    double[] x = ChartSeries.speeds(d.eas, unit);
    List<String> clipped = new ArrayList<>();
    for (Map.Entry<String, double[]> e : curves.entrySet()) {
      double[] y = e.getValue();
      int[] out = ChartSeries.outside(y, yr[0], yr[1]);
      if (out[0] + out[1] > 0) {
        clipped.add(e.getKey() + ": " + (out[0] + out[1]));
      }
      if (!hasData(y)) {
        y = nan(y.length);
      }
      ChartSeries.line(chart, used, e.getKey(), x, y, colors.get(e.getKey()), strokes.get(e.getKey()));
    }
    for (Map.Entry<String, double[][]> e : reqLines.entrySet()) {
      double[][] xy = e.getValue();
      if (xy[0].length > 0) {
        ChartSeries.line(chart, used, e.getKey(), xy[0], xy[1], colors.get(e.getKey()),
            ReportStyle.referenceStroke(2.6f, new float[] {2f, 4f}));
      }
    }
    if (!clipped.isEmpty()) {
      notes.add(String.format(Locale.ROOT, "Values outside %.3g to %.3g run off the plot (points per line: %s).",
          yr[0], yr[1], String.join(", ", clipped)));
    }
    if (d.req != null) {
      // named at their tops rather than in the legend, which keeps to the curves and requirements
      ChartSeries.regimeLines(chart, used, d.req, unit, xr, yr, notes, false);
    } else {
      notes.add("No requirements table in the case: no requirement lines, regime speeds or onsets.");
    }
    if (!onsets.isEmpty()) {
      double[] ox = new double[onsets.size()];
      double[] oy = new double[onsets.size()];
      for (int i = 0; i < onsets.size(); i++) {
        ox[i] = unit.fromMps(onsets.get(i).condition().speedEasMps());
        oy[i] = onsetY != null ? onsetY[i] : onsets.get(i).requiredValue();
      }
      ChartSeries.markers(chart, used, ONSET_SERIES, ox, oy, ReportStyle.MARGIN_ONSET, SeriesMarkers.DIAMOND);
      double dy = 0.05 * (yr[1] - yr[0]);
      for (int i = 0; i < ox.length; i++) {
        if (Double.isFinite(oy[i])) {
          chart.addAnnotation(new AnnotationText(String.format(Locale.ROOT, "%.1f %s", ox[i], unit.symbol()), ox[i],
              Math.min(oy[i] + dy, yr[1] - dy), false));
        }
      }
      chart.getStyler().setAnnotationTextFont(new Font(Font.SANS_SERIF, Font.BOLD, 12));
      chart.getStyler().setAnnotationTextFontColor(ReportStyle.ZERO_LINE);
      List<String> words = new ArrayList<>();
      for (MarginOnset m : onsets) {
        words.add(String.format(Locale.ROOT, "%s (%s) %.2f %s EAS%s", m.key().kind().key().replace('_', ' '),
            m.key().subject().replace('_', ' '), unit.fromMps(m.condition().speedEasMps()), unit.symbol(),
            m.refined() ? "" : ", not refined"));
      }
      notes.add("Margin onsets: " + String.join("; ", words) + ".");
    }
    List<Object[]> failing = d.failingWithoutOnset(kinds);
    if (!failing.isEmpty()) {
      List<String> words = new ArrayList<>();
      for (Object[] f : failing) {
        words.add(String.format(Locale.ROOT, "%s from %.1f %s EAS", f[0], unit.fromMps((Double) f[1]),
            unit.symbol()));
      }
      notes.add("Failing without a refined onset (already failing at its first assessed grid point, or the check "
          + "exists only where it fails): " + String.join("; ", words) + ".");
    }
    if (onsets.isEmpty() && failing.isEmpty() && d.req != null && !kinds.isEmpty()) {
      notes.add("These requirements are met at every assessed grid point.");
    }
    return new ReportChart(stemPrefix + ResultFiles.fileSafe(d.c.configuration()), caption, chart, notes);
  }

  /**
   * The required value as a step line over the plotted speeds: one horizontal segment per regime
   * (normal envelope up to V0max, up to V_L, up to factor x V_L), none beyond factor x V_L. With
   * a null band (structural peak limit) the line stops at V_L.
   *
   * @param req the table
   * @param band frequency band of the cells, or null for a value not in the cells
   * @param easLo lowest plotted speed, m/s EAS
   * @param easHi highest plotted speed, m/s EAS
   * @param unit display unit
   * @param value the cell's required value
   * @return {x (display unit), y}
   */
  static double[][] requirementSteps(ClearanceRequirements req, FrequencyBand band, double easLo,
      double easHi, SpeedAxisUnit unit, ToDoubleFunction<MarginCell> value) {
    double[] edges = {0, req.maxOperatingSpeedEasMps(), req.limitSpeedEasMps(), req.extendedSpeedEasMps()};
    SpeedRegime[] regimes = {SpeedRegime.NORMAL_ENVELOPE, SpeedRegime.UP_TO_LIMIT_SPEED,
        SpeedRegime.UP_TO_115_LIMIT_SPEED};
    int count = band == null ? 2 : 3;
    List<double[]> pts = new ArrayList<>();
    for (int r = 0; r < count; r++) {
      double lo = Math.max(edges[r], easLo);
      double hi = Math.min(edges[r + 1], easHi);
      if (!(hi > lo)) {
        continue;
      }
      double v = value.applyAsDouble(req.cell(band == null ? FrequencyBand.RIGID_BODY : band, regimes[r]));
      pts.add(new double[] {unit.fromMps(lo), v});
      pts.add(new double[] {unit.fromMps(hi), v});
    }
    double[][] out = new double[2][pts.size()];
    for (int i = 0; i < pts.size(); i++) {
      out[0][i] = pts.get(i)[0];
      out[1][i] = pts.get(i)[1];
    }
    return out;
  }

  static double[] xRange(Data d, SpeedAxisUnit unit) {
    double[] r = FlutterCharts.easRange(d.result);
    return new double[] {unit.fromMps(r[0]), unit.fromMps(r[1])};
  }

  private static String reqWords(Data d) {
    return d.req == null ? "" : "; dotted step lines: the required values by speed regime, diamonds: the refined "
        + "speeds at which a requirement is first violated";
  }

  static String bandWords(FrequencyBand band) {
    return switch (band) {
      case LOW_FREQUENCY -> "low-frequency";
      case RIGID_BODY -> "rigid-body";
      case AEROELASTIC -> "aeroelastic";
    };
  }

  static boolean hasData(double[] a) {
    for (double v : a) {
      if (Double.isFinite(v)) {
        return true;
      }
    }
    return false;
  }

  static double[] nan(int n) {
    double[] a = new double[n];
    java.util.Arrays.fill(a, Double.NaN);
    return a;
  }

  private static double[] concat(List<double[]> arrays) {
    return arrays.stream().flatMapToDouble(java.util.Arrays::stream).toArray();
  }

  /** Linear interpolation of y(x) at xq (x ascending); NaN neighbours give the other one. */
  static double interpolate(double[] x, double[] y, double xq) {
    for (int i = 0; i + 1 < x.length; i++) {
      if (xq >= x[i] && xq <= x[i + 1]) {
        double w = x[i + 1] > x[i] ? (xq - x[i]) / (x[i + 1] - x[i]) : 0;
        if (Double.isNaN(y[i])) {
          return y[i + 1];
        }
        if (Double.isNaN(y[i + 1])) {
          return y[i];
        }
        return y[i] + w * (y[i + 1] - y[i]);
      }
    }
    return Double.NaN;
  }

  /** Colour index of a frequency band: rigid body first, then aeroelastic, then low frequency. */
  private static int bandColorIndex(FrequencyBand band) {
    return band == FrequencyBand.RIGID_BODY ? 0 : band == FrequencyBand.AEROELASTIC ? 1 : 2;
  }

  /** Adds one solid curve of colour index ci. */
  private static void putCurve(Map<String, double[]> curves, Map<String, Color> colors,
      Map<String, BasicStroke> strokes, String name, double[] data, int ci) {
    curves.put(name, data);
    colors.put(name, ReportStyle.seriesColor(ci));
    strokes.put(name, ReportStyle.seriesStroke(0));
  }
}
