package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54Integrator;
import org.flexmargin.loop.StateSpace;
import org.junit.jupiter.api.Test;

/**
 * Exact discretisation against closed-form responses of first- and second-order systems and
 * against Commons Math's Dormand-Prince integrator on a stiff system.
 */
class LinearSimulationTest {
  private static final DoubleUnaryOperator UNIT_STEP = t -> 1.0;

  @Test
  void firstOrderStepResponseIsExact() {
    // closed form: y = 1 - e^{-t/tau} for 1/(tau s + 1) (Ogata, Modern Control Engineering, sec. 5-3).
    // A coarse step (T = tau / 2) still gives the exact samples: the hold is exact for a step.
    double tau = 0.2;
    StateSpace g = StateSpace.fromTransferFunction(new double[] {1}, new double[] {tau, 1});
    TimeHistory h = LinearSimulation.run(g, tau / 2, 40, List.of(UNIT_STEP), null, null);
    double[] t = h.timesS();
    double[] y = h.values()[0];
    for (int k = 0; k < t.length; k++) {
      // tolerance: rounding of the exponential and of 40 state updates
      assertEquals(1 - Math.exp(-t[k] / tau), y[k], 1e-13, "t = " + t[k]);
    }
  }

  @Test
  void secondOrderStepAndImpulseResponsesAreExact() {
    // closed forms for wn^2 / (s^2 + 2 zeta wn s + wn^2), 0 < zeta < 1 (Ogata, Modern Control
    // Engineering, sec. 5-3, eqs. 5-10 and 5-21):
    //   step:    1 - e^{-zeta wn t} (cos wd t + zeta / sqrt(1 - zeta^2) sin wd t)
    //   impulse: wn / sqrt(1 - zeta^2) e^{-zeta wn t} sin wd t,  wd = wn sqrt(1 - zeta^2)
    double wn = 2 * Math.PI * 3.0;
    double zeta = 0.05;
    double wd = wn * Math.sqrt(1 - zeta * zeta);
    StateSpace g = StateSpace.fromTransferFunction(new double[] {wn * wn}, new double[] {1, 2 * zeta * wn, wn * wn});
    double dt = 0.01;
    int steps = 300;
    TimeHistory step = LinearSimulation.run(g, dt, steps, List.of(UNIT_STEP), null, null);
    // impulse response = C e^{A t} B: start from x(0) = B with no input
    double[] b = g.b().data;
    TimeHistory impulse = LinearSimulation.run(g, dt, steps, Collections.singletonList(null), b, null);
    for (int k = 0; k <= steps; k++) {
      double t = k * dt;
      double decay = Math.exp(-zeta * wn * t);
      double yStep = 1 - decay * (Math.cos(wd * t) + zeta / Math.sqrt(1 - zeta * zeta) * Math.sin(wd * t));
      double yImpulse = wn / Math.sqrt(1 - zeta * zeta) * decay * Math.sin(wd * t);
      // tolerance: rounding over 300 updates of a lightly damped mode (peak values ~1 and ~19)
      assertEquals(yStep, step.values()[0][k], 1e-11, "step at t = " + t);
      assertEquals(yImpulse, impulse.values()[0][k], 1e-10, "impulse at t = " + t);
    }
  }

  @Test
  void stiffSystemAgreesWithDormandPrince() {
    // Independent reference: Commons Math's adaptive Dormand-Prince 5(4) at tight tolerances on a
    // stiff system (poles -2000, -1 and -0.5 +/- 20j: stiffness ratio 4000), unit step input.
    double[][] a = {
      {-2000, 0, 0, 0},
      {1, -1, 0, 0},
      {0, 0, -0.5, 20},
      {0, 0, -20, -0.5}
    };
    double[][] bm = {{2000}, {0}, {1}, {0.3}};
    double[][] c = {{1, 1, 2, -1}};
    StateSpace g = StateSpace.of(a, bm, c, new double[][] {{0}});
    double dt = 0.05; // 100 times the fast time constant: only an exact discretisation is stable here
    int steps = 60;
    TimeHistory h = LinearSimulation.run(g, dt, steps, List.of(UNIT_STEP), null, null);
    DormandPrince54Integrator dp = new DormandPrince54Integrator(1e-9, 0.01, 1e-12, 1e-12);
    double[] x = new double[4];
    for (int k = 1; k <= steps; k++) {
      dp.integrate(new org.apache.commons.math3.ode.FirstOrderDifferentialEquations() {
        @Override
        public int getDimension() {
          return 4;
        }

        @Override
        public void computeDerivatives(double t, double[] s, double[] ds) {
          for (int i = 0; i < 4; i++) {
            ds[i] = bm[i][0];
            for (int j = 0; j < 4; j++) {
              ds[i] += a[i][j] * s[j];
            }
          }
        }
      }, (k - 1) * dt, x, k * dt, x);
      double y = 0;
      for (int j = 0; j < 4; j++) {
        y += c[0][j] * x[j];
      }
      // tolerance: the integrator's local tolerance 1e-12 accumulated over ~3000 steps
      assertEquals(y, h.values()[0][k], 1e-8, "t = " + k * dt);
    }
    assertTrue(Math.abs(h.values()[0][steps]) > 0.1, "the response is not trivially zero");
  }
}
