package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.junit.jupiter.api.Test;

/**
 * The optimiser's rules on invented sample evaluations: clustering of offending modes, the
 * constraint violations and their ranking, the explanations, and the case where nothing needs a
 * notch.
 */
class NotchOptimiserRulesTest {
  private static final double NAN = Double.NaN;

  /** Samples with the given labels and mode names; their stored loop values are not used here. */
  private static LoopSamples samples(List<SampleLabel> labels, String... modes) {
    LoopSamples.Builder b = LoopSamples.builder();
    int[] grids = new int[modes.length];
    for (int i = 0; i < modes.length; i++) {
      grids[i] = b.modeGrid(10, 0.05, 0.1);
    }
    int r = b.rigidGrid(0.01, 1);
    for (SampleLabel l : labels) {
      b.add(l, ClosedForm.constant(0, 0), ClosedForm.constant(0, 0), List.of(modes), grids, r);
    }
    return b.build();
  }

  private static SampleLabel at(String c, double eas, double shift) {
    return new SampleLabel(c, 3, eas, 1000, shift);
  }

  private static SampleEvaluation peaks(double[][] db, double[][] hz) {
    int n = db.length;
    double[] z = new double[n];
    double[] nan = new double[n];
    java.util.Arrays.fill(nan, NAN);
    double[] inf = new double[n];
    java.util.Arrays.fill(inf, Double.POSITIVE_INFINITY);
    double[] minf = new double[n];
    java.util.Arrays.fill(minf, Double.NEGATIVE_INFINITY);
    return new SampleEvaluation(db, hz, z, nan, inf, inf, minf);
  }

  @Test
  void offendingModesFormClustersMergedWithinFifteenPercentAndDownToTheAllowedCount() {
    // modes in an unsorted order; two samples each; limit -6 dB (defaults)
    // d: -1 dB at 30 Hz, NaN in sample 2           -> {30, 30, 5}
    // a: -3 dB at 10 Hz and -4 dB at 12.5 Hz        -> {10, 12.5, 3}
    // f: -5 dB at 45 Hz                              -> {45, 45, 1}
    // e: -2 dB at 34.5 Hz, -6.5 dB at 35 Hz          -> {34.5, 34.5, 4}
    // b: exactly -6 dB at 11 Hz, -7 dB at 11.2 Hz    -> none (a peak at the limit does not offend)
    // c: -0.5 dB at 11.9 Hz, -10 dB at 12 Hz         -> {11.9, 11.9, 5.5}
    LoopSamples s = samples(List.of(at("x", 50, 1), at("x", 60, 1)), "d", "a", "f", "e", "b", "c");
    double[][] db = {{-1, -3, -5, -2, -6, -0.5}, {NAN, -4, -7, -6.5, -7, -10}};
    double[][] hz = {{30, 10, 45, 34.5, 11, 11.9}, {NAN, 12.5, 46, 35, 11.2, 12}};
    SampleEvaluation e = peaks(db, hz);
    NotchDesignSpec spec = NotchDesignSpec.defaults().withMaxNotches(6);
    // sorted by low end: a {10, 12.5}, c {11.9}: 11.9/12.5 < 1.15, merged keeping the wider top and
    // the larger excess -> {10, 12.5, 5.5}; d {30}: 30/12.5 = 2.4 apart; e {34.5}: 34.5/30 = 1.15
    // exactly, not below the ratio, stays apart; f {45}
    List<double[]> c = NotchOptimiser.clusters(s, e, spec);
    assertEquals(4, c.size());
    assertArrayEquals(new double[] {10, 12.5, 5.5}, c.get(0), 1e-12);
    assertArrayEquals(new double[] {30, 30, 5}, c.get(1), 1e-12);
    assertArrayEquals(new double[] {34.5, 34.5, 4}, c.get(2), 1e-12);
    assertArrayEquals(new double[] {45, 45, 1}, c.get(3), 1e-12);
    // three allowed: the closest pair (ratio 1.15 of 2.4, 1.15, 1.304) is merged
    List<double[]> three = NotchOptimiser.clusters(s, e, spec.withMaxNotches(3));
    assertEquals(3, three.size());
    assertArrayEquals(new double[] {10, 12.5, 5.5}, three.get(0), 1e-12);
    assertArrayEquals(new double[] {30, 34.5, 5}, three.get(1), 1e-12);
    assertArrayEquals(new double[] {45, 45, 1}, three.get(2), 1e-12);
    // two: then 45/34.5 = 1.304 < 2.4
    List<double[]> two = NotchOptimiser.clusters(s, e, spec.withMaxNotches(2));
    assertEquals(2, two.size());
    assertArrayEquals(new double[] {30, 45, 5}, two.get(1), 1e-12);
    // one: everything
    List<double[]> one = NotchOptimiser.clusters(s, e, spec.withMaxNotches(1));
    assertEquals(1, one.size());
    assertArrayEquals(new double[] {10, 45, 5.5}, one.get(0), 1e-12);
    // a lower limit makes b offend too (-6 > -6.5) and joins it to the first cluster
    List<double[]> lower = NotchOptimiser.clusters(s, e, spec.withPeakLimitDb(-6.5));
    assertArrayEquals(new double[] {10, 12.5, 6}, lower.get(0), 1e-12);
    // nothing above the limit: no cluster
    assertTrue(NotchOptimiser.clusters(s, e, spec.withPeakLimitDb(0)).isEmpty());
  }

