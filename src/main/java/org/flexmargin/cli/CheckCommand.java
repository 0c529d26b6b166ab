package org.flexmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InputFile;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.ServoMargins;
import org.flexmargin.sweep.PlannedPath;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code flexmargin check CASE}: validate a case and summarise it. */
@Command(name = "check", mixinStandardHelpOptions = true,
    description = {"Validate a case file and its mode tables and print a summary, with the estimated cost of "
        + "sweeping it; nothing is computed or written.",
        "A sweep whose estimate exceeds " + CostEstimate.LIMIT_TEXT + " is refused unless --force is given."},
    footer = {"", "Example:", "  flexmargin check mode-tables/demo/demo-case.json"})
final class CheckCommand implements Callable<Integer> {
  @Parameters(index = "0", paramLabel = "CASE", description = "Case file (JSON).")
  Path caseFile;

  @Mixin CommonOptions common;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    AnalysisCase c = LatticeCache.prepare(CaseReader.read(caseFile), spec.commandLine().getErr(), common.quiet);
    c.warnings().forEach(w -> spec.commandLine().getErr().println("flexmargin: warning: " + w.message()));
    if (common.quiet) {
      return FlexMargin.EXIT_OK;
    }
    PrintWriter out = spec.commandLine().getOut();
    out.printf(Locale.ROOT, "case %s (format %d): %s%n", c.name(), c.format(), c.description());
    PlannedPath path = new PlannedPath(c.sweep());
    out.println("sweep: " + path.describe());
    out.printf(Locale.ROOT, "  first point: %s%n", Tables.condition(path.at(0)));
    out.printf(Locale.ROOT, "  last point:  %s%n", Tables.condition(path.at(path.gridPoints() - 1)));
    out.printf(Locale.ROOT, "method: %s, damping limit g = %.3f%n", c.options().method().label(),
        c.options().dampingLimitG());
    Map<Configuration, ConfigurationModel> models = new LinkedHashMap<>();
    for (Configuration cfg : c.configurations()) {
      ConfigurationModel m = ConfigurationModel.of(cfg);
      models.put(cfg, m);
      out.printf(Locale.ROOT, "configuration %s: %d elastic modes; aerodynamics: %s%n",
          cfg.name(), m.modes().size(), m.system().aero().description());
      for (ElasticMode mode : m.modes().modes()) {
        out.printf(Locale.ROOT, "  %-28s %9.3f Hz  zeta %.4f  generalized mass %.4g kg%n",
            mode.name(), mode.frequencyHz(), mode.dampingRatio(), mode.generalizedMassKg());
      }
    }
    if (c.loop() != null) {
      LoopSpec loop = c.loop();
      out.printf(Locale.ROOT, "loop: %s actuator %.1f Hz, delay %.4f s, sample period %.4f s, Pade order %d%n",
          loop.actuator().order().name().toLowerCase(Locale.ROOT), loop.actuator().bandwidthHz(),
          loop.computationDelayS(), loop.samplePeriodS(), loop.padeOrder());
      for (SensorSpec sensor : loop.sensors()) {
        out.printf(Locale.ROOT, "  sensor %-16s %-22s at %-12s bandwidth %s%n", sensor.name(),
            sensor.kind().name().toLowerCase(Locale.ROOT), sensor.station(),
            sensor.bandwidthHz() > 0 ? String.format(Locale.ROOT, "%.1f Hz", sensor.bandwidthHz()) : "ideal");
      }
      for (FeedbackPath fp : loop.paths()) {
        out.printf(Locale.ROOT, "  path from %-12s Kp %.4g, Ki %.4g 1/s, %d filter(s), schedule %s%n", fp.sensor(),
            fp.proportionalGain(), fp.integralGainPerS(), fp.filters().size(),
            fp.schedule().dynamicPressurePa().length > 1 ? "on dynamic pressure" : "constant");
      }
      for (Configuration cfg : c.configurations()) {
        var plant = ServoMargins.loopAt(models.get(cfg), cfg, loop, path.at(0)).plant();
        double[] sp = plant.shortPeriodRoots();
        out.printf(Locale.ROOT, "  %s airframe alone at the first point: short-period roots %.3f%+.3fi and %.3f%+.3fi 1/s%s%n",
            cfg.name(), sp[0], sp[1], sp[2], sp[3], Math.max(sp[0], sp[2]) > 0 ? " (unstable: the loop must stabilise it)" : "");
        plant.assumptions().forEach(a -> out.println("    assumption: " + a));
        CouplingTable.print(out, cfg);
      }
    }
    if (c.requirements() != null) {
      out.printf(Locale.ROOT, "requirements: V0max %.1f m/s EAS, V_L %.1f m/s EAS, flutter-free to %.3f x V_L, "
          + "damping g >= %.3f, structural limit %.1f dB, uncertainty +-%.0f %%%n",
          c.requirements().maxOperatingSpeedEasMps(), c.requirements().limitSpeedEasMps(),
          c.requirements().flutterSpeedFactor(), c.requirements().minimumDampingG(),
          c.requirements().structuralPeakLimitDb(), 100 * c.requirements().frequencyUncertainty());
      out.println("  source: " + c.requirements().source());
    }
    out.println("inputs:");
    for (InputFile f : c.inputs()) {
      out.printf(Locale.ROOT, "  %s  sha256 %s%n", f.path(), f.sha256());
    }
    int threads = Runtime.getRuntime().availableProcessors();
    CostEstimate cost = CostEstimate.of(c);
    out.println(cost.describe(threads));
    if (cost.overLimit()) {
      out.println("  above the limit: sweep refuses this case unless --force is given");
    }
    out.println("input is valid.");
    return FlexMargin.EXIT_OK;
  }
}
