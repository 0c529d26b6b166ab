package org.flexmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.clearance.CheckUnit;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.RequiredSense;
import java.util.concurrent.Callable;
import org.flexmargin.io.CaseFileUpdate;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.notch.CheckedPeak;
import org.flexmargin.notch.DesignedNotch;
import org.flexmargin.notch.ExistingNotches;
import org.flexmargin.notch.MarginComparison;
import org.flexmargin.notch.ModePeak;
import org.flexmargin.notch.ModePeakChange;
import org.flexmargin.notch.DiscreteNotchSet;
import org.flexmargin.notch.NotchDesignResult;
import org.flexmargin.notch.NotchDesignSpec;
import org.flexmargin.notch.NotchDesigner;
import org.flexmargin.notch.NotchJson;
import org.flexmargin.notch.PhaseCost;
import org.flexmargin.notch.RigidMargins;
import org.flexmargin.notch.RobustnessCheckResult;
import org.flexmargin.report.Cautions;
import org.flexmargin.report.ReportFolder;
import org.flexmargin.report.ResultFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code flexmargin notch-design CASE}: structural notch placement, or a robustness check of the case's own. */
@Command(name = "notch-design", mixinStandardHelpOptions = true,
    description = {"Place structural notch filters so every structural loop-gain peak stays below the "
        + "gain-stabilisation limit over all configurations, sweep points and the modal frequency uncertainty, "
        + "at the least phase loss at the rigid-body crossover; or (--check-only) check the case's own filters.",
        "Writes notch-design.json and notch-filters.json (the filters list to paste into the case file) "
            + "into the output folder, and with --write-case a copy of the case with the notches in place. "
            + "Notch widths are the usual -3 dB widths. Exit 0 if a feasible set was found (or the check "
            + "passes), 3 if not."},
    footer = {"", "Examples:",
        "  flexmargin notch-design mode-tables/demo/demo-case.json",
        "  flexmargin notch-design mode-tables/demo/demo-case.json --write-case /tmp/mc7-notched.json",
        "  flexmargin sweep /tmp/mc7-notched.json",
        "  flexmargin notch-design mode-tables/demo/demo-case.json --max-eas 70 --notches 2",
        "  flexmargin notch-design mode-tables/demo/demo-case.json --uncertainty 0.05 --limit-db -6 --notches 2",
        "  flexmargin notch-design mode-tables/demo/demo-case.json --check-only"})
final class NotchDesignCommand implements Callable<Integer> {
  @Parameters(index = "0", paramLabel = "CASE", description = "Case file (JSON) with a loop.")
  Path caseFile;

  @Option(names = "--out", paramLabel = "DIR",
      description = "Output folder (default: reports/<case name>-notch-design). Must be new, empty or an "
          + "earlier flexmargin output folder, which is replaced once the new results are complete.")
  Path out;

  @Option(names = "--write-case", paramLabel = "FILE",
      description = "Also write a copy of the case file with the designed notches in place (only when a "
          + "feasible set is found; relative file references are rewritten for the new folder). An existing "
          + "file, the input case included, is replaced only with --overwrite.")
  Path writeCase;

  @Option(names = "--overwrite", description = "Let --write-case replace an existing file (even the input case).")
  boolean overwrite;

  @Option(names = "--notches", paramLabel = "N", description = "Maximum number of notches (default: ${DEFAULT-VALUE}).")
  int notches = 3;

  @Option(names = "--uncertainty", paramLabel = "U",
      description = "Relative modal frequency uncertainty; modes shifted by 1-U, 1, 1+U (default: the "
          + "case's requirements table, else 0.10).")
  Double uncertainty;

  @Option(names = "--limit-db", paramLabel = "DB",
      description = "Gain-stabilisation limit on structural peaks, dB (default: the case's requirements "
          + "table, else -6).")
  Double limitDb;

  @Option(names = "--phase-margin", paramLabel = "DEG",
      description = "Rigid-body phase margin to keep, deg (default: the requirements table's rigid-body "
          + "normal-envelope cell, else 45).")
  Double phaseMarginDeg;

  @Option(names = "--gain-margin", paramLabel = "DB",
      description = "Rigid-body gain margin to keep, dB (default: the requirements table's rigid-body "
          + "normal-envelope cell, else 6).")
  Double gainMarginDb;

  @Option(names = "--path", paramLabel = "PATH",
      description = "Path to carry the notches, by index or sensor name (repeatable; default: every path "
          + "whose sensor sees the structure).")
  List<String> paths = new ArrayList<>();

  @Option(names = "--keep-existing", description = "Keep the path's existing notches (default: replace them).")
  boolean keepExisting;

