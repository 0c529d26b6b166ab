package org.flexmargin.cli;

import java.util.List;
import java.util.Map;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.InertiaAxis;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.UniformCantileverWing;

/**
 * Invented benchmark scenario (timing only, not a validation case): a uniform cantilever wing of
 * Goland proportions with the requested number of Ritz modes, a statically unstable rigid body and
 * a pitch loop with a gyro and an accelerometer on wing strips.
 */
final class BenchScenario {
  private BenchScenario() {}

  static Configuration configuration(int modes, int strips) {
    int half = Math.max(1, modes / 2);
    UniformCantileverWing wing = new UniformCantileverWing(6.096, 1.8288, 0.33, 0.43, 35.71, 8.64,
        InertiaAxis.ELASTIC_AXIS, 9.77e6, 0.987e6, 2 * Math.PI, half, modes - half, strips, 0.0);
    RigidBody rigid = new RigidBody(1400, 6500, 8.1, 0.93, 5.5, 0.2, -15, -5, 0.4, -1.2, Map.of());
    return new Configuration("bench", wing, null, rigid);
  }

  static LoopSpec loop(int strips) {
    String station = String.format("strip_%0" + Math.max(2, Integer.toString(strips).length()) + "d", 1);
    List<SensorSpec> sensors = List.of(
        new SensorSpec("gyro", SensorKind.PITCH_RATE_GYRO, station, 0.0, 40.0),
        new SensorSpec("accel", SensorKind.NORMAL_ACCELEROMETER, station, 0.3, 30.0));
    List<FeedbackPath> paths = List.of(
        new FeedbackPath("gyro", 0.8, 0.4, List.of(new NotchFilterSpec(8.6, 0.05, 0.5),
            new LowPassFilterSpec(25.0, 0.7071)), null),
        new FeedbackPath("accel", 0.05, 0.0, List.of(), null));
    return new LoopSpec(new ActuatorSpec(ActuatorOrder.SECOND, 12.0, 0.7), sensors, paths, 0.01, 0.0125, 2);
  }

  /**
   * Doublet-lattice timing wing: a flat rectangular wing of 1 m chord and 10 m span, 1 m of sweep
   * at the tip, no mirror image, {@code chordwise} x {@code spanwise} boxes.
   */
  static org.flexmargin.lattice.BoxLattice latticeWing(int chordwise, int spanwise) {
    org.flexmargin.model.LiftingSurface wing = new org.flexmargin.model.LiftingSurface("wing",
        new org.flexmargin.model.SurfacePoint(0, 0, 0), 1.0,
        new org.flexmargin.model.SurfacePoint(1.0, 10.0, 0), 1.0, chordwise, spanwise);
    return new org.flexmargin.lattice.BoxLattice(List.of(wing), org.flexmargin.model.FlowSymmetry.NONE);
  }
}
