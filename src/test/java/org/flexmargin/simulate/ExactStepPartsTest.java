package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.loop.StateSpace;
import org.junit.jupiter.api.Test;

/**
 * The parts of an exact step: the quadratic-input step against closed-form integrals, the
 * guard's bound on a cubic against its maximum found by calculus, the actuator guard on a lone
 * lag, and the sparse row products against EJML's dense product.
 */
class ExactStepPartsTest {
  @Test
  void quadraticInputStepIntegratesPolynomialInputsExactly() {
    // x' = a x + u(t) over one step T from x0 (derived by integrating e^{a (T - t)} t^j):
    //   u = 1:   x(T) = e^{aT} x0 + (e^{aT} - 1) / a
    //   u = t:   + (e^{aT} - 1 - aT) / a^2
    //   u = t^2: + 2 (e^{aT} - 1 - aT - (aT)^2 / 2) / a^3
    double a = -3.0;
    double period = 0.5;
    double x0 = 0.7;
    double e = Math.exp(a * period);
    double[] c = {0.4, -1.3, 2.2};
    double expected = e * x0 + c[0] * (e - 1) / a + c[1] * (e - 1 - a * period) / (a * a)
        + c[2] * 2 * (e - 1 - a * period - 0.5 * a * a * period * period) / (a * a * a);
    QuadraticInputDiscretization q = QuadraticInputDiscretization.of(new DMatrixRMaj(new double[][] {{a}}),
        new DMatrixRMaj(new double[][] {{1}}), period);
    double[][] u = new double[3][1];
    for (int k = 0; k < 3; k++) {
      double t = QuadraticInputDiscretization.NODES[k] * period;
      u[k][0] = c[0] + c[1] * t + c[2] * t * t;
    }
    double[] next = new double[1];
    q.step(new double[] {x0}, new double[] {u[0][0], u[1][0], u[2][0]}, next);
    // tolerance: rounding of the Pade exponential and of the node combination
    assertEquals(expected, next[0], 1e-14);
  }

  @Test
  void quadraticInputStepKeepsTwoInputsApart() {
    // x' = a x + u1 + 2 u2 with u1 = 1 and u2 = t (closed forms as above):
    //   x(T) = e^{aT} x0 + (e^{aT} - 1) / a + 2 (e^{aT} - 1 - aT) / a^2
    double a = -2.0;
    double period = 0.3;
    double e = Math.exp(a * period);
    double expected = e * 0.2 + (e - 1) / a + 2 * (e - 1 - a * period) / (a * a);
    QuadraticInputDiscretization q = QuadraticInputDiscretization.of(new DMatrixRMaj(new double[][] {{a}}),
        new DMatrixRMaj(new double[][] {{1, 2}}), period);
    double[] u = new double[6];
    for (int k = 0; k < 3; k++) {
      u[2 * k] = 1;
      u[2 * k + 1] = QuadraticInputDiscretization.NODES[k] * period;
    }
    double[] next = new double[1];
    q.step(new double[] {0.2}, u, next);
    // tolerance: rounding of the Pade exponential and of the node combination
    assertEquals(expected, next[0], 1e-14);
    assertThrows(IllegalArgumentException.class, () -> QuadraticInputDiscretization.of(new DMatrixRMaj(1, 1),
        new DMatrixRMaj(1, 1), Double.POSITIVE_INFINITY));
  }

  @Test
  void quadraticFitReproducesItsPolynomialAndSlope() {
    // u(s) = 2 - s + 3 s^2: u(0) = 2, u(1) = 4, u'(0) = -1, u'(1) = 5
    double[] v = new double[3];
    for (int k = 0; k < 3; k++) {
      double s = QuadraticInputDiscretization.NODES[k];
      v[k] = 2 - s + 3 * s * s;
    }
    assertEquals(2, QuadraticInputDiscretization.fitted(v, 0), 1e-14);
    assertEquals(4, QuadraticInputDiscretization.fitted(v, 1), 1e-14);
    assertEquals(-1, QuadraticInputDiscretization.fittedSlope(v, 0), 1e-13);
    assertEquals(5, QuadraticInputDiscretization.fittedSlope(v, 1), 1e-13);
    assertThrows(IllegalArgumentException.class, () -> QuadraticInputDiscretization.of(new DMatrixRMaj(1, 1),
        new DMatrixRMaj(1, 1), 0.0));
  }

  @Test
  void cubicBoundFindsInteriorAndEndMaxima() {
    // p = s (1 - s): p(0) = p(1) = 0, p'(0) = 1, p'(1) = -1, maximum 1/4 at s = 1/2
    assertEquals(0.25, ActuatorGuard.maxAbsCubic(0, 1, 0, -1), 1e-15);
    // p = -s^3 + s: p(1) = 0, p'(0) = 1, p'(1) = -2, maximum 2 / (3 sqrt 3) at s = 1/sqrt 3
    assertEquals(2 / (3 * Math.sqrt(3)), ActuatorGuard.maxAbsCubic(0, 1, 0, -2), 1e-15);
    // p = -2 s^2 + ... : negative interior extreme: p = -s (1 - s) scaled by 3 -> |min| = 3/4
    assertEquals(0.75, ActuatorGuard.maxAbsCubic(0, -3, 0, 3), 1e-15);
    // p = -4 s^3 + 5 s^2 - s: p(0) = p(1) = 0, p'(0) = -1, p'(1) = -3; p' = 0 at s = (10 +/- sqrt 52) / 24,
    // the larger |p| at s = (10 + sqrt 52) / 24 (the second root of p' as the bound writes them)
    double s1 = (10 + Math.sqrt(52)) / 24;
    assertEquals(-4 * s1 * s1 * s1 + 5 * s1 * s1 - s1, ActuatorGuard.maxAbsCubic(0, -1, 0, -3), 1e-15);
    // its mirror -p(1 - s) = -4 s^3 + 7 s^2 - 3 s: p'(0) = -3, p'(1) = -1, the extreme at 1 - s1
    // (the first root)
    double s2 = 1 - s1;
    assertEquals(Math.abs(-4 * s2 * s2 * s2 + 7 * s2 * s2 - 3 * s2), ActuatorGuard.maxAbsCubic(0, -3, 0, -1), 1e-15);
    // p = s^3 + s + 1: p' = 3 s^2 + 1 never vanishes, largest at the end, p(1) = 3
    assertEquals(3, ActuatorGuard.maxAbsCubic(1, 1, 3, 4), 1e-15);
    // monotone p = 1 + 2 s: largest at the end
    assertEquals(3, ActuatorGuard.maxAbsCubic(1, 2, 3, 2), 1e-15);
    // a stationary point outside [0, 1] is ignored: p = s^2 - 3 s on [0, 1] has |p| largest at s = 1
    assertEquals(2, ActuatorGuard.maxAbsCubic(0, -3, -2, -1), 1e-15);
  }

