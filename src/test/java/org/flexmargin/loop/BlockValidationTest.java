package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * Every block and record of the loop package refuses values outside its documented domain with
 * an {@link InvalidInputException} naming the field, and accepts the edge values its Javadoc
 * allows (a zero delay, a zero-depth notch zero, a solver started on the edge of its range).
 */
class BlockValidationTest {

  private static void rejected(org.junit.jupiter.api.function.Executable e) {
    assertThrows(InvalidInputException.class, e);
  }

  @Test
  void secondOrderBlocksNeedAPositiveFiniteFrequencyAndDamping() {
    rejected(() -> new SecondOrderActuator(0, 0.7));
    rejected(() -> new SecondOrderActuator(Double.NaN, 0.7));
    rejected(() -> new SecondOrderActuator(10, 0));
    rejected(() -> new SecondOrderActuator(10, Double.POSITIVE_INFINITY));
    rejected(() -> new SecondOrderLowPass(0, 0.7));
    rejected(() -> new SecondOrderLowPass(Double.NaN, 0.7));
    rejected(() -> new SecondOrderLowPass(10, 0));
    rejected(() -> new SecondOrderLowPass(10, Double.NaN));
    assertDoesNotThrow(() -> new SecondOrderActuator(1e-9, 1e-9));
    assertDoesNotThrow(() -> new SecondOrderLowPass(1e-9, 1e-9));
  }

  @Test
  void simpleBlocksNeedFiniteGains() {
    rejected(() -> FirstOrderLag.ofBandwidthRadPerS(0));
    rejected(() -> FirstOrderLag.ofBandwidthRadPerS(Double.NaN));
    rejected(() -> FirstOrderLag.ofBandwidthHz(0));
    rejected(() -> FirstOrderLag.ofBandwidthHz(Double.NaN));
    rejected(() -> new Integrator(0));
    rejected(() -> new Integrator(Double.NaN));
    rejected(() -> new ProportionalIntegral(Double.NaN, 1));
    rejected(() -> new ProportionalIntegral(1, Double.POSITIVE_INFINITY));
    rejected(() -> new Gain(Double.NaN));
    rejected(() -> new StateSpaceBlock(null));
    rejected(() -> new StateSpaceBlock(StateSpace.staticGain(1).append(StateSpace.staticGain(2))));
    rejected(() -> new SeriesBlock(Arrays.asList(new Gain(1), null)));
    rejected(() -> new ZeroOrderHold(0.01, null));
    rejected(() -> new ZeroOrderHold(0, PadeOrder.ORDER_2));
    rejected(() -> new PureDelay(-1e-3, PadeOrder.ORDER_2));
    rejected(() -> new PureDelay(0.1, null));
  }

  /** A zero delay is allowed: its response is 1 and its realisation a unit static gain. */
  @Test
  void aZeroDelayIsAUnitStaticGainWithoutPoles() {
    PureDelay d = new PureDelay(0, PadeOrder.ORDER_3);
    StateSpace ss = d.stateSpace();
    assertEquals(0, ss.stateCount());
    assertEquals(1.0, ss.d().get(0, 0), 0.0);
    assertEquals(0, d.knownPoles().size());
    assertEquals(0.0, d.pureDelayS(), 0.0);
  }

  /** The hold's phase -w T/2 is that of a T/2 delay (class comment); it has no poles. */
  @Test
  void zeroOrderHoldReportsHalfItsPeriodAsDelayAndNoPoles() {
    ZeroOrderHold h = new ZeroOrderHold(0.0125, PadeOrder.ORDER_2);
    assertEquals(0.00625, h.pureDelayS(), 1e-18);
    assertEquals(0, h.knownPoles().size());
  }

  @Test
  void notchDomainEdges() {
    rejected(() -> new NotchFilter(0, 0.01, 0.1));
    rejected(() -> new NotchFilter(Double.NaN, 0.01, 0.1));
    rejected(() -> new NotchFilter(10, Double.NaN, 0.1));
    rejected(() -> new NotchFilter(10, -1e-9, 0.1));
    rejected(() -> new NotchFilter(10, 0.01, 0));
    assertDoesNotThrow(() -> new NotchFilter(10, 0, 0.1));
    rejected(() -> NotchFilter.fromDepthAndWidth(10, 0, 1));
    rejected(() -> NotchFilter.fromDepthAndWidth(10, Double.NaN, 1));
    rejected(() -> NotchFilter.fromDepthAndWidth(10, 20, 0));
    rejected(() -> NotchFilter.fromDepthAndWidth(10, 20, Double.NaN));
    rejected(() -> NotchFilter.fromDepthAndWidth(0, 20, 1));
    rejected(() -> NotchFilter.fromDepthAndWidth(Double.NaN, 20, 1));
  }

