package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.model.Coefficients;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.MeasuredTable;
import org.flexmargin.model.OpenLoopData;
import org.junit.jupiter.api.Test;

/**
 * Margins of textbook loops given in each form of a loop file, with and without delay, and of a
 * measured table sampled from a known transfer function (docs/validation.md, "Loops from a
 * file").
 */
class LoopFormsMarginsTest {
  private static final LoopMargins MARGINS = new LoopMargins();

  private static LoopFile file(OpenLoopData d, double delayS, double lo, double hi) {
    return new LoopFile("t", "", d, delayS, 0, lo, hi, List.of(), Double.NaN, 0, null, List.of(), List.of());
  }

  private static LoopMarginResult margins(LoopFile f) {
    return MARGINS.analyse(OpenLoops.modelLoop(f, PadeOrder.ofDegree(4)), 2 * Math.PI * f.minFrequencyHz(),
        2 * Math.PI * f.maxFrequencyHz());
  }

  /**
   * K/(s(s+1)(s+2)): phase crossover at sqrt(2) rad/s, gain margin 20 log10(6/K) (closed form: the
   * Routh limit K = 6). The same loop as a transfer function, as zeros/poles/gain and as a state
   * space in controllable form. Tolerance 1e-9 dB / rad/s: Brent's method at 1e-14 in ln w.
   */
  @Test
  void typeOneThirdOrderLoopInEveryForm() {
    double k = 2;
    List<OpenLoopData> forms = List.of(
        new OpenLoopData.TransferFunction(new Coefficients(new double[] {k}, new double[] {1, 3, 2, 0})),
        new OpenLoopData.ZerosPolesGain(new double[0], new double[0], new double[] {0, -1, -2},
            new double[] {0, 0, 0}, k),
        new OpenLoopData.StateSpaceModel(new double[][] {{0, 1, 0}, {0, 0, 1}, {0, -2, -3}},
            new double[] {0, 0, 1}, new double[] {k, 0, 0}, 0));
    for (OpenLoopData d : forms) {
      LoopMarginResult r = margins(file(d, 0, 0.001, 10));
      PhaseCrossover pc = r.governingGainIncreaseMargin().orElseThrow();
      assertEquals(Math.sqrt(2), pc.omegaRadPerS(), 1e-9, d.key());
      assertEquals(20 * Math.log10(6 / k), pc.gainMarginDb(), 1e-9, d.key());
      assertEquals(ClosedLoopStability.STABLE, r.closedLoopStability(), d.key());
    }
  }

  /**
   * Ogata, Modern Control Engineering (4th ed., frequency-response examples; from memory):
   * G(s) = 10/(s(s+1)(s+5)) has gain margin 9.54 dB (Routh limit K = 30, so 20 log10 3) and phase
   * margin about 25.4 deg at about 1.23 rad/s. The phase margin is also checked against an
   * independent solve of |G(j w)| = 1 by bisection here (25.3898 deg at 1.22706 rad/s).
   * Tolerances: 1e-9 dB for the closed form, 0.05 deg for the recalled value's digits, 1e-6 deg
   * against the bisection.
   */
  @Test
  void ogataThirdOrderExample() {
    LoopFile f = file(new OpenLoopData.ZerosPolesGain(new double[0], new double[0], new double[] {0, -1, -5},
        new double[3], 10), 0, 0.001, 10);
    LoopMarginResult r = margins(f);
    assertEquals(20 * Math.log10(3), r.governingGainIncreaseMargin().orElseThrow().gainMarginDb(), 1e-9);
    GainCrossover gc = r.governingPhaseMargin().orElseThrow();
    assertEquals(25.4, gc.phaseMarginDeg(), 0.05);
    double lo = 0.1;
    double hi = 10;
    for (int i = 0; i < 200; i++) {
      double m = 0.5 * (lo + hi);
      double mag = 10 / (m * Math.hypot(m, 1) * Math.hypot(m, 5));
      if (mag > 1) {
        lo = m;
      } else {
        hi = m;
      }
    }
    double pm = 180 - 90 - Math.toDegrees(Math.atan(lo) + Math.atan(lo / 5));
    assertEquals(lo, gc.omegaRadPerS(), 1e-9);
    assertEquals(pm, gc.phaseMarginDeg(), 1e-6);
  }

