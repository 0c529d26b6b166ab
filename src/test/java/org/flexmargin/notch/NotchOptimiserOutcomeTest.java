package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.ElasticMode;
import org.junit.jupiter.api.Test;

/**
 * Whole optimisations on one-mode constructed loops: the documented objective and diagnostics of
 * the returned set, the variable bounds, and the two explanations of an infeasible design.
 */
class NotchOptimiserOutcomeTest {
  private static final double TWO_PI = 2 * Math.PI;

  /**
   * L(s) = (wc/s) a/(s + a) + k wn s/(s^2 + 2 zeta wn s + wn^2) at each shift of the spec, all in
   * the carrying path: crossover near wc, resonance peak k/(2 zeta) at wn (closed form).
   */
  private static LoopSamples samples(NotchDesignSpec spec, double wc, double lag, double fn, double k) {
    return samples(spec, wc, lag, fn, k, Double.NaN);
  }

  /** As above, the samples labelled with an equivalent airspeed (m/s). */
  private static LoopSamples samples(NotchDesignSpec spec, double wc, double lag, double fn, double k,
      double eas) {
    double zeta = 0.01;
    LoopSamples.Builder b = LoopSamples.builder();
    for (double s : spec.shiftFactors()) {
      double wn = TWO_PI * fn * s;
      SisoFrequencyFunction path = (w, out) -> {
        double re = 0;
        double im = -wc / w;
        if (Double.isFinite(lag)) {
          // times a/(j w + a) = a (a - j w)/(a^2 + w^2)
          double d = lag * lag + w * w;
          double i0 = im;
          re = i0 * lag * w / d;
          im = i0 * lag * lag / d;
        }
        double dr = wn * wn - w * w;
        double di = 2 * zeta * wn * w;
        double ni = k * wn * w;
        double d2 = dr * dr + di * di;
        out[0] = re + ni * di / d2;
        out[1] = im + ni * dr / d2;
      };
      List<ElasticMode> modes = List.of(new ElasticMode("mode_1", fn * s, zeta, 1, null));
      double[] band = CaseLoopSampler.band(modes, 0, spec.modeBandFraction());
      int g = b.modeGrid(fn * s, zeta, band[0], band[1]);
      int r = b.rigidGrid(0.01, spec.rigidBandFraction() * fn * s);
      b.add(new SampleLabel("constructed", 0, eas, Double.NaN, s), ClosedForm.constant(0, 0), path,
          List.of("mode_1"), new int[] {g}, r);
    }
    return b.build();
  }

  private static double sq(double x) {
    return x * x;
  }

