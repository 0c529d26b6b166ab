package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.StructuralModeAssessment;
import org.flexmargin.clearance.StructuralStabilisation;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.loop.FirstOrderLag;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.MarginDirection;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.SpeedRegime;
import org.junit.jupiter.api.Test;

/**
 * The rate-saturation line on hand-made margins: with a first-order actuator F(s) = 1 / (1 + s tau)
 * the elevator rate under a command A sin(w t) is A w |F(j w)| = A w / sqrt(1 + (w tau)^2) in the
 * steady state (closed form), so the line is A_open = R sqrt(1 + (w tau)^2) / w, and with the loop
 * closed at a phase crossover (L = -|L|) the injection reaching the command is 1 / (1 - |L|) of
 * itself, so A_closed = A_open |1 - |L||.
 */
class RateSaturationUnitTest {
  /** Actuator bandwidth 10 Hz: tau = 1 / (2 pi 10) s. */
  private static final double TAU = 1 / (2 * Math.PI * 10);
  /** Rate limit 1 rad/s (57.3 deg/s). */
  private static final double RATE = 1.0;
  private static final ActuatorSpec ACTUATOR = new ActuatorSpec(ActuatorOrder.FIRST, 10, 0.7, RATE,
      Double.POSITIVE_INFINITY);
  private static final FirstOrderLag FORWARD = new FirstOrderLag(TAU);

  /** Closed-form line A_open = R sqrt(1 + (w tau)^2) / w at a frequency in Hz. */
  private static double openLine(double hz) {
    double w = 2 * Math.PI * hz;
    return RATE * Math.sqrt(1 + w * w * TAU * TAU) / w;
  }

  static PhaseCrossover crossover(double hz, double gainMarginDb) {
    double magnitude = Math.pow(10, -gainMarginDb / 20);
    return new PhaseCrossover(2 * Math.PI * hz, hz, magnitude, gainMarginDb,
        magnitude < 1 ? MarginDirection.GAIN_INCREASE : MarginDirection.GAIN_REDUCTION);
  }

  static ServoPoint point(PhaseCrossover... crossovers) {
    LoopMarginResult m = new LoopMarginResult(0.06, 300, List.of(), List.of(crossovers), null, null, null, null);
    return new ServoPoint(0, null, m, List.of(), List.of());
  }

  private static StructuralModeAssessment mode(String name, double peakDb, double peakHz) {
    return new StructuralModeAssessment(name, peakHz, 0.9 * peakHz, 1.1 * peakHz, peakDb, peakHz, 90, peakHz, -6, 45,
        StructuralStabilisation.GAIN_STABILISED, 10);
  }

  private static PointAssessment assessment(double firstHz, StructuralModeAssessment... modes) {
    return new PointAssessment(100, SpeedRegime.NORMAL_ENVELOPE, firstHz, null, List.of(), List.of(modes));
  }

  @Test
  void aCrossoverMarginThatRoundsToZeroIsWrittenWithoutASign() {
    // |L| = 10^(0.004/20): margin -0.004 dB, below the two decimals shown
    for (double db : new double[] {-0.004, 0.004}) {
      ServoPoint p = point(crossover(12, db));
      String basis = RateSaturation.at(p, 8, null, FORWARD, ACTUATOR, true).orElseThrow().basis();
      assertTrue(basis.contains("(|L| = 1.000, gain margin 0.00 dB)"), basis);
    }
    String basis = RateSaturation.at(point(crossover(12, -0.006)), 8, null, FORWARD, ACTUATOR, true)
        .orElseThrow().basis();
    assertTrue(basis.contains("gain margin -0.01 dB"), basis);
    // exactly half of the last shown digit keeps its sign (it rounds away from zero)
    String half = RateSaturation.at(point(crossover(12, -0.005)), 8, null, FORWARD, ACTUATOR, true)
        .orElseThrow().basis();
    assertTrue(half.contains("gain margin -0.01 dB"), half);
  }

