package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.ForkJoinTask;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.TypicalSection;
import org.junit.jupiter.api.Test;

/**
 * A case of typical sections without a loop, swept over four speeds at 3000 m: the open-loop
 * results against closed forms, the stages reported, the flutter rule when the case has
 * requirements, and the pool that runs the configurations.
 */
class CaseSweepTest {
  static final Configuration SECTION = new Configuration("section", MatchedPointsTest.SECTION, null);
  /** The same section with a softer pitch spring (12 Hz instead of 16 Hz). */
  static final Configuration SOFT = new Configuration("soft", new TypicalSection(0.5, 50, 0, 0.1, 0.25, 3, 12,
      2 * Math.PI, 1, 0), null);
  static final SpeedSweep SWEEP = new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 50, 200, 4);
  static final ClearanceRequirements REQ = ClearanceWithoutLoopTest.REQ;

  static AnalysisCase caseOf(List<Configuration> cs, AnalysisOptions options, ClearanceRequirements req) {
    return new AnalysisCase(1, "sections", "", cs, SWEEP, options, List.of(), null, req);
  }

  /**
   * Divergence of the section at q_D = K_alpha / (2 b CL_a (a + 1/2) b) per unit span (lift
   * 2 b q CL_a alpha acting (a + 1/2) b ahead of the elastic axis) with K_alpha = m r^2 b^2
   * omega_alpha^2: q_D = 50 * 0.25 * 0.25 * (32 pi)^2 / (1 * 2 pi * 0.25) = 6400 pi Pa (derived).
   */
  static final double Q_D = 6400 * Math.PI;

  /**
   * In-vacuo frequencies of the section (derived): det(K - lambda M) = 0 with M = m [[1, x b],
   * [x b, r^2 b^2]], K = m diag(omega_h^2, r^2 b^2 omega_a^2) gives (r^2 - x^2) lambda^2 - r^2
   * (omega_h^2 + omega_a^2) lambda + r^2 omega_h^2 omega_a^2 = 0 (b cancels; the sign of the
   * coupling term does not matter).
   */
  static double[] inVacuoHz(double fh, double fa) {
    double r2 = 0.25, x2 = 0.01;
    double wh2 = Math.pow(2 * Math.PI * fh, 2), wa2 = Math.pow(2 * Math.PI * fa, 2);
    double a = r2 - x2, b = -r2 * (wh2 + wa2), c = r2 * wh2 * wa2;
    double disc = Math.sqrt(b * b - 4 * a * c);
    return new double[] {Math.sqrt((-b - disc) / (2 * a)) / (2 * Math.PI), Math.sqrt((-b + disc) / (2 * a))
        / (2 * Math.PI)};
  }

  @Test
  void oneConfigurationAgainstClosedForms() {
    PlannedPath path = new PlannedPath(SWEEP);
    long before = System.nanoTime();
    ConfigurationResult r = CaseSweep.analyse(SECTION, path, caseOf(List.of(SECTION), AnalysisOptions.defaults(),
        null));
    double wall = (System.nanoTime() - before) * 1e-9;
    // the configuration's own wall time lies inside the time measured around the call
    assertTrue(r.elapsedSeconds() > 0 && r.elapsedSeconds() <= wall, r.elapsedSeconds() + " s of " + wall + " s");
    assertEquals("section", r.configuration());
    assertEquals(List.of("mode_1", "mode_2"), r.modeNames());
    double[] f = inVacuoHz(3, 16);
    // round-off of a 2 x 2 eigen-solve
    assertEquals(f[0], r.modeFrequenciesHz()[0], 1e-9 * f[0]);
    assertEquals(f[1], r.modeFrequenciesHz()[1], 1e-9 * f[1]);
    assertEquals(Q_D, r.divergence().dynamicPressurePa(), 1e-6 * Q_D);
    // divergence TAS at the first sweep point's altitude: rho(3000 m) = 0.9093 kg/m^3 (US Standard
    // Atmosphere 1976 table, from memory, four digits: 1e-4 relative, halved by the square root)
    assertEquals(Math.sqrt(2 * Q_D / 0.9093), r.divergenceTasAtSweepStartMps(), 1e-4 * 210);
    // q at the top of the sweep, 1.225 * 200^2 / 2 = 24 500 Pa, exceeds q_D = 20 106 Pa: the sweep
    // confirms the divergence
    assertTrue(r.divergenceConfirmedPa().isPresent());
    assertEquals(FlutterMethodKind.PK, r.flutter().method());
    // 200 m/s EAS at 3000 m is Mach 0.7 (TAS 232 m/s, a = 328.6 m/s): beyond strip theory's Mach 0.3
    assertTrue(r.flutter().warnings().stream().anyMatch(w -> w.contains("strip theory with Theodorsen's function "
        + "is incompressible")), r.flutter().warnings().toString());
    assertNull(r.servo());
    assertNull(r.clearance());
  }

  @Test
  void notesOnReSolvesUnreliableTrackingAndAerodynamicRange() {
    // hand-made solutions over sea-level grid speeds 50, 100, 150, 200 m/s (InstabilityFindingsTest)
    PlannedPath planned = new PlannedPath(new SpeedSweep(0, AirspeedKind.EQUIVALENT, 50, 200, 4));
    var b = InstabilityFindingsTest.branch("bending", new double[] {-0.1, -0.1, -0.1, -0.1},
        InstabilityFindingsTest.ALL);
    var clean = new org.flexmargin.flutter.FlutterSolution(FlutterMethodKind.PK, List.of(b), List.of(),
        new org.flexmargin.flutter.SolverDiagnostics(1, 1, 1, 0, 0, 1, 0), List.of("solver note"));
    // nothing to add: the same solution
    assertSame(clean, CaseSweep.withNotes(clean, planned, planned, List.of()));
    assertEquals(List.of("solver note", "range"), CaseSweep.withNotes(clean, planned, planned, List.of("range"))
        .warnings());
    // re-solved on a grid four times finer: (4 - 1) x 4 + 1 = 13 points
    assertEquals(List.of("solver note", "mode tracking was in doubt on the planned grid: re-solved with every "
        + "interval split in 4 (13 grid points)"), CaseSweep.withNotes(clean, planned, planned.refined(4), List.of())
        .warnings());
    // still in doubt from path parameter 2.5 (175 m/s EAS): trusted to grid point 1, 100 m/s EAS
    var doubt = InstabilityFindingsTest.solution(FlutterMethodKind.PK, List.of(b), List.of(), 2.5);
    var noted = CaseSweep.withNotes(doubt, planned, planned, List.of());
    assertEquals(List.of("UNRELIABLE: mode tracking is still in doubt from 175.00 m/s EAS; findings above 100.00 m/s "
        + "EAS are marked unreliable and no flutter-free speed is claimed beyond it"), noted.warnings());
    assertSame(doubt.diagnostics(), noted.diagnostics());
    assertEquals(doubt.branches(), noted.branches());
    assertEquals(FlutterMethodKind.PK, noted.method());
  }

  @Test
  void theExactLoopModelKeepsModesAndEquations() {
    ConfigurationModel m = ConfigurationModel.of(SECTION);
    ConfigurationModel exact = m.withExactLoop();
    assertSame(m.modes(), exact.modes());
    assertSame(m.system(), exact.system());
    assertTrue(m.loopAero().interpolated());
    assertFalse(exact.loopAero().interpolated());
    assertSame(m.system().aero(), exact.loopAero().source());
  }

  @Test
  void aSweepBelowTheDivergencePressureDoesNotConfirmIt() {
    // top q = 1.225 * 150^2 / 2 = 13 781 Pa < q_D; Mach at most 0.53 at 3000 m
    SpeedSweep slow = new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 50, 150, 3);
    AnalysisCase c = new AnalysisCase(1, "sections", "", List.of(SECTION), slow, AnalysisOptions.defaults(),
        List.of());
    assertTrue(CaseSweep.analyse(SECTION, new PlannedPath(slow), c).divergenceConfirmedPa().isEmpty());
  }

  @Test
  void theMethodFollowsTheOptions() {
    PlannedPath path = new PlannedPath(SWEEP);
    for (FlutterMethodKind m : FlutterMethodKind.values()) {
      AnalysisCase c = caseOf(List.of(SECTION), AnalysisOptions.defaults().withMethod(m), null);
      assertEquals(m, CaseSweep.analyse(SECTION, path, c).flutter().method());
    }
  }

  @Test
  void requirementsWithoutALoopGiveTheFlutterRuleAndOneMoreStage() {
    List<String> stages = Collections.synchronizedList(new ArrayList<>());
    AnalysisCase c = caseOf(List.of(SECTION), AnalysisOptions.defaults(), REQ);
    ConfigurationResult r = CaseSweep.analyse(SECTION, new PlannedPath(SWEEP), c,
        (name, stage) -> stages.add(name + ": " + stage));
    assertEquals(List.of("section: divergence and flutter", "section: clearance"), stages);
    ClearanceResult cr = r.clearance();
    assertTrue(cr.points().isEmpty());
    // divergence EAS sqrt(2 q_D / rho0) = 181.2 m/s against 1.15 V_L = 172.5 m/s: met
    ClearanceCheck div = cr.flutter().checks().stream().filter(x -> x.kind() == CheckKind.DIVERGENCE_SPEED)
        .findFirst().orElseThrow();
    assertEquals(Math.sqrt(2 * Q_D / 1.225), div.achievedValue(), 1e-6 * 181);
    assertTrue(div.passed());
    assertEquals(REQ.source(), cr.requirementsSource());
  }

  @Test
  void runKeepsCaseOrderAndTellsOfEachConfigurationOnceWhenAllItsStagesAreDone() {
    AnalysisCase c = caseOf(List.of(SOFT, SECTION), AnalysisOptions.defaults(), REQ);
    List<String> done = Collections.synchronizedList(new ArrayList<>());
    SweepResult two = new CaseSweep(2).run(c, (String name) -> done.add(name));
    assertEquals(List.of("soft", "section"), two.configurations().stream().map(ConfigurationResult::configuration)
        .toList());
    assertEquals(List.of("section", "soft"), done.stream().sorted().toList());
    assertSame(c, two.analysisCase());
    assertEquals("speed sweep at 3000 m, EAS 50.0 to 200.0 m/s, 4 points", two.pathDescription());
    // the softer pitch spring diverges lower: q_D scales with omega_alpha^2, (12/16)^2 = 0.5625
    assertEquals(0.5625 * Q_D, two.configurations().get(0).divergence().dynamicPressurePa(), 1e-6 * Q_D);
    // one thread gives the same numbers
    SweepResult one = new CaseSweep(1).run(c, SweepProgress.NONE);
    for (int i = 0; i < 2; i++) {
      List<Double> a = one.configurations().get(i).flutter().crossings().stream()
          .map(x -> x.condition().speedEasMps()).toList();
      List<Double> b = two.configurations().get(i).flutter().crossings().stream()
          .map(FlutterCrossing::condition).map(x -> x.speedEasMps()).toList();
      assertEquals(a, b);
    }
  }

  /** Whether t is x or an exception of the same type wrapping x (the pool rethrows such copies). */
  static boolean isOrWraps(Throwable t, Throwable x) {
    return t == x || t.getClass() == x.getClass() && t.getCause() == x;
  }

  @Test
  void failuresInsideTheSweepReachTheCaller() {
    AnalysisCase c = caseOf(List.of(SECTION), AnalysisOptions.defaults(), null);
    IllegalArgumentException stop = new IllegalArgumentException("stop");
    IllegalArgumentException thrown = assertThrows(IllegalArgumentException.class, () -> new CaseSweep(1).run(c,
        (n, s) -> {
          throw stop;
        }));
    assertTrue(isOrWraps(thrown, stop), thrown.toString());
    Error broken = new Error("broken");
    IllegalStateException wrapped = assertThrows(IllegalStateException.class, () -> new CaseSweep(1).run(c,
        (n, s) -> {
          throw broken;
        }));
    assertTrue(isOrWraps(wrapped.getCause(), broken), wrapped.toString());
  }

  @Test
  void otherWorkRunsOnAPoolOfTheSweepsThreads() {
    assertEquals(3, new CaseSweep(3).inPool(() -> ForkJoinTask.getPool().getParallelism()));
    assertEquals("value", new CaseSweep(1).inPool(() -> "value"));
    IllegalArgumentException bad = new IllegalArgumentException("bad");
    assertSame(bad, assertThrows(IllegalArgumentException.class, () -> new CaseSweep(1).inPool(() -> {
      throw bad;
    })));
    StackOverflowError deep = new StackOverflowError("deep");
    assertSame(deep, assertThrows(StackOverflowError.class, () -> new CaseSweep(1).inPool(() -> {
      throw deep;
    })));
  }

  @Test
  void threadsAreValidated() {
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new CaseSweep(0));
    assertEquals("threads must be >= 1, got 0", e.getMessage());
    assertEquals(1, new CaseSweep(1).inPool(() -> ForkJoinTask.getPool().getParallelism()));
  }
  @Test
  void eachConfigurationIsHandedOverInsideThePoolAsSoonAsItIsDone() {
    AnalysisCase c = caseOf(List.of(SOFT, SECTION), AnalysisOptions.defaults(), null);
    java.util.Map<String, ConfigurationResult> handed = new java.util.concurrent.ConcurrentHashMap<>();
    java.util.Set<Integer> parallelism = java.util.concurrent.ConcurrentHashMap.newKeySet();
    SweepResult r = new CaseSweep(2).run(c, SweepProgress.NONE, done -> {
      handed.put(done.configuration(), done);
      parallelism.add(ForkJoinTask.getPool().getParallelism());
    });
    assertEquals(2, handed.size());
    for (ConfigurationResult done : r.configurations()) {
      assertSame(done, handed.get(done.configuration()), done.configuration());
    }
    // on the sweep's own workers, so that work started there uses the sweep's threads
    assertEquals(java.util.Set.of(2), parallelism);
    IllegalStateException e = assertThrows(IllegalStateException.class,
        () -> new CaseSweep(1).run(c, SweepProgress.NONE, done -> {
          throw new IllegalStateException("charts of " + done.configuration());
        }));
    // the pool may wrap the exception in a copy of its own type across threads
    assertTrue(e.getMessage().endsWith("charts of soft"), e.getMessage());
  }
  @Test
  void workAlongsideRunsInTheSweepsPoolAndIsDoneWhenTheSweepIs() {
    AnalysisCase c = caseOf(List.of(SECTION), AnalysisOptions.defaults(), null);
    int[] poolThreads = {0};
    boolean[] done = {false};
    SweepResult r = new CaseSweep(3).run(c, SweepProgress.NONE, x -> { }, () -> {
      poolThreads[0] = ForkJoinTask.getPool().getParallelism();
      done[0] = true;
    });
    assertEquals(1, r.configurations().size());
    assertTrue(done[0], "finished before the sweep returns");
    assertEquals(3, poolThreads[0], "no thread beyond the sweep's own");
    IllegalStateException e = assertThrows(IllegalStateException.class,
        () -> new CaseSweep(1).run(c, SweepProgress.NONE, x -> { }, () -> {
          throw new IllegalStateException("time-domain check failed");
        }));
    assertTrue(e.getMessage().endsWith("time-domain check failed"), e.getMessage());
  }
}
