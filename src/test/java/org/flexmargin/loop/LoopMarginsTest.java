package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

class LoopMarginsTest {

  /**
   * Crossing frequencies come from Brent's method with absolute tolerance 1e-13 in ln w; with
   * the round-off of L itself 1e-9 relative is a safe bound that still catches any real error.
   */
  private static final double ROOT_TOL = 1e-9;

  private static final LoopMargins MARGINS = new LoopMargins();

  /** K/(s(s+1)(s+2)) as blocks: (K/2) * 1/s * 1/(s+1) * 1/(s/2 + 1). */
  private static LinearBlock thirdOrder(double k) {
    return SeriesBlock.of(new Gain(k / 2), new Integrator(1), new FirstOrderLag(1),
        new FirstOrderLag(0.5));
  }

  /** Largest positive real root of a polynomial (ascending coefficients), Commons Math Laguerre. */
  private static double positiveRoot(double... ascending) {
    double best = Double.NaN;
    for (Complex z : new LaguerreSolver(1e-15).solveAllComplex(ascending, 1.0)) {
      if (Math.abs(z.getImaginary()) < 1e-9 && z.getReal() > 0
          && !(z.getReal() < best)) {
        best = z.getReal();
      }
    }
    return best;
  }

  /** Closed-loop eigenvalue of largest real part of the unity negative-feedback state space. */
  private static double[] rightmostClosedLoopPole(StateSpace loop) {
    Eigenvalues ev = loop.feedback(StateSpace.staticGain(1), FeedbackSign.NEGATIVE).eigenvalues();
    int best = 0;
    for (int k = 1; k < ev.size(); k++) {
      if (ev.realAt(k) > ev.realAt(best)
          || (ev.realAt(k) == ev.realAt(best) && ev.imagAt(k) > ev.imagAt(best))) {
        best = k;
      }
    }
    return new double[] {ev.realAt(best), Math.abs(ev.imagAt(best))};
  }

  @Test
  void thirdOrderLoopHasTheTextbookGainMargin() {
    // Closed form (Ogata, Modern Control Engineering, Routh/Bode example K/(s(s+1)(s+2))):
    // phase crossover at w = sqrt(2) where |L| = K/6, so GM = 20 log10(6/K) dB.
    for (double k : new double[] {1, 2}) {
      LoopMarginResult r = MARGINS.analyse(thirdOrder(k), 0.01, 100);
      assertEquals(1, r.phaseCrossovers().size(), r.toString());
      PhaseCrossover pc = r.phaseCrossovers().get(0);
      assertEquals(Math.sqrt(2), pc.omegaRadPerS(), ROOT_TOL * Math.sqrt(2));
      assertEquals(Math.sqrt(2) / (2 * Math.PI), pc.frequencyHz(), 1e-9);
      assertEquals(20 * Math.log10(6 / k), pc.gainMarginDb(), 1e-8);
      assertEquals(MarginDirection.GAIN_INCREASE, pc.direction());
      assertEquals(pc, r.governingGainIncreaseMargin().orElseThrow());
      assertTrue(r.governingGainReductionMargin().isEmpty());
      // gain crossover: w^2 (w^2 + 1)(w^2 + 4) = K^2, i.e. u^3 + 5u^2 + 4u - K^2 = 0 in u = w^2,
      // solved independently by Commons Math's Laguerre solver; PM = 90 - atan w - atan(w/2).
      double wc = Math.sqrt(positiveRoot(-k * k, 4, 5, 1));
      assertEquals(1, r.gainCrossovers().size());
      GainCrossover gc = r.gainCrossovers().get(0);
      assertEquals(wc, gc.omegaRadPerS(), ROOT_TOL * wc);
      double pm = 90 - Math.toDegrees(Math.atan(wc) + Math.atan(wc / 2));
      assertEquals(pm, gc.phaseMarginDeg(), 1e-7);
      assertEquals(Math.toRadians(pm) / wc, r.delayMarginS().getAsDouble(), 1e-8);
      assertEquals(ClosedLoopStability.STABLE, r.closedLoopStability());
      assertEquals(0, r.diagnostics().unresolvedIntervals());
      // Seiler et al. 2020: the disk margin is never larger than the classical margins.
      assertTrue(r.diskMargin().gainUpper() <= 6 / k);
      assertTrue(r.diskMargin().phaseMarginDeg() <= pm);
    }
  }

