package org.flexmargin.flutter;

import java.util.Locale;
import java.util.OptionalDouble;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.MatrixFeatures_DDRM;
import org.ejml.dense.row.NormOps_DDRM;
import org.ejml.dense.row.SingularOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;
import org.ejml.interfaces.decomposition.LUDecomposition_F64;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.numerics.ComplexEigen;
import org.flexmargin.numerics.ComplexEigenResult;

/**
 * Static divergence: the lowest positive real dynamic pressure q_D at which the static
 * aeroelastic stiffness K - q Q(0) becomes singular (Bisplinghoff, Ashley &amp; Halfman,
 * <i>Aeroelasticity</i>, ch. 8; Hodges &amp; Pierce, ch. 5). Solved directly as the eigenproblem
 * K^-1 Q(0) phi = mu phi, q_D = 1 / max(mu &gt; 0, real). The rigid body is restrained (elastic
 * coordinates only), which the result states.
 *
 * <p>{@link #confirmOnPath} is the independent sweep check: it brackets the first sign change of
 * det(I - q K^-1 Q(0)) over the dynamic pressures of a sweep and refines it with Brent's method,
 * using LU determinants only (no eigen-solver). Stateless and thread-safe.
 */
public final class DivergenceSolver {

  private static final double REAL_TOLERANCE = 1e-9;

  /**
   * @param system aeroelastic system
   * @return divergence pressure and speed, or not found
   */
  public DivergenceResult solve(AeroelasticSystem system) {
    int n = system.size();
    double k0 = Math.max(0.0, system.aero().minReducedFrequency());
    DMatrixRMaj kInvQ = staticMatrix(system, k0);
    // eigenvalues of the (often defective: heave columns of Q(0) vanish) matrix K^-1 Q(0) by the
    // complex Schur form, which needs no eigenvectors; the shape comes from the null space below
    ComplexEigenResult eig = new ComplexEigen().decompose(toComplex(kInvQ));
    double muMax = 0;
    double scale = 0;
    for (int i = 0; i < n; i++) {
      scale = Math.max(scale, Math.hypot(eig.realAt(i), eig.imagAt(i)));
    }
    for (int i = 0; i < n; i++) {
      double re = eig.realAt(i);
      if (Math.abs(eig.imagAt(i)) <= REAL_TOLERANCE * Math.max(scale, Double.MIN_NORMAL) && re > muMax) {
        muMax = re;
      }
    }
    String note = "rigid body restrained; aerodynamic stiffness Q taken at k = "
        + String.format(Locale.ROOT, "%.4g", k0) + (k0 > 0 ? " (lowest tabulated value, not 0)" : "");
    // A zero eigenvalue of a defective K^-1 Q(0) (e.g. elastic axis at the aerodynamic centre)
    // is perturbed by rounding to O(sqrt(eps) ||K^-1 Q(0)||) (Golub & Van Loan, 4th ed., 7.2.2):
    // smaller positive values are not divergence.
    double spurious = 1e-7 * NormOps_DDRM.normF(kInvQ);
    if (muMax <= spurious) {
      return new DivergenceResult(false, Double.NaN, Double.NaN, new double[n], Double.NaN, k0,
          note + "; no positive real root of the static stability determinant");
    }
    double qd = 1.0 / muMax;
    double[] shape = nullVector(system, k0, qd);
    double residual = singularRatio(system, k0, qd);
    double eas = Math.sqrt(2 * qd / FlightCondition.SEA_LEVEL_DENSITY_KG_PER_M3);
    return new DivergenceResult(true, qd, eas, shape, residual, k0, note);
  }

  /**
   * Independent check: the first sign change of det(I - q K^-1 Q(0)) over the sweep's dynamic
   * pressures, refined by Brent's method.
   *
   * @return q_D (Pa) if the sweep reaches divergence, else empty
   */
  public OptionalDouble confirmOnPath(AeroelasticSystem system, FlightPath path) {
    double k0 = Math.max(0.0, system.aero().minReducedFrequency());
    DMatrixRMaj kInvQ = staticMatrix(system, k0);
    double qMax = 0;
    for (int p = 0; p < path.gridPoints(); p++) {
      qMax = Math.max(qMax, path.at(p).dynamicPressurePa());
    }
    int steps = Math.max(path.gridPoints(), 2) * 4;
    double prevQ = 0;
    double prevD = 1.0;
    for (int i = 1; i <= steps; i++) {
      double q = qMax * i / steps;
      double d = determinant(kInvQ, q);
      if (Math.signum(d) != Math.signum(prevD)) {
        BrentSolver solver = new BrentSolver(1e-13, 1e-9 * qMax);
        return OptionalDouble.of(solver.solve(200, qq -> determinant(kInvQ, qq), prevQ, q));
      }
      prevQ = q;
      prevD = d;
    }
    return OptionalDouble.empty();
  }

