package org.flexmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.flexmargin.io.CaseReader;
import org.flexmargin.io.EnvelopeReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.report.EnvelopeReport;
import org.flexmargin.report.ReportFolder;
import org.flexmargin.report.ResultFiles;
import org.flexmargin.sweep.MatchedPoints;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code flexmargin envelope CASE}: matched-point flutter and divergence boundary. */
@Command(name = "envelope", mixinStandardHelpOptions = true,
    description = {"Matched-point flutter and divergence boundary of every configuration, from the case's envelope "
        + "section: at each listed altitude the Mach number of the forces is iterated to that of the onset, along "
        + "each listed Mach number the altitude is swept with the forces at that Mach number.",
        "Writes envelope.csv, envelope.png (altitude against EAS with the design dive line) and envelope.txt. "
            + "Exit 0 when done."},
    footer = {"", "Example:", "  flexmargin envelope src/test/resources/lattice/envelope-case.json --out /tmp/env"})
final class EnvelopeCommand implements Callable<Integer> {
  @Parameters(index = "0", paramLabel = "CASE", description = "Case file (JSON) with an envelope section.")
  Path caseFile;

  @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: reports/<case name>/envelope).")
  Path out;

  @Mixin CommonOptions common;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    PrintWriter err = spec.commandLine().getErr();
    AnalysisCase read = CaseReader.read(caseFile);
    EnvelopeSpec env = EnvelopeReader.read(caseFile);
    read.warnings().forEach(w -> err.println("flexmargin: warning: " + w.message()));
    Path target = out != null ? out : Path.of("reports", ResultFiles.fileSafe(read.name()), "envelope");
    ReportFolder.checkTarget(target);
    AnalysisCase c = LatticeCache.prepare(read, err, common.quiet);
    List<MatchedPoints.Envelope> envelopes = new ArrayList<>();
    for (Configuration cfg : c.configurations()) {
      envelopes.add(MatchedPoints.of(cfg, env, c.options()));
    }
    Path written = ReportFolder.writeAtomically(target, folder -> EnvelopeReport.write(folder, c.name(), env, envelopes));
    if (!common.quiet) {
      PrintWriter pw = spec.commandLine().getOut();
      pw.print(EnvelopeReport.text(c.name(), env, envelopes));
      pw.println("written to " + written);
    }
    for (MatchedPoints.Envelope e : envelopes) {
      e.warnings().forEach(w -> err.println("flexmargin: warning: " + e.configuration() + ": " + w));
    }
    err.flush();
    return FlexMargin.EXIT_OK;
  }
}
