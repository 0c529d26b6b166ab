package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.junit.jupiter.api.Test;

/**
 * Structural peaks, phase loss and rigid-body margins of candidate notch sets on small invented
 * loops whose answers are closed-form.
 */
class NotchEvaluatorTest {
  private static final double TWO_PI = 2 * Math.PI;
  private static final SisoFrequencyFunction ZERO = ClosedForm.constant(0, 0);

  private static SampleLabel label(String c) {
    return new SampleLabel(c, 0, Double.NaN, Double.NaN, 1.0);
  }

  /** 20 log10 |a + b N(j w)| for constants a, b and the closed-form notch. */
  private static double db(double ar, double ai, double br, double bi, NotchFilter n, double w) {
    double[] x = ClosedForm.notch(n.centreFrequencyHz(), n.zeroDampingRatio(), n.poleDampingRatio(), w);
    double nr = x[0] * Math.cos(x[1]);
    double ni = x[0] * Math.sin(x[1]);
    return 20 * Math.log10(Math.hypot(ar + br * nr - bi * ni, ai + br * ni + bi * nr));
  }

  @Test
  void peakIsTheLargestGridValuePerModeAndNanWhereASampleLacksTheMode() {
    LoopSamples.Builder b = LoopSamples.builder();
    int g = b.modeGrid(10, 0.02, 9, 11);
    int h = b.modeGrid(20, 0.02, 18, 22);
    int r = b.rigidGrid(0.01, 1);
    // |L| = f / 10 rising: the peak sits on the top of each band, 11 Hz (0.828 dB) and 22 Hz
    SisoFrequencyFunction rising = ClosedForm.power(1 / (TWO_PI * 10), 1);
    // |L| = 10 / f falling: on the bottom, 18 Hz
    SisoFrequencyFunction falling = ClosedForm.power(TWO_PI * 10, -1);
    b.add(label("a"), ZERO, rising, List.of("low"), new int[] {g}, r);
    b.add(label("b"), ZERO, falling, List.of("high"), new int[] {h}, r);
    // the same mode seen on two grids: the larger of the two band peaks, whichever comes first
    b.add(label("c"), ZERO, rising, List.of("low", "low"), new int[] {g, h}, r);
    b.add(label("d"), ZERO, rising, List.of("low", "low"), new int[] {h, g}, r);
    b.add(label("e"), ZERO, falling, List.of("low", "low"), new int[] {h, g}, r);
    SampleEvaluation e = new NotchEvaluator(b.build()).evaluate(List.of());
    double[][] p = e.peakDb();
    double[][] f = e.peakHz();
    assertEquals(20 * Math.log10(1.1), p[0][0], 1e-12);
    assertEquals(11, f[0][0], 1e-12);
    assertTrue(Double.isNaN(p[0][1]) && Double.isNaN(f[0][1]));
    assertEquals(20 * Math.log10(10.0 / 18), p[1][1], 1e-12);
    assertEquals(18, f[1][1], 1e-12);
    assertTrue(Double.isNaN(p[1][0]) && Double.isNaN(f[1][0]));
    assertEquals(20 * Math.log10(2.2), p[2][0], 1e-12);
    assertEquals(22, f[2][0], 1e-12);
    assertEquals(20 * Math.log10(2.2), p[3][0], 1e-12);
    assertEquals(22, f[3][0], 1e-12);
    assertEquals(20 * Math.log10(10.0 / 9), p[4][0], 1e-12);
    assertEquals(9, f[4][0], 1e-12);
  }

