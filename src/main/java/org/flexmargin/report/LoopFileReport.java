package org.flexmargin.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.LoopFileCheck;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.loop.DiskMargin;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.InputFile;
import org.flexmargin.model.LoopFile;
import org.flexmargin.report.LoopResponseCharts.Response;

/**
 * The output folder of {@code flexmargin margins}: {@code report.html} (verdict, margin tables,
 * structural modes, requirement checks, Bode and Nichols charts, inputs, cautions),
 * {@code results.json} (every number, units in the keys), {@code margins.csv} (one row per
 * crossing and structural mode) and {@code response-<label>.csv} (the sampled responses drawn),
 * and the charts as PNG (and SVG) under {@code charts/}. Described in docs/output-files.md.
 */
public final class LoopFileReport {
  private LoopFileReport() {}

  /** Format of results.json of a loop file. */
  public static final int FORMAT = 1;

  /**
   * Writes every file of the report into a folder (the caller's {@link ReportFolder}
   * temporary folder).
   *
   * @param folder the folder
   * @param file the loop file
   * @param results the analyses: the file's own loop first, then a measured response if any
   * @param measured for each analysis, the table frequencies if it is a table, else null
   * @param toolVersion version for provenance
   * @param svg whether to write SVG copies of the charts
   * @throws IOException on failure
   */
  public static void write(Path folder, LoopFile file, List<LoopFileCheck.Result> results, List<double[]> measured,
      String toolVersion, boolean svg) throws IOException {
    List<Response> rs = new ArrayList<>();
    List<Boolean> isTable = new ArrayList<>();
    for (int i = 0; i < results.size(); i++) {
      rs.add(LoopFileCharts.sample(file, results.get(i), measured.get(i) != null, measured.get(i)));
      isTable.add(measured.get(i) != null);
    }
    Files.writeString(folder.resolve("results.json"), json(file, results, toolVersion), StandardCharsets.UTF_8);
    Files.writeString(folder.resolve("margins.csv"), marginsCsv(results), StandardCharsets.UTF_8);
    for (Response r : rs) {
      Files.writeString(folder.resolve("response-" + ResultFiles.fileSafe(r.speed().label()) + ".csv"),
          responseCsv(r), StandardCharsets.UTF_8);
    }
    Path charts = Files.createDirectories(folder.resolve("charts"));
    List<EmbeddedChart> embedded = new ArrayList<>();
    for (ReportChart c : LoopFileCharts.of(file, rs, isTable)) {
      byte[] png = c.png();
      List<String> names = new ArrayList<>();
      for (Path p : c.writeTo(charts, png, svg)) {
        names.add("charts/" + p.getFileName());
      }
      embedded.add(new EmbeddedChart(c, png, names));
    }
    Files.writeString(folder.resolve("report.html"), html(file, results, embedded, toolVersion),
        StandardCharsets.UTF_8);
  }

  /** @return the verdict words of one analysis: PASS, FAIL or "no requirements" */
  public static String verdict(LoopFileCheck.Result r) {
    return r.assessment() == null ? "no requirements table" : r.passed() ? "PASS" : "FAIL";
  }