  @Test
  void feasibleSetReportsTheDocumentedObjectiveAndStaysWithinTheBounds() {
    NotchDesignSpec spec = NotchDesignSpec.defaults();
    // +6.02 dB at 15 Hz (k/(2 zeta) = 2), crossover near 1 Hz
    LoopSamples s = samples(spec, TWO_PI, Double.POSITIVE_INFINITY, 15, 0.04);
    OptimisedNotches r = new NotchOptimiser().optimise(s, spec);
    assertTrue(r.feasible(), () -> String.join("; ", r.reasons()));
    assertTrue(r.reasons().isEmpty());
    assertTrue(r.violations().isEmpty());
    assertEquals(1, r.notches().size());
    NotchFilter n = r.notches().get(0);
    // bounds: centre within the offending band (peaks of the three shifts, 13.5..16.5 Hz on the
    // sampled grids) widened by 1.5 each way; zeta_p in [0.02, 1.5]; depth ratio in [0.01, 0.7]
    assertTrue(n.centreFrequencyHz() > 13.4 / 1.5 && n.centreFrequencyHz() < 16.6 * 1.5, n.toString());
    assertTrue(n.poleDampingRatio() >= 0.02 * (1 - 1e-12) && n.poleDampingRatio() <= 1.5 * (1 + 1e-12));
    double ratio = n.zeroDampingRatio() / n.poleDampingRatio();
    assertTrue(ratio >= 0.01 * (1 - 1e-12) && ratio <= 0.7 * (1 + 1e-12), "ratio " + ratio);
    // the returned evaluation is that of the returned set
    SampleEvaluation again = new NotchEvaluator(s).evaluate(r.notches());
    for (int i = 0; i < s.size(); i++) {
      assertEquals(again.peakDb()[i][0], r.after().peakDb()[i][0], 0);
      assertEquals(again.phaseMarginDeg()[i], r.after().phaseMarginDeg()[i], 0);
    }
    // the before evaluation has no notch: the closed-form peaks sqrt((k/2zeta)^2 + (wc/wn)^2)
    // sampled within 0.3 dB
    for (int i = 0; i < s.size(); i++) {
      double wn = TWO_PI * 15 * s.label(i).shiftFactor();
      double peak = 20 * Math.log10(Math.hypot(2, TWO_PI / wn));
      assertEquals(peak, r.before().peakDb()[i][0], 0.3);
      assertTrue(r.before().peakDb()[i][0] <= peak + 1e-9);
    }
    // objective at the returned set: worst phase loss + 1000 x squared excesses over limit - margin
    // (peaks) and below the required margins (held samples)
    double target = spec.peakLimitDb() - spec.designMarginDb();
    double pen = 0;
    double worstExcess = Double.NEGATIVE_INFINITY;
    boolean[] held = r.constrained();
    for (int i = 0; i < s.size(); i++) {
      double p = r.after().peakDb()[i][0];
      pen += sq(Math.max(0, p - target));
      worstExcess = Math.max(worstExcess, p - spec.peakLimitDb());
      assertTrue(held[i], "a 90 deg phase margin and no phase crossover meet 45 deg / 6 dB");
      pen += sq(Math.max(0, 45 - r.after().phaseMarginDeg()[i]));
      pen += sq(Math.max(0, 6 - r.after().gainIncreaseMarginDb()[i]));
      pen += sq(Math.max(0, r.after().gainReductionMarginDb()[i] + 6));
    }
    OptimiserDiagnostics d = r.diagnostics();
    assertEquals(r.after().worstPhaseLossDeg() + 1000 * pen, d.finalObjective(), 1e-9);
    assertEquals(worstExcess, d.worstPeakExcessDb(), 1e-12);
    assertTrue(worstExcess <= 0);
    assertEquals("BOBYQA (Powell 2009, Commons Math), bounded, penalty objective", d.method());
    assertEquals(4, d.runs());
    assertTrue(d.evaluations() > 4 * 7, "at least 2n + 1 = 7 points per run: " + d.evaluations());
    assertEquals(0, d.violations());
    assertEquals(3, d.samples());
    assertEquals(s.storedValues(), d.storedValues());
    assertEquals(1000.0, d.penaltyWeight());
  }

  @Test
  void aPeakBeyondTheDeepestNotchIsExplainedAsUnreachable() {
    NotchDesignSpec spec = NotchDesignSpec.defaults().withMaxNotches(2);
    // +40 dB at 15 Hz (k/(2 zeta) = 100): the deepest notch allowed (ratio 0.01) gives 40 dB, the
    // -6 dB limit needs 46
    LoopSamples s = samples(spec, TWO_PI, Double.POSITIVE_INFINITY, 15, 2.0);
    OptimisedNotches r = new NotchOptimiser().optimise(s, spec);
    assertFalse(r.feasible());
    assertEquals(ConstraintKind.STRUCTURAL_PEAK, r.violations().get(0).kind());
    String last = r.reasons().get(r.reasons().size() - 1);
    assertTrue(last.startsWith("even ignoring the rigid-body margins no notch set within the bounds (at most 2 "
        + "notches, depth ratio >= 0.01)"), last);
    // the explanation of the worst violation comes first
    assertTrue(r.reasons().get(0).startsWith("mode_1 peaks at"), r.reasons().get(0));
    // both the held and the free optimisation ran
    assertEquals(8, r.diagnostics().runs());
    assertEquals(r.violations().size(), r.diagnostics().violations());
    assertTrue(r.diagnostics().worstPeakExcessDb() > 0);
  }

