package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.ejml.data.DMatrixRMaj;
import org.junit.jupiter.api.Test;

/** The matrix exponential against closed forms. */
class MatrixExponentialTest {

  @Test
  void rotationGeneratorGivesCosineAndSine() {
    // closed form: expm([0 w; -w 0] t) = [cos wt, sin wt; -sin wt, cos wt] (any linear-systems
    // text, e.g. Franklin, Powell & Emami-Naeini, Feedback Control of Dynamic Systems, ch. 4).
    // w t = 40 rad forces five squarings. Tolerance: a few hundred ulps of the squaring chain.
    double wt = 40.0;
    DMatrixRMaj e = MatrixExponential.of(new DMatrixRMaj(new double[][] {{0, wt}, {-wt, 0}}));
    assertEquals(Math.cos(wt), e.get(0, 0), 1e-12);
    assertEquals(Math.sin(wt), e.get(0, 1), 1e-12);
    assertEquals(-Math.sin(wt), e.get(1, 0), 1e-12);
    assertEquals(Math.cos(wt), e.get(1, 1), 1e-12);
  }

  @Test
  void stiffTriangularMatrixMatchesItsClosedForm() {
    // closed form for A = [a 1; 0 b], a != b: e^{A} = [e^a, (e^a - e^b)/(a - b); 0, e^b]
    // (derived: the off-diagonal solves x' = a x + e^{b t}, x(0) = 0). Stiffness ratio 1000.
    double a = -20.0;
    double b = -0.02;
    DMatrixRMaj e = MatrixExponential.of(new DMatrixRMaj(new double[][] {{a, 1}, {0, b}}));
    assertEquals(Math.exp(a), e.get(0, 0), 1e-15);
    assertEquals((Math.exp(a) - Math.exp(b)) / (a - b), e.get(0, 1), 1e-14);
    assertEquals(0.0, e.get(1, 0), 0.0);
    assertEquals(Math.exp(b), e.get(1, 1), 1e-14);
  }

  @Test
  void zeroMatrixGivesIdentityAndSmallNormNeedsNoScaling() {
    DMatrixRMaj e = MatrixExponential.of(new DMatrixRMaj(3, 3));
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        assertEquals(i == j ? 1.0 : 0.0, e.get(i, j), 0.0);
      }
    }
    // scalar case: e^0.5 from java.lang.Math; the degree-13 approximant is exact to rounding here
    assertEquals(Math.exp(0.5), MatrixExponential.of(new DMatrixRMaj(new double[][] {{0.5}})).get(0, 0), 2e-16);
  }
}