  static String json(LoopFile file, List<LoopFileCheck.Result> results, String toolVersion) throws IOException {
    ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    ObjectNode root = mapper.createObjectNode();
    root.put("format", FORMAT);
    root.put("kind", "loop_margins");
    root.put("tool", "flexmargin " + toolVersion);
    root.put("generated_utc", Instant.now().toString());
    root.put("loop", file.name());
    root.put("description", file.description());
    root.put("loop_form", file.loop().key());
    num(root, "delay_s", file.delayS());
    num(root, "sample_period_s", file.samplePeriodS());
    num(root, "speed_eas_mps", file.speedEasMps());
    num(root, "first_aeroelastic_frequency_hz", file.bandEdgeHz());
    root.put("requirements_source", file.requirements() == null ? null : file.requirements().source());
    ArrayNode cautions = root.putArray("cautions");
    Cautions.TEXT.forEach(cautions::add);
    ArrayNode inputs = root.putArray("inputs");
    for (InputFile f : file.inputs()) {
      inputs.addObject().put("path", f.path()).put("sha256", f.sha256());
    }
    ArrayNode responses = root.putArray("responses");
    for (LoopFileCheck.Result r : results) {
      ObjectNode o = responses.addObject();
      o.put("label", r.label());
      o.put("verdict", verdict(r));
      num(o, "frequency_min_hz", r.minFrequencyHz());
      num(o, "frequency_max_hz", r.maxFrequencyHz());
      LoopMarginResult m = r.margins();
      o.put("closed_loop_stability", m.closedLoopStability().name().toLowerCase(Locale.ROOT));
      ArrayNode gc = o.putArray("gain_crossovers");
      for (GainCrossover g : m.gainCrossovers()) {
        ObjectNode x = gc.addObject();
        num(x, "frequency_hz", g.frequencyHz());
        num(x, "phase_deg", g.phaseDeg());
        num(x, "phase_margin_deg", g.phaseMarginDeg());
        num(x, "delay_margin_s", g.delayMarginS());
      }
      ArrayNode pc = o.putArray("phase_crossovers");
      for (PhaseCrossover p : m.phaseCrossovers()) {
        ObjectNode x = pc.addObject();
        num(x, "frequency_hz", p.frequencyHz());
        num(x, "gain_margin_db", p.gainMarginDb());
        x.put("direction", p.direction().name().toLowerCase(Locale.ROOT));
      }
      DiskMargin d = m.diskMargin();
      ObjectNode dm = o.putObject("disk_margin");
      num(dm, "alpha", d.alpha());
      num(dm, "frequency_hz", d.frequencyHz());
      num(dm, "gain_lower_db", d.gainLowerDb());
      num(dm, "gain_upper_db", d.gainUpperDb());
      num(dm, "phase_margin_deg", d.phaseMarginDeg());
      ObjectNode pk = o.putObject("peak_gain");
      num(pk, "frequency_hz", m.peakGain().frequencyHz());
      num(pk, "gain_db", m.peakGain().magnitudeDb());
      ArrayNode sm = o.putArray("structural_modes");
      for (StructuralModeAssessment a : r.structuralModes()) {
        ObjectNode x = sm.addObject();
        x.put("mode", a.modeName());
        num(x, "frequency_hz", a.modeFrequencyHz());
        num(x, "band_low_hz", a.bandLowHz());
        num(x, "band_high_hz", a.bandHighHz());
        num(x, "peak_db", a.peakDb());
        num(x, "peak_frequency_hz", a.peakFrequencyHz());
        num(x, "phase_distance_deg", a.phaseDistanceDeg());
        num(x, "peak_limit_db", a.peakLimitDb());
        x.put("status", a.status().name().toLowerCase(Locale.ROOT));
      }
      if (r.assessment() != null) {
        ObjectNode rq = o.putObject("requirements");
        rq.put("passed", r.passed());
        rq.put("regime", r.assessment().regime().key());
        ArrayNode checks = rq.putArray("checks");
        for (ClearanceCheck c : r.assessment().checks()) {
          ObjectNode x = checks.addObject();
          x.put("requirement", c.kind().key());
          x.put("subject", c.subject());
          x.put("description", c.description());
          num(x, "required", c.requiredValue());
          num(x, "achieved", c.achievedValue());
          x.put("unit", c.unit().symbol());
          x.put("passed", c.passed());
          num(x, "frequency_hz", c.frequencyHz());
        }
      }
      ArrayNode notes = o.putArray("notes");
      r.notes().forEach(notes::add);
      num(o, "grid_points", m.diagnostics().gridPoints());
      num(o, "unresolved_intervals", m.diagnostics().unresolvedIntervals());
    }
    return mapper.writeValueAsString(root);
  }

  private static void num(ObjectNode o, String key, double v) {
    if (Double.isFinite(v)) {
      o.put(key, v);
    } else {
      o.putNull(key);
    }
  }

  static String marginsCsv(List<LoopFileCheck.Result> results) {
    StringBuilder sb = new StringBuilder("response,kind,frequency_hz,value,unit,detail\n");
    for (LoopFileCheck.Result r : results) {
      for (PhaseCrossover p : r.margins().phaseCrossovers()) {
        row(sb, r.label(), "gain_margin", p.frequencyHz(), p.gainMarginDb(), "dB",
            p.direction().name().toLowerCase(Locale.ROOT));
      }
      for (GainCrossover g : r.margins().gainCrossovers()) {
        row(sb, r.label(), "phase_margin", g.frequencyHz(), g.phaseMarginDeg(), "deg",
            String.format(Locale.ROOT, "delay margin %.6g s", g.delayMarginS()));
      }
      DiskMargin d = r.margins().diskMargin();
      row(sb, r.label(), "disk_margin", d.frequencyHz(), d.alpha(), "alpha",
          String.format(Locale.ROOT, "gain %.4g to %.4g dB, phase +-%.4g deg", d.gainLowerDb(), d.gainUpperDb(),
              d.phaseMarginDeg()));
      for (StructuralModeAssessment a : r.structuralModes()) {
        row(sb, r.label(), "structural_peak", a.peakFrequencyHz(), a.peakDb(), "dB",
            a.modeName() + " " + a.status().name().toLowerCase(Locale.ROOT));
      }
    }
    return sb.toString();
  }

