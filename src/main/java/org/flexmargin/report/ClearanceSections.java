package org.flexmargin.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.flexmargin.clearance.CheckKey;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.CheckUnit;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.RequiredSense;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.clearance.StructuralStabilisation;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.SpeedRegime;
import org.flexmargin.sweep.ModeCouplings;
import org.flexmargin.sweep.ClearanceResult;
import org.flexmargin.sweep.ClosedLoopResult;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.MarginOnset;
import org.flexmargin.sweep.ServoPoint;
import org.flexmargin.sweep.SweepResult;

/**
 * The report sections of the flight-control loop and the clearance: the verdict block of the
 * findings summary ({@link #writeVerdicts}), one section per configuration with a loop (margin,
 * root-locus and frequency-response charts, the per-speed margin table, the closed-loop model's
 * assumptions, fit and warnings), and the requirements table with its source.
 *
 * <p>Every number quoted from results.json carries its JSON pointer in {@code data-json} (e.g.
 * {@code /configurations/0/clearance/governing/achieved}) and its full-precision value in
 * {@code data-value}, so the page can be checked against the data file mechanically.
 */
public final class ClearanceSections {
  private ClearanceSections() {}

  /** Anchor id of the requirements section. */
  public static final String REQUIREMENTS_ID = "requirements";

  /**
   * @param result the sweep
   * @param loopCharts loop charts per configuration name
   * @param unit speed unit of the charts and tables
   * @return the loop sections (configurations with a loop) and the requirements section (if any)
   */
  public static List<ReportSection> of(SweepResult result, Map<String, List<EmbeddedChart>> loopCharts,
      SpeedAxisUnit unit) {
    List<ReportSection> out = new ArrayList<>();
    for (int i = 0; i < result.configurations().size(); i++) {
      ConfigurationResult c = result.configurations().get(i);
      if (c.servo() != null || c.clearance() != null) {
        out.add(new LoopSection("loop-" + (i + 1), i, result, c, loopCharts.getOrDefault(c.configuration(),
            List.of()), unit));
      }
    }
    if (result.analysisCase().requirements() != null) {
      out.add(new RequirementsSection(result.analysisCase().requirements(), unit));
    }
    return out;
  }

  /**
   * Writes the clearance verdict of every configuration for the findings summary: pass or fail,
   * the governing requirement with required and achieved values, the flutter rule (speed margin
   * against factor x V_L, minimum damping), a pass/fail line per requirement, and the margin
   * onsets.
   *
   * @param w the page
   * @param result the sweep
   */
  public static void writeVerdicts(XhtmlWriter w, SweepResult result) {
    writeVerdicts(w, result, SpeedAxisUnit.METRES_PER_SECOND);
  }

