package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * The p-k method on uncoupled modes whose aerodynamics Q_ii(ik) = q0_i + i k d_i (a quasi-static
 * spring plus a force in phase with the velocity, per pascal) make the p-k equation solvable in
 * closed form (derived in docs/validation.md §5.6):
 *
 * <pre>
 *   m s^2 + c s + k0 - q_dyn (q0 + i d omega b / V) = 0,  s = sigma + i omega
 *   sigma   = (rho V b d / 2 - c) / (2 m)
 *   omega^2 = sigma^2 + (c sigma + k0 - q_dyn q0) / m
 * </pre>
 *
 * so the flutter onset (sigma = 0) is at V_F = 2 c / (rho b d) with omega_F^2 = (k0 - q_dyn q0)/m.
 * Every root, every curve point and every crossing is checked against these formulas.
 */
class PkClosedFormTest {

  static final double B = 0.5;
  static final double ZETA = 0.02;
  static final double[] F_HZ = {2.0, 5.0};
  static final double[] Q0 = {0.002, -0.005};
  static final double[] D = {0.02, 0.027};
  static final PlannedPath PATH = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, 200, 19));
  static final double RHO = PATH.at(0).densityKgPerM3();

  /** Diagonal Q(ik) = q0 + i k d; valid reduced frequencies [kMin, kMax]. */
  private static AeroSource diagonal(double[] q0, double[] d, double kMin, double kMax) {
    return new FunctionForces(q0.length, B, kMin, kMax, (k, out) -> {
      for (int i = 0; i < q0.length; i++) {
        out.set(i, i, q0[i], k * d[i]);
      }
    }, "diagonal test forces");
  }

  static AeroelasticSystem system(double[] fHz, double[] q0, double[] d, double kMin, double kMax) {
    return new AeroelasticSystem(uncoupledModes(fHz), diagonal(q0, d, kMin, kMax));
  }

  /**
   * @param fHz natural frequencies (Hz)
   * @return uncoupled modes "mode_1", "mode_2", ... of unit generalized mass, stiffness omega^2 and
   *     damping ratio {@link #ZETA}
   */
  static StructuralModel uncoupledModes(double[] fHz) {
    int n = fHz.length;
    double[][] m = new double[n][n];
    double[][] c = new double[n][n];
    double[][] k = new double[n][n];
    String[] names = new String[n];
    for (int i = 0; i < n; i++) {
      double w = 2 * Math.PI * fHz[i];
      m[i][i] = 1.0;
      c[i][i] = 2 * ZETA * w;
      k[i][i] = w * w;
      names[i] = "mode_" + (i + 1);
    }
    return new StructuralModel(List.of(names), m, c, k);
  }

  /** Closed-form root {sigma, omega} of mode i at true airspeed v (m/s). */
  private static double[] root(double fHz, double q0, double d, double v) {
    double w0 = 2 * Math.PI * fHz;
    double c = 2 * ZETA * w0;
    double q = 0.5 * RHO * v * v;
    double sigma = (RHO * v * B * d / 2 - c) / 2;
    double omega = Math.sqrt(sigma * sigma + c * sigma + w0 * w0 - q * q0);
    return new double[] {sigma, omega};
  }

  @Test
  void everyTrackedRootIsTheClosedFormRoot() {
    FlutterSolution sol = new PkMethod().solve(system(F_HZ, Q0, D, 0.005, 2.0), PATH, AnalysisOptions.defaults());
    for (int j = 0; j < 2; j++) {
      BranchCurve c = sol.branches().get(j);
      assertEquals("mode_" + (j + 1), c.name());
      for (int i = 0; i < c.size(); i++) {
        double v = 20 + 10 * i;
        double[] r = root(F_HZ[j], Q0[j], D[j], v);
        // roots converged to the default relative tolerance 1e-9: 1e-7 relative to |s| is safe
        double tol = 1e-7 * Math.hypot(r[0], r[1]);
        assertEquals(v, c.speedTasMps()[i], 1e-9 * v);
        assertEquals(i, c.pathParameter()[i], 0.0);
        assertEquals(r[1] / (2 * Math.PI), c.frequencyHz()[i], tol / (2 * Math.PI), "branch " + j + " at " + v);
        assertEquals(2 * r[0] / r[1], c.dampingG()[i], 1e-6, "g, branch " + j + " at " + v);
        assertEquals(-r[0] / Math.hypot(r[0], r[1]), c.dampingRatio()[i], 1e-6);
        assertEquals(r[1] * B / v, c.reducedFrequency()[i], 1e-7 * r[1] * B / v);
        assertTrue(c.converged()[i]);
      }
    }
    SolverDiagnostics diag = sol.diagnostics();
    // uncoupled modes: every vector is a unit vector, MAC exactly 1; a smooth path needs no halving
    assertEquals(1.0, diag.minMac(), 1e-12);
    assertEquals(0, diag.stepHalvings());
    assertEquals(0, diag.unconvergedRoots());
    assertTrue(Double.isNaN(diag.firstTroublePathParameter()));
    assertTrue(diag.rootSolves() >= 2L * 19, "one root solve per branch and grid point at least");
    assertTrue(sol.warnings().isEmpty(), sol.warnings().toString());
  }

  @Test
  void onsetAndLimitCrossingsAreTheClosedFormSpeeds() {
    AnalysisOptions options = AnalysisOptions.defaults();
    FlutterSolution sol = new PkMethod().solve(system(F_HZ, Q0, D, 0.005, 2.0), PATH, options);
    for (int j = 0; j < 2; j++) {
      final int mode = j;
      double w0 = 2 * Math.PI * F_HZ[j];
      double vf = 2 * (2 * ZETA * w0) / (RHO * B * D[j]);
      double qf = 0.5 * RHO * vf * vf;
      FlutterCrossing onset = sol.crossings().stream()
          .filter(c -> c.branch() == mode && c.kind() == CrossingKind.FLUTTER_ONSET).findFirst()
          .orElseThrow(() -> new AssertionError(sol.crossings()));
      // refined to the default 0.01 m/s; 0.02 m/s allows Brent's last step
      assertEquals(vf, onset.condition().speedTasMps(), 0.02, "onset of mode " + j);
      assertEquals(onset.condition().speedTasMps(), 20 + 10 * onset.pathParameter(), 1e-9);
      double fF = Math.sqrt(w0 * w0 - qf * Q0[j]) / (2 * Math.PI);
      // d omega / dV is small (~1e-3 Hz per m/s): 1e-4 relative covers 0.02 m/s
      assertEquals(fF, onset.frequencyHz(), 1e-4 * fF);
      assertEquals(0.0, onset.thresholdG(), 0.0);
      assertEquals("mode_" + (j + 1), onset.branchName());
      // g = -0.03 crossing: 2 sigma + 0.03 omega = 0, solved here independently by Brent on V
      double g = options.dampingLimitG();
      double vl = new BrentSolver(1e-12).solve(200, v -> {
        double[] r = root(F_HZ[mode], Q0[mode], D[mode], v);
        return 2 * r[0] + g * r[1];
      }, 20, vf);
      FlutterCrossing limit = sol.crossings().stream()
          .filter(c -> c.branch() == mode && c.kind() == CrossingKind.of(-g, true)).findFirst()
          .orElseThrow(() -> new AssertionError(sol.crossings()));
      assertEquals(vl, limit.condition().speedTasMps(), 0.02, "limit crossing of mode " + j);
      assertEquals(-g, limit.thresholdG(), 0.0);
      assertTrue(limit.evaluations() > 0 && limit.evaluations() <= 100);
    }
    // exactly one onset and one limit crossing per mode, ordered along the path
    assertEquals(4, sol.crossings().size(), sol.crossings().toString());
    for (int i = 1; i < sol.crossings().size(); i++) {
      assertTrue(sol.crossings().get(i).pathParameter() >= sol.crossings().get(i - 1).pathParameter());
    }
    assertEquals(0, sol.firstOnset().orElseThrow().branch(), "mode 1 flutters first (82 m/s)");
  }

  @Test
  void noDampingLimitGivesOnlyStabilityCrossings() {
    AnalysisOptions d = AnalysisOptions.defaults();
    AnalysisOptions noLimit = new AnalysisOptions(d.method(), 0.0, d.convergenceTolerance(), d.maxIterations(),
        d.onsetSpeedToleranceMps(), d.kMethodMinReducedFrequency(), d.kMethodMaxReducedFrequency(),
        d.kMethodPoints());
    FlutterSolution sol = new PkMethod().solve(system(F_HZ, Q0, D, 0.005, 2.0), PATH, noLimit);
    assertEquals(2, sol.crossings().size(), sol.crossings().toString());
    assertTrue(sol.crossings().stream().allMatch(c -> c.kind() == CrossingKind.FLUTTER_ONSET));
  }

  @Test
  void aCoarserSpeedToleranceGivesACoarserButStillBracketedOnset() {
    AnalysisOptions d = AnalysisOptions.defaults();
    AnalysisOptions coarse = new AnalysisOptions(d.method(), d.dampingLimitG(), d.convergenceTolerance(),
        d.maxIterations(), 2.0, d.kMethodMinReducedFrequency(), d.kMethodMaxReducedFrequency(), d.kMethodPoints());
    FlutterSolution sol = new PkMethod().solve(system(F_HZ, Q0, D, 0.005, 2.0), PATH, coarse);
    FlutterCrossing onset = sol.firstOnset().orElseThrow();
    double vf = 2 * (2 * ZETA * 2 * Math.PI * F_HZ[0]) / (RHO * B * D[0]);
    // 2 m/s requested on a 10 m/s grid: bracket 0.2 in path parameter
    assertEquals(0.2, onset.bracketWidth(), 1e-6); // dv is 10 m/s EAS to the atmosphere's round-off
    assertEquals(vf, onset.condition().speedTasMps(), 2.0);
  }

  @Test
  void identicalModesShareEveryRootAndTheTrackingIsFlaggedAmbiguous() {
    // two identical uncoupled modes have identical closed-form roots at every speed: the branches
    // cannot be told apart, which must be reported, never hidden
    AeroelasticSystem sys = system(new double[] {2.0, 2.0}, new double[] {Q0[0], Q0[0]},
        new double[] {D[0], D[0]}, 0.005, 2.0);
    FlutterSolution sol = new PkMethod().solve(sys, PATH, AnalysisOptions.defaults());
    assertTrue(sol.warnings().stream().anyMatch(w -> w.contains("at the first sweep point the roots of mode_1 and "
        + "mode_2 coincide")), sol.warnings().toString());
    assertTrue(sol.warnings().stream().anyMatch(w -> w.contains("ambiguous mode tracking at grid point 1 ")),
        sol.warnings().toString());
    assertEquals(1.0, sol.diagnostics().firstTroublePathParameter(), 0.0);
    double[] r = root(2.0, Q0[0], D[0], 200);
    for (BranchCurve c : sol.branches()) {
      assertEquals(r[1] / (2 * Math.PI), c.frequencyHz()[18], 1e-6 * r[1]);
    }
  }

  @Test
  void modesWithinTheCollisionToleranceAreFlaggedAsCoinciding() {
    // 1e-7 relative apart in frequency: the closed-form roots differ by about 1e-7 of |s|, below
    // the 1e-6 relative collision tolerance, so the branches cannot be told apart at start-up
    AeroelasticSystem sys = system(new double[] {2.0, 2.0 * (1 + 1e-7)}, new double[] {Q0[0], Q0[0]},
        new double[] {D[0], D[0]}, 0.005, 2.0);
    double[] r1 = root(2.0, Q0[0], D[0], 20);
    double[] r2 = root(2.0 * (1 + 1e-7), Q0[0], D[0], 20);
    double gap = Math.hypot(r2[0] - r1[0], r2[1] - r1[1]) / Math.hypot(r1[0], r1[1]);
    assertTrue(gap > 1e-8 && gap < 1e-6, "premise: relative gap " + gap);
    FlutterSolution sol = new PkMethod().solve(sys, PATH, AnalysisOptions.defaults());
    assertTrue(sol.warnings().stream().anyMatch(w -> w.contains("at the first sweep point the roots of mode_1 and "
        + "mode_2 coincide")), sol.warnings().toString());
  }

  @Test
  void distinctModesAreNotFlaggedAsCoinciding() {
    // the same two modes 1e-3 apart in frequency: distinct closed-form roots, no ambiguity
    AeroelasticSystem sys = system(new double[] {2.0, 2.002}, new double[] {Q0[0], Q0[0]},
        new double[] {D[0], D[0]}, 0.005, 2.0);
    FlutterSolution sol = new PkMethod().solve(sys, PATH, AnalysisOptions.defaults());
    assertFalse(sol.warnings().stream().anyMatch(w -> w.contains("coincide") || w.contains("ambiguous")),
        sol.warnings().toString());
    assertTrue(Double.isNaN(sol.diagnostics().firstTroublePathParameter()));
  }

  @Test
  void reducedFrequenciesOutsideTheDataRangeAreReported() {
    // closed form: k = omega b / V runs from about 0.026 (mode 1 at 200 m/s) to 0.79 (mode 2 at
    // 20 m/s); a range that covers it draws no warning, one that misses either end does
    String outside = "used outside their reduced-frequency range";
    assertFalse(warnings(0.005, 2.0).stream().anyMatch(w -> w.contains(outside)));
    assertTrue(warnings(0.05, 2.0).stream().anyMatch(w -> w.contains(outside)));
    assertTrue(warnings(0.005, 0.5).stream().anyMatch(w -> w.contains(outside)));
  }

  private static List<String> warnings(double kMin, double kMax) {
    return new PkMethod().solve(system(F_HZ, Q0, D, kMin, kMax), PATH, AnalysisOptions.defaults()).warnings();
  }
}