  @Test
  void theLineAtTheCrossoverClosestToMinusOneFollowsTheActuatorGain() {
    // band edge 8 Hz; crossovers: 3 Hz (rigid, below the band, though nearest -1), 8 Hz exactly at
    // the edge with +1 dB, 12 Hz with -3 dB, 20 Hz with +1 dB (a tie: the first found stays)
    ServoPoint p = point(crossover(3, 0.5), crossover(8, 1), crossover(12, -3), crossover(20, -1));
    Optional<RateSaturation.Line> line = RateSaturation.at(p, 8, null, FORWARD, ACTUATOR, true);
    assertTrue(line.isPresent());
    RateSaturation.Line l = line.get();
    assertEquals(8, l.frequencyHz(), 0.0);
    double magnitude = Math.pow(10, -1.0 / 20);
    assertEquals(magnitude, l.loopMagnitude(), 1e-15);
    // |F(j w)| = 1 / sqrt(1 + (w tau)^2) = 1 / sqrt(1 + 0.64) at 8 Hz (w tau = 8 / 10)
    assertEquals(1 / Math.sqrt(1.64), l.elevatorPerCommand(), 1e-14);
    // round-off of a few operations: 1e-14 relative
    assertEquals(openLine(8), l.commandAmplitudeRad(), 1e-14 * openLine(8));
    assertEquals(openLine(8) * (1 - magnitude), l.closedLoopInjectionAmplitudeRad(), 1e-14 * openLine(8));
    assertTrue(l.basis().startsWith("structural phase crossover closest to -1 (|L| = 0.891, gain margin 1.00 dB)"),
        l.basis());
  }

  @Test
  void aGainReductionCrossoverIsJudgedByItsDistanceFromZeroDecibels() {
    // -1 dB is nearer to -1 than +3 dB: |L| = 10^(1/20) > 1 and A_closed = A_open (|L| - 1)
    ServoPoint p = point(crossover(12, 3), crossover(16, -1));
    RateSaturation.Line l = RateSaturation.at(p, 5, null, FORWARD, ACTUATOR, true).orElseThrow();
    assertEquals(16, l.frequencyHz(), 0.0);
    double magnitude = Math.pow(10, 1.0 / 20);
    assertEquals(openLine(16) * (magnitude - 1), l.closedLoopInjectionAmplitudeRad(), 1e-14 * openLine(16));
    // the order of the list does not matter
    ServoPoint q = point(crossover(16, -1), crossover(12, 3));
    assertEquals(16, RateSaturation.at(q, 5, null, FORWARD, ACTUATOR, true).orElseThrow().frequencyHz(), 0.0);
  }

  @Test
  void withoutACrossoverInTheBandTheHighestStructuralPeakIsUsed() {
    // the only crossover lies below the band edge; peaks -2 dB at 9 Hz and -8 dB at 14 Hz
    ServoPoint p = point(crossover(2, 6));
    PointAssessment a = assessment(7, mode("wing_bending", -8, 14), mode("fuselage_bending", -2, 9),
        mode("wing_torsion", -5, 21));
    RateSaturation.Line l = RateSaturation.at(p, 7, a, FORWARD, ACTUATOR, true).orElseThrow();
    assertEquals(9, l.frequencyHz(), 0.0);
    assertEquals(openLine(9), l.commandAmplitudeRad(), 1e-14 * openLine(9));
    assertTrue(Double.isNaN(l.loopMagnitude()));
    assertTrue(Double.isNaN(l.closedLoopInjectionAmplitudeRad()), "A_closed needs |L|");
    assertEquals("highest structural peak, mode fuselage_bending (-2.0 dB); no structural phase crossover",
        l.basis());
  }

  @Test
  void ofTwoEqualPeaksTheFirstListedIsUsed() {
    ServoPoint p = point();
    PointAssessment a = assessment(7, mode("wing_bending", -4, 14), mode("fuselage_bending", -4, 9));
    assertEquals(14, RateSaturation.at(p, 7, a, FORWARD, ACTUATOR, true).orElseThrow().frequencyHz(), 0.0);
  }

