package org.flexmargin.flutter;

import static org.flexmargin.flutter.PkClosedFormTest.B;
import static org.flexmargin.flutter.PkClosedFormTest.D;
import static org.flexmargin.flutter.PkClosedFormTest.F_HZ;
import static org.flexmargin.flutter.PkClosedFormTest.PATH;
import static org.flexmargin.flutter.PkClosedFormTest.Q0;
import static org.flexmargin.flutter.PkClosedFormTest.RHO;
import static org.flexmargin.flutter.PkClosedFormTest.ZETA;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.model.AnalysisOptions;
import org.junit.jupiter.api.Test;

/**
 * The state-space method on the uncoupled modes of {@link PkClosedFormTest}. Q(p) = q0 + d p
 * (p = s b / V) is exactly Roger's form with A0 = q0, A1 = d and zero lag terms, so the fit is
 * exact and every tracked root solves m s^2 + (c - rho V b d / 2) s + k0 - q_dyn q0 = 0 (quadratic
 * formula; docs/validation.md §5.6). The onset is at the same V_F = 2 c / (rho b d) as in p-k.
 */
class StateSpaceClosedFormTest {

  /** Closed-form root {sigma, omega} (upper half plane) of mode i at true airspeed v. */
  private static double[] root(int i, double v) {
    double w0 = 2 * Math.PI * F_HZ[i];
    double cBar = 2 * ZETA * w0 - RHO * v * B * D[i] / 2;
    double kBar = w0 * w0 - 0.5 * RHO * v * v * Q0[i];
    return new double[] {-cBar / 2, Math.sqrt(kBar - cBar * cBar / 4)};
  }

  @Test
  void trackedRootsAndCrossingsAreTheQuadraticFormulaRoots() {
    AnalysisOptions options = AnalysisOptions.defaults();
    FlutterSolution sol = new StateSpaceMethod().solve(
        PkClosedFormTest.system(F_HZ, Q0, D, 0.0, 2.0), PATH, options);
    for (int j = 0; j < 2; j++) {
      BranchCurve c = sol.branches().get(j);
      for (int i = 0; i < c.size(); i++) {
        double v = 20 + 10 * i;
        double[] r = root(j, v);
        // exact fit (least squares on exactly representable data) and a double-precision
        // eigensolve: 1e-6 relative to |s| leaves room for the conditioning of the lag columns
        double tol = 1e-6 * Math.hypot(r[0], r[1]);
        assertEquals(r[1] / (2 * Math.PI), c.frequencyHz()[i], tol / (2 * Math.PI), "branch " + j + " at " + v);
        assertEquals(2 * r[0] / r[1], c.dampingG()[i], 1e-5, "g, branch " + j + " at " + v);
        assertEquals(r[1] * B / v, c.reducedFrequency()[i], 1e-6 * r[1] * B / v);
      }
    }
    double g = options.dampingLimitG();
    for (int j = 0; j < 2; j++) {
      final int mode = j;
      double vf = 2 * (2 * ZETA * 2 * Math.PI * F_HZ[j]) / (RHO * B * D[j]);
      FlutterCrossing onset = sol.crossings().stream()
          .filter(c -> c.branch() == mode && c.kind() == CrossingKind.FLUTTER_ONSET).findFirst()
          .orElseThrow(() -> new AssertionError(sol.crossings()));
      // refined to the default 0.01 m/s; 0.02 m/s allows Brent's last step
      assertEquals(vf, onset.condition().speedTasMps(), 0.02, "onset of mode " + j);
      double[] rf = root(j, vf);
      assertEquals(rf[1] / (2 * Math.PI), onset.frequencyHz(), 1e-4 * rf[1]);
      double vl = new BrentSolver(1e-12).solve(200, v -> {
        double[] r = root(mode, v);
        return 2 * r[0] + g * r[1];
      }, 20, vf);
      FlutterCrossing limit = sol.crossings().stream()
          .filter(c -> c.branch() == mode && c.kind() == CrossingKind.of(-g, true)).findFirst()
          .orElseThrow(() -> new AssertionError(sol.crossings()));
      assertEquals(vl, limit.condition().speedTasMps(), 0.02, "limit crossing of mode " + j);
    }
    assertEquals(4, sol.crossings().size(), sol.crossings().toString());
    for (FlutterCrossing c : sol.crossings()) {
      // Brent's absolute accuracy on the path parameter is the speed tolerance over the grid step:
      // 0.01 m/s over 10 m/s (EAS = TAS at sea level to the atmosphere's round-off)
      assertEquals(options.onsetSpeedToleranceMps() / 10, c.bracketWidth(), 1e-9, c.toString());
      assertTrue(c.evaluations() > 0 && c.evaluations() < 100, c.toString());
      // the condition is the path's at the refined parameter: 20 m/s plus 10 m/s per grid step
      assertEquals(20 + 10 * c.pathParameter(), c.condition().speedTasMps(), 1e-9, c.toString());
    }
    assertEquals(0, sol.diagnostics().unconvergedRoots());
    assertTrue(Double.isNaN(sol.diagnostics().firstTroublePathParameter()));
    assertEquals(1.0, sol.diagnostics().minMac(), 1e-9, "uncoupled modes keep their unit vectors");
  }
}
