package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

class BlocksTest {

  private static final double TWO_PI = 2 * Math.PI;

  private static double phaseDeg(SisoFrequencyFunction f, double hz) {
    return Math.toDegrees(f.phaseRad(TWO_PI * hz));
  }

  private static double gainDb(SisoFrequencyFunction f, double hz) {
    return 20 * Math.log10(f.magnitude(TWO_PI * hz));
  }

  /** State-space response of a block as a frequency function (Hessenberg path). */
  private static SisoFrequencyFunction ofStateSpace(LinearBlock b) {
    return new StateSpaceBlock(b.stateSpace());
  }

  @Test
  void notchCentreDepthIsTheDampingRatio() {
    // Closed form (common practice form; docs/validation.md sec. 7): |N(j w_n)| = zeta_z/zeta_p.
    for (double[] z : new double[][] {{0.05, 0.5}, {0.1, 0.5}, {0.02, 0.7}, {0.3, 0.31}}) {
      NotchFilter n = new NotchFilter(15, z[0], z[1]);
      // exact value; double round-off only
      assertEquals(z[0] / z[1], n.magnitude(TWO_PI * 15), 1e-14);
      assertEquals(z[0] / z[1], ofStateSpace(n).magnitude(TWO_PI * 15), 1e-12);
      assertEquals(20 * Math.log10(z[0] / z[1]), n.centreGainDb(), 1e-12);
    }
  }

  @Test
  void notchMatchesTheDerivedStructuralFilterValues() {
    // docs/validation.md sec. 7 [derived]: 15 Hz notch, 0.05/0.5: -20 dB at centre, -3.45 deg at
    // 1 Hz, -10.57 deg at 3 Hz, -12.8 / -13.5 dB at 13.5 / 16.5 Hz. Re-derived independently in
    // Python (cmath) for this test: -3.4474, -10.5748, -12.820, -13.486. Tolerance: half a unit
    // of the last digit quoted in docs/validation.md sec. 7.
    NotchFilter n = new NotchFilter(15, 0.05, 0.5);
    assertEquals(-20.0, gainDb(n, 15), 1e-12);
    assertEquals(-3.45, phaseDeg(n, 1), 0.005);
    assertEquals(-10.57, phaseDeg(n, 3), 0.005);
    assertEquals(-12.8, gainDb(n, 13.5), 0.05);
    assertEquals(-13.5, gainDb(n, 16.5), 0.05);
    // docs/validation.md sec. 7 [derived]: 0.10/0.5 -> -14 dB, -3.06 deg @ 1 Hz;
    // 0.02/0.7 -> -30.9 dB, -5.20 deg @ 1 Hz, -16.4 / -17.2 dB at +-10 %.
    NotchFilter n2 = new NotchFilter(15, 0.10, 0.5);
    assertEquals(-14.0, gainDb(n2, 15), 0.05);
    assertEquals(-3.06, phaseDeg(n2, 1), 0.005);
    NotchFilter n3 = new NotchFilter(15, 0.02, 0.7);
    assertEquals(-30.9, gainDb(n3, 15), 0.05);
    assertEquals(-5.20, phaseDeg(n3, 1), 0.005);
    assertEquals(-16.4, gainDb(n3, 13.5), 0.05);
    assertEquals(-17.2, gainDb(n3, 16.5), 0.05);
  }

  @Test
  void notchFromDepthAndWidthHasHalfDepthAtTheWidthEdges() {
    // Derived (NotchFilter Javadoc): the half-depth frequencies are w(sqrt(g^2+1) -+ g) with
    // g = sqrt(zeta_z zeta_p), separated by 2 w g. Check the factory by measuring the response.
    NotchFilter n = NotchFilter.fromDepthAndWidth(12, 18, 3);
    assertEquals(-18.0, n.centreGainDb(), 1e-12);
    assertEquals(3.0, n.widthHz(), 1e-12);
    double g = Math.sqrt(n.zeroDampingRatio() * n.poleDampingRatio());
    double lo = 12 * (Math.sqrt(g * g + 1) - g);
    double hi = 12 * (Math.sqrt(g * g + 1) + g);
    assertEquals(3.0, hi - lo, 1e-12);
    assertEquals(-9.0, gainDb(n, lo), 1e-10);
    assertEquals(-9.0, gainDb(n, hi), 1e-10);
    // and the 0.05/0.5 notch round-trips
    NotchFilter ref = new NotchFilter(15, 0.05, 0.5);
    NotchFilter back = NotchFilter.fromDepthAndWidth(15, 20, ref.widthHz());
    assertEquals(0.05, back.zeroDampingRatio(), 1e-14);
    assertEquals(0.5, back.poleDampingRatio(), 1e-14);
  }