  @Test
  void mergingPicksTheFirstOfTwoEquallyClosePairs() {
    // clusters at 10, 20, 40 Hz: ratios 2 and 2, tie -> the first pair merges
    LoopSamples s = samples(List.of(at("x", 50, 1)), "p", "q", "r");
    SampleEvaluation e = peaks(new double[][] {{0, 0, 0}}, new double[][] {{10, 20, 40}});
    List<double[]> c = NotchOptimiser.clusters(s, e, NotchDesignSpec.defaults().withMaxNotches(2));
    assertArrayEquals(new double[] {10, 20, 6}, c.get(0), 1e-12);
    assertArrayEquals(new double[] {40, 40, 6}, c.get(1), 1e-12);
  }

  @Test
  void violationsCountPeaksEverywhereAndMarginsOnlyWhereHeldRankedByExcess() {
    LoopSamples s = samples(List.of(at("cfg", 55, 0.9), at("cfg", 65, 1.1), at("other", 75, 1.0)), "wing");
    // peaks: -5.98 (0.02 above -6: counted), -5.995 (0.005 above: within the 0.01 tolerance),
    // -4 (2 above)
    double[][] db = {{-5.98}, {-5.995}, {-4}};
    double[][] hz = {{12.3}, {12.5}, {13}};
    // sample 0 held: PM 44 (1 below 45), GM+ 5.5 (0.5 below 6), GM- -5 (1 above -6);
    // sample 1 held: PM 44.995, GM+ 5.995, GM- -5.995: each within the tolerance;
    // sample 2 not held: poor margins ignored
    SampleEvaluation e = new SampleEvaluation(db, hz, new double[3], new double[] {0.7, 0.8, 0.9},
        new double[] {44, 44.995, 10}, new double[] {5.5, 5.995, 1}, new double[] {-5, -5.995, -1});
    boolean[] held = {true, true, false};
    List<ConstraintViolation> v = NotchOptimiser.violations(s, e, held, NotchDesignSpec.defaults());
    assertEquals(5, v.size(), v.toString());
    ConstraintViolation top = v.get(0);
    assertEquals(ConstraintKind.STRUCTURAL_PEAK, top.kind());
    assertEquals("wing", top.mode());
    assertEquals(-4, top.value());
    assertEquals(-6, top.limit());
    assertEquals(2, top.excess(), 1e-12);
    assertEquals(13, top.frequencyHz());
    assertEquals("other", top.where().configuration());
    // then the two excesses of 1 (phase margin and gain reduction, stable order), 0.5, 0.02
    List<ConstraintKind> kinds = v.stream().map(ConstraintViolation::kind).toList();
    assertEquals(List.of(ConstraintKind.STRUCTURAL_PEAK, ConstraintKind.RIGID_PHASE_MARGIN,
        ConstraintKind.RIGID_GAIN_REDUCTION_MARGIN, ConstraintKind.RIGID_GAIN_INCREASE_MARGIN,
        ConstraintKind.STRUCTURAL_PEAK), kinds);
    ConstraintViolation pm = v.get(1);
    assertEquals("rigid body", pm.mode());
    assertEquals(44, pm.value());
    assertEquals(45, pm.limit());
    assertEquals(1, pm.excess(), 1e-12);
    assertEquals(0.7, pm.frequencyHz());
    assertEquals(55, pm.where().speedEasMps());
    ConstraintViolation gr = v.get(2);
    assertEquals(-5, gr.value());
    assertEquals(-6, gr.limit());
    assertEquals(1, gr.excess(), 1e-12);
    assertTrue(Double.isNaN(gr.frequencyHz()));
    ConstraintViolation gi = v.get(3);
    assertEquals(5.5, gi.value());
    assertEquals(6, gi.limit());
    assertEquals(0.5, gi.excess(), 1e-12);
    assertTrue(Double.isNaN(gi.frequencyHz()));
    assertEquals(0.02, v.get(4).excess(), 1e-9);
    assertEquals(12.3, v.get(4).frequencyHz());
    // nothing held: only the peaks
    assertEquals(2, NotchOptimiser.violations(s, e, new boolean[3], NotchDesignSpec.defaults()).size());
  }

