package org.flexmargin.flutter;

import static org.flexmargin.flutter.PkClosedFormTest.B;
import static org.flexmargin.flutter.PkClosedFormTest.D;
import static org.flexmargin.flutter.PkClosedFormTest.F_HZ;
import static org.flexmargin.flutter.PkClosedFormTest.Q0;
import static org.flexmargin.flutter.PkClosedFormTest.RHO;
import static org.flexmargin.flutter.PkClosedFormTest.ZETA;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * State-space tracking bookkeeping on the uncoupled modes of {@link PkClosedFormTest}, whose
 * aerodynamics Q(p) = q0 + d p are exactly Roger's form, so every tracked root is the closed-form
 * root of m s^2 + (c - rho V b d / 2) s + k0 - q_dyn q0 = 0 (see {@link StateSpaceClosedFormTest}).
 */
class StateSpaceTrackingTest {

  /** Closed-form root {sigma, omega} (upper half plane) of mode i at true airspeed v. */
  private static double[] root(int i, double v) {
    return root(F_HZ[i], Q0[i], D[i], v);
  }

  private static double[] root(double fHz, double q0, double d, double v) {
    double w0 = 2 * Math.PI * fHz;
    double cBar = 2 * ZETA * w0 - RHO * v * B * d / 2;
    double kBar = w0 * w0 - 0.5 * RHO * v * v * q0;
    return new double[] {-cBar / 2, Math.sqrt(kBar - cBar * cBar / 4)};
  }

  /** Defaults without a damping-limit crossing. */
  private static AnalysisOptions noLimit() {
    AnalysisOptions d = AnalysisOptions.defaults();
    return new AnalysisOptions(d.method(), 0.0, d.convergenceTolerance(), d.maxIterations(),
        d.onsetSpeedToleranceMps(), d.kMethodMinReducedFrequency(), d.kMethodMaxReducedFrequency(),
        d.kMethodPoints());
  }

  private static PlannedPath tas(double from, double to, int points) {
    return new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, from, to, points));
  }

  private static AeroelasticSystem system() {
    return PkClosedFormTest.system(F_HZ, Q0, D, 0.0, 2.0);
  }

  @Test
  void aSmoothSweepBelowFlutterCountsOneEigenSolveAndOneRootPerBranchAndPoint() {
    // 20 to 60 m/s: both modes stable (onsets at 82 and 152 m/s, docs/validation.md 5.6)
    FlutterSolution sol = new StateSpaceMethod().solve(system(), tas(20, 60, 5), noLimit());
    assertTrue(sol.crossings().isEmpty(), sol.crossings().toString());
    SolverDiagnostics d = sol.diagnostics();
    assertEquals(5, d.fullEigenSolves());
    assertEquals(2 * 5, d.rootSolves());
    assertEquals(0, d.stepHalvings());
    // the QR algorithm needs at least one sweep per decomposition of a non-triangular matrix
    assertTrue(d.iterations() >= d.fullEigenSolves(), "QR sweeps " + d.iterations());
    assertEquals(0, d.unconvergedRoots());
  }

  @Test
  void aCoarseSweepHalvesItsStepsAndStillTracksTheClosedFormRoots() {
    // 20 to 320 m/s in two steps of 150 m/s with a strongly stiffening mode 2 (q0 = -0.05 /Pa):
    // its frequency rises from 31 to about 43 rad/s in the first step, more than a quarter of |s|,
    // so the tracking must subdivide
    double[] q0 = {Q0[0], -0.05};
    double[] w20 = root(F_HZ[1], q0[1], D[1], 20);
    double[] w170 = root(F_HZ[1], q0[1], D[1], 170);
    assertTrue(Math.hypot(w170[0] - w20[0], w170[1] - w20[1]) > 0.25 * Math.hypot(w170[0], w170[1]),
        "premise: a step larger than a quarter of |s|");
    FlutterSolution sol = new StateSpaceMethod().solve(PkClosedFormTest.system(F_HZ, q0, D, 0.0, 2.0),
        tas(20, 320, 3), AnalysisOptions.defaults());
    assertTrue(sol.diagnostics().stepHalvings() > 0);
    for (int j = 0; j < 2; j++) {
      BranchCurve c = sol.branches().get(j);
      for (int i = 0; i < 3; i++) {
        double v = 20 + 150 * i;
        double[] r = root(F_HZ[j], q0[j], D[j], v);
        // exact fit and a double-precision eigensolve: 1e-6 relative (StateSpaceClosedFormTest)
        double tol = 1e-6 * Math.hypot(r[0], r[1]);
        assertTrue(c.converged()[i]);
        assertEquals(r[1] / (2 * Math.PI), c.frequencyHz()[i], tol, "branch " + j + " at " + v);
        assertEquals(r[0], 0.5 * c.dampingG()[i] * r[1], tol, "branch " + j + " at " + v);
      }
    }
    assertEquals(1.0, sol.diagnostics().minMac(), 1e-9, "uncoupled modes keep their unit vectors");
  }

  @Test
  void trackedReducedFrequenciesAboveTheFittedRangeAreReported() {
    // the highest tracked k is mode 2 at the lowest speed: omega b / V at 20 m/s (about 0.79)
    double[] r = root(1, 20);
    double kMax = r[1] * B / 20;
    String above = "above the fitted range";
    FlutterSolution narrow = new StateSpaceMethod(2, 0.5).solve(system(), tas(20, 60, 5), noLimit());
    String w = narrow.warnings().stream().filter(s -> s.contains(above)).findFirst()
        .orElseThrow(() -> new AssertionError(narrow.warnings()));
    assertTrue(w.contains(String.format(java.util.Locale.ROOT, "reduced frequency %.4g,", kMax)), w);
    FlutterSolution wide = new StateSpaceMethod(2, 1.0).solve(system(), tas(20, 60, 5), noLimit());
    assertFalse(wide.warnings().stream().anyMatch(s -> s.contains(above)), wide.warnings().toString());
  }
}
