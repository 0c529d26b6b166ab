package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

class StateSpaceTest {

  /** Round-off level for O(1) transfer functions of a few states: 1e-12 leaves 1e3 ulps. */
  private static final double TIGHT = 1e-12;

  private static final double[] OMEGAS = {0.01, 0.3, 1.0, 2.7, 10.0, 55.0};

  /** G(j w) from polynomials (descending powers), evaluated by direct complex arithmetic. */
  private static double[] tf(double[] num, double[] den, double w) {
    double[] v = new double[2];
    new TransferFunctionBlock(num, den).response(w, v);
    return v;
  }

  private static void assertSisoMatches(StateSpace sys, double[] num, double[] den) {
    FrequencyResponse fr = sys.frequencyResponse(OMEGAS);
    for (int k = 0; k < OMEGAS.length; k++) {
      double[] ref = tf(num, den, OMEGAS[k]);
      double scale = Math.max(1e-3, Math.hypot(ref[0], ref[1]));
      assertEquals(ref[0], fr.real(k, 0, 0), TIGHT * scale, "Re at w=" + OMEGAS[k]);
      assertEquals(ref[1], fr.imag(k, 0, 0), TIGHT * scale, "Im at w=" + OMEGAS[k]);
    }
  }

  private static StateSpace firstOrder(double pole) {
    // 1/(s + pole)
    return StateSpace.of(new double[][] {{-pole}}, new double[][] {{1}}, new double[][] {{1}},
        new double[][] {{0}});
  }

  @Test
  void unityNegativeFeedbackOfFirstOrderLagIsTheJavadocExample() {
    // Hand-derived: 1/(s+1) / (1 + 1/(s+1)) = 1/(s+2); A_cl = -1 - 1 = -2 exactly.
    StateSpace cl = firstOrder(1).feedback(StateSpace.staticGain(1), FeedbackSign.NEGATIVE);
    assertEquals(-2.0, cl.a().get(0, 0), 0.0);
    assertSisoMatches(cl, new double[] {1}, new double[] {1, 2});
  }

  @Test
  void positiveFeedbackSubtractsTheLoop() {
    // Hand-derived: G/(1 - G H) with G = 1/(s+1), H = 0.5: 1/(s + 1 - 0.5) = 1/(s + 0.5).
    StateSpace cl = firstOrder(1).feedback(StateSpace.staticGain(0.5), FeedbackSign.POSITIVE);
    assertSisoMatches(cl, new double[] {1}, new double[] {1, 0.5});
  }

  @Test
  void feedbackWithDynamicsInBothPaths() {
    // Hand-derived: G = 1/s, H = 1/(s+1), negative: G/(1+GH) = (s+1)/(s^2 + s + 1).
    StateSpace g = StateSpace.fromTransferFunction(new double[] {1}, new double[] {1, 0});
    StateSpace cl = g.feedback(firstOrder(1), FeedbackSign.NEGATIVE);
    assertEquals(2, cl.stateCount());
    assertSisoMatches(cl, new double[] {1, 1}, new double[] {1, 1, 1});
  }

  @Test
  void feedbackWithFeedThroughInTheForwardPath() {
    // Hand-derived: G = (s+2)/(s+1) (D = 1), H = 2: G/(1 + 2G) = (s+2)/(3s + 5).
    StateSpace g = StateSpace.fromTransferFunction(new double[] {1, 2}, new double[] {1, 1});
    StateSpace cl = g.feedback(StateSpace.staticGain(2), FeedbackSign.NEGATIVE);
    assertSisoMatches(cl, new double[] {1, 2}, new double[] {3, 5});
    // Hand-derived with feed-through in both paths: H = (0.5s+3)/(s+4) (D = 0.5), positive:
    // G/(1 - G H) = (s+2)(s+4)/((s+1)(s+4) - (s+2)(0.5s+3)) = (s^2+6s+8)/(0.5s^2 + s - 2).
    StateSpace h = StateSpace.fromTransferFunction(new double[] {0.5, 3}, new double[] {1, 4});
    StateSpace cl2 = g.feedback(h, FeedbackSign.POSITIVE);
    assertSisoMatches(cl2, new double[] {1, 6, 8}, new double[] {0.5, 1, -2});
  }

