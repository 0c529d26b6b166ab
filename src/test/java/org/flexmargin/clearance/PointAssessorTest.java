package org.flexmargin.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.loop.FirstOrderLag;
import org.flexmargin.loop.Gain;
import org.flexmargin.loop.Integrator;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.LoopMargins;
import org.flexmargin.loop.SeriesBlock;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.loop.TransferFunctionBlock;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.RequirementPresets;
import org.flexmargin.model.SpeedRegime;
import org.junit.jupiter.api.Test;

/**
 * Point assessment on loops whose margins are known in closed form, against the recalled preset
 * (MIL-F-9490D table from memory, docs/validation.md 10.1: rigid-body band 6 dB/45 deg in the normal
 * envelope, 4.5 dB/30 deg up to V_L, 0/0 up to 1.15 V_L).
 */
class PointAssessorTest {
  /** Invented: V0max 120 m/s, V_L 150 m/s EAS. */
  private static final ClearanceRequirements REQ =
      RequirementPresets.recalledMilitaryAndTransport(120, 150);
  /** First aeroelastic mode at 3 Hz: every crossing below is rigid-body (0.06 Hz and above). */
  private static final double F1_HZ = 3.0;
  private static final LoopMargins MARGINS = new LoopMargins();
  /**
   * Margins are solved by Brent's method to ~1e-13 in ln w (loop package); 1e-7 dB / deg bounds
   * the propagated error with room and still catches any error in the check arithmetic.
   */
  private static final double TOL = 1e-7;

  /** K/(s(s+1)(s+2)) as blocks. */
  private static LinearBlock thirdOrder(double k) {
    return SeriesBlock.of(new Gain(k / 2), new Integrator(1), new FirstOrderLag(1),
        new FirstOrderLag(0.5));
  }

  /** Positive real root of an ascending-coefficient polynomial, Commons Math Laguerre. */
  private static double positiveRoot(double... ascending) {
    for (Complex z : new LaguerreSolver(1e-15).solveAllComplex(ascending, 1.0)) {
      if (Math.abs(z.getImaginary()) < 1e-9 && z.getReal() > 0) {
        return z.getReal();
      }
    }
    throw new AssertionError("no positive root");
  }

  /** Closed-form PM of K/(s(s+1)(s+2)): 90 - atan w_c - atan(w_c/2), w_c^2 = u from u^3+5u^2+4u-K^2. */
  private static double thirdOrderPhaseMargin(double k) {
    double wc = Math.sqrt(positiveRoot(-k * k, 4, 5, 1));
    return 90 - Math.toDegrees(Math.atan(wc) + Math.atan(wc / 2));
  }

  private static ClearanceCheck only(PointAssessment a, CheckKind kind) {
    List<ClearanceCheck> c = a.checks().stream().filter(x -> x.kind() == kind).toList();
    assertEquals(1, c.size(), a.checks().toString());
    return c.get(0);
  }

  @Test
  void thirdOrderLoopInTheNormalEnvelopeFailsOnPhaseMargin() {
    // K = 2: GM = 20 log10(6/K) = 9.54 dB at w = sqrt 2 (0.2251 Hz) (Ogata, Modern Control
    // Engineering, K/(s(s+1)(s+2)) example); PM = 32.6 deg (closed form above) < 45 deg.
    double k = 2;
    LoopMarginResult m = MARGINS.analyse(thirdOrder(k), 0.01, 100);
    PointAssessment a = PointAssessor.assess(REQ, 100, F1_HZ, m, List.of(), null);
    assertEquals(SpeedRegime.NORMAL_ENVELOPE, a.regime());
    ClearanceCheck gm = only(a, CheckKind.GAIN_INCREASE_MARGIN);
    assertEquals(6.0, gm.requiredValue(), 0.0);
    assertEquals(20 * Math.log10(6 / k), gm.achievedValue(), TOL);
    assertEquals(20 * Math.log10(6 / k) - 6, gm.excess(), TOL);
    assertEquals(Math.sqrt(2) / (2 * Math.PI), gm.frequencyHz(), 1e-9);
    assertEquals("rigid_body", gm.subject());
    assertEquals(CheckUnit.DECIBEL, gm.unit());
    assertTrue(gm.passed());
    ClearanceCheck pm = only(a, CheckKind.PHASE_MARGIN);
    double pmDeg = thirdOrderPhaseMargin(k);
    assertEquals(45.0, pm.requiredValue(), 0.0);
    assertEquals(pmDeg, pm.achievedValue(), TOL);
    assertFalse(pm.passed());
    assertEquals((pmDeg - 45) / 45, pm.normalisedExcess(), TOL);
    assertTrue(only(a, CheckKind.CLOSED_LOOP_STABILITY).passed());
    assertFalse(a.passed());
    assertEquals(pm, a.governing().orElseThrow());
    assertEquals(List.of(pm), a.failures());
    assertEquals(pmDeg - 45, a.worstExcess(new CheckKey(CheckKind.PHASE_MARGIN, "rigid_body"))
        .getAsDouble(), TOL);
    assertTrue(a.worstExcess(new CheckKey(CheckKind.PHASE_MARGIN, "aeroelastic")).isEmpty());
  }