  @Test
  void notchedPeakIsTheClosedFormRestPlusPathTimesNotch() {
    NotchFilter n = new NotchFilter(10, 0.05, 0.5);
    LoopSamples.Builder b = LoopSamples.builder();
    // two-point grids (band narrower than one step): the peak is the larger of two closed-form values
    int g = b.modeGrid(8, 0.02, 8, 8.00001);
    int h = b.modeGrid(11, 0.02, 10.99999, 11);
    int r = b.rigidGrid(0.01, 1);
    b.add(label("a"), ClosedForm.constant(0.1, 0.3), ClosedForm.constant(0.6, -0.8), List.of("m8", "m11"),
        new int[] {g, h}, r);
    b.add(label("b"), ClosedForm.constant(-0.2, 0.05), ClosedForm.constant(-0.3, 0.9), List.of("m8", "m11"),
        new int[] {g, h}, r);
    LoopSamples s = b.build();
    SampleEvaluation e = new NotchEvaluator(s).evaluate(List.of(n));
    double[][] ab = {{0.1, 0.3, 0.6, -0.8}, {-0.2, 0.05, -0.3, 0.9}};
    for (int i = 0; i < 2; i++) {
      double[] c = ab[i];
      for (int m = 0; m < 2; m++) {
        double lo = m == 0 ? 8 : 10.99999;
        double hi = m == 0 ? 8.00001 : 11;
        double dLo = db(c[0], c[1], c[2], c[3], n, TWO_PI * lo);
        double dHi = db(c[0], c[1], c[2], c[3], n, TWO_PI * hi);
        assertEquals(Math.max(dLo, dHi), e.peakDb()[i][m], 1e-9, "sample " + i + " mode " + m);
        assertEquals(dLo > dHi ? lo : hi, e.peakHz()[i][m], 1e-9);
      }
    }
    // and the two-notch product: |N1 N2| at the band edges, rest zero, path one
    NotchFilter n2 = new NotchFilter(8.5, 0.1, 0.3);
    LoopSamples.Builder b2 = LoopSamples.builder();
    int g2 = b2.modeGrid(8, 0.02, 8, 8.00001);
    b2.add(label("c"), ZERO, ClosedForm.constant(1, 0), List.of("m"), new int[] {g2}, b2.rigidGrid(0.01, 1));
    SampleEvaluation e2 = new NotchEvaluator(b2.build()).evaluate(List.of(n, n2));
    double expected = Double.NEGATIVE_INFINITY;
    for (double hz : new double[] {8, 8.00001}) {
      double w = TWO_PI * hz;
      double m = ClosedForm.notch(10, 0.05, 0.5, w)[0] * ClosedForm.notch(8.5, 0.1, 0.3, w)[0];
      expected = Math.max(expected, 20 * Math.log10(m));
    }
    assertEquals(expected, e2.peakDb()[0][0], 1e-9);
  }

  @Test
  void pureNotchPeakOnABandIsItsGainAtTheFartherEdge() {
    // |N|^2 = (u^2 + zz^2)/(u^2 + zp^2), u = (wn^2 - w^2)/(2 wn w), grows with |u|: on 9..11 Hz
    // around a 10 Hz notch |u| is 0.1056 at 9 Hz and 0.0955 at 11 Hz, so the peak is at 9 Hz
    NotchFilter n = new NotchFilter(10, 0.02, 0.4);
    LoopSamples.Builder b = LoopSamples.builder();
    int g = b.modeGrid(10, 0.02, 9, 11);
    b.add(label("a"), ZERO, ClosedForm.constant(1, 0), List.of("m"), new int[] {g}, b.rigidGrid(0.01, 1));
    SampleEvaluation e = new NotchEvaluator(b.build()).evaluate(List.of(n));
    double u = (100.0 - 81.0) / (2 * 10 * 9);
    double expected = 10 * Math.log10((u * u + 0.02 * 0.02) / (u * u + 0.4 * 0.4));
    assertEquals(expected, e.peakDb()[0][0], 1e-9);
    assertEquals(9, e.peakHz()[0][0], 1e-9);
  }

  /** |L| = 1 + 0.5 sin(3 ln w), real: crossovers at w = exp(k pi / 3), k = -2..3 on 0.01..5 Hz. */
  private static final SisoFrequencyFunction WAVY = (w, out) -> {
    out[0] = 1 + 0.5 * Math.sin(3 * Math.log(w));
    out[1] = 0;
  };

  private static double lossDeg(NotchFilter n, double w) {
    return -Math.toDegrees(ClosedForm.notch(n.centreFrequencyHz(), n.zeroDampingRatio(), n.poleDampingRatio(), w)[1]);
  }