  @Test
  void padeSecondOrderForTwoSecondsIsTheTextbookRational() {
    // Closed form (docs/validation.md sec. 7): (1 - s tau/2 + s^2 tau^2/12)/(1 + s tau/2 +
    // s^2 tau^2/12); tau = 2 -> (s^2 - 3s + 3)/(s^2 + 3s + 3) [derived].
    assertArrayEquals(new double[] {1, 0.5, 1.0 / 12}, PadeOrder.ORDER_2.coefficients(), 1e-15);
    // c_k for n = 1: 1, 1/2 (first-order Pade (1 - s tau/2)/(1 + s tau/2)).
    assertArrayEquals(new double[] {1, 0.5}, PadeOrder.ORDER_1.coefficients(), 1e-15);
    SisoFrequencyFunction pade = ofStateSpace(new PureDelay(2, PadeOrder.ORDER_2));
    TransferFunctionBlock ref = new TransferFunctionBlock(new double[] {1, -3, 3},
        new double[] {1, 3, 3});
    double[] a = new double[2];
    double[] b = new double[2];
    for (double w : new double[] {0, 0.1, 0.5, 1, 1.7, 3, 10, 100}) {
      pade.response(w, a);
      ref.response(w, b);
      assertEquals(b[0], a[0], 1e-13);
      assertEquals(b[1], a[1], 1e-13);
    }
  }

  @Test
  void padeIsAllPassForEveryOrder() {
    // Closed form: P(-x)/P(x) with real P has |.| = 1 on the imaginary axis.
    for (PadeOrder o : PadeOrder.values()) {
      for (double tau : new double[] {0.0125, 0.3, 2}) {
        SisoFrequencyFunction f = ofStateSpace(new PureDelay(tau, o));
        for (double w = 0.01; w < 1e4; w *= 1.7) {
          // companion realisation: round-off grows with order; 1e-9 is still far below any
          // physically meaningful error
          assertEquals(1.0, f.magnitude(w), 1e-9, o + " tau=" + tau + " w=" + w);
        }
      }
    }
  }

  @Test
  void padePhaseErrorMatchesTheDerivedTable() {
    // docs/validation.md sec. 7 [derived]: at w tau = 1 exact -57.30 deg, Pade-1 -53.13,
    // Pade-2 -57.22; at w tau = 2 exact -114.59, Pade-1 -90.00, Pade-2 -112.62.
    // Tolerance: half a unit of the last quoted digit.
    double tau = 0.5;
    PureDelay d1 = new PureDelay(tau, PadeOrder.ORDER_1);
    PureDelay d2 = new PureDelay(tau, PadeOrder.ORDER_2);
    double w1 = 1 / tau;
    double w2 = 2 / tau;
    assertEquals(-57.30, Math.toDegrees(-w1 * tau), 0.005);
    assertEquals(-57.30, Math.toDegrees(d1.phaseRad(w1)), 0.005); // exact response
    assertEquals(-53.13, Math.toDegrees(ofStateSpace(d1).phaseRad(w1)), 0.005);
    assertEquals(-57.22, Math.toDegrees(ofStateSpace(d2).phaseRad(w1)), 0.005);
    assertEquals(-114.59, Math.toDegrees(d2.phaseRad(w2)), 0.005);
    assertEquals(-90.00, Math.toDegrees(ofStateSpace(d1).phaseRad(w2)), 0.005);
    assertEquals(-112.62, Math.toDegrees(ofStateSpace(d2).phaseRad(w2)), 0.005);
    // Order 6 at w tau = 2: Pade error of order (w tau)^13 / ((12)! (13)!) ~ 1e-9 rad
    assertEquals(-2.0, ofStateSpace(new PureDelay(tau, PadeOrder.ORDER_6)).phaseRad(w2), 1e-6);
  }

