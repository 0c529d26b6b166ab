package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.numerics.ComplexEigenResult;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/**
 * The p-k workspace on a coupled two-coordinate system, checked with Commons Math (complex
 * arithmetic, real LU and inverse), independently of EJML: every frozen-aerodynamics root makes
 * det(M s^2 + C s + K - q Q) vanish, their sum and product are the trace and determinant of the
 * first-order matrix, Newton's root makes det F(s) vanish with Q at the root's own reduced
 * frequency, and the modal assurance criterion is |a^H b|^2 / (|a|^2 |b|^2) (Allemang, "The modal
 * assurance criterion", Proc. IMAC XX, 2002).
 */
class FlutterWorkspaceTest {

  private static final double[][] M = {{2.0, 0.3}, {0.3, 1.0}};
  private static final double[][] C = {{0.5, 0.1}, {0.1, 0.3}};
  private static final double[][] K = {{300.0, -50.0}, {-50.0, 200.0}};
  /** Q(ik) = Q0 + i k D (per pascal), full matrices. */
  private static final double[][] Q0 = {{0.004, -0.002}, {0.001, 0.003}};
  private static final double[][] D = {{0.01, 0.004}, {-0.003, 0.006}};
  private static final double B = 0.4;
  private static final FlightCondition FC = PkClosedFormTest.PATH.at(5);