  @Test
  void phaseLossIsTheWorstNotchLagOverTheCrossoversOrTheLeastLeadWhenAllLead() {
    LoopSamples.Builder b = LoopSamples.builder();
    int r = b.rigidGrid(0.01, 5);
    b.add(label("a"), ZERO, WAVY, List.of(), new int[0], r);
    b.add(label("none"), ZERO, ClosedForm.constant(0.5, 0), List.of(), new int[0], r);
    LoopSamples s = b.build();
    NotchEvaluator ev = new NotchEvaluator(s);
    // a 2 Hz notch (12.6 rad/s): lag at the crossovers below it, lead above
    NotchFilter mid = new NotchFilter(2, 0.1, 0.6);
    SampleEvaluation e = ev.evaluate(List.of(mid));
    double worst = Double.NEGATIVE_INFINITY;
    double at = Double.NaN;
    for (int k = -2; k <= 3; k++) {
      double w = Math.exp(k * Math.PI / 3);
      if (lossDeg(mid, w) > worst) {
        worst = lossDeg(mid, w);
        at = w;
      }
    }
    assertTrue(worst > 0);
    // crossovers Brent-refined to 1e-10 in ln w; the loss slope is under 100 deg per unit ln w
    assertEquals(worst, e.phaseLossDeg()[0], 1e-7);
    assertEquals(at / TWO_PI, e.phaseLossCrossoverHz()[0], 1e-9);
    assertEquals(worst, e.worstPhaseLossDeg(), 1e-7);
    // no crossover: zero loss, no frequency
    assertEquals(0, e.phaseLossDeg()[1]);
    assertTrue(Double.isNaN(e.phaseLossCrossoverHz()[1]));
    // a notch far below every crossover (0.005 Hz = 0.031 rad/s) only leads: the least lead,
    // at the highest crossover exp(pi) = 23.1 rad/s, is reported, negative
    NotchFilter low = new NotchFilter(0.005, 0.1, 0.6);
    SampleEvaluation l = ev.evaluate(List.of(low));
    double top = Math.exp(Math.PI);
    assertEquals(lossDeg(low, top), l.phaseLossDeg()[0], 1e-7);
    assertTrue(l.phaseLossDeg()[0] < 0);
    assertEquals(top / TWO_PI, l.phaseLossCrossoverHz()[0], 1e-9);
    // the worst over samples never goes below zero
    assertEquals(0, l.worstPhaseLossDeg());
  }

  @Test
  void phaseLossOfSeveralNotchesIsTheSumOfTheirLags() {
    NotchFilter a = new NotchFilter(3, 0.05, 0.5);
    NotchFilter c = new NotchFilter(7, 0.02, 0.9);
    double w = TWO_PI * 1.2;
    double[] work = new double[2];
    assertEquals(lossDeg(a, w) + lossDeg(c, w), NotchEvaluator.phaseLossDeg(List.of(a, c), w, work), 1e-12);
    // above a centre the notch leads: negative loss
    assertEquals(lossDeg(a, TWO_PI * 4), NotchEvaluator.phaseLossDeg(List.of(a), TWO_PI * 4, work), 1e-12);
    assertTrue(NotchEvaluator.phaseLossDeg(List.of(a), TWO_PI * 4, work) < 0);
    assertEquals(0, NotchEvaluator.phaseLossDeg(List.of(), w, work), 0.0);
  }

  /** L = K / (s (s + 1)^2). */
  private static SisoFrequencyFunction thirdOrder(double k) {
    return (w, out) -> {
      // (j w + 1)^2 = 1 - w^2 + 2 j w; times j w: -2 w^2 + j w (1 - w^2)
      double dr = -2 * w * w;
      double di = w * (1 - w * w);
      double d2 = dr * dr + di * di;
      out[0] = k * dr / d2;
      out[1] = -k * di / d2;
    };
  }

  /** L = (s + 1)^2 / s^3: phase -270 deg + 2 atan w, crossing -180 deg at w = 1 with |L| = 2. */
  private static final SisoFrequencyFunction CONDITIONAL = (w, out) -> {
    // (1 - w^2 + 2 j w) / (-j w^3) = j (1 - w^2 + 2 j w) / w^3
    out[0] = -2 * w / (w * w * w);
    out[1] = (1 - w * w) / (w * w * w);
  };

  private static double root(SisoFrequencyFunction f, double lo, double hi) {
    return new BrentSolver(1e-14).solve(200, w -> f.magnitude(w) - 1, lo, hi);
  }