  @Test
  void noStructuralFrequencyGivesNoLine() {
    ServoPoint p = point(crossover(2, 6));
    assertTrue(RateSaturation.at(p, 7, null, FORWARD, ACTUATOR, true).isEmpty());
    assertTrue(RateSaturation.at(p, 7, assessment(7), FORWARD, ACTUATOR, true).isEmpty());
    assertTrue(RateSaturation.at(point(), 7, null, FORWARD, ACTUATOR, true).isEmpty());
  }

  @Test
  void anUnstableClosedLoopHasNoSteadyStateInjection() {
    ServoPoint p = point(crossover(12, -2));
    RateSaturation.Line l = RateSaturation.at(p, 5, null, FORWARD, ACTUATOR, false).orElseThrow();
    assertEquals(openLine(12), l.commandAmplitudeRad(), 1e-14 * openLine(12));
    assertTrue(Double.isNaN(l.closedLoopInjectionAmplitudeRad()));
    assertTrue(l.basis().endsWith("; closed loop unstable here: no steady state with the loop closed"), l.basis());
  }

  private static LoopSpec loop(ActuatorSpec actuator) {
    return new LoopSpec(actuator, List.of(new SensorSpec("gyro", SensorKind.PITCH_RATE_GYRO, "gyro", 0, 0)),
        List.of(new FeedbackPath("gyro", 0.1, 0, List.of(), null)), 0, 0, 2);
  }

  private static BranchCurve branch(String name, double[] hz, boolean[] ok) {
    int n = hz.length;
    return new BranchCurve(name, new double[n], new double[n], new double[n], hz, new double[n], new double[n],
        new double[n], ok);
  }

  private static FlutterSolution solution(BranchCurve... b) {
    return new FlutterSolution(FlutterMethodKind.PK, List.of(b), List.of(), new SolverDiagnostics(0, 0, 0, 0, 0, 1, 0),
        List.of());
  }

  private static ConfigurationResult result(FlutterSolution f, double[] modesHz, ServoResult servo,
      ClearanceResult clearance) {
    return new ConfigurationResult("c", List.of(), modesHz, "", null, OptionalDouble.empty(), 0, f, 0, servo,
        clearance);
  }

  private static ClosedLoopPoint closedPoint(double maxReal) {
    return new ClosedLoopPoint(0, null, List.of(new ClosedLoopRoot(maxReal, 30, "x")), 2);
  }

  @Test
  void alongTheSweepEachPointUsesItsOwnBandEdgeAndStability() {
    // point 0: crossover at 6 Hz inside the band (first mode 5 Hz), closed loop stable;
    // point 1: same crossover but the first mode has risen to 7 Hz (outside the band: no line,
    // no assessment); point 2: closed loop unstable
    FlutterSolution f = solution(branch("a", new double[] {5, 7, 5}, new boolean[] {true, true, true}),
        branch("b", new double[] {9, 9, 9}, new boolean[] {true, true, true}));
    ServoPoint sp = point(crossover(6, 2));
    ClosedLoopResult cl = new ClosedLoopResult(List.of(closedPoint(-1), closedPoint(-1), closedPoint(0.5)), List.of(),
        "", 0, List.of(), List.of());
    ConfigurationResult c = result(f, new double[] {4, 9}, new ServoResult(List.of(sp, sp, sp), cl), null);
    List<Optional<RateSaturation.Line>> lines = RateSaturation.along(c, loop(ACTUATOR));
    assertEquals(3, lines.size());
    // the loop's own forward chain is the first-order actuator alone (no hold, no delay)
    assertEquals(openLine(6), lines.get(0).orElseThrow().commandAmplitudeRad(), 1e-14 * openLine(6));
    assertFalse(Double.isNaN(lines.get(0).orElseThrow().closedLoopInjectionAmplitudeRad()));
    assertTrue(lines.get(1).isEmpty());
    assertTrue(Double.isNaN(lines.get(2).orElseThrow().closedLoopInjectionAmplitudeRad()));
    // a closed-loop maximum real part of exactly 0 is not stable
    ClosedLoopResult marginal = new ClosedLoopResult(List.of(closedPoint(0)), List.of(), "", 0, List.of(), List.of());
    ConfigurationResult m = result(f, new double[] {4, 9}, new ServoResult(List.of(sp), marginal), null);
    assertTrue(Double.isNaN(RateSaturation.along(m, loop(ACTUATOR)).get(0).orElseThrow()
        .closedLoopInjectionAmplitudeRad()));
  }