  /**
   * As {@link #writeVerdicts(XhtmlWriter, SweepResult)} with speeds in the given unit.
   *
   * @param w the page
   * @param result the sweep
   * @param unit speed unit of the text and tables
   */
  public static void writeVerdicts(XhtmlWriter w, SweepResult result, SpeedAxisUnit unit) {
    String u = " " + unit.symbol() + " EAS";
    ClearanceRequirements req = result.analysisCase().requirements();
    if (req == null) {
      w.element("p", "No requirements table in the case: results are reported without pass or fail.");
      return;
    }
    w.element("h3", "Clearance against the requirements table");
    w.open("p");
    w.text("Requirements: V0max " + fmt(unit.fromMps(req.maxOperatingSpeedEasMps()), 1) + u + ", V_L "
        + fmt(unit.fromMps(req.limitSpeedEasMps()), 1) + u + ", flutter-free to " + fmt(req.flutterSpeedFactor(), 3)
        + " x V_L = " + fmt(unit.fromMps(req.requiredFlutterSpeedEasMps()), 2) + u + ", damping g at least "
        + fmt(req.minimumDampingG(), 3) + " up to V_L. ");
    if (req.recalledPreset()) {
      w.element("span", "The table starts from a preset recalled from memory and must be verified against the "
          + "specification that applies; see the requirements section.", "class", "warn");
    }
    w.close("p");
    for (int i = 0; i < result.configurations().size(); i++) {
      ConfigurationResult c = result.configurations().get(i);
      ClearanceResult r = c.clearance();
      if (r == null) {
        continue;
      }
      String base = "/configurations/" + i + "/clearance";
      w.open("div", "class", r.passed() ? "verdict pass" : "verdict fail");
      w.open("p");
      w.element("strong", c.configuration() + ": ");
      w.element("span", r.passed() ? "PASS" : "FAIL", "class", r.passed() ? "badge ok" : "badge warn",
          "data-json", base + "/passed", "data-value", Boolean.toString(r.passed()));
      Optional<ClearanceCheck> g = r.governing();
      if (g.isPresent()) {
        ClearanceCheck gc = g.get();
        RankedFinding rf = r.governingFinding().orElseThrow();
        w.text(gc.passed() ? " Closest to its limit, at "
            : String.format(Locale.ROOT, " Governing finding (severity %d of 5, %s), from ", rf.severity().rank(),
                rf.severity().words()));
        speedNum(w, base + "/governing/speed_eas_mps", rf.speedEasMps(), unit);
        w.text(u + ": " + gc.description() + "; ");
        requiredAchieved(w, base + "/governing", gc);
        w.text(".");
      } else {
        w.text(" Every requirement is met.");
      }
      w.close("p");
      w.open("ul");
      List<ClearanceCheck> fc = r.flutter().checks();
      for (int k = 0; k < fc.size(); k++) {
        ClearanceCheck x = fc.get(k);
        String p = base + "/flutter_rule/checks/" + k;
        w.open("li");
        w.element("span", x.passed() ? "pass" : "fail", "class", x.passed() ? "ok" : "warn", "data-json",
            p + "/passed", "data-value", Boolean.toString(x.passed()));
        w.text(": " + x.description() + ": ");
        requiredAchieved(w, p, x);
        if (x.kind() == CheckKind.FLUTTER_SPEED) {
          w.text(String.format(Locale.ROOT, " (%+.1f %% of the required speed)",
              100 * (x.achievedValue() / x.requiredValue() - 1)));
        }
        w.text(".");
        w.close("li");
      }
      w.close("ul");
      requirementTable(w, i, r, unit);
      if (!r.marginOnsets().isEmpty()) {
        w.open("p");
        w.text("Margin onsets (speed at which a loop requirement is first violated, refined between grid points): ");
        for (int k = 0; k < r.marginOnsets().size(); k++) {
          MarginOnset m = r.marginOnsets().get(k);
          if (k > 0) {
            w.text("; ");
          }
          w.text(requirementWords(m.key()) + " at ");
          speedNum(w, base + "/margin_onsets/" + k + "/speed_eas_mps", m.condition().speedEasMps(), unit);
          w.text(u + (m.refined() ? "" : " (not refined)"));
        }
        w.text(".");
        w.close("p");
      } else if (!r.points().isEmpty()) {
        w.element("p", "No loop requirement goes from met to violated along the sweep.");
      }
      w.close("div");
    }
  }

