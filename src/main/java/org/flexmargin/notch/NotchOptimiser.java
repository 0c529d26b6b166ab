package org.flexmargin.notch;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.flexmargin.loop.NotchFilter;

/**
 * Chooses notch centre, width and depth on {@link LoopSamples}.
 *
 * <p>Variables per notch (scaled to [0, 1] for the optimiser): ln f_c within its cluster's band
 * widened by 1.5 each way, ln zeta_p in [ln 0.02, ln 1.5] (sets the width) and ln(zeta_z/zeta_p) in
 * [ln 0.01, ln 0.7] (sets the depth). Objective: the worst phase loss at the rigid-body crossovers
 * (deg) plus {@link #PENALTY_WEIGHT} times the sum of squared violations: structural peaks above
 * (limit - design margin) in dB over all modes and samples, and rigid-body phase (deg) and gain (dB)
 * margins below the requirement at the samples that met it without the notches. Minimised by
 * BOBYQA (Powell 2009) from Commons Math, then restarted three times from its result with
 * smaller initial trust regions.
 *
 * <p>Start: one notch per cluster of offending modes (modes whose peak exceeds the limit anywhere;
 * modes whose offending peak frequencies lie within 15 % of each other form one cluster, clusters
 * merged pairwise, closest first, down to the allowed number), centred at the geometric mean of
 * the cluster's offending peak frequencies, half-depth width covering them, depth = worst excess +
 * 3 dB + design margin; if that set does not yet meet the peak limits, every start notch is made
 * 3 dB deeper and 15 % wider, up to eight times. Stateless.
 */
public final class NotchOptimiser {
  /** Weight of squared violations (per dB^2 or deg^2) against phase loss in deg. */
  public static final double PENALTY_WEIGHT = 1000.0;
  /** Constraint tolerance for feasibility: dB for peaks and gain margins, deg for phase margins. */
  public static final double FEASIBILITY_TOLERANCE = 0.01;

  private static final double CLUSTER_RATIO = 1.15;
  private static final double ZP_MIN = 0.02;
  private static final double ZP_MAX = 1.5;
  private static final double R_MIN = 0.01;
  private static final double R_MAX = 0.7;
  private static final int MAX_EVALUATIONS = 1500;
  /** Final trust-region radius in the scaled variables (1e-4 of a variable's range). */
  private static final double STOPPING_RADIUS = 1e-4;
  private static final int START_STEPS = 8;

  /**
   * @param samples the sampled loop
   * @param spec limits and requirements
   * @return the notch set with its evaluation; never claims feasibility it has not checked
   */
  public OptimisedNotches optimise(LoopSamples samples, NotchDesignSpec spec) {
    NotchEvaluator ev = new NotchEvaluator(samples);
    SampleEvaluation before = ev.evaluate(List.of());
    boolean[] constrained = new boolean[samples.size()];
    double[] speeds = new double[samples.size()];
    for (int s = 0; s < samples.size(); s++) {
      speeds[s] = samples.label(s).speedEasMps();
    }
    for (int s = 0; s < samples.size(); s++) {
      double eas = samples.label(s).speedEasMps();
      constrained[s] = before.phaseMarginDeg()[s] >= spec.requiredPhaseMarginDeg(eas)
          && before.gainIncreaseMarginDb()[s] >= spec.requiredGainMarginDb(eas)
          && before.gainReductionMarginDb()[s] <= -spec.requiredGainMarginDb(eas);
    }
    List<double[]> clusters = clusters(samples, before, spec);
    if (clusters.isEmpty()) {
      // no peak above the limit, and the held samples meet their margins by their definition:
      // nothing can be violated
      return new OptimisedNotches(true, List.of(), before, before, constrained, List.of(), List.of(),
          new OptimiserDiagnostics("none needed", 1, 0, 0.0, PENALTY_WEIGHT, worstExcess(before, spec), 0,
              samples.size(), samples.storedValues()));
    }
    Run run = run(ev, clusters, spec, constrained, true, speeds);
    SampleEvaluation after = ev.evaluate(run.notches);
    List<ConstraintViolation> v = violations(samples, after, constrained, spec);
    List<String> reasons = new ArrayList<>();
    int evaluations = run.evaluations;
    int runs = run.runs;
    if (!v.isEmpty()) {
      reasons.addAll(explain(v));
      boolean peaksFailed = v.stream().anyMatch(x -> x.kind() == ConstraintKind.STRUCTURAL_PEAK);
      if (peaksFailed) {
        // would the peaks be met if the rigid-body margins were ignored? then the phase cost is the reason
        Run free = run(ev, clusters, spec, constrained, false, speeds);
        evaluations += free.evaluations;
        runs += free.runs;
        SampleEvaluation fe = ev.evaluate(free.notches);
        List<ConstraintViolation> fv = violations(samples, fe, constrained, spec);
        boolean peaksOk = fv.stream().noneMatch(x -> x.kind() == ConstraintKind.STRUCTURAL_PEAK);
        if (peaksOk) {
          ConstraintViolation worst = fv.stream().max(Comparator.comparingDouble(ConstraintViolation::excess))
              .orElse(null);
          reasons.add(String.format(Locale.ROOT,
              "the structural peaks can be brought below %.1f dB only by notches costing %.1f deg of phase at the "
                  + "rigid-body crossover, which %s",
              spec.peakLimitDb(), fe.worstPhaseLossDeg(),
              worst == null ? "the rigid-body margins do not allow" : "leaves " + describe(worst)));
        } else {
          reasons.add("even ignoring the rigid-body margins no notch set within the bounds (at most "
              + spec.maxNotches() + " notches, depth ratio >= " + R_MIN + ") brings every peak below the limit; "
              + "peaks near open-loop flutter or at the rigid-body crossover cannot be gain-stabilised");
        }
      }
    }
    OptimiserDiagnostics d = new OptimiserDiagnostics(
        "BOBYQA (Powell 2009, Commons Math), bounded, penalty objective", evaluations, runs, run.value,
        PENALTY_WEIGHT, worstExcess(after, spec), v.size(), samples.size(), samples.storedValues());
    return new OptimisedNotches(v.isEmpty(), run.notches, before, after, constrained, v, reasons, d);
  }

