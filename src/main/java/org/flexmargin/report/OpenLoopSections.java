package org.flexmargin.report;

import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.InputFile;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.Findings;
import org.flexmargin.sweep.SweepResult;

/**
 * The report sections of an open-loop sweep: findings summary, one section per configuration
 * (charts and modes table), numerical diagnostics and warnings, and input provenance.
 *
 * <p>Every number of the findings summary is written with its full-precision value in a
 * {@code data-value} attribute and its results.json key in {@code data-key}, beside the rounded
 * text, so that the page can be checked against the data files mechanically. Missing values
 * (NaN, null in results.json) read "&#8212;" with {@code data-value="null"}.
 */
public final class OpenLoopSections {
  private OpenLoopSections() {}

  /** Text shown for a value that does not exist (NaN). */
  public static final String MISSING = "\u2014";

  /**
   * @param result the sweep
   * @param findings its findings table, as written to results.json
   * @param charts charts per configuration name (may lack a configuration)
   * @param toolVersion version string
   * @param generated time the report was generated
   * @return the sections, in reading order, speeds in m/s
   */
  public static List<ReportSection> of(SweepResult result, List<Finding> findings,
      Map<String, List<EmbeddedChart>> charts, String toolVersion, Instant generated) {
    return of(result, findings, charts, toolVersion, generated, SpeedAxisUnit.METRES_PER_SECOND);
  }

  /**
   * @param result the sweep
   * @param findings its findings table, as written to results.json
   * @param charts charts per configuration name (may lack a configuration)
   * @param toolVersion version string
   * @param generated time the report was generated
   * @param unit speed unit of the tables (the {@code data-value} attributes stay SI, as in results.json)
   * @return the sections, in reading order
   */
  public static List<ReportSection> of(SweepResult result, List<Finding> findings,
      Map<String, List<EmbeddedChart>> charts, String toolVersion, Instant generated, SpeedAxisUnit unit) {
    List<ReportSection> out = new ArrayList<>();
    out.add(new Summary(result, List.copyOf(findings), unit));
    for (int i = 0; i < result.configurations().size(); i++) {
      ConfigurationResult c = result.configurations().get(i);
      out.add(new ConfigurationSection("configuration-" + (i + 1), result, c,
          charts.getOrDefault(c.configuration(), List.of()), unit));
    }
    out.add(new Diagnostics(result));
    out.add(new Provenance(result, toolVersion, generated));
    return out;
  }

  /** Findings summary: headline per configuration, then the full findings table. */
  private record Summary(SweepResult result, List<Finding> findings, SpeedAxisUnit unit) implements ReportSection {
    @Override
    public String id() {
      return "summary";
    }

    @Override
    public String heading() {
      return "Findings summary";
    }

    @Override
    public void writeBody(XhtmlWriter w) {
      w.element("p", "Case " + result.analysisCase().name() + ": " + result.pathDescription()
          + ". Damping limit g = " + String.format(Locale.ROOT, "%.3f", result.analysisCase().options().dampingLimitG())
          + " (V-g convention: g below minus the limit is adequately damped, g above 0 is unstable).");
      for (ConfigurationResult c : result.configurations()) {
        headline(w, c);
      }
      if (result.analysisCase().requirements() != null || result.configurations().stream()
          .anyMatch(c -> c.servo() != null)) {
        ClearanceSections.writeVerdicts(w, result, unit);
        w.element("h3", "All findings");
      }
      w.open("table", "id", "findings");
      w.open("thead").open("tr");
      SpeedAxisUnit other = unit == SpeedAxisUnit.KNOTS ? SpeedAxisUnit.METRES_PER_SECOND : SpeedAxisUnit.KNOTS;
      for (String h : List.of("configuration", "finding", "mode", "EAS (" + unit.symbol() + ")",
          "EAS (" + other.symbol() + ")", "TAS (" + unit.symbol() + ")", "Mach",
          "altitude (m)", "frequency (Hz)", "remark")) {
        w.element("th", h);
      }
      w.close("tr").close("thead");
      w.open("tbody");
      for (int i = 0; i < findings.size(); i++) {
        Finding f = findings.get(i);
        w.open("tr", "data-finding", Integer.toString(i), "class", rowClass(f.what()));
        w.element("td", f.configuration());
        w.element("td", f.what());
        w.element("td", f.mode());
        speedCell(w, "speed_eas_mps", f.speedEasMps(), unit);
        speedCell(w, "speed_eas_mps", f.speedEasMps(), other);
        speedCell(w, "speed_tas_mps", f.speedTasMps(), unit);
        num(w, "mach", f.mach(), 3);
        num(w, "altitude_m", f.altitudeM(), 0);
        if (f.what().equals("divergence") && f.frequencyHz() == 0.0) {
          w.element("td", "static", "class", "num", "data-key", "frequency_hz", "data-value", value(0.0));
        } else {
          num(w, "frequency_hz", f.frequencyHz(), 3);
        }
        w.element("td", f.remark());
        w.close("tr");
      }
      w.close("tbody");
      w.close("table");
      w.element("p", "The same findings, unrounded, are in results.json and findings.csv beside this report.");
    }