  /** One row per requirement (kind and subject): pass or fail over the sweep, worst point, first onset. */
  private static void requirementTable(XhtmlWriter w, int config, ClearanceResult r, SpeedAxisUnit unit) {
    if (r.points().isEmpty()) {
      return;
    }
    Map<CheckKey, int[]> worst = new LinkedHashMap<>(); // {point, check, failing points, points present}
    for (int p = 0; p < r.points().size(); p++) {
      List<ClearanceCheck> cs = r.points().get(p).checks();
      for (int k = 0; k < cs.size(); k++) {
        ClearanceCheck ck = cs.get(k);
        int[] cur = worst.get(ck.key());
        if (cur == null) {
          cur = new int[] {p, k, 0, 0, -1};
          worst.put(ck.key(), cur);
        } else if (ck.normalisedExcess() < r.points().get(cur[0]).checks().get(cur[1]).normalisedExcess()) {
          cur[0] = p;
          cur[1] = k;
        }
        if (cur[4] != p) {
          cur[3]++;
          cur[4] = p;
          if (r.points().get(p).worstExcess(ck.key()).orElse(0) < 0) {
            cur[2]++;
          }
        }
      }
    }
    String base = "/configurations/" + config + "/clearance";
    w.open("table", "class", "requirements-met");
    w.open("thead").open("tr");
    for (String h : List.of("loop requirement", "result over the sweep", "worst point EAS (" + unit.symbol() + ")",
        "required", "achieved", "unit", "first violated at EAS (" + unit.symbol() + ")")) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    for (Map.Entry<CheckKey, int[]> e : worst.entrySet()) {
      int[] a = e.getValue();
      ClearanceCheck ck = r.points().get(a[0]).checks().get(a[1]);
      String p = base + "/points/" + a[0];
      w.open("tr");
      w.element("td", requirementWords(e.getKey()));
      w.open("td");
      if (a[2] == 0) {
        w.element("span", "pass at all " + a[3] + " points", "class", "ok");
      } else {
        w.element("span", "fail at " + a[2] + " of " + a[3] + " points", "class", "warn");
      }
      w.close("td");
      speedCell(w, p + "/speed_eas_mps", r.points().get(a[0]).speedEasMps(), unit);
      w.open("td", "class", "num");
      w.text(sense(ck) + " ");
      num(w, p + "/checks/" + a[1] + "/required", ck.requiredValue(), decimals(ck));
      w.close("td");
      numCell(w, p + "/checks/" + a[1] + "/achieved", ck.achievedValue(), decimals(ck));
      w.element("td", ck.unit().symbol());
      int onset = -1;
      for (int k = 0; k < r.marginOnsets().size(); k++) {
        if (r.marginOnsets().get(k).key().equals(e.getKey())) {
          onset = k;
          break;
        }
      }
      if (onset >= 0) {
        speedCell(w, base + "/margin_onsets/" + onset + "/speed_eas_mps",
            r.marginOnsets().get(onset).condition().speedEasMps(), unit);
      } else if (a[2] == 0) {
        w.element("td", "never", "class", "num");
      } else {
        int first = -1;
        for (int p2 = 0; p2 < r.points().size() && first < 0; p2++) {
          if (r.points().get(p2).worstExcess(e.getKey()).orElse(0) < 0) {
            first = p2;
          }
        }
        w.open("td", "class", "num");
        w.element("span", fmt(unit.fromMps(r.points().get(first).speedEasMps()), 2), "data-json", base + "/points/"
            + first + "/speed_eas_mps", "data-value", value(r.points().get(first).speedEasMps()), "data-unit",
            unit.symbol());
        w.text(" (from its first grid point, no bracket)");
        w.close("td");
      }
      w.close("tr");
    }
    w.close("tbody").close("table");
  }

  /** @return plain words for a requirement key, e.g. "phase margin, rigid body" */
  static String requirementWords(CheckKey key) {
    String kind = key.kind().key().replace('_', ' ');
    return key.subject().isEmpty() ? kind : kind + ", " + key.subject().replace('_', ' ');
  }

  private static int decimals(ClearanceCheck c) {
    return switch (c.unit()) {
      case DAMPING_G -> 4;
      case STABILITY -> 0;
      default -> 2;
    };
  }

