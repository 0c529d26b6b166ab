package org.flexmargin.report;

import java.util.List;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.SweepResult;

/**
 * One configuration's report charts, built and (once {@link #draw drawn}) held as PNG bytes in
 * memory, so that they can be drawn as soon as that configuration is analysed, while the others
 * still compute, and written into the report folder later by {@link ReportWriter}. The charts
 * depend only on the case, the sweep's description and this configuration's result, so drawing
 * them early gives the same files as drawing them with the whole report.
 */
public final class ConfigurationCharts {
  private final String configuration;
  private final List<ReportWriter.Planned> open;
  private final List<ReportWriter.Planned> loop;

  ConfigurationCharts(String configuration, List<ReportWriter.Planned> open, List<ReportWriter.Planned> loop) {
    this.configuration = configuration;
    this.open = List.copyOf(open);
    this.loop = List.copyOf(loop);
  }

  /**
   * Builds and draws (in the pool of the calling thread) one configuration's charts.
   *
   * @param analysisCase the analysed case
   * @param pathDescription the sweep's one-line description (as in its {@link SweepResult})
   * @param result the configuration's result
   * @param options drawing options (speed unit, proposed notches, shared models)
   * @return the drawn charts
   */
  public static ConfigurationCharts draw(AnalysisCase analysisCase, String pathDescription,
      ConfigurationResult result, ReportOptions options) {
    ReportWriter.headless();
    ConfigurationCharts planned = ReportWriter.plan(
        new SweepResult(analysisCase, pathDescription, List.of(result)), result, options.chartSpeedUnit(), options);
    List<ReportWriter.Planned> drawn = ReportWriter.drawAll(planned.all());
    int n = planned.open.size();
    return new ConfigurationCharts(result.configuration(), drawn.subList(0, n), drawn.subList(n, drawn.size()));
  }

  /** @return the configuration's name */
  public String configuration() {
    return configuration;
  }

  List<ReportWriter.Planned> open() {
    return open;
  }

  List<ReportWriter.Planned> loop() {
    return loop;
  }

  List<ReportWriter.Planned> all() {
    List<ReportWriter.Planned> all = new java.util.ArrayList<>(open);
    all.addAll(loop);
    return all;
  }
}