    private void headline(XhtmlWriter w, ConfigurationResult c) {
      int onset = -1;
      int limit = -1;
      int divergence = -1;
      for (int i = 0; i < findings.size(); i++) {
        Finding f = findings.get(i);
        if (!f.configuration().equals(c.configuration())) {
          continue;
        }
        boolean unstable = f.what().equals(Findings.label(CrossingKind.FLUTTER_ONSET))
            || f.what().equals(Findings.OPEN_LOOP_UNSTABLE_AT_START) || Findings.isClosedLoopInstability(f);
        boolean belowLimit = f.what().equals(Findings.label(CrossingKind.DAMPING_BELOW_LIMIT))
            || f.what().equals("damping below limit at start");
        if (unstable && (onset < 0 || f.speedEasMps() < findings.get(onset).speedEasMps())) {
          onset = i;
        }
        if (belowLimit && (limit < 0 || f.speedEasMps() < findings.get(limit).speedEasMps())) {
          limit = i;
        }
        if (f.what().equals("divergence")) {
          divergence = i;
        }
      }
      w.open("p", "class", "headline");
      w.element("strong", c.configuration() + ": ");
      if (onset >= 0) {
        Finding f = findings.get(onset);
        w.text("lowest unstable speed (open or closed loop) ");
        span(w, onset, "speed_eas_mps", f.speedEasMps(), 2);
        w.text(" m/s EAS (");
        span(w, onset, "speed_eas_kt", f.speedEasKnots(), 1);
        w.text(" kt), mode " + f.mode() + " at ");
        span(w, onset, "frequency_hz", f.frequencyHz(), 3);
        w.text(" Hz");
        if (!f.what().equals(Findings.label(CrossingKind.FLUTTER_ONSET))) {
          w.text(" (" + f.what() + ")");
        }
        w.text("; ");
      } else {
        w.element("span", "no flutter onset in the swept range", "class", "ok");
        w.text("; ");
      }
      if (limit >= 0) {
        Finding f = findings.get(limit);
        w.text("damping first below the limit at ");
        span(w, limit, "speed_eas_mps", f.speedEasMps(), 2);
        w.text(" m/s EAS (mode " + f.mode() + "); ");
      } else {
        w.text("damping above the limit throughout; ");
      }
      if (divergence >= 0) {
        Finding f = findings.get(divergence);
        w.text("divergence at ");
        span(w, divergence, "speed_eas_mps", f.speedEasMps(), 2);
        w.text(" m/s EAS (" + (c.divergenceConfirmedPa().isPresent() ? "inside" : "beyond") + " the sweep).");
      } else {
        w.text("no static divergence found.");
      }
      w.close("p");
    }
  }

