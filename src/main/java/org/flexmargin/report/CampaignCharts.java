package org.flexmargin.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Function;
import org.flexmargin.campaign.Cell;
import org.flexmargin.campaign.CampaignPlan;
import org.flexmargin.campaign.CampaignSummary;
import org.flexmargin.campaign.GroupSummary;
import org.flexmargin.campaign.MarginBand;
import org.flexmargin.campaign.SampleOutcome;
import org.flexmargin.campaign.SampleStatus;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;

/**
 * Charts of a campaign: margin versus airspeed with 5/50/95 % bands (one chart per configuration
 * and margin, one colour per cell), and the empirical distribution of each cell's first problem
 * speed.
 */
final class CampaignCharts {
  private CampaignCharts() {}

  private static final float[] DASH = {6f, 4f};

  static List<ReportChart> all(CampaignPlan plan, CampaignSummary summary, List<SampleOutcome> outcomes) {
    List<ReportChart> out = new ArrayList<>();
    for (String conf : plan.spec().configurations()) {
      List<Cell> cells = plan.cells().stream().filter(c -> c.configuration().equals(conf)).toList();
      if (cells.stream().anyMatch(c -> summary.cells().get(c.index()).gainMarginBand().speedEasMps().length > 0)) {
        out.add(band(summary, cells, "gain-band-" + conf, "Gain margin, " + conf, "gain margin (dB)",
            GroupSummary::gainMarginBand));
        out.add(band(summary, cells, "phase-band-" + conf, "Phase margin, " + conf, "phase margin (deg)",
            GroupSummary::phaseMarginBand));
      }
    }
    out.add(firstProblem(plan, outcomes));
    return out;
  }

  private static XYChart chart(String title, String yTitle) {
    XYChart chart = ReportXYChart.of(new XYChartBuilder().width(ReportStyle.CHART_WIDTH_PX).height(ReportStyle.CHART_HEIGHT_PX)
        .title(title).xAxisTitle("EAS (m/s)").yAxisTitle(yTitle));
    ReportStyle.apply(chart);
    return chart;
  }

