package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.Eigenvalues;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.junit.jupiter.api.Test;

/**
 * Closed-loop roots tracked one at a time from speed to speed (shifted inverse iteration from the
 * previous speed's root) against the full eigen-solve (EJML's QR algorithm) at the new speed, on
 * both demo configurations.
 */
class ClosedLoopTrackingTest {

  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  /**
   * Every upper-half-plane root at grid point p, used as the shift at p + 1, gives the root of the
   * full solve at p + 1 nearest it. Tolerance 1e-9 of the root's modulus (at least 1 rad/s), or,
   * for an ill-conditioned root (the lag roots of the rational aerodynamics come in near-repeated
   * groups), four times the difference between two independent full solvers on that root (EJML
   * and Commons Math): all three are backward stable, so their forward errors are round-off times
   * the root's condition number; the difference of two of them shows that size, and the factor
   * leaves room for a third error of the same size in another direction. At least 90 % of the
   * roots must meet the plain 1e-9. A root is picked from the full solve only where the tracker
   * does not settle (a second root about as near, as the near-repeated lag roots often are: about
   * a third of the roots on the demo); those are counted and must stay a minority.
   */
  @Test
  void trackedRootsEqualTheFullSolveNearestRoot() {
    PlannedPath path = new PlannedPath(DEMO.sweep());
    int tracked = 0;
    int strict = 0;
    int all = 0;
    for (Configuration cfg : DEMO.configurations()) {
      ConfigurationModel m = ConfigurationModel.of(cfg);
      RationalAerodynamics rational = RationalAerodynamics.of(
          RogerApproximation.fit(m.system().aero(), 3.0, ClosedLoopSweep.LAG_COUNT));
      for (int p = 0; p + 1 < path.gridPoints(); p += 9) {
        Eigenvalues before = ServoMargins.loopAt(m, cfg, DEMO.loop(), path.at(p)).closedLoop(rational).eigenvalues();
        StateSpace next = ServoMargins.loopAt(m, cfg, DEMO.loop(), path.at(p + 1)).closedLoop(rational);
        Eigenvalues after = next.eigenvalues();
        Eigenvalues other = commonsMath(next.a());
        for (int i = 0; i < before.size(); i++) {
          if (before.imagAt(i) < 0) {
            continue;
          }
          double[] got = new double[2];
          int[] solves = {0};
          ClosedLoopSweep.rootNear(m, cfg, DEMO.loop(), path.at(p + 1), rational, before.realAt(i),
              before.imagAt(i), before.realAt(i), before.imagAt(i), 0, got, solves);
          double[] want = new double[2];
          ClosedLoopSweep.nearest(after, before.realAt(i), before.imagAt(i), want);
          double[] second = new double[2];
          ClosedLoopSweep.nearest(other, want[0], want[1], second);
          double plain = 1e-9 * Math.max(1, Math.hypot(want[0], want[1]));
          double tol = Math.max(plain, 4 * Math.hypot(second[0] - want[0], second[1] - want[1]));
          double diff = Math.hypot(got[0] - want[0], got[1] - want[1]);
          assertTrue(diff <= tol, cfg.name() + " point " + p + " root " + want[0] + ", " + want[1] + ": tracked "
              + got[0] + ", " + got[1] + ", second solver " + second[0] + ", " + second[1]);
          strict += diff <= plain ? 1 : 0;
          tracked += 1 - solves[0];
          all++;
        }
      }
    }
    assertTrue(all > 100, "roots compared: " + all);
    assertTrue(tracked >= 0.5 * all, "tracked " + tracked + " of " + all);
    assertTrue(strict >= 0.9 * all, "within 1e-9: " + strict + " of " + all);
  }

  private static Eigenvalues commonsMath(DMatrixRMaj a) {
    double[][] arr = new double[a.numRows][a.numCols];
    for (int i = 0; i < a.numRows; i++) {
      for (int j = 0; j < a.numCols; j++) {
        arr[i][j] = a.get(i, j);
      }
    }
    EigenDecomposition cm = new EigenDecomposition(new Array2DRowRealMatrix(arr));
    return new Eigenvalues(cm.getRealEigenvalues(), cm.getImagEigenvalues());
  }

  /**
   * The onset refinement tracks its one root: on the demo path no refinement step needs a full
   * eigen-solve, so the full solves are those of the grid points; and each refined rational onset
   * has a closed-loop root on the imaginary axis (full solve at the refined condition), to the
   * Brent tolerance on the path parameter (0.01 m/s moves a root by ~1e-3 1/s here).
   */
  @Test
  void onsetRefinementNeedsNoFullSolveAndLandsOnTheAxis() {
    PlannedPath path = new PlannedPath(DEMO.sweep());
    Configuration cfg = DEMO.configurations().get(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    FlutterSolution ol = new PkMethod().solve(m.system(), path, DEMO.options());
    ClosedLoopResult r = new ClosedLoopSweep().analyse(m, cfg, DEMO.loop(), path, ol, DEMO.options());
    assertEquals(path.gridPoints(), r.eigenSolves());
    assertTrue(!r.refinements().isEmpty());
    RationalAerodynamics rational = RationalAerodynamics.of(
        RogerApproximation.fit(m.system().aero(), ClosedLoopSweepTest.fitRange(m, path), ClosedLoopSweep.LAG_COUNT));
    for (OnsetRefinement o : r.refinements()) {
      Eigenvalues e = ServoMargins.loopAt(m, cfg, DEMO.loop(), o.rational().condition()).closedLoop(rational)
          .eigenvalues();
      double w = 2 * Math.PI * o.rational().frequencyHz();
      double nearest = Double.MAX_VALUE;
      for (int i = 0; i < e.size(); i++) {
        if (Math.abs(e.imagAt(i) - w) < 0.05 * w) {
          nearest = Math.min(nearest, Math.abs(e.realAt(i)));
        }
      }
      assertTrue(nearest < 5e-3, "onset at " + o.rational().condition().speedEasMps() + ": " + nearest);
    }
  }
}