  private record Run(List<NotchFilter> notches, double value, int evaluations, int runs) {}

  private Run run(NotchEvaluator ev, List<double[]> clusters, NotchDesignSpec spec, boolean[] constrained,
      boolean holdRigid, double[] speeds) {
    int n = clusters.size();
    double[] lo = new double[3 * n];
    double[] hi = new double[3 * n];
    for (int i = 0; i < n; i++) {
      double[] c = clusters.get(i);
      lo[3 * i] = Math.log(c[0] / 1.5);
      hi[3 * i] = Math.log(c[1] * 1.5);
      lo[3 * i + 1] = Math.log(ZP_MIN);
      hi[3 * i + 1] = Math.log(ZP_MAX);
      lo[3 * i + 2] = Math.log(R_MIN);
      hi[3 * i + 2] = Math.log(R_MAX);
    }
    // start: the cluster notches, deepened and widened step by step until the peaks are met
    // (or the bounds are reached), so that BOBYQA starts from a set meeting the structural limits
    double[] start = new double[3 * n];
    double grow = 0;
    for (int step = 0; step <= START_STEPS; step++) {
      for (int i = 0; i < n; i++) {
        double[] c = clusters.get(i);
        double centre = Math.sqrt(c[0] * c[1]);
        double width = Math.max(1.2 * (c[1] - c[0]), 0.1 * centre) * Math.pow(1.15, grow);
        double depth = Math.min(38, c[2] + 3 + spec.designMarginDb() + 3 * grow);
        NotchFilter s = NotchFilter.fromDepthAndWidth(centre, depth, width);
        double[] raw = {Math.log(centre), Math.log(s.poleDampingRatio()),
            Math.log(s.zeroDampingRatio() / s.poleDampingRatio())};
        for (int k = 0; k < 3; k++) {
          int j = 3 * i + k;
          start[j] = Math.min(1, Math.max(0, (raw[k] - lo[j]) / (hi[j] - lo[j])));
        }
      }
      if (peakPenalty(ev.evaluate(decode(start, lo, hi)), spec) == 0) {
        break;
      }
      grow++;
    }
    int[] count = {0};
    org.apache.commons.math3.analysis.MultivariateFunction f = u -> {
      count[0]++;
      return objective(ev, decode(u, lo, hi), spec, constrained, holdRigid, speeds);
    };
    double[] zeros = new double[3 * n];
    double[] ones = new double[3 * n];
    java.util.Arrays.fill(ones, 1.0);
    double[] best = start;
    double bestValue = f.value(start);
    int runs = 0;
    for (double radius : new double[] {0.2, 0.05, 0.02, 0.01}) {
      BOBYQAOptimizer opt = new BOBYQAOptimizer(2 * 3 * n + 1, radius, STOPPING_RADIUS);
      runs++;
      try {
        PointValuePair r = opt.optimize(new MaxEval(MAX_EVALUATIONS), new ObjectiveFunction(f), GoalType.MINIMIZE,
            new InitialGuess(best), new SimpleBounds(zeros, ones));
        if (r.getValue() < bestValue) {
          bestValue = r.getValue();
          best = r.getPoint();
        }
      } catch (org.apache.commons.math3.exception.TooManyEvaluationsException e) {
        // keep the best point found so far (the start or the previous run)
      }
    }
    return new Run(decode(best, lo, hi), bestValue, count[0], runs);
  }