  @Option(names = "--max-eas", paramLabel = "M/S",
      description = "Design and check only sweep points at or below this EAS, m/s (default: the limit "
          + "speed V_L of the requirements table, where structural checks stop; else all points).")
  Double maxEasMps;

  @Option(names = "--stride", paramLabel = "N", description = "Use every N-th sweep grid point (default: ${DEFAULT-VALUE}).")
  int stride = 1;

  @Option(names = "--check-only", description = "Only check the case's own filters over the uncertainty range.")
  boolean checkOnly;

  @Mixin CommonOptions common;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    PrintWriter pw = spec.commandLine().getOut();
    boolean quiet = common.quiet;
    if (writeCase != null && checkOnly) {
      throw new InvalidInputException("--write-case", "a design to write (not --check-only)", "--check-only");
    }
    if (overwrite && writeCase == null) {
      throw new InvalidInputException("--overwrite", "--write-case FILE (it only applies there)", "no --write-case");
    }
    AnalysisCase c = LatticeCache.prepare(CaseReader.read(caseFile), spec.commandLine().getErr(), common.quiet);
    c.warnings().forEach(w -> spec.commandLine().getErr().println("flexmargin: warning: " + w.message()));
    if (c.loop() == null) {
      throw new InvalidInputException("loop", "a flight-control loop (notch design needs one)", "none");
    }
    List<Integer> idx = new ArrayList<>();
    for (String p : paths) {
      idx.add(NotchDesignSpec.pathIndex(c.loop(), p));
    }
    NotchDesignSpec s = NotchDesignSpec.forRequirements(c.requirements()).withNotchPaths(idx).withMaxNotches(notches)
        .withExistingNotches(keepExisting ? ExistingNotches.KEEP : ExistingNotches.REPLACE);
    if (uncertainty != null) {
      s = s.withFrequencyUncertainty(uncertainty);
    }
    if (limitDb != null) {
      s = s.withPeakLimitDb(limitDb);
    }
    if (phaseMarginDeg != null || gainMarginDb != null) {
      s = s.withRequiredMargins(phaseMarginDeg != null ? phaseMarginDeg : 45.0, gainMarginDb != null ? gainMarginDb : 6.0)
          .withMarginTable(null);
    }
    s = s.withPoints(stride, maxEasMps != null ? maxEasMps : s.maxSpeedEasMps());
    Path target = out != null ? out : Path.of("reports", ResultFiles.fileSafe(c.name()) + "-notch-design");
    ReportFolder.checkTarget(target);
    if (writeCase != null) {
      ReportFolder.checkFile(writeCase, "--write-case", overwrite);
    }
    NotchDesigner designer = new NotchDesigner();
    if (checkOnly) {
      RobustnessCheckResult r = designer.check(c, s);
      Path written = ReportFolder.writeAtomically(target,
          folder -> Files.writeString(folder.resolve("notch-check.json"), NotchJson.check(r, Cautions.TEXT)));
      if (!quiet) {
        printCheck(pw, r);
        pw.println();
        pw.println("written to " + written.resolve("notch-check.json"));
        Tables.cautions(pw);
      }
      return r.passes() ? FlexMargin.EXIT_OK : FlexMargin.EXIT_REQUIREMENTS_VIOLATED;
    }
    NotchDesignResult r = designer.design(c, s);
    DiscreteNotchSet discrete = DiscreteNotchSet.of(c, r, designer);
    Path written = ReportFolder.writeAtomically(target, folder -> {
      Files.writeString(folder.resolve("notch-design.json"), NotchJson.design(r, discrete, Cautions.TEXT));
      Files.writeString(folder.resolve("notch-filters.json"), NotchJson.filters(r));
      if (!discrete.sections().isEmpty()) {
        Files.writeString(folder.resolve("notch-filters-discrete.json"), NotchJson.filters(r, discrete.designedLoop()));
      }
    });
    Path updatedCase = r.feasible() && writeCase != null ? writeUpdatedCase(r) : null;
    if (!quiet) {
      printDesign(pw, r);
      printDiscrete(pw, discrete);
      pw.println();
      pw.println("written to " + written.resolve("notch-design.json") + " and " + written.resolve("notch-filters.json")
          + (discrete.sections().isEmpty() ? "" : " (discrete sections: " + written.resolve("notch-filters-discrete.json")
              + ")"));
      if (updatedCase != null) {
        pw.println("case with the designed notches in place: " + updatedCase
            + " (check it: flexmargin sweep " + updatedCase + ")");
      } else if (writeCase != null) {
        pw.println("no case written to " + writeCase + ": no feasible notch set");
      }
      Tables.cautions(pw);
    }
    return r.feasible() ? FlexMargin.EXIT_OK : FlexMargin.EXIT_REQUIREMENTS_VIOLATED;
  }

  /** Writes the case with the designed filters atomically, after reading the copy back as a case. */
  private Path writeUpdatedCase(NotchDesignResult r) {
    String text = CaseFileUpdate.withFilters(caseFile, writeCase, NotchJson.filters(r));
    return ReportFolder.writeFileAtomically(writeCase, "--write-case", text, overwrite, CaseReader::read);
  }

  private static void printDiscrete(PrintWriter pw, DiscreteNotchSet d) {
    pw.println();
    if (d.sections().isEmpty()) {
      pw.println("discrete-time sections: none (" + d.note() + ")");
      return;
    }
    pw.printf(Locale.ROOT, "discrete-time sections at T = %.6g s (bilinear transform pre-warped at each centre;%n"
        + "  H(z) = (b0 + b1 z^-1 + b2 z^-2) / (1 + a1 z^-1 + a2 z^-2), coefficients to paste into flight software):%n",
        d.samplePeriodS());
    for (DiscreteNotchSet.Section s : d.sections()) {
      double[] b = s.filter().numerator();
      double[] a = s.filter().denominator();
      pw.printf(Locale.ROOT, "  centre %7.3f Hz  b = [%s, %s, %s]%n", s.notch().centreFrequencyHz(), b[0], b[1], b[2]);
      pw.printf(Locale.ROOT, "                    a = [%s, %s, %s]  centre gain %.3f dB (continuous %.3f dB)%n",
          a[0], a[1], a[2], s.centreGainDb(), s.continuousCentreGainDb());
    }
    if (d.check() != null) {
      pw.println(d.check().passes()
          ? "  check of the discrete set against the requirements table (same rules as sweep): PASS"
          : "  check of the discrete set against the requirements table (same rules as sweep): FAIL");
      for (RobustnessCheckResult.ConfigurationVerdict v : d.check().configurations()) {
        v.clearance().ranked().stream().filter(f -> !f.check().passed()).forEach(f -> pw.printf(Locale.ROOT,
            "    %s: %s: required %.3g %s, achieved %.3g %s%n", v.configuration(), f.check().description(),
            f.check().requiredValue(), f.check().unit().symbol(), f.check().achievedValue(), f.check().unit().symbol()));
      }
    } else {
      pw.println("  not checked: " + d.note());
    }
  }

  private static String where(ModePeak p) {
    if (p.where() == null) {
      return "-";
    }
    return String.format(Locale.ROOT, "%s %.0f m/s x%.2f", p.where().configuration(), p.where().speedEasMps(),
        p.where().shiftFactor());
  }

  private static void printDesign(PrintWriter pw, NotchDesignResult r) {
    NotchDesignSpec s = r.spec();
    String rigid = s.marginTable() != null
        ? "rigid-body margins from the requirements table by speed regime"
        : String.format(Locale.ROOT, "rigid-body margins %.0f deg / %.0f dB", s.requiredPhaseMarginDeg(),
            s.requiredGainMarginDb());
    String envelope = Double.isFinite(s.maxSpeedEasMps())
        ? String.format(Locale.ROOT, ", up to %.1f m/s EAS", s.maxSpeedEasMps()) : "";
    pw.printf(Locale.ROOT, "case %s: notch design, limit %.1f dB, frequency uncertainty +-%.0f %%, %s%s, paths %s%n",
        r.caseName(), s.peakLimitDb(), 100 * s.frequencyUncertainty(), rigid, envelope, r.notchPaths());
    pw.println(r.feasible() ? "result: feasible notch set found" : "result: NO FEASIBLE NOTCH SET");
    pw.println();
    pw.println("notches (in every carrying path):");
    for (DesignedNotch n : r.notches()) {
      pw.printf(Locale.ROOT, "  centre %7.3f Hz  zeta_z %.4f  zeta_p %.4f  depth %5.1f dB  -3 dB width %5.2f Hz%n",
          n.centreHz(), n.numeratorDampingRatio(), n.denominatorDampingRatio(), n.depthDb(), n.minus3DbWidthHz());
    }
    pw.println();
    String h = String.format(Locale.ROOT, "%-22s %10s %-26s %10s %-26s", "mode", "before dB", "where", "after dB",
        "where");
    pw.println(h);
    pw.println("-".repeat(h.length()));
    for (ModePeakChange c : r.peaks()) {
      pw.printf(Locale.ROOT, "%-22s %10.2f %-26s %10.2f %-26s%n", c.mode(), c.before().peakDb(), where(c.before()),
          c.after().peakDb(), where(c.after()));
    }
    pw.println();
    for (PhaseCost pc : r.phaseCost()) {
      pw.printf(Locale.ROOT, "phase cost at the rigid-body crossover, %s: %.2f deg (at %.2f Hz%s)%n",
          pc.configuration(), pc.worstLossDeg(), pc.crossoverHz(), pc.where() == null ? "" : String.format(Locale.ROOT,
              ", %s %.0f m/s x%.2f", pc.where().configuration(), pc.where().speedEasMps(), pc.where().shiftFactor()));
    }
    pw.printf(Locale.ROOT, "(the case's own notches in these paths cost %.2f deg)%n", r.originalPhaseCost().worstLossDeg());
    pw.println();
    pw.println("rigid-body margins re-run independently (nominal frequencies): before -> after");
    String m = String.format(Locale.ROOT, "%-14s %8s %17s %17s %17s", "configuration", "EAS m/s", "PM deg",
        "GM+ dB", "GM- dB");
    pw.println(m);
    pw.println("-".repeat(m.length()));
    for (MarginComparison mc : r.margins()) {
      RigidMargins b = mc.before();
      RigidMargins a = mc.after();
      pw.printf(Locale.ROOT, "%-14s %8.1f %17s %17s %17s%n", b.configuration(), b.speedEasMps(),
          pair(b.phaseMarginDeg(), a.phaseMarginDeg()), pair(b.gainIncreaseMarginDb(), a.gainIncreaseMarginDb()),
          pair(b.gainReductionMarginDb(), a.gainReductionMarginDb()));
    }
    double worst = Double.NEGATIVE_INFINITY;
    for (CheckedPeak cp : r.checkedPeaks()) {
      worst = Math.max(worst, cp.peakDb());
    }
    pw.printf(Locale.ROOT, "worst structural peak after, independent re-run at those speeds: %.2f dB%n", worst);
    pw.printf(Locale.ROOT, "optimiser: %s, %d evaluations, %d runs, final objective %.4g, %d violations%n",
        r.diagnostics().method(), r.diagnostics().evaluations(), r.diagnostics().runs(),
        r.diagnostics().finalObjective(), r.diagnostics().violations());
    if (!r.reasons().isEmpty()) {
      pw.println();
      pw.println("why no feasible set:");
      for (String reason : r.reasons()) {
        pw.println("  - " + reason);
      }
    }
  }

  private static String pair(double a, double b) {
    return fmt(a) + " -> " + fmt(b);
  }

  private static String fmt(double v) {
    return Double.isFinite(v) ? String.format(Locale.ROOT, "%.1f", v) : "none";
  }

  private static void printCheck(PrintWriter pw, RobustnessCheckResult r) {
    pw.printf(Locale.ROOT, "case %s: check of the case's own filters against the requirements table (the rules of "
        + "sweep), limit %.1f dB, frequency uncertainty +-%.0f %%%n", r.caseName(), r.spec().peakLimitDb(),
        100 * r.spec().frequencyUncertainty());
    pw.println(r.passes() ? "result: passes" : "result: DOES NOT PASS");
    for (RobustnessCheckResult.ConfigurationVerdict v : r.configurations()) {
      pw.println();
      pw.print("  " + v.configuration() + ": " + (v.clearance().passed() ? "PASS" : "FAIL"));
      v.clearance().governingFinding().ifPresent(g -> pw.print("; governing: " + g.describe()));
      pw.println();
      String h = String.format(Locale.ROOT, "    %-24s %-20s %-6s %8s %17s %15s", "requirement", "mode or band",
          "result", "EAS m/s", "required", "achieved");
      pw.println(h);
      pw.println("    " + "-".repeat(h.length() - 4));
      for (RankedFinding f : v.clearance().ranked()) {
        ClearanceCheck c = f.check();
        pw.printf(Locale.ROOT, "    %-24s %-20s %-6s %8.2f %17s %15s%n", c.kind().key().replace('_', ' '),
            c.subject().isEmpty() ? "-" : c.subject(), c.passed() ? "pass" : "FAIL", f.speedEasMps(), sensed(c),
            value(c.achievedValue(), c));
      }
    }
    pw.println();
    pw.println("requirements: " + r.requirementsSource());
  }

  private static String sensed(ClearanceCheck c) {
    if (c.unit() == CheckUnit.STABILITY) {
      return "stable";
    }
    return (c.sense() == RequiredSense.AT_LEAST ? ">= " : "<= ") + value(c.requiredValue(), c);
  }

  private static String value(double v, ClearanceCheck c) {
    if (c.unit() == CheckUnit.STABILITY) {
      return v >= 0 ? "stable" : "unstable";
    }
    return String.format(Locale.ROOT, c.unit() == CheckUnit.DAMPING_G ? "%.4f %s" : "%.2f %s", v, c.unit().symbol());
  }
}
