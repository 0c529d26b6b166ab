package org.flexmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InputFile;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code flexmargin check CASE}: validate a case and summarise it. */
@Command(name = "check", mixinStandardHelpOptions = true,
    description = "Validate a case file and its mode tables and print a summary; nothing is computed or written.",
    footer = {"", "Example:", "  flexmargin check mode-tables/demo/demo-case.json"})
final class CheckCommand implements Callable<Integer> {
  @Parameters(index = "0", paramLabel = "CASE", description = "Case file (JSON).")
  Path caseFile;

  @Mixin CommonOptions common;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    AnalysisCase c = CaseReader.read(caseFile);
    PrintWriter out = spec.commandLine().getOut();
    out.printf(Locale.ROOT, "case %s (format %d): %s%n", c.name(), c.format(), c.description());
    PlannedPath path = new PlannedPath(c.sweep());
    out.println("sweep: " + path.describe());
    out.printf(Locale.ROOT, "  first point: %s%n", Tables.condition(path.at(0)));
    out.printf(Locale.ROOT, "  last point:  %s%n", Tables.condition(path.at(path.gridPoints() - 1)));
    out.printf(Locale.ROOT, "method: %s, damping limit g = %.3f%n",
        c.options().method().name().toLowerCase(Locale.ROOT), c.options().dampingLimitG());
    for (Configuration cfg : c.configurations()) {
      ConfigurationModel m = ConfigurationModel.of(cfg);
      out.printf(Locale.ROOT, "configuration %s: %d elastic modes; aerodynamics: %s%n",
          cfg.name(), m.modes().size(), m.system().aero().description());
      for (ElasticMode mode : m.modes().modes()) {
        out.printf(Locale.ROOT, "  %-28s %9.3f Hz  zeta %.4f  generalized mass %.4g kg%n",
            mode.name(), mode.frequencyHz(), mode.dampingRatio(), mode.generalizedMassKg());
      }
    }
    out.println("inputs:");
    for (InputFile f : c.inputs()) {
      out.printf(Locale.ROOT, "  %s  sha256 %s%n", f.path(), f.sha256());
    }
    out.println("input is valid.");
    return FlexMargin.EXIT_OK;
  }
}
