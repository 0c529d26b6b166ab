package org.flexmargin.report;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.Severity;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.clearance.StructuralStabilisation;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Instability;
import org.flexmargin.sweep.SweepResult;

/**
 * The first thing on the page: one row per configuration answering a reviewer's questions at a
 * glance (is it cleared, what governs and from which speed, divergence speed, lowest open- and
 * closed-loop flutter speeds, worst loop margin against its requirement, where notches should go),
 * followed by the small margin-against-airspeed panel ({@link MarginPanel}).
 *
 * <p>Speeds are written in the report's speed unit (equivalent airspeed). Every number carries its
 * full-precision SI value in {@code data-value} (m/s, Hz) so that the strip can be checked against
 * the data files mechanically; a missing value reads "&#8212;".
 */
public final class VerdictStrip {
  private VerdictStrip() {}

  /** Anchor id of the strip. */
  public static final String ID = "verdict";

  /** Column headings of the strip, in order. */
  public static final List<String> COLUMNS = List.of("configuration", "verdict", "governing finding",
      "divergence", "lowest open-loop flutter", "lowest closed-loop instability", "worst loop margin",
      "notches");

  /**
   * Writes the strip and the margin panel.
   *
   * @param w the page
   * @param result the sweep
   * @param unit speed unit of the page
   * @param panel the margin panel charts (empty when no configuration has a loop)
   * @param notches proposed notch design, or null when none was made
   */
  public static void write(XhtmlWriter w, SweepResult result, SpeedAxisUnit unit, List<EmbeddedChart> panel,
      ProposedNotches notches) {
    w.open("section", "id", ID, "class", "first-screen");
    w.open("table", "class", "verdict-strip");
    w.open("thead").open("tr");
    for (String h : COLUMNS) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    ClearanceRequirements req = result.analysisCase().requirements();
    for (ConfigurationResult c : result.configurations()) {
      w.open("tr", "data-configuration", c.configuration());
      w.element("th", c.configuration());
      verdictCell(w, c);
      governingCell(w, c, unit);
      speedCell(w, c.divergence().found() ? c.divergence().speedEasMps() : Double.NaN, 0.0, unit,
          c.divergence().found() ? "static" : "none found", "divergence");
      onsetCell(w, c.lowestOpenLoopFlutter().orElse(null), unit, "none in the sweep", "open-loop");
      if (c.servo() == null) {
        w.element("td", "no loop", "class", "muted");
      } else {
        onsetCell(w, c.lowestClosedLoopInstability().orElse(null), unit, "none in the sweep", "closed-loop");
      }
      marginCell(w, c, unit);
      notchCell(w, c, notches, unit);
      w.close("tr");
    }
    w.close("tbody").close("table");
    if (req != null) {
      w.element("p", String.format(Locale.ROOT, "Requirements: V0max %s, V_L %s, flutter-free to %.3g V_L = %s "
          + "(all EAS). Speeds in this report are equivalent airspeeds in %s.", speed(req.maxOperatingSpeedEasMps(),
          unit), speed(req.limitSpeedEasMps(), unit), req.flutterSpeedFactor(), speed(req.requiredFlutterSpeedEasMps(),
          unit), unit.symbol()), "class", "strip-note");
    } else {
      w.element("p", "No requirements table in the case: results are reported without pass or fail. Speeds are "
          + "equivalent airspeeds in " + unit.symbol() + ".", "class", "strip-note");
    }
    InputWarningList.write(w, result.analysisCase().warnings());
    if (!panel.isEmpty()) {
      writePanel(w, panel, req != null);
    }
    w.close("section");
  }

