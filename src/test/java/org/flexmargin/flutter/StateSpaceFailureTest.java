package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
 * A state-space model that cannot be formed anywhere on the sweep is reported, point by point,
 * never turned into curves: the apparent mass A2 of the fit cancels the structural mass exactly at
 * the sweep's density, M - (rho b^2 / 2) A2 = 0.
 */
class StateSpaceFailureTest {

  @Test
  void aSingularModelGivesGapsWarningsAndNoCrossings() {
    double b = 0.5;
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, 100, 5));
    double rho = path.at(0).densityKgPerM3();
    // M = (rho b^2 / 2) I, formed as the state matrix forms it, and A2 = I: M - (rho b^2/2) A2 = 0
    double x = 0.5 * rho * b * b;
    double[][] m = {{x, 0}, {0, x}};
    double[][] k = {{100.0, 0}, {0, 400.0}};
    double[][][] a = new double[3][2][2];
    a[2] = new double[][] {{1, 0}, {0, 1}};
    RationalFit fit = new RationalFit(b, new double[0], a, new double[] {0.0, 0.5, 1.0},
        new FitError(new double[2][2], new double[2][2], 0.0, 0, 0), 0.05, List.of(), "apparent mass only",
        RationalFit.ROGER);
    AeroelasticSystem sys = new AeroelasticSystem(
        new StructuralModel(List.of("mode_1", "mode_2"), m, new double[2][2], k), fit);
    FlutterSolution sol = new StateSpaceMethod().solve(sys, path, AnalysisOptions.defaults());
    for (BranchCurve c : sol.branches()) {
      for (int p = 0; p < 5; p++) {
        assertFalse(c.converged()[p]);
        assertTrue(Double.isNaN(c.frequencyHz()[p]) && Double.isNaN(c.dampingG()[p]));
      }
    }
    assertTrue(sol.crossings().isEmpty(), sol.crossings().toString());
    List<String> w = sol.warnings();
    assertTrue(w.stream().anyMatch(s -> s.startsWith("state-space eigen-solution failed: ")), w.toString());
    for (int p = 1; p < 5; p++) {
      for (String name : List.of("mode_1", "mode_2")) {
        String text = "root of " + name + " lost at grid point " + p + " (";
        assertTrue(w.stream().anyMatch(s -> s.startsWith(text)), text + " not in " + w);
      }
    }
    // every branch at every point after the first: 2 x 4
    assertEquals(8, sol.diagnostics().unconvergedRoots());
    assertEquals(1.0, sol.diagnostics().firstTroublePathParameter(), 0.0);
    assertEquals(0, sol.diagnostics().rootSolves());
  }
}
