package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
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
import org.junit.jupiter.api.io.TempDir;

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

  /** Writes a typical-section case with the given extra text in the configuration and at the top. */
  private static Path builtIn(Path dir, String inConfig, String atTop) throws Exception {
    String text = "{\n"
        + "  \"format\": 1, \"name\": \"builtin\",\n"
        + "  \"configurations\": [{\"name\": \"ts\",\n"
        + "    \"typical_section\": {\"semichord_m\": 1, \"mass_per_span_kg_per_m\": 300, \"elastic_axis_a\": -0.5,\n"
        + "      \"mass_offset_x_alpha\": 0.25, \"radius_of_gyration_squared\": 0.25, \"heave_frequency_hz\": 2,\n"
        + "      \"pitch_frequency_hz\": 10, \"lift_slope_per_rad\": 6.28, \"span_m\": 1, \"damping_ratio\": 0},\n"
        + "    \"rigid_body\": {\"mass_kg\": 300, \"pitch_inertia_kg_m2\": 100, \"reference_area_m2\": 2,\n"
        + "      \"reference_chord_m\": 2, \"lift_slope_per_rad\": 5, \"pitch_moment_slope_per_rad\": -0.5,\n"
        + "      \"pitch_damping_cmq\": -10, \"alpha_dot_damping_cm_alpha_dot\": -3, \"lift_per_elevator_per_rad\": 0.3,\n"
        + "      \"pitch_moment_per_elevator_per_rad\": -1" + inConfig + "}}],\n"
        + "  \"sweep\": {\"kind\": \"speed\", \"altitude_m\": 0, \"speed_kind\": \"eas\", \"from_mps\": 20,"
        + " \"to_mps\": 100, \"points\": 5}" + atTop + "\n}\n";
    Path f = dir.resolve("builtin.json");
    Files.writeString(f, text);
    return f;
  }

  private static InputFileException failsBuiltIn(Path dir, String inConfig, String atTop) throws Exception {
    Path f = builtIn(dir, inConfig, atTop);
    return assertThrows(InputFileException.class, () -> CaseReader.read(f));
  }

  @Test
  void builtInStructuresRefuseModeCouplingAndLoops(@TempDir Path dir) throws Exception {
    // Rigid-body data alone are accepted on a built-in structure.
    assertEquals(-0.5, CaseReader.read(builtIn(dir, "", "")).configurations().get(0).rigidBody()
        .pitchMomentSlopePerRad());
    InputFileException coupling = failsBuiltIn(dir, ",\n      \"mode_coupling\": {\"mode_1\": {}}", "");
    assertEquals(11, coupling.line());
    assertEquals("configurations[0].rigid_body.mode_coupling", coupling.fieldPath());
    assertEquals("a mode_coupling section", coupling.found());
    InputFileException loop = failsBuiltIn(dir, "", ",\n  \"loop\": {\"actuator\": {\"order\": \"first\","
        + " \"bandwidth_hz\": 10},\n    \"sensors\": [{\"name\": \"g\", \"kind\": \"pitch_rate_gyro\","
        + " \"station\": \"section\"}],\n    \"paths\": [{\"sensor\": \"g\", \"proportional_gain\": 0.1}]}");
    assertEquals(3, loop.line());
    assertEquals("configurations[0]", loop.fieldPath());
    assertEquals("a built-in structure in a case with a loop", loop.found());
  }

  @Test
  void firstOrderActuatorRefusesADampingRatio(@TempDir Path dir) throws Exception {
    String text = Files.readString(DIR.resolve("bad-loop-unknown-key.json"))
        .replace("\"bandwidth_hz\": 10}", "\"bandwidth_hz\": 10, \"damping_ratio\": 0.7}")
        .replace(",\n    \"computation_delay_ms\": 10", "")
        .replace("good-", DIR.toAbsolutePath() + "/good-");
    Path f = dir.resolve("first.json");
    Files.writeString(f, text);
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(f));
    assertEquals(16, e.line());
    assertEquals("loop.actuator.damping_ratio", e.fieldPath());
    assertEquals("no damping_ratio for a first-order actuator", e.expected());
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
    assertEquals("unknown key \"computation_delay_ms\" (did you mean \"computation_delay_s\"?)", e.found());
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
