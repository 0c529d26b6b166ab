package org.flexmargin.flutter;

import static org.flexmargin.flutter.PkClosedFormTest.B;
import static org.flexmargin.flutter.PkClosedFormTest.D;
import static org.flexmargin.flutter.PkClosedFormTest.F_HZ;
import static org.flexmargin.flutter.PkClosedFormTest.PATH;
import static org.flexmargin.flutter.PkClosedFormTest.Q0;
import static org.flexmargin.flutter.PkClosedFormTest.RHO;
import static org.flexmargin.flutter.PkClosedFormTest.ZETA;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FlutterMethodKind;
import org.junit.jupiter.api.Test;

/**
 * The k method on the uncoupled modes of {@link PkClosedFormTest} (unit mass, K = w0^2, viscous
 * C = 2 zeta w0, Q(ik) = q0 + i k d), where its eigenproblem is scalar: with the viscous damping
 * taken as hysteretic, K_c = K + i C sqrt(K/M) = w0^2 (1 + 2 i zeta) (KMethod documentation), so
 *
 * <pre>
 *   Lambda(k) = (1 + rho b^2 (q0 + i k d) / (2 k^2)) / (w0^2 (1 + 2 i zeta)),
 *   omega = 1/sqrt(Re Lambda), g = Im Lambda / Re Lambda, V = omega b / k.
 * </pre>
 *
 * g = 0 where Im[(1 + rho b^2 q0/(2k^2) + i rho b^2 d/(2k)) (1 - 2 i zeta)] = 0, that is
 * 2 zeta k^2 - (rho b^2 d / 2) k + zeta rho b^2 q0 = 0 (quadratic formula). Mode 1 (q0 &gt; 0) has
 * two roots, an onset and a recovery; mode 2 (q0 &lt; 0) one onset, and at low k its Re Lambda turns
 * negative (the aerodynamic stiffening exceeds the structure's): no harmonic solution there.
 */
class KMethodClosedFormTest {

  private static final double K_MIN = 0.002;
  private static final double K_MAX = 2.0;
  private static final int POINTS = 80;
  private static final AnalysisOptions OPTIONS = new AnalysisOptions(FlutterMethodKind.K, 0.03, 1e-9, 60, 0.01,
      K_MIN, K_MAX, POINTS);

  private static Complex lambda(int mode, double k) {
    double w0 = 2 * Math.PI * F_HZ[mode];
    Complex num = new Complex(1 + RHO * B * B * Q0[mode] / (2 * k * k), RHO * B * B * D[mode] / (2 * k));
    return num.divide(new Complex(w0 * w0, 2 * ZETA * w0 * w0));
  }

  /** Roots k of 2 zeta k^2 - (rho b^2 d / 2) k + zeta rho b^2 q0 = 0, larger first; positive only. */
  private static double[] zeroDamping(int mode) {
    double a = 2 * ZETA;
    double bb = -RHO * B * B * D[mode] / 2;
    double c = ZETA * RHO * B * B * Q0[mode];
    double disc = Math.sqrt(bb * bb - 4 * a * c);
    return new double[] {(-bb + disc) / (2 * a), (-bb - disc) / (2 * a)};
  }

  private static FlutterSolution solve() {
    return new KMethod().solve(PkClosedFormTest.system(F_HZ, Q0, D, 0.0, 5.0), PATH, OPTIONS);
  }

  @Test
  void everyCurvePointIsTheScalarEigenvalue() {
    FlutterSolution sol = solve();
    assertEquals(2, sol.branches().size());
    int negative = 0;
    for (int j = 0; j < 2; j++) {
      BranchCurve c = sol.branches().get(j);
      assertEquals("mode_" + (j + 1), c.name());
      assertEquals(POINTS, c.size());
      for (int i = 0; i < POINTS; i++) {
        double k = K_MAX * Math.pow(K_MIN / K_MAX, i / (double) (POINTS - 1));
        assertEquals(k, c.pathParameter()[i], 1e-12 * k);
        assertEquals(k, c.reducedFrequency()[i], 1e-12 * k);
        Complex l = lambda(j, k);
        if (l.getReal() <= 0) {
          negative++;
          assertFalse(c.converged()[i], "branch " + j + ", k = " + k);
          assertTrue(Double.isNaN(c.frequencyHz()[i]) && Double.isNaN(c.speedTasMps()[i])
              && Double.isNaN(c.speedEasMps()[i]) && Double.isNaN(c.dampingG()[i]) && Double.isNaN(c.dampingRatio()[i]));
          continue;
        }
        assertTrue(c.converged()[i]);
        double omega = 1 / Math.sqrt(l.getReal());
        double g = l.getImaginary() / l.getReal();
        // a double-precision eigenvalue of a diagonal 2 x 2 matrix: round-off only, 1e-10 relative
        assertEquals(omega / (2 * Math.PI), c.frequencyHz()[i], 1e-10 * omega, "branch " + j + ", k = " + k);
        assertEquals(g, c.dampingG()[i], 1e-10 * Math.max(1, Math.abs(g)), "branch " + j + ", k = " + k);
        assertEquals(g / 2, c.dampingRatio()[i], 1e-10 * Math.max(1, Math.abs(g)));
        double v = omega * B / k;
        assertEquals(v, c.speedTasMps()[i], 1e-9 * v);
        // EAS = TAS sqrt(rho / rho0) at the sweep's own density
        assertEquals(v * Math.sqrt(RHO / 1.225), c.speedEasMps()[i], 1e-9 * v);
      }
    }
    assertTrue(negative > 0, "premise: mode 2 has no harmonic solution at the lowest k");
    // uncoupled modes: each branch keeps its own unit vector, MAC 1
    assertEquals(1.0, sol.diagnostics().minMac(), 1e-12);
    assertEquals(POINTS, sol.diagnostics().fullEigenSolves() - countRefinementSolves(sol));
  }