  @Test
  void scalingByTheGainMarginPutsAClosedLoopPoleOnTheAxisAtThePhaseCrossover() {
    // Consistency that cannot be faked: the margin is found from the frequency response; the
    // check uses eigenvalues of the state-space feedback loop. Eigenvalue round-off ~1e-14 of a
    // matrix of norm ~10, Brent tolerance 1e-13 in ln w: 1e-8 bounds both with margin.
    for (double k : new double[] {1, 2}) {
      LinearBlock loop = thirdOrder(k);
      LoopMarginResult r = MARGINS.analyse(loop, 0.01, 100);
      PhaseCrossover pc = r.governingGainIncreaseMargin().orElseThrow();
      double factor = Math.pow(10, pc.gainMarginDb() / 20);
      double[] p = rightmostClosedLoopPole(loop.stateSpace().scale(factor));
      assertEquals(0.0, p[0], 1e-8);
      assertEquals(pc.omegaRadPerS(), p[1], 1e-8);
    }
  }

  @Test
  void integratorWithDelayHasTheClosedFormMargins() {
    // Closed forms for L = K e^{-s tau}/s: |L| = K/w so w_c = K; phase -90 deg - w tau, so
    // PM = 90 deg - K tau (rad->deg), delay margin = pi/(2K) - tau; phase crossovers at
    // w tau = pi/2 + 2 n pi with GM_n = 20 log10(w_n / K).
    double[][] cases = {{1, 0.1}, {2, 0.3}};
    for (double[] c : cases) {
      double k = c[0];
      double tau = c[1];
      LinearBlock loop = new Integrator(k).then(new PureDelay(tau, PadeOrder.ORDER_6));
      LoopMarginResult r = MARGINS.analyse(loop, 0.01, 200);
      assertEquals(1, r.gainCrossovers().size());
      GainCrossover gc = r.gainCrossovers().get(0);
      assertEquals(k, gc.omegaRadPerS(), ROOT_TOL * k);
      assertEquals(90 - Math.toDegrees(k * tau), gc.phaseMarginDeg(), 1e-7);
      assertEquals(Math.PI / (2 * k) - tau, r.delayMarginS().getAsDouble(), 1e-8);
      int expected = 0;
      for (int n = 0; (Math.PI / 2 + 2 * n * Math.PI) / tau < 200; n++) {
        double wn = (Math.PI / 2 + 2 * n * Math.PI) / tau;
        PhaseCrossover pc = r.phaseCrossovers().get(n);
        assertEquals(wn, pc.omegaRadPerS(), ROOT_TOL * wn);
        assertEquals(20 * Math.log10(wn / k), pc.gainMarginDb(), 1e-7);
        expected++;
      }
      assertEquals(expected, r.phaseCrossovers().size());
      assertEquals(r.phaseCrossovers().get(0), r.governingGainIncreaseMargin().orElseThrow());
      assertEquals(0, r.diagnostics().unresolvedIntervals());
    }
  }

