package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.flexmargin.loop.StateSpace;
import org.junit.jupiter.api.Test;

/**
 * Runs with actuator limits taken by exact steps where the actuator is clear of its limits and by
 * Dormand-Prince elsewhere: against closed forms of a lone first-order actuator, against an
 * independent integrator on a small loop, and against the run integrated throughout.
 */
class ExactActuatorStepsTest {
  private static final double TAU = 0.05;

  /**
   * A lone first-order actuator delta' = (u - delta) / tau. Outputs: delta, the command (= u),
   * the linear rate.
   */
  private static LimitedActuatorSystem lag() {
    StateSpace s = StateSpace.of(new double[][] {{-1 / TAU}}, new double[][] {{1 / TAU}},
        new double[][] {{1}, {0}, {-1 / TAU}}, new double[][] {{0}, {1}, {1 / TAU}});
    return new LimitedActuatorSystem(s, 0, -1, 1 / TAU, 0, 1, 2);
  }

  @Test
  void firstOrderLagClearOfItsLimitsFollowsTheClosedForm() {
    // unit step from t = 0: delta = 1 - e^{-t/tau} (Ogata, Modern Control Engineering, sec.
    // 5-3). The largest rate is 1/tau = 20 1/s, far below the limit of 100: every step exact.
    double dt = 0.002;
    int steps = 300;
    LimitedActuatorSimulation.Result r = LimitedActuatorSimulation.run(lag(), new ActuatorLimits(100, 10), dt,
        steps, List.of(t -> 1.0), null);
    double[] delta = r.history().values()[0];
    for (int k = 0; k <= steps; k++) {
      // tolerance: rounding of the exponential and of 300 updates
      assertEquals(1 - Math.exp(-k * dt / TAU), delta[k], 1e-13, "t = " + k * dt);
    }
    assertEquals(steps, r.diagnostics().exactSteps());
    assertEquals(0, r.diagnostics().acceptedSteps());
    assertTrue(Double.isNaN(r.diagnostics().meanStepS()));
  }

  @Test
  void rateLimitedLagRampsThenRelaxesAsTheClosedFormSays() {
    // delta' = clip((1 - delta) / tau, R) from delta = 0 with R tau < 1: a ramp at R until the
    // linear rate (1 - delta) / tau falls to R, at delta1 = 1 - R tau, t1 = delta1 / R; then the
    // lag from there: delta = 1 - R tau e^{-(t - t1)/tau} (derived: both pieces solve the
    // equation and meet with equal value and rate at t1).
    double rate = 5.0;
    double t1 = (1 - rate * TAU) / rate;
    double dt = 0.002;
    int steps = 300;
    LimitedActuatorSimulation.Result r = LimitedActuatorSimulation.run(lag(), new ActuatorLimits(rate, 10), dt,
        steps, List.of(t -> 1.0), null);
    double[] delta = r.history().values()[0];
    double[] achieved = r.history().values()[2];
    for (int k = 0; k <= steps; k++) {
      double t = k * dt;
      double expected = t <= t1 ? rate * t : 1 - rate * TAU * Math.exp(-(t - t1) / TAU);
      // tolerance: Dormand-Prince at 1e-7 relative / 1e-9 absolute per step over the ramp and
      // the kink at t1 (about 80 steps), carried on exactly afterwards
      assertEquals(expected, delta[k], 2e-7, "position at t = " + t);
      double expectedRate = t <= t1 ? rate : rate * Math.exp(-(t - t1) / TAU);
      assertEquals(expectedRate, achieved[k], 1e-5 * rate, "rate at t = " + t);
    }
    assertTrue(r.diagnostics().acceptedSteps() > 0, "the ramp is integrated: " + r.diagnostics());
    assertTrue(r.diagnostics().exactSteps() > steps / 2, "the relaxation is stepped exactly: " + r.diagnostics());
  }