  @Test
  void zeroOrderHoldPhaseAndDroop() {
    // docs/validation.md sec. 7: ZOH = sinc(fT) e^{-j pi f T} [seen formula]; 80 Hz frame:
    // -2.25 deg at 1 Hz, -11.25 deg at 5 Hz, |ZOH(5 Hz)| = 0.9936 [derived].
    ZeroOrderHold zoh = new ZeroOrderHold(1.0 / 80, PadeOrder.ORDER_2);
    assertEquals(-2.25, phaseDeg(zoh, 1), 1e-12);
    assertEquals(-11.25, phaseDeg(zoh, 5), 1e-12);
    assertEquals(0.9936, zoh.magnitude(TWO_PI * 5), 0.00005);
    // the state space keeps the T/2 phase and the droop: (1 - P(-sT)/P(sT))/(sT) with the
    // order-2 Pade P; error at 1 Hz (wT = 0.079) below 1e-6 deg, at 5 Hz (wT = 0.39) 3.2e-5 in
    // magnitude (grows like (wT)^5; docs/validation.md sec. 13.2)
    assertEquals(-2.25, phaseDeg(ofStateSpace(zoh), 1), 1e-6);
    assertEquals(zoh.magnitude(TWO_PI * 5), ofStateSpace(zoh).magnitude(TWO_PI * 5), 5e-5);
    // 40 Hz: -4.5 deg at 1 Hz (docs/validation.md sec. 7)
    assertEquals(-4.5, phaseDeg(new ZeroOrderHold(1.0 / 40, PadeOrder.ORDER_1), 1), 1e-12);
    // one frame of computational delay at 80 Hz: -4.5 deg at 1 Hz, -22.5 deg at 5 Hz
    PureDelay frame = new PureDelay(1.0 / 80, PadeOrder.ORDER_2);
    assertEquals(-4.5, phaseDeg(frame, 1), 1e-12);
    assertEquals(-22.5, phaseDeg(frame, 5), 1e-12);
    assertEquals(1.0, zoh.magnitude(0), 0.0);
  }

  @Test
  void firstOrderLagPhase() {
    // docs/validation.md sec. 7: first-order actuator tau = 0.05 s: -17.4 deg at 1 Hz, -32.1 deg at
    // 2 Hz (closed form -atan(w tau)); tolerance half a unit of the last digit.
    FirstOrderLag lag = new FirstOrderLag(0.05);
    assertEquals(-17.4, phaseDeg(lag, 1), 0.05);
    assertEquals(-32.1, phaseDeg(lag, 2), 0.05);
    assertEquals(-17.4, phaseDeg(ofStateSpace(lag), 1), 0.05);
    // bandwidth factories: corner at 1/tau
    assertEquals(0.05, FirstOrderLag.ofBandwidthRadPerS(20).timeConstantS(), 1e-15);
    assertEquals(-45.0, phaseDeg(FirstOrderLag.ofBandwidthHz(3.2), 3.2), 1e-12);
  }

  @Test
  void secondOrderBlocksAtTheirNaturalFrequency() {
    // Closed form: w_n^2/(s^2 + 2 zeta w_n s + w_n^2) at w_n equals 1/(2 j zeta): gain
    // 1/(2 zeta), phase -90 deg. Butterworth (zeta = 1/sqrt 2): -3.0103 dB.
    SecondOrderActuator act = new SecondOrderActuator(12, 0.7);
    assertEquals(1 / 1.4, act.magnitude(TWO_PI * 12), 1e-14);
    assertEquals(-90, phaseDeg(act, 12), 1e-12);
    assertEquals(1.0, act.magnitude(0), 0.0);
    SecondOrderLowPass bw = SecondOrderLowPass.butterworth(40);
    assertEquals(-10 * Math.log10(2), gainDb(bw, 40), 1e-12);
    // Butterworth magnitude 1/sqrt(1 + (w/wc)^4) (closed form) at 2 wc
    assertEquals(1 / Math.sqrt(17), bw.magnitude(TWO_PI * 80), 1e-14);
  }

