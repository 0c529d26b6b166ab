package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The demo drone (invented data) with its actuator limits: without limits the adaptive integrator
 * reproduces the exact discretisation; with a tight rate limit the elevator rate stays within it.
 */
class AircraftLimitsTest {
  private static final AircraftSimulationModel MODEL = DemoPoint.at(0, 50.0).model(LoopClosure.CLOSED);
  /** A 1 deg doublet of 0.1 s pulses at the elevator command: a step-wise input on the grid. */
  private static final DoubleUnaryOperator DOUBLET =
      new InputSignal.Doublet(Math.toRadians(1), 0.1, 0.1)::value;

  @Test
  void withoutLimitsTheIntegratorReproducesTheExactDiscretisation() {
    // Independent reference: Commons Math's Dormand-Prince (tolerances 1e-7 relative, 1e-9
    // absolute) against the matrix-exponential solution on a stiff system (~65 states, Pade and
    // aerodynamic-lag poles to ~1e3 rad/s). The doublet switches on output-grid points, where
    // the held input is exact. Tolerance: 1e-4 of the peak (the integrator's error control
    // accumulated over 1 s).
    double dt = 0.002;
    int steps = 500;
    TimeHistory exact = LinearSimulation.run(MODEL.system(), dt, steps, List.of(DOUBLET, t -> 0.0), null, null);
    LimitedActuatorSimulation.Result dp = LimitedActuatorSimulation.integrated(MODEL.limited(),
        new ActuatorLimits(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY), dt, steps, List.of(DOUBLET, t -> 0.0),
        null);
    for (String name : List.of("sensor_normal_accel_g", AircraftSimulationModel.ELEVATOR,
        AircraftSimulationModel.ELEVATOR_RATE, AircraftSimulationModel.modalOutput("fuselage_bending_2"))) {
      double[] a = exact.channel(name);
      double[] b = dp.history().channel(name);
      double peak = Math.abs(a[exact.peakIndex(name)]);
      for (int k = 0; k <= steps; k++) {
        assertEquals(a[k], b[k], 1e-4 * peak, name + " at " + k * dt + " s");
      }
    }
    assertTrue(dp.diagnostics().smallestStepS() < dt, "the integrator controls its step: " + dp.diagnostics());
  }

  @Test
  void rateLimitHoldsAndCostsResponse() {
    double limit = Math.toRadians(20);
    double dt = 0.002;
    int steps = 500;
    LimitedActuatorSimulation.Result free = LimitedActuatorSimulation.run(MODEL.limited(),
        new ActuatorLimits(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY), dt, steps, List.of(DOUBLET, t -> 0.0),
        null);
    LimitedActuatorSimulation.Result limited = LimitedActuatorSimulation.run(MODEL.limited(),
        new ActuatorLimits(limit, Math.toRadians(0.8)), dt, steps, List.of(DOUBLET, t -> 0.0), null);
    double[] rateFree = free.history().channel(AircraftSimulationModel.ELEVATOR_RATE);
    double[] rate = limited.history().channel(AircraftSimulationModel.ELEVATOR_RATE);
    double[] position = limited.history().channel(AircraftSimulationModel.ELEVATOR);
    double peakFree = 0;
    for (int k = 0; k <= steps; k++) {
      peakFree = Math.max(peakFree, Math.abs(rateFree[k]));
      assertTrue(Math.abs(rate[k]) <= limit * (1 + 1e-9), "rate " + rate[k] + " at " + k * dt);
      assertTrue(Math.abs(position[k]) <= Math.toRadians(0.8) * (1 + 1e-6), "position " + position[k]);
    }
    assertTrue(peakFree > 2 * limit, "the doublet demands more than the limit: " + peakFree);
  }
}