  /** The panel charts in one row with one caption (their own notes, if any, below). */
  private static void writePanel(XhtmlWriter w, List<EmbeddedChart> panel, boolean withRequirements) {
    w.open("figure", "class", "panel");
    w.open("div", "class", "panel-row");
    List<String> files = new java.util.ArrayList<>();
    for (EmbeddedChart c : panel) {
      w.empty("img", "src", c.dataUri(), "alt", c.chart().chart().getTitle(), "width",
          Integer.toString(c.chart().chart().getWidth()), "height", Integer.toString(c.chart().chart().getHeight()));
      c.fileNames().stream().filter(f -> f.endsWith(".png")).forEach(files::add);
    }
    w.close("div");
    w.element("figcaption", "Margins against equivalent airspeed, every configuration with a loop: smallest "
        + "rigid-body gain margin (either direction), smallest rigid-body phase margin and highest structural peak "
        + "loop gain over all modes" + (withRequirements ? "; dotted red: the requirement by speed regime (none "
        + "beyond the extended speed; structural peaks are judged up to V_L, and a peak above the limit may still "
        + "pass by phase stabilisation); thin lines at V0max and V_L" : "") + ". Per band and per mode in the loop "
        + "sections. Files: " + String.join(", ", files) + ".");
    List<String> notes = panel.stream().flatMap(c -> c.chart().notes().stream()).toList();
    if (!notes.isEmpty()) {
      w.open("ul", "class", "notes");
      for (String n : notes) {
        w.element("li", n);
      }
      w.close("ul");
    }
    w.close("figure");
  }

  private static void verdictCell(XhtmlWriter w, ConfigurationResult c) {
    w.open("td");
    if (c.clearance() == null) {
      w.element("span", "NOT ASSESSED", "class", "badge muted", "title", "no requirements table");
    } else {
      boolean pass = c.clearance().passed();
      w.element("span", pass ? "PASS" : "FAIL", "class", pass ? "badge ok" : "badge warn", "data-value",
          Boolean.toString(pass));
    }
    w.close("td");
  }

  private static void governingCell(XhtmlWriter w, ConfigurationResult c, SpeedAxisUnit unit) {
    w.open("td", "class", "governing");
    Instability lowest = c.lowestInstability().orElse(null);
    Optional<RankedFinding> g = c.clearance() == null ? Optional.empty() : c.clearance().governingFinding();
    if (g.isPresent() && !g.get().check().passed()) {
      RankedFinding f = g.get();
      w.element("strong", f.severity().words(), "class", "warn", "title", Severity.RULE);
      w.text(String.format(Locale.ROOT, " (severity %d of %d) from ", f.severity().rank(), Severity.values().length));
      speedSpan(w, f.speedEasMps(), unit);
      w.text(": " + f.check().description());
    } else if (c.clearance() != null) {
      w.element("span", "every requirement met", "class", "ok");
    }
    if (lowest != null) {
      if (c.clearance() != null) {
        w.empty("br");
      }
      w.text("lowest unstable speed ");
      speedSpan(w, lowest.speedEasMps(), unit);
      w.text(" (" + lowest.kind().words() + (lowest.kind() == Instability.Kind.DIVERGENCE ? "" : ", " + lowest.mode())
          + ")");
    } else if (c.clearance() == null) {
      w.element("span", "no instability in the sweep", "class", "ok");
    }
    w.close("td");
  }

  private static void onsetCell(XhtmlWriter w, Instability o, SpeedAxisUnit unit, String none, String what) {
    if (o == null) {
      w.element("td", none, "class", "ok", "data-value", "null", "data-key", what);
      return;
    }
    w.open("td", "class", "num", "data-key", what);
    w.element("strong", (o.atSweepStart() ? "at or below " : "") + speed(o.speedEasMps(), unit), "data-value",
        Double.toString(o.speedEasMps()));
    w.empty("br");
    w.text(o.mode() + (o.frequencyHz() > 0 ? String.format(Locale.ROOT, ", %.2f Hz", o.frequencyHz()) : ""));
    w.close("td");
  }

  private static void speedCell(XhtmlWriter w, double speedEasMps, double frequencyHz, SpeedAxisUnit unit,
      String remark, String key) {
    if (!Double.isFinite(speedEasMps)) {
      w.element("td", remark, "class", "ok", "data-key", key, "data-value", "null");
      return;
    }
    w.open("td", "class", "num", "data-key", key);
    w.element("strong", speed(speedEasMps, unit), "data-value", Double.toString(speedEasMps));
    w.empty("br");
    w.text(remark);
    w.close("td");
  }

