package org.flexmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.LoopFileCheck;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.io.LoopFileReader;
import org.flexmargin.io.MeasuredTableReader;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.MeasuredTable;
import org.flexmargin.model.OpenLoopData;
import org.flexmargin.report.LoopFileReport;
import org.flexmargin.report.ReportFolder;
import org.flexmargin.report.ResultFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code flexmargin margins LOOP_FILE}: margins of a loop given on its own. */
@Command(name = "margins", mixinStandardHelpOptions = true,
    description = {"Margins of a loop given on its own (transfer function, zeros/poles/gain, state space or a "
        + "measured frequency response; with delay and zero-order hold): every gain and phase crossover, delay and "
        + "disk margins, structural peaks, and the requirements check when the loop file has a table. Writes "
        + "report.html (Bode, Nichols, margin tables), results.json, margins.csv and the sampled responses under "
        + "reports/<name>-margins/ (exit 3 when a requirement is violated)."},
    footer = {"", "Examples:", "  flexmargin margins mode-tables/loops/ridgeline-pitch-loop.json",
        "  flexmargin margins mode-tables/loops/ridgeline-pitch-loop.json "
            + "--measured mode-tables/loops/ridgeline-ground-test.csv",
        "  flexmargin margins mode-tables/loops/textbook-type1.json --out /tmp/type1 --quiet"})
final class MarginsCommand implements Callable<Integer> {
  @Parameters(index = "0", paramLabel = "LOOP_FILE", description = "Loop file (JSON, docs/loop-files.md).")
  Path loopFile;

  @Option(names = "--out", paramLabel = "DIR",
      description = "Output folder (default: reports/<loop name>-margins). Must be new, empty or an earlier "
          + "flexmargin output folder, which is replaced once the new report is complete.")
  Path out;

  @Option(names = "--measured", paramLabel = "FILE",
      description = "A measured open-loop response table (CSV or JSON: frequency_hz, gain_db, phase_deg) drawn beside "
          + "the loop on the Bode and Nichols charts and judged against the same modes and requirements.")
  Path measuredFile;

  @Mixin ChartFileOptions chartFiles;

  @Mixin CommonOptions common;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws Exception {
    PrintWriter o = spec.commandLine().getOut();
    LoopFile file = LoopFileReader.read(loopFile);
    file.warnings().forEach(w -> spec.commandLine().getErr().println("flexmargin: warning: " + w.message()));
    MeasuredTable measured = measuredFile == null ? null : MeasuredTableReader.read(measuredFile);
    Path target = out != null ? out : Path.of("reports", ResultFiles.fileSafe(file.name()) + "-margins");
    ReportFolder.checkTarget(target);
    List<LoopFileCheck.Result> results = new ArrayList<>();
    List<double[]> tables = new ArrayList<>();
    results.add(LoopFileCheck.analyse(file));
    tables.add(file.loop() instanceof OpenLoopData.Measured m ? m.table().frequencyHz() : null);
    if (measured != null) {
      results.add(LoopFileCheck.analyseMeasured(file, measured));
      tables.add(measured.frequencyHz());
    }
    Path written = ReportFolder.writeAtomically(target,
        folder -> LoopFileReport.write(folder, file, results, tables, Version.get(), chartFiles.svg));
    if (!common.quiet) {
      o.println("loop " + file.name() + " (" + file.loop().key().replace('_', ' ') + "): " + String.format(Locale.ROOT,
          "delay %.4g s, zero-order hold %s", file.delayS(), file.samplePeriodS() > 0
              ? String.format(Locale.ROOT, "T = %.4g s", file.samplePeriodS()) : "none"));
      for (LoopFileCheck.Result r : results) {
        print(o, r);
      }
      if (file.requirements() != null) {
        o.println();
        o.println("requirements: " + file.requirements().source());
      }
      o.println();
      o.println("results written to " + written + " (report: " + written.resolve("report.html") + ")");
      Tables.cautions(o);
    }
    boolean failed = results.stream().anyMatch(r -> !r.passed());
    return failed ? FlexMargin.EXIT_REQUIREMENTS_VIOLATED : FlexMargin.EXIT_OK;
  }

  private static void print(PrintWriter o, LoopFileCheck.Result r) {
    o.println();
    o.printf(Locale.ROOT, "%s, %.4g to %.4g Hz: %s%n", r.label(), r.minFrequencyHz(), r.maxFrequencyHz(),
        LoopFileReport.verdict(r));
    o.println("  " + LoopFileReport.summary(r));
    r.margins().phaseCrossovers().forEach(p -> o.printf(Locale.ROOT,
        "  phase crossover %10.5g Hz   gain margin %+8.3f dB (%s)%n", p.frequencyHz(), p.gainMarginDb(),
        p.direction().name().toLowerCase(Locale.ROOT).replace('_', ' ')));
    r.margins().gainCrossovers().forEach(g -> o.printf(Locale.ROOT,
        "  gain crossover  %10.5g Hz   phase margin %8.3f deg, delay margin %.4g s%n", g.frequencyHz(),
        g.phaseMarginDeg(), g.delayMarginS()));
    for (StructuralModeAssessment a : r.structuralModes()) {
      o.printf(Locale.ROOT, "  structural mode %-20s %8.4g Hz   peak %+7.2f dB at %.4g Hz (limit %.1f dB), %s%n",
          a.modeName(), a.modeFrequencyHz(), a.peakDb(), a.peakFrequencyHz(), a.peakLimitDb(),
          a.status().name().toLowerCase(Locale.ROOT).replace('_', ' '));
    }
    if (r.assessment() != null) {
      for (ClearanceCheck c : r.assessment().failures()) {
        o.printf(Locale.ROOT, "  violated: %s: required %.3g %s, achieved %.3g %s%n", c.description(),
            c.requiredValue(), c.unit().symbol(), c.achievedValue(), c.unit().symbol());
      }
    }
    r.notes().forEach(n -> o.println("  note: " + n));
  }
}
