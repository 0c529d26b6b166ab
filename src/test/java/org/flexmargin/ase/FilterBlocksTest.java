package org.flexmargin.ase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.Coefficients;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.junit.jupiter.api.Test;

/** The general filters of a path against closed forms (docs/validation.md, "General filters"). */
class FilterBlocksTest {
  private static double[] at(LinearBlock b, double hz) {
    double[] v = new double[2];
    b.response(2 * Math.PI * hz, v);
    return new double[] {20 * Math.log10(Math.hypot(v[0], v[1])), Math.toDegrees(Math.atan2(v[1], v[0]))};
  }

  /**
   * Lead-lag with zero 2 Hz and pole 8 Hz: the largest lead asin((p - z)/(p + z)) = asin(0.6) =
   * 36.870 deg at the geometric mean sqrt(2 x 8) = 4 Hz, unit gain at zero frequency and 20 log10(8/2)
   * = 12.04 dB at high frequency (closed forms of the first-order lead, e.g. Franklin, Powell &amp;
   * Emami-Naeini, Feedback Control of Dynamic Systems, lead compensation; from memory). Tolerance
   * 1e-9 (double rounding), 1e-3 dB for the high-frequency asymptote evaluated at 1e5 x the pole.
   */
  @Test
  void leadLagHasItsClosedFormMaximumLead() {
    LinearBlock b = FlightControlLaw.filter(new FilterSpec.LeadLag(2, 8));
    assertEquals(Math.toDegrees(Math.asin(0.6)), at(b, 4)[1], 1e-9);
    assertEquals(0, at(b, 1e-6)[0], 1e-9);
    assertEquals(20 * Math.log10(4), at(b, 8e5)[0], 1e-3);
  }

  /** Washout tau s/(tau s + 1): -3.0103 dB and +45 deg at 1/(2 pi tau) (closed form). */
  @Test
  void washoutCornerIsAtOneOverTau() {
    double tau = 2.0;
    double[] g = at(FlightControlLaw.filter(new FilterSpec.Washout(tau)), 1 / (2 * Math.PI * tau));
    assertEquals(-10 * Math.log10(2), g[0], 1e-9);
    assertEquals(45, g[1], 1e-9);
  }

  /**
   * A second-order section with equal frequencies is a notch: depth 20 log10(zeta_n/zeta_d) at
   * the centre with zero phase; with unequal frequencies the high-frequency gain is (f_d/f_n)^2.
   */
  @Test
  void secondOrderSectionIsANotchOrASkewedNotch() {
    double[] c = at(FlightControlLaw.filter(new FilterSpec.SecondOrder(12, 0.05, 12, 0.5)), 12);
    assertEquals(-20, c[0], 1e-9);
    assertEquals(0, c[1], 1e-9);
    double[] hf = at(FlightControlLaw.filter(new FilterSpec.SecondOrder(10, 0.1, 20, 0.7)), 1e6);
    assertEquals(20 * Math.log10(4), hf[0], 1e-5);
  }

  /**
   * A digital filter in a path runs at the loop's sample period; a continuous loop refuses it.
   * The one-step average (1 + z^-1)/2 has gain cos(w T/2) and phase -w T/2 (closed form).
   */
  @Test
  void discreteFilterUsesTheLoopSamplePeriod() {
    FilterSpec avg = new FilterSpec.Discrete(new Coefficients(new double[] {0.5, 0.5}, new double[] {1}));
    double t = 0.01;
    double[] g = at(FlightControlLaw.filter(avg, t), 10);
    double x = 2 * Math.PI * 10 * t / 2;
    assertEquals(20 * Math.log10(Math.cos(x)), g[0], 1e-12);
    assertEquals(-Math.toDegrees(x), g[1], 1e-12);
    ActuatorSpec act = new ActuatorSpec(ActuatorOrder.FIRST, 10, 0);
    List<SensorSpec> sensors = List.of(new SensorSpec("q", SensorKind.PITCH_RATE_GYRO, "nose", 0, 0));
    List<FeedbackPath> paths = List.of(new FeedbackPath("q", 0.3, 0, List.of(avg), null));
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> new LoopSpec(act, sensors, paths, 0, 0, 2));
    assertEquals("paths[0].filters[0].discrete", e.fieldPath());
    assertEquals(1, new LoopSpec(act, sensors, paths, 0, t, 2).paths().get(0).filters().size());
  }
}