  /** Eigen-solves of the Brent refinements: each crossing's evaluations plus one final solve. */
  private static long countRefinementSolves(FlutterSolution sol) {
    return sol.crossings().stream().mapToLong(c -> c.evaluations() + 1).sum();
  }

  @Test
  void zeroDampingCrossingsAreTheRootsOfTheQuadratic() {
    FlutterSolution sol = solve();
    double[] k1 = zeroDamping(0);
    double[] k2 = zeroDamping(1);
    assertTrue(k1[1] > K_MIN && k2[1] < 0, "premise: two roots of mode 1 in the grid, one of mode 2");
    List<FlutterCrossing> x = sol.crossings();
    assertEquals(3, x.size(), x.toString());
    // ordered by speed: mode 1 onset (k1[0]), mode 2 onset (k2[0]), mode 1 recovery (k1[1])
    double[] ks = {k1[0], k2[0], k1[1]};
    int[] branch = {0, 1, 0};
    CrossingKind[] kind = {CrossingKind.FLUTTER_ONSET, CrossingKind.FLUTTER_ONSET, CrossingKind.FLUTTER_RECOVERY};
    for (int i = 0; i < 3; i++) {
      FlutterCrossing c = x.get(i);
      assertEquals(branch[i], c.branch(), c.toString());
      assertEquals("mode_" + (branch[i] + 1), c.branchName());
      assertEquals(kind[i], c.kind(), c.toString());
      assertEquals(0.0, c.thresholdG(), 0.0);
      // Brent to 1e-10 k on k: 1e-8 relative is safe, and so on V and f, which vary like k
      assertEquals(ks[i], c.pathParameter(), 1e-8 * ks[i], c.toString());
      double omega = 1 / Math.sqrt(lambda(branch[i], ks[i]).getReal());
      assertEquals(omega / (2 * Math.PI), c.frequencyHz(), 1e-8 * omega);
      double v = omega * B / ks[i];
      assertEquals(v, c.condition().speedTasMps(), 1e-7 * v);
      assertEquals(RHO, c.condition().densityKgPerM3(), 0.0);
      // the final bracket is 1e-10 of the bracket's upper grid k, at most one grid step (9 %) above
      assertTrue(c.bracketWidth() >= 1e-10 * ks[i] && c.bracketWidth() <= 1.1e-10 * ks[i], c.toString());
      assertTrue(c.evaluations() > 0 && c.evaluations() < 100);
    }
    // the data cover every k used: only the artificial-damping remark
    assertEquals(1, sol.warnings().size(), sol.warnings().toString());
  }

  @Test
  void reducedFrequenciesBeyondTheDataAreReported() {
    FlutterSolution sol = new KMethod().solve(PkClosedFormTest.system(F_HZ, Q0, D, 0.01, 1.0), PATH, OPTIONS);
    assertTrue(sol.warnings().stream().anyMatch(w -> w.contains("outside their reduced-frequency range")),
        sol.warnings().toString());
  }

  @Test
  void aConservativeSystemHasZeroDampingEverywhereAndNoCrossing() {
    // no structural damping and purely real (in-phase) aerodynamics: K_c = K and Lambda(k) =
    // (1 + rho b^2 q0 / (2 k^2)) / w0^2 is real, so g = 0 at every point of mode 1 (q0 > 0); g never
    // changes sign, so there is nothing to report
    double w0 = 2 * Math.PI * F_HZ[0];
    AeroelasticSystem sys = new AeroelasticSystem(new org.flexmargin.structure.StructuralModel(List.of("mode_1"),
        new double[][] {{1.0}}, new double[][] {{0.0}}, new double[][] {{w0 * w0}}),
        new org.flexmargin.aero.FunctionForces(1, B, 0.0, 5.0, (k, out) -> out.set(0, 0, Q0[0], 0.0), "real forces"));
    FlutterSolution sol = new KMethod().solve(sys, PATH, OPTIONS);
    BranchCurve c = sol.branches().get(0);
    for (int i = 0; i < POINTS; i++) {
      double k = c.pathParameter()[i];
      double omega = w0 / Math.sqrt(1 + RHO * B * B * Q0[0] / (2 * k * k));
      assertTrue(c.converged()[i]);
      assertEquals(0.0, c.dampingG()[i], 0.0, "k = " + k);
      // a double-precision eigenvalue of a 1 x 1 matrix: round-off only
      assertEquals(omega / (2 * Math.PI), c.frequencyHz()[i], 1e-12 * omega, "k = " + k);
    }
    assertTrue(sol.crossings().isEmpty(), sol.crossings().toString());
  }
}