  @Test
  void rigidMarginsOfClassicLoopsMatchTheirClosedForms() {
    LoopSamples.Builder b = LoopSamples.builder();
    int r = b.rigidGrid(0.01, 5);
    // split each loop between the two parts, so that only their sum has the margins
    SisoFrequencyFunction third = thirdOrder(0.5);
    b.add(label("third"), (w, out) -> {
      third.response(w, out);
      out[0] *= 0.3;
      out[1] *= 0.3;
    }, (w, out) -> {
      third.response(w, out);
      out[0] *= 0.7;
      out[1] *= 0.7;
    }, List.of(), new int[0], r);
    b.add(label("conditional"), ZERO, CONDITIONAL, List.of(), new int[0], r);
    SampleEvaluation e = new NotchEvaluator(b.build()).evaluate(List.of());
    // K/(s(s+1)^2): arg = -90 - 2 atan w = -180 at w = 1 where |L| = K/2: GM = 20 log10(2/K) =
    // 20 log10 4 = 12.04 dB; PM = 90 - 2 atan(w_c) with w_c (1 + w_c^2) = K. Interpolation on the
    // 60-per-decade grid (h = 0.038 in ln w) errs by about h^2/8 times the curvature: < 0.01
    double wc = root(third, 0.1, 1);
    assertEquals(90 - 2 * Math.toDegrees(Math.atan(wc)), e.phaseMarginDeg()[0], 0.01);
    assertEquals(20 * Math.log10(4), e.gainIncreaseMarginDb()[0], 0.01);
    assertEquals(Double.NEGATIVE_INFINITY, e.gainReductionMarginDb()[0]);
    // (s+1)^2/s^3: -180 deg at w = 1 with |L| = 2: gain-reduction margin -6.02 dB; crossover at
    // 1 + w^2 = w^3, PM = 180 - 270 + 2 atan(w_c)
    double wc2 = root(CONDITIONAL, 1.1, 2);
    assertEquals(-90 + 2 * Math.toDegrees(Math.atan(wc2)), e.phaseMarginDeg()[1], 0.01);
    assertEquals(-20 * Math.log10(2), e.gainReductionMarginDb()[1], 0.01);
    assertEquals(Double.POSITIVE_INFINITY, e.gainIncreaseMarginDb()[1]);
  }

  @Test
  void rigidMarginsSeeTheNotchInThePathOnly() {
    NotchFilter n = new NotchFilter(0.5, 0.1, 0.5);
    LoopSamples.Builder b = LoopSamples.builder();
    int r = b.rigidGrid(0.01, 5);
    b.add(label("third"), ZERO, thirdOrder(0.5), List.of(), new int[0], r);
    b.add(label("rest"), thirdOrder(0.5), ZERO, List.of(), new int[0], r);
    SampleEvaluation e = new NotchEvaluator(b.build()).evaluate(List.of(n));
    // L N with the closed-form notch: crossover by Brent on |L N| = 1, PM = 180 + arg L + arg N
    SisoFrequencyFunction third = thirdOrder(0.5);
    SisoFrequencyFunction notched = (w, out) -> {
      third.response(w, out);
      double[] x = ClosedForm.notch(0.5, 0.1, 0.5, w);
      double m = Math.hypot(out[0], out[1]) * x[0];
      double a = Math.atan2(out[1], out[0]) + x[1];
      out[0] = m * Math.cos(a);
      out[1] = m * Math.sin(a);
    };
    double wc = root(notched, 0.1, 1);
    double[] xc = ClosedForm.notch(0.5, 0.1, 0.5, wc);
    double pm = 180 - 90 - 2 * Math.toDegrees(Math.atan(wc)) + Math.toDegrees(xc[1]);
    assertEquals(pm, e.phaseMarginDeg()[0], 0.02);
    assertTrue(pm < 90 - 2 * Math.toDegrees(Math.atan(root(third, 0.1, 1))) - 1, "the notch lags by > 1 deg");
    // in the rest the notch has no effect
    assertEquals(90 - 2 * Math.toDegrees(Math.atan(root(third, 0.1, 1))), e.phaseMarginDeg()[1], 0.01);
    assertEquals(20 * Math.log10(4), e.gainIncreaseMarginDb()[1], 0.01);
  }