  private static void row(StringBuilder sb, String label, String kind, double f, double v, String unit, String detail) {
    sb.append(label).append(',').append(kind).append(',').append(String.format(Locale.ROOT, "%.9g,%.9g", f, v))
        .append(',').append(unit).append(",\"").append(detail.replace("\"", "\"\"")).append("\"\n");
  }

  static String responseCsv(Response r) {
    StringBuilder sb = new StringBuilder("frequency_hz,gain_db,phase_deg\n");
    for (int i = 0; i < r.frequencyHz().length; i++) {
      sb.append(String.format(Locale.ROOT, "%.9g,%.9g,%.9g%n", r.frequencyHz()[i], r.gainDb()[i], r.phaseDeg()[i]));
    }
    return sb.toString();
  }

  private static String html(LoopFile file, List<LoopFileCheck.Result> results, List<EmbeddedChart> charts,
      String toolVersion) {
    List<ReportSection> sections = new ArrayList<>();
    sections.add(section("margins", "Margins", w -> {
      for (LoopFileCheck.Result r : results) {
        w.element("h3", r.label());
        marginTable(w, r);
      }
    }));
    sections.add(section("structural-modes", "Structural modes", w -> {
      if (file.modes().isEmpty()) {
        w.element("p", "The loop file lists no structural modes.");
        return;
      }
      w.open("table").open("tr");
      for (String h : List.of("response", "mode", "band (Hz)", "peak (dB)", "at (Hz)", "limit (dB)",
          "phase distance from -180 deg (deg)", "status")) {
        w.element("th", h);
      }
      w.close("tr");
      for (LoopFileCheck.Result r : results) {
        for (StructuralModeAssessment a : r.structuralModes()) {
          w.open("tr", "class", a.status().name().equals("FAILED") ? "fail" : "ok");
          w.element("td", r.label()).element("td", a.modeName())
              .element("td", String.format(Locale.ROOT, "%.4g to %.4g", a.bandLowHz(), a.bandHighHz()), "class", "num")
              .element("td", fmt(a.peakDb(), 2), "class", "num").element("td", fmt(a.peakFrequencyHz(), 4), "class", "num")
              .element("td", fmt(a.peakLimitDb(), 2), "class", "num")
              .element("td", String.format(Locale.ROOT, "%.1f", a.phaseDistanceDeg()), "class", "num")
              .element("td", a.status().name().toLowerCase(Locale.ROOT).replace('_', ' '));
          w.close("tr");
        }
      }
      w.close("table");
    }));
    if (file.requirements() != null) {
      sections.add(section("requirements", "Requirements", w -> {
        w.element("p", "Requirements: " + file.requirements().source().replaceAll("\\.$", "") + ". Airspeed " + file.speedEasMps()
            + " m/s EAS; rigid-body / aeroelastic band edge " + fmt(file.bandEdgeHz(), 4) + " Hz.");
        for (LoopFileCheck.Result r : results) {
          w.element("h3", r.label() + ": " + verdict(r));
          w.open("table").open("tr");
          for (String h : List.of("check", "required", "achieved", "unit", "result")) {
            w.element("th", h);
          }
          w.close("tr");
          for (ClearanceCheck c : r.assessment().checks()) {
            w.open("tr", "class", c.passed() ? "ok" : "fail");
            w.element("td", c.description()).element("td", fmt(c.requiredValue(), 3), "class", "num")
                .element("td", fmt(c.achievedValue(), 3), "class", "num").element("td", c.unit().symbol())
                .element("td", c.passed() ? "met" : "violated");
            w.close("tr");
          }
          w.close("table");
        }
      }));
    }
    sections.add(section("charts", "Bode and Nichols charts", w -> charts.forEach(c -> c.writeFigure(w))));
    sections.add(section("inputs", "Inputs", w -> {
      w.open("table", "class", "provenance").open("tr").element("th", "file").element("th", "SHA-256").close("tr");
      for (InputFile f : file.inputs()) {
        w.open("tr").element("td", f.path()).element("td", f.sha256(), "class", "mono").close("tr");
      }
      w.close("table");
    }));
    List<String> subtitle = List.of("Loop margins of " + file.name() + " (" + file.loop().key().replace('_', ' ')
        + ")", "flexmargin " + toolVersion);
    List<String> caseLines = new ArrayList<>();
    if (!file.description().isBlank()) {
      caseLines.add(file.description());
    }
    caseLines.add(String.format(Locale.ROOT, "Broken loop L in the negative-feedback convention (closed loop "
        + "1/(1 + L)); delay %.4g s, zero-order hold %s, analysed from %.4g to %.4g Hz.", file.delayS(),
        file.samplePeriodS() > 0 ? String.format(Locale.ROOT, "T = %.4g s", file.samplePeriodS()) : "none",
        file.minFrequencyHz(), file.maxFrequencyHz()));
    return HtmlReport.render("flexmargin loop margins: " + file.name(), subtitle, w -> firstScreen(w, results),
        caseLines, sections);
  }