  @Test
  void alongTheSweepThePeakFallbackUsesTheClearanceOfThatPointOnly() {
    // no crossover in the band at either point; the clearance assessed point 0 only (band edge
    // 5 Hz, peak of mode "bend" at 9 Hz): a line at point 0, none at point 1
    FlutterSolution f = solution(branch("a", new double[] {5, 5}, new boolean[] {true, true}));
    ServoPoint sp = point(crossover(2, 6));
    ClosedLoopResult cl = new ClosedLoopResult(List.of(closedPoint(-1), closedPoint(-1)), List.of(), "", 0, List.of(),
        List.of());
    ClearanceResult clearance = new ClearanceResult(List.of(assessment(5, mode("bend", -3, 9))), List.of(), null, "",
        List.of());
    ConfigurationResult c = result(f, new double[] {4}, new ServoResult(List.of(sp, sp), cl), clearance);
    List<Optional<RateSaturation.Line>> lines = RateSaturation.along(c, loop(ACTUATOR));
    assertEquals(2, lines.size());
    assertEquals(9, lines.get(0).orElseThrow().frequencyHz(), 0.0);
    assertEquals(openLine(9), lines.get(0).orElseThrow().commandAmplitudeRad(), 1e-14 * openLine(9));
    assertTrue(lines.get(1).isEmpty());
  }

  @Test
  void noLineWithoutALoopOrARateLimit() {
    FlutterSolution f = solution(branch("a", new double[] {5}, new boolean[] {true}));
    ServoPoint sp = point(crossover(6, 2));
    ClosedLoopResult cl = new ClosedLoopResult(List.of(closedPoint(-1)), List.of(), "", 0, List.of(), List.of());
    ConfigurationResult withLoop = result(f, new double[] {4}, new ServoResult(List.of(sp), cl), null);
    ConfigurationResult withoutLoop = result(f, new double[] {4}, null, null);
    assertTrue(RateSaturation.along(withoutLoop, loop(ACTUATOR)).isEmpty());
    assertTrue(RateSaturation.along(withLoop, null).isEmpty());
    assertTrue(RateSaturation.along(withLoop, loop(new ActuatorSpec(ActuatorOrder.FIRST, 10, 0.7))).isEmpty());
    assertEquals(1, RateSaturation.along(withLoop, loop(ACTUATOR)).size());
  }

  @Test
  void theBandEdgeComesFromTheClearanceThenTheConvergedRootsThenTheModes() {
    // branch a converged at points 0 and 2 only; b everywhere; a non-oscillating root (0 Hz) is skipped
    FlutterSolution f = solution(branch("a", new double[] {3, 3, 0}, new boolean[] {true, false, true}),
        branch("b", new double[] {6, 5, 8}, new boolean[] {true, true, true}));
    ConfigurationResult c = result(f, new double[] {4, 7}, null, null);
    assertEquals(3, RateSaturation.firstAeroelasticHz(c, 0), 0.0);
    assertEquals(5, RateSaturation.firstAeroelasticHz(c, 1), 0.0);
    assertEquals(8, RateSaturation.firstAeroelasticHz(c, 2), 0.0);
    // beyond the branches' length: the lowest in-vacuo frequency
    assertEquals(4, RateSaturation.firstAeroelasticHz(c, 3), 0.0);
    // nothing known at all: 1 Hz
    assertEquals(1, RateSaturation.firstAeroelasticHz(result(solution(), new double[0], null, null), 0), 0.0);
    // with a clearance assessment at the point, its band edge; beyond its points, the roots again
    ClearanceResult clearance = new ClearanceResult(List.of(assessment(4.5)), List.of(), null, "", List.of());
    ConfigurationResult cc = result(f, new double[] {4, 7}, null, clearance);
    assertEquals(4.5, RateSaturation.firstAeroelasticHz(cc, 0), 0.0);
    assertEquals(5, RateSaturation.firstAeroelasticHz(cc, 1), 0.0);
  }
}
