package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.aero.FitError;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * A tracked structural pair that meets the real axis, splits and diverges, in the state-space
 * method. Two uncoupled unit-mass modes with viscous damping c = 2 zeta w0 and a purely static
 * aerodynamic stiffness Q = q0 (a rational fit with A0 = q0 and nothing else, exact by
 * construction) have the roots of s^2 + c s + (w0^2 - q_dyn q0) = 0:
 *
 * <pre>
 *   below the split (q_dyn q0 &lt; w0^2 (1 - zeta^2)): s = -zeta w0 +- i sqrt(w0^2 - q_dyn q0 - zeta^2 w0^2)
 *   above it: s = -zeta w0 +- sqrt(zeta^2 w0^2 - w0^2 + q_dyn q0), both real
 * </pre>
 *
 * and the larger real root crosses zero at q_D = w0^2 / q0: static divergence of that branch.
 */
class StateSpaceDivergingBranchTest {

  private static final double B = 0.5;
  private static final double ZETA = 0.02;
  private static final double[] F_HZ = {2.0, 5.0};
  private static final double[] Q0 = {0.004, 0.001};
  private static final PlannedPath PATH = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, 300, 15));
  private static final double RHO = PATH.at(0).densityKgPerM3();

  private static AeroelasticSystem system() {
    double[][] m = new double[2][2];
    double[][] c = new double[2][2];
    double[][] k = new double[2][2];
    double[][][] a = new double[3][2][2];
    for (int i = 0; i < 2; i++) {
      double w = 2 * Math.PI * F_HZ[i];
      m[i][i] = 1.0;
      c[i][i] = 2 * ZETA * w;
      k[i][i] = w * w;
      a[0][i][i] = Q0[i];
    }
    RationalFit fit = new RationalFit(B, new double[0], a, new double[] {0.0, 0.5, 1.0},
        new FitError(new double[2][2], new double[2][2], 0.0, 0, 0), 0.05, List.of(), "static forces",
        RationalFit.ROGER);
    return new AeroelasticSystem(new StructuralModel(List.of("mode_1", "mode_2"), m, c, k), fit);
  }

  /** The root a branch follows: {Re, |Im|}; the larger real root once the pair has split. */
  private static double[] root(int mode, double v) {
    double w0 = 2 * Math.PI * F_HZ[mode];
    double disc = ZETA * ZETA * w0 * w0 - w0 * w0 + 0.5 * RHO * v * v * Q0[mode];
    return disc < 0 ? new double[] {-ZETA * w0, Math.sqrt(-disc)} : new double[] {-ZETA * w0 + Math.sqrt(disc), 0};
  }

  @Test
  void theBranchFollowsTheLargerRealRootAndItsZeroCrossingIsTheDivergenceSpeed() {
    FlutterSolution sol = new StateSpaceMethod().solve(system(), PATH, AnalysisOptions.defaults());
    int split = 0;
    for (int j = 0; j < 2; j++) {
      BranchCurve c = sol.branches().get(j);
      for (int p = 0; p < c.size(); p++) {
        double v = 20 + 20 * p;
        double[] r = root(j, v);
        split += r[1] == 0 ? 1 : 0;
        // double-precision eigenvalues of a 4 x 4 matrix with entries up to ~1e3: 1e-9 relative to
        // w0; a split pair's real roots are far from the double root, so they are as accurate
        double tol = 1e-9 * 2 * Math.PI * F_HZ[j];
        assertEquals(r[1] / (2 * Math.PI), c.frequencyHz()[p], tol, "branch " + j + " at " + v);
        assertEquals(-r[0] / Math.hypot(r[0], r[1]), c.dampingRatio()[p], 1e-9, "branch " + j + " at " + v);
        assertTrue(c.converged()[p]);
      }
    }
    assertTrue(split >= 2, "premise: mode 1 has split at the last two speeds");
    // mode 1 diverges at V_D = sqrt(2 w0^2 / (rho q0)) = 254 m/s, mode 2 far beyond the sweep
    double w0 = 2 * Math.PI * F_HZ[0];
    double vd = Math.sqrt(2 * w0 * w0 / (RHO * Q0[0]));
    List<FlutterCrossing> x = sol.crossings();
    assertTrue(x.stream().allMatch(c -> c.branch() == 0), x.toString());
    FlutterCrossing onset = sol.firstOnset().orElseThrow(() -> new AssertionError(x));
    // refined to the default 0.01 m/s; 0.02 m/s allows Brent's last step
    assertEquals(vd, onset.condition().speedTasMps(), 0.02);
    assertEquals(0.0, onset.frequencyHz(), 0.0, "a real root has no frequency");
    // a real root's crossing function 2 Re(s) - g |Im(s)| is 2 Re(s) at every level: the limit is
    // crossed at the same speed
    FlutterCrossing limit = x.stream().filter(c -> c.kind() == CrossingKind.DAMPING_BELOW_LIMIT).findFirst()
        .orElseThrow(() -> new AssertionError(x));
    assertEquals(vd, limit.condition().speedTasMps(), 0.02);
    assertEquals(2, x.size(), x.toString());
    // the unstable real root is tracked: no warning of an unstable root no branch follows, and no
    // note of a real root crossing zero either, although the pair splits (at q q0 = w0^2 (1 -
    // zeta^2)) and its larger root crosses zero (at q q0 = w0^2) within one grid step, so the branch
    // is oscillating at the step's left end: the onset above already reports that crossing
    int left = (int) Math.floor((vd - 20) / 20);
    assertTrue(root(0, 20 + 20 * left)[1] > 0 && root(0, 40 + 20 * left)[1] == 0, "premise: split within the step");
    assertTrue(sol.warnings().stream().noneMatch(w -> w.contains("not followed by any branch")),
        sol.warnings().toString());
    assertTrue(sol.warnings().stream().noneMatch(w -> w.contains("crosses zero")), sol.warnings().toString());
    assertEquals(0, sol.diagnostics().unconvergedRoots());
    assertTrue(Double.isNaN(sol.diagnostics().firstTroublePathParameter()));
  }
}