  @Test
  void guardSeesTheLagsRateAndPositionAgainstTheirLimits() {
    // delta' = (u - delta) / tau, tau = 0.05: linear rate (u - delta) / tau
    StateSpace s = StateSpace.of(new double[][] {{-20}}, new double[][] {{20}}, new double[][] {{1}, {0}},
        new double[][] {{0}, {1}});
    LimitedActuatorSystem lag = new LimitedActuatorSystem(s, 0, -1, 20, 0, 1, -1);
    ActuatorGuard guard = ActuatorGuard.of(lag, new ActuatorLimits(10, 1));
    // rate 20 * 0.45 = 9 <= 0.95 * 10; command 0.45 and position 0 inside 0.95
    assertTrue(guard.inside(new double[] {0}, new double[] {0.45}));
    // rate 20 * 0.48 = 9.6 > 9.5
    assertFalse(guard.inside(new double[] {0}, new double[] {0.48}));
    // command 0.96 > 0.95 with a small rate
    assertFalse(guard.inside(new double[] {0.94}, new double[] {0.96}));
    // position 0.96 > 0.95 with the command beside it
    assertFalse(guard.inside(new double[] {0.96}, new double[] {0.94}));
    // over a step: rate slope -20 * rate; from delta 0 at u = 0.45 the rate only falls
    double[] x1 = {0.45 * (1 - Math.exp(-20 * 0.002))};
    assertTrue(guard.insideOver(new double[] {0}, new double[] {0.45}, new double[] {0}, x1, new double[] {0.45},
        new double[] {0}, 0.002));
    // input slopes +100 and -100 1/s at the ends: the rate is 9 at both ends but bulges to about 10
    assertFalse(guard.insideOver(new double[] {0}, new double[] {0.45}, new double[] {100}, new double[] {0},
        new double[] {0.45}, new double[] {-100}, 0.002));
    // a command from the state and the second input: command = x1 + u2, rate 20 (command - x0)
    StateSpace two = StateSpace.of(new double[][] {{-20, 20}, {0, -1}}, new double[][] {{0, 20}, {1, 0}},
        new double[][] {{1, 0}, {0, 1}}, new double[][] {{0, 0}, {0, 1}});
    ActuatorGuard g2 = ActuatorGuard.of(new LimitedActuatorSystem(two, 0, -1, 20, 0, 1, -1),
        new ActuatorLimits(10, 1));
    assertTrue(g2.inside(new double[] {0, 0.25}, new double[] {7, 0.2}), "rate 9");
    assertFalse(g2.inside(new double[] {0, 0.28}, new double[] {0, 0.2}), "rate 9.6");
    assertFalse(g2.inside(new double[] {0, 0}, new double[] {0, 0.96}), "command 0.96 from the input");
    assertFalse(g2.inside(new double[] {0.94, 0.96}, new double[] {0, 0}), "command 0.96 from the state");
    // no finite limit: nothing to guard
    assertTrue(ActuatorGuard.of(lag, new ActuatorLimits(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY))
        .inside(new double[] {50}, new double[] {-50}));
  }

  @Test
  void sparseRowsGiveTheDenseProduct() {
    // Independent reference: EJML's dense matrix-vector product; the sparse rows add the same
    // nonzero terms in the same order, so the sums agree exactly.
    Random rnd = new Random(7);
    DMatrixRMaj m = new DMatrixRMaj(9, 13);
    for (int i = 0; i < m.getNumElements(); i++) {
      m.data[i] = rnd.nextDouble() < 0.3 ? rnd.nextGaussian() : 0.0;
    }
    DMatrixRMaj x = new DMatrixRMaj(13, 1);
    for (int j = 0; j < 13; j++) {
      x.data[j] = rnd.nextGaussian();
    }
    DMatrixRMaj y = new DMatrixRMaj(9, 1);
    CommonOps_DDRM.mult(m, x, y);
    SparseRows s = SparseRows.of(m);
    int nonzero = 0;
    for (double v : m.data) {
      nonzero += v != 0 ? 1 : 0;
    }
    assertEquals(nonzero, s.nonzeros());
    assertEquals(9, s.rows());
    assertEquals(13, s.cols());
    for (int i = 0; i < 9; i++) {
      assertEquals(y.data[i], s.rowTimes(i, x.data, 0), 0.0, "row " + i);
      assertEquals(y.data[i] + 1.5, s.rowTimes(i, x.data, 1.5), 1e-15, "row " + i + " added to 1.5");
    }
  }
}
