package org.flexmargin.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.loop.DiskMargin;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.sweep.RateSaturation;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.sweep.ClearanceResult;
import org.flexmargin.sweep.ClosedLoopPoint;
import org.flexmargin.sweep.MarginOnset;
import org.flexmargin.sweep.NotchCheck;
import org.flexmargin.sweep.ClosedLoopResult;
import org.flexmargin.sweep.ClosedLoopRoot;
import org.flexmargin.sweep.ServoPoint;
import org.flexmargin.sweep.ServoResult;
import org.flexmargin.model.InputFile;
import org.flexmargin.model.InputWarning;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.sweep.ModeCouplings;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.Instability;
import org.flexmargin.sweep.SweepResult;

/**
 * Writes the open-loop results as data files: {@code results.json} (every number, units in the key
 * names, non-finite values as null), {@code findings.csv} (the findings table) and one
 * {@code branches-CONFIG.csv} per configuration (damping and frequency of every root at every
 * solution point, the data of the V-g and V-f diagrams).
 */
public final class ResultFiles {
  private ResultFiles() {}

  /** Format version of the result files. */
  public static final int FORMAT = 1;

  /**
   * @param folder output folder (exists)
   * @param result sweep result
   * @param findings findings table
   * @param toolVersion version string for provenance
   * @throws IOException on write failure
   */
  public static void write(Path folder, SweepResult result, List<Finding> findings, String toolVersion)
      throws IOException {
    ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    ObjectNode root = mapper.createObjectNode();
    root.put("format", FORMAT);
    root.put("tool", "flexmargin " + toolVersion);
    root.put("generated_utc", Instant.now().toString());
    root.put("case", result.analysisCase().name());
    root.put("description", result.analysisCase().description());
    root.put("sweep", result.pathDescription());
    ArrayNode cautions = root.putArray("cautions");
    Cautions.TEXT.forEach(cautions::add);
    ArrayNode inputs = root.putArray("inputs");
    for (InputFile f : result.analysisCase().inputs()) {
      inputs.addObject().put("path", f.path()).put("sha256", f.sha256());
    }
    ArrayNode inputWarnings = root.putArray("input_warnings");
    for (InputWarning iw : result.analysisCase().warnings()) {
      inputWarnings.addObject().put("file", iw.file()).put("line", iw.line()).put("field", iw.fieldPath())
          .put("text", iw.text()).put("message", iw.message());
    }
    ArrayNode fnd = root.putArray("findings");
    for (Finding f : findings) {
      ObjectNode o = fnd.addObject();
      o.put("configuration", f.configuration());
      o.put("finding", f.what());
      o.put("mode", f.mode());
      num(o, "speed_eas_mps", f.speedEasMps());
      num(o, "speed_eas_kt", f.speedEasKnots());
      num(o, "speed_tas_mps", f.speedTasMps());
      num(o, "mach", f.mach());
      num(o, "altitude_m", f.altitudeM());
      num(o, "frequency_hz", f.frequencyHz());
      o.put("remark", f.remark());
    }
    ArrayNode configs = root.putArray("configurations");
    for (ConfigurationResult c : result.configurations()) {
      ObjectNode co = configuration(mapper, c, RateSaturation.along(c, result.analysisCase().loop()));
      if (co.get("loop") instanceof ObjectNode lo) {
        result.analysisCase().configurations().stream().filter(k -> k.name().equals(c.configuration()))
            .findFirst().ifPresent(k -> modeCoupling(lo.putArray("mode_coupling"), ModeCouplings.of(k)));
      }
      configs.add(co);
    }
    Files.writeString(folder.resolve("results.json"), mapper.writeValueAsString(root), StandardCharsets.UTF_8);
    writeFindingsCsv(folder.resolve("findings.csv"), findings);
    for (ConfigurationResult c : result.configurations()) {
      writeBranchesCsv(folder.resolve("branches-" + fileSafe(c.configuration()) + ".csv"), c.flutter());
      if (c.servo() != null) {
        writeMarginsCsv(folder.resolve("margins-" + fileSafe(c.configuration()) + ".csv"), c.servo(),
            RateSaturation.along(c, result.analysisCase().loop()));
      }
    }
  }

  /** @return a name safe for a file: letters, digits, dot, dash, underscore */
  public static String fileSafe(String name) {
    return name.replaceAll("[^A-Za-z0-9._-]", "_");
  }