  private static void firstScreen(XhtmlWriter w, List<LoopFileCheck.Result> results) {
    w.open("section", "class", "first-screen");
    for (LoopFileCheck.Result r : results) {
      boolean fail = r.assessment() != null && !r.passed();
      w.open("div", "class", fail ? "verdict fail" : "verdict");
      w.open("p").element("strong", r.label() + ": ").element("span", verdict(r), "class",
          fail ? "badge warn" : "badge ok").close("p");
      w.element("p", summary(r));
      if (r.assessment() != null) {
        r.assessment().governing().ifPresent(g -> w.element("p", "Governing: " + g.description() + String.format(
            Locale.ROOT, ", required %.3g %s, achieved %.3g %s.", g.requiredValue(), g.unit().symbol(),
            g.achievedValue(), g.unit().symbol())));
      }
      w.close("div");
    }
    w.close("section");
  }

  /**
   * @param r one analysis
   * @return one line: least gain margins both ways, least phase margin, delay margin, disk margin
   */
  public static String summary(LoopFileCheck.Result r) {
    LoopMarginResult m = r.margins();
    List<String> parts = new ArrayList<>();
    m.governingGainIncreaseMargin().ifPresent(p -> parts.add(String.format(Locale.ROOT,
        "gain margin %+.2f dB at %.4g Hz", p.gainMarginDb(), p.frequencyHz())));
    m.governingGainReductionMargin().ifPresent(p -> parts.add(String.format(Locale.ROOT,
        "gain-reduction margin %.2f dB at %.4g Hz", p.gainMarginDb(), p.frequencyHz())));
    if (m.phaseCrossovers().isEmpty()) {
      parts.add("no phase crossover in range (gain margin unbounded there)");
    }
    m.governingPhaseMargin().ifPresent(g -> parts.add(String.format(Locale.ROOT,
        "phase margin %.2f deg at %.4g Hz", g.phaseMarginDeg(), g.frequencyHz())));
    m.delayMarginS().ifPresent(d -> parts.add(String.format(Locale.ROOT, "delay margin %.4g s", d)));
    if (m.gainCrossovers().isEmpty()) {
      parts.add("no gain crossover in range");
    }
    parts.add(String.format(Locale.ROOT, "disk margin alpha %.3f (gain %.2f/%+.2f dB, phase +-%.1f deg)",
        m.diskMargin().alpha(), m.diskMargin().gainLowerDb(), m.diskMargin().gainUpperDb(),
        m.diskMargin().phaseMarginDeg()));
    parts.add("closed loop " + m.closedLoopStability().name().toLowerCase(Locale.ROOT).replace('_', ' '));
    return String.join("; ", parts);
  }

  private static void marginTable(XhtmlWriter w, LoopFileCheck.Result r) {
    w.element("p", String.format(Locale.ROOT, "Analysed from %.4g to %.4g Hz. %s.", r.minFrequencyHz(),
        r.maxFrequencyHz(), summary(r)));
    w.open("table").open("tr");
    for (String h : List.of("crossing", "frequency (Hz)", "margin", "remark")) {
      w.element("th", h);
    }
    w.close("tr");
    for (PhaseCrossover p : r.margins().phaseCrossovers()) {
      w.open("tr").element("td", "phase crossover (gain margin)").element("td", fmt(p.frequencyHz(), 5), "class", "num")
          .element("td", String.format(Locale.ROOT, "%+.3f dB", p.gainMarginDb()), "class", "num")
          .element("td", p.direction().name().toLowerCase(Locale.ROOT).replace('_', ' ')).close("tr");
    }
    for (GainCrossover g : r.margins().gainCrossovers()) {
      w.open("tr").element("td", "gain crossover (phase margin)").element("td", fmt(g.frequencyHz(), 5), "class", "num")
          .element("td", String.format(Locale.ROOT, "%.3f deg", g.phaseMarginDeg()), "class", "num")
          .element("td", String.format(Locale.ROOT, "delay margin %.4g s", g.delayMarginS())).close("tr");
    }
    w.close("table");
    if (!r.notes().isEmpty()) {
      w.open("ul", "class", "notes");
      r.notes().forEach(n -> w.element("li", n));
      w.close("ul");
    }
  }

  private static String fmt(double v, int digits) {
    return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + digits + "g", v) : "-";
  }

  private static ReportSection section(String id, String heading, java.util.function.Consumer<XhtmlWriter> body) {
    return ReportSection.of(id, heading, body);
  }
}
