package org.flexmargin.model;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The fly-by-wire pitch loop: actuator, sensors, control-law paths and the digital effects.
 *
 * @param actuator elevator actuator
 * @param sensors sensors, names unique
 * @param paths feedback paths, each naming a sensor
 * @param computationDelayS computational (transport) delay (s), &gt;= 0
 * @param samplePeriodS sample period of the flight computer (s); 0 for a continuous law (no
 *     zero-order hold)
 * @param padeOrder order of the Pade approximation of delays in the state-space model (1..6);
 *     frequency responses use the exact e^{-s tau}
 */
public record LoopSpec(
    ActuatorSpec actuator,
    List<SensorSpec> sensors,
    List<FeedbackPath> paths,
    double computationDelayS,
    double samplePeriodS,
    int padeOrder) {
  /** Validates and copies. */
  public LoopSpec {
    if (actuator == null) {
      throw new InvalidInputException("actuator", "an actuator section", "nothing");
    }
    sensors = Checks.nonEmpty("sensors", sensors);
    paths = Checks.nonEmpty("paths", paths);
    Set<String> names = new HashSet<>();
    for (int i = 0; i < sensors.size(); i++) {
      if (!names.add(sensors.get(i).name())) {
        throw new InvalidInputException("sensors[" + i + "].name", "a unique sensor name",
            "duplicate \"" + sensors.get(i).name() + "\"");
      }
    }
    for (int i = 0; i < paths.size(); i++) {
      if (!names.contains(paths.get(i).sensor())) {
        throw new InvalidInputException("paths[" + i + "].sensor", "one of the sensors " + names,
            "\"" + paths.get(i).sensor() + "\"");
      }
    }
    Checks.nonNegative("computation_delay_s", computationDelayS);
    Checks.nonNegative("sample_period_s", samplePeriodS);
    for (int i = 0; i < paths.size(); i++) {
      for (int j = 0; j < paths.get(i).filters().size(); j++) {
        if (paths.get(i).filters().get(j) instanceof FilterSpec.Discrete && !(samplePeriodS > 0)) {
          throw new InvalidInputException("paths[" + i + "].filters[" + j + "].discrete",
              "a loop with sample_period_s > 0 (a digital filter runs at the loop's sample period)",
              "a continuous loop (sample_period_s " + samplePeriodS + ")");
        }
      }
    }
    if (padeOrder < 1 || padeOrder > 6) {
      throw new InvalidInputException("pade_order", "an integer from 1 to 6", String.valueOf(padeOrder));
    }
  }

  /** @return the sensor of the given name */
  public SensorSpec sensor(String name) {
    return sensors.stream().filter(s -> s.name().equals(name)).findFirst()
        .orElseThrow(() -> new InvalidInputException("paths.sensor", "a declared sensor", name));
  }
}