  /** Charts and modes table of one configuration. */
  private record ConfigurationSection(String id, SweepResult result, ConfigurationResult c, List<EmbeddedChart> charts,
      SpeedAxisUnit unit) implements ReportSection {
    @Override
    public String heading() {
      return "Configuration " + c.configuration();
    }

    @Override
    public void writeBody(XhtmlWriter w) {
      w.element("p", "Aerodynamics: " + c.aeroDescription() + ". Flutter solution: "
          + FlutterCharts.methodWords(c.flutter().method()) + ".");
      for (EmbeddedChart chart : charts) {
        chart.writeFigure(w);
      }
      w.element("h3", "Modes");
      double limitG = result.analysisCase().options().dampingLimitG();
      w.open("table", "class", "modes");
      w.open("thead").open("tr");
      for (String h : List.of("mode", "in-vacuo frequency (Hz)", "frequency over sweep (Hz)", "highest g in sweep",
          "at EAS (" + unit.symbol() + ")", "status", "crossings (EAS " + unit.symbol() + ")")) {
        w.element("th", h);
      }
      w.close("tr").close("thead");
      w.open("tbody");
      double[] fv = c.modeFrequenciesHz();
      List<BranchCurve> branches = c.flutter().branches();
      for (int m = 0; m < Math.max(fv.length, branches.size()); m++) {
        BranchCurve b = m < branches.size() ? branches.get(m) : null;
        String name = m < c.modeNames().size() ? c.modeNames().get(m) : b.name();
        double fLo = Double.NaN;
        double fHi = Double.NaN;
        double gMax = Double.NaN;
        double gAt = Double.NaN;
        int bad = 0;
        if (b != null) {
          double[] f = b.frequencyHz();
          double[] g = b.dampingG();
          double[] eas = b.speedEasMps();
          boolean[] ok = b.converged();
          for (int i = 0; i < b.size(); i++) {
            if (!ok[i]) {
              bad++;
              continue;
            }
            if (Double.isFinite(f[i])) {
              fLo = Double.isNaN(fLo) ? f[i] : Math.min(fLo, f[i]);
              fHi = Double.isNaN(fHi) ? f[i] : Math.max(fHi, f[i]);
            }
            if (Double.isFinite(g[i]) && (Double.isNaN(gMax) || g[i] > gMax)) {
              gMax = g[i];
              gAt = eas[i];
            }
          }
        }
        w.open("tr");
        w.element("td", name);
        w.element("td", m < fv.length ? fmt(fv[m], 3) : MISSING, "class", "num");
        w.element("td", Double.isNaN(fLo) ? MISSING : fmt(fLo, 2) + " to " + fmt(fHi, 2), "class", "num");
        w.element("td", fmt(gMax, 4), "class", "num");
        w.element("td", fmt(unit.fromMps(gAt), 1), "class", "num");
        String status;
        String cls;
        if (Double.isNaN(gMax)) {
          status = "no converged oscillating point";
          cls = "warn";
        } else if (gMax > 0) {
          status = "unstable in part of the sweep";
          cls = "warn";
        } else if (gMax > -limitG) {
          status = "stable, damping below the limit in part of the sweep";
          cls = "warn";
        } else {
          status = "stable, damping above the limit throughout";
          cls = "ok";
        }
        if (bad > 0) {
          status += "; " + bad + " unconverged point" + (bad == 1 ? "" : "s");
          cls = "warn";
        }
        w.open("td").element("span", status, "class", cls).close("td");
        List<String> xs = new ArrayList<>();
        for (FlutterCrossing x : c.flutter().crossings()) {
          if (x.branch() == m) {
            xs.add(Findings.label(x.kind()) + " " + fmt(unit.fromMps(x.condition().speedEasMps()), 2));
          }
        }
        w.element("td", xs.isEmpty() ? MISSING : String.join("; ", xs));
        w.close("tr");
      }
      w.close("tbody");
      w.close("table");
    }
  }