  /** The loop and clearance of one configuration. */
  private record LoopSection(String id, int index, SweepResult result, ConfigurationResult c,
      List<EmbeddedChart> charts, SpeedAxisUnit unit) implements ReportSection {
    @Override
    public String heading() {
      return "Flight control loop and clearance: " + c.configuration();
    }

    @Override
    public void writeBody(XhtmlWriter w) {
      w.element("p", "Margins of the broken loop L(j w) at the actuator command (negative-feedback convention, "
          + "closed loop 1/(1 + L)) from the exact frequency response at every grid point; closed-loop "
          + "eigenvalues from the state-space model with rational aerodynamics.");
      for (EmbeddedChart chart : charts) {
        chart.writeFigure(w);
      }
      if (c.servo() != null) {
        perSpeedTable(w);
        RateSaturationTable.write(w, c, result.analysisCase().loop(), index, unit);
        closedLoopModel(w, c.servo().closedLoop());
      }
    }

    private void perSpeedTable(XhtmlWriter w) {
      w.element("h3", "Margins and pass/fail at every grid point");
      w.element("p", "Governing values per grid point: gain margins (GM+ smallest gain increase, GM- gain reduction "
          + "closest to 0 dB) and phase margin in the rigid-body band, smallest delay margin over all gain "
          + "crossovers, symmetric disk margin, highest structural peak and the closed loop's rightmost root. "
          + "Regimes: N normal envelope, L up to V_L, E up to the extended speed, - beyond (no requirement).");
      ClearanceResult cr = c.clearance();
      w.open("table", "class", "per-speed compact");
      w.open("thead").open("tr");
      for (String h : List.of("EAS (" + unit.symbol() + ")", "regime", "GM+ (dB)", "GM- (dB)", "PM (deg)", "delay (ms)",
          "disk GM (dB)", "disk PM (deg)", "peak |L| (dB)", "at mode", "max Re s (1/s)", "result",
          "governing check")) {
        w.element("th", h);
      }
      w.close("tr").close("thead").open("tbody");
      List<ServoPoint> pts = c.servo().points();
      for (int i = 0; i < pts.size(); i++) {
        ServoPoint sp = pts.get(i);
        LoopMarginResult m = sp.margins();
        double f1 = MarginCharts.firstAeroelasticHz(c, i);
        double gmUp = Double.NaN;
        double gmDown = Double.NaN;
        for (var pc : m.phaseCrossovers()) {
          if (org.flexmargin.clearance.RequirementLookup.band(pc.frequencyHz(), f1) != FrequencyBand.RIGID_BODY) {
            continue;
          }
          if (pc.gainMarginDb() >= 0) {
            gmUp = Double.isNaN(gmUp) ? pc.gainMarginDb() : Math.min(gmUp, pc.gainMarginDb());
          } else {
            gmDown = Double.isNaN(gmDown) ? pc.gainMarginDb() : Math.max(gmDown, pc.gainMarginDb());
          }
        }
        double pm = Double.NaN;
        for (GainCrossover gc : m.gainCrossovers()) {
          if (org.flexmargin.clearance.RequirementLookup.band(gc.frequencyHz(), f1) == FrequencyBand.RIGID_BODY) {
            pm = Double.isNaN(pm) ? Math.abs(gc.phaseMarginDeg()) : Math.min(pm, Math.abs(gc.phaseMarginDeg()));
          }
        }
        PointAssessment pa = cr != null && i < cr.points().size() ? cr.points().get(i) : null;
        double peak = Double.NaN;
        String peakMode = OpenLoopSections.MISSING;
        if (pa != null) {
          for (StructuralModeAssessment s : pa.structuralModes()) {
            if (Double.isNaN(peak) || s.peakDb() > peak) {
              peak = s.peakDb();
              peakMode = s.modeName() + (s.status() == StructuralStabilisation.PHASE_STABILISED ? " (phase)" : "");
            }
          }
        }
        String rowClass = pa == null ? null : pa.passed() ? null : "fail";
        w.open("tr", "class", rowClass);
        speedCell(w, "/configurations/" + index + "/loop/points/" + i + "/speed_eas_mps",
            sp.condition().speedEasMps(), unit);
        w.element("td", pa == null ? OpenLoopSections.MISSING : regimeLetter(pa.regime()));
        w.element("td", fmt(gmUp, 1), "class", "num");
        w.element("td", fmt(gmDown, 1), "class", "num");
        w.element("td", fmt(pm, 1), "class", "num");
        w.element("td", fmt(1000 * m.delayMarginS().orElse(Double.NaN), 1), "class", "num");
        w.element("td", fmt(m.diskMargin().gainUpperDb(), 1), "class", "num");
        w.element("td", fmt(m.diskMargin().phaseMarginDeg(), 1), "class", "num");
        w.element("td", fmt(peak, 1), "class", "num");
        w.element("td", peakMode);
        w.element("td", fmt(c.servo().closedLoop().points().get(i).maxRealPart(), 3), "class", "num");
        if (pa == null) {
          w.element("td", OpenLoopSections.MISSING);
          w.element("td", OpenLoopSections.MISSING);
        } else if (pa.checks().isEmpty()) {
          w.element("td", "none", "title", "no requirement beyond the extended speed");
          w.element("td", OpenLoopSections.MISSING);
        } else {
          int failing = pa.failures().size();
          w.open("td").element("span", failing == 0 ? "pass" : "fail (" + failing + ")", "class",
              failing == 0 ? "ok" : "warn").close("td");
          ClearanceCheck g = pa.governing().orElseThrow();
          w.element("td", g.kind() == CheckKind.CLOSED_LOOP_STABILITY
              ? (g.passed() ? "closed loop stable" : "closed loop unstable")
              : requirementWords(g.key()) + ": " + fmt(g.achievedValue(), decimals(g)) + " vs "
                  + sense(g) + " " + fmt(g.requiredValue(), decimals(g)) + " " + g.unit().symbol());
        }
        w.close("tr");
      }
      w.close("tbody").close("table");
      w.element("p", "Every check at every point, with frequencies and structural-mode detail, is in results.json "
          + "(configurations[].clearance.points and configurations[].loop.points) and margins-"
          + ResultFiles.fileSafe(c.configuration()) + ".csv.");
    }

    private void closedLoopModel(XhtmlWriter w, ClosedLoopResult cl) {
      w.element("h3", "Closed-loop model: assumptions, fit and warnings");
      w.open("p");
      w.text("Rational aerodynamic approximation: ");
      w.element("span", cl.fitDescription(), "class", "mono");
      w.text(". Closed-loop eigen-decompositions: " + cl.eigenSolves() + ".");
      w.close("p");
      w.open("ul");
      for (String a : cl.assumptions()) {
        w.element("li", a);
      }
      w.close("ul");
      result.analysisCase().configurations().stream().filter(k -> k.name().equals(c.configuration())).findFirst()
          .ifPresent(k -> CouplingTableSection.write(w, ModeCouplings.of(k)));
      w.element("p", "Warnings and remarks:");
      w.open("ul");
      for (String s : cl.warnings()) {
        w.element("li", s, "class", "warn");
      }
      int unresolved = 0;
      for (ServoPoint sp : c.servo().points()) {
        unresolved += sp.margins().diagnostics().unresolvedIntervals();
      }
      if (unresolved > 0) {
        w.element("li", unresolved + " frequency intervals of the margin search stayed unresolved over the sweep "
            + "(see margin_grid_points and unresolved_intervals in results.json).", "class", "warn");
      }
      if (cl.warnings().isEmpty() && unresolved == 0) {
        w.element("li", "The closed-loop analysis and the margin search reported no warnings.", "class", "ok");
      }
      w.close("ul");
    }
  }

