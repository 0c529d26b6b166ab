package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.Map;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * Band-limited sensor noise: its own variance (closed form of a first-order filter on white
 * noise), independence from turbulence (variances add), and the simulated RMS within its
 * confidence interval of the exact (Lyapunov) value on the demo drone (invented data).
 */
class SensorNoiseTest {

  @Test
  void noiseAloneOnAnOpenLoopSensorHasItsStatedRms() {
    // Loop open and nothing else excited: the measured accelerometer signal is the noise alone.
    // Closed form (derived): k w_c / (s + w_c) on unit-intensity white noise has variance
    // k^2 w_c / 2 = sigma^2. Tolerance 1e-9 relative (the doubling sum of the Lyapunov equation).
    AircraftSimulationModel model = RigidHeaveGustTest.heaveModel(RigidHeaveGustTest.MASS, 0, null);
    SensorNoise noise = new SensorNoise(Map.of("accel", 0.01), 50);
    StateSpace sys = model.withRandomInputs(null, noise);
    RandomResponse.Result r = RandomResponse.run(sys, new int[] {1}, 0.001, 20_000, 3L);
    int o = sys.outputNames().indexOf("sensor_accel_g");
    assertEquals(0.01, r.exactRms()[o], 1e-9 * 0.01);
    // the simulated mean square within 3 standard errors (fixed seed: deterministic)
    double sim = r.simulatedRms()[o];
    assertTrue(Math.abs(sim * sim - 1e-4) < 3 * r.meanSquareStandardError()[o], "simulated " + sim);
    // the stated density: one-sided 2 sigma^2 / (pi f_c) per Hz, whose integral over the
    // first-order band (equivalent bandwidth pi f_c / 2) is sigma^2 (derived)
    assertEquals(1e-4, noise.densityPerHz(0.01) * Math.PI * 50 / 2, 1e-18);
  }

  @Test
  void turbulenceAndNoiseVariancesAddAndTheSimulationAgrees() {
    SimulationPoint point = DemoPoint.at(1, 100.0);
    AircraftSimulationModel model = point.model(LoopClosure.CLOSED);
    assertTrue(model.system().eigenvalues().maxRealPart() < 0, "closed loop stable, empty, 100 m/s EAS");
    Turbulence dryden = new Turbulence(TurbulenceSpectrum.DRYDEN, 1.0, 533.4);
    Map<String, Double> rms = new LinkedHashMap<>();
    rms.put("pitch_rate", Math.toRadians(0.1));
    rms.put("normal_accel", 0.005);
    SensorNoise noise = new SensorNoise(rms, 100);
    StateSpace both = model.withRandomInputs(dryden, noise);
    RandomResponse.Result all = RandomResponse.run(both, new int[] {1, 2, 3}, 0.002, 8_000, 11L);
    double[] turb = exactVariances(model.withTurbulence(dryden));
    double[] onlyNoise = exactVariances(model.withRandomInputs(null, noise));
    for (String name : new String[] {"sensor_pitch_rate_rad_per_s", "sensor_normal_accel_g",
        AircraftSimulationModel.ELEVATOR_RATE, AircraftSimulationModel.ELEVATOR}) {
      int o = both.outputNames().indexOf(name);
      double e = all.exactRms()[o];
      // independent sources: the variances add (derived); 1e-9 relative, rounding of the sums
      double sum = turb[o] + onlyNoise[o];
      assertEquals(sum, e * e, 1e-9 * sum, name);
      assertTrue(onlyNoise[o] > 0, name + " feels the noise");
      // the simulated mean square within 3 standard errors (fixed seed: deterministic)
      double sim = all.simulatedRms()[o];
      assertTrue(Math.abs(sim * sim - e * e) < 3 * all.meanSquareStandardError()[o],
          name + ": simulated " + sim + ", exact " + e);
    }
  }

  /** Output variances C P C^T with P from the Lyapunov equation, every input but the first noise. */
  private static double[] exactVariances(StateSpace sys) {
    int n = sys.stateCount();
    DMatrixRMaj g = CommonOps_DDRM.extract(sys.b(), 0, n, 1, sys.inputCount());
    DMatrixRMaj gg = new DMatrixRMaj(n, n);
    CommonOps_DDRM.multTransB(g, g, gg);
    DMatrixRMaj p = StationaryCovariance.of(sys.a(), gg, 0.002).covariance();
    DMatrixRMaj cp = new DMatrixRMaj(sys.outputCount(), n);
    CommonOps_DDRM.mult(sys.c(), p, cp);
    double[] v = new double[sys.outputCount()];
    for (int o = 0; o < v.length; o++) {
      for (int j = 0; j < n; j++) {
        v[o] += cp.get(o, j) * sys.c().get(o, j);
      }
    }
    return v;
  }

  @Test
  void refusesNegativeRmsAndNoBandwidth() {
    assertThrows(InvalidInputException.class, () -> new SensorNoise(Map.of("g", -1.0), 50));
    assertThrows(InvalidInputException.class, () -> new SensorNoise(Map.of("g", 1.0), 0));
    assertThrows(InvalidInputException.class, () -> new SensorNoise(Map.of(), 50));
  }
}
