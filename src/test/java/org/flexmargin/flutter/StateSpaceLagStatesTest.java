package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.flexmargin.aero.FitError;
import org.flexmargin.aero.LagRealisation;
import org.flexmargin.aero.MinimumStateApproximation;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.numerics.ReferenceEigenvalues;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * No unstable root of the state-space model is dominated by its lag states, so an instability is
 * never mistaken for a lag root and always reported as a root (tracked or not). Derivation: the
 * lag rows of x' = A x give, for an eigenpair (s, x = [xi; s xi; z]), s z_l = E_l s xi - (V/b)
 * beta_l z_l, so z_l = s / (s + (V/b) beta_l) E_l xi. For Re s &gt; 0 and beta_l &gt; 0,
 * |s + (V/b) beta_l| &gt; |s|; with ||E_l|| &le; 1 (the identity in Roger's realisation, a unit row
 * in the minimum-state one) ||z_l|| &lt; ||xi||.
 *
 * <p>Eigenvalues by Commons Math, eigenvectors by inverse iteration with EJML's complex LU: both
 * independent of the program's eigen-solver.
 */
class StateSpaceLagStatesTest {

  /**
   * Largest ||z_l|| / ||xi|| over the lags and the eigenvalues with Re s &gt; 0 of the state
   * matrix; fails unless there is at least one such eigenvalue.
   */
  private static double worstUnstableLagRatio(DMatrixRMaj a, LagRealisation lags, int n) {
    double worst = 0;
    int unstable = 0;
    for (Complex s : ReferenceEigenvalues.of(a)) {
      if (!(s.getReal() > 0)) {
        continue;
      }
      unstable++;
      double[] v = eigenvector(a, s);
      double xi = norm(v, 0, n);
      for (int l = 0; l < lags.lagCount(); l++) {
        worst = Math.max(worst, norm(v, 2 * n + lags.firstState(l), lags.states(l)) / xi);
      }
    }
    assertTrue(unstable > 0, "premise: an unstable root at this speed");
    return worst;
  }

  /** Two steps of inverse iteration at s (1 + 1e-12): interleaved complex entries. */
  private static double[] eigenvector(DMatrixRMaj a, Complex s) {
    int size = a.numRows;
    ZMatrixRMaj shifted = new ZMatrixRMaj(size, size);
    for (int i = 0; i < size; i++) {
      for (int j = 0; j < size; j++) {
        shifted.set(i, j, a.get(i, j), 0);
      }
      shifted.set(i, i, a.get(i, i) - s.getReal() * (1 + 1e-12), -s.getImaginary() * (1 + 1e-12));
    }
    ZMatrixRMaj x = new ZMatrixRMaj(size, 1);
    for (int i = 0; i < size; i++) {
      x.set(i, 0, 1.0, 0.0);
    }
    for (int k = 0; k < 2; k++) {
      ZMatrixRMaj next = new ZMatrixRMaj(size, 1);
      assertTrue(CommonOps_ZDRM.solve(shifted.copy(), x, next));
      double scale = 1 / norm(next.data, 0, size);
      CommonOps_ZDRM.scale(scale, 0, next);
      x = next;
    }
    return x.data;
  }

  /** Euclidean norm of complex entries from..from + count - 1 of interleaved data. */
  private static double norm(double[] v, int from, int count) {
    double sum = 0;
    for (int i = from; i < from + count; i++) {
      sum += v[2 * i] * v[2 * i] + v[2 * i + 1] * v[2 * i + 1];
    }
    return Math.sqrt(sum);
  }

  @Test
  void aRootGrownOutOfTheLagRootStaysMostlyStructuralOnceUnstable() {
    // one mode diverging through its lag root (StateSpaceStaticNotesTest), at 1.2 times its
    // divergence speed: the unstable real root is the former lag root
    AeroelasticSystem sys = StateSpaceStaticNotesTest.lagSpringModes(new double[] {2.0}, new double[] {0.002},
        new double[] {-0.004});
    double rho = 1.225;
    double v = 1.2 * Math.sqrt(2 * StateSpaceStaticNotesTest.divergencePa(2.0, 0.002) / rho);
    RationalFit fit = (RationalFit) sys.aero();
    double worst = worstUnstableLagRatio(StateSpaceMethod.stateMatrix(sys, fit, rho, v), fit.lagRealisation(), 1);
    // the bound |s| / |s + (V/b) beta| < 1; 1e-9: inverse iteration in double precision
    assertTrue(worst < 1 + 1e-9, "lag ratio " + worst);
  }

