package org.flexmargin.simulate;

import java.util.LinkedHashMap;
import java.util.Map;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.InvalidInputException;

/**
 * Band-limited white noise on the sensors: for each named sensor, independent Gaussian noise of a
 * stated RMS added to its signal (what the control law reads and what is recorded), white up to a
 * first-order corner f_c. In the sensor's output unit: rad/s for a pitch-rate gyro, g for a normal
 * accelerometer, rad for a vane.
 *
 * <p>The noise is unit-intensity white noise through k w_c / (s + w_c), w_c = 2 pi f_c, k = sigma
 * sqrt(2 / w_c), so that its variance is sigma^2; its one-sided density is 2 sigma^2 / (pi f_c)
 * per Hz at low frequency (equivalent noise bandwidth pi f_c / 2). Example: sigma = 0.002 rad/s
 * (0.11 deg/s) with f_c = 100 Hz is 2.5e-8 (rad/s)^2/Hz, 0.0091 deg/s per root hertz. Immutable.
 *
 * @param rmsBySensor RMS per sensor name (unit of that sensor's signal), each finite and &gt;= 0
 * @param bandwidthHz corner f_c (Hz), &gt; 0
 */
public record SensorNoise(Map<String, Double> rmsBySensor, double bandwidthHz) {
  /** Validates and copies, keeping the order given. */
  public SensorNoise {
    if (rmsBySensor == null || rmsBySensor.isEmpty()) {
      throw new InvalidInputException("sensor_noise", "at least one sensor with its noise RMS", "none");
    }
    for (Map.Entry<String, Double> e : rmsBySensor.entrySet()) {
      Double v = e.getValue();
      if (v == null || !(v >= 0) || !Double.isFinite(v)) {
        throw new InvalidInputException("sensor_noise." + e.getKey(), "a finite RMS >= 0 in the sensor's unit",
            String.valueOf(v));
      }
    }
    rmsBySensor = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(rmsBySensor));
    if (!(bandwidthHz > 0) || !Double.isFinite(bandwidthHz)) {
      throw new InvalidInputException("sensor_noise.bandwidth_hz", "a finite value > 0 Hz",
          String.valueOf(bandwidthHz));
    }
  }

  /**
   * @param rms sigma (sensor unit)
   * @return the shaping filter from unit-intensity white noise to the noise (one state)
   */
  StateSpace filter(double rms) {
    double w = 2 * Math.PI * bandwidthHz;
    double k = rms * Math.sqrt(2 / w);
    return StateSpace.fromTransferFunction(new double[] {k * w}, new double[] {1, w});
  }

  /**
   * @param rms sigma (sensor unit)
   * @return one-sided density at low frequency (unit^2 per Hz)
   */
  public double densityPerHz(double rms) {
    return 2 * rms * rms / (Math.PI * bandwidthHz);
  }
}
