package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The margin frequency grid cannot step over what matters: every phase turn of a long delay and a
 * very narrow resonance that no caller announced. Check values are closed forms derived beside
 * each test (docs/validation.md sec. 13.1).
 */
class MarginGridTest {

  private static final LoopMargins MARGINS = new LoopMargins();

  /** 5 e^{-0.05 s} / s: k/s with a long delay. */
  private static LinearBlock delayedIntegrator() {
    return new Integrator(5).then(new PureDelay(0.05, PadeOrder.ORDER_6));
  }

  @Test
  void everyPhaseTurnOfALongDelayGivesAPhaseCrossover() {
    // Closed form (derived): arg L = -pi/2 - w tau, so the phase crossovers are
    // w_n tau = pi/2 + 2 pi n; with tau = 0.05 s and w <= 1e4 rad/s, w tau <= 500 rad, so
    // n = 0..79: 80 crossovers, |L(j w_n)| = 5 / w_n.
    double tau = 0.05;
    for (SisoFrequencyFunction loop : List.of((SisoFrequencyFunction) delayedIntegrator(),
        withoutSeeds(delayedIntegrator()))) {
      LoopMarginResult r = loop instanceof LinearBlock b ? MARGINS.analyse(b, 1e-2, 1e4)
          : MARGINS.analyse(loop, 1e-2, 1e4, Eigenvalues.none());
      List<PhaseCrossover> pc = r.phaseCrossovers();
      assertEquals(80, pc.size(), "phase crossovers");
      for (int n = 0; n < pc.size(); n++) {
        double w = (Math.PI / 2 + 2 * Math.PI * n) / tau;
        // Brent on ln w to 1e-13: relative 1e-9 leaves room for the phase evaluation
        assertEquals(w, pc.get(n).omegaRadPerS(), 1e-9 * w, "crossover " + n);
        assertEquals(20 * Math.log10(w / 5), pc.get(n).gainMarginDb(), 1e-8, "gain margin " + n);
      }
      assertEquals(0, r.diagnostics().unresolvedIntervals(), "unresolved intervals");
    }
  }

  @Test
  void theGridKeepsTheDelayTurnBelowHalfATurnPerInterval() {
    // A function that only reveals its delay through pureDelayS(): the phase of e^{-j w tau}
    // sampled with steps of w tau >= pi would alias; the grid must place points so that the
    // turn per interval stays below pi. Each phase crossover then lies in its own interval.
    SisoFrequencyFunction delay = withoutSeeds(delayedIntegrator());
    assertEquals(0.05, delay.pureDelayS(), 0.0);
    LoopMarginResult r = MARGINS.analyse(delay, 1e-2, 1e4, Eigenvalues.none());
    assertTrue(r.diagnostics().gridPoints() > 500 / Math.PI, "points " + r.diagnostics());
  }

  @Test
  void aNarrowPoleZeroPairIsFoundWithoutSeeds() {
    // L(s) = k (s^2 + 2 z wz s + wz^2) / (s^2 + 2 z wp s + wp^2), z = 0.001, wz = 1.002 wp,
    // k = 0.72: a structural pole and zero 0.2 % apart on a loop gain of -2.85 dB. On a
    // 40-per-decade grid (5.9 % steps) the whole pair falls between two points, where |L| is
    // within 0.1 dB of k. Closed forms (derived, u = w^2, N = u^2 + p u + a^2,
    // D = u^2 + r u + c^2, a = wz^2, c = wp^2, p = (4 z^2 - 2) a, r = (4 z^2 - 2) c):
    // peak where N'D - N D' = (r - p) u^2 + 2 (c^2 - a^2) u + (p c^2 - a^2 r) = 0, +4.81 dB;
    // gain crossovers where k^2 N - D = (k^2 - 1) u^2 + (k^2 p - r) u + (k^2 a^2 - c^2) = 0.
    double z = 0.001;
    // 7.3 rad/s: not a point of the initial grid (1 rad/s would be)
    double wp = 7.3;
    double wz = 1.002 * wp;
    double k = 0.72;
    TransferFunctionBlock pair = new TransferFunctionBlock(
        new double[] {k, k * 2 * z * wz, k * wz * wz}, new double[] {1, 2 * z * wp, wp * wp});
    double a = wz * wz;
    double c = wp * wp;
    double p = (4 * z * z - 2) * a;
    double r = (4 * z * z - 2) * c;
    double[] peakU = quadraticRoots(r - p, 2 * (c * c - a * a), p * c * c - a * a * r);
    double peakDb = Double.NEGATIVE_INFINITY;
    double peakW = 0;
    for (double u : peakU) {
      double db = 10 * Math.log10(k * k * (u * u + p * u + a * a) / (u * u + r * u + c * c));
      if (u > 0 && db > peakDb) {
        peakDb = db;
        peakW = Math.sqrt(u);
      }
    }
    assertEquals(4.81, peakDb, 0.005, "the case has the intended peak");
    double[] crossU = quadraticRoots(k * k - 1, k * k * p - r, k * k * a * a - c * c);
    for (LoopMarginResult res : List.of(MARGINS.analyse(pair, 0.01, 100),
        MARGINS.analyse((SisoFrequencyFunction) pair, 0.01, 100, Eigenvalues.none()))) {
      // Brent maximisation to 1e-12 in ln w around a peak of relative width 1e-3: 1e-6 dB
      assertEquals(peakDb, res.peakGain().magnitudeDb(), 1e-6, "peak dB");
      assertEquals(peakW, res.peakGain().omegaRadPerS(), 1e-6 * wp, "peak frequency");
      List<GainCrossover> gc = res.gainCrossovers();
      assertEquals(2, gc.size(), "gain crossovers either side of the peak");
      // Brent on ln |L| to 1e-13 in ln w: relative 1e-9
      assertEquals(Math.sqrt(Math.min(crossU[0], crossU[1])), gc.get(0).omegaRadPerS(), 1e-9 * wp);
      assertEquals(Math.sqrt(Math.max(crossU[0], crossU[1])), gc.get(1).omegaRadPerS(), 1e-9 * wp);
    }
  }

  private static double[] quadraticRoots(double qa, double qb, double qc) {
    double disc = Math.sqrt(qb * qb - 4 * qa * qc);
    return new double[] {(-qb + disc) / (2 * qa), (-qb - disc) / (2 * qa)};
  }

  /** The block's response and delay as a plain frequency function (no poles to seed from). */
  private static SisoFrequencyFunction withoutSeeds(LinearBlock block) {
    return new SisoFrequencyFunction() {
      @Override
      public void response(double omegaRadPerS, double[] reIm) {
        block.response(omegaRadPerS, reIm);
      }

      @Override
      public double pureDelayS() {
        return block.pureDelayS();
      }
    };
  }
}
