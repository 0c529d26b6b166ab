package org.flexmargin.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.campaign.CampaignPlan;
import org.flexmargin.campaign.CampaignSummary;
import org.flexmargin.campaign.GroupSummary;
import org.flexmargin.campaign.SampleOutcome;
import org.flexmargin.campaign.Spread;
import org.flexmargin.model.CampaignSpec;
import org.flexmargin.model.UncertainParameter;

/**
 * The campaign's summary files: {@code summary.json} (every statistic, units in the key names),
 * the charts ({@code charts/}) and the self-contained {@code campaign.html}.
 */
public final class CampaignReport {
  private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  private CampaignReport() {}

  /**
   * @param folder the campaign's output folder (exists)
   * @param plan the campaign
   * @param summary its statistics
   * @param outcomes every outcome, task order
   * @param worstFiles case files written for the worst samples, in {@code summary.worst()} order
   *     (relative to the folder)
   * @throws OutputWriteException if a file cannot be written
   */
  public static void write(Path folder, CampaignPlan plan, CampaignSummary summary, List<SampleOutcome> outcomes,
      List<String> worstFiles) {
    try {
      Files.writeString(folder.resolve("summary.json"), MAPPER.writeValueAsString(json(plan, summary, worstFiles))
          + "\n", StandardCharsets.UTF_8);
      Path charts = Files.createDirectories(folder.resolve("charts"));
      List<EmbeddedChart> embedded = new ArrayList<>();
      for (ReportChart c : CampaignCharts.all(plan, summary, outcomes)) {
        byte[] png = c.png();
        c.writeTo(charts, png, false);
        embedded.add(new EmbeddedChart(c, png, List.of("charts/" + c.fileStem() + ".png")));
      }
      Files.writeString(folder.resolve("campaign.html"), html(plan, summary, embedded, worstFiles),
          StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new OutputWriteException("cannot write the campaign summary in " + folder + ": " + e.getMessage(), e);
    }
  }

  private static ObjectNode json(CampaignPlan plan, CampaignSummary s, List<String> worstFiles) {
    CampaignSpec spec = plan.spec();
    ObjectNode root = MAPPER.createObjectNode();
    root.put("campaign", spec.name());
    root.put("base_case", spec.baseCaseFile());
    root.put("seed", spec.seed());
    root.put("samples_per_cell", spec.samples());
    root.put("cells", spec.cellCount());
    root.put("confidence_level", GroupSummary.CONFIDENCE);
    root.set("overall", group(s.overall()));
    ArrayNode cells = root.putArray("by_cell");
    s.cells().forEach(g -> cells.add(group(g)));
    ArrayNode worst = root.putArray("worst_samples");
    for (int i = 0; i < s.worst().size(); i++) {
      SampleOutcome o = s.worst().get(i);
      ObjectNode w = worst.addObject();
      w.put("task", o.task());
      w.put("cell", plan.cells().get(o.cell()).label());
      w.put("status", o.status().name());
      putSpeed(w, "first_problem_eas_mps", o.criticalEasMps());
      w.put("governing", o.governing());
      if (i < worstFiles.size()) {
        w.put("case_file", worstFiles.get(i));
      }
    }
    ArrayNode errors = root.putArray("errors");
    for (SampleOutcome o : s.errors()) {
      errors.addObject().put("task", o.task()).put("message", o.governing());
    }
    ArrayNode cautions = root.putArray("cautions");
    Cautions.TEXT.forEach(cautions::add);
    return root;
  }

  private static ObjectNode group(GroupSummary g) {
    ObjectNode n = MAPPER.createObjectNode();
    n.put("label", g.label());
    n.put("samples", g.samples());
    n.put("passed", g.passed());
    n.put("failed", g.failed());
    n.put("unreliable", g.unreliable());
    n.put("not_judged", g.notJudged());
    n.put("errors", g.errors());
    n.put("probability_of_clearance", g.probabilityOfClearance());
    n.put("clearance_interval_low", g.clearanceInterval().low());
    n.put("clearance_interval_high", g.clearanceInterval().high());
    ArrayNode spreads = n.putArray("speeds");
    for (Spread sp : g.spreads()) {
      ObjectNode o = spreads.addObject();
      o.put("quantity", sp.quantity());
      o.put("computed", sp.computed());
      o.put("found", sp.found());
      putSpeed(o, "p5_eas_mps", sp.p5EasMps());
      putSpeed(o, "p50_eas_mps", sp.p50EasMps());
      putSpeed(o, "p95_eas_mps", sp.p95EasMps());
      putSpeed(o, "min_eas_mps", sp.minEasMps());
    }
    return n;
  }

  /** Writes a speed; null when beyond the sweep or not found (JSON has no infinity). */
  private static void putSpeed(ObjectNode o, String key, double v) {
    if (Double.isFinite(v)) {
      o.put(key, v);
    } else {
      o.putNull(key);
    }
  }

  static String speed(double v) {
    if (Double.isNaN(v)) {
      return "-";
    }
    return Double.isInfinite(v) ? "beyond sweep" : String.format(Locale.ROOT, "%.1f", v);
  }

  static String percent(double p) {
    return String.format(Locale.ROOT, "%.1f %%", 100 * p);
  }

  private static String html(CampaignPlan plan, CampaignSummary s, List<EmbeddedChart> charts,
      List<String> worstFiles) {
    CampaignSpec spec = plan.spec();
    GroupSummary all = s.overall();
    List<String> subtitle = List.of(
        String.format(Locale.ROOT, "Clearance campaign %s on base case %s: %d cells x %d samples = %d samples, "
            + "seed %d", spec.name(), spec.baseCase().name(), spec.cellCount(), spec.samples(), all.samples(),
            spec.seed()),
        String.format(Locale.ROOT, "Probability of clearance %s (95 %% Clopper-Pearson interval %s to %s)",
            percent(all.probabilityOfClearance()), percent(all.clearanceInterval().low()),
            percent(all.clearanceInterval().high())));
    List<ReportSection> sections = new ArrayList<>();
    sections.add(section("clearance", "Probability of clearance by cell", w -> clearanceTable(w, s)));
    sections.add(section("speeds", "Distributions of onset speeds", w -> speedTables(w, s)));
    sections.add(section("charts", "Margins against airspeed and first problems", w -> {
      for (EmbeddedChart c : charts) {
        c.writeFigure(w);
      }
    }));
    sections.add(section("worst", "Worst samples", w -> worst(w, plan, s, worstFiles)));
    sections.add(section("inputs", "Campaign", w -> inputs(w, spec)));
    List<String> caseLines = new ArrayList<>();
    if (!spec.description().isEmpty()) {
      caseLines.add(spec.description());
    }
    caseLines.add("A sample is cleared only when it meets every requirement with trusted mode tracking; samples "
        + "that failed, could not be judged or could not be computed count as not cleared. The interval is the "
        + "exact (Clopper-Pearson) binomial interval of the proportion; it covers sampling error only, not errors "
        + "of the model or of the assumed distributions.");
    return HtmlReport.render("Clearance campaign " + spec.name(), subtitle, w -> { }, caseLines, sections);
  }

  private static ReportSection section(String id, String heading, java.util.function.Consumer<XhtmlWriter> body) {
    return ReportSection.of(id, heading, body);
  }

  private static void clearanceTable(XhtmlWriter w, CampaignSummary s) {
    w.open("table");
    w.open("thead").open("tr");
    for (String h : List.of("cell", "samples", "passed", "failed", "unreliable", "not judged", "errors",
        "P(clearance)", "95 % interval")) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    List<GroupSummary> rows = new ArrayList<>(s.cells());
    rows.add(s.overall());
    for (GroupSummary g : rows) {
      w.open("tr", "class", g.passed() < g.samples() ? "fail" : "ok");
      w.element("td", g.label());
      for (int v : new int[] {g.samples(), g.passed(), g.failed(), g.unreliable(), g.notJudged(), g.errors()}) {
        w.element("td", Integer.toString(v), "class", "num");
      }
      w.element("td", percent(g.probabilityOfClearance()), "class", "num");
      w.element("td", percent(g.clearanceInterval().low()) + " to " + percent(g.clearanceInterval().high()),
          "class", "num");
      w.close("tr");
    }
    w.close("tbody").close("table");
  }

  private static void speedTables(XhtmlWriter w, CampaignSummary s) {
    w.element("p", "Equivalent airspeeds (m/s EAS) over the computed samples of each cell; an onset not found in "
        + "the sweep counts as beyond it, so a percentile marked 'beyond sweep' means that share of samples has no "
        + "onset inside the swept range.");
    w.open("table");
    w.open("thead").open("tr");
    for (String h : List.of("cell", "quantity", "found / computed", "min", "5 %", "50 %", "95 %")) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    for (GroupSummary g : s.cells()) {
      for (Spread sp : g.spreads()) {
        w.open("tr");
        w.element("td", g.label());
        w.element("td", sp.quantity());
        w.element("td", sp.found() + " / " + sp.computed(), "class", "num");
        for (double v : new double[] {sp.minEasMps(), sp.p5EasMps(), sp.p50EasMps(), sp.p95EasMps()}) {
          w.element("td", speed(v), "class", "num");
        }
        w.close("tr");
      }
    }
    w.close("tbody").close("table");
  }

  private static void worst(XhtmlWriter w, CampaignPlan plan, CampaignSummary s, List<String> files) {
    w.element("p", "The computed samples with the lowest first problem, each written as a plain case file: "
        + "'flexmargin sweep FILE' reproduces the sample exactly.");
    w.open("table");
    w.open("thead").open("tr");
    for (String h : List.of("task", "cell", "status", "first problem (m/s EAS)", "governing finding", "case file")) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    for (int i = 0; i < s.worst().size(); i++) {
      SampleOutcome o = s.worst().get(i);
      w.open("tr");
      w.element("td", Integer.toString(o.task()), "class", "num");
      w.element("td", plan.cells().get(o.cell()).label());
      w.element("td", o.status().name());
      w.element("td", speed(o.criticalEasMps()), "class", "num");
      w.element("td", o.governing());
      w.element("td", i < files.size() ? files.get(i) : "-", "class", "mono");
      w.close("tr");
    }
    w.close("tbody").close("table");
    if (!s.errors().isEmpty()) {
      w.element("p", s.errors().size() + " sample(s) could not be computed (counted as not cleared); the first: task "
          + s.errors().get(0).task() + ": " + s.errors().get(0).governing(), "class", "warn");
    }
  }

  private static void inputs(XhtmlWriter w, CampaignSpec spec) {
    w.open("ul");
    w.element("li", "Base case: " + spec.baseCaseFile() + " (" + spec.baseCase().name() + ")");
    w.element("li", "Configurations: " + String.join(", ", spec.configurations()));
    w.element("li", "Flight-condition sets: " + spec.conditions().stream().map(c -> c.name()
        + (Double.isNaN(c.altitudeM()) ? "" : " (" + c.altitudeM() + " m)")
        + (Double.isNaN(c.machNumber()) ? "" : " (Mach " + c.machNumber() + ")")).toList());
    w.element("li", "Failure states: " + spec.failureStates().stream().map(f -> f.name()).toList());
    w.element("li", "Gain factors: " + spec.gainFactors());
    w.element("li", "Monte Carlo: " + spec.samples() + " samples per cell, seed " + spec.seed()
        + (spec.sweepPoints() > 0 ? "; " + spec.sweepPoints() + " grid points per sweep" : ""));
    for (UncertainParameter p : spec.parameters()) {
      w.element("li", p.name() + ": " + p.quantity().key() + (p.modes().isEmpty() ? "" : " of " + p.modes())
          + ", " + p.distribution());
    }
    w.close("ul");
  }
}