  @Test
  void singularAlgebraicLoopIsRejected() {
    // D_G D_H = 1 with positive feedback: I - D_G D_H = 0, ill-posed.
    assertThrows(InvalidInputException.class, () -> StateSpace.staticGain(1)
        .feedback(StateSpace.staticGain(1), FeedbackSign.POSITIVE));
    assertThrows(InvalidInputException.class,
        () -> firstOrder(1).feedback(StateSpace.staticGain(1), null));
  }

  @Test
  void seriesAndParallelMatchHandDerivedTransferFunctions() {
    StateSpace g1 = firstOrder(1);
    StateSpace g2 = StateSpace.fromTransferFunction(new double[] {3, 1}, new double[] {1, 2});
    // Hand-derived: 1/(s+1) * (3s+1)/(s+2) = (3s+1)/(s^2+3s+2)
    assertSisoMatches(g1.series(g2), new double[] {3, 1}, new double[] {1, 3, 2});
    // Hand-derived: 1/(s+1) + (3s+1)/(s+2) = (s+2 + (3s+1)(s+1))/((s+1)(s+2))
    //             = (3s^2 + 5s + 3)/(s^2 + 3s + 2)
    assertSisoMatches(g1.parallel(g2), new double[] {3, 5, 3}, new double[] {1, 3, 2});
    // scale: 2.5 G
    assertSisoMatches(g1.scale(2.5), new double[] {2.5}, new double[] {1, 1});
  }

  @Test
  void appendIsBlockDiagonal() {
    StateSpace sys = firstOrder(1).append(firstOrder(3));
    assertEquals(2, sys.inputCount());
    assertEquals(2, sys.outputCount());
    assertEquals(List.of("u1", "u1"), sys.inputNames());
    FrequencyResponse fr = sys.frequencyResponse(new double[] {2.0});
    double[] g11 = tf(new double[] {1}, new double[] {1, 1}, 2.0);
    double[] g22 = tf(new double[] {1}, new double[] {1, 3}, 2.0);
    assertEquals(g11[0], fr.real(0, 0, 0), TIGHT);
    assertEquals(g11[1], fr.imag(0, 0, 0), TIGHT);
    assertEquals(g22[0], fr.real(0, 1, 1), TIGHT);
    assertEquals(g22[1], fr.imag(0, 1, 1), TIGHT);
    assertEquals(0.0, fr.magnitude(0, 0, 1), 0.0);
    assertEquals(0.0, fr.magnitude(0, 1, 0), 0.0);
  }

  @Test
  void secondOrderPlantWithProportionalFeedbackHasTheTextbookPoles() {
    // Closed form (e.g. Ogata, Modern Control Engineering, second-order systems): K/(s(s+a))
    // with unity negative feedback has s^2 + a s + K = 0, s = -a/2 +- j sqrt(K - a^2/4).
    // K = 10, a = 2: s = -1 +- 3j.
    StateSpace plant = StateSpace.fromTransferFunction(new double[] {1}, new double[] {1, 2, 0});
    StateSpace cl = plant.feedback(StateSpace.staticGain(10), FeedbackSign.NEGATIVE);
    // gain in the feedback path gives the same characteristic equation as in the forward path
    Eigenvalues ev = cl.eigenvalues();
    assertEquals(2, ev.size());
    for (int k = 0; k < 2; k++) {
      assertEquals(-1.0, ev.realAt(k), 1e-12);
      assertEquals(3.0, Math.abs(ev.imagAt(k)), 1e-12);
      // damping ratio a/(2 sqrt K) = 1/sqrt(10)
      assertEquals(1 / Math.sqrt(10), ev.dampingRatio(k), 1e-12);
    }
  }

