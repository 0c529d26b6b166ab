package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * The indicial lift filters against the published two-term approximations, written out here:
 * Wagner's function after R. T. Jones, phi(s) = 1 - 0.165 e^{-0.0455 s} - 0.335 e^{-0.3 s}, and
 * Küssner's function after Sears, psi(s) = 1 - 0.5 e^{-0.13 s} - 0.5 e^{-s} (Bisplinghoff,
 * Ashley &amp; Halfman, Aeroelasticity, 1955, ch. 5; Fung, An Introduction to the Theory of
 * Aeroelasticity, ch. 6; from memory). s = V t / b.
 */
class IndicialLiftTest {
  private static final double V = 120;
  private static final double B = 0.8;

  static double jonesWagner(double s) {
    return 1 - 0.165 * Math.exp(-0.0455 * s) - 0.335 * Math.exp(-0.3 * s);
  }

  static double searsKussner(double s) {
    return 1 - 0.5 * Math.exp(-0.13 * s) - 0.5 * Math.exp(-s);
  }

  @Test
  void stepResponsesAreThePublishedApproximations() {
    // The filters' responses to a unit step, by exact discretisation (no truncation error: the step
    // changes on the grid). Step dt = 0.25 b / V, so sample k is at s = k / 4. Tolerance 1e-12:
    // round-off of a few hundred products of 2 x 2 matrices.
    double dt = 0.25 * B / V;
    int steps = 4 * 400;
    for (int k : new int[] {0, 1, 4, 10, 40, 100, 400, 1000, 1600}) {
      double s = k / 4.0;
      assertEquals(jonesWagner(s), step(IndicialLift.WAGNER, dt, steps)[k], 1e-12, "Wagner at s = " + s);
      assertEquals(searsKussner(s), step(IndicialLift.KUSSNER, dt, steps)[k], 1e-12, "Kuessner at s = " + s);
    }
  }

  @Test
  void stepResponsesTendToOne() {
    // At s = 1000 the slowest term, 0.165 e^{-45.5}, is 2.9e-21: the response is 1 to round-off.
    double dt = 10 * B / V;
    assertEquals(1.0, step(IndicialLift.WAGNER, dt, 100)[100], 1e-12);
    assertEquals(1.0, step(IndicialLift.KUSSNER, dt, 100)[100], 1e-12);
  }

  @Test
  void valuesAndInitialShares() {
    for (double s : new double[] {0, 0.5, 3, 17, 250}) {
      assertEquals(jonesWagner(s), IndicialLift.WAGNER.value(s), 1e-15);
      assertEquals(searsKussner(s), IndicialLift.KUSSNER.value(s), 1e-15);
    }
    // phi(0) = 1 - 0.165 - 0.335 = 0.5 (half the lift at once); psi(0) = 0 (the gust lift starts from nothing)
    assertEquals(0.5, IndicialLift.WAGNER.initialValue(), 1e-15);
    assertEquals(0.0, IndicialLift.KUSSNER.initialValue(), 1e-15);
  }

  @Test
  void invalidFunctionsAndArgumentsAreRefused() {
    assertThrows(InvalidInputException.class, () -> new IndicialLift(" ", 0.1, 1, 0.1, 1));
    assertThrows(InvalidInputException.class, () -> new IndicialLift(null, 0.1, 1, 0.1, 1));
    assertThrows(InvalidInputException.class, () -> new IndicialLift("x", -0.1, 1, 0.1, 1));
    assertThrows(InvalidInputException.class, () -> new IndicialLift("x", 0.1, 1, -0.1, 1));
    assertThrows(InvalidInputException.class, () -> new IndicialLift("x", 0.6, 1, 0.5, 1));
    assertThrows(InvalidInputException.class, () -> new IndicialLift("x", 0.1, 0, 0.1, 1));
    assertThrows(InvalidInputException.class, () -> new IndicialLift("x", 0.1, 1, 0.1, 0));
    assertThrows(InvalidInputException.class, () -> new IndicialLift("x", 0.1, Double.POSITIVE_INFINITY, 0.1, 1));
    assertThrows(InvalidInputException.class, () -> new IndicialLift("x", 0.1, 1, 0.1, Double.POSITIVE_INFINITY));
    // the limits themselves are valid: a1 + a2 = 1 (no lift at once), a zero amplitude
    assertEquals(0.0, new IndicialLift("x", 0.6, 1, 0.4, 1).initialValue(), 1e-15);
    assertEquals(1.0, new IndicialLift("x", 0, 1, 0, 1).value(0), 1e-15);
    for (double[] vb : new double[][] {{0, B}, {-V, B}, {V, 0}, {V, -B}}) {
      IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
          () -> IndicialLift.WAGNER.filter(vb[0], vb[1]));
      assertTrue(e.getMessage().startsWith("speed and semichord must be > 0"), e.getMessage());
    }
  }

  @Test
  void wordsOfTheLiftGrowth() {
    assertEquals(LiftGrowth.UNSTEADY, LiftGrowth.of("f", " Unsteady "));
    assertEquals(LiftGrowth.QUASI_STEADY, LiftGrowth.of("f", "quasi-steady"));
    assertEquals("quasi_steady", LiftGrowth.QUASI_STEADY.word());
    InvalidInputException e = assertThrows(InvalidInputException.class, () -> LiftGrowth.of("--lift-growth", "wagner"));
    assertEquals("--lift-growth", e.fieldPath());
    assertThrows(InvalidInputException.class, () -> LiftGrowth.of("f", null));
    // a scenario without a lift growth is quasi-steady; null is refused
    ActuatorLimits none = new ActuatorLimits(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
    SimulationScenario plain = new SimulationScenario(LoopClosure.OPEN, null, 5, List.of(30.0), null, null, none, 1,
        0.01, 1, 1, null, false);
    assertEquals(LiftGrowth.QUASI_STEADY, plain.liftGrowth());
    InvalidInputException missing = assertThrows(InvalidInputException.class, () -> new SimulationScenario(
        LoopClosure.OPEN, null, 5, List.of(30.0), null, null, none, 1, 0.01, 1, 1, null, false, null));
    assertEquals("lift_growth", missing.fieldPath());
  }

  private static double[] step(IndicialLift f, double dt, int steps) {
    StateSpace filter = f.filter(V, B);
    InputSignal unit = new InputSignal.Step(1.0, 0.0);
    return LinearSimulation.run(filter, dt, steps, List.of(unit::value), null, null).channel("effective_angle_rad");
  }
}
