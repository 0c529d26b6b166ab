package org.flexmargin.notch;

import java.util.List;
import java.util.Locale;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.NotchFilterSpec;

/**
 * JSON text of notch design results, keys lower_snake_case with units (the project's file
 * conventions), and the filter fragment in the case-file format of docs/case-files.md. Written by
 * hand because JSON libraries are confined to the io and report layers.
 */
public final class NotchJson {
  private NotchJson() {}

  /** A small JSON text builder with indentation. */
  private static final class Out {
    private final StringBuilder sb = new StringBuilder();
    private int depth;
    private boolean first = true;

    Out open(String key, char bracket) {
      sep();
      if (key != null) {
        sb.append(quote(key)).append(": ");
      }
      sb.append(bracket);
      depth++;
      first = true;
      return this;
    }

    Out close(char bracket) {
      depth--;
      sb.append('\n').append("  ".repeat(depth)).append(bracket);
      first = false;
      return this;
    }

    private void sep() {
      if (!first) {
        sb.append(',');
      }
      if (depth > 0) {
        sb.append('\n').append("  ".repeat(depth));
      }
      first = false;
    }

    Out num(String key, double v) {
      sep();
      if (key != null) {
        sb.append(quote(key)).append(": ");
      }
      sb.append(Double.isFinite(v) ? String.format(Locale.ROOT, "%.6g", v).replaceAll("(\\.\\d*?)0+(e|$)", "$1$2")
          .replace(".e", "e").replaceAll("\\.$", "") : "null");
      return this;
    }

    Out str(String key, String v) {
      sep();
      sb.append(quote(key)).append(": ").append(v == null ? "null" : quote(v));
      return this;
    }

    Out bool(String key, boolean v) {
      sep();
      sb.append(quote(key)).append(": ").append(v);
      return this;
    }

    Out strings(String key, List<String> v) {
      open(key, '[');
      for (String s : v) {
        sep();
        sb.append(quote(s));
      }
      return close(']');
    }

    @Override
    public String toString() {
      return sb.toString() + "\n";
    }
  }

  static String quote(String s) {
    StringBuilder b = new StringBuilder("\"");
    for (char c : s.toCharArray()) {
      switch (c) {
        case '"' -> b.append("\\\"");
        case '\\' -> b.append("\\\\");
        case '\n' -> b.append("\\n");
        case '\t' -> b.append("\\t");
        case '\r' -> b.append("\\r");
        default -> {
          if (c < 0x20) {
            b.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
          } else {
            b.append(c);
          }
        }
      }
    }
    return b.append('"').toString();
  }

  private static void label(Out o, String key, SampleLabel l) {
    if (l == null) {
      o.str(key, null);
      return;
    }
    o.open(key, '{').str("configuration", l.configuration()).num("grid_point", l.gridPoint())
        .num("speed_eas_mps", l.speedEasMps()).num("altitude_m", l.altitudeM())
        .num("frequency_shift_factor", l.shiftFactor()).close('}');
  }

  private static void peak(Out o, String key, ModePeak p) {
    o.open(key, '{').num("peak_db", p.peakDb()).num("frequency_hz", p.frequencyHz());
    label(o, "where", p.where());
    o.close('}');
  }

  private static void margins(Out o, String key, RigidMargins r) {
    o.open(key, '{').num("phase_margin_deg", r.phaseMarginDeg()).num("crossover_hz", r.crossoverHz())
        .num("gain_increase_margin_db", r.gainIncreaseMarginDb())
        .num("gain_reduction_margin_db", r.gainReductionMarginDb()).bool("meets_requirement", r.meetsRequirement())
        .close('}');
  }

  private static void spec(Out o, NotchDesignSpec s) {
    o.open("settings", '{').num("max_notches", s.maxNotches()).num("peak_limit_db", s.peakLimitDb())
        .num("frequency_uncertainty", s.frequencyUncertainty())
        .num("required_phase_margin_deg", s.requiredPhaseMarginDeg())
        .num("required_gain_margin_db", s.requiredGainMarginDb()).num("rigid_band_fraction", s.rigidBandFraction())
        .str("existing_notches", s.existingNotches().name().toLowerCase(Locale.ROOT))
        .num("point_stride", s.pointStride()).num("max_speed_eas_mps", s.maxSpeedEasMps())
        .num("design_margin_db", s.designMarginDb()).num("mode_band_fraction", s.modeBandFraction()).close('}');
  }

  private static void violations(Out o, List<ConstraintViolation> v) {
    o.open("violations", '[');
    for (ConstraintViolation x : v) {
      o.open(null, '{').str("kind", x.kind().name().toLowerCase(Locale.ROOT)).str("mode", x.mode())
          .num("value", x.value()).num("limit", x.limit()).num("excess", x.excess())
          .num("frequency_hz", x.frequencyHz());
      label(o, "where", x.where());
      o.close('}');
    }
    o.close(']');
  }