  @Test
  void smallLoopAgreesWithAnEighthOrderReferenceForBothActuatorOrders() {
    for (int order = 1; order <= 2; order++) {
      SmallLoop loop = new SmallLoop(order);
      double dt = 0.002;
      int steps = 600;
      DoubleUnaryOperator pulse = new InputSignal.OneMinusCosineGust(1.0, 0.03, 1.0, 0.05)::value;
      ActuatorLimits limits = new ActuatorLimits(SmallLoop.RATE, SmallLoop.POSITION);
      LimitedActuatorSimulation.Result r = LimitedActuatorSimulation.run(loop.spec(), limits, dt, steps,
          List.of(pulse), null);
      double[][] reference = loop.reference(pulse, dt, steps);
      TimeHistory integrated = LimitedActuatorSimulation.integrated(loop.spec(), limits, dt, steps, List.of(pulse),
          null).history();
      TimeHistory h = r.history();
      double peakRate = 0;
      double[] rate = h.channel("y3");
      for (int k = 0; k <= steps; k++) {
        // tolerance 5e-5 (positions up to about 0.3): Dormand-Prince 5(4) at 1e-7 per step
        // accumulates about 1e-5 over the few hundred steps spent at the limits (the run
        // integrated throughout is 1.3e-5 off the reference, second-order actuator); the
        // reference is Commons Math's 8(5,3) at 1e-12
        for (int ch = 0; ch < 2; ch++) {
          String name = ch == 0 ? "y1" : "y2";
          String what = "order " + order + ": " + name + " at " + k * dt;
          assertEquals(reference[ch][k], h.channel(name)[k], 5e-5, what + " against the reference");
          assertEquals(integrated.channel(name)[k], h.channel(name)[k], 5e-5, what + " against the integrated run");
        }
        peakRate = Math.max(peakRate, Math.abs(rate[k]));
      }
      assertEquals(SmallLoop.RATE, peakRate, 1e-9, "order " + order + ": the rate limit is reached");
      assertTrue(r.diagnostics().exactSteps() > steps / 4, "order " + order + ": " + r.diagnostics());
    }
  }

  @Test
  void demoDoubletMatchesTheRunIntegratedThroughout() {
    // The demo drone at V0max (100 m/s EAS, about 63 states) with the case's limits (60 deg/s,
    // 20 deg) and the report's doublet: the exact-step route against Dormand-Prince throughout.
    // Tolerance: 1e-4 of each channel's peak, the integrated run's own error against a
    // 1e-10-tolerance run (about 3e-5 found, in the rate at the limit's switches).
    AircraftSimulationModel model = DemoPoint.FULL_PAYLOAD_V0MAX.model(LoopClosure.CLOSED);
    ActuatorLimits limits = new ActuatorLimits(Math.toRadians(60), Math.toRadians(20));
    List<DoubleUnaryOperator> in = List.of(new InputSignal.Doublet(Math.toRadians(1), 0.1, 0.5)::value, t -> 0.0);
    double dt = 0.002;
    int steps = 1500;
    LimitedActuatorSimulation.Result fast = LimitedActuatorSimulation.run(model.limited(), limits, dt, steps, in, null);
    LimitedActuatorSimulation.Result slow = LimitedActuatorSimulation.integrated(model.limited(), limits, dt, steps, in,
        null);
    for (String name : List.of("sensor_normal_accel_g", AircraftSimulationModel.ELEVATOR,
        AircraftSimulationModel.ELEVATOR_RATE, AircraftSimulationModel.PITCH_RATE,
        AircraftSimulationModel.modalOutput("fuselage_bending_2"))) {
      double[] a = slow.history().channel(name);
      double[] b = fast.history().channel(name);
      double peak = Math.abs(a[slow.history().peakIndex(name)]);
      for (int k = 0; k <= steps; k++) {
        assertEquals(a[k], b[k], 1e-4 * peak, name + " at " + k * dt + " s");
      }
    }
    assertEquals(Math.toRadians(60), Math.abs(fast.history().channel(AircraftSimulationModel.ELEVATOR_RATE)[
        fast.history().peakIndex(AircraftSimulationModel.ELEVATOR_RATE)]), 1e-12, "the doublet reaches the limit");
    assertTrue(fast.diagnostics().exactSteps() > 0.9 * steps, "most steps exact: " + fast.diagnostics());
    assertTrue(fast.diagnostics().evaluations() < slow.diagnostics().evaluations() / 5,
        fast.diagnostics() + " against " + slow.diagnostics());
  }