  /**
   * At zeta_p^2 = 2 zeta_z^2 the centre gain is exactly -3.01 dB and the -3 dB points merge at
   * the centre: the class defines no width there (NaN). The pair below satisfies the equality
   * exactly in double arithmetic (zeta_p = sqrt(2) zeta_z, checked by the first assertion).
   */
  @Test
  void aNotchExactlyThreeDecibelsDeepHasNoMinus3DbWidth() {
    double zz = 0.6377992844843734;
    double zp = 0.9019843981896568;
    assertEquals(0.0, zp * zp - 2 * zz * zz, 0.0);
    assertTrue(Double.isNaN(new NotchFilter(10, zz, zp).minus3DbWidthHz()));
  }

  /**
   * Crossover records check omega against frequency: at 10^6 rad/s the tolerance 1e-12 omega is
   * 1e-6 Hz x 2 pi, far above the round-off of omega/(2 pi); a zero frequency is refused.
   */
  @Test
  void crossoverRecordsAtHighAndZeroFrequency() {
    double w = 1e6;
    assertDoesNotThrow(() -> new GainCrossover(w, w / (2 * Math.PI), -120, 60, 1e-6));
    assertDoesNotThrow(() -> new PhaseCrossover(w, w / (2 * Math.PI), 0.5, 6.02,
        MarginDirection.GAIN_INCREASE));
    rejected(() -> new PhaseCrossover(0, 0, 0.5, 6.02, MarginDirection.GAIN_INCREASE));
    rejected(() -> new GainCrossover(0, 0, -120, 60, 1));
  }

  @Test
  void malformedStateSpacesNameTheirField() {
    double[][] one = {{1}};
    rejected(() -> new StateSpace(null, new org.ejml.data.DMatrixRMaj(1, 1),
        new org.ejml.data.DMatrixRMaj(1, 1), new org.ejml.data.DMatrixRMaj(1, 1), List.of("u"),
        List.of("y"), List.of("x")));
    // D with the wrong number of rows, then of columns
    rejected(() -> StateSpace.of(one, one, one, new double[][] {{1}, {2}}));
    rejected(() -> StateSpace.of(new org.ejml.data.DMatrixRMaj(one), new org.ejml.data.DMatrixRMaj(one),
        new org.ejml.data.DMatrixRMaj(one), new org.ejml.data.DMatrixRMaj(new double[][] {{1, 2}})));
    rejected(() -> StateSpace.of(one, null, one, one));
    rejected(() -> StateSpace.of(one, new double[][] {null}, one, one));
    rejected(() -> StateSpace.of(one, new double[][] {{1}, {2}}, one, one));
    StateSpace s = StateSpace.of(one, one, one, one);
    rejected(() -> new StateSpace(s.a(), s.b(), s.c(), s.d(), null, List.of("y"), List.of("x")));
    rejected(() -> new StateSpace(s.a(), s.b(), s.c(), s.d(), List.of(" "), List.of("y"),
        List.of("x")));
    rejected(() -> s.feedback(StateSpace.staticGain(1), null));
    rejected(() -> s.scale(Double.NaN));
    rejected(() -> StateSpace.fromTransferFunction(new double[] {1}, new double[] {}));
    rejected(() -> StateSpace.fromTransferFunction(new double[] {1}, new double[] {0, 1}));
    rejected(() -> StateSpace.fromTransferFunction(new double[] {Double.NaN}, new double[] {1, 1}));
    rejected(() -> StateSpace.fromTransferFunction(new double[] {1}, new double[] {1, Double.NaN}));
  }

  /** Degree-0 transfer function 2/4: no states, feed-through 1/2. */
  @Test
  void constantTransferFunctionHasOnlyFeedThrough() {
    StateSpace s = StateSpace.fromTransferFunction(new double[] {2}, new double[] {4});
    assertEquals(0, s.stateCount());
    assertEquals(0.5, s.d().get(0, 0), 0.0);
  }