  @Test
  void aViolationMustExceedTheToleranceStrictly() {
    // with a 0 dB limit and zero required margins the excesses below are exactly 0.01 (binary
    // exact differences with zero): not violations; 0.02 is
    LoopSamples s = samples(List.of(at("cfg", 55, 1), at("cfg", 65, 1)), "wing");
    SampleEvaluation e = new SampleEvaluation(new double[][] {{0.01}, {0.02}}, new double[][] {{10}, {11}},
        new double[2], new double[2], new double[] {-0.01, -0.02}, new double[] {-0.01, -0.02},
        new double[] {0.01, 0.02});
    NotchDesignSpec spec = NotchDesignSpec.defaults().withPeakLimitDb(0).withRequiredMargins(0, 0);
    List<ConstraintViolation> v = NotchOptimiser.violations(s, e, new boolean[] {true, true}, spec);
    assertEquals(4, v.size(), v.toString());
    for (ConstraintViolation x : v) {
      assertEquals(65, x.where().speedEasMps());
      assertEquals(0.02, x.excess(), 1e-15);
    }
  }

  @Test
  void aModePeakingExactlyAtTheLimitNeedsNoNotch() {
    LoopSamples s = samples(List.of(at("x", 50, 1)), "p", "q");
    SampleEvaluation e = peaks(new double[][] {{-6, -5}}, new double[][] {{60, 20}});
    List<double[]> c = NotchOptimiser.clusters(s, e, NotchDesignSpec.defaults());
    assertEquals(1, c.size());
    assertArrayEquals(new double[] {20, 20, 1}, c.get(0), 1e-12);
  }

  @Test
  void marginRequirementsFollowTheTableAtEachSampleSpeed() {
    // invented table: 45 deg / 6 dB up to 100 m/s, 35 deg / 5 dB up to 120, 25 deg / 4 dB to 150
    LoopSamples s = samples(List.of(at("cfg", 90, 1), at("cfg", 110, 1), at("cfg", 140, 1)), "wing");
    double[][] db = {{-10}, {-10}, {-10}};
    // PM 40 misses 45 by 5 and 35 by nothing; GM+ 4.5 misses 6 and 5 but not 4
    SampleEvaluation e = new SampleEvaluation(db, db, new double[3], new double[3],
        new double[] {40, 40, 40}, new double[] {4.5, 4.5, 4.5}, new double[] {-10, -10, -10});
    NotchDesignSpec spec = NotchDesignSpec.defaults().withMarginTable(NotchDesignSpecTest.table());
    List<ConstraintViolation> v = NotchOptimiser.violations(s, e, new boolean[] {true, true, true}, spec);
    assertEquals(3, v.size(), v.toString());
    assertEquals(ConstraintKind.RIGID_PHASE_MARGIN, v.get(0).kind());
    assertEquals(5, v.get(0).excess(), 1e-12);
    assertEquals(90, v.get(0).where().speedEasMps());
    assertEquals(1.5, v.get(1).excess(), 1e-12);
    assertEquals(0.5, v.get(2).excess(), 1e-12);
    assertEquals(110, v.get(2).where().speedEasMps());
  }