  @Test
  void addingTheDelayMarginPutsTheLoopOnTheCriticalPoint() {
    // Consistency: with tau = delay margin added, 1 + L(j w_c) e^{-j w_c tau} = 0 (exact
    // response), and the Pade-6 state space has a closed-loop pole at j w_c. Pade-6 phase error
    // at w tau <= 1 rad is below 1e-12 rad, so the pole sits on the axis to round-off (1e-7).
    for (LinearBlock loop : List.of(thirdOrder(1), thirdOrder(2),
        new TransferFunctionBlock(new double[] {2}, new double[] {1, 1, 0}))) {
      LoopMarginResult r = MARGINS.analyse(loop, 0.01, 100);
      GainCrossover gc = r.governingDelayMargin().orElseThrow();
      double tau = gc.delayMarginS();
      LinearBlock delayed = loop.then(new PureDelay(tau, PadeOrder.ORDER_6));
      double[] v = new double[2];
      delayed.response(gc.omegaRadPerS(), v);
      assertEquals(0.0, Math.hypot(1 + v[0], v[1]), 1e-10);
      double[] p = rightmostClosedLoopPole(delayed.stateSpace());
      assertEquals(0.0, p[0], 1e-7);
      assertEquals(gc.omegaRadPerS(), p[1], 1e-7);
    }
  }

  @Test
  void conditionallyStableLoopReportsAGainReductionMargin() {
    // L = K (s+1)^2 / s^3, K = 2 (derived by hand): phase -270 deg + 2 atan w = -180 deg at
    // w = 1 where |L| = 2K = 4; closed loop s^3 + K s^2 + 2K s + K is stable iff K > 1/2
    // (Routh), so the gain may fall by a factor 4: GM = -20 log10 4 = -12.04 dB.
    LinearBlock loop = new TransferFunctionBlock(new double[] {2, 4, 2}, new double[] {1, 0, 0, 0});
    LoopMarginResult r = MARGINS.analyse(loop, 0.01, 100);
    assertEquals(ClosedLoopStability.STABLE, r.closedLoopStability());
    assertEquals(1, r.phaseCrossovers().size());
    PhaseCrossover pc = r.governingGainReductionMargin().orElseThrow();
    assertEquals(MarginDirection.GAIN_REDUCTION, pc.direction());
    assertEquals(1.0, pc.omegaRadPerS(), ROOT_TOL);
    assertEquals(-20 * Math.log10(4), pc.gainMarginDb(), 1e-8);
    assertTrue(r.governingGainIncreaseMargin().isEmpty());
    // gain crossover 2(1 + w^2) = w^3 (Laguerre), PM = -90 + 2 atan w_c
    double wc = positiveRoot(-2, 0, -2, 1);
    GainCrossover gc = r.governingPhaseMargin().orElseThrow();
    assertEquals(wc, gc.omegaRadPerS(), ROOT_TOL * wc);
    assertEquals(-90 + 2 * Math.toDegrees(Math.atan(wc)), gc.phaseMarginDeg(), 1e-7);
    // scaling by the reduction margin (x 0.25) puts a closed-loop pole at +-j (Routh, K = 1/2)
    double[] p = rightmostClosedLoopPole(loop.stateSpace().scale(Math.pow(10,
        pc.gainMarginDb() / 20)));
    assertEquals(0.0, p[0], 1e-8);
    assertEquals(1.0, p[1], 1e-8);
  }

  @Test
  void phaseMarginIsWrappedAndDelayMarginUsesTheNextCriticalRotation() {
    // L = e^{-5 s}/s: w_c = 1, unwrapped phase -90 - 286.48 = -376.48 deg, so PM = 180 - 376.48
    // = -196.48 -> wrapped 163.52 deg (closed form, mod 360 into (-180, 180]); a further delay of
    // 163.52 deg / (1 rad/s) = 2.8540 s reaches -540 deg = -180 deg (mod 360).
    LinearBlock loop = new Integrator(1).then(new PureDelay(5, PadeOrder.ORDER_6));
    LoopMarginResult r = MARGINS.analyse(loop, 0.01, 20);
    GainCrossover gc = r.gainCrossovers().get(0);
    double pm = 180 - 90 - Math.toDegrees(5) + 360;
    assertEquals(pm, gc.phaseMarginDeg(), 1e-7);
    assertEquals(Math.toRadians(pm), gc.delayMarginS(), 1e-8);
    // closed form: phase crossover below w_c at w = (pi/2)/5 with |L| = 10/pi > 1 -> reduction
    PhaseCrossover first = r.phaseCrossovers().get(0);
    assertEquals(Math.PI / 10, first.omegaRadPerS(), ROOT_TOL);
    assertEquals(MarginDirection.GAIN_REDUCTION, first.direction());
    assertEquals(-20 * Math.log10(10 / Math.PI), first.gainMarginDb(), 1e-8);
    // nominal loop is unstable (K tau = 5 > pi/2); the Pade-6 model agrees
    assertEquals(ClosedLoopStability.UNSTABLE, r.closedLoopStability());
  }

