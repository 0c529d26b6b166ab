package org.flexmargin.simulate;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.NormOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * Stationary state covariance of a stable system x' = A x + G w driven by continuous white noise
 * of intensity W: the solution P of the Lyapunov equation A P + P A^T + G W G^T = 0.
 *
 * <p>Computed through the exact sampled process (Van Loan's Qd over a step T): P is also the
 * solution of the discrete equation P = Ad P Ad^T + Qd, summed by doubling (Smith, "Matrix
 * equation XA + BX = C", SIAM J. Appl. Math. 16(1):198-201, 1968): P_{j+1} = P_j + Ad_j P_j
 * Ad_j^T, Ad_{j+1} = Ad_j^2, until Ad_j has decayed. No truncation error beyond that decay test.
 * Immutable.
 *
 * @param covariance P (n x n)
 * @param stepS the step T of the sampled process (s)
 * @param stateTransition Ad = e^{A T}
 * @param stepCovariance Qd, the covariance added over one step
 */
public record StationaryCovariance(DMatrixRMaj covariance, double stepS, DMatrixRMaj stateTransition,
    DMatrixRMaj stepCovariance) {

  private static final int MAX_DOUBLINGS = 80;

  /** Copies. */
  public StationaryCovariance {
    covariance = covariance.copy();
    stateTransition = stateTransition.copy();
    stepCovariance = stepCovariance.copy();
  }

  @Override
  public DMatrixRMaj covariance() {
    return covariance.copy();
  }

  @Override
  public DMatrixRMaj stateTransition() {
    return stateTransition.copy();
  }

  @Override
  public DMatrixRMaj stepCovariance() {
    return stepCovariance.copy();
  }

  /**
   * @param a state matrix (stable: every eigenvalue in the open left half plane)
   * @param gwg G W G^T
   * @param stepS step T of the sampled process (s), &gt; 0
   * @return the stationary covariance
   * @throws ArithmeticException if the doubling does not converge (the system is not stable)
   */
  public static StationaryCovariance of(DMatrixRMaj a, DMatrixRMaj gwg, double stepS) {
    int n = a.numRows;
    DMatrixRMaj ad = ExactDiscretization.of(a, new DMatrixRMaj(n, 0), stepS).stateTransition();
    DMatrixRMaj qd = ExactDiscretization.noiseCovariance(a, gwg, stepS);
    DMatrixRMaj p = sum(powersOf(ad), qd);
    return new StationaryCovariance(p, stepS, ad, qd);
  }

  /**
   * The squarings Ad, Ad^2, Ad^4, ... until the power has decayed below 1e-15 (Frobenius norm).
   *
   * @param ad a discrete state transition with spectral radius below 1
   * @return the powers
   * @throws ArithmeticException if they do not decay (the system is not stable)
   */
  public static List<DMatrixRMaj> powersOf(DMatrixRMaj ad) {
    List<DMatrixRMaj> powers = new ArrayList<>();
    DMatrixRMaj power = ad.copy();
    for (int j = 0; j < MAX_DOUBLINGS; j++) {
      double norm = NormOps_DDRM.normF(power);
      if (!Double.isFinite(norm)) {
        break;
      }
      if (norm < 1e-15) {
        return powers;
      }
      powers.add(power);
      DMatrixRMaj next = new DMatrixRMaj(power.numRows, power.numCols);
      CommonOps_DDRM.mult(power, power, next);
      power = next;
    }
    throw new ArithmeticException("no stationary covariance: the system is not asymptotically stable");
  }

  /**
   * The solution X = sum_k Ad^k Q Ad^kT of X = Ad X Ad^T + Q by doubling.
   *
   * @param powers {@link #powersOf} of Ad
   * @param q symmetric matrix
   * @return X
   */
  public static DMatrixRMaj sum(List<DMatrixRMaj> powers, DMatrixRMaj q) {
    int n = q.numRows;
    DMatrixRMaj x = q.copy();
    DMatrixRMaj tmp = new DMatrixRMaj(n, n);
    DMatrixRMaj tmp2 = new DMatrixRMaj(n, n);
    for (DMatrixRMaj power : powers) {
      CommonOps_DDRM.mult(power, x, tmp);
      CommonOps_DDRM.multTransB(tmp, power, tmp2);
      CommonOps_DDRM.addEquals(x, tmp2);
    }
    ExactDiscretization.symmetrize(x);
    return x;
  }

  /**
   * A square-root factor F with F F^T = M of a symmetric positive semi-definite matrix, by the
   * symmetric eigen-decomposition (negative rounding-level eigenvalues clipped to zero), so that
   * rank-deficient step covariances are handled.
   *
   * @param m symmetric positive semi-definite matrix
   * @return F (n x n)
   */
  public static DMatrixRMaj squareRoot(DMatrixRMaj m) {
    int n = m.numRows;
    EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, true, true);
    if (!eig.decompose(m.copy())) {
      throw new ArithmeticException("symmetric eigen-decomposition failed");
    }
    DMatrixRMaj f = new DMatrixRMaj(n, n);
    for (int k = 0; k < n; k++) {
      double lambda = Math.max(0.0, eig.getEigenvalue(k).getReal());
      DMatrixRMaj v = eig.getEigenVector(k);
      double s = Math.sqrt(lambda);
      for (int i = 0; i < n; i++) {
        f.set(i, k, s * v.get(i, 0));
      }
    }
    return f;
  }
}