  /** Numerical diagnostics and warnings of every configuration; nothing is left out. */
  private record Diagnostics(SweepResult result) implements ReportSection {
    @Override
    public String id() {
      return "diagnostics";
    }

    @Override
    public String heading() {
      return "Numerical diagnostics and warnings";
    }

    @Override
    public void writeBody(XhtmlWriter w) {
      w.element("p", "Solver statistics, residuals and every warning raised during the analysis. Unconverged roots "
          + "are counted here and shown as gaps in the charts.");
      w.open("table", "class", "diagnostics");
      w.open("thead").open("tr");
      w.element("th", "quantity");
      for (ConfigurationResult c : result.configurations()) {
        w.element("th", c.configuration());
      }
      w.close("tr").close("thead");
      w.open("tbody");
      row(w, "flutter method", c -> FlutterCharts.methodWords(c.flutter().method()));
      row(w, "root solves", c -> Long.toString(c.flutter().diagnostics().rootSolves()));
      row(w, "inner iterations", c -> Long.toString(c.flutter().diagnostics().iterations()));
      row(w, "iterations per root", c -> {
        SolverDiagnostics d = c.flutter().diagnostics();
        return d.rootSolves() > 0 ? fmt((double) d.iterations() / d.rootSolves(), 2) : MISSING;
      });
      row(w, "full eigen-solutions", c -> Long.toString(c.flutter().diagnostics().fullEigenSolves()));
      row(w, "continuation step halvings", c -> Integer.toString(c.flutter().diagnostics().stepHalvings()));
      row(w, "worst relative residual", c -> sci(c.flutter().diagnostics().maxRelativeResidual()));
      row(w, "lowest MAC between steps", c -> fmt(c.flutter().diagnostics().minMac(), 4));
      row(w, "unconverged roots", c -> Integer.toString(c.flutter().diagnostics().unconvergedRoots()));
      row(w, "divergence dynamic pressure (Pa)", c -> fmt(c.divergence().dynamicPressurePa(), 1));
      row(w, "divergence confirmed by determinant sign change (Pa)", c -> c.divergenceConfirmedPa().isPresent()
          ? fmt(c.divergenceConfirmedPa().getAsDouble(), 1) : "not inside the sweep");
      row(w, "divergence relative residual", c -> sci(c.divergence().relativeResidual()));
      row(w, "divergence reduced frequency used", c -> fmt(c.divergence().reducedFrequencyUsed(), 4));
      row(w, "divergence TAS at sweep start altitude (m/s)", c -> fmt(c.divergenceTasAtSweepStartMps(), 2));
      row(w, "analysis time (s)", c -> fmt(c.elapsedSeconds(), 2));
      w.close("tbody");
      w.close("table");
      for (ConfigurationResult c : result.configurations()) {
        w.element("h3", "Warnings and remarks: " + c.configuration());
        w.open("ul");
        if (c.flutter().diagnostics().unconvergedRoots() > 0) {
          w.element("li", c.flutter().diagnostics().unconvergedRoots()
              + " root solutions did not converge within the iteration budget.", "class", "warn");
        }
        for (String s : c.flutter().warnings()) {
          w.element("li", s, "class", "warn");
        }
        if (c.flutter().warnings().isEmpty() && c.flutter().diagnostics().unconvergedRoots() == 0) {
          w.element("li", "The flutter solver reported no warnings.", "class", "ok");
        }
        DivergenceResult d = c.divergence();
        w.element("li", "Divergence: " + d.note());
        w.close("ul");
      }
    }

    private void row(XhtmlWriter w, String label, java.util.function.Function<ConfigurationResult, String> cell) {
      w.open("tr");
      w.element("th", label);
      for (ConfigurationResult c : result.configurations()) {
        w.element("td", cell.apply(c), "class", "num");
      }
      w.close("tr");
    }
  }

  /** Where the numbers came from. */
  private record Provenance(SweepResult result, String toolVersion, Instant generated) implements ReportSection {
    @Override
    public String id() {
      return "provenance";
    }