  @Test
  void sameLoopPassesTheReducedMarginsUpToLimitSpeedAndStabilityBeyond() {
    LoopMarginResult m = MARGINS.analyse(thirdOrder(2), 0.01, 100);
    // up to V_L: 4.5 dB / 30 deg (from memory) - 9.54 dB and 32.6 deg pass
    PointAssessment atLimit = PointAssessor.assess(REQ, 150, F1_HZ, m, List.of(), null);
    assertEquals(SpeedRegime.UP_TO_LIMIT_SPEED, atLimit.regime());
    assertEquals(4.5, only(atLimit, CheckKind.GAIN_INCREASE_MARGIN).requiredValue(), 0.0);
    assertEquals(30.0, only(atLimit, CheckKind.PHASE_MARGIN).requiredValue(), 0.0);
    assertTrue(atLimit.passed());
    // up to 1.15 V_L: stable at nominal gain and phase (0 dB, 0 deg)
    PointAssessment above = PointAssessor.assess(REQ, 160, F1_HZ, m, List.of(), null);
    assertEquals(0.0, only(above, CheckKind.PHASE_MARGIN).requiredValue(), 0.0);
    assertTrue(above.passed());
    // beyond 1.15 V_L: nothing required
    PointAssessment beyond = PointAssessor.assess(REQ, 180, F1_HZ, m, List.of(), null);
    assertEquals(SpeedRegime.BEYOND, beyond.regime());
    assertTrue(beyond.checks().isEmpty());
    assertTrue(beyond.governing().isEmpty());
  }

  @Test
  void unstableLoopFailsItsStabilityAndReportsAReductionMargin() {
    // K = 8 > 6 (Routh: K/(s(s+1)(s+2)) is stable iff K < 6): |L| = 8/6 at the phase crossover,
    // so the gain must fall by 20 log10(6/8) = -2.50 dB; required -6 dB: fails.
    double k = 8;
    LoopMarginResult m = MARGINS.analyse(thirdOrder(k), 0.01, 100);
    assertEquals(ClosedLoopStability.UNSTABLE, m.closedLoopStability());
    PointAssessment a = PointAssessor.assess(REQ, 100, F1_HZ, m, List.of(), null);
    ClearanceCheck st = only(a, CheckKind.CLOSED_LOOP_STABILITY);
    assertFalse(st.passed());
    ClearanceCheck red = only(a, CheckKind.GAIN_REDUCTION_MARGIN);
    assertEquals(-6.0, red.requiredValue(), 0.0);
    assertEquals(20 * Math.log10(6 / k), red.achievedValue(), TOL);
    assertEquals(RequiredSense.AT_MOST, red.sense());
    assertFalse(red.passed());
    assertEquals(-6 - 20 * Math.log10(6 / k), red.excess(), TOL);
  }

  @Test
  void conditionallyStableLoopChecksItsGainReductionMargin() {
    // L = K (s+1)^2 / s^3: phase -180 deg at w = 1 where |L| = 2K (derived by hand); closed loop
    // stable iff K > 1/2 (Routh). K = 2: margin -20 log10 4 = -12.04 dB <= -6: passes.
    // K = 0.7: -20 log10 1.4 = -2.92 dB: the loop may lose only 2.9 dB, fails the 6 dB.
    for (double k : new double[] {2, 0.7}) {
      LinearBlock loop = new TransferFunctionBlock(new double[] {k, 2 * k, k},
          new double[] {1, 0, 0, 0});
      LoopMarginResult m = MARGINS.analyse(loop, 0.01, 100);
      PointAssessment a = PointAssessor.assess(REQ, 100, F1_HZ, m, List.of(), null);
      ClearanceCheck red = only(a, CheckKind.GAIN_REDUCTION_MARGIN);
      double gm = -20 * Math.log10(2 * k);
      assertEquals(gm, red.achievedValue(), TOL);
      assertEquals(1 / (2 * Math.PI), red.frequencyHz(), 1e-9);
      assertEquals(-6 - gm, red.excess(), TOL);
      assertEquals(k > 1.9, red.passed());
      assertTrue(only(a, CheckKind.CLOSED_LOOP_STABILITY).passed());
    }
  }

