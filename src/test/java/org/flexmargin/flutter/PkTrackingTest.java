package org.flexmargin.flutter;

import static org.flexmargin.flutter.PkClosedFormTest.B;
import static org.flexmargin.flutter.PkClosedFormTest.RHO;
import static org.flexmargin.flutter.PkClosedFormTest.ZETA;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
 * Root tracking of the p-k method where it is not smooth: steps too long for a clean continuation
 * (halved until they are) and roots that cannot be converged (reported as gaps, never hidden). The
 * uncoupled modes of {@link PkClosedFormTest} give every root in closed form:
 * sigma = (rho V b d / 2 - c) / 2, omega^2 = sigma^2 + c sigma + w0^2 - q_dyn q0 (unit mass).
 */
class PkTrackingTest {

  /** Closed-form root {sigma, omega} of a unit-mass mode at true airspeed v. */
  private static double[] root(double fHz, double q0, double d, double v) {
    double w0 = 2 * Math.PI * fHz;
    double c = 2 * ZETA * w0;
    double sigma = (RHO * v * B * d / 2 - c) / 2;
    double omega = Math.sqrt(sigma * sigma + c * sigma + w0 * w0 - 0.5 * RHO * v * v * q0);
    return new double[] {sigma, omega};
  }

  @Test
  void aLongStepIsHalvedUntilTrackingIsClean() {
    // mode 1 (2 Hz) with q0 = 0.005: omega falls from 12.5 to 5.9 rad/s between 20 and 200 m/s,
    // a move of about half its modulus in one step, more than the quarter a clean step allows
    double[] f = {2.0, 5.0};
    double[] q0 = {0.005, -0.005};
    double[] d = {0.02, 0.027};
    PlannedPath two = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, 200, 2));
    double[] r20 = root(f[0], q0[0], d[0], 20);
    double[] r200 = root(f[0], q0[0], d[0], 200);
    double move = Math.hypot(r200[0] - r20[0], r200[1] - r20[1]);
    assertTrue(move > 0.25 * Math.hypot(r20[0], r20[1]), "premise: the step is not clean, " + move);
    FlutterSolution sol = new PkMethod().solve(PkClosedFormTest.system(f, q0, d, 0.0, 5.0), two,
        AnalysisOptions.defaults());
    assertTrue(sol.diagnostics().stepHalvings() > 0, sol.diagnostics().toString());
    for (int j = 0; j < 2; j++) {
      BranchCurve c = sol.branches().get(j);
      double[] r = root(f[j], q0[j], d[j], 200);
      // converged to 1e-9 relative: 1e-7 relative to |s| is safe
      assertEquals(r[1] / (2 * Math.PI), c.frequencyHz()[1], 1e-7 * Math.hypot(r[0], r[1]), "branch " + j);
      assertEquals(2 * r[0] / r[1], c.dampingG()[1], 1e-6, "branch " + j);
    }
    // the onset of mode 1 lies inside the single step: V_F = 2 c / (rho b d)
    double vf = 2 * (2 * ZETA * 2 * Math.PI * f[0]) / (RHO * B * d[0]);
    FlutterCrossing onset = sol.firstOnset().orElseThrow(() -> new AssertionError(sol.crossings()));
    assertEquals(0, onset.branch());
    // 0.01 m/s requested on a 180 m/s step; 0.05 m/s allows Brent's last bracket
    assertEquals(vf, onset.condition().speedTasMps(), 0.05);
    assertEquals(0, sol.diagnostics().unconvergedRoots());
  }

  /** Q_ii = q0_i + i k d_i down to kBad; below it the data are not a number. */
  private static AeroSource holed(double[] q0, double[] d, double kBad) {
    return new FunctionForces(q0.length, B, 0, 5, (k, out) -> {
      for (int i = 0; i < q0.length; i++) {
        out.set(i, i, k < kBad ? Double.NaN : q0[i], k * d[i]);
      }
    }, "forces with a hole at low k");
  }

  @Test
  void rootsThatCannotConvergeAreGapsInTheirCurveAndAreReported() {
    double[] f = {2.0, 5.0};
    double[] q0 = {0.002, -0.005};
    double[] d = {0.02, 0.027};
    // mode 1's reduced frequency omega b / V falls below 0.034 from 170 m/s on; mode 2's stays
    // above 0.07 on the whole sweep
    double kBad = 0.034;
    double[][] m = {{1, 0}, {0, 1}};
    double[][] c = new double[2][2];
    double[][] k = new double[2][2];
    for (int i = 0; i < 2; i++) {
      double w = 2 * Math.PI * f[i];
      c[i][i] = 2 * ZETA * w;
      k[i][i] = w * w;
    }
    AeroelasticSystem sys = new AeroelasticSystem(new StructuralModel(List.of("mode_1", "mode_2"), m, c, k),
        holed(q0, d, kBad));
    FlutterSolution sol = new PkMethod().solve(sys, PkClosedFormTest.PATH, AnalysisOptions.defaults());
    int firstGap = -1;
    int gaps = 0;
    BranchCurve one = sol.branches().get(0);
    for (int p = 0; p < one.size(); p++) {
      double v = 20 + 10 * p;
      double[] r = root(f[0], q0[0], d[0], v);
      double kRoot = r[1] * B / v;
      assertTrue(Math.abs(kRoot - kBad) > 0.02 * kBad, "premise: no grid point at the edge of the hole");
      if (kRoot < kBad) {
        assertFalse(one.converged()[p], "point " + p);
        assertTrue(Double.isNaN(one.frequencyHz()[p]) && Double.isNaN(one.dampingG()[p])
            && Double.isNaN(one.dampingRatio()[p]) && Double.isNaN(one.reducedFrequency()[p]));
        assertTrue(sol.warnings().stream().anyMatch(w -> w.startsWith("root of mode_1 did not converge at grid point "
            + (int) Math.round((v - 20) / 10) + " ")), sol.warnings().toString());
        firstGap = firstGap < 0 ? p : firstGap;
        gaps++;
      } else {
        assertTrue(one.converged()[p], "point " + p);
        assertEquals(r[1] / (2 * Math.PI), one.frequencyHz()[p], 1e-7 * Math.hypot(r[0], r[1]));
      }
    }
    assertTrue(gaps > 0 && firstGap > 0, "premise: the sweep reaches the hole after its start");
    assertTrue(java.util.Arrays.equals(new boolean[19], invert(sol.branches().get(1).converged())),
        "mode 2 converges everywhere");
    assertEquals(gaps, sol.diagnostics().unconvergedRoots());
    assertEquals(firstGap, sol.diagnostics().firstTroublePathParameter(), 0.0);
    // the onset of mode 1 (82 m/s) lies before the hole and is still found
    double vf = 2 * (2 * ZETA * 2 * Math.PI * f[0]) / (RHO * B * d[0]);
    assertEquals(vf, sol.firstOnset().orElseThrow().condition().speedTasMps(), 0.02);
  }

  private static boolean[] invert(boolean[] a) {
    boolean[] b = new boolean[a.length];
    for (int i = 0; i < a.length; i++) {
      b[i] = !a[i];
    }
    return b;
  }
}
