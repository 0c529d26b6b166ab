package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.GainSchedule;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.junit.jupiter.api.Test;

/**
 * The optional closed-loop sections of a case file: {@code rigid_body} in a configuration and the
 * top-level {@code loop}. One good file read field by field, and one small bad file per kind of
 * error, each asserting file, line, field path, expected and found.
 *
 * <p>The expected values are those written in the test files themselves (no unit conversion is
 * defined for these keys: Hz stays Hz, seconds stay seconds), so values read must equal them
 * exactly.
 */
class LoopCaseReaderTest {
  private static final Path DIR = Path.of("src/test/resources/io");

  private static InputFileException failsCase(String file) {
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(DIR.resolve(file)));
    assertEquals(file, Path.of(e.file()).getFileName().toString());
    return e;
  }

  @Test
  void readsEveryLoopAndRigidBodyField() {
    AnalysisCase c = CaseReader.read(DIR.resolve("good-loop-case.json"));

    RigidBody heavy = c.configurations().get(0).rigidBody();
    RigidBody expectedHeavy = new RigidBody(1400, 2600, 9.0, 1.0, 5.5, 0.2, -15, -5, 0.4, -1.2,
        Map.of("bending", new ModeCoupling(0.05, -0.02, 1.5, 0.3),
            "torsion", new ModeCoupling(0, 0, -0.7, 0)));
    assertEquals(expectedHeavy, heavy);
    RigidBody light = c.configurations().get(1).rigidBody();
    assertEquals(new RigidBody(900, 1800, 9.0, 1.0, 5.5, 0.25, -14, -4.5, 0.4, -1.25, Map.of()), light);
    // Unlisted coefficients and modes are zero coupling.
    assertSame(ModeCoupling.NONE, light.couplingOf("bending"));

    LoopSpec loop = c.loop();
    assertEquals(new ActuatorSpec(ActuatorOrder.SECOND, 12, 0.7), loop.actuator());
    assertEquals(List.of(
        new SensorSpec("gyro", SensorKind.PITCH_RATE_GYRO, "s1", -2.5, 40),
        new SensorSpec("accel", SensorKind.NORMAL_ACCELEROMETER, "s2", 0.0, 0.0),
        new SensorSpec("vane", SensorKind.ANGLE_OF_ATTACK_VANE, "s2", 0.0, 10)), loop.sensors());

    assertEquals(2, loop.paths().size());
    FeedbackPath q = loop.paths().get(0);
    assertEquals("gyro", q.sensor());
    assertEquals(0.3, q.proportionalGain());
    assertEquals(0.6, q.integralGainPerS());
    assertEquals(List.of(new NotchFilterSpec(8.6, 0.05, 0.5), new LowPassFilterSpec(25, 0.7071)), q.filters());
    assertArrayEquals(new double[] {1000, 15000}, q.schedule().dynamicPressurePa());
    assertArrayEquals(new double[] {1.0, 0.5}, q.schedule().factor());
    FeedbackPath nz = loop.paths().get(1);
    assertEquals("accel", nz.sensor());
    assertEquals(0.05, nz.proportionalGain());
    assertEquals(0.0, nz.integralGainPerS());
    assertEquals(List.of(), nz.filters());
    assertSame(GainSchedule.CONSTANT, nz.schedule());

    assertEquals(0.01, loop.computationDelayS());
    assertEquals(0.0125, loop.samplePeriodS());
    assertEquals(CaseReader.DEFAULT_PADE_ORDER, loop.padeOrder());
    assertEquals(2, loop.padeOrder());
  }

  @Test
  void casesWithoutTheNewSectionsStillRead() {
    AnalysisCase c = CaseReader.read(DIR.resolve("good-case.json"));
    assertNull(c.loop());
    assertNull(c.configurations().get(0).rigidBody());
  }

  @Test
  void unknownKeyInLoop() {
    InputFileException e = failsCase("bad-loop-unknown-key.json");
    assertEquals(19, e.line());
    assertEquals("loop.computation_delay_ms", e.fieldPath());
    assertEquals("one of the keys actuator, sensors, paths, computation_delay_s, sample_period_s, pade_order",
        e.expected());
    assertEquals("unknown key \"computation_delay_ms\"", e.found());
  }

  @Test
  void secondOrderActuatorNeedsDamping() {
    InputFileException e = failsCase("bad-loop-actuator-damping.json");
    assertEquals(16, e.line()); // the actuator object, where the key is missing
    assertEquals("loop.actuator.damping_ratio", e.fieldPath());
    assertEquals("the damping ratio of the second-order actuator", e.expected());
    assertEquals("nothing (required key missing)", e.found());
  }

  @Test
  void pathNamingAnUnknownSensor() {
    InputFileException e = failsCase("bad-loop-path-sensor.json");
    assertEquals(20, e.line());
    assertEquals("loop.paths[1].sensor", e.fieldPath());
    assertEquals("one of the sensors [gyro]", e.expected());
    assertEquals("\"alpha\"", e.found());
  }

  @Test
  void sensorStationMissingFromTheModeTable() {
    InputFileException e = failsCase("bad-loop-station.json");
    assertEquals(19, e.line()); // the sensor's line
    assertEquals("loop.sensors[1].station", e.fieldPath());
    assertEquals("a station of mode table \"two-modes\" of configuration \"a\" (s1, s2)", e.expected());
    assertEquals("\"nose\"", e.found());
  }

  @Test
  void notchNeedsPositiveDenominatorDamping() {
    InputFileException e = failsCase("bad-loop-notch.json");
    assertEquals(23, e.line());
    assertEquals("loop.paths[1].filters[1].notch.denominator_damping_ratio", e.fieldPath());
    assertEquals("a value in [1.0E-6, 10.0]", e.expected());
    assertEquals("0.0", e.found());
  }

  @Test
  void scheduleMustIncrease() {
    InputFileException e = failsCase("bad-loop-schedule.json");
    assertEquals(20, e.line());
    assertEquals("loop.paths[0].schedule.dynamic_pressure_pa[2]", e.fieldPath());
    assertEquals("strictly increasing values", e.expected());
    assertEquals("5000.0 after 5000.0", e.found());
  }

  @Test
  void couplingNamingAnUnknownMode() {
    InputFileException e = failsCase("bad-coupling-mode.json");
    assertEquals(14, e.line());
    assertEquals("configurations[0].rigid_body.mode_coupling.wing_torsion", e.fieldPath());
    assertEquals("a mode of mode table \"two-modes\" (bending, torsion)", e.expected());
    assertEquals("\"wing_torsion\"", e.found());
  }

  @Test
  void loopNeedsRigidBodyDataInEveryConfiguration() {
    InputFileException e = failsCase("bad-loop-no-rigid-body.json");
    assertEquals(13, e.line()); // the configuration without it
    assertEquals("configurations[1].rigid_body", e.fieldPath());
    assertEquals("rigid-body data (the case has a loop)", e.expected());
    assertEquals("none", e.found());
    assertTrue(e.getMessage().startsWith(e.file() + ":13: configurations[1].rigid_body: expected"));
  }
}
