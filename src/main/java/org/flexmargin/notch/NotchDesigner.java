package org.flexmargin.notch;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.SweepResult;

/**
 * Notch design and robustness check of a case: samples the loop ({@link CaseLoopSampler}),
 * optimises ({@link NotchOptimiser}), then re-runs the margins independently on the full loop with
 * the new filters ({@link IndependentCheck}). Stateless.
 */
public final class NotchDesigner {
  /** Speeds per configuration in the independent before/after margin table. */
  public static final int TABLE_SPEEDS = 5;
  /** Allowance of the independent peak re-run over the limit (dB): the optimiser samples peaks on
   * a grid with a ratio step of zeta/2 (within about 0.3 dB of the true peak) and aims the design
   * margin below the limit, so a refined peak above limit + this means the sampling missed it. */
  public static final double INDEPENDENT_PEAK_TOLERANCE_DB = 0.05;

  /**
   * @param analysisCase case with a loop
   * @param spec settings
   * @return the design, feasible or not, with the independent re-run
   */
  public NotchDesignResult design(AnalysisCase analysisCase, NotchDesignSpec spec) {
    LoopSpec loop = PathFilters.requireLoop(analysisCase);
    List<Integer> paths = spec.notchPaths().isEmpty() ? PathFilters.defaultNotchPaths(analysisCase)
        : spec.notchPaths();
    LoopSpec base = PathFilters.baseLoop(loop, paths, spec.existingNotches());
    LoopSamples samples = CaseLoopSampler.sample(analysisCase, base, paths, spec);
    OptimisedNotches opt = new NotchOptimiser().optimise(samples, spec);
    // before: the case's own loop sampled as it is (its notches may differ from path to path)
    LoopSamples originalSamples = CaseLoopSampler.sample(analysisCase, loop, paths, spec);
    SampleEvaluation original = new NotchEvaluator(originalSamples).evaluate(List.of());
    // phase lag of the case's own notches: those of the first carrying path that has any
    List<NotchFilter> own = List.of();
    for (int p : paths) {
      List<NotchFilter> n = PathFilters.existingNotches(loop, List.of(p));
      if (!n.isEmpty() && spec.existingNotches() == ExistingNotches.REPLACE) {
        own = n;
        break;
      }
    }
    SampleEvaluation ownCost = new NotchEvaluator(samples).evaluate(own);
    List<ModePeakChange> peaks = new ArrayList<>();
    List<ModePeak> b = worstPeaks(originalSamples, original);
    List<ModePeak> a = worstPeaks(samples, opt.after());
    for (int m = 0; m < b.size(); m++) {
      peaks.add(new ModePeakChange(b.get(m).mode(), b.get(m), a.get(m)));
    }
    List<PhaseCost> cost = new ArrayList<>();
    cost.add(phaseCost(samples, opt.after(), null));
    for (Configuration c : analysisCase.configurations()) {
      cost.add(phaseCost(samples, opt.after(), c.name()));
    }
    LoopSpec designed = PathFilters.withNotches(loop, paths, spec.existingNotches(), opt.notches());
    List<Integer> points = IndependentCheck.spread(CaseLoopSampler.points(analysisCase, spec), TABLE_SPEEDS);
    List<MarginComparison> margins = new ArrayList<>();
    List<CheckedPeak> checked = new ArrayList<>();
    for (Configuration c : analysisCase.configurations()) {
      for (int p : points) {
        RigidMargins before = IndependentCheck.at(analysisCase, loop, spec, c, 1.0, p, null);
        RigidMargins after = IndependentCheck.at(analysisCase, designed, spec, c, 1.0, p, checked);
        margins.add(new MarginComparison(before, after));
      }
    }
    List<String> reasons = new ArrayList<>(opt.reasons());
    boolean feasible = opt.feasible();
    if (feasible) {
      for (CheckedPeak cp : checked) {
        if (cp.peakDb() > spec.peakLimitDb() + INDEPENDENT_PEAK_TOLERANCE_DB) {
          feasible = false;
          reasons.add(String.format(Locale.ROOT, "independent re-run: %s peaks at %.2f dB (%.2f Hz) in configuration "
              + "%s at %.1f m/s EAS, above the %.1f dB limit", cp.mode(), cp.peakDb(), cp.frequencyHz(),
              cp.where().configuration(), cp.where().speedEasMps(), spec.peakLimitDb()));
        }
      }
      for (MarginComparison mc : margins) {
        if (mc.before().meetsRequirement() && !mc.after().meetsRequirement()) {
          // the sampled estimate allowed it but the full computation does not
          feasible = false;
          reasons.add(String.format(Locale.ROOT, "independent re-run: rigid-body margins PM %.1f deg, GM %+.1f/%+.1f dB"
              + " in configuration %s at %.1f m/s EAS no longer meet %.0f deg / %.0f dB", mc.after().phaseMarginDeg(),
              mc.after().gainIncreaseMarginDb(), mc.after().gainReductionMarginDb(), mc.after().configuration(),
              mc.after().speedEasMps(), spec.requiredPhaseMarginDeg(mc.after().speedEasMps()),
              spec.requiredGainMarginDb(mc.after().speedEasMps())));
        }
      }
    }
    return new NotchDesignResult(analysisCase.name(), spec, paths, feasible,
        opt.notches().stream().map(DesignedNotch::of).toList(), peaks, cost, phaseCost(samples, ownCost, null),
        opt.diagnostics(), opt.violations(), reasons, margins, checked, designed);
  }

