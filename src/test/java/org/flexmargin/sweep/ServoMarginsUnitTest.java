package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.junit.jupiter.api.Test;

/** Margin grid seeds, notch checks and the margins along the sweep of the small section. */
class ServoMarginsUnitTest {

  private static BranchCurve branch(String name, double[] hz, double[] zeta, boolean[] ok) {
    int n = hz.length;
    return new BranchCurve(name, new double[n], new double[n], new double[n], hz, new double[n], zeta, new double[n],
        ok);
  }

  private static FlutterSolution solution(BranchCurve... b) {
    return new FlutterSolution(FlutterMethodKind.PK, List.of(b), List.of(), new SolverDiagnostics(0, 0, 0, 0, 0, 1, 0),
        List.of());
  }

  @Test
  void seedsClampTheDampingRatioAndTakeTheLowerOfTwoEquallyNearPoints() {
    // s = -zeta w + j w sqrt(1 - zeta^2), zeta clamped to [-0.99, 0.99]
    BranchCurve overdamped = branch("o", new double[] {5, 5}, new double[] {1.5, 1.5}, new boolean[] {true, true});
    BranchCurve unstable = branch("u", new double[] {7, 7}, new double[] {-2, -2}, new boolean[] {true, true});
    Eigenvalues s = ServoMargins.seeds(solution(overdamped, unstable), 1);
    double w5 = 2 * Math.PI * 5;
    double w7 = 2 * Math.PI * 7;
    double root = Math.sqrt(1 - 0.99 * 0.99);
    assertEquals(-0.99 * w5, s.realAt(0), 1e-12);
    assertEquals(w5 * root, s.imagAt(0), 1e-12);
    assertEquals(0.99 * w7, s.realAt(1), 1e-12);
    assertEquals(w7 * root, s.imagAt(1), 1e-12);
    // lost at point 2, converged at 0 (4 Hz) and 4 (9 Hz), both two points away: the earlier one
    BranchCurve gap = branch("g", new double[] {4, 0, 0, 0, 9}, new double[] {0.05, 0, 0, 0, 0.05},
        new boolean[] {true, false, false, false, true});
    Eigenvalues g = ServoMargins.seeds(solution(gap), 2);
    assertEquals(2 * Math.PI * 4, g.naturalFrequencyRadPerS(0), 1e-9);
    assertEquals(ServoMargins.LOST_MODE_SEED_DAMPING, g.dampingRatio(0), 1e-12);
    // converged one point later only: that point
    BranchCurve late = branch("l", new double[] {0, 0, 0, 8, 9}, new double[5], new boolean[] {false, false, false, true,
        true});
    assertEquals(2 * Math.PI * 8, ServoMargins.seeds(solution(late), 2).naturalFrequencyRadPerS(0), 1e-9);
    // a point beyond the branch's end: its last converged point, seeded as a lost mode
    Eigenvalues beyond = ServoMargins.seeds(solution(gap), 6);
    assertEquals(2 * Math.PI * 9, beyond.naturalFrequencyRadPerS(0), 1e-9);
    assertEquals(ServoMargins.LOST_MODE_SEED_DAMPING, beyond.dampingRatio(0), 1e-12);
    // never converged: no seed
    BranchCurve never = branch("n", new double[3], new double[3], new boolean[3]);
    assertEquals(0, ServoMargins.seeds(solution(never), 1).size());
  }

  @Test
  void theBandTopIsOneAndAHalfTimesTheHighestModeButAtLeastFiftyHertz() {
    assertEquals(50.0, ServoMargins.bandTopHz(model(20, 4)), 0.0);
    assertEquals(60.0, ServoMargins.bandTopHz(model(4, 40)), 1e-12);
  }

  private static ConfigurationModel model(double... hz) {
    List<ElasticMode> modes = Arrays.stream(hz).mapToObj(f -> new ElasticMode("m" + f, f, 0.02, 1,
        Map.of("s", new ShapeValue(0, 1)))).toList();
    return new ConfigurationModel(new ModeTable("t", modes), null, null);
  }

  /** N(j w) of the notch (s^2 + 2 zz wn s + wn^2) / (s^2 + 2 zp wn s + wn^2), as {re, im} (closed form). */
  private static double[] notch(double centreHz, double zz, double zp, double hz) {
    double wn = 2 * Math.PI * centreHz;
    double w = 2 * Math.PI * hz;
    double a = wn * wn - w * w;
    double nb = 2 * zz * wn * w;
    double db = 2 * zp * wn * w;
    double den = a * a + db * db;
    return new double[] {(a * a + nb * db) / den, (nb * a - a * db) / den};
  }

  private static LoopMarginResult crossovers(double... hz) {
    List<GainCrossover> g = Arrays.stream(hz).mapToObj(f -> new GainCrossover(2 * Math.PI * f, f, -120, 60, 0.1))
        .toList();
    return new LoopMarginResult(0.06, 300, g, List.<PhaseCrossover>of(), null, null, null, null);
  }

  private static LoopSpec twoPaths() {
    List<SensorSpec> sensors = List.of(new SensorSpec("gyro", SensorKind.PITCH_RATE_GYRO, "g", 0, 0),
        new SensorSpec("accel", SensorKind.NORMAL_ACCELEROMETER, "a", 0, 0));
    return new LoopSpec(new ActuatorSpec(ActuatorOrder.FIRST, 10, 0.7), sensors, List.of(
        new FeedbackPath("gyro", 0.1, 0, List.of(new LowPassFilterSpec(20, 0.7)), null),
        new FeedbackPath("accel", 0.01, 0, List.of(new LowPassFilterSpec(25, 0.7), new NotchFilterSpec(8, 0.05, 0.5)),
            null)), 0, 0, 2);
  }

