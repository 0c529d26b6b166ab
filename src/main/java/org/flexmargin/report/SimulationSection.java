package org.flexmargin.report;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.flexmargin.simulate.AircraftSimulationModel;
import org.flexmargin.simulate.LoopComparison;
import org.flexmargin.simulate.SimulationResult;
import org.flexmargin.simulate.TimeHistory;
import org.knowm.xchart.XYChart;

/**
 * The report's time-domain check: a pilot doublet and the worst 1-cosine gust at V0max, with the
 * case's loop and the proposed one overlaid (solid and dashed), with the actuator's rate limit on
 * the elevator-rate charts and a table of peaks.
 */
final class SimulationSection implements ReportSection {
  private static final BasicStroke SOLID = new BasicStroke(1.6f);
  private static final BasicStroke DASHED = new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
      new float[] {6f, 4f}, 0f);

  private final LoopComparison comparison;
  private final List<EmbeddedChart> charts;

  SimulationSection(LoopComparison comparison, List<EmbeddedChart> charts) {
    this.comparison = comparison;
    this.charts = List.copyOf(charts);
  }

  @Override
  public String id() {
    return "time-domain-check";
  }

  @Override
  public String heading() {
    return "Time-domain check at V0max: doublet and gust";
  }

  @Override
  public void writeBody(XhtmlWriter w) {
    w.element("p", comparison.description() + ". The aircraft, loop and Roger fit are those of the closed-loop "
        + "sweep; with a rate limit, steps on which the actuator stays clear of its limits are taken exactly and the "
        + "others integrated by Dormand-Prince (docs/simulation.md). The linear "
        + "margins above hold only while the elevator stays inside its rate limit.");
    w.open("table", "class", "per-speed compact");
    w.open("thead").open("tr");
    for (String h : List.of("loop", "input", "peak |pitch rate| (deg/s)", "peak |n_z| (g)", "peak |elevator| (deg)",
        "peak |elevator rate| (deg/s)", "time at rate limit (s)", "worst H (m)", "linear loop")) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    double rate = comparison.variants().get(0).result().scenario().limits().rateLimitRadPerS();
    for (LoopComparison.Variant v : comparison.variants()) {
      SimulationResult r = v.result();
      row(w, v.label(), "doublet", r.pilot(), rate, Double.NaN, r.closedLoopMaxRealPartPerS());
      double worstH = r.gusts().stream().filter(g -> r.worstGust() != null)
          .max((a, b) -> Double.compare(a.peakLoadFactorG(), b.peakLoadFactorG()))
          .map(SimulationResult.GustPeak::gradientLengthM).orElse(Double.NaN);
      row(w, v.label(), "gust", r.worstGust(), rate, worstH, r.closedLoopMaxRealPartPerS());
    }
    w.close("tbody").close("table");
    for (EmbeddedChart c : charts) {
      c.writeFigure(w);
    }
    w.open("ul");
    for (String n : comparison.variants().get(0).result().notes()) {
      w.element("li", n);
    }
    w.close("ul");
  }

  private static void row(XhtmlWriter w, String label, String input, TimeHistory h, double rateLimit, double worstH,
      double maxRe) {
    if (h == null) {
      return;
    }
    w.open("tr");
    w.element("td", label);
    w.element("td", input);
    w.element("td", OpenLoopSections.fmt(Math.toDegrees(peak(h, AircraftSimulationModel.PITCH_RATE)), 2), "class", "num");
    w.element("td", OpenLoopSections.fmt(peakAccel(h), 3), "class", "num");
    w.element("td", OpenLoopSections.fmt(Math.toDegrees(peak(h, AircraftSimulationModel.ELEVATOR)), 2), "class", "num");
    w.element("td", OpenLoopSections.fmt(Math.toDegrees(peak(h, AircraftSimulationModel.ELEVATOR_RATE)), 1), "class",
        "num");
    w.element("td", Double.isFinite(rateLimit) ? OpenLoopSections.fmt(timeAtLimit(h, rateLimit), 3)
        : "no limit", "class", "num");
    w.element("td", OpenLoopSections.fmt(worstH, 0), "class", "num");
    w.element("td", maxRe < 0 ? "stable" : String.format(Locale.ROOT, "UNSTABLE (Re s = %.3f 1/s)", maxRe),
        "class", maxRe < 0 ? "ok" : "warn");
    w.close("tr");
  }

  /** @return time (s) the achieved elevator rate spends within 0.1 % of the limit */
  static double timeAtLimit(TimeHistory h, double limit) {
    double[] r = h.channel(AircraftSimulationModel.ELEVATOR_RATE);
    double dt = h.timesS()[1] - h.timesS()[0];
    int n = 0;
    for (double v : r) {
      if (Math.abs(v) >= 0.999 * limit) {
        n++;
      }
    }
    return n * dt;
  }

  private static double peak(TimeHistory h, String name) {
    return Math.abs(h.channel(name)[h.peakIndex(name)]);
  }

  private static double peakAccel(TimeHistory h) {
    for (String n : h.names()) {
      if (n.startsWith("sensor_") && n.endsWith("_g")) {
        return peak(h, n);
      }
    }
    return Double.NaN;
  }

  /**
   * @param comparison the runs
   * @return four charts: sensors and elevator rate for the doublet and for the worst gust
   */
  static List<ReportChart> charts(LoopComparison comparison) {
    List<ReportChart> out = new ArrayList<>();
    double limit = comparison.variants().get(0).result().scenario().limits().rateLimitRadPerS();
    for (String input : List.of("doublet", "gust")) {
      XYChart sensors = ChartSeries.timeChart(input + ": sensor signals", "sensor signal (deg/s, g)");
      XYChart rate = ChartSeries.timeChart(input + ": elevator rate", "elevator rate (deg/s)");
      Set<String> usedS = new HashSet<>();
      Set<String> usedR = new HashSet<>();
      for (int k = 0; k < comparison.variants().size(); k++) {
        LoopComparison.Variant v = comparison.variants().get(k);
        TimeHistory h = input.equals("doublet") ? v.result().pilot() : v.result().worstGust();
        if (h == null) {
          continue;
        }
        BasicStroke stroke = k == 0 ? SOLID : DASHED;
        int colour = 0;
        for (int i = 0; i < h.names().size(); i++) {
          String name = h.names().get(i);
          if (!name.startsWith("sensor_")) {
            continue;
          }
          boolean g = name.endsWith("_g");
          double[] y = g ? h.values()[i] : SimulationCharts.degrees(h.values()[i]);
          String label = name.replaceAll("_(g|rad|rad_per_s)$", "") + (g ? " (g)" : name.endsWith("_s") ? " (deg/s)"
              : " (deg)") + ", " + v.label();
          ChartSeries.line(sensors, usedS, label, h.timesS(), y, ReportStyle.seriesColor(colour++), stroke);
        }
        ChartSeries.line(rate, usedR, "elevator rate, " + v.label(), h.timesS(),
            SimulationCharts.degrees(h.channel(AircraftSimulationModel.ELEVATOR_RATE)), ReportStyle.seriesColor(k), stroke);
      }
      List<String> notes = new ArrayList<>();
      if (Double.isFinite(limit)) {
        double[] t = {0, LoopComparison.DURATION_S};
        double r = Math.toDegrees(limit);
        ChartSeries.line(rate, usedR, "rate limit", t, new double[] {r, r}, ReportStyle.LIMIT_LINE, DASHED);
        ChartSeries.line(rate, usedR, "-rate limit", t, new double[] {-r, -r}, ReportStyle.LIMIT_LINE, DASHED);
      } else {
        notes.add("no actuator rate limit given: the actuator is linear");
      }
      String what = input.equals("doublet") ? "1 deg pilot doublet" : "worst 1-cosine gust";
      out.add(new ReportChart("time-" + input + "-sensors", what + " at V0max: sensor signals, case loop solid"
          + (comparison.variants().size() > 1 ? ", " + comparison.variants().get(1).label() + " dashed" : "") + ".",
          sensors, List.of()));
      out.add(new ReportChart("time-" + input + "-elevator-rate", what + " at V0max: achieved elevator rate against "
          + "the actuator's rate limit.", rate, notes));
    }
    return out;
  }
}
