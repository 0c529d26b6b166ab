package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * Interconnections of {@link StateSpace} with feed-through and several channels, checked at
 * single frequencies against the transfer-matrix formulas evaluated here with Commons Math complex
 * arithmetic (independent of the state-space code):
 *
 * <ul>
 *   <li>G(s) = C (sI - A)^-1 B + D;
 *   <li>feedback: T = (I - sign G H)^-1 G (sign -1 for negative feedback);
 *   <li>scale: k G; append: diag(G1, G2).
 * </ul>
 *
 * Tolerance 1e-10 relative: small well-conditioned systems, both sides backward stable.
 */
class StateSpaceAlgebraTest {

  private static final double[] OMEGAS = {0.13, 0.9, 2.7, 11.0};
  private static final double TOL = 1e-10;

  private static double[][] random(Random rnd, int rows, int cols, double shift) {
    double[][] m = new double[rows][cols];
    for (int i = 0; i < rows; i++) {
      for (int j = 0; j < cols; j++) {
        m[i][j] = rnd.nextGaussian() + (i == j ? shift : 0);
      }
    }
    return m;
  }

  private static StateSpace randomSystem(long seed, int n, int outputs, int inputs) {
    Random rnd = new Random(seed);
    // A shifted left so the random system is stable and well conditioned on the jw axis
    return StateSpace.of(random(rnd, n, n, -4), random(rnd, n, inputs, 0),
        random(rnd, outputs, n, 0), random(rnd, outputs, inputs, 0));
  }