  private static ObjectNode configuration(ObjectMapper mapper, ConfigurationResult c,
      List<Optional<RateSaturation.Line>> rateLines) {
    ObjectNode o = mapper.createObjectNode();
    o.put("name", c.configuration());
    o.put("aero", c.aeroDescription());
    num(o, "elapsed_s", c.elapsedSeconds());
    ArrayNode modes = o.putArray("modes");
    double[] f = c.modeFrequenciesHz();
    for (int i = 0; i < f.length; i++) {
      ObjectNode m = modes.addObject();
      m.put("name", c.modeNames().get(i));
      num(m, "frequency_hz", f[i]);
    }
    ObjectNode unstable = o.putObject("lowest_unstable_speed");
    instability(unstable, "any", c.lowestInstability());
    instability(unstable, "open_loop_flutter", c.lowestOpenLoopFlutter());
    instability(unstable, "closed_loop", c.lowestClosedLoopInstability());
    instability(unstable, "divergence", c.divergenceInstability());
    DivergenceResult d = c.divergence();
    ObjectNode div = o.putObject("divergence");
    div.put("found", d.found());
    num(div, "dynamic_pressure_pa", d.dynamicPressurePa());
    num(div, "speed_eas_mps", d.speedEasMps());
    num(div, "speed_tas_mps_at_sweep_start_altitude", c.divergenceTasAtSweepStartMps());
    num(div, "confirmed_dynamic_pressure_pa",
        c.divergenceConfirmedPa().isPresent() ? c.divergenceConfirmedPa().getAsDouble() : Double.NaN);
    num(div, "relative_residual", d.relativeResidual());
    num(div, "reduced_frequency_used", d.reducedFrequencyUsed());
    ArrayNode shape = div.putArray("shape");
    for (double s : d.shape()) {
      shape.add(s);
    }
    div.put("note", d.note());
    FlutterSolution s = c.flutter();
    ObjectNode fl = o.putObject("flutter");
    fl.put("method", s.method().name().toLowerCase(Locale.ROOT));
    ArrayNode cr = fl.putArray("crossings");
    for (FlutterCrossing x : s.crossings()) {
      ObjectNode xo = cr.addObject();
      xo.put("mode", x.branchName());
      xo.put("kind", x.kind().name().toLowerCase(Locale.ROOT));
      num(xo, "damping_threshold_g", 0.0 - x.thresholdG()); // positive = damped (docs/verdict.md)
      num(xo, "speed_eas_mps", x.condition().speedEasMps());
      num(xo, "speed_tas_mps", x.condition().speedTasMps());
      num(xo, "mach", x.condition().mach());
      num(xo, "altitude_m", x.condition().altitudeM());
      num(xo, "dynamic_pressure_pa", x.condition().dynamicPressurePa());
      num(xo, "frequency_hz", x.frequencyHz());
      num(xo, "path_parameter", x.pathParameter());
      xo.put("evaluations", x.evaluations());
    }
    SolverDiagnostics dg = s.diagnostics();
    ObjectNode diag = fl.putObject("diagnostics");
    diag.put("root_solves", dg.rootSolves());
    diag.put("iterations", dg.iterations());
    diag.put("full_eigen_solves", dg.fullEigenSolves());
    diag.put("step_halvings", dg.stepHalvings());
    num(diag, "max_relative_residual", dg.maxRelativeResidual());
    num(diag, "min_mac", dg.minMac());
    diag.put("unconverged_roots", dg.unconvergedRoots());
    ArrayNode warn = fl.putArray("warnings");
    s.warnings().forEach(warn::add);
    if (c.servo() != null) {
      loop(o.putObject("loop"), c.servo(), rateLines);
    }
    if (c.clearance() != null) {
      clearance(o.putObject("clearance"), c.clearance());
    }
    ArrayNode br = fl.putArray("branches");
    for (BranchCurve b : s.branches()) {
      ObjectNode bo = br.addObject();
      bo.put("mode", b.name());
      arr(bo, s.method().name().equals("K") ? "reduced_frequency_grid" : "path_parameter", b.pathParameter());
      arr(bo, "speed_eas_mps", b.speedEasMps());
      arr(bo, "speed_tas_mps", b.speedTasMps());
      arr(bo, "frequency_hz", b.frequencyHz());
      arr(bo, "damping_g", b.dampingG());
      arr(bo, "damping_ratio", b.dampingRatio());
      arr(bo, "reduced_frequency", b.reducedFrequency());
    }
    return o;
  }

