package org.flexmargin.ase;

import org.ejml.data.DMatrixRMaj;
import org.flexmargin.aero.LagRealisation;
import org.flexmargin.aero.RationalFit;

/**
 * Elastic generalized aerodynamic forces in rational form, in the Laplace variable p = s b / V:
 *
 * <pre>  Q(p) = A0 + A1 p + A2 p^2 + sum_l A_{l+2} p / (p + beta_l) </pre>
 *
 * <p>(Roger, AGARD-CP-228, 1977). The lag terms become aerodynamic states by their {@link
 * #lagRealisation()}: A<sub>l+2</sub> = D<sub>l</sub> E<sub>l</sub>, states z<sub>l</sub> with
 * z<sub>l</sub>' = E<sub>l</sub> xi' - (V/b) beta<sub>l</sub> z<sub>l</sub>, so that the force is
 * q_dyn (A0 xi + A1 (b/V) xi' + A2 (b/V)^2 xi'' + sum_l D<sub>l</sub> z<sub>l</sub>). Roger's form
 * has E<sub>l</sub> = I (m states per lag root); Karpel's minimum-state form (J. Aircraft 19(3),
 * 1982) has rank-one lag matrices d<sub>l</sub> e<sub>l</sub><sup>T</sup> and one state per lag
 * root.
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
   * The lag terms as states. By default Roger's realisation: E<sub>l</sub> = I and D<sub>l</sub>
   * = {@link #coefficient}(3 + l), {@link #size()} states per lag root.
   *
   * @return the realisation
   */
  default LagRealisation lagRealisation() {
    int n = size();
    int nl = lagCount();
    double[] roots = new double[nl];
    double[][][] lags = new double[nl][n][n];
    for (int l = 0; l < nl; l++) {
      roots[l] = lagRoot(l);
      DMatrixRMaj a = coefficient(3 + l);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          lags[l][i][j] = a.get(i, j);
        }
      }
    }
    return LagRealisation.roger(n, roots, lags);
  }

  /**
   * @param fit a rational fit of a configuration's elastic forces, Roger's or minimum-state form
   * @return the fit seen as rational aerodynamics, with the fit's own realisation ({@link
   *     RationalFit#lagRealisation()}: one lag state per root for the minimum-state form)
   */
  static RationalAerodynamics of(RationalFit fit) {
    LagRealisation lags = fit.lagRealisation();
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

      @Override
      public LagRealisation lagRealisation() {
        return lags;
      }
    };
  }
}
