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
    return write(folder, result, findings, toolVersion, options, Map.of());
  }

  /**
   * As {@link #write(Path, SweepResult, List, String, ReportOptions)}, taking the charts of the
   * configurations already drawn with {@link ConfigurationCharts#draw} (keyed by configuration
   * name, drawn with the same options) instead of drawing them again.
   *
   * @param folder report folder (exists)
   * @param result sweep result
   * @param findings findings table (the one given to {@link ResultFiles#write})
   * @param toolVersion version string for provenance
   * @param options drawing options
   * @param drawnEarlier charts already drawn, by configuration; the others are drawn here
   * @return the written report.html
   * @throws IOException on write failure
   */
  public static Path write(Path folder, SweepResult result, List<Finding> findings, String toolVersion,
      ReportOptions options, Map<String, ConfigurationCharts> drawnEarlier) throws IOException {
    headless();
    Path chartDir = Files.createDirectories(folder.resolve(CHARTS_FOLDER));
    SpeedAxisUnit unit = options.chartSpeedUnit();
    List<ConfigurationResult> configurations = result.configurations();
    // chart data (some charts sample the loop) per configuration in parallel, then every chart not
    // drawn yet drawn, and all written, in parallel; order and content do not depend on the number
    // of threads or on which configurations were drawn earlier
    List<ConfigurationCharts> planned = configurations.parallelStream().map(c -> {
      ConfigurationCharts early = drawnEarlier.get(c.configuration());
      return early != null ? early : plan(result, c, unit, options);
    }).toList();
    List<Planned> all = new ArrayList<>();
    planned.forEach(p -> all.addAll(p.all()));
    MarginPanel.of(result, unit).forEach(chart -> all.add(new Planned(chart, null)));
    List<EmbeddedChart> drawn = embed(all, chartDir, options);
    Map<String, List<EmbeddedChart>> charts = new LinkedHashMap<>();
    Map<String, List<EmbeddedChart>> loopCharts = new LinkedHashMap<>();
    boolean anyLoop = false;
    int next = 0;
    for (int i = 0; i < configurations.size(); i++) {
      ConfigurationResult c = configurations.get(i);
      anyLoop |= c.servo() != null;
      int open = planned.get(i).open().size();
      int loop = planned.get(i).loop().size();
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
      sections.add(sections.size() - 2, new EnvelopeSection(e, unit, embed(List.of(new Planned(EnvelopeReport.chart(
          result.analysisCase().name(), e.spec(), e.envelopes(), unit), null)), chartDir, options).get(0)));
    }
    if (options.timeDomainCheck() != null) {
      sections.add(sections.size() - 2, new SimulationSection(options.timeDomainCheck(),
          embed(undrawn(SimulationSection.charts(options.timeDomainCheck())), chartDir, options)));
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

  /** A chart and, once drawn, its PNG bytes (null before). */
  record Planned(ReportChart chart, byte[] png) {
    /** @return this chart drawn (itself if it already is) */
    Planned drawn() {
      return png != null ? this : new Planned(chart, chart.png());
    }
  }

  /** Draws charts without a graphics device, as the report always does. */
  static void headless() {
    if (System.getProperty("java.awt.headless") == null) {
      System.setProperty("java.awt.headless", "true");
    }
  }

  private static List<Planned> undrawn(List<ReportChart> charts) {
    return charts.stream().map(c -> new Planned(c, null)).toList();
  }

  /** @return the open-loop group (with the closed-loop V-g and V-f) and the loop group of charts, not drawn */
  static ConfigurationCharts plan(SweepResult result, ConfigurationResult c, SpeedAxisUnit unit,
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
    return new ConfigurationCharts(c.configuration(), undrawn(open), undrawn(loop));
  }

  /** Draws, in parallel in the pool of the calling thread, the charts not drawn yet; results in order. */
  static List<Planned> drawAll(List<Planned> charts) {
    return charts.parallelStream().map(Planned::drawn).toList();
  }

  /** Draws the charts not drawn yet and writes all of them, in parallel; results in order. */
  private static List<EmbeddedChart> embed(List<Planned> charts, Path chartDir, ReportOptions options)
      throws IOException {
    try {
      return charts.parallelStream().map(Planned::drawn).map(p -> {
        try {
          byte[] png = p.png();
          List<String> names = new ArrayList<>();
          for (Path f : p.chart().writeTo(chartDir, png, options.vectorCharts())) {
            names.add(CHARTS_FOLDER + "/" + f.getFileName());
          }
          return new EmbeddedChart(p.chart(), png, names);
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        }
      }).toList();
    } catch (UncheckedIOException e) {
      throw e.getCause();
    }
  }
}
