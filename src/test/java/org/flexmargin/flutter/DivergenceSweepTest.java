package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.List;
import java.util.OptionalDouble;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * Divergence on systems whose static determinant is known in closed form. With K = k0 I and a
 * diagonal aerodynamic stiffness Q(0) = diag(k0 / q_1, k0 / q_2),
 * det(I - q K^-1 Q(0)) = (1 - q / q_1)(1 - q / q_2): it changes sign at q_1 and again at q_2.
 */
class DivergenceSweepTest {

  private static final double K0 = 200.0;

  private static AeroelasticSystem system(double[][] stiffness, double[][] q0) {
    AeroSource aero = new FunctionForces(2, 0.5, 0.0, 2.0, (k, out) -> {
      for (int i = 0; i < 2; i++) {
        for (int j = 0; j < 2; j++) {
          out.set(i, j, q0[i][j], 0.0);
        }
      }
    }, "static test forces");
    return new AeroelasticSystem(new StructuralModel(List.of("a", "b"),
        new double[][] {{1.0, 0.0}, {0.0, 1.0}}, new double[2][2], stiffness), aero);
  }

  private static AeroelasticSystem diagonal(double q1, double q2) {
    return system(new double[][] {{K0, 0}, {0, K0}}, new double[][] {{K0 / q1, 0}, {0, K0 / q2}});
  }

  /** Five grid points at sea level up to 60 m/s EAS. */
  private static final PlannedPath PATH = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.EQUIVALENT, 20, 60, 5));
  private static final double Q_MAX = PATH.at(4).dynamicPressurePa();

  @Test
  void twoCloseDivergencePressuresAreBothResolvedByTheSweep() {
    // q_1 = 0.52 q_max and q_2 = 0.58 q_max lie 0.06 q_max apart; the sweep check samples the
    // pressure range finely enough (four samples per grid point) to see the first sign change alone
    double q1 = 0.52 * Q_MAX;
    OptionalDouble q = new DivergenceSolver().confirmOnPath(diagonal(q1, 0.58 * Q_MAX), PATH);
    // Brent to 1e-9 q_max
    assertEquals(q1, q.orElseThrow(), 1e-8 * Q_MAX);
    assertEquals(q1, new DivergenceSolver().solve(diagonal(q1, 0.58 * Q_MAX)).dynamicPressurePa(), 1e-9 * q1);
  }

  @Test
  void aDivergencePressureJustBelowTheLastSweepPointIsFound() {
    double q1 = 0.99 * Q_MAX;
    assertEquals(q1, new DivergenceSolver().confirmOnPath(diagonal(q1, 3 * Q_MAX), PATH).orElseThrow(),
        1e-8 * Q_MAX);
    assertFalse(new DivergenceSolver().confirmOnPath(diagonal(1.01 * Q_MAX, 3 * Q_MAX), PATH).isPresent());
  }

  @Test
  void aNearlyRealComplexPairIsNotDivergence() {
    // K^-1 Q(0) = 1e-5 [[1, -1e-3], [1e-3, 1]]: eigenvalues 1e-5 (1 +- 1e-3 i), a complex pair
    // whose imaginary part is far above round-off (1e-8 against 1e-21); det(K - q Q(0)) =
    // (K0 - q a)^2 + (q b)^2 > 0 for every q, so there is no divergence
    double a = 1e-5 * K0;
    double b = 1e-8 * K0;
    DivergenceResult r = new DivergenceSolver().solve(
        system(new double[][] {{K0, 0}, {0, K0}}, new double[][] {{a, -b}, {b, a}}));
    assertFalse(r.found(), "found q = " + r.dynamicPressurePa());
  }
}