  @Test
  void anUnstableRootOfAFittedWingIsNotLagDominatedInEitherRealisation() {
    // Goland wing, 2 + 2 Ritz modes, 10 strips, at 250 m/s at sea level, where the model has an
    // unstable root (checked below)
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.goland(2, 2, 10));
    for (RationalFit fit : List.of(RogerApproximation.fit(sys.aero(), 1.5, 4),
        MinimumStateApproximation.fit(sys.aero(), 1.5, 3))) {
      DMatrixRMaj a = StateSpaceMethod.stateMatrix(sys, fit, 1.225, 250);
      double worst = worstUnstableLagRatio(a, fit.lagRealisation(), sys.size());
      assertTrue(worst < 1 + 1e-9, fit.form() + ": lag ratio " + worst);
    }
  }

  @Test
  void anOscillatingPairGrownOutOfTwoLagRootsIsReportedAsAnUntrackedRootAndPutsTheOnsetsInDoubt() {
    // One stiff mode (50 Hz, zeta 0.02, unit mass) with Q(p) = -X p / (p + beta_1) + X p / (p +
    // beta_2), beta_1 = 0.3 > beta_2 = 0.05, nothing else. Far below the mode's frequency xi
    // follows the lag states quasi-statically, K xi = q X (z_2 - z_1), and with a_l = (V/b) beta_l
    // the lag states obey z' = -(I + (q X / K) [1; 1] [-1, 1]) diag(a) z: trace -(a_1 + a_2) + (q X /
    // K)(a_1 - a_2), determinant a_1 a_2 > 0. The two lag roots meet, become a complex pair and
    // cross into the right half-plane where the trace vanishes, q X / K = (beta_1 + beta_2) /
    // (beta_1 - beta_2) = 1.4: q = 3454 Pa, 75.1 m/s at sea level. No branch follows that pair.
    double w = 2 * Math.PI * 50;
    double x = 40;
    double[][][] a = new double[5][1][1];
    a[3][0][0] = -x;
    a[4][0][0] = x;
    RationalFit fit = new RationalFit(0.5, new double[] {0.3, 0.05}, a, new double[] {0.0, 0.5, 1.0},
        new FitError(new double[1][1], new double[1][1], 0.0, 0, 0), 0.05, List.of(), "two opposite lags",
        RationalFit.ROGER);
    AeroelasticSystem sys = new AeroelasticSystem(new StructuralModel(List.of("stiff"), new double[][] {{1}},
        new double[][] {{2 * 0.02 * w}}, new double[][] {{w * w}}), fit);
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, 160, 15));
    double rho = path.at(0).densityKgPerM3();
    double estimate = Math.sqrt(2 * 1.4 * w * w / x / rho);
    assertTrue(estimate > 70 && estimate < 80, "premise: quasi-static onset " + estimate + " m/s");

    // the first grid point with an unstable oscillating root of the lag pair (|s| well below the
    // mode's 314 rad/s), by Commons Math
    int first = -1;
    Complex root = null;
    for (int p = 0; p < path.gridPoints() && first < 0; p++) {
      for (Complex s : ReferenceEigenvalues.of(StateSpaceMethod.stateMatrix(sys, fit, rho, path.at(p).speedTasMps()))) {
        if (s.getReal() > 0 && s.getImaginary() > 1e-6 * w && s.abs() < 0.5 * w) {
          first = p;
          root = s;
        }
      }
    }
    assertEquals(6, first, "premise: 80 m/s, the first grid point above the estimate");

    FlutterSolution sol = new StateSpaceMethod().solve(sys, path, AnalysisOptions.defaults());
    String warning = sol.warnings().stream().filter(v -> v.contains("not followed by any branch")).findFirst()
        .orElseThrow(() -> new AssertionError(sol.warnings().toString()));
    assertTrue(warning.contains("unstable from 80.00 m/s EAS"), warning);
    // the root printed to four significant digits: half a unit of the fourth is 5e-4 relative
    Matcher m = Pattern.compile("s = ([-+0-9.e]+) ([-+0-9.e]+) i").matcher(warning);
    assertTrue(m.find(), warning);
    assertEquals(root.getReal(), Double.parseDouble(m.group(1)), 5e-4 * root.getReal(), warning);
    assertEquals(root.getImaginary(), Double.parseDouble(m.group(2)), 5e-4 * root.getImaginary(), warning);
    // an unstable oscillating root that no branch follows puts the tracking in doubt from there
    assertEquals(6.0, sol.diagnostics().firstTroublePathParameter(), 0.0);
    assertTrue(sol.crossings().isEmpty(), sol.crossings().toString());
  }
}
