package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.junit.jupiter.api.Test;

/** Default carrying paths by what each sensor sees, and the loop edits that insert notches. */
class PathFiltersTest {
  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  /**
   * The demo case with the given shape values at the two sensor stations of every mode (null:
   * the station is left out of every mode but the first, which must carry it) and a loop whose
   * paths use the named sensors: q (gyro, gyro_fwd), nz (accelerometer, accel_cg), vane (vane,
   * gyro_fwd).
   */
  private static AnalysisCase withShapes(ShapeValue gyro, ShapeValue accel, ShapeValue gyroLaterModes,
      String... pathSensors) {
    List<Configuration> cs = new ArrayList<>();
    for (Configuration c : DEMO.configurations()) {
      ModeTable mt = (ModeTable) c.structure();
      List<ElasticMode> modes = new ArrayList<>();
      for (int k = 0; k < mt.modes().size(); k++) {
        ElasticMode m = mt.modes().get(k);
        Map<String, ShapeValue> shapes = new HashMap<>(m.shapes());
        ShapeValue g = k == 0 ? gyro : gyroLaterModes;
        if (g == null) {
          shapes.remove("gyro_fwd");
        } else {
          shapes.put("gyro_fwd", g);
        }
        shapes.put("accel_cg", accel);
        modes.add(new ElasticMode(m.name(), m.frequencyHz(), m.dampingRatio(), m.generalizedMassKg(), shapes));
      }
      cs.add(new Configuration(c.name(), new ModeTable(mt.name(), modes), c.aero(), c.rigidBody()));
    }
    List<SensorSpec> sensors = List.of(new SensorSpec("q", SensorKind.PITCH_RATE_GYRO, "gyro_fwd", 0, 0),
        new SensorSpec("nz", SensorKind.NORMAL_ACCELEROMETER, "accel_cg", 0, 0),
        new SensorSpec("vane", SensorKind.ANGLE_OF_ATTACK_VANE, "gyro_fwd", 0, 0));
    List<FeedbackPath> paths = new ArrayList<>();
    for (String s : pathSensors) {
      paths.add(new FeedbackPath(s, 0.1, 0, List.of(), null));
    }
    LoopSpec loop = new LoopSpec(DEMO.loop().actuator(), sensors, paths, 0.005, 0, 2);
    return new AnalysisCase(1, "edited", "", cs, DEMO.sweep(), DEMO.options(), List.of(), loop, null);
  }

  private static final ShapeValue ZERO = new ShapeValue(0, 0);

  @Test
  void aPathIsCarryingWhenItsSensorSeesSomeModeInSomeConfiguration() {
    // heave only at the gyro station, pitch only at the accelerometer: the gyro and the
    // accelerometer see nothing, the vane (either motion) sees the heave
    assertEquals(List.of(2),
        PathFilters.defaultNotchPaths(withShapes(new ShapeValue(0.3, 0), new ShapeValue(0, 0.2),
            new ShapeValue(0.3, 0), "nz", "q", "vane")));
    // rotation at the gyro station in the later modes only: gyro and vane see it; displacement
    // at the accelerometer: it sees it too
    assertEquals(List.of(0, 1, 2),
        PathFilters.defaultNotchPaths(withShapes(ZERO, new ShapeValue(0.1, 0), new ShapeValue(0, 0.01),
            "nz", "q", "vane")));
    // the later modes lack the gyro station altogether: nobody sees, so the pitch-rate paths
    assertEquals(List.of(1, 3),
        PathFilters.defaultNotchPaths(withShapes(ZERO, ZERO, null, "nz", "q", "vane", "q")));
    // and with no pitch-rate path the first path
    assertEquals(List.of(0), PathFilters.defaultNotchPaths(withShapes(ZERO, ZERO, ZERO, "nz", "vane")));
  }

  @Test
  void theDemoGyroAndAccelerometerBothSeeTheStructure() {
    // the demo's invented shapes have rotation at gyro_fwd and displacement at accel_cg
    assertEquals(List.of(0, 1), PathFilters.defaultNotchPaths(DEMO));
  }

  @Test
  void aCaseWithoutALoopIsRejected() {
    AnalysisCase open = new AnalysisCase(1, "open", "", DEMO.configurations(), DEMO.sweep(), DEMO.options(),
        List.of());
    InvalidInputException e = assertThrows(InvalidInputException.class, () -> PathFilters.requireLoop(open));
    assertEquals("loop", e.fieldPath());
    assertSame(DEMO.loop(), PathFilters.requireLoop(DEMO));
  }