  /** G(j w) from the matrices, by Gaussian elimination with Commons Math complex numbers. */
  private static Complex[][] transfer(StateSpace sys, double w) {
    int n = sys.stateCount();
    int m = sys.inputCount();
    int p = sys.outputCount();
    Complex[][] lhs = new Complex[n][n + m];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        lhs[i][j] = new Complex(-sys.a().get(i, j), i == j ? w : 0);
      }
      for (int j = 0; j < m; j++) {
        lhs[i][n + j] = new Complex(sys.b().get(i, j));
      }
    }
    Complex[][] x = solve(lhs, n, m);
    Complex[][] g = new Complex[p][m];
    for (int i = 0; i < p; i++) {
      for (int j = 0; j < m; j++) {
        Complex s = new Complex(sys.d().get(i, j));
        for (int k = 0; k < n; k++) {
          s = s.add(x[k][j].multiply(sys.c().get(i, k)));
        }
        g[i][j] = s;
      }
    }
    return g;
  }

  /** Solves [M | R] in place by Gauss-Jordan with partial pivoting; returns X (n x m). */
  private static Complex[][] solve(Complex[][] aug, int n, int m) {
    for (int k = 0; k < n; k++) {
      int piv = k;
      for (int i = k + 1; i < n; i++) {
        if (aug[i][k].abs() > aug[piv][k].abs()) {
          piv = i;
        }
      }
      Complex[] t = aug[k];
      aug[k] = aug[piv];
      aug[piv] = t;
      for (int i = 0; i < n; i++) {
        if (i != k) {
          Complex f = aug[i][k].divide(aug[k][k]);
          for (int j = k; j < n + m; j++) {
            aug[i][j] = aug[i][j].subtract(f.multiply(aug[k][j]));
          }
        }
      }
    }
    Complex[][] x = new Complex[n][m];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < m; j++) {
        x[i][j] = aug[i][n + j].divide(aug[i][i]);
      }
    }
    return x;
  }

  private static Complex[][] multiply(Complex[][] a, Complex[][] b) {
    Complex[][] c = new Complex[a.length][b[0].length];
    for (int i = 0; i < a.length; i++) {
      for (int j = 0; j < b[0].length; j++) {
        Complex s = Complex.ZERO;
        for (int k = 0; k < b.length; k++) {
          s = s.add(a[i][k].multiply(b[k][j]));
        }
        c[i][j] = s;
      }
    }
    return c;
  }

  private static void assertMatches(Complex[][] ref, StateSpace sys, double w, String what) {
    FrequencyResponse fr = sys.frequencyResponse(new double[] {w});
    assertEquals(ref.length, fr.outputCount(), what + " outputs");
    assertEquals(ref[0].length, fr.inputCount(), what + " inputs");
    for (int i = 0; i < ref.length; i++) {
      for (int j = 0; j < ref[0].length; j++) {
        double scale = Math.max(1, ref[i][j].abs());
        assertEquals(ref[i][j].getReal(), fr.real(0, i, j), TOL * scale, what + " Re " + i + j + " w=" + w);
        assertEquals(ref[i][j].getImaginary(), fr.imag(0, i, j), TOL * scale, what + " Im " + i + j + " w=" + w);
      }
    }
  }

  @Test
  void feedbackWithFeedThroughInBothPathsMatchesTheTransferMatrixFormula() {
    // Two outputs, two inputs, D != 0 in the forward and the feedback path, dynamics in both.
    StateSpace g = randomSystem(11, 3, 2, 2);
    StateSpace h = randomSystem(12, 2, 2, 2).scale(0.3);
    for (FeedbackSign sign : FeedbackSign.values()) {
      StateSpace cl = g.feedback(h, sign);
      assertEquals(5, cl.stateCount());
      for (double w : OMEGAS) {
        Complex[][] gw = transfer(g, w);
        Complex[][] hw = transfer(h, w);
        Complex[][] gh = multiply(gw, hw);
        // [I - sign G H | G] -> (I - sign G H)^-1 G
        Complex[][] aug = new Complex[2][4];
        for (int i = 0; i < 2; i++) {
          for (int j = 0; j < 2; j++) {
            aug[i][j] = gh[i][j].multiply(-sign.factor()).add(i == j ? 1 : 0);
            aug[i][2 + j] = gw[i][j];
          }
        }
        assertMatches(solve(aug, 2, 2), cl, w, "feedback " + sign);
      }
    }
  }

  @Test
  void negativeFeedbackOfAStaticGainWithFeedThroughIsTheClosedForm() {
    // Hand-derived: G = (s + 3)/(s + 1) = 1 + 2/(s + 1) (D = 1), H = 2, negative feedback:
    // T = G/(1 + 2G) = (s + 3)/(3 s + 7). Positive feedback: (s + 3)/(-s - 5).
    StateSpace g = StateSpace.of(new double[][] {{-1}}, new double[][] {{2}}, new double[][] {{1}},
        new double[][] {{1}});
    for (double w : OMEGAS) {
      Complex s = new Complex(0, w);
      assertMatches(new Complex[][] {{s.add(3).divide(s.multiply(3).add(7))}},
          g.feedback(StateSpace.staticGain(2), FeedbackSign.NEGATIVE), w, "negative");
      assertMatches(new Complex[][] {{s.add(3).divide(s.negate().subtract(5))}},
          g.feedback(StateSpace.staticGain(2), FeedbackSign.POSITIVE), w, "positive");
    }
  }

  @Test
  void scaleAndAppendCarryTheFeedThrough() {
    StateSpace g1 = randomSystem(21, 2, 1, 2);
    StateSpace g2 = randomSystem(22, 3, 2, 1);
    StateSpace both = g1.append(g2);
    StateSpace scaled = g2.scale(-2.5);
    assertEquals(3, both.outputCount());
    assertEquals(3, both.inputCount());
    for (double w : OMEGAS) {
      Complex[][] a = transfer(g1, w);
      Complex[][] b = transfer(g2, w);
      Complex[][] diag = new Complex[3][3];
      for (int i = 0; i < 3; i++) {
        for (int j = 0; j < 3; j++) {
          diag[i][j] = Complex.ZERO;
        }
      }
      for (int j = 0; j < 2; j++) {
        diag[0][j] = a[0][j];
      }
      for (int i = 0; i < 2; i++) {
        diag[1 + i][2] = b[i][0];
      }
      assertMatches(diag, both, w, "append");
      Complex[][] k = new Complex[2][1];
      for (int i = 0; i < 2; i++) {
        k[i][0] = b[i][0].multiply(-2.5);
      }
      assertMatches(k, scaled, w, "scale");
    }
    // the D matrices themselves, not only their effect
    assertEquals(-2.5 * g2.d().get(1, 0), scaled.d().get(1, 0), 1e-15);
    assertEquals(g2.d().get(1, 0), both.d().get(2, 2), 0.0);
    assertEquals(g1.d().get(0, 1), both.d().get(0, 1), 0.0);
    assertEquals(0.0, both.d().get(0, 2), 0.0);
  }

  @Test
  void hessenbergSolvePivotsWhenTheDiagonalVanishes() {
    // A = [[0, 1], [-4, 0]] has a zero diagonal, so at w = 0 the first pivot of (jw I - A) is
    // exactly zero and at w = 1e-9 it is 1e-9 against a sub-diagonal of 4: without row
    // interchange the elimination divides by zero or amplifies round-off by 4e9. Closed form:
    // G(s) = C (sI - A)^-1 B with B = [0; 1], C = [1, 0]: 1/(s^2 + 4), so G(0) = 0.25 and
    // G(j w) = 1/(4 - w^2). Tolerance 1e-14: a 2 x 2 solve with pivoting is exact to round-off.
    StateSpace osc = StateSpace.of(new double[][] {{0, 1}, {-4, 0}}, new double[][] {{0}, {1}},
        new double[][] {{1, 0}}, new double[][] {{0}});
    double[] ws = {0.0, 1e-9, 1.0};
    FrequencyResponse fr = osc.frequencyResponse(ws);
    for (int k = 0; k < ws.length; k++) {
      assertEquals(1 / (4 - ws[k] * ws[k]), fr.real(k, 0, 0), 1e-14, "w=" + ws[k]);
      assertEquals(0.0, fr.imag(k, 0, 0), 1e-14, "w=" + ws[k]);
    }
    // a 4-state chain with zero diagonal: the same through several pivots, against the dense LU
    StateSpace chain = StateSpace.of(
        new double[][] {{0, 1, 0, 0}, {-3, 0, 1, 0}, {0, -2, 0, 1}, {0, 0, -5, 0}},
        new double[][] {{1}, {0}, {0}, {1}}, new double[][] {{1, 0, 1, 0}}, new double[][] {{0}});
    double[] wc = {0.0, 1e-10, 0.7};
    FrequencyResponse hess = chain.frequencyResponse(wc);
    for (int k = 0; k < wc.length; k++) {
      Complex ref = transfer(chain, wc[k])[0][0];
      assertEquals(ref.getReal(), hess.real(k, 0, 0), 1e-12 * Math.max(1, ref.abs()));
      assertEquals(ref.getImaginary(), hess.imag(k, 0, 0), 1e-12 * Math.max(1, ref.abs()));
    }
  }

  @Test
  void malformedSystemsAreRejected() {
    double[][] a = {{-1}};
    double[][] b = {{1}};
    double[][] c = {{1}};
    double[][] d = {{0}};
    assertTrue(StateSpace.of(a, b, c, d).isSiso());
    // dimension mismatches of each matrix (n = 2 states, 1 input, 1 output)
    DMatrixRMaj a2 = new DMatrixRMaj(2, 2);
    DMatrixRMaj b2 = new DMatrixRMaj(2, 1);
    DMatrixRMaj c2 = new DMatrixRMaj(1, 2);
    DMatrixRMaj d2 = new DMatrixRMaj(1, 1);
    assertEquals(2, StateSpace.of(a2, b2, c2, d2).stateCount());
    assertThrows(InvalidInputException.class, () -> StateSpace.of(new DMatrixRMaj(2, 3), b2, c2, d2));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(a2, new DMatrixRMaj(3, 1), c2, d2));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(a2, b2, new DMatrixRMaj(1, 3), d2));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(a2, b2, c2, new DMatrixRMaj(2, 1)));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(a2, b2, c2, new DMatrixRMaj(1, 2)));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(new double[][] {{-1, 0}}, b, c, d));
    // non-finite entries in each matrix
    assertThrows(InvalidInputException.class, () -> StateSpace.of(new double[][] {{Double.NaN}}, b, c, d));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(a, new double[][] {{Double.NaN}}, c, d));
    assertThrows(InvalidInputException.class,
        () -> StateSpace.of(a, b, new double[][] {{Double.POSITIVE_INFINITY}}, d));
    assertThrows(InvalidInputException.class, () -> StateSpace.of(a, b, c, new double[][] {{Double.NaN}}));
    StateSpace g = StateSpace.of(a, b, c, d);
    assertThrows(InvalidInputException.class, () -> g.scale(Double.NaN));
    assertThrows(InvalidInputException.class, () -> g.parallel(randomSystem(3, 1, 2, 1)));
    assertThrows(InvalidInputException.class, () -> g.feedback(randomSystem(4, 1, 2, 1), FeedbackSign.NEGATIVE));
    // transfer functions: improper, empty or zero leading denominator
    assertThrows(InvalidInputException.class,
        () -> StateSpace.fromTransferFunction(new double[] {1, 0, 0}, new double[] {1, 1}));
    assertThrows(InvalidInputException.class,
        () -> StateSpace.fromTransferFunction(new double[] {1}, new double[] {0, 1}));
    assertThrows(InvalidInputException.class,
        () -> StateSpace.fromTransferFunction(new double[] {1}, new double[] {}));
  }

  @Test
  void properTransferFunctionsOfEqualDegreeKeepTheirFeedThrough() {
    // Hand-derived: (2 s^2 + 3 s + 1)/(s^2 + 0.5 s + 4) = 2 + (2 s - 7)/(s^2 + 0.5 s + 4): D = 2.
    StateSpace sys = StateSpace.fromTransferFunction(new double[] {2, 3, 1}, new double[] {1, 0.5, 4});
    assertEquals(2.0, sys.d().get(0, 0), 1e-15);
    assertEquals(2, sys.stateCount());
    for (double w : OMEGAS) {
      Complex s = new Complex(0, w);
      Complex ref = s.multiply(s).multiply(2).add(s.multiply(3)).add(1)
          .divide(s.multiply(s).add(s.multiply(0.5)).add(4));
      assertMatches(new Complex[][] {{ref}}, sys, w, "biproper");
    }
    // a scaled leading coefficient: (4 s + 2)/(2 s + 4) = (2 s + 1)/(s + 2) = 2 - 3/(s + 2)
    StateSpace lead = StateSpace.fromTransferFunction(new double[] {4, 2}, new double[] {2, 4});
    assertEquals(2.0, lead.d().get(0, 0), 1e-15);
    assertEquals(-2.0, lead.a().get(0, 0), 1e-15);
  }
}
