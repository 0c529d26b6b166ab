package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.structure.StructuralModel;
import org.junit.jupiter.api.Test;

/**
 * The aeroelastic equations' container and the solvers' refusal of structures they cannot treat:
 * a stiffness matrix without inverse (a free rigid body) for the k method and divergence, sizes
 * that differ between structure and aerodynamics.
 */
class AeroelasticSystemTest {

  private static final double[][] M = {{2.0, 0.3}, {0.3, 1.5}};
  private static final double[][] C = {{0.4, -0.1}, {0.2, 0.3}};
  private static final double[][] K = {{300.0, -40.0}, {25.0, 180.0}};

  /** Quasi-steady forces Q = q0 (1 + i k), size n. */
  private static AeroSource forces(int n, double q0) {
    return new FunctionForces(n, 0.5, 0, 2, (k, out) -> {
      for (int i = 0; i < n; i++) {
        out.set(i, i, q0, q0 * k);
      }
    }, "diagonal test forces");
  }

  @Test
  void matricesAreReadRowByRow() {
    StructuralModel s = new StructuralModel(List.of("a", "b"), M, C, K);
    AeroSource aero = forces(2, 0.01);
    AeroelasticSystem sys = new AeroelasticSystem(s, aero);
    assertEquals(2, sys.size());
    assertSame(s, sys.structure());
    assertSame(aero, sys.aero());
    assertEquals(List.of("a", "b"), sys.coordinateNames());
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        assertEquals(M[i][j], sys.mass(i, j), 0.0);
        assertEquals(C[i][j], sys.damping(i, j), 0.0);
        assertEquals(K[i][j], sys.stiffness(i, j), 0.0);
        assertEquals(C[i][j], sys.dampingFlat()[2 * i + j], 0.0);
      }
    }
    // sqrt(K_ii / M_ii)
    assertEquals(Math.sqrt(150.0), sys.inVacuoOmegaRadPerS(0), 1e-12);
    assertEquals(Math.sqrt(120.0), sys.inVacuoOmegaRadPerS(1), 1e-12);
  }

  @Test
  void aNegativeDiagonalStiffnessHasNoInVacuoFrequency() {
    double[][] k = {{-10.0, 0.0}, {0.0, 40.0}};
    AeroelasticSystem sys = new AeroelasticSystem(
        new StructuralModel(List.of("a", "b"), M, new double[2][2], k), forces(2, 0.01));
    assertEquals(0.0, sys.inVacuoOmegaRadPerS(0), 0.0);
  }

  @Test
  void structureAndAerodynamicsMustHaveTheSameSize() {
    StructuralModel s = new StructuralModel(List.of("a", "b"), M, C, K);
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
        () -> new AeroelasticSystem(s, forces(3, 0.01)));
    assertTrue(e.getMessage().contains("2 coordinates") && e.getMessage().contains("3"), e.getMessage());
  }

  @Test
  void aFreeRigidBodyIsRefusedByTheKMethodAndByDivergence() {
    // K = [[1, 1], [1, 1]] is singular (a free mode along (1, -1))
    double[][] k = {{1.0, 1.0}, {1.0, 1.0}};
    AeroelasticSystem sys = new AeroelasticSystem(
        new StructuralModel(List.of("a", "b"), M, new double[2][2], k), forces(2, 0.01));
    // both need K^-1, which is not finite here: they stop rather than return results
    IllegalArgumentException kMethod = assertThrows(IllegalArgumentException.class,
        () -> new KMethod().solve(sys, PkClosedFormTest.PATH, AnalysisOptions.defaults()));
    assertTrue(kMethod.getMessage().contains("singular"), kMethod.getMessage());
    IllegalArgumentException d = assertThrows(IllegalArgumentException.class,
        () -> new DivergenceSolver().solve(sys));
    assertTrue(d.getMessage().contains("singular"), d.getMessage());
  }
}