  @Test
  void aNotchIsCheckedAtTheConvergedModesAndAtTheRigidCrossover() {
    // point 1: mode a converged at 6 Hz, mode b lost (its 2 Hz must not count); first mode 6 Hz, so
    // the rigid crossover is the highest below 3 Hz: 2.5 Hz (3 Hz itself and 4 Hz count as elastic)
    FlutterSolution ol = solution(
        branch("a", new double[] {6, 6}, new double[] {0.02, 0.02}, new boolean[] {true, true}),
        branch("b", new double[] {2, 2}, new double[] {0.02, 0.02}, new boolean[] {true, false}));
    List<NotchCheck> checks = ServoMargins.notchChecks(twoPaths(), ol, 1, crossovers(1, 2.5, 3, 4));
    assertEquals(1, checks.size());
    NotchCheck c = checks.get(0);
    assertEquals(1, c.path());
    assertEquals("accel", c.sensor());
    assertEquals(8, c.centreHz(), 0.0);
    // depth at the centre 20 log10(0.05 / 0.5) = -20 dB
    assertEquals(-20, c.depthDb(), 1e-12);
    assertEquals(1, c.modes().size());
    double[] at6 = notch(8, 0.05, 0.5, 6);
    assertEquals("a", c.modes().get(0).mode());
    assertEquals(6, c.modes().get(0).frequencyHz(), 0.0);
    assertEquals(20 * Math.log10(Math.hypot(at6[0], at6[1])), c.modes().get(0).attenuationDb(), 1e-10);
    assertEquals(2.5, c.crossoverHz(), 0.0);
    double[] at25 = notch(8, 0.05, 0.5, 2.5);
    assertEquals(-Math.toDegrees(Math.atan2(at25[1], at25[0])), c.phaseLossDeg(), 1e-10);
    assertTrue(c.phaseLossDeg() > 0, "a notch lags below its centre");
    // at point 0 mode b (2 Hz) is converged: the limit is 1 Hz and no crossover lies below it
    NotchCheck none = ServoMargins.notchChecks(twoPaths(), ol, 0, crossovers(1, 2.5, 4)).get(0);
    assertTrue(Double.isNaN(none.crossoverHz()));
    assertTrue(Double.isNaN(none.phaseLossDeg()));
    assertEquals(2, none.modes().size());
  }

  @Test
  void marginsAlongTheSweepDescribeTheLoopAtEachPoint() {
    Configuration cfg = LoopTestSection.configuration(0.02);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    PlannedPath path = new PlannedPath(new org.flexmargin.model.SpeedSweep(0,
        org.flexmargin.model.AirspeedKind.EQUIVALENT, 30, 60, 3));
    // gain 1 rad per rad/s: |L| is about 1.5 at 0.2 Hz and falls through 1 near 1 Hz
    LoopSpec loop = LoopTestSection.loop(1.0);
    FlutterSolution ol = new PkMethod().solve(m.system(), path, AnalysisOptions.defaults());
    List<ServoPoint> points = ServoMargins.withDefaults().along(m, cfg, loop, path, ol);
    assertEquals(3, points.size());
    for (int p = 0; p < 3; p++) {
      ServoPoint sp = points.get(p);
      assertEquals(p, sp.pathParameter(), 0.0);
      assertEquals(path.at(p), sp.condition());
      LoopMarginResult r = sp.margins();
      // band: 0.01 Hz to 50 Hz (1.5 x 6 Hz is below the 50 Hz floor)
      assertEquals(2 * Math.PI * ServoMargins.MIN_FREQUENCY_HZ, r.omegaMinRadPerS(), 1e-12);
      assertEquals(2 * Math.PI * 50, r.omegaMaxRadPerS(), 1e-9);
      assertTrue(sp.notches().isEmpty(), "no notch in the loop");
      // every crossing found is one of L(j w), evaluated here directly (Brent-refined crossings: 1e-6)
      var l = ServoMargins.loopAt(m, cfg, loop, path.at(p)).brokenLoop();
      assertTrue(!r.gainCrossovers().isEmpty(), "the loop has a gain crossover");
      for (GainCrossover g : r.gainCrossovers()) {
        assertEquals(1.0, l.magnitude(g.omegaRadPerS()), 1e-6);
      }
      for (PhaseCrossover x : r.phaseCrossovers()) {
        assertEquals(Math.PI, Math.abs(l.phaseRad(x.omegaRadPerS())), 1e-6);
        assertEquals(x.magnitude(), l.magnitude(x.omegaRadPerS()), 1e-9 * x.magnitude());
      }
      // with a single feedback path the loop broken at that path is the same return ratio
      assertEquals(1, sp.pathMargins().size());
      LoopMarginResult atPath = sp.pathMargins().get(0);
      assertEquals(r.omegaMinRadPerS(), atPath.omegaMinRadPerS(), 0.0);
      assertEquals(r.omegaMaxRadPerS(), atPath.omegaMaxRadPerS(), 0.0);
      assertEquals(r.gainCrossovers().size(), atPath.gainCrossovers().size());
      assertEquals(r.phaseCrossovers().size(), atPath.phaseCrossovers().size());
      for (int i = 0; i < r.gainCrossovers().size(); i++) {
        assertEquals(r.gainCrossovers().get(i).frequencyHz(), atPath.gainCrossovers().get(i).frequencyHz(),
            1e-6 * r.gainCrossovers().get(i).frequencyHz());
      }
    }
  }
}