  /** Each g = 0 closed-loop onset: rational model, exact loop, difference. */
  private static void onsetRefinements(ArrayNode out, ClosedLoopResult cl) {
    for (org.flexmargin.sweep.OnsetRefinement r : cl.refinements()) {
      ObjectNode ro = out.addObject();
      ro.put("root", r.rational().branchName());
      ro.put("kind", r.rational().kind().name().toLowerCase(Locale.ROOT));
      num(ro, "rational_speed_eas_mps", r.rational().condition().speedEasMps());
      num(ro, "rational_frequency_hz", r.rational().frequencyHz());
      ro.put("confirmed_on_exact_loop", r.confirmed());
      num(ro, "exact_speed_eas_mps", r.exact().map(e -> e.condition().speedEasMps()).orElse(Double.NaN));
      num(ro, "exact_frequency_hz", r.exact().map(FlutterCrossing::frequencyHz).orElse(Double.NaN));
      num(ro, "speed_difference_eas_mps", r.speedDifferenceEasMps());
      num(ro, "frequency_difference_hz", r.frequencyDifferenceHz());
      num(ro, "residual", r.residual());
      ro.put("remark", r.remark());
    }
  }

  private static void modeCoupling(ArrayNode out, Map<String, ModeCoupling> couplings) {
    for (Map.Entry<String, ModeCoupling> e : couplings.entrySet()) {
      ModeCoupling m = e.getValue();
      ObjectNode mo = out.addObject();
      mo.put("mode", e.getKey());
      mo.put("origin", m.origin().name().toLowerCase(Locale.ROOT));
      num(mo, "lift_coefficient_per_unit_coordinate", m.liftCoefficientPerUnitCoordinate());
      num(mo, "pitch_moment_coefficient_per_unit_coordinate", m.pitchMomentCoefficientPerUnitCoordinate());
      num(mo, "generalized_force_per_alpha_m2", m.generalizedForcePerAlphaM2());
      num(mo, "generalized_force_per_pitch_rate_m2", m.generalizedForcePerPitchRateM2());
      num(mo, "generalized_force_per_elevator_m2", m.generalizedForcePerElevatorM2());
    }
  }