  @Test
  void diskMarginOfADoubleIntegratorLikeLoopMatchesItsClosedForm() {
    // Derived here from the definition alpha = 1/max|(1 - L)/(2(1 + L))| (Seiler, Packard &
    // Gahinet 2020) for L = k/(s(s+a)): |(1-L)/(1+L)|^2 = 1 + 4 k w^2/((k - w^2)^2 + a^2 w^2),
    // largest at w^2 = k where it is 1 + 4k/a^2; so alpha = 2/sqrt(1 + 4k/a^2) at w = sqrt(k).
    for (double[] c : new double[][] {{1, 1}, {4, 0.5}, {9, 3}}) {
      double k = c[0];
      double a = c[1];
      LoopMarginResult r = MARGINS.analyse(
          new TransferFunctionBlock(new double[] {k}, new double[] {1, a, 0}), 0.01, 1000);
      DiskMargin dm = r.diskMargin();
      // Brent maximisation of a smooth peak: value accurate to round-off, location to ~1e-6
      assertEquals(2 / Math.sqrt(1 + 4 * k / (a * a)), dm.alpha(), 1e-10);
      assertEquals(Math.sqrt(k), dm.omegaRadPerS(), 1e-5 * Math.sqrt(k));
    }
    // L = k/s: (1 - L)/(1 + L) is all-pass, so alpha = 2 exactly: gain interval [0, inf), 90 deg.
    DiskMargin dm = MARGINS.analyse(new Integrator(3), 0.01, 100).diskMargin();
    assertEquals(2.0, dm.alpha(), 1e-12);
    assertEquals(Double.POSITIVE_INFINITY, dm.gainUpper());
    assertEquals(90.0, dm.phaseMarginDeg(), 1e-9);
  }

  @Test
  void diskMarginGainAndPhaseMatchTheDerivedTable() {
    // Seiler, Packard & Gahinet, IEEE CSM 40(5) 2020 [derived, docs/validation.md sec. 8]:
    // alpha = 0.5 -> gain [0.6, 1.6667], phase +-28.0725 deg.
    DiskMargin half = DiskMargin.ofAlpha(0.5, 1);
    assertEquals(0.6, half.gainLower(), 1e-15);
    assertEquals(5.0 / 3, half.gainUpper(), 1e-15);
    assertEquals(28.0725, half.phaseMarginDeg(), 0.00005);
    // Phase from the general formula cos(theta) = (1 + gmin gmax)/(gmin + gmax) (sigma = 0).
    assertEquals(Math.toDegrees(Math.acos((1 + 0.6 * 5.0 / 3) / (0.6 + 5.0 / 3))),
        half.phaseMarginDeg(), 1e-12);
    // +-6 dB symmetric -> alpha 0.6646, +-36.76 deg; 3 dB 0.3420 (19.4); 4.5 dB 0.5068 (28.4);
    // 8 dB 0.8610 (46.6). Tolerances: half a unit of the last quoted digit.
    double[][] table = {{6, 0.6646, 36.76, 0.005}, {3, 0.3420, 19.4, 0.05},
        {4.5, 0.5068, 28.4, 0.05}, {8, 0.8610, 46.6, 0.05}};
    for (double[] row : table) {
      double alpha = DiskMargin.alphaForSymmetricGainDb(row[0]);
      assertEquals(row[1], alpha, 0.00005);
      DiskMargin d = DiskMargin.ofAlpha(alpha, 1);
      assertEquals(row[2], d.phaseMarginDeg(), row[3]);
      assertEquals(row[0], d.gainUpperDb(), 1e-12);
      assertEquals(-row[0], d.gainLowerDb(), 1e-12);
    }
  }

