package org.flexmargin.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
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
    XYChart chart = new XYChartBuilder().width(ReportStyle.CHART_WIDTH_PX).height(ReportStyle.CHART_HEIGHT_PX)
        .title(title).xAxisTitle("EAS (m/s)").yAxisTitle(yTitle).build();
    ReportStyle.apply(chart);
    return chart;
  }

  private static ReportChart band(CampaignSummary summary, List<Cell> cells, String stem, String title, String y,
      Function<GroupSummary, MarginBand> which) {
    XYChart chart = chart(title + ": median (solid) and 5 % / 95 % of the samples (dashed)", y);
    Set<String> used = new HashSet<>();
    List<String> notes = new ArrayList<>();
    for (int k = 0; k < cells.size(); k++) {
      Cell c = cells.get(k);
      MarginBand b = which.apply(summary.cells().get(c.index()));
      if (b.speedEasMps().length == 0) {
        continue;
      }
      String label = c.condition().name() + " / " + c.failure().name() + (c.gainFactor() == 1.0 ? "" : " / x" + c.gainFactor());
      ChartSeries.line(chart, used, label + " 50 %", b.speedEasMps(), b.p50(), ReportStyle.seriesColor(k),
          ReportStyle.seriesStroke(0));
      ChartSeries.line(chart, used, label + " 5 %", b.speedEasMps(), b.p5(), ReportStyle.seriesColor(k),
          ReportStyle.referenceStroke(1.4f, DASH)).setShowInLegend(false);
      ChartSeries.line(chart, used, label + " 95 %", b.speedEasMps(), b.p95(), ReportStyle.seriesColor(k),
          ReportStyle.referenceStroke(1.4f, DASH)).setShowInLegend(false);
      int gaps = (int) Arrays.stream(b.counts()).filter(n -> n == 0).count();
      if (gaps > 0) {
        notes.add(label + ": no sample has this margin at " + gaps + " grid speed(s) (no crossover there): gap.");
      }
    }
    return new ReportChart(stem, title + " against airspeed: median and 5-95 % band over the Monte Carlo samples of "
        + "each cell (at each speed, over the samples that have the margin).", chart, notes);
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
        + "divergence, open- and closed-loop flutter onset and the first lost loop margin requirement): the "
        + "percentage of samples whose first problem lies below each airspeed; samples without a problem in "
        + "the sweep never reach the curve.", chart, notes);
  }
}