  /**
   * K e^{-s tau}/s: crossover at w = K, phase margin 90 deg - K tau (rad to deg), delay margin
   * pi/(2K) - tau (closed form). K = 2, tau = 0.2 s: PM = 90 - 22.918 = 67.082 deg. Tolerance
   * 1e-9.
   */
  @Test
  void integratorWithDelay() {
    double k = 2;
    double tau = 0.2;
    LoopMarginResult r = margins(file(new OpenLoopData.TransferFunction(new Coefficients(new double[] {k}, new double[] {1, 0})), tau,
        0.01, 10));
    GainCrossover gc = r.governingPhaseMargin().orElseThrow();
    assertEquals(k, gc.omegaRadPerS(), 1e-9);
    assertEquals(90 - Math.toDegrees(k * tau), gc.phaseMarginDeg(), 1e-9);
    assertEquals(Math.PI / (2 * k) - tau, r.delayMarginS().orElseThrow(), 1e-9);
    // and without the delay: 90 deg
    LoopMarginResult r0 = margins(file(new OpenLoopData.TransferFunction(new Coefficients(new double[] {k}, new double[] {1, 0})), 0,
        0.01, 10));
    assertEquals(90, r0.governingPhaseMargin().orElseThrow().phaseMarginDeg(), 1e-9);
  }

  /**
   * A measured table made by sampling K/(s(s+1)(s+2)) at 200 points per decade gives the
   * transfer function's margins to the interpolation error: linear interpolation in ln f of dB
   * and phase errs by at most h^2/8 max|y''| with h = ln(10)/200 = 0.0115 (1.7e-5 h-units); the
   * gain and phase curvatures of this loop near the crossovers are below 20 dB and 60 deg per
   * unit ln w squared, so the margins agree within 1e-3 dB and 3e-3 deg (bounds stated with
   * margin: 3.3e-4 dB, 1e-3 deg) and the crossover frequencies within 1e-3 relative.
   */
  @Test
  void sampledTableReproducesTheTransferFunctionMargins() {
    double k = 2;
    TransferFunctionBlock tf = new TransferFunctionBlock(new double[] {k}, new double[] {1, 3, 2, 0});
    int n = 4 * 200 + 1;
    double[] f = new double[n];
    for (int i = 0; i < n; i++) {
      f[i] = 0.001 * Math.pow(10, i / 200.0);
    }
    MeasuredResponse m = MeasuredResponse.sample(tf, f);
    MeasuredTable table = new MeasuredTable("sampled", m.frequencyHz(), m.gainDb(), m.phaseDeg());
    LoopFile lf = file(new OpenLoopData.Measured(table), 0, 0.001, 10);
    LoopMarginResult fromTable = MARGINS.analyse(OpenLoops.measuredLoop(lf, PadeOrder.ofDegree(2)),
        2 * Math.PI * 0.001, 2 * Math.PI * 10, Eigenvalues.none());
    LoopMarginResult exact = margins(file(new OpenLoopData.TransferFunction(new Coefficients(new double[] {k}, new double[] {1, 3, 2, 0})), 0, 0.001, 10));
    PhaseCrossover a = fromTable.governingGainIncreaseMargin().orElseThrow();
    PhaseCrossover b = exact.governingGainIncreaseMargin().orElseThrow();
    assertEquals(b.gainMarginDb(), a.gainMarginDb(), 1e-3);
    assertEquals(b.omegaRadPerS(), a.omegaRadPerS(), 1e-3 * b.omegaRadPerS());
    GainCrossover c = fromTable.governingPhaseMargin().orElseThrow();
    GainCrossover d = exact.governingPhaseMargin().orElseThrow();
    assertEquals(d.phaseMarginDeg(), c.phaseMarginDeg(), 3e-3);
    assertEquals(d.omegaRadPerS(), c.omegaRadPerS(), 1e-3 * d.omegaRadPerS());
    assertEquals(ClosedLoopStability.NOT_CHECKED, fromTable.closedLoopStability());
  }

  /** Wrapped phases in a table are unwrapped; outside the table the response is not known. */
  @Test
  void tablePhaseIsUnwrappedAndNotExtrapolated() {
    MeasuredResponse m = new MeasuredResponse(new MeasuredTable("t", new double[] {1, 2, 3},
        new double[] {0, -1, -2}, new double[] {-170, 175, 160}));
    assertEquals(-185, m.phaseDeg()[1], 1e-12);
    assertEquals(-200, m.phaseDeg()[2], 1e-12);
    double[] v = new double[2];
    m.response(2 * Math.PI * 0.5, v);
    assertTrue(Double.isNaN(v[0]));
    m.response(2 * Math.PI * 1.5, v);
    double ph = Math.toDegrees(Math.atan2(v[1], v[0]));
    double t = Math.log(1.5) / Math.log(2);
    assertEquals(-170 - 15 * t, ph, 1e-9);
  }
}