  private static void loop(ObjectNode o, ServoResult servo, List<Optional<RateSaturation.Line>> rateLines) {
    ClosedLoopResult cl = servo.closedLoop();
    o.put("rational_approximation", cl.fitDescription());
    o.put("closed_loop_eigen_solves", cl.eigenSolves());
    ArrayNode notes = o.putArray("assumptions");
    cl.assumptions().forEach(notes::add);
    ArrayNode warn = o.putArray("warnings");
    cl.warnings().forEach(warn::add);
    ArrayNode cross = o.putArray("closed_loop_crossings");
    for (FlutterCrossing x : cl.crossings()) {
      ObjectNode xo = cross.addObject();
      xo.put("root", x.branchName());
      xo.put("kind", x.kind().name().toLowerCase(Locale.ROOT));
      num(xo, "damping_threshold_g", 0.0 - x.thresholdG()); // positive = damped (docs/verdict.md)
      num(xo, "speed_eas_mps", x.condition().speedEasMps());
      num(xo, "speed_tas_mps", x.condition().speedTasMps());
      num(xo, "mach", x.condition().mach());
      num(xo, "frequency_hz", x.frequencyHz());
      xo.put("evaluations", x.evaluations());
    }
    onsetRefinements(o.putArray("closed_loop_onset_refinements"), cl);
    ArrayNode pts = o.putArray("points");
    for (int i = 0; i < servo.points().size(); i++) {
      ServoPoint p = servo.points().get(i);
      LoopMarginResult m = p.margins();
      ObjectNode po = pts.addObject();
      num(po, "speed_eas_mps", p.condition().speedEasMps());
      num(po, "speed_tas_mps", p.condition().speedTasMps());
      num(po, "mach", p.condition().mach());
      num(po, "dynamic_pressure_pa", p.condition().dynamicPressurePa());
      ArrayNode gc = po.putArray("gain_crossovers");
      for (GainCrossover g : m.gainCrossovers()) {
        ObjectNode go = gc.addObject();
        num(go, "frequency_hz", g.frequencyHz());
        num(go, "phase_margin_deg", g.phaseMarginDeg());
        num(go, "delay_margin_s", g.delayMarginS());
      }
      ArrayNode pc = po.putArray("phase_crossovers");
      for (PhaseCrossover x : m.phaseCrossovers()) {
        ObjectNode xo = pc.addObject();
        num(xo, "frequency_hz", x.frequencyHz());
        num(xo, "gain_margin_db", x.gainMarginDb());
        xo.put("direction", x.direction().name().toLowerCase(Locale.ROOT));
      }
      DiskMargin d = m.diskMargin();
      ObjectNode dm = po.putObject("disk_margin");
      num(dm, "alpha", d.alpha());
      num(dm, "gain_lower_db", d.gainLowerDb());
      num(dm, "gain_upper_db", d.gainUpperDb());
      num(dm, "phase_margin_deg", d.phaseMarginDeg());
      num(dm, "frequency_hz", d.frequencyHz());
      num(po, "peak_gain_db", m.peakGain().magnitudeDb());
      num(po, "peak_gain_frequency_hz", m.peakGain().frequencyHz());
      if (!rateLines.isEmpty()) {
        rateSaturation(po, rateLines.get(i));
      }
      po.put("margin_grid_points", m.diagnostics().gridPoints());
      po.put("unresolved_intervals", m.diagnostics().unresolvedIntervals());
      ArrayNode paths = po.putArray("loop_at_a_time");
      for (int k = 0; k < p.pathMargins().size(); k++) {
        LoopMarginResult pm = p.pathMargins().get(k);
        ObjectNode ko = paths.addObject();
        ko.put("path", k);
        num(ko, "min_phase_margin_deg", pm.governingPhaseMargin().map(GainCrossover::phaseMarginDeg).orElse(Double.NaN));
        num(ko, "gain_increase_margin_db",
            pm.governingGainIncreaseMargin().map(PhaseCrossover::gainMarginDb).orElse(Double.NaN));
        num(ko, "gain_reduction_margin_db",
            pm.governingGainReductionMargin().map(PhaseCrossover::gainMarginDb).orElse(Double.NaN));
        num(ko, "disk_margin_alpha", pm.diskMargin().alpha());
      }
      ArrayNode notches = po.putArray("notches");
      for (NotchCheck n : p.notches()) {
        ObjectNode no = notches.addObject();
        no.put("path", n.path());
        no.put("sensor", n.sensor());
        num(no, "centre_hz", n.centreHz());
        num(no, "depth_db", n.depthDb());
        num(no, "crossover_hz", n.crossoverHz());
        num(no, "phase_loss_at_crossover_deg", n.phaseLossDeg());
        ArrayNode at = no.putArray("attenuation_at_modes");
        for (NotchCheck.ModeAttenuation a : n.modes()) {
          ObjectNode ao = at.addObject();
          ao.put("mode", a.mode());
          num(ao, "frequency_hz", a.frequencyHz());
          num(ao, "attenuation_db", a.attenuationDb());
        }
      }
      ClosedLoopPoint cp = cl.points().get(i);
      num(po, "closed_loop_max_real_per_s", cp.maxRealPart());
      ArrayNode roots = po.putArray("closed_loop_roots");
      for (ClosedLoopRoot r : cp.roots()) {
        ObjectNode ro = roots.addObject();
        ro.put("label", r.label());
        num(ro, "real_per_s", r.realPerS());
        num(ro, "imag_rad_per_s", r.imagRadPerS());
        num(ro, "frequency_hz", r.frequencyHz());
        num(ro, "damping_ratio", r.dampingRatio());
      }
    }
  }