  @Test
  void smallestPhaseMarginAndGainMarginsNearestZeroAreKept() {
    // invented loop, x = ln w: |L| = exp(0.6 sin(1.5 x)), arg L = -pi + 0.5 sin(2 (x - 0.5)).
    // Gain crossovers where sin(1.5 x) = 0: x = -2.094, 0, 2.094 (grid spans x in [-2.77, 3.45]);
    // phase crossovers where sin(2 (x - 0.5)) = 0: x = 0.5 + k pi/2 = -2.642, -1.071, 0.5, 2.071;
    // there GM = -20 log10 |L| = -20/ln10 * 0.6 sin(1.5 x)
    SisoFrequencyFunction wavy = (w, out) -> {
      double x = Math.log(w);
      double m = Math.exp(0.6 * Math.sin(1.5 * x));
      double a = -Math.PI + 0.5 * Math.sin(2 * (x - 0.5));
      out[0] = m * Math.cos(a);
      out[1] = m * Math.sin(a);
    };
    LoopSamples.Builder b = LoopSamples.builder();
    int r = b.rigidGrid(0.01, 5);
    b.add(label("w"), ZERO, wavy, List.of(), new int[0], r);
    SampleEvaluation e = new NotchEvaluator(b.build()).evaluate(List.of());
    double pm = Double.POSITIVE_INFINITY;
    for (double x : new double[] {-2 * Math.PI / 3, 0, 2 * Math.PI / 3}) {
      pm = Math.min(pm, Math.toDegrees(0.5 * Math.sin(2 * (x - 0.5))));
    }
    double inc = Double.POSITIVE_INFINITY;
    double red = Double.NEGATIVE_INFINITY;
    for (int k = -2; k <= 1; k++) {
      double x = 0.5 + k * Math.PI / 2;
      double gm = -20 / Math.log(10) * 0.6 * Math.sin(1.5 * x);
      if (gm > 0) {
        inc = Math.min(inc, gm);
      } else {
        red = Math.max(red, gm);
      }
    }
    // at least one of each by construction
    assertTrue(Double.isFinite(inc) && Double.isFinite(red));
    // linear interpolation on the grid (h = 0.038 in ln w): errors of order h^2/8 times the
    // second derivatives (< 1.2 rad and < 12 dB per unit ln w squared): < 0.003 rad, 0.03 dB
    assertEquals(pm, e.phaseMarginDeg()[0], 0.15);
    assertEquals(inc, e.gainIncreaseMarginDb()[0], 0.03);
    assertEquals(red, e.gainReductionMarginDb()[0], 0.03);
  }

  @Test
  void tiesKeepTheFirstGridPointTheFirstGridAndTheFirstCrossover() {
    LoopSamples.Builder b = LoopSamples.builder();
    int g = b.modeGrid(10, 0.02, 9, 11);
    int h = b.modeGrid(20, 0.02, 18, 22);
    int r = b.rigidGrid(0.01, 5);
    // |L| = 1 on every grid point of both grids of one mode: the first point of the first grid
    b.add(label("flat"), ZERO, ClosedForm.constant(1, 0), List.of("m", "m"), new int[] {h, g}, r);
    b.add(label("wavy"), ZERO, WAVY, List.of(), new int[0], r);
    SampleEvaluation e = new NotchEvaluator(b.build()).evaluate(List.of());
    assertEquals(0, e.peakDb()[0][0], 1e-12);
    assertEquals(18, e.peakHz()[0][0], 1e-12);
    // no notch: zero loss at all six crossovers, reported at the first, exp(-2 pi/3) rad/s
    assertEquals(0, e.phaseLossDeg()[1], 0.0);
    assertEquals(Math.exp(-2 * Math.PI / 3) / TWO_PI, e.phaseLossCrossoverHz()[1], 1e-9);
  }

  @Test
  void aLoopAboveUnityEverywhereHasNoCrossingAtAll() {
    LoopSamples.Builder b = LoopSamples.builder();
    int r = b.rigidGrid(0.01, 5);
    b.add(label("high"), ZERO, ClosedForm.constant(2, 0), List.of(), new int[0], r);
    SampleEvaluation e = new NotchEvaluator(b.build()).evaluate(List.of());
    assertEquals(Double.POSITIVE_INFINITY, e.phaseMarginDeg()[0]);
    assertEquals(Double.POSITIVE_INFINITY, e.gainIncreaseMarginDb()[0]);
    assertEquals(Double.NEGATIVE_INFINITY, e.gainReductionMarginDb()[0]);
  }
}
