package org.flexmargin.flutter;

import java.util.List;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.structure.StructuralModel;

/**
 * The open-loop aeroelastic equations in generalized coordinates xi:
 *
 * <pre>  M xi'' + C xi' + K xi = q_dyn Q(ik) xi,   k = omega b_ref / V </pre>
 *
 * <p>with the rigid body restrained (elastic coordinates only). Holds the structural matrices as
 * flat row-major arrays for the solvers' inner loops. Instances are immutable and thread-safe.
 */
public final class AeroelasticSystem {
  private final StructuralModel structure;
  private final AeroSource aero;
  private final int n;
  private final double[] mass;
  private final double[] damping;
  private final double[] stiffness;

  /**
   * @param structure structural model
   * @param aero aerodynamic source of the same size, in the same coordinates
   */
  public AeroelasticSystem(StructuralModel structure, AeroSource aero) {
    if (structure.size() != aero.size()) {
      throw new IllegalArgumentException(
          "structure has " + structure.size() + " coordinates but the aerodynamic source has " + aero.size());
    }
    this.structure = structure;
    this.aero = aero;
    this.n = structure.size();
    this.mass = flatten(structure.massKg());
    this.damping = flatten(structure.dampingNsPerM());
    this.stiffness = flatten(structure.stiffnessNPerM());
  }

  private static double[] flatten(double[][] a) {
    int n = a.length;
    double[] f = new double[n * n];
    for (int i = 0; i < n; i++) {
      System.arraycopy(a[i], 0, f, i * n, n);
    }
    return f;
  }

  /** @return number of generalized coordinates */
  public int size() {
    return n;
  }

  /** @return the structural model */
  public StructuralModel structure() {
    return structure;
  }

  /** @return the aerodynamic source */
  public AeroSource aero() {
    return aero;
  }

  /** @return coordinate (mode) names */
  public List<String> coordinateNames() {
    return structure.coordinateNames();
  }

  /** @return M(i,j) (kg or consistent units) */
  double mass(int i, int j) {
    return mass[i * n + j];
  }

  /** @return C(i,j) */
  double damping(int i, int j) {
    return damping[i * n + j];
  }

  /** @return K(i,j) */
  double stiffness(int i, int j) {
    return stiffness[i * n + j];
  }

  /** @return the flat row-major mass array (not a copy: package-private for solvers) */
  double[] massFlat() {
    return mass;
  }

  /** @return the flat row-major damping array (not a copy) */
  double[] dampingFlat() {
    return damping;
  }

  /** @return the flat row-major stiffness array (not a copy) */
  double[] stiffnessFlat() {
    return stiffness;
  }

  /**
   * In-vacuo estimate of coordinate i's circular frequency sqrt(K_ii / M_ii) (rad/s), exact for
   * normal modes.
   */
  public double inVacuoOmegaRadPerS(int i) {
    return Math.sqrt(Math.max(stiffness(i, i), 0) / mass(i, i));
  }
}
