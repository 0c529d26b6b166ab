package org.flexmargin.ase;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.flexmargin.loop.FrequencyResponse;
import org.flexmargin.loop.StateSpace;

/** The plant's state space against its exact frequency evaluator, sensor by sensor. */
final class PlantResponseCheck {
  private PlantResponseCheck() {}

  /**
   * Asserts that the state space's response equals the plant's exact (2 + m) complex solve at
   * every frequency, to 1e-9 relative (floor 1e-6): two exact computations of one transfer
   * function, each losing at most the condition number of its solve to rounding.
   *
   * @param p the plant
   * @param ss its state space (elevator input, the plant's sensors as outputs)
   * @param w frequencies, rad/s
   * @param sensors number of sensors
   */
  static void stateSpaceEqualsEvaluator(AircraftPlant p, StateSpace ss, double[] w, int sensors) {
    FrequencyResponse fr = ss.frequencyResponse(w);
    AircraftPlant.FrequencyEvaluator ev = p.frequencyEvaluator();
    double[] out = new double[2 * sensors];
    for (int k = 0; k < w.length; k++) {
      ev.response(w[k], out);
      for (int s = 0; s < sensors; s++) {
        double re = fr.real(k, s, 0);
        double im = fr.imag(k, s, 0);
        double scale = Math.max(1e-6, Math.hypot(re, im));
        assertEquals(re, out[2 * s], 1e-9 * scale, "re, sensor " + s + " at " + w[k]);
        assertEquals(im, out[2 * s + 1], 1e-9 * scale, "im, sensor " + s + " at " + w[k]);
      }
    }
  }
}