  @Test
  void integratorAndProportionalIntegral() {
    // Closed forms: k/(j w) = -j k/w; kp + ki/(j w).
    Integrator i = new Integrator(4);
    assertEquals(2.0, i.magnitude(2), 1e-15);
    assertEquals(-90, Math.toDegrees(i.phaseRad(2)), 1e-12);
    ProportionalIntegral pi = new ProportionalIntegral(2, 6);
    double[] v = new double[2];
    pi.response(3, v);
    assertEquals(2, v[0], 1e-15);
    assertEquals(-2, v[1], 1e-15);
  }

  @Test
  void everyRationalBlockStateSpaceMatchesItsExactResponse() {
    // Two independent evaluations: direct complex formula vs controllable-canonical state space
    // through the Hessenberg solve. Agreement to round-off (1e-10 relative).
    List<LinearBlock> blocks = List.of(new Gain(-2.5), new Integrator(3),
        new ProportionalIntegral(0.7, 1.9), new FirstOrderLag(0.05),
        new SecondOrderActuator(9, 0.55), new NotchFilter(15, 0.02, 0.7),
        SecondOrderLowPass.butterworth(30), new SecondOrderLowPass(25, 0.3),
        new TransferFunctionBlock(new double[] {2, -1, 7}, new double[] {0.5, 3, 1, 9}));
    double[] a = new double[2];
    double[] b = new double[2];
    for (LinearBlock blk : blocks) {
      SisoFrequencyFunction ss = ofStateSpace(blk);
      for (double w = 0.05; w < 2000; w *= 1.9) {
        blk.response(w, a);
        ss.response(w, b);
        double scale = Math.hypot(a[0], a[1]);
        assertEquals(a[0], b[0], 1e-10 * scale, blk + " w=" + w);
        assertEquals(a[1], b[1], 1e-10 * scale, blk + " w=" + w);
      }
    }
  }

  @Test
  void seriesMultipliesResponsesAndChainsStateSpaces() {
    LinearBlock chain = SeriesBlock.of(new FirstOrderLag(0.05), new NotchFilter(15, 0.05, 0.5),
        new Gain(3));
    assertEquals(3, chain.stateSpace().stateCount());
    for (double hz : new double[] {0.5, 3, 15, 40}) {
      // gains in dB add, phases add (definition of the product)
      double db = gainDb(new FirstOrderLag(0.05), hz) + gainDb(new NotchFilter(15, 0.05, 0.5), hz)
          + 20 * Math.log10(3);
      assertEquals(db, gainDb(chain, hz), 1e-10);
      assertEquals(db, gainDb(ofStateSpace(chain), hz), 1e-9);
      double ph = phaseDeg(new FirstOrderLag(0.05), hz)
          + phaseDeg(new NotchFilter(15, 0.05, 0.5), hz);
      assertEquals(ph, phaseDeg(chain, hz), 1e-9);
    }
  }

  @Test
  void invalidBlocksAreRejected() {
    assertThrows(InvalidInputException.class, () -> new FirstOrderLag(0));
    assertThrows(InvalidInputException.class, () -> new NotchFilter(15, 0.05, 0));
    assertThrows(InvalidInputException.class, () -> new PureDelay(-1, PadeOrder.ORDER_2));
    assertThrows(InvalidInputException.class, () -> new PureDelay(1, null));
    assertThrows(InvalidInputException.class, () -> new ZeroOrderHold(0, PadeOrder.ORDER_1));
    assertThrows(InvalidInputException.class, () -> NotchFilter.fromDepthAndWidth(15, -3, 2));
    assertThrows(InvalidInputException.class, () -> PadeOrder.ofDegree(7));
    assertThrows(InvalidInputException.class, () -> new SeriesBlock(List.of()));
    assertThrows(InvalidInputException.class, () -> new StateSpaceBlock(
        StateSpace.staticGain(1).append(StateSpace.staticGain(2))));
  }
}