  @Test
  void structuralModesAreCheckedInTheEnvelopeAndUpToLimitSpeedOnly() {
    // K = 1 third-order loop; a mode at 5 Hz: over 4.5..5.5 Hz |L| = 1/(w sqrt(w^2+1)
    // sqrt(w^2+4)) falls monotonically, so the peak is at 4.5 Hz (closed form), about -86.9 dB:
    // gain-stabilised. Tolerance 1e-9 dB: the band edge is a sample.
    LinearBlock loop = thirdOrder(1);
    LoopMarginResult m = MARGINS.analyse(loop, 0.01, 100);
    List<ModeFrequency> modes = List.of(new ModeFrequency("fuselage bending", 5.0));
    PointAssessment a = PointAssessor.assess(REQ, 100, F1_HZ, m, modes, loop);
    ClearanceCheck s = only(a, CheckKind.STRUCTURAL_MODE);
    double w = 2 * Math.PI * 4.5;
    double peakDb = -20 * Math.log10(w * Math.sqrt(w * w + 1) * Math.sqrt(w * w + 4));
    assertEquals(peakDb, s.achievedValue(), 1e-9);
    assertEquals(-6.0, s.requiredValue(), 0.0);
    assertEquals(4.5, s.frequencyHz(), 1e-9);
    assertEquals("fuselage bending", s.subject());
    assertTrue(s.passed());
    assertEquals(StructuralStabilisation.GAIN_STABILISED, a.structuralModes().get(0).status());
    assertEquals(1, PointAssessor.assess(REQ, 150, F1_HZ, m, modes, loop).structuralModes().size());
    PointAssessment above = PointAssessor.assess(REQ, 160, F1_HZ, m, modes, loop);
    assertTrue(above.structuralModes().isEmpty());
    assertTrue(above.checks().stream().noneMatch(c -> c.kind() == CheckKind.STRUCTURAL_MODE));
    assertThrows(InvalidInputException.class,
        () -> PointAssessor.assess(REQ, 100, F1_HZ, m, modes, null));
  }

  @Test
  void structuralModesAloneAreTheStructuralChecksOfTheFullAssessment() {
    // the same K = 1 loop and 5 Hz mode as above: peak at the 4.5 Hz band edge, closed form
    LinearBlock loop = thirdOrder(1);
    List<ModeFrequency> modes = List.of(new ModeFrequency("fuselage bending", 5.0));
    PointAssessment a = PointAssessor.assessStructuralModes(REQ, 100, F1_HZ, modes, loop);
    ClearanceCheck s = only(a, CheckKind.STRUCTURAL_MODE);
    double w = 2 * Math.PI * 4.5;
    assertEquals(-20 * Math.log10(w * Math.sqrt(w * w + 1) * Math.sqrt(w * w + 4)), s.achievedValue(), 1e-9);
    assertEquals(1, a.checks().size(), "no margin or stability check");
    assertEquals(ClosedLoopStability.NOT_CHECKED, a.closedLoopStability());
    assertEquals(SpeedRegime.NORMAL_ENVELOPE, a.regime());
    assertEquals(100.0, a.speedEasMps(), 0.0);
    assertEquals(F1_HZ, a.firstAeroelasticFrequencyHz(), 0.0);
    // exactly the structural check and detail of the full assessment (same search, same loop)
    PointAssessment full = PointAssessor.assess(REQ, 100, F1_HZ, MARGINS.analyse(loop, 0.01, 100), modes, loop);
    assertEquals(only(full, CheckKind.STRUCTURAL_MODE), s);
    assertEquals(full.structuralModes(), a.structuralModes());
    // up to V_L (150) still checked; up to 1.15 V_L (160) and beyond (180) not
    assertEquals(1, PointAssessor.assessStructuralModes(REQ, 150, F1_HZ, modes, loop).checks().size());
    PointAssessment above = PointAssessor.assessStructuralModes(REQ, 160, F1_HZ, modes, loop);
    assertEquals(SpeedRegime.UP_TO_115_LIMIT_SPEED, above.regime());
    assertTrue(above.checks().isEmpty());
    assertTrue(above.structuralModes().isEmpty());
    PointAssessment beyond = PointAssessor.assessStructuralModes(REQ, 180, F1_HZ, modes, loop);
    assertEquals(SpeedRegime.BEYOND, beyond.regime());
    assertTrue(beyond.checks().isEmpty());
    // no mode, no loop needed
    assertTrue(PointAssessor.assessStructuralModes(REQ, 100, F1_HZ, List.of(), null).checks().isEmpty());
    // a mode without a loop is refused before any search, naming the loop
    assertEquals("loop", assertThrows(InvalidInputException.class,
        () -> PointAssessor.assessStructuralModes(REQ, 100, F1_HZ, modes, null)).fieldPath());
    assertThrows(InvalidInputException.class, () -> PointAssessor.assessStructuralModes(null, 100, F1_HZ, modes, loop));
    assertThrows(InvalidInputException.class, () -> PointAssessor.assessStructuralModes(REQ, 100, F1_HZ, null, loop));
    assertThrows(InvalidInputException.class, () -> PointAssessor.assessStructuralModes(REQ, 100, 0.0, modes, loop));
  }

