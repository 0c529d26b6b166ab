package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * The V-g (k) method's curves, checked point by point against an independent solve of the same
 * 2 x 2 eigenproblem by its characteristic polynomial (Commons Math complex arithmetic, no EJML
 * eigen-decomposition), and its hysteretic damping against the exact algebraic identity it implies
 * (Bisplinghoff, Ashley &amp; Halfman, <i>Aeroelasticity</i>, §9.6; docs/validation.md §5.5).
 */
class KMethodCurvesTest {

  /** The sweep's own sea-level density from the atmosphere model, kg/m^3. */
  private static final double RHO = ValidationCases.lpwPath(2.0, 8.0, 31).at(0).densityKgPerM3();
  /** Coarser than the default 400 points to keep the test fast; still 40 points per decade. */
  private static final AnalysisOptions K_OPTIONS = new AnalysisOptions(FlutterMethodKind.K, 0.03, 1e-9, 60,
      0.01, 0.01, 5.0, 108);

  private static TypicalSection damped(double zeta) {
    TypicalSection s = ValidationCases.lpwSection();
    return new TypicalSection(s.semichordM(), s.massPerSpanKgPerM(), s.elasticAxisA(),
        s.massOffsetXAlpha(), s.radiusOfGyrationSquared(), s.heaveFrequencyHz(), s.pitchFrequencyHz(),
        s.liftSlopePerRad(), s.spanM(), zeta);
  }

  private static FlutterSolution solve(AeroelasticSystem sys) {
    return new KMethod().solve(sys, ValidationCases.lpwPath(2.0, 8.0, 31), K_OPTIONS);
  }

