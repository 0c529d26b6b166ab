package org.flexmargin.notch;

import java.util.List;
import java.util.Locale;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.Severity;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.LoopSpec;
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

    /** A whole number (a count, an index or a format version), written with every digit. */
    Out num(String key, long v) {
      sep();
      if (key != null) {
        sb.append(quote(key)).append(": ");
      }
      sb.append(v);
      return this;
    }

    /** A list entry with every digit of the double (17 significant digits round-trip exactly). */
    Out exact(double v) {
      sep();
      sb.append(Double.isFinite(v) ? Double.toString(v) : "null");
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
    return design(r, null, cautions);
  }

  /**
   * @param r a design
   * @param discrete its discrete-time sections and their check (null: none written)
   * @param cautions the cautions text to embed
   * @return notch-design.json
   */
  public static String design(NotchDesignResult r, DiscreteNotchSet discrete, List<String> cautions) {
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
    if (discrete != null) {
      discrete(o, discrete);
    }
    o.strings("cautions", cautions);
    o.close('}');
    return o.toString();
  }

  private static void discrete(Out o, DiscreteNotchSet d) {
    o.open("discrete_sections", '{').num("sample_period_s", d.samplePeriodS()).str("method",
        "bilinear transform pre-warped at each notch centre; H(z) = (b0 + b1 z^-1 + b2 z^-2)/(1 + a1 z^-1 + a2 z^-2)");
    o.open("sections", '[');
    for (DiscreteNotchSet.Section s : d.sections()) {
      o.open(null, '{').num("centre_hz", s.notch().centreFrequencyHz())
          .num("centre_gain_db", s.centreGainDb()).num("continuous_centre_gain_db", s.continuousCentreGainDb());
      coefficients(o, s.filter().numerator(), s.filter().denominator());
      o.close('}');
    }
    o.close(']');
    if (d.check() != null) {
      o.bool("check_passes", d.check().passes()).str("check", "the requirements table, same rules as sweep, on the "
          + "loop with the discrete sections in place of the designed notches");
      o.open("check_failures", '[');
      for (RobustnessCheckResult.ConfigurationVerdict v : d.check().configurations()) {
        for (RankedFinding f : v.clearance().ranked()) {
          if (!f.check().passed()) {
            o.open(null, '{').str("configuration", v.configuration()).str("description", f.check().description())
                .num("required", f.check().requiredValue()).num("achieved", f.check().achievedValue())
                .str("unit", f.check().unit().symbol()).close('}');
          }
        }
      }
      o.close(']');
    }
    o.str("note", d.note());
    o.close('}');
  }

  /**
   * @param r a design
   * @return notch-filters.json: for each carrying path its sensor and the complete {@code filters}
   *     list in the case-file format, ready to paste into the path
   */
  public static String filters(NotchDesignResult r) {
    return filters(r, r.designedLoop());
  }

  /**
   * @param r a design
   * @param loop the designed loop to write (e.g. with the discrete sections in place of the notches)
   * @return the filter fragment of that loop's carrying paths
   */
  public static String filters(NotchDesignResult r, LoopSpec loop) {
    Out o = new Out();
    o.open(null, '{').num("format", 1).str("case", r.caseName()).bool("feasible", r.feasible());
    o.open("paths", '[');
    for (int p : r.notchPaths()) {
      FeedbackPath fp = loop.paths().get(p);
      o.open(null, '{').num("path_index", p).str("sensor", fp.sensor());
      o.open("filters", '[');
      for (FilterSpec f : fp.filters()) {
        if (f instanceof NotchFilterSpec n) {
          o.open(null, '{').open("notch", '{').num("centre_hz", n.centreHz())
              .num("numerator_damping_ratio", n.numeratorDampingRatio())
              .num("denominator_damping_ratio", n.denominatorDampingRatio()).close('}').close('}');
        } else {
          filter(o, f);
        }
      }
      o.close(']');
      o.close('}');
    }
    o.close(']');
    o.close('}');
    return o.toString();
  }

  /** Writes one filter other than a notch in the case-file format. */
  private static void filter(Out o, FilterSpec f) {
    o.open(null, '{');
    if (f instanceof LowPassFilterSpec lp) {
      o.open("low_pass", '{').num("corner_hz", lp.cornerHz()).num("damping_ratio", lp.dampingRatio());
    } else if (f instanceof FilterSpec.LeadLag ll) {
      o.open("lead_lag", '{').num("zero_hz", ll.zeroHz()).num("pole_hz", ll.poleHz());
    } else if (f instanceof FilterSpec.Washout w) {
      o.open("washout", '{').num("time_constant_s", w.timeConstantS());
    } else if (f instanceof FilterSpec.SecondOrder so) {
      o.open("second_order", '{').num("numerator_frequency_hz", so.numeratorFrequencyHz())
          .num("numerator_damping_ratio", so.numeratorDampingRatio())
          .num("denominator_frequency_hz", so.denominatorFrequencyHz())
          .num("denominator_damping_ratio", so.denominatorDampingRatio());
    } else if (f instanceof FilterSpec.TransferFunction tf) {
      coefficients(o.open("transfer_function", '{'), tf.coefficients().numerator(), tf.coefficients().denominator());
    } else if (f instanceof FilterSpec.Discrete d) {
      coefficients(o.open("discrete", '{'), d.coefficients().numerator(), d.coefficients().denominator());
    }
    o.close('}').close('}');
  }

  private static void coefficients(Out o, double[] numerator, double[] denominator) {
    o.open("numerator", '[');
    for (double v : numerator) {
      o.exact(v);
    }
    o.close(']').open("denominator", '[');
    for (double v : denominator) {
      o.exact(v);
    }
    o.close(']');
  }

  /**
   * @param r a robustness check
   * @param cautions the cautions text to embed
   * @return notch-check.json
   */
  public static String check(RobustnessCheckResult r, List<String> cautions) {
    Out o = new Out();
    o.open(null, '{').num("format", 2).str("kind", "filter_check").str("case", r.caseName())
        .bool("passes", r.passes());
    spec(o, r.spec());
    o.str("requirements_source", r.requirementsSource()).str("ranking_rule", Severity.RULE);
    o.open("configurations", '[');
    for (RobustnessCheckResult.ConfigurationVerdict v : r.configurations()) {
      o.open(null, '{').str("name", v.configuration()).bool("passed", v.clearance().passed());
      o.open("requirements", '[');
      for (RankedFinding f : v.clearance().ranked()) {
        ClearanceCheck c = f.check();
        o.open(null, '{').str("requirement", c.kind().key()).str("subject", c.subject())
            .str("description", c.description()).num("required", c.requiredValue())
            .num("achieved", c.achievedValue()).str("unit", c.unit().symbol())
            .str("sense", c.sense().name().toLowerCase(Locale.ROOT)).bool("passed", c.passed())
            .str("severity", f.severity().key()).num("severity_rank", f.severity().rank())
            .num("speed_eas_mps", f.speedEasMps()).close('}');
      }
      o.close(']').close('}');
    }
    o.close(']');
    o.strings("cautions", cautions);
    o.close('}');
    return o.toString();
  }
}