  @Test
  void failingStructuralModeGovernsWithItsPhaseFigures() {
    // A sign-reversed collocated mode at 5 Hz (see StructuralPeakSearchTest): +14 dB at 5 Hz
    // with the phase exactly -180 deg there (closed form): FAILED, distance 0 against 60 deg.
    double wn = 2 * Math.PI * 5;
    double zeta = 0.02;
    SisoFrequencyFunction mode = (w, v) -> {
      double re = wn * wn - w * w;
      double im = 2 * zeta * wn * w;
      double d = re * re + im * im;
      v[0] = -0.2 * wn * w * im / d;
      v[1] = -0.2 * wn * w * re / d;
    };
    LoopMarginResult m = MARGINS.analyse(thirdOrder(1), 0.01, 100);
    PointAssessment a = PointAssessor.assess(REQ, 100, F1_HZ, m,
        List.of(new ModeFrequency("wing torsion", 5.0)), mode);
    ClearanceCheck s = only(a, CheckKind.STRUCTURAL_MODE);
    assertFalse(s.passed());
    assertEquals(CheckUnit.DEGREE, s.unit());
    assertEquals(60.0, s.requiredValue(), 0.0);
    assertEquals(0.0, s.achievedValue(), 1e-6);
    // normalised: max((-6 - 14)/6, (0 - 60)/60) = max(-3.33, -1) = -1 (to the 1e-6 deg above)
    assertEquals(-1.0, s.normalisedExcess(), 1e-7);
    assertEquals(s, a.governing().orElseThrow());
  }

  @Test
  void checksSayWhichWayTheGainMayMoveInWhichBandAndRegime() {
    // K = 2: gain may rise (|L| = 1/3 at the phase crossover); K = 8: it may only fall (|L| = 4/3);
    // phase crossover at sqrt 2 rad/s = 0.2251 Hz (closed form above), rigid-body band
    PointAssessment rise = PointAssessor.assess(REQ, 100, F1_HZ, MARGINS.analyse(thirdOrder(2), 0.01, 100),
        List.of(), null);
    assertEquals("gain margin (gain increase) at 0.2251 Hz, rigid-body band, normal envelope",
        only(rise, CheckKind.GAIN_INCREASE_MARGIN).description());
    PointAssessment fall = PointAssessor.assess(REQ, 130, F1_HZ, MARGINS.analyse(thirdOrder(8), 0.01, 100),
        List.of(), null);
    assertTrue(only(fall, CheckKind.GAIN_REDUCTION_MARGIN).description()
        .startsWith("gain margin (gain reduction) at 0.2251 Hz, rigid-body band, up to limit speed"),
        only(fall, CheckKind.GAIN_REDUCTION_MARGIN).description());
    // the same crossover above a first aeroelastic mode at 0.1 Hz is in the aeroelastic band
    PointAssessment aero = PointAssessor.assess(REQ, 100, 0.1, MARGINS.analyse(thirdOrder(2), 0.01, 100),
        List.of(), null);
    assertTrue(only(aero, CheckKind.GAIN_INCREASE_MARGIN).description().contains(", aeroelastic band,"));
    // below 0.06 Hz: the gain crossover of K = 0.1 (|L| = 1 at w = 0.05 rad/s, 0.0080 Hz, derived
    // from 0.1/(w sqrt(w^2+1) sqrt(w^2+4)) = 1 to first order in w) lies in the low-frequency band
    PointAssessment slow = PointAssessor.assess(REQ, 100, F1_HZ, MARGINS.analyse(thirdOrder(0.1), 0.001, 100),
        List.of(), null);
    assertTrue(only(slow, CheckKind.PHASE_MARGIN).description().contains(", low-frequency band,"),
        only(slow, CheckKind.PHASE_MARGIN).description());
  }

  @Test
  void checkSignsAreConsistent() {
    assertThrows(InvalidInputException.class, () -> new ClearanceCheck(CheckKind.PHASE_MARGIN,
        "rigid_body", "x", 45, 30, CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1.0, 0.5));
    ClearanceCheck zero = ClearanceCheck.of(CheckKind.PHASE_MARGIN, "rigid_body", "x", 0, 0,
        CheckUnit.DEGREE, RequiredSense.AT_LEAST, 1.0);
    assertTrue(zero.passed());
    assertEquals(0.0, zero.normalisedExcess(), 0.0);
  }
}