  @Test
  void closedLoopEigenvaluesMatchCommonsMathAndAHandFactoredPolynomial() {
    // L = 6/(s(s+1)(s+2)): closed-loop characteristic polynomial s^3 + 3s^2 + 2s + 6
    // = (s + 3)(s^2 + 2) (hand-factored) -> -3, +-j sqrt(2).
    // 3 * (1/s) * 1/(s+1) * 1/(s/2+1) = 3 * 2/(s(s+1)(s+2)) = 6/(s(s+1)(s+2))
    LinearBlock loop = new Gain(3).then(new Integrator(1))
        .then(new FirstOrderLag(1)).then(FirstOrderLag.ofBandwidthRadPerS(2));
    StateSpace cl = loop.stateSpace().feedback(StateSpace.staticGain(1), FeedbackSign.NEGATIVE);
    double[][] ours = sorted(cl.eigenvalues());
    assertEquals(-3.0, ours[0][0], 1e-10);
    assertEquals(0.0, ours[1][0], 1e-10);
    assertEquals(Math.sqrt(2), Math.abs(ours[1][1]), 1e-10);
    assertEquals(0.0, ours[2][0], 1e-10);
    // Independent solver: Commons Math EigenDecomposition of the same A.
    EigenDecomposition cm = new EigenDecomposition(new Array2DRowRealMatrix(toArray(cl.a())));
    double[][] theirs = sorted(new Eigenvalues(cm.getRealEigenvalues(),
        cm.getImagEigenvalues()));
    for (int k = 0; k < ours.length; k++) {
      assertEquals(theirs[k][0], ours[k][0], 1e-10);
      assertEquals(theirs[k][1], ours[k][1], 1e-10);
    }
  }

  @Test
  void eigenvaluesOfALargerLoopAgreeWithCommonsMath() {
    // A 9-state loop: actuator, notch, low-pass, Pade delay, lightly damped plant, PI law.
    LinearBlock loop = new ProportionalIntegral(0.8, 0.4)
        .then(new SecondOrderActuator(10, 0.6)).then(new NotchFilter(15, 0.05, 0.5))
        .then(new PureDelay(0.02, PadeOrder.ORDER_2))
        .then(new TransferFunctionBlock(new double[] {40, 400},
            new double[] {1, 0.4, 400}));
    StateSpace cl = loop.stateSpace().feedback(StateSpace.staticGain(1), FeedbackSign.NEGATIVE);
    double[][] ours = sorted(cl.eigenvalues());
    EigenDecomposition cm = new EigenDecomposition(new Array2DRowRealMatrix(toArray(cl.a())));
    double[][] theirs = sorted(new Eigenvalues(cm.getRealEigenvalues(),
        cm.getImagEigenvalues()));
    assertEquals(theirs.length, ours.length);
    for (int k = 0; k < ours.length; k++) {
      double scale = Math.hypot(theirs[k][0], theirs[k][1]);
      // two backward-stable QR solvers on a matrix of norm ~1e4: agree to ~1e-9 relative
      assertEquals(theirs[k][0], ours[k][0], 1e-8 * scale);
      assertEquals(theirs[k][1], ours[k][1], 1e-8 * scale);
    }
  }

