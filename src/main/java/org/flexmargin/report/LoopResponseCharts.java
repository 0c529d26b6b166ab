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
import org.flexmargin.simulate.SharedModels;
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
 * +-PM, one for each frequency band (rigid-body and aeroelastic normal-envelope margins of the
 * table, or 6 dB and 45 deg, common practice, without one), repeated at every -180 + k 360 deg in
 * range. Phases are drawn continuous (unwrapped along frequency), never wrapped.
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
   * @param phaseDeg arg L unwrapped along the grid (continuous), shifted by whole turns so that it
   *     starts in (-360, 0] deg at the lowest frequency, deg
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
  /**
   * @param n a proposed notch
   * @return name of its attenuation series
   */
  public static String proposedNotchSeries(NotchFilterSpec n) {
    return String.format(Locale.ROOT, "proposed notch %.4g Hz, depth %.3g dB", n.centreHz(), n.depthDb());
  }

  /** @return 20 log10 |N(j 2 pi f)| of a notch at every frequency, dB (floored at -120 dB) */
  private static double[] notchDb(NotchFilterSpec n, double[] f) {
    NotchFilter nf = new NotchFilter(n.centreHz(), n.numeratorDampingRatio(), n.denominatorDampingRatio());
    double[] v = new double[2];
    double[] db = new double[f.length];
    for (int i = 0; i < f.length; i++) {
      nf.response(2 * Math.PI * f[i], v);
      db[i] = 20 * Math.log10(Math.max(Math.hypot(v[0], v[1]), 1e-6));
    }
    return db;
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
   * @return the speeds at which to draw the loop, ascending; a speed chosen for two reasons is
   *     drawn once with both in its label
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
    for (int i = 0; i < out.size(); i++) {
      ChosenSpeed o = out.get(i);
      if (Math.abs(o.speedEasMps() - s.speedEasMps()) < 1e-6 * Math.max(1, s.speedEasMps())) {
        // one curve, both reasons in its label (e.g. "V0max, worst loop check")
        out.set(i, new ChosenSpeed(o.label() + ", " + s.label(), o.speedEasMps()));
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
    // the whole curve shifted by whole turns so that it starts in (-360, 0] deg, as loop phases are read
    double shift = n == 0 ? 0 : -360 * Math.ceil(ph[0] / 360);
    for (int i = 0; i < n; i++) {
      ph[i] += shift;
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
    return responses(result, c, new SharedModels());
  }

  /**
   * As {@link #responses(SweepResult, ConfigurationResult)}, with the configuration's model taken
   * from the run's shared models.
   *
   * @param result the sweep
   * @param c one configuration's result (with a loop)
   * @param models the run's models
   * @return responses, speed by speed, with-notches first
   */
  public static List<Response> responses(SweepResult result, ConfigurationResult c, SharedModels models) {
    LoopSpec loop = result.analysisCase().loop();
    Configuration conf = configuration(result, c);
    ConfigurationModel model = models.of(conf);
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
    return of(result, c, unit, null);
  }

  /**
   * @param result the sweep
   * @param c one configuration with loop results
   * @param unit speed unit of the legends
   * @param proposed a notch design to draw beside the case's loop, or null
   * @return Bode gain, Bode phase, Nichols (each with a "with proposed notches" curve per speed when
   *     a design is given), notch attenuation (when the loop or the design has notches; the
   *     proposed notches dashed)
   */
  public static List<ReportChart> of(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit,
      ProposedNotches proposed) {
    return of(result, c, unit, proposed, new SharedModels());
  }

  /**
   * As {@link #of(SweepResult, ConfigurationResult, SpeedAxisUnit, ProposedNotches)}, with the
   * configuration's model taken from the run's shared models.
   *
   * @param models the run's models
   */
  public static List<ReportChart> of(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit,
      ProposedNotches proposed, SharedModels models) {
    if (c.servo() == null || result.analysisCase().loop() == null) {
      return List.of();
    }
    List<Response> rs = responses(result, c, models);
    List<Response> prop = proposed == null ? List.of() : proposedResponses(result, c, proposed, rs, models);
    List<ReportChart> out = new ArrayList<>();
    out.add(withProposed(bodeGain(result, c, rs, unit), prop, unit, 0));
    out.add(withProposed(bodePhase(result, c, rs, unit), prop, unit, 1));
    out.add(withProposed(nichols(result, c, rs, unit), prop, unit, 2));
    if (hasNotches(result.analysisCase().loop()) || proposed != null) {
      out.add(notchChart(result, c, proposed));
    }
    return out;
  }

  /**
   * @param speed chosen speed
   * @param unit speed unit
   * @return the legend name of the response with the proposed notches
   */
  public static String proposedSeries(ChosenSpeed speed, SpeedAxisUnit unit) {
    return String.format(Locale.ROOT, "%s %.1f %s, with proposed notches", speed.label(),
        unit.fromMps(speed.speedEasMps()), unit.symbol());
  }

  /** @return the case's configuration of a result */
  private static Configuration configuration(SweepResult result, ConfigurationResult c) {
    return result.analysisCase().configurations().stream()
        .filter(x -> x.name().equals(c.configuration())).findFirst().orElseThrow();
  }

  /** The loop with the proposed notches at the same speeds and frequencies as the case's responses. */
  private static List<Response> proposedResponses(SweepResult result, ConfigurationResult c, ProposedNotches p,
      List<Response> rs, SharedModels models) {
    Configuration conf = configuration(result, c);
    ConfigurationModel model = models.of(conf);
    List<Response> out = new ArrayList<>();
    for (Response r : rs) {
      if (r.notches()) {
        FlightCondition fc = conditionAt(result, r.speed().speedEasMps());
        out.add(sample(r.speed(), true, ServoMargins.loopAt(model, conf, p.loop(), fc).brokenLoop(), r.frequencyHz()));
      }
    }
    return out;
  }

  /** Adds the proposed-notch curves (thick dotted, the speed's colour) to a Bode (0, 1) or Nichols (2) chart. */
  private static ReportChart withProposed(ReportChart rc, List<Response> prop, SpeedAxisUnit unit, int kind) {
    if (prop.isEmpty()) {
      return rc;
    }
    Set<String> used = new HashSet<>(rc.chart().getSeriesMap().keySet());
    for (int i = 0; i < prop.size(); i++) {
      Response r = prop.get(i);
      double[] g = finite(r.gainDb());
      double[] x = kind == 2 ? r.phaseDeg() : r.frequencyHz();
      double[] y = kind == 1 ? r.phaseDeg() : g;
      ChartSeries.line(rc.chart(), used, proposedSeries(r.speed(), unit), x, y, speedColor(i),
          ReportStyle.referenceStroke(2.8f, new float[] {1.5f, 3.5f}));
    }
    List<String> notes = new ArrayList<>(rc.notes());
    notes.add("Dotted: the same loop with the proposed notch design in place of the case's notches.");
    return new ReportChart(rc.fileStem(), rc.caption() + " Dotted: with the proposed notches.", rc.chart(), notes);
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
        "frequency (Hz, logarithmic)", "phase arg L (deg, continuous)");
    chart.getStyler().setXAxisLogarithmic(true);
    Set<String> used = new HashSet<>();
    double[] f = rs.get(0).frequencyHz();
    double[] pr = phaseRange(rs);
    chart.getStyler().setXAxisMin(f[0]).setXAxisMax(f[f.length - 1]);
    chart.getStyler().setYAxisMin(pr[0]).setYAxisMax(pr[1]);
    chart.getStyler().setYAxisDecimalPattern("0");
    addResponses(chart, used, rs, unit, true);
    boolean first = true;
    for (double p : criticalPhases(pr)) {
      ChartSeries.line(chart, used, CRITICAL_PHASE_SERIES, new double[] {f[0], f[f.length - 1]}, new double[] {p, p},
          ReportStyle.ZERO_LINE, ReportStyle.referenceStroke(1.4f, null)).setShowInLegend(first);
      first = false;
    }
    List<String> notes = new ArrayList<>(commonNotes(rs));
    notes.add("Phase unwrapped continuously along frequency from its principal value at the lowest frequency; the "
        + "lines at -180 deg + k 360 deg are the phase-crossover levels.");
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
      double[][] xy = {r.frequencyHz(), phase ? r.phaseDeg() : finite(r.gainDb())};
      ChartSeries.line(chart, used, responseSeries(r.speed(), r.notches(), unit), xy[0], xy[1],
          speedColor(si), responseStroke(r.notches()));
    }
  }

  private static ReportChart nichols(SweepResult result, ConfigurationResult c, List<Response> rs,
      SpeedAxisUnit unit) {
    XYChart chart = ChartSeries.chart(c.configuration() + ": Nichols chart of the broken loop",
        "phase arg L (deg, continuous)", "gain 20 log10 |L| (dB)");
    Set<String> used = new HashSet<>();
    List<double[]> ys = new ArrayList<>();
    for (Response r : rs) {
      ys.add(r.gainDb());
    }
    double[][] cells = exclusionCells(result);
    double gmMax = Math.max(cells[0][0], cells[1][0]);
    double[] yr = ChartSeries.range(ys, new double[] {gmMax + 3, -gmMax - 3}, GAIN_AXIS_FLOOR_DB, GAIN_AXIS_CEILING_DB);
    double[] xr = phaseRange(rs);
    chart.getStyler().setXAxisMin(xr[0]).setXAxisMax(xr[1]);
    chart.getStyler().setYAxisMin(yr[0]).setYAxisMax(yr[1]);
    chart.getStyler().setXAxisDecimalPattern("0");
    chart.getStyler().setYAxisDecimalPattern("0");
    int si = -1;
    ChosenSpeed last = null;
    List<double[]> edges = new ArrayList<>();
    for (Response r : rs) {
      if (r.speed() != last) {
        si++;
        last = r.speed();
      }
      ChartSeries.line(chart, used, responseSeries(r.speed(), r.notches(), unit), r.phaseDeg(), finite(r.gainDb()),
          speedColor(si), responseStroke(r.notches()));
      if (r.notches()) {
        double fe = firstAeroelasticHzNear(c, r.speed().speedEasMps());
        int k = java.util.Arrays.binarySearch(r.frequencyHz(), fe);
        k = Math.min(Math.max(k < 0 ? -k - 1 : k, 0), r.frequencyHz().length - 1);
        edges.add(new double[] {r.phaseDeg()[k], r.gainDb()[k]});
      }
    }
    String[] bandNames = {"rigid-body band", "aeroelastic band"};
    float[][] dash = {null, {7f, 4f}};
    for (int b = 0; b < 2; b++) {
      boolean first = true;
      for (double p : criticalPhases(xr)) {
        double[][] d = exclusionRegion(cells[b][0], cells[b][1], p);
        ChartSeries.line(chart, used, exclusionSeries(cells[b][0], cells[b][1]) + ", " + bandNames[b], d[0], d[1],
            ReportStyle.REQUIREMENT, ReportStyle.referenceStroke(b == 0 ? 2.6f : 1.8f, dash[b])).setShowInLegend(first);
        first = false;
      }
    }
    double[] cp = criticalPhases(xr);
    ChartSeries.markers(chart, used, CRITICAL_POINT_SERIES, cp, new double[cp.length], ReportStyle.ZERO_LINE,
        SeriesMarkers.CROSS);
    if (!edges.isEmpty()) {
      double[] ex = new double[edges.size()];
      double[] ey = new double[edges.size()];
      for (int i = 0; i < ex.length; i++) {
        ex[i] = edges.get(i)[0];
        ey[i] = edges.get(i)[1];
      }
      ChartSeries.markers(chart, used, BAND_EDGE_SERIES, ex, ey, ReportStyle.ZERO_LINE, SeriesMarkers.CIRCLE);
    }
    List<String> notes = new ArrayList<>(commonNotes(rs));
    notes.add(String.format(Locale.ROOT, "Exclusion regions around every critical point (-180 deg + k 360 deg, 0 dB), "
        + "one per frequency band as the clearance judges it: solid, the rigid-body band (+-%.3g dB, +-%.3g deg); "
        + "dashed, the aeroelastic band (+-%.3g dB, +-%.3g deg)%s. The part of a curve below its dot (the first "
        + "elastic mode frequency at that speed) is judged against the solid region, the part above it against the "
        + "dashed one.", cells[0][0], cells[0][1], cells[1][0], cells[1][1],
        result.analysisCase().requirements() != null ? ", the normal-envelope cells of the requirements table"
            : " (common practice; no requirements table)"));
    notes.add("Phase unwrapped continuously along frequency.");
    clipNote(notes, rs, yr, true);
    return new ReportChart("nichols-" + ResultFiles.fileSafe(c.configuration()),
        "Nichols chart (gain against phase) of L(j w) at " + speedWords(rs, unit)
            + "; solid with notches, dashed without; red diamonds: the margin exclusion regions of the two "
            + "frequency bands around the critical points.", chart, notes);
  }

  /** Name of the -180 deg (mod 360) lines of the Bode phase chart. */
  public static final String CRITICAL_PHASE_SERIES = "-180 deg + k 360 deg";
  /** Name of the band-edge dots of the Nichols chart. */
  public static final String BAND_EDGE_SERIES = "first elastic mode (band edge)";

  /** @return phase axis limits: the data, widened to multiples of 90 deg, including -180 */
  static double[] phaseRange(List<Response> rs) {
    double lo = -180;
    double hi = -180;
    for (Response r : rs) {
      for (double p : r.phaseDeg()) {
        if (Double.isFinite(p)) {
          lo = Math.min(lo, p);
          hi = Math.max(hi, p);
        }
      }
    }
    return new double[] {Math.floor(lo / 90 - 1e-9) * 90, Math.ceil(hi / 90 + 1e-9) * 90};
  }

  /** @return the phases -180 + k 360 deg inside the range */
  static double[] criticalPhases(double[] range) {
    List<Double> out = new ArrayList<>();
    for (double p = -180 + 360 * Math.ceil((range[0] + 180) / 360); p <= range[1]; p += 360) {
      out.add(p);
    }
    return out.stream().mapToDouble(Double::doubleValue).toArray();
  }

  /** @return the first elastic mode frequency at the grid point nearest a speed, Hz */
  private static double firstAeroelasticHzNear(ConfigurationResult c, double speedEasMps) {
    int best = 0;
    List<org.flexmargin.sweep.ServoPoint> pts = c.servo().points();
    for (int i = 1; i < pts.size(); i++) {
      if (Math.abs(pts.get(i).condition().speedEasMps() - speedEasMps)
          < Math.abs(pts.get(best).condition().speedEasMps() - speedEasMps)) {
        best = i;
      }
    }
    return MarginCharts.firstAeroelasticHz(c, best);
  }

  /**
   * @param result the sweep
   * @return {{gain dB, phase deg} of the rigid-body band, {gain dB, phase deg} of the aeroelastic
   *     band}: the normal-envelope cells of the table, or 6 dB and 45 deg (common practice) for both
   *     without one
   */
  public static double[][] exclusionCells(SweepResult result) {
    ClearanceRequirements req = result.analysisCase().requirements();
    if (req == null) {
      double[] d = {DEFAULT_EXCLUSION_GAIN_DB, DEFAULT_EXCLUSION_PHASE_DEG};
      return new double[][] {d, d.clone()};
    }
    MarginCell rigid = req.cell(FrequencyBand.RIGID_BODY, SpeedRegime.NORMAL_ENVELOPE);
    MarginCell aero = req.cell(FrequencyBand.AEROELASTIC, SpeedRegime.NORMAL_ENVELOPE);
    return new double[][] {{rigid.gainMarginDb(), rigid.phaseMarginDeg()}, {aero.gainMarginDb(), aero.phaseMarginDeg()}};
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
    return exclusionRegion(gainDb, phaseDeg, -180);
  }

  /**
   * @param gainDb half-height, dB
   * @param phaseDeg half-width, deg
   * @param centreDeg phase of the critical point, deg
   * @return the closed diamond {phase deg, gain dB} around (centreDeg, 0 dB)
   */
  static double[][] exclusionRegion(double gainDb, double phaseDeg, double centreDeg) {
    return new double[][] {
      {centreDeg - phaseDeg, centreDeg, centreDeg + phaseDeg, centreDeg, centreDeg - phaseDeg},
      {0, gainDb, 0, -gainDb, 0}
    };
  }

  static double[] finite(double[] a) {
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
    return notchChart(result, c, null);
  }

  /**
   * The attenuation of each notch of the loop, and of each proposed notch (dashed), against the
   * modal frequency bands.
   *
   * @param result the sweep
   * @param c one configuration
   * @param proposed a notch design, or null
   * @return the chart
   */
  public static ReportChart notchChart(SweepResult result, ConfigurationResult c, ProposedNotches proposed) {
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
    for (int p = 0; p < loop.paths().size(); p++) {
      FeedbackPath path = loop.paths().get(p);
      for (FilterSpec s : path.filters()) {
        if (s instanceof NotchFilterSpec n) {
          double[] db = notchDb(n, f);
          for (double x : db) {
            minDb = Math.min(minDb, x);
          }
          curves.add(db);
          names.add(notchSeries(n, p, path.sensor()));
        }
      }
    }
    int caseNotches = curves.size();
    if (proposed != null) {
      for (NotchFilterSpec n : proposed.notches()) {
        double[] db = notchDb(n, f);
        for (double x : db) {
          minDb = Math.min(minDb, x);
        }
        curves.add(db);
        names.add(proposedNotchSeries(n));
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
      ChartSeries.line(chart, used, names.get(i), f, curves.get(i), i < caseNotches ? ReportStyle.ZERO_LINE
          : ReportStyle.REQUIREMENT, i < caseNotches ? new BasicStroke(2.4f, BasicStroke.CAP_ROUND,
          BasicStroke.JOIN_ROUND) : ReportStyle.referenceStroke(2.4f, new float[] {8f, 4f}));
    }
    List<String> notes = new ArrayList<>();
    if (proposed != null) {
      notes.add("Red: the proposed notch design (" + proposed.summary() + (proposed.feasible() ? ""
          : "; not feasible: best set found") + ")" + (proposed.source().isEmpty() ? "" : ", " + proposed.source())
          + "; solid black: the case's own notches.");
    }
    notes.add(String.format(Locale.ROOT, "Shaded: in-vacuo frequency of each mode +- %.3g %% (%s), in the colour of "
        + "the mode's line in the other charts. Coupled frequencies move with airspeed (see the V-f diagrams).",
        100 * u, req != null ? "the requirement's frequency uncertainty" : "common practice, no requirements table"));
    notes.add("Exact notch response N(j w) = (w_n^2 - w^2 + 2j zeta_z w_n w) / (w_n^2 - w^2 + 2j zeta_p w_n w).");
    return new ReportChart("notches-" + ResultFiles.fileSafe(c.configuration()),
        "Attenuation of every notch filter of the loop against frequency, with the uncertainty band of every "
            + "structural mode shaded.", chart, notes);
  }
}
