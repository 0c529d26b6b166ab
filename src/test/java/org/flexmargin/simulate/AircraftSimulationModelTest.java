package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.FrequencyResponse;
import org.flexmargin.loop.StateSpace;
import org.junit.jupiter.api.Test;

/** The simulation model is the sweep's closed loop, with the inputs and outputs a simulation needs. */
class AircraftSimulationModelTest {
  private static final SimulationPoint POINT = DemoPoint.FULL_PAYLOAD_V0MAX;

  @Test
  void closedLoopEigenvaluesAreThoseOfTheSweep() {
    // Consistency with ServoLoop.closedLoop (the sweep's closed-loop eigenvalues): same spectrum,
    // different state order and actuator realisation. Tolerance 1e-7 relative: eigenvalues of two
    // similar matrices of order ~60 with entries up to ~1e4.
    Eigenvalues ours = POINT.model(LoopClosure.CLOSED).system().eigenvalues();
    Eigenvalues sweep = POINT.servo().closedLoop(POINT.rational()).eigenvalues();
    assertEquals(sweep.real().length, ours.real().length);
    double[] a = sortedModuli(ours);
    double[] b = sortedModuli(sweep);
    for (int i = 0; i < a.length; i++) {
      assertEquals(b[i], a[i], 1e-7 * Math.max(1, b[i]), "eigenvalue modulus " + i);
    }
  }

  @Test
  void openLoopPilotToElevatorIsTheForwardBlock() {
    // With the loop open, pilot command to elevator is the hold, delay and actuator in series:
    // compare with the forward block's state space at a few frequencies (same Padé realisation).
    StateSpace open = POINT.model(LoopClosure.OPEN).system();
    double[] w = {0.5, 5, 30, 120};
    FrequencyResponse ours = open.frequencyResponse(w);
    FrequencyResponse fwd = POINT.servo().forward().stateSpace().frequencyResponse(w);
    int out = open.outputNames().indexOf(AircraftSimulationModel.ELEVATOR);
    for (int k = 0; k < w.length; k++) {
      assertEquals(fwd.real(k, 0, 0), ours.real(k, out, 0), 1e-9);
      assertEquals(fwd.imag(k, 0, 0), ours.imag(k, out, 0), 1e-9);
    }
  }

  @Test
  void gustEntersAsAnAngleOfAttack() {
    // A vertical gust w_g changes the angle of attack seen by the aerodynamics by w_g / V (small
    // angles; e.g. Hoblit, Gust Loads on Aircraft, ch. 2): every aircraft state equation and every
    // accelerometer gets the alpha column of the plant divided by V; the pitch-rate gyro none.
    StateSpace sys = POINT.model(LoopClosure.OPEN).system();
    double v = POINT.condition().speedTasMps();
    int gust = 1;
    int aircraftStates = sys.stateNames().indexOf("law_path1_x1");
    assertTrue(aircraftStates > 40, "aircraft states: " + aircraftStates);
    for (int i = 0; i < aircraftStates; i++) {
      assertEquals(sys.a().get(i, 0) / v, sys.b().get(i, gust), 1e-12, sys.stateNames().get(i));
    }
    for (int o = 0; o < sys.outputCount(); o++) {
      String name = sys.outputNames().get(o);
      if (name.endsWith("_g")) {
        assertEquals(sys.c().get(o, 0) / v, sys.d().get(o, gust), 1e-12, name);
        assertTrue(sys.d().get(o, gust) != 0, name);
      } else if (name.endsWith("_rad_per_s")) {
        assertEquals(0.0, sys.d().get(o, gust), 0.0, name);
      }
    }
  }

  private static double[] sortedModuli(Eigenvalues e) {
    double[] m = new double[e.real().length];
    for (int i = 0; i < m.length; i++) {
      m[i] = Math.hypot(e.real()[i], e.imag()[i]);
    }
    Arrays.sort(m);
    return m;
  }
}
