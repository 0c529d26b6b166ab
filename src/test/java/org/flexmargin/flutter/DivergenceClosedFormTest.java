package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
 * Static divergence of two coupled coordinates in closed form: q_D is the reciprocal of the largest
 * positive real eigenvalue mu of K^-1 Q(0), a 2 x 2 matrix whose eigenvalues follow from the
 * quadratic formula mu = (tr +- sqrt(tr^2 - 4 det))/2 (Bisplinghoff, Ashley &amp; Halfman,
 * <i>Aeroelasticity</i>, ch. 8), and the divergence shape is the null vector (-a_01, a_00) of
 * K - q_D Q(0). The aerodynamic stiffness here grows with k (Re Q = (1 + k) Q0) so that taking it at
 * the lowest valid k instead of 0 is visible.
 */
class DivergenceClosedFormTest {

  private static final double[][] K = {{400.0, 60.0}, {60.0, 150.0}};

  private static AeroelasticSystem system(double[][] q0, double kMin) {
    double[][] m = {{1.0, 0.0}, {0.0, 1.0}};
    AeroSource aero = new FunctionForces(2, 0.5, kMin, 2.0, (k, out) -> {
      for (int i = 0; i < 2; i++) {
        for (int j = 0; j < 2; j++) {
          out.set(i, j, (1 + k) * q0[i][j], 0.1 * k);
        }
      }
    }, "static test forces");
    return new AeroelasticSystem(new StructuralModel(List.of("bend", "twist"), m, new double[2][2], K), aero);
  }

  /** Eigenvalues of K^-1 (factor Q0) by the quadratic formula; NaN pair if complex. */
  private static double[] mu(double[][] q0, double factor) {
    double det = K[0][0] * K[1][1] - K[0][1] * K[1][0];
    double[][] kinv = {{K[1][1] / det, -K[0][1] / det}, {-K[1][0] / det, K[0][0] / det}};
    double[][] a = new double[2][2];
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        a[i][j] = factor * (kinv[i][0] * q0[0][j] + kinv[i][1] * q0[1][j]);
      }
    }
    double tr = a[0][0] + a[1][1];
    double dt = a[0][0] * a[1][1] - a[0][1] * a[1][0];
    double disc = tr * tr - 4 * dt;
    return disc < 0 ? new double[] {Double.NaN, Double.NaN}
        : new double[] {(tr + Math.sqrt(disc)) / 2, (tr - Math.sqrt(disc)) / 2};
  }

  @Test
  void divergencePressureShapeAndSpeedMatchTheQuadraticFormula() {
    double[][] q0 = {{0.02, 0.01}, {0.005, 0.03}};
    double kMin = 0.05;
    DivergenceResult r = new DivergenceSolver().solve(system(q0, kMin));
    double[] mu = mu(q0, 1 + kMin);
    assertTrue(mu[0] > 0 && mu[1] > 0, "premise: two positive roots, the larger decides");
    double qd = 1 / mu[0];
    assertTrue(r.found());
    // eigenvalue of a 2 x 2 real matrix from the complex Schur form: round-off, 1e-10 relative
    assertEquals(qd, r.dynamicPressurePa(), 1e-10 * qd);
    assertEquals(Math.sqrt(2 * qd / 1.225), r.speedEasMps(), 1e-10 * r.speedEasMps());
    assertEquals(Math.sqrt(2 * qd / 0.8), r.speedTasMps(0.8), 1e-10 * r.speedTasMps(0.8));
    assertEquals(kMin, r.reducedFrequencyUsed(), 0.0);
    assertTrue(r.note().contains("lowest tabulated value"), r.note());
    // null vector of K - q_D Q: (-a01, a00), unit norm, largest entry positive
    double a00 = K[0][0] - qd * (1 + kMin) * q0[0][0];
    double a01 = K[0][1] - qd * (1 + kMin) * q0[0][1];
    double norm = Math.hypot(a00, a01);
    double[] shape = {-a01 / norm, a00 / norm};
    int big = Math.abs(shape[0]) >= Math.abs(shape[1]) ? 0 : 1;
    double sign = Math.signum(shape[big]);
    assertEquals(sign * shape[0], r.shape()[0], 1e-8);
    assertEquals(sign * shape[1], r.shape()[1], 1e-8);
    assertTrue(r.relativeResidual() < 1e-12, "smallest/largest singular value at q_D: " + r.relativeResidual());
    // independent sweep check: first sign change of det(I - q K^-1 Q) brackets the same q_D
    double vAbove = Math.sqrt(2 * 1.5 * qd / 1.225);
    OptionalDouble confirmed = new DivergenceSolver().confirmOnPath(system(q0, kMin),
        new PlannedPath(new SpeedSweep(0.0, AirspeedKind.EQUIVALENT, 1.0, vAbove, 12)));
    assertTrue(confirmed.isPresent());
    // Brent to 1e-9 of the largest pressure of the sweep
    assertEquals(qd, confirmed.getAsDouble(), 1e-8 * 1.5 * qd);
    OptionalDouble below = new DivergenceSolver().confirmOnPath(system(q0, kMin),
        new PlannedPath(new SpeedSweep(0.0, AirspeedKind.EQUIVALENT, 1.0, 0.9 * Math.sqrt(2 * qd / 1.225), 12)));
    assertFalse(below.isPresent(), "a sweep ending below q_D must not confirm divergence");
  }

  @Test
  void atZeroLowestFrequencyTheStaticForcesAreTakenAtZero() {
    double[][] q0 = {{0.02, 0.01}, {0.005, 0.03}};
    DivergenceResult r = new DivergenceSolver().solve(system(q0, 0.0));
    assertEquals(1 / mu(q0, 1.0)[0], r.dynamicPressurePa(), 1e-10 / mu(q0, 1.0)[0]);
    assertEquals(0.0, r.reducedFrequencyUsed(), 0.0);
    assertFalse(r.note().contains("lowest tabulated value"), r.note());
  }

  @Test
  void complexOrNegativeRootsAreNotDivergence() {
    // K^-1 Q with a complex pair of positive real part (closed form: disc < 0): no divergence
    double[][] rotating = {{0.02, -0.2}, {0.2, 0.02}};
    assertTrue(Double.isNaN(mu(rotating, 1.0)[0]), "premise: complex pair");
    DivergenceResult c = new DivergenceSolver().solve(system(rotating, 0.0));
    assertFalse(c.found());
    assertTrue(Double.isNaN(c.dynamicPressurePa()) && Double.isNaN(c.speedEasMps()));
    assertTrue(Double.isNaN(c.speedTasMps(1.0)));
    assertTrue(c.note().contains("no positive real root"), c.note());
    // negative definite aerodynamic stiffness only stiffens: both mu negative
    double[][] stiffening = {{-0.02, 0.0}, {0.0, -0.03}};
    assertTrue(mu(stiffening, 1.0)[0] < 0, "premise: both roots negative");
    assertFalse(new DivergenceSolver().solve(system(stiffening, 0.0)).found());
    assertFalse(new DivergenceSolver().confirmOnPath(system(stiffening, 0.0),
        new PlannedPath(new SpeedSweep(0.0, AirspeedKind.EQUIVALENT, 1.0, 400, 12))).isPresent());
  }
}