  @Test
  void aPeakThatCostsTooMuchPhaseIsExplainedByThatCost() {
    NotchDesignSpec spec = NotchDesignSpec.defaults();
    double wc = TWO_PI * 0.8;
    // phase margin 50 deg (lag a = wc / tan 40 deg), a +14 dB resonance at 2 Hz
    LoopSamples s = samples(spec, wc, wc / Math.tan(Math.toRadians(40)), 2.0, 0.1);
    OptimisedNotches r = new NotchOptimiser().optimise(s, spec);
    assertFalse(r.feasible());
    assertTrue(r.violations().stream().anyMatch(v -> v.kind() == ConstraintKind.STRUCTURAL_PEAK
        || v.kind() == ConstraintKind.RIGID_PHASE_MARGIN));
    String last = r.reasons().get(r.reasons().size() - 1);
    assertTrue(last.startsWith("the structural peaks can be brought below -6.0 dB only by notches costing "), last);
    assertTrue(last.contains(" deg of phase at the rigid-body crossover, which leaves "), last);
    assertEquals(8, r.diagnostics().runs());
    List<String> kinds = new ArrayList<>();
    r.violations().forEach(v -> kinds.add(v.kind().name()));
    assertTrue(kinds.contains("STRUCTURAL_PEAK"), kinds.toString());
  }

  /** Objective at a returned set, as documented: worst loss + 1000 x squared excesses. */
  private static double objective(OptimisedNotches r, NotchDesignSpec spec, double eas) {
    double target = spec.peakLimitDb() - spec.designMarginDb();
    double pen = 0;
    boolean[] held = r.constrained();
    for (int i = 0; i < held.length; i++) {
      for (double p : r.after().peakDb()[i]) {
        pen += sq(Math.max(0, p - target));
      }
      if (held[i]) {
        pen += sq(Math.max(0, spec.requiredPhaseMarginDeg(eas) - r.after().phaseMarginDeg()[i]));
        pen += sq(Math.max(0, spec.requiredGainMarginDb(eas) - r.after().gainIncreaseMarginDb()[i]));
        pen += sq(Math.max(0, r.after().gainReductionMarginDb()[i] + spec.requiredGainMarginDb(eas)));
      }
    }
    return r.after().worstPhaseLossDeg() + 1000 * pen;
  }

  @Test
  void infeasibleSetsReportTheObjectiveOfTheHeldRun() {
    NotchDesignSpec spec = NotchDesignSpec.defaults();
    double wc = TWO_PI * 0.8;
    LoopSamples s = samples(spec, wc, wc / Math.tan(Math.toRadians(40)), 2.0, 0.1);
    OptimisedNotches r = new NotchOptimiser().optimise(s, spec);
    assertFalse(r.feasible());
    double expected = objective(r, spec, Double.NaN);
    assertTrue(expected > r.after().worstPhaseLossDeg(), "a penalty remains");
    assertEquals(expected, r.diagnostics().finalObjective(), 1e-9 * expected);
    // held and free runs each count at least 2n + 1 = 7 evaluations per BOBYQA run
    assertTrue(r.diagnostics().evaluations() > 8 * 7, "evaluations " + r.diagnostics().evaluations());
  }

  @Test
  void withATableTheHeldMarginIsThatOfTheSampleSpeed() {
    // the loop of the phase-cost case, now at 140 m/s EAS where the invented table asks 25 deg /
    // 4 dB instead of 45 deg / 6 dB
    NotchDesignSpec spec = NotchDesignSpec.defaults().withMarginTable(NotchDesignSpecTest.table());
    double wc = TWO_PI * 0.8;
    LoopSamples s = samples(spec, wc, wc / Math.tan(Math.toRadians(40)), 2.0, 0.1, 140);
    OptimisedNotches r = new NotchOptimiser().optimise(s, spec);
    assertTrue(r.feasible(), () -> String.join("; ", r.reasons()));
    for (int i = 0; i < s.size(); i++) {
      assertTrue(r.after().phaseMarginDeg()[i] >= 25 - NotchOptimiser.FEASIBILITY_TOLERANCE);
    }
    assertTrue(r.after().worstPhaseLossDeg() > 5, "the notch spends more than the 5 deg to spare at 45 deg");
    assertEquals(objective(r, spec, 140), r.diagnostics().finalObjective(), 1e-9);
  }
}