  private static void clearance(ObjectNode o, ClearanceResult r) {
    o.put("passed", r.passed());
    o.put("requirements_source", r.requirementsSource());
    r.governingFinding().ifPresent(g -> ranked(o.putObject("governing"), g));
    o.put("ranking_rule", r.rankingRule());
    ArrayNode failures = o.putArray("failures_ranked");
    r.failures().forEach(f -> ranked(failures.addObject(), f));
    ArrayNode every = o.putArray("requirements");
    r.ranked().forEach(f -> ranked(every.addObject(), f));
    ObjectNode fl = o.putObject("flutter_rule");
    fl.put("passed", r.flutter().passed());
    num(fl, "limit_speed_eas_mps", r.flutter().limitSpeedEasMps());
    num(fl, "required_flutter_speed_eas_mps", r.flutter().requiredFlutterSpeedEasMps());
    ArrayNode fc = fl.putArray("checks");
    r.flutter().checks().forEach(c -> check(fc.addObject(), c));
    ArrayNode on = o.putArray("margin_onsets");
    for (MarginOnset m : r.marginOnsets()) {
      ObjectNode mo = on.addObject();
      mo.put("requirement", m.key().kind().key());
      mo.put("subject", m.key().subject());
      mo.put("description", m.description());
      num(mo, "speed_eas_mps", m.condition().speedEasMps());
      num(mo, "speed_tas_mps", m.condition().speedTasMps());
      num(mo, "mach", m.condition().mach());
      num(mo, "required_value", m.requiredValue());
      mo.put("unit", m.unit());
      mo.put("refined", m.refined());
      mo.put("evaluations", m.evaluations());
    }
    ArrayNode pts = o.putArray("points");
    for (PointAssessment p : r.points()) {
      ObjectNode po = pts.addObject();
      num(po, "speed_eas_mps", p.speedEasMps());
      po.put("regime", p.regime().key());
      po.put("passed", p.passed());
      num(po, "first_aeroelastic_frequency_hz", p.firstAeroelasticFrequencyHz());
      ArrayNode cs = po.putArray("checks");
      p.checks().forEach(c -> check(cs.addObject(), c));
      ArrayNode sm = po.putArray("structural_modes");
      for (StructuralModeAssessment s : p.structuralModes()) {
        ObjectNode so = sm.addObject();
        so.put("mode", s.modeName());
        num(so, "frequency_hz", s.modeFrequencyHz());
        num(so, "band_low_hz", s.bandLowHz());
        num(so, "band_high_hz", s.bandHighHz());
        num(so, "peak_db", s.peakDb());
        num(so, "peak_frequency_hz", s.peakFrequencyHz());
        num(so, "phase_distance_deg", s.phaseDistanceDeg());
        so.put("status", s.status().name().toLowerCase(Locale.ROOT));
      }
    }
  }

  private static void ranked(ObjectNode o, RankedFinding f) {
    check(o, f.check());
    o.put("severity", f.severity().key());
    o.put("severity_rank", f.severity().rank());
    num(o, "speed_eas_mps", f.speedEasMps());
  }

  private static void instability(ObjectNode o, String key, Optional<Instability> i) {
    if (i.isEmpty()) {
      o.putNull(key);
      return;
    }
    ObjectNode x = o.putObject(key);
    x.put("kind", i.get().kind().key());
    x.put("mode", i.get().mode());
    num(x, "speed_eas_mps", i.get().speedEasMps());
    num(x, "frequency_hz", i.get().frequencyHz());
    x.put("at_sweep_start", i.get().atSweepStart());
  }

  private static void check(ObjectNode o, ClearanceCheck c) {
    o.put("requirement", c.kind().key());
    o.put("subject", c.subject());
    o.put("description", c.description());
    num(o, "required", c.requiredValue());
    num(o, "achieved", c.achievedValue());
    o.put("unit", c.unit().symbol());
    o.put("sense", c.sense().name().toLowerCase(Locale.ROOT));
    num(o, "frequency_hz", c.frequencyHz());
    o.put("passed", c.passed());
    num(o, "normalised_excess", c.normalisedExcess());
  }

  private static void rateSaturation(ObjectNode po, Optional<RateSaturation.Line> line) {
    if (line.isEmpty()) {
      po.putNull("rate_saturation");
      return;
    }
    RateSaturation.Line l = line.get();
    ObjectNode r = po.putObject("rate_saturation");
    num(r, "frequency_hz", l.frequencyHz());
    r.put("basis", l.basis());
    num(r, "loop_magnitude", l.loopMagnitude());
    num(r, "elevator_per_command", l.elevatorPerCommand());
    num(r, "command_amplitude_rad", l.commandAmplitudeRad());
    num(r, "closed_loop_injection_amplitude_rad", l.closedLoopInjectionAmplitudeRad());
  }

