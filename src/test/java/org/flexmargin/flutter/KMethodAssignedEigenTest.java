package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/**
 * The k method on three coupled coordinates whose aerodynamics are built so that the k-method
 * matrix has prescribed eigenvectors and eigenvalues. With M = K = I and C = 0 the hysteretic
 * stiffness is K_c = I and the k-method matrix is A(k) = I + (rho b^2 / (2 k^2)) Q(ik) (KMethod
 * documentation); choosing
 *
 * <pre>
 *   Q(ik) = (2 k^2 / (rho b^2)) (V diag(Lambda_j(k)) V^-1 - I),   Lambda_j = (1 + i g_j(k)) / omega_j(k)^2
 * </pre>
 *
 * makes the columns of V (fixed, not orthogonal) the eigenvectors and Lambda_j(k) the eigenvalues at
 * every k. Branch j must then report omega_j and g_j. The columns are chosen so that the first one has
 * the largest share of both coordinates 0 and 1: the start-up must still give each coordinate its own
 * eigenvector. omega_2 sweeps through omega_1 as k falls, so the eigenvalues change order while the
 * eigenvectors stay put. g_1(k) = GAMMA (K_STAR - k) crosses zero at K_STAR exactly, with omega_1
 * constant: flutter onset at V = omega_1 b / K_STAR and frequency omega_1 / 2 pi.
 */
class KMethodAssignedEigenTest {

  private static final double B = 0.5;
  private static final double RHO = PkClosedFormTest.RHO;
  /** Eigenvector columns (rows are coordinates). */
  private static final double[][] V = {
    {0.62, 0.52, 0.05},
    {0.58, 0.47, 0.15},
    {0.53, 0.71, 0.99}
  };
  private static final RealMatrix V_INV = MatrixUtils.inverse(new Array2DRowRealMatrix(V));
  private static final double OMEGA_1 = 2 * Math.PI * 2.0;
  private static final double OMEGA_3 = 2 * Math.PI * 5.0;
  private static final double GAMMA = 0.2;
  private static final double K_STAR = 0.3137;
  private static final double K_MIN = 0.05;
  private static final double K_MAX = 2.0;
  private static final int POINTS = 60;

  private static double omega(int j, double k) {
    return switch (j) {
      case 0 -> OMEGA_1;
      case 1 -> 2 * Math.PI * (1.5 + 0.75 * k);
      default -> OMEGA_3;
    };
  }

  private static double g(int j, double k) {
    return switch (j) {
      case 0 -> GAMMA * (K_STAR - k);
      case 1 -> -0.05;
      default -> -0.02;
    };
  }

  private static Complex lambda(int j, double k) {
    double w = omega(j, k);
    return new Complex(1, g(j, k)).divide(w * w);
  }

  private static final AeroSource ASSIGNED = new FunctionForces(3, B, 0.0, 5.0, (k, out) -> {
    double f = 2 * k * k / (RHO * B * B);
    for (int r = 0; r < 3; r++) {
      for (int c = 0; c < 3; c++) {
        Complex a = Complex.ZERO;
        for (int j = 0; j < 3; j++) {
          a = a.add(lambda(j, k).multiply(V[r][j] * V_INV.getEntry(j, c)));
        }
        if (r == c) {
          a = a.subtract(1.0);
        }
        out.set(r, c, f * a.getReal(), f * a.getImaginary());
      }
    }
  }, "forces with assigned k-method eigenvalues");

  private static FlutterSolution solve() {
    double[][] identity = {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}};
    AeroelasticSystem sys = new AeroelasticSystem(new StructuralModel(List.of("a", "b", "c"), identity,
        new double[3][3], identity), ASSIGNED);
    AnalysisOptions options = new AnalysisOptions(FlutterMethodKind.K, 0.03, 1e-9, 60, 0.01, K_MIN, K_MAX, POINTS);
    return new KMethod().solve(sys, PkClosedFormTest.PATH, options);
  }

  @Test
  void premiseTheFirstEigenvectorDominatesTwoCoordinates() {
    double[] share0 = new double[3];
    double[] share1 = new double[3];
    for (int j = 0; j < 3; j++) {
      double norm2 = V[0][j] * V[0][j] + V[1][j] * V[1][j] + V[2][j] * V[2][j];
      share0[j] = V[0][j] * V[0][j] / norm2;
      share1[j] = V[1][j] * V[1][j] / norm2;
    }
    assertTrue(share0[0] > share0[1] && share0[0] > share0[2]);
    assertTrue(share1[0] > share1[1] && share1[0] > share1[2]);
    assertTrue(share1[1] > share1[2]);
  }

  @Test
  void eachBranchFollowsItsAssignedEigenvalue() {
    FlutterSolution sol = solve();
    assertEquals(3, sol.branches().size());
    for (int j = 0; j < 3; j++) {
      BranchCurve c = sol.branches().get(j);
      for (int i = 0; i < POINTS; i++) {
        double k = c.reducedFrequency()[i];
        Complex l = lambda(j, k);
        double w = 1 / Math.sqrt(l.getReal());
        // eigenvalues of a 3 x 3 non-normal matrix with condition number of V about 30:
        // round-off times the condition number, 1e-10 relative is safe
        assertEquals(w / (2 * Math.PI), c.frequencyHz()[i], 1e-10 * w, "branch " + j + ", k = " + k);
        assertEquals(g(j, k), c.dampingG()[i], 1e-9, "branch " + j + ", k = " + k);
        assertEquals(w * B / k, c.speedTasMps()[i], 1e-9 * w * B / k);
      }
    }
    // constant eigenvectors: every step MAC is 1 to round-off
    assertEquals(1.0, sol.diagnostics().minMac(), 1e-9);
  }

  @Test
  void theOnsetIsAtTheAssignedReducedFrequency() {
    FlutterSolution sol = solve();
    assertEquals(1, sol.crossings().size(), sol.crossings().toString());
    FlutterCrossing x = sol.crossings().get(0);
    assertEquals(0, x.branch());
    assertEquals(CrossingKind.FLUTTER_ONSET, x.kind());
    // Brent on k to 1e-10 k
    assertEquals(K_STAR, x.pathParameter(), 1e-9 * K_STAR);
    assertEquals(OMEGA_1 / (2 * Math.PI), x.frequencyHz(), 1e-9 * OMEGA_1);
    assertEquals(OMEGA_1 * B / K_STAR, x.condition().speedTasMps(), 1e-8 * OMEGA_1 * B / K_STAR);
  }
}