  private static List<NotchFilter> decode(double[] u, double[] lo, double[] hi) {
    List<NotchFilter> out = new ArrayList<>();
    for (int i = 0; i < u.length / 3; i++) {
      double[] x = new double[3];
      for (int k = 0; k < 3; k++) {
        int j = 3 * i + k;
        x[k] = lo[j] + Math.min(1, Math.max(0, u[j])) * (hi[j] - lo[j]);
      }
      double zp = Math.exp(x[1]);
      out.add(new NotchFilter(Math.exp(x[0]), zp * Math.exp(x[2]), zp));
    }
    return out;
  }

  private static double objective(NotchEvaluator ev, List<NotchFilter> notches, NotchDesignSpec spec,
      boolean[] constrained, boolean holdRigid, double[] speeds) {
    SampleEvaluation e = ev.evaluate(notches);
    double target = spec.peakLimitDb() - spec.designMarginDb();
    double pen = 0;
    double[][] peaks = e.peakDb();
    double[] pm = e.phaseMarginDeg();
    double[] gi = e.gainIncreaseMarginDb();
    double[] gr = e.gainReductionMarginDb();
    for (int s = 0; s < peaks.length; s++) {
      for (double p : peaks[s]) {
        if (p > target) {
          pen += (p - target) * (p - target);
        }
      }
      if (holdRigid && constrained[s]) {
        double eas = speeds[s];
        pen += sq(Math.max(0, spec.requiredPhaseMarginDeg(eas) - pm[s]));
        pen += sq(Math.max(0, spec.requiredGainMarginDb(eas) - gi[s]));
        pen += sq(Math.max(0, gr[s] + spec.requiredGainMarginDb(eas)));
      }
    }
    return e.worstPhaseLossDeg() + PENALTY_WEIGHT * pen;
  }

  private static double peakPenalty(SampleEvaluation e, NotchDesignSpec spec) {
    double target = spec.peakLimitDb() - spec.designMarginDb();
    double pen = 0;
    for (double[] row : e.peakDb()) {
      for (double p : row) {
        if (p > target) {
          pen += (p - target) * (p - target);
        }
      }
    }
    return pen;
  }

  private static double sq(double x) {
    return x * x;
  }

  /** Offending clusters as {lowHz, highHz, worstExcessDb}, ascending. */
  static List<double[]> clusters(LoopSamples samples, SampleEvaluation before, NotchDesignSpec spec) {
    int nm = samples.modeNames().size();
    double[] lo = new double[nm];
    double[] hi = new double[nm];
    double[] excess = new double[nm];
    java.util.Arrays.fill(lo, Double.MAX_VALUE);
    java.util.Arrays.fill(excess, Double.NEGATIVE_INFINITY);
    double[][] peak = before.peakDb();
    double[][] hz = before.peakHz();
    for (int s = 0; s < peak.length; s++) {
      for (int m = 0; m < nm; m++) {
        if (peak[s][m] > spec.peakLimitDb()) {
          lo[m] = Math.min(lo[m], hz[s][m]);
          hi[m] = Math.max(hi[m], hz[s][m]);
          excess[m] = Math.max(excess[m], peak[s][m] - spec.peakLimitDb());
        }
      }
    }
    List<double[]> c = new ArrayList<>();
    for (int m = 0; m < nm; m++) {
      if (excess[m] > Double.NEGATIVE_INFINITY) {
        c.add(new double[] {lo[m], hi[m], excess[m]});
      }
    }
    c.sort(Comparator.comparingDouble(x -> x[0]));
    List<double[]> merged = new ArrayList<>();
    for (double[] x : c) {
      if (!merged.isEmpty() && x[0] / merged.get(merged.size() - 1)[1] < CLUSTER_RATIO) {
        merged.set(merged.size() - 1, join(merged.get(merged.size() - 1), x));
      } else {
        merged.add(x);
      }
    }
    while (merged.size() > spec.maxNotches()) {
      int best = 0;
      double ratio = Double.MAX_VALUE;
      for (int i = 0; i + 1 < merged.size(); i++) {
        double r = merged.get(i + 1)[0] / merged.get(i)[1];
        if (r < ratio) {
          ratio = r;
          best = i;
        }
      }
      merged.set(best, join(merged.get(best), merged.get(best + 1)));
      merged.remove(best + 1);
    }
    return merged;
  }