  private static void writeMarginsCsv(Path file, ServoResult servo, List<Optional<RateSaturation.Line>> rateLines)
      throws IOException {
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write("point,speed_eas_mps,speed_tas_mps,mach,dynamic_pressure_pa,min_phase_margin_deg,"
          + "phase_margin_frequency_hz,min_gain_increase_margin_db,gain_increase_frequency_hz,"
          + "gain_reduction_margin_db,gain_reduction_frequency_hz,delay_margin_s,disk_margin_alpha,"
          + "disk_gain_margin_db,disk_phase_margin_deg,peak_gain_db,peak_gain_frequency_hz,"
          + "closed_loop_max_real_per_s,rate_saturation_frequency_hz,rate_saturation_command_amplitude_rad,"
          + "rate_saturation_injection_amplitude_rad\n");
      for (int i = 0; i < servo.points().size(); i++) {
        ServoPoint p = servo.points().get(i);
        LoopMarginResult m = p.margins();
        var pm = m.governingPhaseMargin();
        var gi = m.governingGainIncreaseMargin();
        var gr = m.governingGainReductionMargin();
        var dm = m.governingDelayMargin();
        w.write(String.join(",", Integer.toString(i), fmt(p.condition().speedEasMps()),
            fmt(p.condition().speedTasMps()), fmt(p.condition().mach()), fmt(p.condition().dynamicPressurePa()),
            fmt(pm.map(GainCrossover::phaseMarginDeg).orElse(Double.NaN)),
            fmt(pm.map(GainCrossover::frequencyHz).orElse(Double.NaN)),
            fmt(gi.map(PhaseCrossover::gainMarginDb).orElse(Double.NaN)),
            fmt(gi.map(PhaseCrossover::frequencyHz).orElse(Double.NaN)),
            fmt(gr.map(PhaseCrossover::gainMarginDb).orElse(Double.NaN)),
            fmt(gr.map(PhaseCrossover::frequencyHz).orElse(Double.NaN)),
            fmt(dm.map(GainCrossover::delayMarginS).orElse(Double.NaN)),
            fmt(m.diskMargin().alpha()), fmt(m.diskMargin().gainUpperDb()), fmt(m.diskMargin().phaseMarginDeg()),
            fmt(m.peakGain().magnitudeDb()), fmt(m.peakGain().frequencyHz()),
            fmt(servo.closedLoop().points().get(i).maxRealPart()),
            rateColumns(rateLines.isEmpty() ? Optional.empty() : rateLines.get(i))));
        w.write('\n');
      }
    }
  }

  private static String rateColumns(Optional<RateSaturation.Line> line) {
    return line.map(l -> String.join(",", fmt(l.frequencyHz()), fmt(l.commandAmplitudeRad()),
        fmt(l.closedLoopInjectionAmplitudeRad()))).orElse(",,");
  }

  private static void num(ObjectNode o, String key, double v) {
    if (Double.isFinite(v)) {
      o.put(key, v);
    } else {
      o.putNull(key);
    }
  }

  private static void arr(ObjectNode o, String key, double[] v) {
    ArrayNode a = o.putArray(key);
    for (double d : v) {
      if (Double.isFinite(d)) {
        a.add(d);
      } else {
        a.addNull();
      }
    }
  }

  private static void writeFindingsCsv(Path file, List<Finding> findings) throws IOException {
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write("configuration,finding,mode,speed_eas_mps,speed_eas_kt,speed_tas_mps,mach,altitude_m,frequency_hz,remark\n");
      for (Finding f : findings) {
        w.write(String.join(",", csv(f.configuration()), csv(f.what()), csv(f.mode()),
            fmt(f.speedEasMps()), fmt(f.speedEasKnots()), fmt(f.speedTasMps()), fmt(f.mach()),
            fmt(f.altitudeM()), fmt(f.frequencyHz()), csv(f.remark())));
        w.write('\n');
      }
    }
  }

  private static void writeBranchesCsv(Path file, FlutterSolution s) throws IOException {
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write("mode,point,speed_eas_mps,speed_tas_mps,frequency_hz,damping_g,damping_ratio,reduced_frequency,converged\n");
      for (BranchCurve b : s.branches()) {
        double[] eas = b.speedEasMps();
        double[] tas = b.speedTasMps();
        double[] f = b.frequencyHz();
        double[] g = b.dampingG();
        double[] z = b.dampingRatio();
        double[] k = b.reducedFrequency();
        boolean[] ok = b.converged();
        for (int i = 0; i < b.size(); i++) {
          w.write(String.join(",", csv(b.name()), Integer.toString(i), fmt(eas[i]), fmt(tas[i]), fmt(f[i]),
              fmt(g[i]), fmt(z[i]), fmt(k[i]), Boolean.toString(ok[i])));
          w.write('\n');
        }
      }
    }
  }

  private static String fmt(double v) {
    return Double.isFinite(v) ? String.format(Locale.ROOT, "%.8g", v) : "";
  }

  private static String csv(String s) {
    if (s.contains(",") || s.contains("\"") || s.contains("\n")) {
      return "\"" + s.replace("\"", "\"\"") + "\"";
    }
    return s;
  }
}