  /**
   * @param r a design
   * @param cautions the cautions text to embed
   * @return notch-design.json
   */
  public static String design(NotchDesignResult r, List<String> cautions) {
    Out o = new Out();
    o.open(null, '{').num("format", 1).str("kind", "notch_design").str("case", r.caseName())
        .bool("feasible", r.feasible());
    spec(o, r.spec());
    o.open("notch_paths", '[');
    for (int p : r.notchPaths()) {
      o.num(null, p);
    }
    o.close(']');
    o.open("notches", '[');
    for (DesignedNotch n : r.notches()) {
      o.open(null, '{').num("centre_hz", n.centreHz()).num("numerator_damping_ratio", n.numeratorDampingRatio())
          .num("denominator_damping_ratio", n.denominatorDampingRatio()).num("depth_db", n.depthDb())
          .num("width_3db_hz", n.minus3DbWidthHz()).num("half_depth_width_hz", n.halfDepthWidthHz()).close('}');
    }
    o.close(']');
    o.open("structural_peaks", '[');
    for (ModePeakChange c : r.peaks()) {
      o.open(null, '{').str("mode", c.mode());
      peak(o, "before", c.before());
      peak(o, "after", c.after());
      o.close('}');
    }
    o.close(']');
    o.open("phase_cost", '[');
    for (PhaseCost c : r.phaseCost()) {
      o.open(null, '{').str("configuration", c.configuration()).num("worst_loss_deg", c.worstLossDeg())
          .num("crossover_hz", c.crossoverHz());
      label(o, "where", c.where());
      o.close('}');
    }
    o.close(']');
    o.num("original_notches_phase_loss_deg", r.originalPhaseCost().worstLossDeg());
    OptimiserDiagnostics d = r.diagnostics();
    o.open("optimiser", '{').str("method", d.method()).num("evaluations", d.evaluations()).num("runs", d.runs())
        .num("final_objective", d.finalObjective()).num("penalty_weight", d.penaltyWeight())
        .num("worst_peak_excess_db", d.worstPeakExcessDb()).num("violations", d.violations())
        .num("samples", d.samples()).num("stored_values", d.storedValues()).close('}');
    violations(o, r.violations().size() > 50 ? r.violations().subList(0, 50) : r.violations());
    o.strings("reasons", r.reasons());
    o.open("independent_margins", '[');
    for (MarginComparison m : r.margins()) {
      o.open(null, '{').str("configuration", m.before().configuration()).num("grid_point", m.before().gridPoint())
          .num("speed_eas_mps", m.before().speedEasMps());
      margins(o, "before", m.before());
      margins(o, "after", m.after());
      o.close('}');
    }
    o.close(']');
    o.open("independent_peaks_after", '[');
    for (CheckedPeak p : r.checkedPeaks()) {
      o.open(null, '{').str("mode", p.mode()).str("configuration", p.where().configuration())
          .num("speed_eas_mps", p.where().speedEasMps()).num("peak_db", p.peakDb())
          .num("frequency_hz", p.frequencyHz()).close('}');
    }
    o.close(']');
    o.strings("cautions", cautions);
    o.close('}');
    return o.toString();
  }

  /**
   * @param r a design
   * @return notch-filters.json: for each carrying path its sensor and the complete {@code filters}
   *     list in the case-file format, ready to paste into the path
   */
  public static String filters(NotchDesignResult r) {
    Out o = new Out();
    o.open(null, '{').num("format", 1).str("case", r.caseName()).bool("feasible", r.feasible());
    o.open("paths", '[');
    for (int p : r.notchPaths()) {
      FeedbackPath fp = r.designedLoop().paths().get(p);
      o.open(null, '{').num("path_index", p).str("sensor", fp.sensor());
      o.open("filters", '[');
      for (FilterSpec f : fp.filters()) {
        if (f instanceof NotchFilterSpec n) {
          o.open(null, '{').open("notch", '{').num("centre_hz", n.centreHz())
              .num("numerator_damping_ratio", n.numeratorDampingRatio())
              .num("denominator_damping_ratio", n.denominatorDampingRatio()).close('}').close('}');
        } else if (f instanceof LowPassFilterSpec lp) {
          o.open(null, '{').open("low_pass", '{').num("corner_hz", lp.cornerHz())
              .num("damping_ratio", lp.dampingRatio()).close('}').close('}');
        }
      }
      o.close(']');
      o.close('}');
    }
    o.close(']');
    o.close('}');
    return o.toString();
  }

  /**
   * @param r a robustness check
   * @param cautions the cautions text to embed
   * @return notch-check.json
   */
  public static String check(RobustnessCheckResult r, List<String> cautions) {
    Out o = new Out();
    o.open(null, '{').num("format", 1).str("kind", "notch_robustness_check").str("case", r.caseName())
        .bool("passes", r.passes());
    spec(o, r.spec());
    o.open("structural_peaks", '[');
    for (ModePeak p : r.peaks()) {
      o.open(null, '{').str("mode", p.mode()).num("peak_db", p.peakDb()).num("frequency_hz", p.frequencyHz());
      label(o, "where", p.where());
      o.close('}');
    }
    o.close(']');
    o.num("worst_phase_margin_deg", r.worstPhaseMarginDeg())
        .num("worst_gain_increase_margin_db", r.worstGainIncreaseMarginDb())
        .num("worst_gain_reduction_margin_db", r.worstGainReductionMarginDb());
    violations(o, r.violations().size() > 50 ? r.violations().subList(0, 50) : r.violations());
    o.open("independent_margins", '[');
    for (MarginComparison m : r.margins()) {
      o.open(null, '{').str("configuration", m.before().configuration()).num("speed_eas_mps", m.before().speedEasMps());
      margins(o, "margins", m.before());
      o.close('}');
    }
    o.close(']');
    o.strings("cautions", cautions);
    o.close('}');
    return o.toString();
  }
}
