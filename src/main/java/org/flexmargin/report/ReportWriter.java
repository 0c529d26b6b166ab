package org.flexmargin.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.SweepResult;

/**
 * Writes the human-readable part of a report folder: {@code charts/} (V-g and V-f diagrams of
 * every configuration and, with a loop, closed-loop V-g and V-f, margins against airspeed, root
 * locus, Bode, Nichols and notch charts; with an envelope the matched-point boundary; PNG and
 * optionally SVG) and {@code report.html} (self-contained, charts embedded, clearance verdicts in
 * the findings summary). The data files ({@link ResultFiles}) are written separately into the same folder.
 *
 * <p>Drawing needs no display: if {@code java.awt.headless} is not set, it is set to true.
 */
public final class ReportWriter {
  private ReportWriter() {}

  /** Name of the page. */
  public static final String REPORT_FILE = "report.html";
  /** Name of the charts subfolder. */
  public static final String CHARTS_FOLDER = "charts";

  /**
   * Writes charts and page with the default options.
   *
   * @param folder report folder (exists)
   * @param result sweep result
   * @param findings findings table (the one given to {@link ResultFiles#write})
   * @param toolVersion version string for provenance
   * @return the written report.html
   * @throws IOException on write failure
   */
  public static Path write(Path folder, SweepResult result, List<Finding> findings, String toolVersion)
      throws IOException {
    return write(folder, result, findings, toolVersion, ReportOptions.defaults());
  }

  /**
   * @param folder report folder (exists)
   * @param result sweep result
   * @param findings findings table (the one given to {@link ResultFiles#write})
   * @param toolVersion version string for provenance
   * @param options drawing options
   * @return the written report.html
   * @throws IOException on write failure
   */
  public static Path write(Path folder, SweepResult result, List<Finding> findings, String toolVersion,
      ReportOptions options) throws IOException {
    if (System.getProperty("java.awt.headless") == null) {
      System.setProperty("java.awt.headless", "true");
    }
    Path chartDir = Files.createDirectories(folder.resolve(CHARTS_FOLDER));
    SpeedAxisUnit unit = options.chartSpeedUnit();
    List<ConfigurationResult> configurations = result.configurations();
    // chart data (some charts sample the loop) per configuration in parallel, then every chart
    // drawn and written in parallel; order and content do not depend on the number of threads
    List<List<List<ReportChart>>> planned = configurations.parallelStream()
        .map(c -> chartsOf(result, c, unit, options)).toList();
    List<ReportChart> panelCharts = MarginPanel.of(result, unit);
    List<ReportChart> all = new ArrayList<>();
    planned.forEach(p -> p.forEach(all::addAll));
    all.addAll(panelCharts);
    List<EmbeddedChart> drawn = embed(all, chartDir, options);
    Map<String, List<EmbeddedChart>> charts = new LinkedHashMap<>();
    Map<String, List<EmbeddedChart>> loopCharts = new LinkedHashMap<>();
    boolean anyLoop = false;
    int next = 0;
    for (int i = 0; i < configurations.size(); i++) {
      ConfigurationResult c = configurations.get(i);
      anyLoop |= c.servo() != null;
      int open = planned.get(i).get(0).size();
      int loop = planned.get(i).get(1).size();
      charts.put(c.configuration(), drawn.subList(next, next + open));
      loopCharts.put(c.configuration(), drawn.subList(next + open, next + open + loop));
      next += open + loop;
    }
    List<EmbeddedChart> panel = drawn.subList(next, drawn.size());
    Instant now = Instant.now();
    List<ReportSection> sections = new ArrayList<>(OpenLoopSections.of(result, findings, charts, toolVersion, now, unit));
    if (anyLoop || result.analysisCase().requirements() != null) {
      // loop and clearance sections go after the configurations, before diagnostics and provenance
      int at = sections.size() - 2;
      sections.addAll(at, ClearanceSections.of(result, loopCharts, unit));
    }
    if (options.envelope() != null) {
      EnvelopeReport.Data e = options.envelope();
      sections.add(sections.size() - 2, new EnvelopeSection(e, unit, embed(List.of(EnvelopeReport.chart(
          result.analysisCase().name(), e.spec(), e.envelopes(), unit)), chartDir, options).get(0)));
    }
    if (options.timeDomainCheck() != null) {
      sections.add(sections.size() - 2, new SimulationSection(options.timeDomainCheck(),
          embed(SimulationSection.charts(options.timeDomainCheck()), chartDir, options)));
    }
    String title = (anyLoop ? "Aeroservoelastic clearance report: " : "Flutter and divergence report: ")
        + result.analysisCase().name();
    String page = HtmlReport.render(title, List.of(result.pathDescription()),
        w -> VerdictStrip.write(w, result, unit, panel, options.proposedNotches()),
        java.util.stream.Stream.of(result.analysisCase().description()).filter(s -> !s.isBlank()).toList(),
        sections);
    Path html = folder.resolve(REPORT_FILE);
    Files.writeString(html, page, StandardCharsets.UTF_8);
    return html;
  }

  /** @return the open-loop group (with the closed-loop V-g and V-f) and the loop group of charts */
  private static List<List<ReportChart>> chartsOf(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit,
      ReportOptions options) {
    List<ReportChart> open = new ArrayList<>(FlutterCharts.of(result, c, unit));
    List<ReportChart> loop = new ArrayList<>();
    if (c.servo() != null) {
      List<ReportChart> closed = ClosedLoopCharts.of(result, c, unit);
      // the closed-loop V-g and V-f go beside the open-loop ones, the root locus with the loop charts
      open.add(closed.get(1));
      open.add(closed.get(2));
      loop.addAll(MarginCharts.of(result, c, unit));
      loop.add(closed.get(0));
      loop.addAll(LoopResponseCharts.of(result, c, unit, options.proposedNotches(), options.models()));
    }
    return List.of(open, loop);
  }

  /** Draws and writes the charts in parallel (in the pool of the calling thread); results in order. */
  private static List<EmbeddedChart> embed(List<ReportChart> charts, Path chartDir, ReportOptions options)
      throws IOException {
    try {
      return charts.parallelStream().map(chart -> {
        try {
          byte[] png = chart.png();
          List<String> names = new ArrayList<>();
          for (Path p : chart.writeTo(chartDir, png, options.vectorCharts())) {
            names.add(CHARTS_FOLDER + "/" + p.getFileName());
          }
          return new EmbeddedChart(chart, png, names);
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        }
      }).toList();
    } catch (UncheckedIOException e) {
      throw e.getCause();
    }
  }
}
