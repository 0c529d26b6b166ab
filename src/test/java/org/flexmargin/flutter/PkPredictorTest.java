package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.structure.StructuralModel;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * The p-k continuation on one coordinate whose aerodynamics are built so that the p-k root is known
 * in closed form and moves linearly with the airspeed:
 *
 * <pre>
 *   s(V) = sigma(V) + i omega0,   sigma(V) = SIGMA0 + BETA V
 * </pre>
 *
 * With m = 1, stiffness omega0^2 and damping c, the p-k equation s^2 + c s + omega0^2 = q Q(ik) holds
 * at s(V) with k = omega0 b / V exactly when
 *
 * <pre>
 *   Q(ik) = [sigma^2 + c sigma + i omega0 (2 sigma + c)] / (rho V^2 / 2),   V = omega0 b / k
 * </pre>
 *
 * (expand (sigma + i omega0)^2 + c (sigma + i omega0) + omega0^2). Because the root's frequency is
 * omega0 at every speed, the classical p-k start-up at the in-vacuo reduced frequency omega0 b / V
 * lands on it at once, and because sigma is linear in V (and V in the path parameter) the linear
 * predictor from the two previous roots is exact: every further grid point converges in one Newton
 * step.
 */
class PkPredictorTest {

  private static final double B = 0.5;
  private static final double OMEGA0 = 2 * Math.PI * 3.0;
  private static final double C = 0.5;
  private static final double SIGMA0 = -1.0;
  private static final double BETA = 0.01;
  private static final double RHO = PkClosedFormTest.RHO;

  private static double sigma(double v) {
    return SIGMA0 + BETA * v;
  }

  private static final AeroSource LINEAR_ROOT = new FunctionForces(1, B, 0.0, Double.POSITIVE_INFINITY, (k, out) -> {
    double v = OMEGA0 * B / k;
    double q = 0.5 * RHO * v * v;
    double s = sigma(v);
    out.set(0, 0, (s * s + C * s) / q, OMEGA0 * (2 * s + C) / q);
  }, "forces placing the root on a line");

  private static final AeroelasticSystem SYSTEM = new AeroelasticSystem(new StructuralModel(List.of("mode"),
      new double[][] {{1.0}}, new double[][] {{C}}, new double[][] {{OMEGA0 * OMEGA0}}), LINEAR_ROOT);

  /** Defaults with no damping-limit crossing: sigma stays negative, so no crossing is refined. */
  private static AnalysisOptions options() {
    AnalysisOptions d = AnalysisOptions.defaults();
    return new AnalysisOptions(d.method(), 0.0, d.convergenceTolerance(), d.maxIterations(),
        d.onsetSpeedToleranceMps(), d.kMethodMinReducedFrequency(), d.kMethodMaxReducedFrequency(),
        d.kMethodPoints());
  }

  /** TAS sweep at sea level from 20 m/s in 2 m/s steps. */
  private static FlutterSolution solve(int points) {
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, 20 + 2.0 * (points - 1), points));
    return new PkMethod().solve(SYSTEM, path, options());
  }

  @Test
  void everyRootIsOnTheLine() {
    FlutterSolution sol = solve(26);
    BranchCurve c = sol.branches().get(0);
    for (int i = 0; i < c.size(); i++) {
      double v = 20 + 2.0 * i;
      // converged to the relative tolerance 1e-9 of |s| ~ 19: 1e-7 is safe
      assertEquals(OMEGA0 / (2 * Math.PI), c.frequencyHz()[i], 1e-7, "at " + v);
      assertEquals(2 * sigma(v) / OMEGA0, c.dampingG()[i], 1e-7, "at " + v);
      assertTrue(c.converged()[i]);
    }
    assertTrue(sol.crossings().isEmpty(), sol.crossings().toString());
    assertEquals(0, sol.diagnostics().stepHalvings());
  }

  @Test
  void theStartUpNeedsOneFrozenEigenSolveAndEveryPredictedPointOneNewtonStep() {
    FlutterSolution shorter = solve(26);
    FlutterSolution longer = solve(36);
    // start-up: the frozen root at the in-vacuo reduced frequency is already the p-k root, so the
    // first classical update changes omega by round-off only and the second is skipped
    assertEquals(1, shorter.diagnostics().fullEigenSolves());
    assertEquals(1, longer.diagnostics().fullEigenSolves());
    // ten more grid points, each one root from an exact prediction: one step and one solve each
    assertEquals(10, longer.diagnostics().iterations() - shorter.diagnostics().iterations());
    assertEquals(10, longer.diagnostics().rootSolves() - shorter.diagnostics().rootSolves());
  }
}