  @Test
  void hessenbergResponseEqualsDenseComplexLuOnARandomSixtyStateSystem() {
    Random rnd = new Random(20260207L);
    int n = 60;
    int m = 3;
    int p = 2;
    double[][] a = new double[n][n];
    double[][] b = new double[n][m];
    double[][] c = new double[p][n];
    double[][] d = new double[p][m];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a[i][j] = rnd.nextGaussian() * 3 / Math.sqrt(n) - (i == j ? 2.0 : 0.0);
      }
      for (int j = 0; j < m; j++) {
        b[i][j] = rnd.nextGaussian();
      }
      for (int j = 0; j < p; j++) {
        c[j][i] = rnd.nextGaussian();
      }
    }
    for (int i = 0; i < p; i++) {
      for (int j = 0; j < m; j++) {
        d[i][j] = rnd.nextGaussian();
      }
    }
    StateSpace sys = StateSpace.of(a, b, c, d);
    double[] w = new double[200];
    for (int k = 0; k < w.length; k++) {
      w[k] = Math.pow(10, -2 + 4.0 * k / (w.length - 1));
    }
    FrequencyResponse hess = sys.frequencyResponse(w);
    FrequencyResponse lu = sys.frequencyResponseDenseLu(w);
    double worst = 0;
    for (int k = 0; k < w.length; k++) {
      double norm = 0;
      for (int i = 0; i < p; i++) {
        for (int j = 0; j < m; j++) {
          norm = Math.max(norm, lu.magnitude(k, i, j));
        }
      }
      for (int i = 0; i < p; i++) {
        for (int j = 0; j < m; j++) {
          double err = Math.hypot(hess.real(k, i, j) - lu.real(k, i, j),
              hess.imag(k, i, j) - lu.imag(k, i, j));
          worst = Math.max(worst, err / norm);
        }
      }
    }
    // Agreement to 1e-10 relative (both are backward-stable solves of a well-conditioned
    // random system; observed round-off is ~1e-14).
    assertTrue(worst < 1e-10, "worst relative difference " + worst);
  }

  @Test
  void staticGainHasNoStatesAndAFlatResponse() {
    StateSpace k = StateSpace.staticGain(-3);
    assertEquals(0, k.stateCount());
    assertEquals(0, k.eigenvalues().size());
    FrequencyResponse fr = k.frequencyResponse(new double[] {0, 1, 100});
    for (int i = 0; i < 3; i++) {
      assertEquals(-3, fr.real(i, 0, 0), 0);
      assertEquals(0, fr.imag(i, 0, 0), 0);
    }
  }

  @Test
  void missingMatricesAreReportedNotThrownAsNullPointers() {
    double[][] one = {{1}};
    assertThrows(InvalidInputException.class, () -> StateSpace.of(null, one, one, one));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(one, one, one, null));
    DMatrixRMaj m = new DMatrixRMaj(one);
    assertThrows(InvalidInputException.class, () -> StateSpace.of(null, m, m, m));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(m, m, m, (DMatrixRMaj) null));
  }

  @Test
  void invalidMatricesAreRejected() {
    assertThrows(InvalidInputException.class, () -> StateSpace.of(new double[][] {{1, 0}},
        new double[][] {{1}}, new double[][] {{1}}, new double[][] {{0}}));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(new double[][] {{Double.NaN}},
        new double[][] {{1}}, new double[][] {{1}}, new double[][] {{0}}));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(new double[][] {{1}},
        new double[][] {{1}}, new double[][] {{1, 2}}, new double[][] {{0}}));
    assertThrows(InvalidInputException.class, () -> firstOrder(1).series(firstOrder(1)
        .append(firstOrder(2))));
    assertThrows(InvalidInputException.class, () -> new StateSpace(new DMatrixRMaj(1, 1),
        new DMatrixRMaj(1, 1), new DMatrixRMaj(1, 1), new DMatrixRMaj(1, 1), List.of("u"),
        List.of("y"), List.of()));
    assertThrows(InvalidInputException.class,
        () -> StateSpace.fromTransferFunction(new double[] {1, 2, 3}, new double[] {1, 1}));
  }

  @Test
  void matricesAreCopiedInAndOut() {
    DMatrixRMaj a = new DMatrixRMaj(new double[][] {{-1}});
    StateSpace s = StateSpace.of(a, new DMatrixRMaj(new double[][] {{1}}),
        new DMatrixRMaj(new double[][] {{1}}), new DMatrixRMaj(new double[][] {{0}}));
    a.set(0, 0, 5);
    s.a().set(0, 0, 7);
    assertEquals(-1, s.a().get(0, 0), 0);
  }

  static double[][] toArray(DMatrixRMaj m) {
    double[][] r = new double[m.numRows][m.numCols];
    for (int i = 0; i < m.numRows; i++) {
      for (int j = 0; j < m.numCols; j++) {
        r[i][j] = m.get(i, j);
      }
    }
    return r;
  }

  /** Eigenvalues sorted by real part, then imaginary part, as {re, im} rows. */
  static double[][] sorted(Eigenvalues ev) {
    double[][] r = new double[ev.size()][];
    for (int k = 0; k < ev.size(); k++) {
      r[k] = new double[] {ev.realAt(k), ev.imagAt(k)};
    }
    Arrays.sort(r, (x, y) -> {
      double dx = x[0] - y[0];
      if (Math.abs(dx) > 1e-6 * (1 + Math.abs(x[0]))) {
        return Double.compare(x[0], y[0]);
      }
      return Double.compare(x[1], y[1]);
    });
    return r;
  }
}
