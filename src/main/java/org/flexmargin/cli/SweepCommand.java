package org.flexmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicReference;
import org.flexmargin.clearance.Severity;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.io.CaseReader;
import org.flexmargin.io.EnvelopeReader;
import org.flexmargin.io.RequirementsOverride;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.report.EnvelopeReport;
import org.flexmargin.report.ReportFolder;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.notch.ExistingNotches;
import org.flexmargin.notch.NotchDesignResult;
import org.flexmargin.notch.NotchDesignSpec;
import org.flexmargin.notch.NotchDesigner;
import org.flexmargin.report.ProposedNotches;
import org.flexmargin.simulate.LoopComparison;
import org.flexmargin.simulate.SharedModels;
import org.flexmargin.report.ReportOptions;
import org.flexmargin.report.ConfigurationCharts;
import org.flexmargin.report.ReportWriter;
import org.flexmargin.report.ResultFiles;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.Findings;
import org.flexmargin.sweep.Instability;
import org.flexmargin.sweep.MatchedPoints;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.SweepResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code flexmargin sweep CASE}: the main job. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
    description = {"Sweep airspeed: divergence speed and every open-loop flutter onset; with a loop, the loop "
        + "margins at every speed and the closed-loop onsets; with a requirements table, pass/fail and the "
        + "speed at which each requirement is first lost. Onsets are refined between grid points. Writes "
        + "report.html, charts, JSON and CSV under reports/<case>/ (exit 3 when a requirement is violated). With "
        + "an envelope section in the case, the matched-point envelope is computed too and shown in the report."},
    footer = {"", "Examples:", "  flexmargin sweep mode-tables/demo/demo-case.json",
        "  flexmargin sweep mode-tables/validation/goland-wing.json --out /tmp/goland --quiet"})
final class SweepCommand implements Callable<Integer> {
  @Parameters(index = "0", paramLabel = "CASE", description = "Case file (JSON).")
  Path caseFile;

  @Option(names = "--out", paramLabel = "DIR",
      description = "Output folder (default: reports/<case name>). Must be new, empty or an earlier "
          + "flexmargin output folder, which is replaced once the new report is complete.")
  Path out;

  @Option(names = "--requirements", paramLabel = "FILE",
      description = "Judge against this requirements file (format of docs/requirements.md) instead of "
          + "the case's own requirements section.")
  Path requirementsFile;

  @Option(names = "--design-notches", description = "Also place structural notches as notch-design does (its "
      + "defaults) and show them in the report: on the notch chart and as a \"with proposed notches\" curve on "
      + "the Bode and Nichols charts. Adds the cost of a notch design.")
  boolean designNotches;

  @Option(names = "--time-domain-check", description = "Also simulate a 1 deg doublet and 1-cosine gusts at V0max "
      + "(first configuration, the case's actuator limits) with the case's loop and, with --design-notches, the "
      + "designed one, and show the time histories in the report. Needs a loop and requirements.")
  boolean timeDomainCheck;

