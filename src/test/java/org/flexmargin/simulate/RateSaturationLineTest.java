package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import java.nio.file.Path;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.sweep.RateSaturation;
import org.flexmargin.sweep.ServoMargins;
import org.flexmargin.sweep.ServoPoint;
import org.junit.jupiter.api.Test;

/**
 * The per-point rate-saturation line against the time-domain simulation of the same point, and
 * against the closed form of the actuator alone. The demo drone (invented data), empty
 * configuration at V0max = 100 m/s EAS, where the closed loop is stable and a structural phase
 * crossover lies close to -1.
 */
class RateSaturationLineTest {
  /** Rate limit of the demo actuator (deg/s). */
  private static final double RATE_DEG_S = 60;

  @Test
  void secondOrderActuatorAloneMatchesTheClosedForm() {
    // derived: for w^2 / (s^2 + 2 zeta w s + w^2) at s = j w the gain is 1 / (2 zeta), so the rate
    // limit R is reached at A = R 2 zeta / w. Exact to rounding.
    ActuatorSpec a = new ActuatorSpec(ActuatorOrder.SECOND, 12, 0.7, Math.toRadians(RATE_DEG_S), 1);
    var forward = new org.flexmargin.loop.SecondOrderActuator(12, 0.7);
    double w = 2 * Math.PI * 12;
    double[] v = new double[2];
    forward.response(w, v);
    assertEquals(1 / 1.4, Math.hypot(v[0], v[1]), 1e-12);
    assertEquals(Math.toRadians(RATE_DEG_S) * 1.4 / w, a.rateLimitRadPerS() / (w * Math.hypot(v[0], v[1])), 1e-15);
  }

  @Test
  void predictedAmplitudesReachTheRateLimitInSimulation() {
    SimulationPoint point = DemoPoint.at(1, 100.0);
    AircraftSimulationModel closed = point.model(LoopClosure.CLOSED);
    assertTrue(closed.system().eigenvalues().maxRealPart() < 0, "the point must be closed-loop stable");
    LoopMarginResult margins = ServoMargins.withDefaults().at(point.servo(), closed.system().eigenvalues(), 50);
    ServoPoint sp = new ServoPoint(0, point.condition(), margins, List.of(), List.of());
    ActuatorSpec actuator = new ActuatorSpec(ActuatorOrder.SECOND, 12, 0.7, Math.toRadians(RATE_DEG_S), 1);
    double firstModeHz = ConfigurationModel.of(CaseReader.read(Path.of("mode-tables/demo/demo-case.json"))
        .configurations().get(1)).modes().modes().stream().mapToDouble(ElasticMode::frequencyHz).min().orElseThrow();
    Optional<RateSaturation.Line> line = RateSaturation.at(sp, firstModeHz, null, point.servo().forward(), actuator,
        true);
    RateSaturation.Line l = line.orElseThrow();
    double rate = Math.toRadians(RATE_DEG_S);

    // Broken loop: the elevator follows the command through hold, delay (Pade in the simulation)
    // and actuator. Tolerance 1.5 %: the Pade hold and delay against their exact responses (0.6 %
    // found) and the mid-step hold of the sinusoid (0.07 % at 50 steps per cycle).
    double openRate = steadyRateAmplitude(point.model(LoopClosure.OPEN), l.frequencyHz(), l.commandAmplitudeRad());
    assertEquals(rate, openRate, 0.02 * rate, "loop open");

    // Closed loop: the injection amplitude reaches the limit. Tolerance 10 %: near the critical
    // point the closed loop amplifies by 1 / |1 + L| (about 9 here), so the sub-percent
    // differences of the Roger fit and the Pade delay against the exact loop grow ninefold (4 %
    // found).
    double closedRate = steadyRateAmplitude(closed, l.frequencyHz(), l.closedLoopInjectionAmplitudeRad());
    assertEquals(rate, closedRate, 0.10 * rate, "loop closed");
  }

  /** Steady elevator-rate amplitude under a sinusoid at the elevator command (linear, exact). */
  static double steadyRateAmplitude(AircraftSimulationModel model, double hz, double amplitude) {
    double w = 2 * Math.PI * hz;
    double dt = 1 / (50 * hz);
    int steps = (int) Math.ceil(14.0 / dt);
    DoubleUnaryOperator in = t -> amplitude * Math.sin(w * t);
    TimeHistory h = LinearSimulation.run(model.system(), dt, steps, List.of(in, t -> 0.0), null, null);
    double[] r = h.channel(AircraftSimulationModel.ELEVATOR_RATE);
    double max = 0;
    for (int k = steps - (int) (1.0 / dt); k <= steps; k++) {
      max = Math.max(max, Math.abs(r[k]));
    }
    return max;
  }
}