  @Test
  void explanationsGiveTheWorstViolationPerKindAndModeInWords() {
    SampleLabel flight = at("heavy", 55.04, 1.1);
    SampleLabel built = new SampleLabel("constructed", 0, NAN, NAN, 0.9);
    List<ConstraintViolation> v = new ArrayList<>();
    v.add(new ConstraintViolation(ConstraintKind.STRUCTURAL_PEAK, "wing", flight, -2.5, -6, 3.5, 12.345));
    v.add(new ConstraintViolation(ConstraintKind.STRUCTURAL_PEAK, "fin", built, -3, -6, 3, 20));
    v.add(new ConstraintViolation(ConstraintKind.STRUCTURAL_PEAK, "wing", built, -4, -6, 2, 11));
    v.add(new ConstraintViolation(ConstraintKind.RIGID_PHASE_MARGIN, "rigid body", flight, 40.04, 45, 4.96, 1));
    v.add(new ConstraintViolation(ConstraintKind.RIGID_GAIN_INCREASE_MARGIN, "rigid body", flight, 5.04, 6, 0.96,
        NAN));
    v.add(new ConstraintViolation(ConstraintKind.RIGID_GAIN_REDUCTION_MARGIN, "rigid body", built, -5.04, -6, 0.96,
        NAN));
    v.add(new ConstraintViolation(ConstraintKind.RIGID_PHASE_MARGIN, "rigid body", built, 44, 45, 1, 1));
    List<String> words = NotchOptimiser.explain(v);
    assertEquals(5, words.size(), words.toString());
    assertEquals("wing peaks at -2.50 dB (12.35 Hz) in configuration heavy at 55.0 m/s EAS, mode frequencies x 1.10:"
        + " 3.50 dB above the -6.0 dB limit", words.get(0));
    assertEquals("fin peaks at -3.00 dB (20.00 Hz) in configuration constructed at the constructed loop, mode "
        + "frequencies x 0.90: 3.00 dB above the -6.0 dB limit", words.get(1));
    assertEquals("a rigid-body phase margin of 40.0 deg (required 45.0) in configuration heavy at 55.0 m/s EAS, "
        + "mode frequencies x 1.10", words.get(2));
    assertEquals("a rigid-body gain-increase margin of 5.0 dB (required 6.0) in configuration heavy at 55.0 m/s "
        + "EAS, mode frequencies x 1.10", words.get(3));
    assertEquals("a rigid-body gain-reduction margin of -5.0 dB (required -6.0) in configuration constructed at the "
        + "constructed loop, mode frequencies x 0.90", words.get(4));
    assertTrue(NotchOptimiser.explain(List.of()).isEmpty());
  }

  /** L = K / (s (s + 1)^2) in the path, nothing in the rest. */
  private static SisoFrequencyFunction thirdOrder(double k) {
    return (w, out) -> {
      double dr = -2 * w * w;
      double di = w * (1 - w * w);
      double d2 = dr * dr + di * di;
      out[0] = k * dr / d2;
      out[1] = -k * di / d2;
    };
  }

