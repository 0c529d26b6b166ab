package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.aero.FitError;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/**
 * The state-space method's inputs: the state matrix entry by entry against its block formula
 * (class Javadoc of {@link StateSpaceMethod}) evaluated with Commons Math's inverse, the checks on
 * density, speed and sizes, the choice of the rational fit, and the fit error at a reduced
 * frequency by its definition.
 */
class StateSpaceInputsTest {

  private static final double[][] M = {{2.0, 0.3}, {0.3, 1.5}};
  private static final double[][] C = {{0.4, -0.1}, {0.2, 0.3}};
  private static final double[][] K = {{300.0, -40.0}, {25.0, 180.0}};
  private static final double B = 0.7;
  private static final double BETA = 0.35;
  /** A0, A1, A2 and one lag matrix A3, deliberately unsymmetric. */
  private static final double[][][] A = {
    {{0.02, -0.01}, {0.005, 0.03}},
    {{0.01, 0.004}, {-0.003, 0.006}},
    {{-0.002, 0.001}, {0.0005, -0.003}},
    {{0.015, -0.007}, {0.002, 0.009}}};

  private static RationalFit fit(double semichord, double[][][] coefficients, double[] lags) {
    int n = coefficients[0].length;
    return new RationalFit(semichord, lags, coefficients, new double[] {0.0, 0.5, 1.0},
        new FitError(new double[n][n], new double[n][n], 0.0, 0, 0), 0.05, List.of(), "test", RationalFit.ROGER);
  }

  private static final RationalFit FIT = fit(B, A, new double[] {BETA});

