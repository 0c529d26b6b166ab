package org.flexmargin.ase;

import org.ejml.data.DMatrixRMaj;
import org.flexmargin.aero.RationalFit;

/**
 * Elastic generalized aerodynamic forces in Roger's rational form, in the Laplace variable
 * p = s b / V:
 *
 * <pre>  Q(p) = A0 + A1 p + A2 p^2 + sum_l A_{l+2} p / (p + beta_l) </pre>
 *
 * <p>(Roger, AGARD-CP-228, 1977). Each lag term becomes a vector of aerodynamic states r_l with
 * r_l' = xi' - (V/b) beta_l r_l, so that the force is q_dyn (A0 xi + A1 (b/V) xi' +
 * A2 (b/V)^2 xi'' + sum_l A_{l+2} r_l).
 */
public interface RationalAerodynamics {
  /** @return number of generalized coordinates */
  int size();

  /** @return reference semichord b (m) of p = s b / V */
  double referenceSemichordM();

  /** @return number of lag terms */
  int lagCount();

  /** @return lag root beta_l (dimensionless, &gt; 0) */
  double lagRoot(int l);

  /**
   * @param index 0 for A0, 1 for A1, 2 for A2, 3 + l for the lag term l
   * @return the real coefficient matrix (a copy)
   */
  DMatrixRMaj coefficient(int index);

  /**
   * @param fit a Roger fit of a configuration's elastic forces
   * @return the fit seen as rational aerodynamics
   */
  static RationalAerodynamics of(RationalFit fit) {
    return new RationalAerodynamics() {
      @Override
      public int size() {
        return fit.size();
      }

      @Override
      public double referenceSemichordM() {
        return fit.referenceSemichordM();
      }

      @Override
      public int lagCount() {
        return fit.lagCount();
      }

      @Override
      public double lagRoot(int l) {
        return fit.lagRoot(l);
      }

      @Override
      public DMatrixRMaj coefficient(int index) {
        return new DMatrixRMaj(fit.matrix(index));
      }
    };
  }
}