  @Test
  void designedNotchesGoFirstAndExistingNotchesAreReplacedOrKept() {
    LoopSpec loop = DEMO.loop();
    FeedbackPath pitch = loop.paths().get(0);
    // the demo path: an 8.6 Hz notch, then a 25 Hz low-pass
    assertEquals(List.of(new NotchFilterSpec(8.6, 0.05, 0.5), new LowPassFilterSpec(25, 0.7071)), pitch.filters());
    List<NotchFilter> n = List.of(new NotchFilter(7.5, 0.05, 0.5), new NotchFilter(19, 0.1, 0.4));
    NotchFilterSpec n1 = new NotchFilterSpec(7.5, 0.05, 0.5);
    NotchFilterSpec n2 = new NotchFilterSpec(19, 0.1, 0.4);
    assertEquals(List.of(n1, n2, new LowPassFilterSpec(25, 0.7071)),
        PathFilters.filters(pitch, ExistingNotches.REPLACE, n));
    assertEquals(List.of(n1, n2, new NotchFilterSpec(8.6, 0.05, 0.5), new LowPassFilterSpec(25, 0.7071)),
        PathFilters.filters(pitch, ExistingNotches.KEEP, n));
    LoopSpec edited = PathFilters.withNotches(loop, List.of(0), ExistingNotches.REPLACE, n);
    assertEquals(List.of(n1, n2, new LowPassFilterSpec(25, 0.7071)), edited.paths().get(0).filters());
    FeedbackPath e0 = edited.paths().get(0);
    assertEquals(pitch.sensor(), e0.sensor());
    assertEquals(pitch.proportionalGain(), e0.proportionalGain());
    assertEquals(pitch.integralGainPerS(), e0.integralGainPerS());
    assertSame(pitch.schedule(), e0.schedule());
    assertSame(loop.paths().get(1), edited.paths().get(1));
    assertEquals(loop.actuator(), edited.actuator());
    assertEquals(loop.sensors(), edited.sensors());
    assertEquals(loop.computationDelayS(), edited.computationDelayS());
    assertEquals(loop.samplePeriodS(), edited.samplePeriodS());
    assertEquals(loop.padeOrder(), edited.padeOrder());
    // the base loop is the loop with no designed notch
    LoopSpec base = PathFilters.baseLoop(loop, List.of(0, 1), ExistingNotches.REPLACE);
    assertEquals(List.of(new LowPassFilterSpec(25, 0.7071)), base.paths().get(0).filters());
    assertEquals(List.of(), base.paths().get(1).filters());
    assertEquals(loop.paths(), PathFilters.baseLoop(loop, List.of(0), ExistingNotches.KEEP).paths());
    InvalidInputException bad = assertThrows(InvalidInputException.class,
        () -> PathFilters.withNotches(loop, List.of(0, 2), ExistingNotches.REPLACE, n));
    assertEquals("notch_paths", bad.fieldPath());
  }

  @Test
  void existingNotchesAreListedOnceEachInPathOrder() {
    NotchFilterSpec a = new NotchFilterSpec(8.6, 0.05, 0.5);
    NotchFilterSpec b = new NotchFilterSpec(21, 0.1, 0.3);
    FilterSpec lp = new LowPassFilterSpec(25, 0.7);
    LoopSpec loop = DEMO.loop();
    List<FeedbackPath> paths = List.of(new FeedbackPath("pitch_rate", 1, 0, List.of(lp, b, a), null),
        new FeedbackPath("normal_accel", 1, 0, List.of(a, lp), null));
    LoopSpec two = new LoopSpec(loop.actuator(), loop.sensors(), paths, 0, 0, 2);
    assertEquals(List.of(new NotchFilter(21, 0.1, 0.3), new NotchFilter(8.6, 0.05, 0.5)),
        PathFilters.existingNotches(two, List.of(0, 1)));
    assertEquals(List.of(new NotchFilter(8.6, 0.05, 0.5)), PathFilters.existingNotches(two, List.of(1)));
    assertEquals(List.of(), PathFilters.existingNotches(DEMO.loop(), List.of(1)));
  }
}