  private static double determinant(DMatrixRMaj kInvQ, double q) {
    int n = kInvQ.numRows;
    DMatrixRMaj a = new DMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a.set(i, j, (i == j ? 1.0 : 0.0) - q * kInvQ.get(i, j));
      }
    }
    LUDecomposition_F64<DMatrixRMaj> lu = DecompositionFactory_DDRM.lu(n, n);
    if (!lu.decompose(a)) {
      return 0.0;
    }
    return lu.computeDeterminant().real;
  }

  /** Re Q(ik0): the aerodynamic stiffness. */
  private static DMatrixRMaj realForces(AeroelasticSystem system, double k0) {
    int n = system.size();
    ZMatrixRMaj q = new ZMatrixRMaj(n, n);
    system.aero().forces(k0, q);
    DMatrixRMaj qr = new DMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        qr.set(i, j, q.getReal(i, j));
      }
    }
    return qr;
  }

  /** K^-1 Re Q(ik0). */
  private static DMatrixRMaj staticMatrix(AeroelasticSystem system, double k0) {
    int n = system.size();
    DMatrixRMaj qr = realForces(system, k0);
    DMatrixRMaj k = new DMatrixRMaj(n, n, true, system.stiffnessFlat());
    DMatrixRMaj kInvQ = new DMatrixRMaj(n, n);
    if (!CommonOps_DDRM.solve(k, qr, kInvQ) || MatrixFeatures_DDRM.hasUncountable(kInvQ)) {
      throw new IllegalArgumentException(
          "stiffness matrix is singular: divergence needs the rigid body restrained (elastic modes only)");
    }
    return kInvQ;
  }

  private static ZMatrixRMaj toComplex(DMatrixRMaj a) {
    ZMatrixRMaj z = new ZMatrixRMaj(a.numRows, a.numCols);
    for (int i = 0; i < a.numRows; i++) {
      for (int j = 0; j < a.numCols; j++) {
        z.set(i, j, a.get(i, j), 0.0);
      }
    }
    return z;
  }

  /** Right singular vector of the smallest singular value of K - q Q(0): unit norm, largest entry positive. */
  private static double[] nullVector(AeroelasticSystem system, double k0, double qd) {
    DMatrixRMaj a = staticStiffness(system, k0, qd);
    int n = a.numRows;
    SingularValueDecomposition_F64<DMatrixRMaj> svd = DecompositionFactory_DDRM.svd(n, n, false, true, false);
    if (!svd.decompose(a)) {
      throw new ArithmeticException("SVD of the static stiffness at divergence failed");
    }
    double[] sv = svd.getSingularValues();
    int min = 0;
    for (int i = 1; i < sv.length; i++) {
      if (sv[i] < sv[min]) {
        min = i;
      }
    }
    DMatrixRMaj v = svd.getV(null, false);
    double[] shape = new double[n];
    int maxIdx = 0;
    for (int i = 0; i < n; i++) {
      shape[i] = v.get(i, min);
      if (Math.abs(shape[i]) > Math.abs(shape[maxIdx])) {
        maxIdx = i;
      }
    }
    if (shape[maxIdx] < 0) {
      for (int i = 0; i < n; i++) {
        shape[i] = -shape[i];
      }
    }
    return shape;
  }

  /** K - q Re Q(ik0). */
  private static DMatrixRMaj staticStiffness(AeroelasticSystem system, double k0, double qd) {
    DMatrixRMaj a = realForces(system, k0);
    int n = a.numRows;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a.set(i, j, system.stiffness(i, j) - qd * a.get(i, j));
      }
    }
    return a;
  }

  private static double singularRatio(AeroelasticSystem system, double k0, double qd) {
    DMatrixRMaj a = staticStiffness(system, k0, qd);
    double[] sv = SingularOps_DDRM.singularValues(a);
    double max = 0;
    double min = Double.MAX_VALUE;
    for (double s : sv) {
      max = Math.max(max, s);
      min = Math.min(min, s);
    }
    return max > 0 ? min / max : 0.0;
  }
}
