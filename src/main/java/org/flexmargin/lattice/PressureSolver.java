package org.flexmargin.lattice;

import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_ZDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * Solves the doublet-lattice equations D(k, M) Delta Cp = w / U for the pressure coefficient jumps
 * of given normalwash columns.
 *
 * <p>Not thread-safe: one instance per thread (it keeps the influence matrix and its LU
 * factorisation as workspace).
 */
public final class PressureSolver {
  private final BoxLattice lattice;
  private final ZMatrixRMaj influence = new ZMatrixRMaj(1, 1);
  private LinearSolverDense<ZMatrixRMaj> lu;

  /** @param lattice the boxes */
  public PressureSolver(BoxLattice lattice) {
    this.lattice = lattice;
  }

  /**
   * Builds and factorises D at one reduced frequency and Mach number.
   *
   * @param omegaOverU omega / U (rad/m), &gt;= 0
   * @param mach Mach number in [0, 0.95]
   * @return false if the influence matrix is singular
   */
  public boolean factorise(double omegaOverU, double mach) {
    InfluenceMatrix.build(lattice, omegaOverU, mach, influence);
    lu = LinearSolverFactory_ZDRM.lu(lattice.size());
    // copy only where the factorisation would overwrite its input (EJML states it per solver)
    return lu.setA(lu.modifiesA() ? influence.copy() : influence);
  }

  /**
   * @param normalwash n x m columns of w / U at the control points (dimensionless, up positive)
   * @param out n x m pressure coefficient jumps (lift positive); reshaped, modified
   */
  public void solve(ZMatrixRMaj normalwash, ZMatrixRMaj out) {
    if (lu == null) {
      throw new IllegalStateException("factorise first");
    }
    out.reshape(normalwash.numRows, normalwash.numCols);
    lu.solve(lu.modifiesB() ? normalwash.copy() : normalwash, out);
  }
}