  /** A source that is not a fit: Q = A0 + i k A1, semichord B. */
  private static final AeroSource PLAIN = new FunctionForces(2, B, 0, 2.0, (k, out) -> {
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        out.set(i, j, A[0][i][j], k * A[1][i][j]);
      }
    }
  }, "plain test forces");

  private static AeroelasticSystem system(AeroSource aero) {
    return new AeroelasticSystem(new StructuralModel(List.of("a", "b"), M, C, K), aero);
  }

  @Test
  void stateMatrixIsTheBlockFormula() {
    double rho = 1.1;
    double v = 50.0;
    DMatrixRMaj a = StateSpaceMethod.stateMatrix(system(FIT), FIT, rho, v);
    assertEquals(6, a.numRows);
    assertEquals(6, a.numCols);
    double q = 0.5 * rho * v * v;
    RealMatrix mbar = new Array2DRowRealMatrix(M).subtract(
        new Array2DRowRealMatrix(A[2]).scalarMultiply(0.5 * rho * B * B));
    RealMatrix inv = MatrixUtils.inverse(mbar);
    RealMatrix kbar = new Array2DRowRealMatrix(K).subtract(new Array2DRowRealMatrix(A[0]).scalarMultiply(q));
    RealMatrix cbar = new Array2DRowRealMatrix(C).subtract(
        new Array2DRowRealMatrix(A[1]).scalarMultiply(0.5 * rho * v * B));
    RealMatrix stiff = inv.multiply(kbar).scalarMultiply(-1);
    RealMatrix damp = inv.multiply(cbar).scalarMultiply(-1);
    RealMatrix lag = inv.multiply(new Array2DRowRealMatrix(A[3])).scalarMultiply(q);
    double[][] expected = new double[6][6];
    for (int i = 0; i < 2; i++) {
      expected[i][2 + i] = 1.0;
      expected[4 + i][2 + i] = 1.0;
      expected[4 + i][4 + i] = -v / B * BETA;
      for (int j = 0; j < 2; j++) {
        expected[2 + i][j] = stiff.getEntry(i, j);
        expected[2 + i][2 + j] = damp.getEntry(i, j);
        expected[2 + i][4 + j] = lag.getEntry(i, j);
      }
    }
    for (int i = 0; i < 6; i++) {
      for (int j = 0; j < 6; j++) {
        // entries up to ~400 from a 2 x 2 solve: 1e-10 relative to that is round-off
        assertEquals(expected[i][j], a.get(i, j), 1e-10 * Math.max(1.0, Math.abs(expected[i][j])),
            "A(" + i + ", " + j + ")");
      }
    }
  }

  @Test
  void atRestTheStateMatrixIsTheInVacuoStructure() {
    // V = 0 (and so q = 0): the lag rows reduce to r' = xi', the lag poles to zero
    DMatrixRMaj a = StateSpaceMethod.stateMatrix(system(FIT), FIT, 1.225, 0.0);
    RealMatrix stiff = MatrixUtils.inverse(new Array2DRowRealMatrix(M).subtract(
        new Array2DRowRealMatrix(A[2]).scalarMultiply(0.5 * 1.225 * B * B))).multiply(new Array2DRowRealMatrix(K));
    assertEquals(-stiff.getEntry(1, 0), a.get(3, 0), 1e-12 * Math.abs(stiff.getEntry(1, 0)));
    assertEquals(0.0, a.get(4, 4), 0.0);
    assertEquals(0.0, a.get(2, 4), 0.0);
  }

  @Test
  void badDensitySpeedOrSizeIsRejected() {
    AeroelasticSystem sys = system(FIT);
    assertThrows(IllegalArgumentException.class, () -> StateSpaceMethod.stateMatrix(sys, FIT, -1e-9, 10));
    assertThrows(IllegalArgumentException.class, () -> StateSpaceMethod.stateMatrix(sys, FIT, Double.NaN, 10));
    assertThrows(IllegalArgumentException.class,
        () -> StateSpaceMethod.stateMatrix(sys, FIT, Double.POSITIVE_INFINITY, 10));
    assertThrows(IllegalArgumentException.class, () -> StateSpaceMethod.stateMatrix(sys, FIT, 1.0, -1e-9));
    assertThrows(IllegalArgumentException.class, () -> StateSpaceMethod.stateMatrix(sys, FIT, 1.0, Double.NaN));
    assertThrows(IllegalArgumentException.class,
        () -> StateSpaceMethod.stateMatrix(sys, FIT, 1.0, Double.POSITIVE_INFINITY));
    RationalFit one = fit(B, new double[][][] {{{1}}, {{0}}, {{0}}}, new double[0]);
    assertThrows(IllegalArgumentException.class, () -> StateSpaceMethod.stateMatrix(sys, one, 1.0, 10));
    assertThrows(org.flexmargin.model.InvalidInputException.class,
        () -> new StateSpaceMethod((org.flexmargin.model.RationalFitSettings) null));
  }

  @Test
  void aSingularApparentMassIsReported() {
    // b = 1 m and rho = 2 kg/m^3 make rho b^2 / 2 = 1 exactly, so A2 = M gives M - A2 = 0 exactly
    double[][][] c = new double[3][2][2];
    c[2] = M;
    RationalFit heavy = fit(1.0, c, new double[0]);
    assertThrows(ArithmeticException.class, () -> StateSpaceMethod.stateMatrix(system(heavy), heavy, 2.0, 10));
    // half that density leaves M / 2: regular
    assertEquals(4, StateSpaceMethod.stateMatrix(system(heavy), heavy, 1.0, 10).numRows);
  }

  @Test
  void theFitIsTheGivenOneTheSystemsOwnOrANewOneOfTheRequestedForm() {
    assertSame(FIT, new StateSpaceMethod(FIT).fitFor(system(PLAIN)));
    assertSame(FIT, new StateSpaceMethod().fitFor(system(FIT)));
    RationalFit made = new StateSpaceMethod(3, 1.2).fitFor(system(PLAIN));
    assertEquals(3, made.lagCount());
    assertEquals(1.2, made.maxReducedFrequency(), 1e-12);
    RationalFit byDefault = new StateSpaceMethod().fitFor(system(PLAIN));
    assertEquals(StateSpaceMethod.DEFAULT_LAG_COUNT, byDefault.lagCount());
    assertEquals(StateSpaceMethod.DEFAULT_MAX_REDUCED_FREQUENCY, byDefault.maxReducedFrequency(), 1e-12);
  }

  @Test
  void aFitThatDoesNotMatchTheSystemIsRejected() {
    RationalFit one = fit(B, new double[][][] {{{1}}, {{0}}, {{0}}}, new double[0]);
    assertThrows(IllegalArgumentException.class, () -> new StateSpaceMethod(one).fitFor(system(PLAIN)));
    RationalFit otherChord = fit(B * (1 + 1e-9), A, new double[] {BETA});
    assertThrows(IllegalArgumentException.class, () -> new StateSpaceMethod(otherChord).fitFor(system(PLAIN)));
    // the tolerance is 1e-12 relative: one and a half times that is another semichord
    RationalFit justOther = fit(B * (1 + 1.5e-12), A, new double[] {BETA});
    assertThrows(IllegalArgumentException.class, () -> new StateSpaceMethod(justOther).fitFor(system(PLAIN)));
    // a difference of 1e-14 relative is round-off of the same semichord and is accepted
    RationalFit sameChord = fit(B * (1 + 1e-14), A, new double[] {BETA});
    assertSame(sameChord, new StateSpaceMethod(sameChord).fitFor(system(PLAIN)));
    assertThrows(InvalidInputException.class, () -> new StateSpaceMethod((RationalFit) null));
    assertThrows(InvalidInputException.class, () -> new StateSpaceMethod(-1, 1.5));
    assertThrows(InvalidInputException.class, () -> new StateSpaceMethod(4, 0.0));
  }

  @Test
  void fitErrorIsTheLargestElementDifferenceOverTheLargestElement() {
    // the fit of this test has Q_fit(ik) = A0 + i k A1 - k^2 A2 + A3 (k^2 + i k beta)/(k^2 + beta^2);
    // against PLAIN (A0 + i k A1) the difference is the last two terms
    double k = 0.4;
    double den = k * k + BETA * BETA;
    double worst = 0;
    double largest = 0;
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        double dr = -k * k * A[2][i][j] + A[3][i][j] * k * k / den;
        double di = A[3][i][j] * k * BETA / den;
        worst = Math.max(worst, Math.hypot(dr, di));
        largest = Math.max(largest, Math.hypot(A[0][i][j], k * A[1][i][j]));
      }
    }
    assertEquals(worst / largest, StateSpaceMethod.fitErrorAt(PLAIN, FIT, k), 1e-12 * worst / largest);
    assertEquals(0.0, StateSpaceMethod.fitErrorAt(FIT, FIT, k), 0.0);
  }

  @Test
  void fitErrorAgainstVanishingDataIsZeroOrInfinite() {
    AeroSource zero = new FunctionForces(1, B, 0, 2, FunctionForces.NONE, "no forces");
    RationalFit nothing = fit(B, new double[][][] {{{0}}, {{0}}, {{0}}}, new double[0]);
    RationalFit something = fit(B, new double[][][] {{{0.1}}, {{0}}, {{0}}}, new double[0]);
    assertEquals(0.0, StateSpaceMethod.fitErrorAt(zero, nothing, 0.3), 0.0);
    assertEquals(Double.POSITIVE_INFINITY, StateSpaceMethod.fitErrorAt(zero, something, 0.3), 0.0);
  }
}