  @Mixin CommonOptions common;
  @Mixin ReportStyleOptions style;
  @Mixin WorkOptions work;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    AnalysisCase c = CaseReader.read(caseFile);
    c.warnings().forEach(w -> spec.commandLine().getErr().println("flexmargin: warning: " + w.message()));
    if (requirementsFile != null) {
      c = RequirementsOverride.apply(c, requirementsFile);
    }
    return run(spec, c, out != null ? out : defaultFolder(c), common, style, work, designNotches, timeDomainCheck,
        EnvelopeReader.readIfPresent(caseFile).orElse(null));
  }

  /** @return reports/&lt;case name&gt; */
  static Path defaultFolder(AnalysisCase c) {
    return Path.of("reports", ResultFiles.fileSafe(c.name()));
  }

  /**
   * Sweeps a case and writes its report. The output folder and the estimated cost are checked
   * before any computation.
   */
  static int run(picocli.CommandLine.Model.CommandSpec spec, AnalysisCase c, Path target, CommonOptions common,
      ReportStyleOptions style, WorkOptions work) {
    return run(spec, c, target, common, style, work, false, false);
  }

  /**
   * As above; with {@code designNotches} a notch design is made and shown in the report; with
   * {@code timeDomain} (and a loop and requirements) the doublet-and-gust check at V0max is added.
   */
  static int run(picocli.CommandLine.Model.CommandSpec spec, AnalysisCase c, Path target, CommonOptions common,
      ReportStyleOptions style, WorkOptions work, boolean designNotches, boolean timeDomain) {
    return run(spec, c, target, common, style, work, designNotches, timeDomain, null);
  }

  /**
   * As above; with an {@code envelope} section the matched-point envelope of every configuration
   * is computed after the sweep and shown in the report.
   */
  static int run(picocli.CommandLine.Model.CommandSpec spec, AnalysisCase c, Path target, CommonOptions common,
      ReportStyleOptions style, WorkOptions work, boolean designNotches, boolean timeDomain, EnvelopeSpec envelope) {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    ReportFolder.checkTarget(target);
    c = LatticeCache.prepare(c, err, common.quiet);
    CostEstimate cost = CostEstimate.of(c);
    if (!common.quiet) {
      out.println(cost.describe(work.threads));
      out.flush();
    }
    if (cost.overLimit() && !work.force) {
      throw new InvalidInputException("estimated cost",
          "at most " + CostEstimate.LIMIT_TEXT + " (give --force to run anyway)",
          "about " + CostEstimate.duration(cost.cpuSeconds()) + "; fewer sweep points or modes bring it down");
    }
    // one model per configuration for the time-domain check and the loop charts
    SharedModels models = new SharedModels();
    ReportOptions styled = style.reportOptions().withModels(models);
    ReportOptions withNotches = designNotches && c.loop() != null
        ? styled.withProposedNotches(proposedNotches(c)) : styled;
    ProposedNotches proposed = withNotches.proposedNotches();
    AnalysisCase analysed = c;
    // the time-domain check needs no sweep result: it runs in the sweep's pool beside the sweep
    boolean checked = timeDomain && c.loop() != null && c.requirements() != null;
    AtomicReference<LoopComparison> check = new AtomicReference<>();
    Runnable alongside = checked
        ? () -> check.set(LoopComparison.of(analysed, models, proposed == null ? null : proposed.loop(),
            "designed notches"))
        : () -> { };
    boolean terminal = System.console() != null && !common.quiet;
    ProgressBar bar = new ProgressBar(err, cost, terminal);
    CaseSweep sweep = new CaseSweep(work.threads);
    // each configuration's charts are drawn as soon as it is analysed, while the others compute
    PlannedPath path = new PlannedPath(c.sweep());
    String pathDescription = path.describe();
    Map<String, ConfigurationCharts> drawnEarly = new ConcurrentHashMap<>();
    SweepResult result = sweep.run(c, bar, r -> drawnEarly.put(r.configuration(),
        ConfigurationCharts.draw(analysed, pathDescription, r, withNotches)), alongside);
    ReportOptions reportOptions = checked ? withNotches.withTimeDomainCheck(check.get()) : withNotches;
    List<Finding> findings = Findings.of(result, path.at(0));
    ReportOptions shown = envelope == null ? reportOptions : reportOptions.withEnvelope(envelope(c, envelope));
    if (terminal) {
      err.println("writing the report to " + target.toAbsolutePath().normalize() + " ...");
      err.flush();
    }
    Path written = sweep.inPool(() -> ReportFolder.writeAtomically(target, folder -> {
      ResultFiles.write(folder, result, findings, Version.get());
      ReportWriter.write(folder, result, findings, Version.get(), shown, drawnEarly);
    }));
    if (!common.quiet) {
      out.println("case " + c.name() + ": " + result.pathDescription());
      out.println();
      Tables.findings(out, findings, terminal);
      out.println();
      for (ConfigurationResult r : result.configurations()) {
        SolverDiagnostics d = r.flutter().diagnostics();
        out.printf(Locale.ROOT,
            "%s: %s method, %d root solves, %.2f iterations per root, %d step halvings, worst residual %.1e, "
                + "lowest MAC %.3f, %d unconverged, %.2f s%n",
            r.configuration(), r.flutter().method().label(),
            d.rootSolves(), d.rootSolves() > 0 ? (double) d.iterations() / d.rootSolves() : 0.0,
            d.stepHalvings(), d.maxRelativeResidual(), d.minMac(), d.unconvergedRoots(), r.elapsedSeconds());
        for (String w : r.flutter().warnings()) {
          out.println("  warning: " + w);
        }
        if (r.servo() != null) {
          r.servo().closedLoop().assumptions().forEach(a -> out.println("  assumption: " + a));
        }
        if (r.clearance() == null) {
          out.println("  lowest unstable speed: " + lowestUnstable(r));
        }
      }
      clearance(out, result, terminal);
      out.println();
      out.println("results written to " + written + " (report: " + written.resolve("report.html") + ")");
      Tables.cautions(out);
    }
    boolean failed = result.configurations().stream()
        .anyMatch(r -> r.clearance() != null && !r.clearance().passed());
    boolean unreliable = result.configurations().stream().anyMatch(r -> r.trackingTrustedUpToEasMps().isPresent());
    return failed ? FlexMargin.EXIT_REQUIREMENTS_VIOLATED : unreliable ? FlexMargin.EXIT_UNRELIABLE : FlexMargin.EXIT_OK;
  }

  /** The matched-point envelope of every configuration, for the report. */
  private static EnvelopeReport.Data envelope(AnalysisCase c, EnvelopeSpec spec) {
    return new EnvelopeReport.Data(spec, c.configurations().stream()
        .map(cfg -> MatchedPoints.of(cfg, spec, c.options())).toList());
  }

  /** A notch design with the defaults of {@code notch-design}, for the report. */
  private static ProposedNotches proposedNotches(AnalysisCase c) {
    NotchDesignSpec s = NotchDesignSpec.forRequirements(c.requirements()).withNotchPaths(List.of())
        .withMaxNotches(3).withExistingNotches(ExistingNotches.REPLACE);
    s = s.withPoints(1, s.maxSpeedEasMps());
    NotchDesignResult r = new NotchDesigner().design(c, s);
    return new ProposedNotches(r.designedLoop(), r.feasible(), String.format(Locale.ROOT,
        "designed over every configuration%s, limit %.1f dB, frequency uncertainty +-%.0f %%",
        Double.isFinite(s.maxSpeedEasMps()) ? String.format(Locale.ROOT, " up to %.1f m/s EAS", s.maxSpeedEasMps())
            : "", s.peakLimitDb(), 100 * s.frequencyUncertainty()));
  }

  private static String lowestUnstable(ConfigurationResult r) {
    return r.lowestInstability().map(Instability::describe)
        .orElse("none found (no flutter onset, closed-loop instability or divergence)");
  }

  private static void clearance(PrintWriter out, SweepResult result, boolean colour) {
    boolean any = false;
    for (ConfigurationResult r : result.configurations()) {
      if (r.clearance() == null) {
        continue;
      }
      if (!any) {
        out.println();
        out.println("Clearance against the requirements table:");
        any = true;
      }
      boolean pass = r.clearance().passed();
      String verdict = pass ? "PASS" : "FAIL";
      if (colour) {
        verdict = (pass ? "\u001b[1;32m" : "\u001b[1;31m") + verdict + "\u001b[0m";
      }
      out.printf(Locale.ROOT, "  %s: %s", r.configuration(), verdict);
      r.clearance().governingFinding().ifPresent(g -> out.printf(Locale.ROOT, "; governing: %s", g.describe()));
      out.println();
      out.println("    lowest unstable speed: " + lowestUnstable(r));
      long failing = r.clearance().points().stream().filter(p -> !p.passed()).count();
      if (failing > 0) {
        out.printf(Locale.ROOT, "    %d of %d sweep points fail at least one loop requirement%n", failing,
            r.clearance().points().size());
      }
    }
    if (any) {
      out.println("  ranking: " + Severity.RULE);
      out.println("  requirements: " + result.configurations().stream().filter(r -> r.clearance() != null)
          .findFirst().orElseThrow().clearance().requirementsSource());
    }
  }
}