  private static String regimeLetter(SpeedRegime r) {
    return switch (r) {
      case NORMAL_ENVELOPE -> "N";
      case UP_TO_LIMIT_SPEED -> "L";
      case UP_TO_115_LIMIT_SPEED -> "E";
      case BEYOND -> "-";
    };
  }

  /** The requirements table used, with its source. */
  private record RequirementsSection(ClearanceRequirements req, SpeedAxisUnit unit) implements ReportSection {
    @Override
    public String id() {
      return REQUIREMENTS_ID;
    }

    @Override
    public String heading() {
      return "Requirements table used";
    }

    @Override
    public void writeBody(XhtmlWriter w) {
      if (req.recalledPreset()) {
        w.element("p", "This table starts from a preset recalled from memory of published specifications. It is "
            + "offered for convenience, must be verified against the edition that applies to the programme, and "
            + "does not replace the programme's contract, certification basis or engineering judgement.",
            "class", "pointer");
      }
      w.element("h3", "Source");
      w.element("p", req.source());
      w.element("h3", "Required loop margins by frequency band and speed regime");
      w.open("table", "class", "margin-cells");
      w.open("thead").open("tr").element("th", "band");
      String[] regimeWords = {
        "normal envelope (V <= V0max = " + fmt(unit.fromMps(req.maxOperatingSpeedEasMps()), 1) + " " + unit.symbol()
            + ")",
        "up to V_L = " + fmt(unit.fromMps(req.limitSpeedEasMps()), 1) + " " + unit.symbol(),
        "up to " + fmt(req.extendedSpeedFactor(), 3) + " V_L = " + fmt(unit.fromMps(req.extendedSpeedEasMps()), 1) + " "
            + unit.symbol()
      };
      for (String r : regimeWords) {
        w.element("th", r);
      }
      w.close("tr").close("thead").open("tbody");
      SpeedRegime[] regimes = {SpeedRegime.NORMAL_ENVELOPE, SpeedRegime.UP_TO_LIMIT_SPEED,
          SpeedRegime.UP_TO_115_LIMIT_SPEED};
      for (FrequencyBand b : FrequencyBand.values()) {
        w.open("tr");
        w.element("th", switch (b) {
          case LOW_FREQUENCY -> "low frequency (below " + FrequencyBand.LOW_FREQUENCY_EDGE_HZ + " Hz)";
          case RIGID_BODY -> "rigid body (" + FrequencyBand.LOW_FREQUENCY_EDGE_HZ
              + " Hz to the first aeroelastic mode)";
          case AEROELASTIC -> "aeroelastic (first elastic mode frequency and above)";
        });
        for (SpeedRegime r : regimes) {
          MarginCell cell = req.cell(b, r);
          w.element("td", "+-" + fmt(cell.gainMarginDb(), 1) + " dB, +-" + fmt(cell.phaseMarginDeg(), 0) + " deg",
              "class", "num", "data-band", b.key(), "data-regime", r.key());
        }
        w.close("tr");
      }
      w.close("tbody").close("table");
      w.element("p", "Beyond " + fmt(req.extendedSpeedFactor(), 3) + " V_L no margin is required. 0 dB and 0 deg "
          + "mean stable at nominal gain and phase.");
      w.element("h3", "Structural coupling and flutter");
      w.open("table", "class", "provenance").open("tbody");
      pair(w, "structural peak limit (gain stabilisation)", fmt(req.structuralPeakLimitDb(), 1) + " dB");
      pair(w, "phase stabilisation margin", fmt(req.phaseStabilisationMarginDeg(), 0) + " deg from -180 deg");
      pair(w, "modal frequency uncertainty", "+-" + fmt(100 * req.frequencyUncertainty(), 1) + " %");
      pair(w, "flutter speed factor", fmt(req.flutterSpeedFactor(), 3) + " x V_L = "
          + fmt(unit.fromMps(req.requiredFlutterSpeedEasMps()), 2) + " " + unit.symbol() + " EAS");
      pair(w, "minimum damping up to V_L", "g >= " + fmt(req.minimumDampingG(), 3) + " (zeta >= "
          + fmt(req.minimumDampingG() / 2, 4) + ")");
      pair(w, "started from a recalled preset", req.recalledPreset() ? "yes (to be verified)" : "no");
      w.close("tbody").close("table");
    }