  /** Eigenvalues of K^-1 (M + rho b^2 Q(ik) / (2 k^2)) for a diagonal K, by the quadratic formula. */
  private static Complex[] lambdas(AeroelasticSystem sys, double k) {
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    sys.aero().forces(k, q);
    double b = sys.aero().referenceSemichordM();
    double factor = RHO * b * b / (2 * k * k);
    Complex[][] p = new Complex[2][2];
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        Complex a = new Complex(sys.structure().mass(i, j) + factor * q.getReal(i, j), factor * q.getImag(i, j));
        p[i][j] = a.divide(sys.structure().stiffness(i, i));
      }
    }
    Complex tr = p[0][0].add(p[1][1]);
    Complex det = p[0][0].multiply(p[1][1]).subtract(p[0][1].multiply(p[1][0]));
    Complex root = tr.multiply(tr).subtract(det.multiply(4)).sqrt();
    return new Complex[] {tr.add(root).divide(2), tr.subtract(root).divide(2)};
  }

  /** Eigenvector (p01, Lambda - p00) of the 2 x 2 k-method matrix for its eigenvalue Lambda. */
  private static Complex[] vector(AeroelasticSystem sys, double k, Complex lambda) {
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    sys.aero().forces(k, q);
    double b = sys.aero().referenceSemichordM();
    double factor = RHO * b * b / (2 * k * k);
    Complex p00 = new Complex(sys.structure().mass(0, 0) + factor * q.getReal(0, 0), factor * q.getImag(0, 0))
        .divide(sys.structure().stiffness(0, 0));
    Complex p01 = new Complex(sys.structure().mass(0, 1) + factor * q.getReal(0, 1), factor * q.getImag(0, 1))
        .divide(sys.structure().stiffness(0, 0));
    return new Complex[] {p01, lambda.subtract(p00)};
  }

  /**
   * Lowest MAC |a^H b|^2 / (|a|^2 |b|^2) between a branch's eigenvectors at consecutive grid points,
   * each branch taken at the eigenvalue nearest its reported Lambda = (1 + i g) / omega^2.
   */
  private static double lowestStepMac(AeroelasticSystem sys, BranchCurve[] br, double[] ks) {
    double lowest = 1.0;
    for (BranchCurve c : br) {
      Complex[] prev = null;
      for (int i = 0; i < ks.length; i++) {
        double omega = 2 * Math.PI * c.frequencyHz()[i];
        Complex got = new Complex(1, c.dampingG()[i]).divide(omega * omega);
        Complex[] ref = lambdas(sys, ks[i]);
        Complex lambda = got.subtract(ref[0]).abs() <= got.subtract(ref[1]).abs() ? ref[0] : ref[1];
        Complex[] v = vector(sys, ks[i], lambda);
        if (prev != null) {
          Complex dot = prev[0].conjugate().multiply(v[0]).add(prev[1].conjugate().multiply(v[1]));
          double aa = prev[0].abs() * prev[0].abs() + prev[1].abs() * prev[1].abs();
          double bb = v[0].abs() * v[0].abs() + v[1].abs() * v[1].abs();
          lowest = Math.min(lowest, dot.abs() * dot.abs() / (aa * bb));
        }
        prev = v;
      }
    }
    return lowest;
  }

  @Test
  void everyCurvePointSolvesTheKMethodEigenproblem() {
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    assertEquals(0.0, sys.structure().stiffness(0, 1), 0.0, "premise: modal (diagonal) stiffness");
    FlutterSolution sol = solve(sys);
    BranchCurve[] br = {sol.branches().get(0), sol.branches().get(1)};
    double[] ks = br[0].pathParameter();
    assertEquals(K_OPTIONS.kMethodPoints(), ks.length);
    double b = sys.aero().referenceSemichordM();
    for (int i = 0; i < ks.length; i++) {
      // grid log-spaced from k_max down to k_min (AnalysisOptions documentation)
      double expectedK = 5.0 * Math.pow(0.01 / 5.0, i / (double) (ks.length - 1));
      assertEquals(expectedK, ks[i], 1e-12 * expectedK);
      Complex[] ref = lambdas(sys, ks[i]);
      boolean[] used = new boolean[2];
      for (BranchCurve c : br) {
        double omega = 2 * Math.PI * c.frequencyHz()[i];
        // Lambda = (1 + i g) / omega^2 as documented in KMethod
        Complex got = new Complex(1, c.dampingG()[i]).divide(omega * omega);
        int m = got.subtract(ref[0]).abs() <= got.subtract(ref[1]).abs() ? 0 : 1;
        assertTrue(!used[m], "both branches on one eigenvalue at k = " + ks[i]);
        used[m] = true;
        // both are double-precision eigenvalues of a well-conditioned 2 x 2 matrix: 1e-9 relative
        assertEquals(0.0, got.subtract(ref[m]).abs(), 1e-9 * ref[m].abs(), "k = " + ks[i]);
        // V = omega b / k; sea level, so EAS = TAS to the atmosphere's round-off
        assertEquals(omega * b / ks[i], c.speedTasMps()[i], 1e-9 * c.speedTasMps()[i]);
        assertEquals(c.speedTasMps()[i], c.speedEasMps()[i], 1e-6 * c.speedTasMps()[i]);
        assertEquals(c.dampingG()[i] / 2, c.dampingRatio()[i], 1e-15);
        assertTrue(c.converged()[i]);
      }
    }
    // the lowest step MAC is that of the exact eigenvectors (p01, Lambda - p00) of consecutive points
    assertEquals(lowestStepMac(sys, br, ks), sol.diagnostics().minMac(), 1e-9);
    assertTrue(sol.diagnostics().minMac() < 1 - 1e-6, "premise: the coupled eigenvectors turn, " + sol.diagnostics().minMac());
    // at k = 5 the air adds ~1 % mass (mu = 100): branch j starts at in-vacuo mode j
    for (int j = 0; j < 2; j++) {
      double fVac = sys.inVacuoOmegaRadPerS(j) / (2 * Math.PI);
      assertEquals(fVac, br[j].frequencyHz()[0], 0.05 * fVac, "branch " + j + " starts at its own mode");
    }
  }

  @Test
  void onsetFrequencyAndReducedFrequencyMatchTheLpwReference() {
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    FlutterSolution sol = solve(sys);
    FlutterCrossing onset = sol.firstOnset().orElseThrow(() -> new AssertionError(sol.crossings()));
    // docs/validation.md §5.1 [derived]: U* = 6.2566, omega/omega_alpha = 0.5233 (exact Theodorsen)
    double uStar = onset.condition().speedTasMps() / ValidationCases.LPW_OMEGA_ALPHA;
    double ratio = 2 * Math.PI * onset.frequencyHz() / ValidationCases.LPW_OMEGA_ALPHA;
    // 1e-3 / 2e-3 relative: 5 and 4 significant digits in the reference
    assertEquals(6.2566, uStar, 1e-3 * 6.2566);
    assertEquals(0.5233, ratio, 2e-3 * 0.5233);
    // the path parameter of a k-method crossing is its reduced frequency k = omega b / V
    double k = 2 * Math.PI * onset.frequencyHz() * 1.0 / onset.condition().speedTasMps();
    assertEquals(k, onset.pathParameter(), 1e-8 * k);
    assertEquals(0.0, onset.thresholdG(), 0.0);
    assertTrue(onset.evaluations() > 0 && onset.evaluations() < 100);
    // crossings are ordered by speed
    for (int i = 1; i < sol.crossings().size(); i++) {
      assertTrue(sol.crossings().get(i).condition().speedTasMps()
          >= sol.crossings().get(i - 1).condition().speedTasMps());
    }
  }

  @Test
  void uniformHystereticDampingRotatesEveryEigenvalueExactly() {
    // Modal damping zeta in every mode enters as K_c = (1 + i g_s) K with g_s = 2 zeta (KMethod
    // documentation), so Lambda_damped = Lambda_undamped / (1 + i g_s) exactly:
    //   g_d = (g_u - g_s) / (1 + g_u g_s),  omega_d^2 = omega_u^2 (1 + g_s^2) / (1 + g_u g_s),
    // and the damped onset (g_d = 0) is the undamped point where g_u = g_s, at the same omega and V
    // (algebra derived in docs/validation.md §5.5).
    double zeta = 0.02;
    double gs = 2 * zeta;
    FlutterSolution u = solve(ValidationCases.system(ValidationCases.lpwSection()));
    FlutterSolution d = solve(ValidationCases.system(damped(zeta)));
    for (int j = 0; j < 2; j++) {
      BranchCurve cu = u.branches().get(j);
      BranchCurve cd = d.branches().get(j);
      for (int i = 0; i < cu.size(); i++) {
        double gu = cu.dampingG()[i];
        double fu = cu.frequencyHz()[i];
        // round-off of two eigen-decompositions: 1e-9 absolute on g (|g| <= ~3), 1e-9 relative on f
        assertEquals((gu - gs) / (1 + gu * gs), cd.dampingG()[i], 1e-9);
        assertEquals(fu * Math.sqrt((1 + gs * gs) / (1 + gu * gs)), cd.frequencyHz()[i], 1e-9 * fu);
      }
    }
    FlutterCrossing onset = d.firstOnset().orElseThrow();
    // independent: locate g_u = g_s on the undamped curve of the same branch by linear interpolation
    BranchCurve cu = u.branches().get(onset.branch());
    double[] g = cu.dampingG();
    double vRef = Double.NaN;
    for (int i = 0; i + 1 < g.length; i++) {
      if ((g[i] - gs) * (g[i + 1] - gs) < 0) {
        double s = (gs - g[i]) / (g[i + 1] - g[i]);
        vRef = cu.speedTasMps()[i] + s * (cu.speedTasMps()[i + 1] - cu.speedTasMps()[i]);
        break;
      }
    }
    // linear interpolation on a 108-point grid: the curve's curvature over one step (1.6 % in k)
    // gives errors of order 1e-4 relative; 1e-3 relative keeps the check well above that
    assertEquals(vRef, onset.condition().speedTasMps(), 1e-3 * vRef);
    double undampedOnset = u.firstOnset().orElseThrow().condition().speedTasMps();
    assertTrue(onset.condition().speedTasMps() > undampedOnset * 1.002,
        "positive damping must raise the k-method flutter speed");
  }

  @Test
  void altitudeChangingPathIsRejected() {
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> new KMethod().solve(sys, new PlannedPath(new MachSweep(0.3, 12000, 0, 11)), K_OPTIONS));
    assertTrue(e.getMessage().contains("options.method"), e.getMessage());
  }
}
