package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * Loop margins in the cases a single-crossover test does not reach: a negative phase margin,
 * loops with several resonances (which local maximum governs the peak gain and the disk margin),
 * a phase swing at constant gain, and a grid too small to resolve the loop. References are
 * closed forms or an independent search: a dense logarithmic scan refined by Commons Math's
 * Brent optimiser on the loop written here with Commons Math complex arithmetic.
 */
class LoopMarginCasesTest {

  private static final LoopMargins MARGINS = new LoopMargins();

  /** k w^2/(s^2 + 2 zeta w s + w^2) at s = j omega. */
  private static Complex mode(double k, double w, double zeta, double omega) {
    Complex s = new Complex(0, omega);
    return new Complex(k * w * w).divide(s.multiply(s).add(s.multiply(2 * zeta * w)).add(w * w));
  }

  /**
   * Two resonances in parallel: gain 2 at 2 rad/s (zeta 0.05, peak 20) and gain -0.5 at 15 rad/s
   * (zeta 0.01, peak 25). Found by a scan of the loop written here: the peak gain belongs to the
   * second resonance, while the disk margin's critical point (max |(1 - L)/(2(1 + L))|: 51.4 at
   * 4.69 rad/s against 47.4 at 10.1 rad/s) belongs to the first.
   */
  private static Complex twoModes(double omega) {
    return mode(2, 2, 0.05, omega).add(mode(-0.5, 15, 0.01, omega));
  }