    private static void pair(XhtmlWriter w, String k, String v) {
      w.open("tr").element("th", k).element("td", v).close("tr");
    }
  }

  /**
   * Writes "required at least R unit, achieved A unit" (or "at most"; "required stable, found
   * unstable" for stability), so that every printed pair reads the way its pass or fail goes.
   */
  private static void requiredAchieved(XhtmlWriter w, String pointer, ClearanceCheck c) {
    if (c.unit() == CheckUnit.STABILITY) {
      w.text("required stable, found " + (c.passed() ? "stable" : "unstable"));
      return;
    }
    String unit = c.unit().symbol().isEmpty() ? "" : " " + c.unit().symbol();
    w.text("required " + sense(c) + " ");
    num(w, pointer + "/required", c.requiredValue(), decimals(c));
    w.text(unit + ", achieved ");
    num(w, pointer + "/achieved", c.achievedValue(), decimals(c));
    w.text(unit);
  }

  /** @return "at least" or "at most": how a required value is to be read */
  private static String sense(ClearanceCheck c) {
    return c.sense() == RequiredSense.AT_LEAST ? "at least" : "at most";
  }

  /** A speed in the text: shown in the display unit, JSON pointer, SI value and display unit in the attributes. */
  private static void speedNum(XhtmlWriter w, String pointer, double mps, SpeedAxisUnit unit) {
    w.element("span", fmt(unit.fromMps(mps), 2), "class", "num", "data-json", pointer, "data-value", value(mps),
        "data-unit", unit.symbol());
  }

  private static void num(XhtmlWriter w, String pointer, double v, int decimals) {
    w.element("span", fmt(v, decimals), "class", "num", "data-json", pointer, "data-value", value(v));
  }

  /** A speed cell: text in the display unit, JSON pointer, SI value and display unit in the attributes. */
  private static void speedCell(XhtmlWriter w, String pointer, double mps, SpeedAxisUnit unit) {
    w.element("td", fmt(unit.fromMps(mps), 2), "class", "num", "data-json", pointer, "data-value", value(mps),
        "data-unit", unit.symbol());
  }

  private static void numCell(XhtmlWriter w, String pointer, double v, int decimals) {
    w.element("td", fmt(v, decimals), "class", "num", "data-json", pointer, "data-value", value(v));
  }

  private static String value(double v) {
    return Double.isFinite(v) ? Double.toString(v) : "null";
  }

  private static String fmt(double v, int decimals) {
    return OpenLoopSections.fmt(v, decimals);
  }
}