  /** With no outputs the input count comes from B; with nothing at all the system is empty. */
  @Test
  void inputCountOfSystemsWithoutOutputs() {
    StateSpace s = StateSpace.of(new double[][] {{-1}}, new double[][] {{1, 2}}, new double[0][],
        new double[0][]);
    assertEquals(2, s.inputCount());
    assertEquals(0, s.outputCount());
    StateSpace empty = StateSpace.of(new double[0][], new double[0][], new double[0][],
        new double[0][]);
    assertEquals(0, empty.inputCount());
    assertEquals(0, empty.stateCount());
  }

  /** Names of appended systems are concatenated; toString states the sizes and the names. */
  @Test
  void appendedNamesAndDescription() {
    StateSpace a = StateSpace.fromTransferFunction(new double[] {1}, new double[] {1, 1});
    StateSpace b = StateSpace.fromTransferFunction(new double[] {1}, new double[] {1, 2, 1});
    StateSpace ab = a.append(b);
    assertEquals(List.of("y1", "y1"), ab.outputNames());
    assertEquals(List.of("x1", "x1", "x2"), ab.stateNames());
    assertEquals("StateSpace[3 states, [u1, u1] -> [y1, y1]]", ab.toString());
    FrequencyResponseEvaluator ev = new FrequencyResponseEvaluator(ab);
    assertEquals(2, ev.outputCount());
    assertEquals(2, ev.inputCount());
  }

  /** The dense path of a static gain 3 is 3 at every frequency (no states to solve for). */
  @Test
  void denseResponseOfAStaticGain() {
    FrequencyResponse r = StateSpace.staticGain(3).frequencyResponseDenseLu(new double[] {0.5, 7});
    assertEquals(3.0, r.real(1, 0, 0), 0.0);
    assertEquals(0.0, r.imag(1, 0, 0), 0.0);
  }

  /**
   * Critical-point search arguments; t0 on either end of the range is allowed. Family: L(s; t) =
   * (t/s) e^{-s}; 1 + L = 0 needs -pi/2 - w = -pi and t/w = 1, so w = t = pi/2 (closed form).
   */
  @Test
  void criticalPointSolverArgumentsAndRangeEdges() {
    CriticalPointSolver.Family fam = t -> (w, v) -> {
      v[0] = -t / w * Math.sin(w);
      v[1] = -t / w * Math.cos(w);
    };
    rejected(() -> CriticalPointSolver.solve(null, 1, 1, 1, 2, 1e-10, 20));
    rejected(() -> CriticalPointSolver.solve(fam, 1, 0, 1, 2, 1e-10, 20));
    rejected(() -> CriticalPointSolver.solve(fam, 1, Double.NaN, 1, 2, 1e-10, 20));
    rejected(() -> CriticalPointSolver.solve(fam, 1, 1, 1, 1, 1e-10, 20));
    rejected(() -> CriticalPointSolver.solve(fam, 0.9, 1, 1, 2, 1e-10, 20));
    rejected(() -> CriticalPointSolver.solve(fam, 2.1, 1, 1, 2, 1e-10, 20));
    rejected(() -> CriticalPointSolver.solve(fam, 1.5, 1, 1, 2, 0, 20));
    rejected(() -> CriticalPointSolver.solve(fam, 1.5, 1, 1, 2, 1e-10, 0));
    for (double t0 : new double[] {1.0, 2.0}) {
      CriticalPointSolver.Solution s = CriticalPointSolver.solve(fam, t0, 1.4, 1, 2, 1e-10, 50);
      assertTrue(s.converged(), s.remark());
      // Newton converges quadratically: 1e-9 on t and w is far above its final error
      assertEquals(Math.PI / 2, s.parameter(), 1e-9);
      assertEquals(Math.PI / 2, s.omegaRadPerS(), 1e-9);
    }
    CriticalPointSolver.Solution one = CriticalPointSolver.solve(fam, 1.0, 1.4, 1, 2, 1e-10, 1);
    assertFalse(one.converged());
    assertEquals(1, one.iterations());
  }

  /** A loop that does not depend on t has a singular Jacobian: reported, not guessed. */
  @Test
  void aFamilyIndependentOfTheParameterIsSingular() {
    CriticalPointSolver.Solution s = CriticalPointSolver.solve(
        t -> new FirstOrderLag(1.0), 1.5, 1.0, 1, 2, 1e-10, 20);
    assertFalse(s.converged());
    assertEquals(1, s.iterations());
    assertTrue(s.remark().contains("singular"), s.remark());
    // |1 + 1/(1 + j)| = |1.5 - 0.5 j| (closed form) at the starting point
    assertEquals(Math.hypot(1.5, 0.5), s.residual(), 1e-12);
  }
}
