package org.flexmargin.structure;

import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.CholeskyDecomposition_F64;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;

/**
 * Linear structural dynamics in generalized coordinates xi: {@code M xi'' + C xi' + K xi = F}.
 *
 * <p>All three matrices are square, of the same size as {@code coordinateNames}, with finite
 * entries; the mass matrix is symmetric (to 1e-12 of its largest entry, a few rounding errors of
 * an assembled matrix) and positive definite (a Cholesky factorisation must succeed). Damping and
 * stiffness are not required to be symmetric. Arrays are copied in and out, so the record is
 * immutable; {@code equals} and {@code hashCode} compare contents.
 *
 * <p>Units: for coordinates of length (m) the entries are kg, N s/m and N/m as the component
 * names say; for rotations or modal coordinates they are the matching consistent SI units
 * (kg m^2, N m s/rad, N m/rad, or per the mode-shape normalisation).
 *
 * @param coordinateNames unique, non-blank coordinate names, one per row/column
 * @param massKg mass matrix M (kg, or consistent SI units)
 * @param dampingNsPerM viscous damping matrix C (N s/m, or consistent SI units)
 * @param stiffnessNPerM stiffness matrix K (N/m, or consistent SI units)
 */
public record StructuralModel(
    List<String> coordinateNames,
    double[][] massKg,
    double[][] dampingNsPerM,
    double[][] stiffnessNPerM) {

  /** Relative asymmetry of the mass matrix accepted as rounding (see class Javadoc). */
  private static final double SYMMETRY_TOLERANCE = 1e-12;

  /** Validates and copies. */
  public StructuralModel {
    if (coordinateNames == null || coordinateNames.isEmpty()) {
      throw new InvalidInputException("coordinate_names", "at least one name", "none");
    }
    Set<String> seen = new HashSet<>();
    for (int i = 0; i < coordinateNames.size(); i++) {
      String name = coordinateNames.get(i);
      if (name == null || name.isBlank()) {
        throw new InvalidInputException(
            "coordinate_names[" + i + "]", "a non-empty name", name == null ? "nothing" : "\"\"");
      }
      if (!seen.add(name)) {
        throw new InvalidInputException(
            "coordinate_names[" + i + "]", "a unique name", "duplicate \"" + name + "\"");
      }
    }
    coordinateNames = List.copyOf(coordinateNames);
    int n = coordinateNames.size();
    massKg = copySquare("mass_kg", massKg, n);
    dampingNsPerM = copySquare("damping_ns_per_m", dampingNsPerM, n);
    stiffnessNPerM = copySquare("stiffness_n_per_m", stiffnessNPerM, n);
    checkSymmetricPositiveDefinite("mass_kg", massKg);
  }

  /**
   * Modal model of a mode table: coordinates are the modal amplitudes named after the modes, and
   * the matrices are diagonal with {@code M_ii = m_i}, {@code K_ii = omega_i^2 m_i} and
   * {@code C_ii = 2 zeta_i omega_i m_i}, where m_i is the generalized mass, omega_i = 2 pi f_i
   * and zeta_i the damping ratio of mode i (standard modal viscous damping; e.g. Hodges &amp;
   * Pierce, <i>Introduction to Structural Dynamics and Aeroelasticity</i>, ch. 3).
   *
   * @param table the mode table, not null
   * @return the diagonal modal model
   */
  public static StructuralModel fromModeTable(ModeTable table) {
    if (table == null) {
      throw new InvalidInputException("mode_table", "a mode table", "nothing");
    }
    int n = table.size();
    double[][] m = new double[n][n];
    double[][] c = new double[n][n];
    double[][] k = new double[n][n];
    for (int i = 0; i < n; i++) {
      ElasticMode mode = table.modes().get(i);
      double w = mode.omegaRadPerS();
      double mi = mode.generalizedMassKg();
      m[i][i] = mi;
      k[i][i] = w * w * mi;
      c[i][i] = 2 * mode.dampingRatio() * w * mi;
    }
    return new StructuralModel(table.modeNames(), m, c, k);
  }

  /** @return number of generalized coordinates */
  public int size() {
    return coordinateNames.size();
  }

  /** @return a copy of the mass matrix (kg, or consistent SI units) */
  @Override
  public double[][] massKg() {
    return copy(massKg);
  }

  /** @return a copy of the damping matrix (N s/m, or consistent SI units) */
  @Override
  public double[][] dampingNsPerM() {
    return copy(dampingNsPerM);
  }

  /** @return a copy of the stiffness matrix (N/m, or consistent SI units) */
  @Override
  public double[][] stiffnessNPerM() {
    return copy(stiffnessNPerM);
  }

  /**
   * @param i row
   * @param j column
   * @return mass-matrix entry M_ij (kg, or consistent SI units)
   */
  public double mass(int i, int j) {
    return massKg[i][j];
  }

  /**
   * @param i row
   * @param j column
   * @return damping-matrix entry C_ij (N s/m, or consistent SI units)
   */
  public double damping(int i, int j) {
    return dampingNsPerM[i][j];
  }

  /**
   * @param i row
   * @param j column
   * @return stiffness-matrix entry K_ij (N/m, or consistent SI units)
   */
  public double stiffness(int i, int j) {
    return stiffnessNPerM[i][j];
  }

  /** @return a new EJML copy of the mass matrix */
  public DMatrixRMaj massMatrix() {
    return new DMatrixRMaj(massKg);
  }

  /** @return a new EJML copy of the damping matrix */
  public DMatrixRMaj dampingMatrix() {
    return new DMatrixRMaj(dampingNsPerM);
  }

  /** @return a new EJML copy of the stiffness matrix */
  public DMatrixRMaj stiffnessMatrix() {
    return new DMatrixRMaj(stiffnessNPerM);
  }

  /**
   * @param name a coordinate name
   * @return its index, or -1 when absent
   */
  public int indexOf(String name) {
    return coordinateNames.indexOf(name);
  }

  /** Content equality: same names and element-wise equal matrices. */
  @Override
  public boolean equals(Object o) {
    return o instanceof StructuralModel other
        && coordinateNames.equals(other.coordinateNames)
        && Arrays.deepEquals(massKg, other.massKg)
        && Arrays.deepEquals(dampingNsPerM, other.dampingNsPerM)
        && Arrays.deepEquals(stiffnessNPerM, other.stiffnessNPerM);
  }

  /** Hash of the names and matrix contents, consistent with {@link #equals}. */
  @Override
  public int hashCode() {
    int h = coordinateNames.hashCode();
    h = 31 * h + Arrays.deepHashCode(massKg);
    h = 31 * h + Arrays.deepHashCode(dampingNsPerM);
    return 31 * h + Arrays.deepHashCode(stiffnessNPerM);
  }

  /** @return the names and matrix contents, for diagnostics */
  @Override
  public String toString() {
    return "StructuralModel[coordinateNames="
        + coordinateNames
        + ", massKg="
        + Arrays.deepToString(massKg)
        + ", dampingNsPerM="
        + Arrays.deepToString(dampingNsPerM)
        + ", stiffnessNPerM="
        + Arrays.deepToString(stiffnessNPerM)
        + "]";
  }

  private static double[][] copySquare(String path, double[][] a, int n) {
    if (a == null || a.length != n) {
      throw new InvalidInputException(
          path, n + " rows", a == null ? "nothing" : String.valueOf(a.length));
    }
    double[][] out = new double[n][];
    for (int i = 0; i < n; i++) {
      if (a[i] == null || a[i].length != n) {
        throw new InvalidInputException(
            path + "[" + i + "]",
            n + " columns",
            a[i] == null ? "nothing" : String.valueOf(a[i].length));
      }
      for (int j = 0; j < n; j++) {
        if (!Double.isFinite(a[i][j])) {
          throw new InvalidInputException(
              path + "[" + i + "][" + j + "]", "a finite number", String.valueOf(a[i][j]));
        }
      }
      out[i] = a[i].clone();
    }
    return out;
  }

  private static void checkSymmetricPositiveDefinite(String path, double[][] a) {
    int n = a.length;
    double largest = 0;
    for (double[] row : a) {
      for (double v : row) {
        largest = Math.max(largest, Math.abs(v));
      }
    }
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        if (Math.abs(a[i][j] - a[j][i]) > SYMMETRY_TOLERANCE * largest) {
          throw new InvalidInputException(
              path + "[" + i + "][" + j + "]",
              "a symmetric matrix (equal to entry [" + j + "][" + i + "])",
              a[i][j] + " vs " + a[j][i]);
        }
      }
    }
    CholeskyDecomposition_F64<DMatrixRMaj> chol = DecompositionFactory_DDRM.chol(n, true);
    if (largest == 0 || !chol.decompose(new DMatrixRMaj(a))) {
      throw new InvalidInputException(
          path, "a positive-definite matrix (Cholesky factorisation)", "a matrix that is not");
    }
  }

  private static double[][] copy(double[][] a) {
    double[][] out = new double[a.length][];
    for (int i = 0; i < a.length; i++) {
      out[i] = a[i].clone();
    }
    return out;
  }
}