  private static LinearBlock twoModesBlock() {
    // 2*4/(s^2 + 0.2 s + 4) - 0.5*225/(s^2 + 0.3 s + 225), over the common denominator
    double[] d1 = {1, 0.2, 4};
    double[] d2 = {1, 0.3, 225};
    double[] num = new double[3];
    // 8 d2 - 112.5 d1 (both numerators are constants)
    for (int i = 0; i < 3; i++) {
      num[i] = 8 * d2[i] - 112.5 * d1[i];
    }
    double[] den = new double[5];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        den[i + j] += d1[i] * d2[j];
      }
    }
    return new TransferFunctionBlock(num, den);
  }

  /** Location and value of the maximum of f over [lo, hi] (log scan of 20 000 points + Brent). */
  private static UnivariatePointValuePair maximise(java.util.function.DoubleUnaryOperator f,
      double lo, double hi) {
    int n = 20_000;
    double best = Double.NEGATIVE_INFINITY;
    int at = 0;
    for (int i = 0; i <= n; i++) {
      double w = lo * Math.pow(hi / lo, (double) i / n);
      double v = f.applyAsDouble(w);
      if (v > best) {
        best = v;
        at = i;
      }
    }
    double a = lo * Math.pow(hi / lo, Math.max(0, at - 1.0) / n);
    double b = lo * Math.pow(hi / lo, Math.min(n, at + 1.0) / n);
    return new BrentOptimizer(1e-14, 1e-300).optimize(new MaxEval(1000),
        new UnivariateObjectiveFunction(f::applyAsDouble), GoalType.MAXIMIZE,
        new SearchInterval(a, b, 0.5 * (a + b)));
  }

  @Test
  void negativePhaseMarginGivesTheDelayToTheNextCriticalRotation() {
    // L = e^{-2 s}/s: w_c = 1, phase -90 deg - 114.59 deg, so PM = 90 - 114.59 = -24.59 deg
    // (closed form; the loop is unstable). The delay margin is the added delay that brings the
    // crossover back onto -1: PM wrapped into [0, 360) deg, (360 - 24.59) deg / (1 rad/s).
    LoopMarginResult r = MARGINS.analyse(new Integrator(1).then(new PureDelay(2, PadeOrder.ORDER_6)),
        0.01, 10);
    GainCrossover gc = r.gainCrossovers().get(0);
    double pm = 90 - Math.toDegrees(2);
    assertTrue(pm < 0);
    // Pade-6 phase error at w tau = 2: order (w tau)^13/(12! 13!), ~1e-9 rad; 1e-7 deg
    assertEquals(pm, gc.phaseMarginDeg(), 1e-7);
    assertEquals(Math.toRadians(360 + pm), gc.delayMarginS(), 1e-8);
    assertEquals(gc.delayMarginS(), r.delayMarginS().getAsDouble(), 0.0);
    assertEquals(gc, r.governingPhaseMargin().orElseThrow());
    assertEquals(ClosedLoopStability.UNSTABLE, r.closedLoopStability());
  }

  @Test
  void theLargestOfSeveralResonancesGovernsThePeakGain() {
    // Independent maximum of |L| for two resonances whose peaks are 20 (at 2 rad/s) and 25 (at
    // 15 rad/s): the second local maximum must win.
    // Tolerances: value 1e-9 relative (both sides maximise a smooth peak to round-off), location
    // 1e-5 relative (a flat maximum locates to the square root of the value's precision).
    LinearBlock loop = twoModesBlock();
    for (double w : new double[] {0.7, 2.0, 9.0, 15.0}) {
      assertEquals(twoModes(w).abs(), loop.magnitude(w), 1e-12 * twoModes(w).abs());
    }
    UnivariatePointValuePair ref = maximise(w -> twoModes(w).abs(), 0.1, 100);
    LoopMarginResult r = MARGINS.analyse(loop, 0.1, 100);
    assertEquals(ref.getValue(), r.peakGain().magnitude(), 1e-9 * ref.getValue());
    assertEquals(ref.getPoint(), r.peakGain().omegaRadPerS(), 1e-5 * ref.getPoint());
    assertTrue(ref.getPoint() > 10, "the 15 rad/s resonance governs: " + ref.getPoint());
    // over a range that holds only the first resonance, the first one is found
    UnivariatePointValuePair low = maximise(w -> twoModes(w).abs(), 0.1, 6);
    LoopMarginResult rl = MARGINS.analyse(loop, 0.1, 6);
    assertEquals(low.getValue(), rl.peakGain().magnitude(), 1e-9 * low.getValue());
    assertEquals(low.getPoint(), rl.peakGain().omegaRadPerS(), 1e-5 * low.getPoint());
  }

  @Test
  void withoutExtremaRefinementThePeakIsTheGridsLargestSampleAndTheRestIsUnchanged() {
    // the same two resonances (peaks 20 and 25, maximum found independently by Brent): without
    // refinement the peak gain is a grid sample, so at most the true maximum, and within the
    // grid's gain step of it (1.5 dB: neighbouring samples differ by less, and the resonance is
    // seeded); crossovers and margins are refined either way, so they are the same numbers
    LinearBlock loop = twoModesBlock();
    UnivariatePointValuePair ref = maximise(w -> twoModes(w).abs(), 0.1, 100);
    LoopMarginResult full = MARGINS.analyse(loop, 0.1, 100);
    LoopMarginResult coarse = new LoopMargins(MarginOptions.defaults().withoutExtremaRefinement())
        .analyse(loop, 0.1, 100);
    assertTrue(MarginOptions.defaults().refineExtrema());
    assertTrue(coarse.peakGain().magnitude() <= ref.getValue() * (1 + 1e-12), coarse.peakGain().toString());
    assertTrue(20 * Math.log10(ref.getValue() / coarse.peakGain().magnitude()) < 1.5, coarse.peakGain().toString());
    assertTrue(coarse.peakGain().omegaRadPerS() > 10, "the 15 rad/s resonance still governs");
    assertTrue(coarse.diskMargin().alpha() >= full.diskMargin().alpha() * (1 - 1e-12),
        "the grid's smallest disk can only be larger: " + coarse.diskMargin() + " vs " + full.diskMargin());
    assertEquals(full.gainCrossovers(), coarse.gainCrossovers());
    assertEquals(full.phaseCrossovers(), coarse.phaseCrossovers());
    assertEquals(full.closedLoopStability(), coarse.closedLoopStability());
    assertTrue(coarse.diagnostics().functionEvaluations() < full.diagnostics().functionEvaluations(),
        coarse.diagnostics() + " vs " + full.diagnostics());
  }

  @Test
  void theResonanceClosestToMinusOneGovernsTheDiskMargin() {
    // Disk margin alpha = 1 / max |(1 - L)/(2 (1 + L))| (Seiler, Packard & Gahinet 2020,
    // docs/validation.md sec. 8): of the two local maxima the first, lower-frequency one governs
    // (the reverse of the peak gain). Tolerances as for the peak gain, location 1e-4 relative.
    LinearBlock loop = twoModesBlock();
    java.util.function.DoubleUnaryOperator f = w -> {
      Complex l = twoModes(w);
      return Complex.ONE.subtract(l).divide(Complex.ONE.add(l).multiply(2)).abs();
    };
    UnivariatePointValuePair ref = maximise(f, 0.1, 100);
    LoopMarginResult r = MARGINS.analyse(loop, 0.1, 100);
    assertEquals(1 / ref.getValue(), r.diskMargin().alpha(), 1e-9 / ref.getValue());
    assertEquals(ref.getPoint(), r.diskMargin().omegaRadPerS(), 1e-4 * ref.getPoint());
    assertTrue(ref.getPoint() < 6, "the first resonance governs: " + ref.getPoint());
    // above 6 rad/s only the second local maximum is left
    UnivariatePointValuePair high = maximise(f, 6, 100);
    LoopMarginResult rh = MARGINS.analyse(loop, 6, 100);
    assertEquals(1 / high.getValue(), rh.diskMargin().alpha(), 1e-9 / high.getValue());
    assertEquals(high.getPoint(), rh.diskMargin().omegaRadPerS(), 1e-4 * high.getPoint());
  }

  /** 0.5 (s^2 - 2 zeta w s + w^2)/(s^2 + 2 zeta w s + w^2): constant gain 0.5, phase 0 to -360 deg. */
  private static LinearBlock halfAllPass(double w, double zeta) {
    return new TransferFunctionBlock(new double[] {0.5, -0.5 * 2 * zeta * w, 0.5 * w * w},
        new double[] {1, 2 * zeta * w, w * w});
  }

  @Test
  void phaseSwingAtConstantGainIsRefinedOntoItsCrossover() {
    // |L| = 0.5 at every frequency; the phase -2 atan2(2 zeta w omega, w^2 - omega^2) passes
    // -180 deg exactly at omega = w (closed form: the all-pass equals -1 there). On a grid of 4
    // points per decade the phase moves about 50 deg between points, so only the phase-step
    // refinement (10 deg) resolves it (no pole seeds: frequency-function entry point). Expected:
    // one phase crossover at w with GM = 20 log10 2 dB; tolerances from Brent's 1e-13 in ln w.
    double w = 7.3;
    MarginOptions coarse = new MarginOptions(4, 10, 1.5, 100_000, 30, 0.3, 8);
    LoopMarginResult r = new LoopMargins(coarse).analyse((SisoFrequencyFunction) halfAllPass(w, 0.3),
        1, 100, Eigenvalues.none());
    assertEquals(1, r.phaseCrossovers().size(), r.phaseCrossovers().toString());
    PhaseCrossover pc = r.phaseCrossovers().get(0);
    assertEquals(w, pc.omegaRadPerS(), 1e-9 * w);
    assertEquals(20 * Math.log10(2), pc.gainMarginDb(), 1e-9);
    assertEquals(MarginDirection.GAIN_INCREASE, pc.direction());
    assertEquals(0, r.gainCrossovers().size());
    assertEquals(0, r.diagnostics().unresolvedIntervals());
    assertTrue(r.diagnostics().refinementPoints() > 0, r.diagnostics().toString());
    // the refined grid has no phase step above the limit: check it by halving the limit, which
    // must need more points
    MarginOptions finer = new MarginOptions(4, 5, 1.5, 100_000, 30, 0.3, 8);
    LoopMarginResult rf = new LoopMargins(finer).analyse((SisoFrequencyFunction) halfAllPass(w, 0.3),
        1, 100, Eigenvalues.none());
    assertTrue(rf.diagnostics().gridPoints() > r.diagnostics().gridPoints(),
        rf.diagnostics() + " vs " + r.diagnostics());
  }

  @Test
  void aGridTooShallowForTheLoopIsReportedAsUnresolved() {
    // The same loop with refinement depth 1: the phase steps cannot all be brought below 10 deg
    // and the result must say so instead of reporting a clean grid.
    MarginOptions shallow = new MarginOptions(4, 10, 1.5, 100_000, 1, 0.3, 8);
    LoopMarginResult r = new LoopMargins(shallow).analyse((SisoFrequencyFunction) halfAllPass(7.3, 0.3),
        1, 100, Eigenvalues.none());
    assertTrue(r.diagnostics().unresolvedIntervals() >= 1, r.diagnostics().toString());
  }

  @Test
  void marginOptionsAcceptTheirLimitsAndRejectBeyond() {
    // each limit of the Javadoc accepted exactly at the bound and rejected just past it
    new MarginOptions(4, 45, 1e-9, 16, 1, 0, 0);
    new MarginOptions(4, 1e-9, 1.5, 16, 52, 1, 0);
    assertThrows(InvalidInputException.class, () -> new MarginOptions(3, 10, 1.5, 1000, 30, 0.3, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 0, 1.5, 1000, 30, 0.3, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 45.0001, 1.5, 1000, 30, 0.3, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 10, 0, 1000, 30, 0.3, 8));
    assertThrows(InvalidInputException.class,
        () -> new MarginOptions(40, 10, Double.POSITIVE_INFINITY, 1000, 30, 0.3, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 10, 1.5, 15, 30, 0.3, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 10, 1.5, 1000, 0, 0.3, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 10, 1.5, 1000, 53, 0.3, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 10, 1.5, 1000, 30, -0.01, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 10, 1.5, 1000, 30, 1.01, 8));
    assertThrows(InvalidInputException.class, () -> new MarginOptions(40, 10, 1.5, 1000, 30, 0.3, -1));
    MarginOptions d = MarginOptions.defaults();
    assertEquals(new MarginOptions(40, 10.0, 1.5, 200_000, 30, 0.3, 8), d);
  }

  @Test
  void crossoverRecordsRejectInconsistentValues() {
    double w = 2.0;
    double hz = w / (2 * Math.PI);
    new GainCrossover(w, hz, -100, 180, 1.0);
    assertThrows(InvalidInputException.class, () -> new GainCrossover(0, 0, -100, 80, 1.0));
    assertThrows(InvalidInputException.class, () -> new GainCrossover(Double.POSITIVE_INFINITY, hz, -100, 80, 1));
    assertThrows(InvalidInputException.class, () -> new GainCrossover(w, hz * 1.001, -100, 80, 1.0));
    assertThrows(InvalidInputException.class, () -> new GainCrossover(w, hz, -100, -180, 1.0));
    assertThrows(InvalidInputException.class, () -> new GainCrossover(w, hz, -100, 180.001, 1.0));
    new PhaseCrossover(w, hz, 0.5, 6.02, MarginDirection.GAIN_INCREASE);
    assertThrows(InvalidInputException.class,
        () -> new PhaseCrossover(0, 0, 0.5, 6.02, MarginDirection.GAIN_INCREASE));
    assertThrows(InvalidInputException.class,
        () -> new PhaseCrossover(Double.NaN, hz, 0.5, 6.02, MarginDirection.GAIN_INCREASE));
    assertThrows(InvalidInputException.class,
        () -> new PhaseCrossover(w, hz * 0.999, 0.5, 6.02, MarginDirection.GAIN_INCREASE));
    assertThrows(InvalidInputException.class, () -> new PhaseCrossover(w, hz, 0.5, 6.02, null));
  }

  @Test
  void diskMarginLimitsAndTheirClosedForms() {
    // Seiler et al. 2020 (docs/validation.md sec. 8): alpha = 2 is the largest finite disk, with
    // gain interval [0, inf) and 90 deg; alpha = 0 is no margin at all; symmetric 6 dB disk
    // alpha = 2 (g - 1)/(g + 1) with g = 10^(6/20).
    DiskMargin two = DiskMargin.ofAlpha(2, 1);
    assertEquals(0.0, two.gainLower(), 0.0);
    assertEquals(Double.POSITIVE_INFINITY, two.gainUpper());
    assertEquals(90.0, two.phaseMarginDeg(), 1e-12);
    DiskMargin zero = DiskMargin.ofAlpha(0, 1);
    assertEquals(1.0, zero.gainLower(), 0.0);
    assertEquals(1.0, zero.gainUpper(), 0.0);
    assertEquals(0.0, zero.phaseMarginDeg(), 0.0);
    DiskMargin big = DiskMargin.ofAlpha(3, 1);
    assertEquals(0.0, big.gainLower(), 0.0);
    assertEquals(Double.POSITIVE_INFINITY, big.gainUpper());
    DiskMargin nearTwo = DiskMargin.ofAlpha(1.9, 1);
    assertEquals(0.1 / 3.9, nearTwo.gainLower(), 1e-15);
    assertEquals(3.9 / 0.1, nearTwo.gainUpper(), 1e-12);
    assertEquals(1.0 / (2 * Math.PI), DiskMargin.ofAlpha(0.5, 1).frequencyHz(), 1e-15);
    double g = Math.pow(10, 6.0 / 20);
    assertEquals(2 * (g - 1) / (g + 1), DiskMargin.alphaForSymmetricGainDb(6), 1e-15);
    assertThrows(InvalidInputException.class, () -> DiskMargin.ofAlpha(-1e-12, 1));
    assertThrows(InvalidInputException.class, () -> DiskMargin.ofAlpha(Double.NaN, 1));
    assertThrows(InvalidInputException.class, () -> DiskMargin.alphaForSymmetricGainDb(0));
    assertThrows(InvalidInputException.class,
        () -> DiskMargin.alphaForSymmetricGainDb(Double.POSITIVE_INFINITY));
  }

  @Test
  void firstOrderLagBandwidthConstructors() {
    // 1/(tau s + 1) with tau = 1/w_b: corner at w_b, -45 deg there (closed form)
    FirstOrderLag lag = FirstOrderLag.ofBandwidthRadPerS(4);
    assertEquals(-Math.PI / 4, lag.phaseRad(4), 1e-15);
    FirstOrderLag hz = FirstOrderLag.ofBandwidthHz(2);
    assertEquals(-Math.PI / 4, hz.phaseRad(4 * Math.PI), 1e-15);
    assertThrows(InvalidInputException.class, () -> FirstOrderLag.ofBandwidthRadPerS(0));
    assertThrows(InvalidInputException.class, () -> FirstOrderLag.ofBandwidthHz(0));
    assertThrows(InvalidInputException.class, () -> FirstOrderLag.ofBandwidthHz(Double.NaN));
  }
}
