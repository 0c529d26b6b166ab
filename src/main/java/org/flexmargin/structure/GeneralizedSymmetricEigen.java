package org.flexmargin.structure;

import java.util.Arrays;
import java.util.Comparator;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.decomposition.TriangularSolver_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.CholeskyDecomposition_F64;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * The symmetric-definite generalized eigenproblem {@code K v = lambda M v} (K symmetric, M
 * symmetric positive definite), solved by the standard Cholesky reduction: M = L L^T, the
 * symmetric standard problem {@code (L^-1 K L^-T) u = lambda u}, then v = L^-T u (Golub &amp;
 * Van Loan, <i>Matrix Computations</i>, 4th ed., section 8.7.2).
 *
 * <p>The eigenvectors are mass-normalised, {@code v^T M v = 1}, and mutually M- and
 * K-orthogonal; eigenvalues are in ascending order. For structural dynamics lambda = omega^2
 * (rad^2/s^2).
 */
final class GeneralizedSymmetricEigen {
  private GeneralizedSymmetricEigen() {}

  /**
   * Eigen-solution.
   *
   * @param eigenvalues ascending eigenvalues lambda_i
   * @param vectors n x n matrix whose column i is the mass-normalised eigenvector of lambda_i
   */
  record Solution(double[] eigenvalues, DMatrixRMaj vectors) {}

  /**
   * Solves {@code K v = lambda M v}.
   *
   * @param stiffness symmetric K (not modified)
   * @param mass symmetric positive-definite M (not modified)
   * @return ascending eigenvalues and mass-normalised eigenvectors
   * @throws IllegalStateException if M is not positive definite or the eigen solver fails
   */
  static Solution solve(DMatrixRMaj stiffness, DMatrixRMaj mass) {
    int n = mass.numRows;
    CholeskyDecomposition_F64<DMatrixRMaj> chol = DecompositionFactory_DDRM.chol(n, true);
    if (!chol.decompose(mass.copy())) {
      throw new IllegalStateException("mass matrix is not positive definite");
    }
    DMatrixRMaj lowerInverse = chol.getT(null);
    TriangularSolver_DDRM.invertLower(lowerInverse.data, n);
    // A = L^-1 K L^-T
    DMatrixRMaj tmp = new DMatrixRMaj(n, n);
    CommonOps_DDRM.mult(lowerInverse, stiffness, tmp);
    DMatrixRMaj a = new DMatrixRMaj(n, n);
    CommonOps_DDRM.multTransB(tmp, lowerInverse, a);
    // Symmetrise away rounding so the symmetric solver sees an exactly symmetric matrix.
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        double s = 0.5 * (a.get(i, j) + a.get(j, i));
        a.set(i, j, s);
        a.set(j, i, s);
      }
    }
    EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, true, true);
    if (!eig.decompose(a)) {
      throw new IllegalStateException("symmetric eigen decomposition failed");
    }
    Integer[] order = new Integer[n];
    double[] values = new double[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
      values[i] = eig.getEigenvalue(i).real;
    }
    Arrays.sort(order, Comparator.comparingDouble(i -> values[i]));
    double[] sorted = new double[n];
    DMatrixRMaj u = new DMatrixRMaj(n, n);
    for (int c = 0; c < n; c++) {
      sorted[c] = values[order[c]];
      DMatrixRMaj vec = eig.getEigenVector(order[c]);
      double norm = Math.sqrt(CommonOps_DDRM.elementSum(elementSquares(vec)));
      for (int r = 0; r < n; r++) {
        u.set(r, c, vec.get(r) / norm);
      }
    }
    // v = L^-T u
    DMatrixRMaj v = new DMatrixRMaj(n, n);
    CommonOps_DDRM.multTransA(lowerInverse, u, v);
    return new Solution(sorted, v);
  }

  private static DMatrixRMaj elementSquares(DMatrixRMaj v) {
    DMatrixRMaj out = v.copy();
    CommonOps_DDRM.elementMult(out, v);
    return out;
  }
}