  @Test
  void withNoPeakAboveTheLimitNothingIsDesignedAndHeldSamplesAreThoseMeetingTheMargins() {
    // K/(s(s+1)^2): K = 0.3 gives PM 58.9 deg (w_c = 0.278: w(1 + w^2) = 0.3) and GM 16.5 dB
    // (20 log10(2/0.3)); K = 0.5 gives PM 41.2 deg (w_c = 0.4534), below 45: not held.
    // Structural band 9..11 Hz: |L| there about K/w^3 < 1e-4, far below -6 dB; the worst peak is
    // the 9 Hz value of the K = 0.5 loop, 20 log10(0.5 / |j w (j w + 1)^2|) at w = 2 pi 9
    LoopSamples.Builder b = LoopSamples.builder();
    int g = b.modeGrid(10, 0.05, 9, 11);
    int r = b.rigidGrid(0.01, 5);
    b.add(at("a", 40, 1), ClosedForm.constant(0, 0), thirdOrder(0.3), List.of("wing"), new int[] {g}, r);
    b.add(at("a", 50, 1), ClosedForm.constant(0, 0), thirdOrder(0.5), List.of("wing"), new int[] {g}, r);
    LoopSamples s = b.build();
    OptimisedNotches o = new NotchOptimiser().optimise(s, NotchDesignSpec.defaults());
    assertTrue(o.feasible());
    assertTrue(o.notches().isEmpty());
    assertTrue(o.violations().isEmpty());
    assertTrue(o.reasons().isEmpty());
    assertArrayEquals(new boolean[] {true, false}, o.constrained());
    // against 0 deg / 17 dB neither is held (gain-increase margins 16.5 and 12.0 dB); against
    // 0 deg / 11 dB both are
    assertArrayEquals(new boolean[] {false, false},
        new NotchOptimiser().optimise(s, NotchDesignSpec.defaults().withRequiredMargins(0, 17)).constrained());
    assertArrayEquals(new boolean[] {true, true},
        new NotchOptimiser().optimise(s, NotchDesignSpec.defaults().withRequiredMargins(0, 11)).constrained());
    assertEquals(o.before(), o.after());
    OptimiserDiagnostics d = o.diagnostics();
    assertEquals("none needed", d.method());
    assertEquals(1, d.evaluations());
    assertEquals(0, d.runs());
    assertEquals(0.0, d.finalObjective());
    assertEquals(NotchOptimiser.PENALTY_WEIGHT, d.penaltyWeight());
    double w9 = 2 * Math.PI * 9;
    double worst = 20 * Math.log10(0.5 / (w9 * (1 + w9 * w9)));
    assertEquals(worst + 6, d.worstPeakExcessDb(), 1e-9);
    assertEquals(0, d.violations());
    assertEquals(2, d.samples());
    assertEquals(s.storedValues(), d.storedValues());
    // the held flags are a copy
    o.constrained()[1] = true;
    assertFalse(o.constrained()[1]);
  }

  /** L = (s + 1)^2 / s^3: -180 deg at w = 1 with |L| = 2 (gain-reduction margin -6.02 dB). */
  @Test
  void aSampleIsHeldOnlyWhenItsGainReductionMarginReachesMinusTheRequirement() {
    SisoFrequencyFunction conditional = (w, out) -> {
      out[0] = -2 * w / (w * w * w);
      out[1] = (1 - w * w) / (w * w * w);
    };
    LoopSamples.Builder b = LoopSamples.builder();
    int g = b.modeGrid(10, 0.05, 9, 11);
    int r = b.rigidGrid(0.01, 5);
    b.add(at("a", 40, 1), ClosedForm.constant(0, 0), conditional, List.of("wing"), new int[] {g}, r);
    LoopSamples s = b.build();
    // its phase margin is 21.4 deg (1 + w^2 = w^3 at w_c = 1.466: 180 - 270 + 2 atan w_c), so ask for 0 deg
    assertArrayEquals(new boolean[] {true},
        new NotchOptimiser().optimise(s, NotchDesignSpec.defaults().withRequiredMargins(0, 6)).constrained());
    assertArrayEquals(new boolean[] {false},
        new NotchOptimiser().optimise(s, NotchDesignSpec.defaults().withRequiredMargins(0, 8)).constrained());
  }
}
