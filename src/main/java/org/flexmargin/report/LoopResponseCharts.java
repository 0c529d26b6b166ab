package org.flexmargin.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.SpeedRegime;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.ServoMargins;
import org.flexmargin.sweep.SweepResult;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Frequency-response charts of the broken loop L(j w) (negative-feedback convention, closed loop
 * 1/(1 + L)) at chosen airspeeds, with and without the case's notch filters: Bode gain, Bode
 * phase and Nichols, and the attenuation of every notch against the modal frequency bands.
 *
 * <p>L is evaluated here, exactly (exact aerodynamics and delays, {@link ServoLoop#brokenLoop()}),
 * on a frequency grid uniform in log f from {@link ServoMargins#MIN_FREQUENCY_HZ} to the top of the
 * margin analysis band, made denser around every in-vacuo mode frequency (0.6 to 1.4 times it)
 * and every notch centre, so that lightly damped peaks are drawn. "Notches removed" is the same
 * loop with every {@link NotchFilterSpec} taken out of every path (other filters kept).
 *
 * <p>Chosen speeds: with a requirements table V0max, V_L (when inside the sweep) and the grid
 * point where the clearance's worst loop check is worst (smallest normalised excess); without a
 * table three speeds at 1/6, 1/2 and 5/6 of the swept range. The Nichols chart shows the
 * exclusion region around the critical point (-180 deg, 0 dB): a diamond with corners at +-GM and
 * +-PM, the rigid-body normal-envelope margins of the table, or 6 dB and 45 deg (common practice)
 * without one. Phases are drawn wrapped into (-360, 0] deg with a gap at each wrap.
 */
public final class LoopResponseCharts {
  private LoopResponseCharts() {}

  /** Points of the base log-frequency grid. */
  public static final int BASE_POINTS = 400;
  /** Points added around each mode frequency and notch centre. */
  public static final int DENSE_POINTS = 150;
  /** Gain-margin half-height of the exclusion region without a requirements table, dB (common practice). */
  public static final double DEFAULT_EXCLUSION_GAIN_DB = 6.0;
  /** Phase half-width of the exclusion region without a requirements table, deg (common practice). */
  public static final double DEFAULT_EXCLUSION_PHASE_DEG = 45.0;
  /** Gain axis limits of Bode and Nichols charts, dB. */
  public static final double GAIN_AXIS_FLOOR_DB = -60.0;
  /** Gain axis ceiling, dB. */
  public static final double GAIN_AXIS_CEILING_DB = 40.0;
  /** Name of the exclusion region series. */
  public static final String EXCLUSION_SERIES_PREFIX = "margin exclusion region";
  /** Name of the critical point series. */
  public static final String CRITICAL_POINT_SERIES = "critical point (-180 deg, 0 dB)";

  /**
   * An airspeed at which the loop is drawn.
   *
   * @param label why this speed, e.g. "V0max", "V_L", "worst loop check"
   * @param speedEasMps equivalent airspeed, m/s
   */
  public record ChosenSpeed(String label, double speedEasMps) {}

  /**
   * L(j w) sampled at one speed.
   *
   * @param speed the speed
   * @param notches whether the case's notch filters are in the loop
   * @param frequencyHz ascending frequencies, Hz
   * @param gainDb 20 log10 |L|, dB
   * @param phaseDeg arg L unwrapped along the grid (continuous), starting from the principal value
   *     at the lowest frequency, deg
   */
  public record Response(ChosenSpeed speed, boolean notches, double[] frequencyHz, double[] gainDb,
      double[] phaseDeg) {}

  /**
   * @param speed chosen speed
   * @param notches with notches
   * @param unit speed unit
   * @return the legend name of that response
   */
  public static String responseSeries(ChosenSpeed speed, boolean notches, SpeedAxisUnit unit) {
    return String.format(Locale.ROOT, "%s %.1f %s, %s", speed.label(), unit.fromMps(speed.speedEasMps()),
        unit.symbol(), notches ? "with notches" : "notches removed");
  }

  /**
   * @param gainDb half-height, dB
   * @param phaseDeg half-width, deg
   * @return name of the exclusion region series
   */
  public static String exclusionSeries(double gainDb, double phaseDeg) {
    return String.format(Locale.ROOT, "%s (+-%.3g dB, +-%.3g deg)", EXCLUSION_SERIES_PREFIX, gainDb, phaseDeg);
  }

  /**
   * @param n notch
   * @param path path index
   * @param sensor sensor name of the path
   * @return name of a notch attenuation series
   */
  public static String notchSeries(NotchFilterSpec n, int path, String sensor) {
    return String.format(Locale.ROOT, "notch %.4g Hz, depth %.3g dB (%s path)", n.centreHz(), n.depthDb(), sensor);
  }

  /**
   * @param mode mode name
   * @param lo band low edge, Hz
   * @param hi band high edge, Hz
   * @return name of a modal frequency band series
   */
  public static String bandSeries(String mode, double lo, double hi) {
    return String.format(Locale.ROOT, "%s %.3g to %.3g Hz", mode, lo, hi);
  }

  /**
   * @param loop the case's loop
   * @return the same loop with every notch filter removed from every path
   */
  public static LoopSpec withoutNotches(LoopSpec loop) {
    List<FeedbackPath> paths = new ArrayList<>();
    for (FeedbackPath p : loop.paths()) {
      List<FilterSpec> kept = p.filters().stream().filter(f -> !(f instanceof NotchFilterSpec)).toList();
      paths.add(new FeedbackPath(p.sensor(), p.proportionalGain(), p.integralGainPerS(), kept, p.schedule()));
    }
    return new LoopSpec(loop.actuator(), loop.sensors(), paths, loop.computationDelayS(), loop.samplePeriodS(),
        loop.padeOrder());
  }

  /** @return whether any path of the loop has a notch */
  static boolean hasNotches(LoopSpec loop) {
    return loop.paths().stream().anyMatch(p -> p.filters().stream().anyMatch(f -> f instanceof NotchFilterSpec));
  }

  /**
   * @param result the sweep
   * @param c one configuration
   * @return the speeds at which to draw the loop, ascending, without near-duplicates
   */
  public static List<ChosenSpeed> chosenSpeeds(SweepResult result, ConfigurationResult c) {
    double[] r = FlutterCharts.easRange(result);
    List<ChosenSpeed> out = new ArrayList<>();
    ClearanceRequirements req = result.analysisCase().requirements();
    if (req != null && c.clearance() != null) {
      add(out, new ChosenSpeed("V0max", req.maxOperatingSpeedEasMps()), r);
      add(out, new ChosenSpeed("V_L", req.limitSpeedEasMps()), r);
      PointAssessment worst = null;
      for (PointAssessment p : c.clearance().points()) {
        if (p.worstNormalisedExcess().isPresent() && (worst == null
            || p.worstNormalisedExcess().getAsDouble() < worst.worstNormalisedExcess().getAsDouble())) {
          worst = p;
        }
      }
      if (worst != null) {
        add(out, new ChosenSpeed("worst loop check", worst.speedEasMps()), r);
      }
    }
    if (out.isEmpty()) {
      for (double f : new double[] {1.0 / 6, 0.5, 5.0 / 6}) {
        add(out, new ChosenSpeed(String.format(Locale.ROOT, "%.0f %% of range", 100 * f),
            r[0] + f * (r[1] - r[0])), r);
      }
    }
    out.sort((a, b) -> Double.compare(a.speedEasMps(), b.speedEasMps()));
    return out;
  }

  private static void add(List<ChosenSpeed> out, ChosenSpeed s, double[] range) {
    if (s.speedEasMps() < range[0] - 1e-9 || s.speedEasMps() > range[1] + 1e-9) {
      return;
    }
    for (ChosenSpeed o : out) {
      if (Math.abs(o.speedEasMps() - s.speedEasMps()) < 1e-6 * Math.max(1, s.speedEasMps())) {
        return;
      }
    }
    out.add(s);
  }

  /**
   * The flight condition on the sweep path at an equivalent airspeed: the path parameter is
   * interpolated linearly in EAS between the grid points that bracket it (exact for a speed
   * sweep in EAS).
   *
   * @param result the sweep
   * @param speedEasMps EAS, m/s, within the swept range
   * @return the condition
   */
  public static FlightCondition conditionAt(SweepResult result, double speedEasMps) {
    PlannedPath path = new PlannedPath(result.analysisCase().sweep());
    int n = path.gridPoints();
    double prev = path.at(0).speedEasMps();
    if (n == 1) {
      return path.at(0);
    }
    for (int i = 0; i + 1 < n; i++) {
      double next = path.at(i + 1).speedEasMps();
      double lo = Math.min(prev, next);
      double hi = Math.max(prev, next);
      if (speedEasMps >= lo - 1e-9 && speedEasMps <= hi + 1e-9) {
        double w = next == prev ? 0 : (speedEasMps - prev) / (next - prev);
        return path.at(i + Math.min(Math.max(w, 0), 1));
      }
      prev = next;
    }
    throw new IllegalArgumentException("speed " + speedEasMps + " m/s EAS outside the sweep");
  }

  /**
   * @param c configuration (mode frequencies)
   * @param loop loop (notch centres)
   * @param topHz top of the band, Hz
   * @return ascending frequencies, Hz
   */
  public static double[] frequencyGridHz(ConfigurationResult c, LoopSpec loop, double topHz) {
    TreeSet<Double> f = new TreeSet<>();
    double lo = ServoMargins.MIN_FREQUENCY_HZ;
    logSpace(f, lo, topHz, BASE_POINTS);
    List<Double> centres = new ArrayList<>();
    for (double m : c.modeFrequenciesHz()) {
      centres.add(m);
    }
    for (FeedbackPath p : loop.paths()) {
      for (FilterSpec s : p.filters()) {
        if (s instanceof NotchFilterSpec n) {
          centres.add(n.centreHz());
        }
      }
    }
    for (double m : centres) {
      logSpace(f, Math.max(lo, 0.6 * m), Math.min(topHz, 1.4 * m), DENSE_POINTS);
    }
    return f.stream().mapToDouble(Double::doubleValue).toArray();
  }

  private static void logSpace(TreeSet<Double> out, double lo, double hi, int n) {
    if (!(hi > lo)) {
      return;
    }
    double a = Math.log(lo);
    double b = Math.log(hi);
    for (int i = 0; i < n; i++) {
      out.add(Math.exp(a + (b - a) * i / (n - 1)));
    }
  }

  /**
   * Samples a frequency function.
   *
   * @param speed the speed (for the record)
   * @param notches with notches (for the record)
   * @param fn L(j w)
   * @param frequencyHz ascending frequencies, Hz
   * @return gains and unwrapped phases
   */
  public static Response sample(ChosenSpeed speed, boolean notches, SisoFrequencyFunction fn, double[] frequencyHz) {
    int n = frequencyHz.length;
    double[] g = new double[n];
    double[] ph = new double[n];
    double[] v = new double[2];
    double prev = Double.NaN;
    for (int i = 0; i < n; i++) {
      fn.response(2 * Math.PI * frequencyHz[i], v);
      double mag = Math.hypot(v[0], v[1]);
      g[i] = mag > 0 ? 20 * Math.log10(mag) : Double.NEGATIVE_INFINITY;
      double p = Math.toDegrees(Math.atan2(v[1], v[0]));
      if (!Double.isNaN(prev)) {
        p += 360 * Math.rint((prev - p) / 360);
      }
      ph[i] = p;
      prev = p;
    }
    return new Response(speed, notches, frequencyHz.clone(), g, ph);
  }

  /**
   * Computes the responses at the chosen speeds, with and (if the loop has notches) without notches.
   *
   * @param result the sweep (with a loop)
   * @param c one configuration
   * @return responses, speed by speed, with-notches first
   */
  public static List<Response> responses(SweepResult result, ConfigurationResult c) {
    LoopSpec loop = result.analysisCase().loop();
    Configuration conf = result.analysisCase().configurations().stream()
        .filter(x -> x.name().equals(c.configuration())).findFirst().orElseThrow();
    ConfigurationModel model = ConfigurationModel.of(conf);
    double top = ServoMargins.bandTopHz(model);
    double[] f = frequencyGridHz(c, loop, top);
    LoopSpec bare = hasNotches(loop) ? withoutNotches(loop) : null;
    List<Response> out = new ArrayList<>();
    for (ChosenSpeed s : chosenSpeeds(result, c)) {
      FlightCondition fc = conditionAt(result, s.speedEasMps());
      out.add(sample(s, true, ServoMargins.loopAt(model, conf, loop, fc).brokenLoop(), f));
      if (bare != null) {
        out.add(sample(s, false, ServoMargins.loopAt(model, conf, bare, fc).brokenLoop(), f));
      }
    }
    return out;
  }

  /**
   * @param result the sweep
   * @param c one configuration with loop results
   * @param unit speed unit of the legends
   * @return Bode gain, Bode phase, Nichols, notch attenuation (the last only if the loop has notches)
   */
  public static List<ReportChart> of(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit) {
    if (c.servo() == null || result.analysisCase().loop() == null) {
      return List.of();
    }
    List<Response> rs = responses(result, c);
    List<ReportChart> out = new ArrayList<>();
    out.add(bodeGain(result, c, rs, unit));
    out.add(bodePhase(result, c, rs, unit));
    out.add(nichols(result, c, rs, unit));
    if (hasNotches(result.analysisCase().loop())) {
      out.add(notchChart(result, c));
    }
    return out;
  }

  private static String speedWords(List<Response> rs, SpeedAxisUnit unit) {
    List<String> w = new ArrayList<>();
    for (Response r : rs) {
      if (r.notches()) {
        w.add(String.format(Locale.ROOT, "%s %.1f %s", r.speed().label(), unit.fromMps(r.speed().speedEasMps()),
            unit.symbol()));
      }
    }
    return String.join(", ", w);
  }

  private static Color speedColor(int index) {
    int[] pick = {0, 1, 3, 2, 4, 5};
    return ReportStyle.seriesColor(pick[index % pick.length]);
  }

  private static BasicStroke responseStroke(boolean notches) {
    return notches ? new BasicStroke(2.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND)
        : ReportStyle.referenceStroke(1.3f, new float[] {6f, 3f});
  }

  private static ReportChart bodeGain(SweepResult result, ConfigurationResult c, List<Response> rs,
      SpeedAxisUnit unit) {
    XYChart chart = ChartSeries.chart(c.configuration() + ": broken-loop gain (Bode)", "frequency (Hz, logarithmic)",
        "gain 20 log10 |L| (dB)");
    chart.getStyler().setXAxisLogarithmic(true);
    Set<String> used = new HashSet<>();
    List<double[]> ys = new ArrayList<>();
    for (Response r : rs) {
      ys.add(r.gainDb());
    }
    double[] yr = ChartSeries.range(ys, new double[] {0}, GAIN_AXIS_FLOOR_DB, GAIN_AXIS_CEILING_DB);
    double[] f = rs.get(0).frequencyHz();
    chart.getStyler().setXAxisMin(f[0]).setXAxisMax(f[f.length - 1]);
    chart.getStyler().setYAxisMin(yr[0]).setYAxisMax(yr[1]);
    chart.getStyler().setYAxisDecimalPattern("0");
    addResponses(chart, used, rs, unit, false);
    ChartSeries.line(chart, used, "0 dB", new double[] {f[0], f[f.length - 1]}, new double[] {0, 0},
        ReportStyle.ZERO_LINE, ReportStyle.referenceStroke(1.4f, null));
    ClearanceRequirements req = result.analysisCase().requirements();
    if (req != null) {
      ChartSeries.line(chart, used, String.format(Locale.ROOT, "structural peak limit %.3g dB",
          req.structuralPeakLimitDb()), new double[] {f[0], f[f.length - 1]},
          new double[] {req.structuralPeakLimitDb(), req.structuralPeakLimitDb()}, ReportStyle.REQUIREMENT,
          ReportStyle.referenceStroke(1.6f, new float[] {2f, 4f}));
    }
    List<String> notes = new ArrayList<>(commonNotes(rs));
    clipNote(notes, rs, yr, true);
    return new ReportChart("bode-gain-" + ResultFiles.fileSafe(c.configuration()),
        "Gain of the broken loop L(j w) at " + speedWords(rs, unit) + "; solid with the case's notch filters, "
            + "dashed with the notches removed.", chart, notes);
  }

  private static ReportChart bodePhase(SweepResult result, ConfigurationResult c, List<Response> rs,
      SpeedAxisUnit unit) {
    XYChart chart = ChartSeries.chart(c.configuration() + ": broken-loop phase (Bode)",
        "frequency (Hz, logarithmic)", "phase arg L (deg, wrapped into -360 to 0)");
    chart.getStyler().setXAxisLogarithmic(true);
    Set<String> used = new HashSet<>();
    double[] f = rs.get(0).frequencyHz();
    chart.getStyler().setXAxisMin(f[0]).setXAxisMax(f[f.length - 1]);
    chart.getStyler().setYAxisMin(-360.0).setYAxisMax(0.0);
    chart.getStyler().setYAxisDecimalPattern("0");
    addResponses(chart, used, rs, unit, true);
    ChartSeries.line(chart, used, "-180 deg", new double[] {f[0], f[f.length - 1]}, new double[] {-180, -180},
        ReportStyle.ZERO_LINE, ReportStyle.referenceStroke(1.4f, null));
    List<String> notes = new ArrayList<>(commonNotes(rs));
    notes.add("Phase wrapped into (-360, 0] deg; the lines break where they wrap.");
    return new ReportChart("bode-phase-" + ResultFiles.fileSafe(c.configuration()),
        "Phase of the broken loop L(j w) at " + speedWords(rs, unit) + "; solid with notches, dashed without.",
        chart, notes);
  }

  private static void addResponses(XYChart chart, Set<String> used, List<Response> rs, SpeedAxisUnit unit,
      boolean phase) {
    int si = -1;
    ChosenSpeed last = null;
    for (Response r : rs) {
      if (r.speed() != last) {
        si++;
        last = r.speed();
      }
      double[][] xy = phase ? wrapped(r.frequencyHz(), r.phaseDeg(), r.phaseDeg())
          : new double[][] {r.frequencyHz(), finite(r.gainDb())};
      ChartSeries.line(chart, used, responseSeries(r.speed(), r.notches(), unit), xy[0], xy[1],
          speedColor(si), responseStroke(r.notches()));
    }
  }

  private static ReportChart nichols(SweepResult result, ConfigurationResult c, List<Response> rs,
      SpeedAxisUnit unit) {
    XYChart chart = ChartSeries.chart(c.configuration() + ": Nichols chart of the broken loop",
        "phase arg L (deg, wrapped into -360 to 0)", "gain 20 log10 |L| (dB)");
    Set<String> used = new HashSet<>();
    List<double[]> ys = new ArrayList<>();
    for (Response r : rs) {
      ys.add(r.gainDb());
    }
    double[] exclusion = exclusionHalfSizes(result);
    double gm = exclusion[0];
    double pm = exclusion[1];
    double[] yr = ChartSeries.range(ys, new double[] {gm + 3, -gm - 3}, GAIN_AXIS_FLOOR_DB, GAIN_AXIS_CEILING_DB);
    chart.getStyler().setXAxisMin(-360.0).setXAxisMax(0.0);
    chart.getStyler().setYAxisMin(yr[0]).setYAxisMax(yr[1]);
    chart.getStyler().setXAxisDecimalPattern("0");
    chart.getStyler().setYAxisDecimalPattern("0");
    int si = -1;
    ChosenSpeed last = null;
    for (Response r : rs) {
      if (r.speed() != last) {
        si++;
        last = r.speed();
      }
      double[][] xy = wrapped(r.frequencyHz(), r.phaseDeg(), finite(r.gainDb()));
      ChartSeries.line(chart, used, responseSeries(r.speed(), r.notches(), unit), xy[1], xy[2], speedColor(si),
          responseStroke(r.notches()));
    }
    double[][] d = exclusionRegion(gm, pm);
    ChartSeries.line(chart, used, exclusionSeries(gm, pm), d[0], d[1], ReportStyle.REQUIREMENT,
        ReportStyle.referenceStroke(2.6f, null));
    ChartSeries.markers(chart, used, CRITICAL_POINT_SERIES, new double[] {-180}, new double[] {0},
        ReportStyle.ZERO_LINE, SeriesMarkers.CROSS);
    List<String> notes = new ArrayList<>(commonNotes(rs));
    notes.add(result.analysisCase().requirements() != null
        ? String.format(Locale.ROOT, "Exclusion region: diamond with corners at -180 +- %.3g deg, 0 dB and -180 deg, "
            + "+-%.3g dB, the required rigid-body margins of the normal envelope (common practice for reading a "
            + "Nichols chart); a curve that avoids it has at least these margins at its crossings.", pm, gm)
        : String.format(Locale.ROOT, "No requirements table: exclusion region drawn for +-%.3g dB and +-%.3g deg "
            + "(common practice).", gm, pm));
    notes.add("Phase wrapped into (-360, 0] deg; the lines break where they wrap.");
    clipNote(notes, rs, yr, true);
    return new ReportChart("nichols-" + ResultFiles.fileSafe(c.configuration()),
        "Nichols chart (gain against phase) of L(j w) at " + speedWords(rs, unit)
            + "; solid with notches, dashed without; red diamond: the margin exclusion region around the "
            + "critical point.", chart, notes);
  }

  /**
   * @param result the sweep
   * @return {gain half-height dB, phase half-width deg} of the Nichols exclusion region: the
   *     rigid-body normal-envelope cell of the table, or 6 dB and 45 deg without one
   */
  public static double[] exclusionHalfSizes(SweepResult result) {
    ClearanceRequirements req = result.analysisCase().requirements();
    if (req == null) {
      return new double[] {DEFAULT_EXCLUSION_GAIN_DB, DEFAULT_EXCLUSION_PHASE_DEG};
    }
    MarginCell cell = req.cell(FrequencyBand.RIGID_BODY, SpeedRegime.NORMAL_ENVELOPE);
    return new double[] {cell.gainMarginDb(), cell.phaseMarginDeg()};
  }

  /**
   * @param gainDb half-height, dB
   * @param phaseDeg half-width, deg
   * @return the closed diamond {phase deg, gain dB}: left, top, right, bottom, left corner
   */
  static double[][] exclusionRegion(double gainDb, double phaseDeg) {
    return new double[][] {
      {-180 - phaseDeg, -180, -180 + phaseDeg, -180, -180 - phaseDeg},
      {0, gainDb, 0, -gainDb, 0}
    };
  }

  /**
   * Wraps phases into (-360, 0] and inserts a gap (NaN in every row) where the wrapped phase jumps.
   *
   * @return {x, wrapped phase, y} with gaps
   */
  static double[][] wrapped(double[] x, double[] phaseDeg, double[] y) {
    List<double[]> out = new ArrayList<>();
    double prev = Double.NaN;
    for (int i = 0; i < x.length; i++) {
      double w = phaseDeg[i] % 360;
      if (w > 0) {
        w -= 360;
      }
      if (w <= -360) {
        w += 360;
      }
      if (!Double.isNaN(prev) && Math.abs(w - prev) > 180) {
        out.add(new double[] {Double.NaN, Double.NaN, Double.NaN});
      }
      out.add(new double[] {x[i], w, y[i]});
      prev = w;
    }
    double[][] r = new double[3][out.size()];
    for (int i = 0; i < out.size(); i++) {
      r[0][i] = out.get(i)[0];
      r[1][i] = out.get(i)[1];
      r[2][i] = out.get(i)[2];
    }
    return r;
  }

  private static double[] finite(double[] a) {
    double[] out = a.clone();
    for (int i = 0; i < out.length; i++) {
      if (!Double.isFinite(out[i])) {
        out[i] = Double.NaN;
      }
    }
    return out;
  }

  private static List<String> commonNotes(List<Response> rs) {
    List<String> n = new ArrayList<>();
    n.add(String.format(Locale.ROOT, "L(j w) evaluated exactly (exact aerodynamics and delays) at %d frequencies "
        + "from %.3g to %.3g Hz, uniform in log f and denser around every mode frequency and notch centre.",
        rs.get(0).frequencyHz().length, rs.get(0).frequencyHz()[0],
        rs.get(0).frequencyHz()[rs.get(0).frequencyHz().length - 1]));
    if (rs.stream().noneMatch(r -> !r.notches())) {
      n.add("The loop has no notch filter; only the loop as given is drawn.");
    } else {
      n.add("Dashed: the same loop with every notch filter of every path removed (other filters, gains and "
          + "schedules unchanged).");
    }
    return n;
  }

  private static void clipNote(List<String> notes, List<Response> rs, double[] yr, boolean gain) {
    int out = 0;
    for (Response r : rs) {
      int[] o = ChartSeries.outside(r.gainDb(), yr[0], yr[1]);
      out += o[0] + o[1];
    }
    if (out > 0 && gain) {
      notes.add(String.format(Locale.ROOT, "%d samples with gains outside %.0f to %.0f dB (mostly the integral "
          + "action at the lowest frequencies) run off the plot.", out, yr[0], yr[1]));
    }
  }

  /**
   * The attenuation of each notch of the loop against the modal frequency bands.
   *
   * @param result the sweep
   * @param c one configuration
   * @return the chart
   */
  public static ReportChart notchChart(SweepResult result, ConfigurationResult c) {
    LoopSpec loop = result.analysisCase().loop();
    ClearanceRequirements req = result.analysisCase().requirements();
    double u = req != null ? req.frequencyUncertainty() : ClearanceRequirements.DEFAULT_FREQUENCY_UNCERTAINTY;
    double[] fm = c.modeFrequenciesHz();
    double fMax = 1;
    for (double v : fm) {
      fMax = Math.max(fMax, v);
    }
    double lo = 0.5;
    double hi = 2 * fMax;
    TreeSet<Double> grid = new TreeSet<>();
    logSpace(grid, lo, hi, 1200);
    double[] f = grid.stream().mapToDouble(Double::doubleValue).toArray();
    XYChart chart = ChartSeries.chart(c.configuration() + ": notch filter attenuation and modal frequency bands",
        "frequency (Hz, logarithmic)", "notch gain 20 log10 |N| (dB)");
    chart.getStyler().setXAxisLogarithmic(true);
    Set<String> used = new HashSet<>();
    double minDb = 0;
    List<double[]> curves = new ArrayList<>();
    List<String> names = new ArrayList<>();
    double[] v = new double[2];
    for (int p = 0; p < loop.paths().size(); p++) {
      FeedbackPath path = loop.paths().get(p);
      for (FilterSpec s : path.filters()) {
        if (s instanceof NotchFilterSpec n) {
          NotchFilter nf = new NotchFilter(n.centreHz(), n.numeratorDampingRatio(), n.denominatorDampingRatio());
          double[] db = new double[f.length];
          for (int i = 0; i < f.length; i++) {
            nf.response(2 * Math.PI * f[i], v);
            db[i] = 20 * Math.log10(Math.max(Math.hypot(v[0], v[1]), 1e-6));
            minDb = Math.min(minDb, db[i]);
          }
          curves.add(db);
          names.add(notchSeries(n, p, path.sensor()));
        }
      }
    }
    double yLo = Math.max(-60, Math.floor((minDb - 3) / 5) * 5);
    double yHi = 3;
    chart.getStyler().setXAxisMin(lo).setXAxisMax(hi).setYAxisMin(yLo).setYAxisMax(yHi);
    chart.getStyler().setYAxisDecimalPattern("0");
    for (int m = 0; m < fm.length; m++) {
      double bl = fm[m] * (1 - u);
      double bh = fm[m] * (1 + u);
      Color base = ReportStyle.seriesColor(m);
      Color fill = new Color(base.getRed(), base.getGreen(), base.getBlue(), 46);
      // an area series fills between its line and y = 0: one above and one below 0 cover the band
      XYSeries s = chart.addSeries(ChartSeries.unique(bandSeries(c.modeNames().get(m), bl, bh), used),
          new double[] {bl, bh}, new double[] {yHi, yHi});
      s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Area);
      s.setMarker(SeriesMarkers.NONE);
      s.setFillColor(fill);
      s.setLineColor(new Color(base.getRed(), base.getGreen(), base.getBlue(), 150));
      s.setLineStyle(new BasicStroke(8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
      XYSeries below = chart.addSeries(ChartSeries.unique(bandSeries(c.modeNames().get(m), bl, bh) + " (lower half)",
          used), new double[] {bl, bh}, new double[] {yLo, yLo});
      below.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Area);
      below.setMarker(SeriesMarkers.NONE);
      below.setFillColor(fill);
      below.setLineColor(fill);
      below.setLineStyle(new BasicStroke(0.5f));
      below.setShowInLegend(false);
    }
    for (int i = 0; i < curves.size(); i++) {
      ChartSeries.line(chart, used, names.get(i), f, curves.get(i), ReportStyle.ZERO_LINE,
          new BasicStroke(2.4f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
    }
    List<String> notes = new ArrayList<>();
    notes.add(String.format(Locale.ROOT, "Shaded: in-vacuo frequency of each mode +- %.3g %% (%s), in the colour of "
        + "the mode's line in the other charts. Coupled frequencies move with airspeed (see the V-f diagrams).",
        100 * u, req != null ? "the requirement's frequency uncertainty" : "common practice, no requirements table"));
    notes.add("Exact notch response N(j w) = (w_n^2 - w^2 + 2j zeta_z w_n w) / (w_n^2 - w^2 + 2j zeta_p w_n w).");
    return new ReportChart("notches-" + ResultFiles.fileSafe(c.configuration()),
        "Attenuation of every notch filter of the loop against frequency, with the uncertainty band of every "
            + "structural mode shaded.", chart, notes);
  }
}
