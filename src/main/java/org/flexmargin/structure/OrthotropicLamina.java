package org.flexmargin.structure;

/**
 * A plate material with orthotropic elastic constants in its own axes 1 and 2, axis 1 turned by
 * {@code axisAngleRad} from the +y (outboard) direction towards +x (aft), so an axis along a line
 * swept back by Lambda has angle Lambda.
 *
 * <p>Bending stiffness of a Kirchhoff plate of thickness t: with the curvatures
 * kappa = (w_xx, w_yy, w_xy) the strain energy per unit area is
 * (t^3 / 24) [Q11 k11^2 + 2 Q12 k11 k22 + Q22 k22^2 + 4 Q66 k12^2], where k_ab are the curvature
 * tensor's components in the material axes, Q11 = E1 / (1 - nu12 nu21), Q22 = E2 / (1 - nu12 nu21),
 * Q12 = nu12 Q22, Q66 = G12 and nu21 = nu12 E2 / E1 (reduced stiffness of an orthotropic lamina,
 * e.g. R. M. Jones, <i>Mechanics of Composite Materials</i>, ch. 2). With e1 = (ex, ey) =
 * (sin a, cos a) the unit vector of axis 1 in (x, y) and e2 = (-ey, ex), the components
 * k_ab = e_a^T kappa e_b are k11 = ex^2 w_xx + 2 ex ey w_xy + ey^2 w_yy,
 * k22 = ey^2 w_xx - 2 ex ey w_xy + ex^2 w_yy, k12 = -ex ey w_xx + (ex^2 - ey^2) w_xy + ex ey w_yy
 * (rows of T), so the
 * energy is (1/2) kappa^T D kappa with D = (t^3 / 12) T^T diag-block(Q) T.
 *
 * @param e1Pa Young's modulus along axis 1 (Pa), &gt; 0
 * @param e2Pa Young's modulus along axis 2 (Pa), &gt; 0
 * @param g12Pa in-plane shear modulus (Pa), &gt; 0
 * @param nu12 major Poisson ratio (dimensionless), with nu12 nu21 &lt; 1
 * @param densityKgPerM3 mass density (kg/m^3), &gt; 0
 * @param axisAngleRad angle of axis 1 from +y towards +x (rad), finite
 */
public record OrthotropicLamina(
    double e1Pa, double e2Pa, double g12Pa, double nu12, double densityKgPerM3, double axisAngleRad) {

  /** Validates positive moduli and density and a positive-definite reduced stiffness. */
  public OrthotropicLamina {
    PositiveFinite.require("lamina E1 (Pa)", e1Pa);
    PositiveFinite.require("lamina E2 (Pa)", e2Pa);
    PositiveFinite.require("lamina G12 (Pa)", g12Pa);
    PositiveFinite.require("lamina density (kg/m^3)", densityKgPerM3);
    if (!Double.isFinite(axisAngleRad) || !Double.isFinite(nu12) || !(nu12 * nu12 * e2Pa / e1Pa < 1)) {
      throw new IllegalArgumentException("lamina needs a finite axis angle (rad) and nu12^2 E2 / E1 < 1; got nu12 "
          + nu12 + ", angle " + axisAngleRad);
    }
  }

  /**
   * Isotropic material: E1 = E2 = E, G = E / (2 (1 + nu)).
   *
   * @param ePa Young's modulus (Pa)
   * @param nu Poisson ratio, -1 &lt; nu &lt; 0.5
   * @param densityKgPerM3 density (kg/m^3)
   * @return the material (axis angle 0)
   */
  public static OrthotropicLamina isotropic(double ePa, double nu, double densityKgPerM3) {
    return new OrthotropicLamina(ePa, ePa, ePa / (2 * (1 + nu)), nu, densityKgPerM3, 0);
  }

  /**
   * @param thicknessM plate thickness t (m)
   * @return D, 3 x 3 row-major, on (w_xx, w_yy, w_xy) (N m)
   */
  double[][] bendingStiffness(double thicknessM) {
    double nu21 = nu12 * e2Pa / e1Pa;
    double den = 1 - nu12 * nu21;
    double[] q = {e1Pa / den, e2Pa / den, nu12 * e2Pa / den, 4 * g12Pa};
    double ex = Math.sin(axisAngleRad), ey = Math.cos(axisAngleRad);
    double[][] t = {
      {ex * ex, ey * ey, 2 * ex * ey},
      {ey * ey, ex * ex, -2 * ex * ey},
      {-ex * ey, ex * ey, ex * ex - ey * ey}
    };
    double[][] qm = {{q[0], q[2], 0}, {q[2], q[1], 0}, {0, 0, q[3]}};
    double scale = thicknessM * thicknessM * thicknessM / 12;
    double[][] d = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        double sum = 0;
        for (int a = 0; a < 3; a++) {
          for (int b = 0; b < 3; b++) {
            sum += t[a][i] * qm[a][b] * t[b][j];
          }
        }
        d[i][j] = scale * sum;
      }
    }
    return d;
  }
}