  /**
   * Judges the case's own filters against its requirements table with the same clearance code as
   * {@code sweep} (the table's peak limit and frequency uncertainty replaced by the settings'), so
   * that the two commands agree on every mode and band.
   *
   * @param analysisCase case with a loop and a requirements table
   * @param spec settings (peak limit, frequency uncertainty)
   * @return the verdict per configuration
   */
  public RobustnessCheckResult check(AnalysisCase analysisCase, NotchDesignSpec spec) {
    PathFilters.requireLoop(analysisCase);
    ClearanceRequirements r = analysisCase.requirements();
    if (r == null) {
      throw new InvalidInputException("requirements",
          "a requirements table (the check judges the filters by the same rules as sweep)", "none");
    }
    ClearanceRequirements judged = new ClearanceRequirements(r.maxOperatingSpeedEasMps(), r.limitSpeedEasMps(),
        r.extendedSpeedFactor(), r.margins(), spec.peakLimitDb(), r.phaseStabilisationMarginDeg(),
        spec.frequencyUncertainty(), r.flutterSpeedFactor(), r.minimumDampingG(), r.source(), r.recalledPreset());
    AnalysisCase c = new AnalysisCase(analysisCase.format(), analysisCase.name(), analysisCase.description(),
        analysisCase.configurations(), analysisCase.sweep(), analysisCase.options(), analysisCase.inputs(),
        analysisCase.loop(), judged);
    SweepResult sweep = new CaseSweep(Math.min(2, Runtime.getRuntime().availableProcessors())).run(c, n -> { });
    List<RobustnessCheckResult.ConfigurationVerdict> out = new ArrayList<>();
    boolean passes = true;
    for (ConfigurationResult cr : sweep.configurations()) {
      out.add(new RobustnessCheckResult.ConfigurationVerdict(cr.configuration(), cr.clearance()));
      passes &= cr.clearance().passed();
    }
    return new RobustnessCheckResult(analysisCase.name(), spec, passes, out, judged.source());
  }

  /** @return the worst peak per mode over samples */
  static List<ModePeak> worstPeaks(LoopSamples samples, SampleEvaluation e) {
    List<ModePeak> out = new ArrayList<>();
    double[][] p = e.peakDb();
    double[][] hz = e.peakHz();
    for (int m = 0; m < samples.modeNames().size(); m++) {
      int at = -1;
      for (int s = 0; s < samples.size(); s++) {
        if (!Double.isNaN(p[s][m]) && (at < 0 || p[s][m] > p[at][m])) {
          at = s;
        }
      }
      out.add(new ModePeak(samples.modeNames().get(m), at < 0 ? Double.NaN : p[at][m],
          at < 0 ? Double.NaN : hz[at][m], at < 0 ? null : samples.label(at)));
    }
    return out;
  }

  /** @return the worst phase loss over the samples of one configuration (null = all) */
  static PhaseCost phaseCost(LoopSamples samples, SampleEvaluation e, String configuration) {
    int at = -1;
    double[] loss = e.phaseLossDeg();
    double[] hz = e.phaseLossCrossoverHz();
    for (int s = 0; s < samples.size(); s++) {
      if (configuration != null && !samples.label(s).configuration().equals(configuration)) {
        continue;
      }
      if (!Double.isNaN(hz[s]) && (at < 0 || loss[s] > loss[at])) {
        at = s;
      }
    }
    return new PhaseCost(configuration == null ? "all" : configuration, at < 0 ? 0.0 : loss[at],
        at < 0 ? Double.NaN : hz[at], at < 0 ? null : samples.label(at));
  }
}
