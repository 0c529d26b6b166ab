package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.flexmargin.loop.FrequencyResponse;
import org.flexmargin.loop.StateSpace;
import org.junit.jupiter.api.Test;

/**
 * RMS responses of the demo drone (invented data) in continuous turbulence, closed loop, at a
 * speed where the loop is stable: exact (Lyapunov) against spectral integration and against the
 * simulated record.
 */
class AircraftTurbulenceTest {
  private static final SimulationPoint POINT = DemoPoint.at(0, 50.0);
  private static final Turbulence DRYDEN = new Turbulence(TurbulenceSpectrum.DRYDEN, 1.0, 533.4);

  @Test
  void exactAndSimulatedRmsAgree() {
    AircraftSimulationModel model = POINT.model(LoopClosure.CLOSED);
    assertTrue(model.system().eigenvalues().maxRealPart() < 0, "closed loop stable at 50 m/s EAS");
    StateSpace sys = model.withTurbulence(DRYDEN);
    RandomResponse.Result r = RandomResponse.run(sys, 1, 0.005, 20_000, 7L);
    String[] checked = {"sensor_normal_accel_g", "sensor_pitch_rate_rad_per_s", AircraftSimulationModel.ELEVATOR_RATE,
        AircraftSimulationModel.GUST_INPUT};
    double[] spectralVariances = spectralVariances(sys);
    for (String name : checked) {
      int o = firstOutputStartingWith(sys, name);
      double exact = r.exactRms()[o];
      // 1) independent route: (1/pi) int_0^inf |H(j w)|^2 dw with the Hessenberg frequency response
      // and Commons Math Gauss-Legendre on ln w in pieces of 0.05 (structural peaks of damping
      // ratio >= 0.01 span >= 0.02 in ln w); tolerance 1e-4 relative for the quadrature.
      double spectral = Math.sqrt(spectralVariances[o]);
      assertEquals(spectral, exact, 1e-4 * spectral, name);
      // 2) the simulated mean square within 3 standard errors (fixed seed: deterministic)
      double se = r.meanSquareStandardError()[o];
      double sim = r.simulatedRms()[o];
      assertTrue(Math.abs(sim * sim - exact * exact) < 3 * se,
          name + ": simulated " + sim + ", exact " + exact + ", se of mean square " + se);
    }
  }

  private static int firstOutputStartingWith(StateSpace sys, String prefix) {
    for (int o = 0; o < sys.outputCount(); o++) {
      if (sys.outputNames().get(o).startsWith(prefix)) {
        return o;
      }
    }
    throw new AssertionError("no output " + prefix + " in " + sys.outputNames());
  }

  private static double[] spectralVariances(StateSpace sys) {
    GaussIntegratorFactory factory = new GaussIntegratorFactory();
    double[] sum = new double[sys.outputCount()];
    for (double u = Math.log(1e-7); u < Math.log(1e5); u += 0.05) {
      GaussIntegrator g = factory.legendre(12, u, u + 0.05);
      double[] w = new double[12];
      for (int i = 0; i < 12; i++) {
        w[i] = Math.exp(g.getPoint(i));
      }
      FrequencyResponse fr = sys.frequencyResponse(w);
      for (int i = 0; i < 12; i++) {
        for (int o = 0; o < sum.length; o++) {
          double re = fr.real(i, o, 1);
          double im = fr.imag(i, o, 1);
          sum[o] += g.getWeight(i) * (re * re + im * im) * w[i] / Math.PI;
        }
      }
    }
    return sum;
  }
}