  private static ReportChart band(CampaignSummary summary, List<Cell> cells, String stem, String title, String y,
      Function<GroupSummary, MarginBand> which) {
    XYChart chart = chart(title + ": median (solid) and 5 % / 95 % of the samples (dashed)", y);
    Set<String> used = new HashSet<>();
    List<String> notes = new ArrayList<>();
    double low = Double.POSITIVE_INFINITY;
    double high = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < cells.size(); k++) {
      Cell c = cells.get(k);
      MarginBand b = which.apply(summary.cells().get(c.index()));
      if (b.speedEasMps().length == 0) {
        continue;
      }
      String label = c.condition().name() + " / " + c.failure().name() + (c.gainFactor() == 1.0 ? "" : " / x" + c.gainFactor());
      double[] x = b.speedEasMps();
      String[] names = {" 50 %", " 5 %", " 95 %"};
      double[][] ys = {b.p50(), b.p5(), b.p95()};
      for (int j = 0; j < 3; j++) {
        double[] yj = drawable(ys[j]);
        double[] drawn = Arrays.stream(yj).filter(v -> !Double.isNaN(v)).toArray();
        if (drawn.length == 0) {
          continue;
        }
        low = Math.min(low, Arrays.stream(drawn).min().getAsDouble());
        high = Math.max(high, Arrays.stream(drawn).max().getAsDouble());
        ChartSeries.line(chart, used, label + names[j], x, yj, ReportStyle.seriesColor(k), j == 0
            ? ReportStyle.seriesStroke(0) : ReportStyle.referenceStroke(1.4f, DASH)).setShowInLegend(j == 0);
      }
      int gaps = (int) Arrays.stream(b.counts()).filter(n -> n == 0).count();
      if (gaps > 0) {
        notes.add(label + ": no sample has this margin at " + gaps + " grid speed(s) (no crossover there): gap.");
      }
      String lost = lostFrom(x, b.p5(), b.p50());
      if (!lost.isEmpty()) {
        notes.add(label + ": " + lost);
      }
    }
    if (low <= high) { // the axis from the drawn points only (the gaps would otherwise upset its range)
      double pad = Math.max(0.05 * (high - low), 0.5);
      chart.getStyler().setYAxisMin(low - pad).setYAxisMax(high + pad);
    }
    return new ReportChart(stem, title + " against airspeed: median and 5-95 % band over the Monte Carlo samples of "
        + "each cell (at each speed, over the samples that have the margin; a sample whose closed loop is unstable at "
        + "that speed counts as margin lost, and a band line ends where it reaches such samples).", chart, notes);
  }

  /** Minus infinity (margin lost) as NaN: a gap in the line. */
  private static double[] drawable(double[] y) {
    double[] d = y.clone();
    for (int i = 0; i < d.length; i++) {
      if (d[i] == Double.NEGATIVE_INFINITY) {
        d[i] = Double.NaN;
      }
    }
    return d;
  }

  /** Where the 5 % line and the median first reach samples with an unstable closed loop; empty when never. */
  private static String lostFrom(double[] speedEasMps, double[] p5, double[] p50) {
    List<String> parts = new ArrayList<>();
    addLost(parts, speedEasMps, p5, "5 % line", "5 % point");
    addLost(parts, speedEasMps, p50, "median", "median");
    return String.join("; ", parts);
  }

  private static void addLost(List<String> parts, double[] speedEasMps, double[] y, String line, String point) {
    for (int i = 0; i < y.length; i++) {
      if (y[i] == Double.NEGATIVE_INFINITY) {
        parts.add("the " + line + " is lost from " + String.format(Locale.ROOT, "%.1f", speedEasMps[i])
            + " m/s EAS (samples unstable in closed loop reach the " + point + ")");
        return;
      }
    }
  }

  private static ReportChart firstProblem(CampaignPlan plan, List<SampleOutcome> outcomes) {
    XYChart chart = chart("Share of samples with a first problem below each speed", "samples (%)");
    Set<String> used = new HashSet<>();
    List<String> notes = new ArrayList<>();
    for (Cell c : plan.cells()) {
      List<SampleOutcome> mine = outcomes.stream().filter(o -> o.cell() == c.index()).toList();
      double[] v = mine.stream().filter(o -> o.status() != SampleStatus.ERROR)
          .mapToDouble(SampleOutcome::criticalEasMps).filter(x -> !Double.isNaN(x)).sorted().toArray();
      long computed = mine.stream().filter(o -> o.status() != SampleStatus.ERROR).count();
      if (v.length == 0 || computed == 0) {
        notes.add(c.label() + ": no problem found in the sweep in any sample.");
        continue;
      }
      double[] x = new double[2 * v.length];
      double[] y = new double[2 * v.length];
      for (int i = 0; i < v.length; i++) {
        x[2 * i] = v[i];
        y[2 * i] = 100.0 * i / computed;
        x[2 * i + 1] = v[i];
        y[2 * i + 1] = 100.0 * (i + 1) / computed;
      }
      ChartSeries.line(chart, used, c.label(), x, y, ReportStyle.seriesColor(c.index()),
          ReportStyle.seriesStroke(c.index()));
    }
    chart.getStyler().setYAxisMin(0.0).setYAxisMax(100.0);
    chart.getStyler().setYAxisDecimalPattern("0");
    chart.getStyler().setXAxisDecimalPattern("0.#");
    return new ReportChart("first-problem", "Empirical distribution of each cell's first problem (the lowest of "
        + "divergence, open- and closed-loop flutter onset, the first lost loop margin requirement and the lowest "
        + "speed at which any other requirement fails, such as the damping requirement): the "
        + "percentage of samples whose first problem lies below each airspeed; samples without a problem in "
        + "the sweep never reach the curve.", chart, notes);
  }
}