  private static final AeroSource FULL = new FunctionForces(2, B, 0, Double.POSITIVE_INFINITY, (k, out) -> {
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        out.set(i, j, Q0[i][j], k * D[i][j]);
      }
    }
  }, "full test forces");

  private static FlutterWorkspace workspace() {
    AeroelasticSystem sys = new AeroelasticSystem(new StructuralModel(List.of("a", "b"), M, C, K), FULL);
    return new FlutterWorkspace(sys, new SolveCounters());
  }

  /** F(s) = M s^2 + C s + K - q Q(ik) entry (i, j), Commons Math complex arithmetic. */
  private static Complex f(int i, int j, Complex s, double k) {
    double q = FC.dynamicPressurePa();
    return s.multiply(s).multiply(M[i][j]).add(s.multiply(C[i][j])).add(K[i][j])
        .subtract(new Complex(Q0[i][j], k * D[i][j]).multiply(q));
  }

  /** |det F(s)| relative to the size of its two products. */
  private static double relativeDeterminant(Complex s, double k) {
    Complex a = f(0, 0, s, k).multiply(f(1, 1, s, k));
    Complex b = f(0, 1, s, k).multiply(f(1, 0, s, k));
    return a.subtract(b).abs() / (a.abs() + b.abs());
  }

  @Test
  void frozenRootsSolveTheQuadraticEigenproblem() {
    double k = 0.3;
    ComplexEigenResult e = workspace().frozenRoots(k, FC);
    assertEquals(4, e.size());
    Complex sum = Complex.ZERO;
    Complex product = Complex.ONE;
    for (int c = 0; c < 4; c++) {
      Complex s = new Complex(e.realAt(c), e.imagAt(c));
      // double-precision eigenvalues of a 4 x 4 matrix with entries up to ~300: the determinant
      // relative to its terms vanishes to ~1e-13; 1e-10 is safe
      assertEquals(0.0, relativeDeterminant(s, k), 1e-10, "root " + s);
      sum = sum.add(s);
      product = product.multiply(s);
    }
    // trace of [[0, I], [-M^-1 (K - qQ), -M^-1 C]] is -tr(M^-1 C); its determinant is
    // det(M^-1 (K - q Q)) = det(K - q Q) / det(M) (block determinant with commuting blocks)
    RealMatrix mInv = MatrixUtils.inverse(new Array2DRowRealMatrix(M));
    double trace = -mInv.multiply(new Array2DRowRealMatrix(C)).getTrace();
    assertEquals(trace, sum.getReal(), 1e-9 * Math.abs(trace));
    assertEquals(0.0, sum.getImaginary(), 1e-9 * Math.abs(trace));
    double q = FC.dynamicPressurePa();
    Complex[][] kq = new Complex[2][2];
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        kq[i][j] = new Complex(K[i][j] - q * Q0[i][j], -q * k * D[i][j]);
      }
    }
    Complex det = kq[0][0].multiply(kq[1][1]).subtract(kq[0][1].multiply(kq[1][0]))
        .divide(new LUDecomposition(new Array2DRowRealMatrix(M)).getDeterminant());
    assertEquals(0.0, product.subtract(det).abs(), 1e-9 * det.abs());
  }

  @Test
  void newtonConvergesToARootOfTheFlutterDeterminantAtItsOwnReducedFrequency() {
    FlutterWorkspace ws = workspace();
    // start from a frozen root at a guessed k, as the start-up does
    ComplexEigenResult e = ws.frozenRoots(0.3, FC);
    int pick = e.imagAt(0) > 0 ? 0 : 1;
    for (int c = 0; c < 4; c++) {
      if (e.imagAt(c) > 0 && Math.abs(e.imagAt(c)) < Math.abs(e.imagAt(pick))) {
        pick = c;
      }
    }
    double[] v = new double[4];
    for (int i = 0; i < 2; i++) {
      v[2 * i] = e.vectors().getReal(i, pick);
      v[2 * i + 1] = e.vectors().getImag(i, pick);
    }
    FlutterWorkspace.Root r = ws.newton(e.realAt(pick), e.imagAt(pick), v, FC, 60, 1e-12);
    assertTrue(r.converged());
    Complex s = new Complex(r.sr(), r.si());
    double k = Math.abs(r.si()) * B / FC.speedTasMps();
    assertEquals(0.0, relativeDeterminant(s, k), 1e-11, "det F(s) at k = Im(s) b / V");
    // Newton converges quadratically from a start this close: a handful of steps
    assertTrue(r.iterations() <= 8, "iterations " + r.iterations());
    assertTrue(r.residual() < 1e-12, "residual " + r.residual());
    // the vector is a unit null vector of F(s): |F(s) v| small, |v| = 1
    double norm = 0;
    Complex[] fv = {Complex.ZERO, Complex.ZERO};
    for (int i = 0; i < 2; i++) {
      norm += r.v()[2 * i] * r.v()[2 * i] + r.v()[2 * i + 1] * r.v()[2 * i + 1];
      for (int j = 0; j < 2; j++) {
        fv[i] = fv[i].add(f(i, j, s, k).multiply(new Complex(r.v()[2 * j], r.v()[2 * j + 1])));
      }
    }
    assertEquals(1.0, norm, 1e-12);
    assertTrue(fv[0].abs() + fv[1].abs() < 1e-9 * 300, "F(s) v = " + fv[0] + ", " + fv[1]);
    // the same start with a budget of one step has not converged, and its residual says so
    FlutterWorkspace.Root one = ws.newton(e.realAt(pick) * 1.3, e.imagAt(pick) * 0.7, v, FC, 1, 1e-12);
    assertFalse(one.converged());
    assertTrue(one.residual() > 1e-6, "residual of an unconverged root " + one.residual());
    assertEquals(1, one.iterations());
  }

  @Test
  void macIsTheNormalisedSquaredInnerProduct() {
    Random rnd = new Random(7);
    for (int trial = 0; trial < 20; trial++) {
      double[] a = new double[6];
      double[] b = new double[6];
      for (int i = 0; i < 6; i++) {
        a[i] = rnd.nextGaussian();
        b[i] = rnd.nextGaussian();
      }
      Complex inner = Complex.ZERO;
      double aa = 0;
      double bb = 0;
      for (int i = 0; i < 6; i += 2) {
        Complex ca = new Complex(a[i], a[i + 1]);
        Complex cb = new Complex(b[i], b[i + 1]);
        inner = inner.add(ca.conjugate().multiply(cb));
        aa += ca.abs() * ca.abs();
        bb += cb.abs() * cb.abs();
      }
      double expected = inner.abs() * inner.abs() / (aa * bb);
      assertEquals(expected, FlutterWorkspace.mac(a, b), 1e-13);
      // b = (2 - 3i) a: the same shape, MAC = 1 (equality in Cauchy-Schwarz)
      double[] scaled = new double[6];
      for (int i = 0; i < 6; i += 2) {
        Complex c = new Complex(a[i], a[i + 1]).multiply(new Complex(2, -3));
        scaled[i] = c.getReal();
        scaled[i + 1] = c.getImaginary();
      }
      assertEquals(1.0, FlutterWorkspace.mac(a, scaled), 1e-13);
    }
    assertEquals(0.0, FlutterWorkspace.mac(new double[] {1, 0, 0, 0}, new double[] {0, 0, 0, 1}), 0.0);
    assertEquals(0.0, FlutterWorkspace.mac(new double[4], new double[4]), 0.0);
  }

  @Test
  void normaliseGivesAUnitVectorAndLeavesZeroAlone() {
    double[] v = {3, 0, 0, 4};
    FlutterWorkspace.normalise(v);
    assertEquals(0.6, v[0], 1e-15);
    assertEquals(0.8, v[3], 1e-15);
    double[] z = new double[4];
    FlutterWorkspace.normalise(z);
    assertEquals(0.0, z[0], 0.0);
  }
}