  @Test
  void aStepTooLongForTheGuardIsIntegratedThroughout() {
    // (rho T)^4 / 384 > 0.025 when rho T > 1.76: the lag's rho = 20 1/s with T = 0.1 s gives 2
    LimitedActuatorSimulation.Prepared p = LimitedActuatorSimulation.prepare(lag(), new ActuatorLimits(100, 10), 0.1);
    assertTrue(!p.exactSteps());
    LimitedActuatorSimulation.Result r = LimitedActuatorSimulation.run(p, 10, List.of(t -> 1.0), null);
    assertEquals(0, r.diagnostics().exactSteps());
    for (int k = 0; k <= 10; k++) {
      // tolerance: Dormand-Prince at 1e-7 / 1e-9 per step, 1 s
      assertEquals(1 - Math.exp(-k * 0.1 / TAU), r.history().values()[0][k], 1e-6);
    }
    assertTrue(LimitedActuatorSimulation.prepare(lag(), new ActuatorLimits(100, 10), 0.08).exactSteps(),
        "rho T = 1.6 is resolved");
  }

  /**
   * A lightly damped plant p'' = -wp^2 p - 2 zeta wp p' + wp^2 delta under rate feedback,
   * command = u - 0.5 p', through a first-order (w) or second-order (w, 0.6) actuator with rate
   * and position limits. States: p, p', delta (, delta'). Outputs: delta, p, the linear rate, the
   * command.
   */
  private record SmallLoop(int order) {
    static final double WP = 12.0;
    static final double ZP = 0.1;
    static final double W = 40.0;
    static final double ZA = 0.6;
    static final double RATE = 6.0;
    static final double POSITION = 0.8;
    static final double K = 0.5;

    LimitedActuatorSystem spec() {
      if (order == 1) {
        double[][] a = {{0, 1, 0}, {-WP * WP, -2 * ZP * WP, WP * WP}, {0, -W * K, -W}};
        double[][] b = {{0}, {0}, {W}};
        double[][] c = {{0, 0, 1}, {1, 0, 0}, {0, -W * K, -W}, {0, -K, 0}};
        double[][] d = {{0}, {0}, {W}, {1}};
        return new LimitedActuatorSystem(StateSpace.of(a, b, c, d), 2, -1, W, 0, 3, 2);
      }
      double[][] a = {{0, 1, 0, 0}, {-WP * WP, -2 * ZP * WP, WP * WP, 0}, {0, 0, 0, 1},
        {0, -W * W * K, -W * W, -2 * ZA * W}};
      double[][] b = {{0}, {0}, {0}, {W * W}};
      double[][] c = {{0, 0, 1, 0}, {1, 0, 0, 0}, {0, 0, 0, 1}, {0, -K, 0, 0}};
      double[][] d = {{0}, {0}, {0}, {1}};
      return new LimitedActuatorSystem(StateSpace.of(a, b, c, d), 2, 3, W, ZA, 3, 2);
    }

    /**
     * The same equations written out and integrated by Commons Math's Dormand-Prince 8(5,3) at
     * 1e-12, stopping on every output time.
     *
     * @return {delta, p} on the output grid
     */
    double[][] reference(DoubleUnaryOperator u, double dt, int steps) {
      FirstOrderDifferentialEquations f = new FirstOrderDifferentialEquations() {
        @Override
        public int getDimension() {
          return order + 2;
        }

        @Override
        public void computeDerivatives(double t, double[] x, double[] dx) {
          double delta = Math.max(-POSITION, Math.min(POSITION, x[2]));
          double command = Math.max(-POSITION, Math.min(POSITION, u.applyAsDouble(t) - K * x[1]));
          dx[0] = x[1];
          dx[1] = -WP * WP * x[0] - 2 * ZP * WP * x[1] + WP * WP * delta;
          double rate;
          if (order == 1) {
            rate = Math.max(-RATE, Math.min(RATE, W * (command - delta)));
          } else {
            double acc = W * W * (command - delta) - 2 * ZA * W * x[3];
            boolean held = (x[3] >= RATE && acc > 0) || (x[3] <= -RATE && acc < 0);
            dx[3] = held ? 0 : acc;
            rate = Math.max(-RATE, Math.min(RATE, x[3]));
          }
          boolean stopped = (delta >= POSITION && rate > 0) || (delta <= -POSITION && rate < 0);
          dx[2] = stopped ? 0 : rate;
        }
      };
      DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14, dt, 1e-14, 1e-12);
      double[] x = new double[order + 2];
      double[][] out = new double[2][steps + 1];
      for (int k = 0; k <= steps; k++) {
        out[0][k] = Math.max(-POSITION, Math.min(POSITION, x[2]));
        out[1][k] = x[0];
        if (k < steps) {
          integrator.integrate(f, k * dt, x, (k + 1) * dt, x);
        }
      }
      return out;
    }
  }
}