  private static double[] join(double[] a, double[] b) {
    return new double[] {Math.min(a[0], b[0]), Math.max(a[1], b[1]), Math.max(a[2], b[2])};
  }

  private static double worstExcess(SampleEvaluation e, NotchDesignSpec spec) {
    double w = Double.NEGATIVE_INFINITY;
    for (double[] row : e.peakDb()) {
      for (double p : row) {
        if (!Double.isNaN(p)) {
          w = Math.max(w, p - spec.peakLimitDb());
        }
      }
    }
    return w;
  }

  /**
   * @return every requirement missed by the evaluated loop: structural peaks above the limit
   *     everywhere, rigid-body margins below the requirement at the constrained samples
   */
  static List<ConstraintViolation> violations(LoopSamples samples, SampleEvaluation e, boolean[] constrained,
      NotchDesignSpec spec) {
    List<ConstraintViolation> out = new ArrayList<>();
    double[][] peak = e.peakDb();
    double[][] hz = e.peakHz();
    for (int s = 0; s < peak.length; s++) {
      SampleLabel l = samples.label(s);
      for (int m = 0; m < peak[s].length; m++) {
        double x = peak[s][m] - spec.peakLimitDb();
        if (x > FEASIBILITY_TOLERANCE) {
          out.add(new ConstraintViolation(ConstraintKind.STRUCTURAL_PEAK, samples.modeNames().get(m), l, peak[s][m],
              spec.peakLimitDb(), x, hz[s][m]));
        }
      }
      if (constrained[s]) {
        double eas = l.speedEasMps();
        double rpm = spec.requiredPhaseMarginDeg(eas);
        double rgm = spec.requiredGainMarginDb(eas);
        double pm = e.phaseMarginDeg()[s];
        if (rpm - pm > FEASIBILITY_TOLERANCE) {
          out.add(new ConstraintViolation(ConstraintKind.RIGID_PHASE_MARGIN, "rigid body", l, pm,
              rpm, rpm - pm, e.phaseLossCrossoverHz()[s]));
        }
        double gi = e.gainIncreaseMarginDb()[s];
        if (rgm - gi > FEASIBILITY_TOLERANCE) {
          out.add(new ConstraintViolation(ConstraintKind.RIGID_GAIN_INCREASE_MARGIN, "rigid body", l, gi,
              rgm, rgm - gi, Double.NaN));
        }
        double gr = e.gainReductionMarginDb()[s];
        if (gr + rgm > FEASIBILITY_TOLERANCE) {
          out.add(new ConstraintViolation(ConstraintKind.RIGID_GAIN_REDUCTION_MARGIN, "rigid body", l, gr,
              -rgm, gr + rgm, Double.NaN));
        }
      }
    }
    out.sort(Comparator.comparingDouble(ConstraintViolation::excess).reversed());
    return out;
  }

  /** @return the worst violation per kind and mode, in words */
  static List<String> explain(List<ConstraintViolation> v) {
    List<String> out = new ArrayList<>();
    List<String> seen = new ArrayList<>();
    for (ConstraintViolation x : v) {
      String key = x.kind() + "/" + x.mode();
      if (!seen.contains(key)) {
        seen.add(key);
        out.add(describe(x));
      }
    }
    return out;
  }

  /** @return one violation in words */
  static String describe(ConstraintViolation x) {
    SampleLabel l = x.where();
    String at = String.format(Locale.ROOT, "configuration %s at %s, mode frequencies x %.2f", l.configuration(),
        Double.isNaN(l.speedEasMps()) ? "the constructed loop" : String.format(Locale.ROOT, "%.1f m/s EAS",
            l.speedEasMps()), l.shiftFactor());
    return switch (x.kind()) {
      case STRUCTURAL_PEAK -> String.format(Locale.ROOT, "%s peaks at %.2f dB (%.2f Hz) in %s: %.2f dB above the "
          + "%.1f dB limit", x.mode(), x.value(), x.frequencyHz(), at, x.excess(), x.limit());
      case RIGID_PHASE_MARGIN -> String.format(Locale.ROOT, "a rigid-body phase margin of %.1f deg (required %.1f)"
          + " in %s", x.value(), x.limit(), at);
      case RIGID_GAIN_INCREASE_MARGIN -> String.format(Locale.ROOT, "a rigid-body gain-increase margin of %.1f dB "
          + "(required %.1f) in %s", x.value(), x.limit(), at);
      case RIGID_GAIN_REDUCTION_MARGIN -> String.format(Locale.ROOT, "a rigid-body gain-reduction margin of %.1f dB"
          + " (required %.1f) in %s", x.value(), x.limit(), at);
    };
  }
}