    @Override
    public String heading() {
      return "Inputs and provenance";
    }

    @Override
    public void writeBody(XhtmlWriter w) {
      AnalysisOptions o = result.analysisCase().options();
      w.open("table", "class", "provenance");
      w.open("tbody");
      pair(w, "case", result.analysisCase().name());
      pair(w, "description", result.analysisCase().description().isEmpty() ? MISSING
          : result.analysisCase().description());
      pair(w, "sweep", result.pathDescription());
      pair(w, "flutter method", FlutterCharts.methodWords(o.method()));
      pair(w, "damping limit g", fmt(o.dampingLimitG(), 4));
      pair(w, "convergence tolerance", sci(o.convergenceTolerance()));
      pair(w, "iteration budget per root", Integer.toString(o.maxIterations()));
      pair(w, "onset speed tolerance (m/s)", sci(o.onsetSpeedToleranceMps()));
      pair(w, "rational fit (state-space models)", o.rationalFit().words());
      pair(w, "tool", "flexmargin " + toolVersion);
      pair(w, "generated (UTC)", generated.truncatedTo(ChronoUnit.SECONDS).toString());
      w.close("tbody");
      w.close("table");
      w.element("h3", "Input files");
      w.open("table", "class", "inputs");
      w.open("thead").open("tr").element("th", "file").element("th", "SHA-256").close("tr").close("thead");
      w.open("tbody");
      for (InputFile f : result.analysisCase().inputs()) {
        w.open("tr").element("td", f.path(), "class", "mono").element("td", f.sha256(), "class", "mono").close("tr");
      }
      if (result.analysisCase().inputs().isEmpty()) {
        w.open("tr").element("td", "no input files recorded (case built in memory)").element("td", MISSING)
            .close("tr");
      }
      w.close("tbody");
      w.close("table");
    }

    private static void pair(XhtmlWriter w, String k, String v) {
      w.open("tr").element("th", k).element("td", v).close("tr");
    }
  }

  private static String rowClass(String what) {
    if (what.contains("flutter onset") || what.contains("unstable")) {
      return "flutter";
    }
    if (what.contains("limit")) {
      return "limit";
    }
    if (what.equals("divergence")) {
      return "static";
    }
    return null;
  }

  /**
   * A speed cell: the text in the display unit (1 decimal in knots, 2 in m/s), the JSON key, the
   * unrounded SI value of results.json and the display unit ({@code data-unit}) in the attributes.
   */
  private static void speedCell(XhtmlWriter w, String key, double mps, SpeedAxisUnit unit) {
    w.element("td", fmt(unit.fromMps(mps), unit == SpeedAxisUnit.KNOTS ? 1 : 2), "class", "num", "data-key", key,
        "data-value", value(mps), "data-unit", unit.symbol());
  }

  private static void num(XhtmlWriter w, String key, double v, int decimals) {
    w.element("td", fmt(v, decimals), "class", "num", "data-key", key, "data-value", value(v));
  }

  private static void span(XhtmlWriter w, int finding, String key, double v, int decimals) {
    w.element("span", fmt(v, decimals), "class", "num", "data-finding", Integer.toString(finding),
        "data-key", key, "data-value", value(v));
  }

  /** @return the value as results.json has it: Java's shortest round-trip form, or "null" */
  private static String value(double v) {
    return Double.isFinite(v) ? Double.toString(v) : "null";
  }

  static String fmt(double v, int decimals) {
    if (!Double.isFinite(v)) {
      return MISSING;
    }
    String text = String.format(Locale.ROOT, "%." + decimals + "f", v);
    // a value that rounds to zero is shown as 0, not -0 (the sign is below the shown precision)
    return text.startsWith("-") && text.chars().noneMatch(ch -> ch >= '1' && ch <= '9') ? text.substring(1) : text;
  }

  private static String sci(double v) {
    return Double.isFinite(v) ? String.format(Locale.ROOT, "%.2e", v) : MISSING;
  }
}