  /** The loop-margin check (gain or phase margin) closest to, or furthest past, its requirement. */
  private static void marginCell(XhtmlWriter w, ConfigurationResult c, SpeedAxisUnit unit) {
    if (c.clearance() == null || c.clearance().points().isEmpty()) {
      w.element("td", c.servo() == null ? "no loop" : "no requirements table", "class", "muted");
      return;
    }
    ClearanceCheck worst = null;
    double at = Double.NaN;
    for (PointAssessment p : c.clearance().points()) {
      for (ClearanceCheck k : p.checks()) {
        boolean margin = k.kind() == CheckKind.GAIN_INCREASE_MARGIN || k.kind() == CheckKind.GAIN_REDUCTION_MARGIN
            || k.kind() == CheckKind.PHASE_MARGIN;
        if (margin && (worst == null || k.normalisedExcess() < worst.normalisedExcess())) {
          worst = k;
          at = p.speedEasMps();
        }
      }
    }
    if (worst == null) {
      w.element("td", "no crossover with a requirement", "class", "muted");
      return;
    }
    w.open("td", "class", worst.passed() ? null : "fail-cell");
    w.element("strong", String.format(Locale.ROOT, "%s %s", ClearanceSections.requirementWords(worst.key()),
        worst.passed() ? "met" : "not met"), "class", worst.passed() ? "ok" : "warn");
    w.empty("br");
    w.text(String.format(Locale.ROOT, "required %s %s %s, achieved %s %s, at ",
        worst.sense() == org.flexmargin.clearance.RequiredSense.AT_LEAST ? "at least" : "at most",
        OpenLoopSections.fmt(worst.requiredValue(), 1), worst.unit().symbol(),
        OpenLoopSections.fmt(worst.achievedValue(), 1), worst.unit().symbol()));
    speedSpan(w, at, unit);
    w.close("td");
  }

  /** Where notches should go: the proposed design, else the modes the present filters leave failing. */
  private static void notchCell(XhtmlWriter w, ConfigurationResult c, ProposedNotches notches, SpeedAxisUnit unit) {
    w.open("td", "class", "notches");
    if (notches != null) {
      w.element("strong", notches.feasible() ? "proposed: " : "best found (not feasible): ",
          "class", notches.feasible() ? null : "warn");
      w.text(notches.summary());
      w.close("td");
      return;
    }
    if (c.clearance() == null || c.clearance().points().isEmpty()) {
      w.text(c.servo() == null ? "no loop" : "no requirements table to judge structural peaks");
      w.close("td");
      return;
    }
    StructuralModeAssessment worst = null;
    double at = Double.NaN;
    int failing = 0;
    java.util.Set<String> failed = new java.util.LinkedHashSet<>();
    for (PointAssessment p : c.clearance().points()) {
      for (StructuralModeAssessment s : p.structuralModes()) {
        if (s.status() == StructuralStabilisation.FAILED) {
          failed.add(s.modeName());
          failing++;
          if (worst == null || s.peakDb() > worst.peakDb()) {
            worst = s;
            at = p.speedEasMps();
          }
        }
      }
    }
    if (worst == null) {
      w.element("span", "present filters keep every structural mode gain- or phase-stabilised", "class", "ok");
    } else {
      w.element("strong", "needed near " + String.format(Locale.ROOT, "%.1f Hz", worst.modeFrequencyHz()),
          "class", "warn");
      w.empty("br");
      w.text(String.format(Locale.ROOT, "%s peak %+.1f dB at ", worst.modeName(), worst.peakDb()));
      speedSpan(w, at, unit);
      if (failed.size() > 1) {
        failed.remove(worst.modeName());
        w.text("; also " + String.join(", ", failed));
      }
      w.text(String.format(Locale.ROOT, " (%d failing mode-points). Run notch-design.", failing));
    }
    w.close("td");
  }

  private static void speedSpan(XhtmlWriter w, double speedEasMps, SpeedAxisUnit unit) {
    w.element("span", speed(speedEasMps, unit), "class", "num", "data-value", Double.toString(speedEasMps));
  }

  /**
   * @param speedEasMps EAS, m/s
   * @param unit display unit
   * @return e.g. "61.9 m/s"
   */
  static String speed(double speedEasMps, SpeedAxisUnit unit) {
    return String.format(Locale.ROOT, "%.1f %s", unit.fromMps(speedEasMps), unit.symbol());
  }
}