  @Test
  void refiningGridFindsALightlyDampedPeakBetweenCoarsePoints() {
    // Closed form: w_n^2/(s^2 + 2 zeta w_n s + w_n^2) peaks at 1/(2 zeta sqrt(1 - zeta^2)),
    // about 250 (47.96 dB) for zeta = 0.002 (docs/validation.md sec. 8). w_n = 11.7 rad/s lies between the coarse
    // grid points 10 and 12.59 rad/s of a 10-per-decade grid.
    double zeta = 0.002;
    double wn = 11.7;
    LinearBlock mode = new TransferFunctionBlock(new double[] {wn * wn},
        new double[] {1, 2 * zeta * wn, wn * wn});
    double peakDb = 20 * Math.log10(1 / (2 * zeta * Math.sqrt(1 - zeta * zeta)));
    // the coarse points alone miss the peak by more than 30 dB (shows the test can fail)
    assertTrue(peakDb - 20 * Math.log10(mode.magnitude(Math.pow(10, 1.1))) > 30);
    assertTrue(peakDb - 20 * Math.log10(mode.magnitude(10)) > 30);
    MarginOptions coarse = new MarginOptions(10, 10, 1.5, 100_000, 30, 0.3, 8);
    // without pole seeds: found by the phase/gain-step refinement alone
    LoopMarginResult noSeeds = new LoopMargins(coarse).analyse((SisoFrequencyFunction) mode,
        1, 100, Eigenvalues.none());
    // with seeds from the state space
    LoopMarginResult seeded = new LoopMargins(coarse).analyse(mode, 1, 100);
    for (LoopMarginResult r : List.of(noSeeds, seeded)) {
      // 1e-4 dB: the peak frequency is located to 1e-6 relative, which costs about
      // (1e-6 / (2 zeta))^2 = 6e-8 relative in magnitude (5e-7 dB) at the top of the resonance
      assertEquals(peakDb, r.peakGain().magnitudeDb(), 1e-4);
      // peak frequency w_n sqrt(1 - 2 zeta^2) (closed form), Brent-located to 1e-6 relative
      assertEquals(wn * Math.sqrt(1 - 2 * zeta * zeta), r.peakGain().omegaRadPerS(), 1e-6 * wn);
      assertTrue(r.diagnostics().gridPoints() > r.diagnostics().initialPoints());
      assertEquals(0, r.diagnostics().unresolvedIntervals());
      // |L| = 1 (closed form): (wn^2 - w^2)^2 + (2 zeta wn w)^2 = wn^4, w = wn sqrt(2(1 - 2 zeta^2))
      assertEquals(1, r.gainCrossovers().size());
      assertEquals(wn * Math.sqrt(2 * (1 - 2 * zeta * zeta)),
          r.gainCrossovers().get(0).omegaRadPerS(), ROOT_TOL * wn);
    }
    assertEquals(ClosedLoopStability.NOT_CHECKED, noSeeds.closedLoopStability());
    assertTrue(seeded.diagnostics().seedPoints() > 0);
  }

  @Test
  void invalidRangesAreRejected() {
    LinearBlock loop = thirdOrder(1);
    assertThrows(InvalidInputException.class, () -> MARGINS.analyse(loop, 0, 10));
    assertThrows(InvalidInputException.class, () -> MARGINS.analyse(loop, 10, 1));
    assertThrows(InvalidInputException.class,
        () -> new MarginOptions(2, 10, 1.5, 1000, 30, 0.3, 8));
  }
}
