package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.complex.Complex;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.FunctionForces;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RogerApproximation;
import org.flexmargin.aero.Theodorsen;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.structure.BuiltInStructures;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.numerics.ReferenceEigenvalues;
import org.junit.jupiter.api.Test;

/** Validation of {@link StateSpaceMethod}: the state-space (rational-fit) flutter method. */
class StateSpaceMethodTest {

  // docs/validation.md §5.1 [derived]: Lee, Price & Wong section, exact Theodorsen aerodynamics, p-k
  // and k method: U* = U/(b omega_alpha) = 6.2566, omega/omega_alpha = 0.5233.
  private static final double LPW_U_STAR_EXACT = 6.2566;
  private static final double LPW_FREQ_RATIO_EXACT = 0.5233;
  // docs/validation.md §5.2: with the R. T. Jones two-lag approximation of Theodorsen's function,
  // C(ik) ~ 1 - 0.165 ik/(ik + 0.0455) - 0.335 ik/(ik + 0.3) (docs/validation.md §1.2, from memory),
  // U* = 6.2851, omega/omega_alpha = 0.5282 [derived]; 6.2851 is also the linear flutter speed
  // quoted by Lee, Price & Wong, Prog. Aerosp. Sci. 35 (1999) (from memory).
  private static final double LPW_U_STAR_JONES = 6.2851;
  private static final double LPW_FREQ_RATIO_JONES = 0.5282;

  private static FlutterCrossing firstOnset(FlutterSolution s) {
    return s.firstOnset().orElseThrow(() -> new AssertionError("no onset: " + s.crossings()));
  }

  @Test
  void lpwSectionFlutterMatchesTheExactValueWithFourLags() {
    // State-space flutter speed within 0.5 % of the exact value (docs/validation.md §5.1).
    // Measured: U* = 6.2408 (-0.25 %), omega/omega_alpha = 0.5210 (-0.44 %) with 4 default lag
    // roots over k in [0, 1.5] (fit error 0.63 % worst element). Frequency tolerance 1 %: about
    // twice the fit error, which is what the root frequency inherits.
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    FlutterSolution sol = new StateSpaceMethod(4, 1.5)
        .solve(sys, ValidationCases.lpwPath(2.0, 8.0, 31), AnalysisOptions.defaults());
    FlutterCrossing onset = firstOnset(sol);
    double uStar = onset.condition().speedTasMps() / ValidationCases.LPW_OMEGA_ALPHA;
    double ratio = 2 * Math.PI * onset.frequencyHz() / ValidationCases.LPW_OMEGA_ALPHA;
    assertEquals(LPW_U_STAR_EXACT, uStar, 0.005 * LPW_U_STAR_EXACT);
    assertEquals(LPW_FREQ_RATIO_EXACT, ratio, 0.01 * LPW_FREQ_RATIO_EXACT);
    assertEquals(1, sol.crossings().stream().filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET).count());
    assertEquals(0, sol.diagnostics().unconvergedRoots());
    assertTrue(sol.diagnostics().maxRelativeResidual() < 1e-12, "residual " + sol.diagnostics());
    assertTrue(sol.diagnostics().fullEigenSolves() >= 31);
    // the coupled mode shapes turn along the sweep (MAC below 1) and every accepted step is clean
    // (MAC at least 0.8, StateSpaceMethod documentation)
    double mac = sol.diagnostics().minMac();
    assertTrue(mac >= 0.8 && mac < 1 - 1e-6, "lowest step MAC " + mac);
    // only the line naming the method: no fit, range, lag-root or tracking warning
    assertEquals(1, sol.warnings().size(), sol.warnings().toString());
    assertTrue(sol.warnings().get(0).startsWith("method: state-space"));
    // the line gives the fit's worst element error in per cent
    String worst = String.format(java.util.Locale.ROOT, "worst element error %.3g %%)",
        100 * new StateSpaceMethod(4, 1.5).fitFor(sys).error().worstRelativeError());
    assertTrue(sol.warnings().get(0).endsWith(worst), worst + " not in " + sol.warnings().get(0));
  }

  @Test
  void lpwOnsetIsIndependentOfTheGridDensity() {
    // Tracking regression as for p-k (docs/validation.md §5.1, tracking pitfall): 7 and 121 grid points must
    // give the same refined onset (both refined to 0.01 m/s on ~392 m/s: 1e-4 relative).
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    StateSpaceMethod method = new StateSpaceMethod(4, 1.5);
    double coarse = firstOnset(method.solve(sys, ValidationCases.lpwPath(2.0, 8.0, 7),
        AnalysisOptions.defaults())).condition().speedTasMps();
    double fine = firstOnset(method.solve(sys, ValidationCases.lpwPath(2.0, 8.0, 121),
        AnalysisOptions.defaults())).condition().speedTasMps();
    assertEquals(fine, coarse, 1e-4 * fine);
  }

  /**
   * Theodorsen's section forces (Theodorsen, NACA Report 496; the formulas of the {@link
   * org.flexmargin.aero.StripTheoryAero} Javadoc, re-implemented here) with any lift-deficiency
   * function, projected on the modes of the built typical section: Q = Phi^T Q_section Phi.
   */
  private static AeroSource sectionForces(TypicalSection s, ModeTable modes, Deficiency c) {
    double b = s.semichordM();
    double a = s.elasticAxisA();
    double a0 = s.liftSlopePerRad();
    double span = s.spanM();
    double[][] phi = new double[modes.size()][]; // [mode][w, theta]
    for (int i = 0; i < modes.size(); i++) {
      ElasticMode m = modes.modes().get(i);
      ShapeValue v = m.shapes().get(BuiltInStructures.SECTION_STATION);
      phi[i] = new double[] {v.displacementM(), v.rotationRad()};
    }
    return new FunctionForces(phi.length, b, 0, Double.POSITIVE_INFINITY, (k, out) -> {
      Complex ik = new Complex(0, k);
      Complex cc = c.at(k);
      double twoPi = 2 * Math.PI;
      // per unit span per unit q; rows (lift, moment), columns (w, theta)
      Complex lw = new Complex(twoPi * k * k).subtract(ik.multiply(cc).multiply(2 * a0));
      Complex mw = new Complex(twoPi * a * b * k * k).subtract(ik.multiply(cc).multiply(2 * a0 * b * (a + 0.5)));
      Complex steady = Complex.ONE.add(ik.multiply(0.5 - a));
      Complex lt = ik.add(a * k * k).multiply(twoPi * b).add(cc.multiply(steady).multiply(2 * a0 * b));
      Complex mt = new Complex((0.125 + a * a) * k * k).subtract(ik.multiply(0.5 - a)).multiply(twoPi * b * b)
          .add(cc.multiply(steady).multiply(2 * a0 * b * b * (a + 0.5)));
      Complex[][] qs = {{lw, lt}, {mw, mt}};
      int n = phi.length;
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          Complex sum = Complex.ZERO;
          for (int r = 0; r < 2; r++) {
            for (int q = 0; q < 2; q++) {
              sum = sum.add(qs[r][q].multiply(phi[i][r] * phi[j][q]));
            }
          }
          out.set(i, j, span * sum.getReal(), span * sum.getImaginary());
        }
      }
    }, "typical-section forces (test)");
  }

  /** A lift-deficiency function C(k) (dimensionless, complex). */
  private interface Deficiency {
    Complex at(double k);
  }

  @Test
  void jonesApproximationGivesThePublishedStateSpaceFlutterSpeed() {
    TypicalSection section = ValidationCases.lpwSection();
    ConfigurationModel model = ConfigurationModel.of(new Configuration("lpw", section, null));
    // 1. The test's own section forces with the exact C(k) equal the project's strip theory
    //    (1e-12 of the largest entry: same formulas, independent code).
    AeroSource exact = sectionForces(section, model.modes(), k -> {
      double[] fg = new double[2];
      Theodorsen.evaluate(k, fg);
      return new Complex(fg[0], fg[1]);
    });
    for (double k : new double[] {0.0, 0.05, 0.3, 1.2}) {
      ZMatrixRMaj mine = new ZMatrixRMaj(2, 2);
      ZMatrixRMaj project = new ZMatrixRMaj(2, 2);
      exact.forces(k, mine);
      model.system().aero().forces(k, project);
      double scale = Arrays.stream(project.data).map(Math::abs).max().orElseThrow();
      for (int e = 0; e < mine.data.length; e++) {
        assertEquals(project.data[e], mine.data[e], 1e-12 * scale, "k = " + k);
      }
    }
    // 2. With Jones's C the forces are exactly of Roger's form with lag roots 0.0455 and 0.3
    //    (p C(p) = p/2 + 0.165 * 0.0455 p/(p + 0.0455) + 0.335 * 0.3 p/(p + 0.3)), so the fit is
    //    exact (to rounding) and the state space is the classical Jones-Wagner model.
    AeroSource jones = sectionForces(section, model.modes(), k -> {
      Complex ik = new Complex(0, k);
      return Complex.ONE.subtract(ik.divide(ik.add(0.0455)).multiply(0.165))
          .subtract(ik.divide(ik.add(0.3)).multiply(0.335));
    });
    RationalFit fit = RogerApproximation.fit(jones, RogerApproximation.defaultReducedFrequencies(1.5, 31),
        new double[] {0.0455, 0.3});
    assertTrue(fit.error().worstRelativeError() < 1e-10, "fit error " + fit.error().worstRelativeError());
    AeroelasticSystem sys = new AeroelasticSystem(model.system().structure(), fit);
    // the default method uses the system's own rational fit as it is
    FlutterSolution sol = new StateSpaceMethod().solve(sys, ValidationCases.lpwPath(2.0, 8.0, 31),
        AnalysisOptions.defaults());
    FlutterCrossing onset = firstOnset(sol);
    double uStar = onset.condition().speedTasMps() / ValidationCases.LPW_OMEGA_ALPHA;
    double ratio = 2 * Math.PI * onset.frequencyHz() / ValidationCases.LPW_OMEGA_ALPHA;
    // 1e-3 relative on speed (five digits of the reference plus the 0.01 m/s onset bracket; docs/validation.md §5.2); 2e-3 on
    // frequency (4 significant digits in the reference)
    assertEquals(LPW_U_STAR_JONES, uStar, 1e-3 * LPW_U_STAR_JONES);
    assertEquals(LPW_FREQ_RATIO_JONES, ratio, 2e-3 * LPW_FREQ_RATIO_JONES);
  }

  @Test
  void golandWingFlutterMatchesTheIndependentSolve() {
    // Goland wing, I_alpha about the elastic axis, rho = 1.225, 4 + 4 Ritz modes, Theodorsen on
    // 40 strips: flutter at 136.954 m/s, 70.015 rad/s, derived by an independent k-method solve
    // (docs/validation.md §5.3; published ~137 m/s, ~70.7 rad/s, from memory). Tolerances: 1 % on
    // speed and 2 % on frequency, the size of the error of a four-lag Roger fit over k <= 1.5
    // (about 1 % worst element) that the roots inherit. Measured: 136.81 m/s, 70.19 rad/s.
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.goland(4, 4, 40));
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 60, 240, 37));
    FlutterSolution sol = new StateSpaceMethod(4, 1.5).solve(sys, path, AnalysisOptions.defaults());
    FlutterCrossing ss = firstOnset(sol);
    assertEquals(GolandWingTest.DERIVED_FLUTTER_MPS, ss.condition().speedTasMps(),
        0.01 * GolandWingTest.DERIVED_FLUTTER_MPS);
    assertEquals(GolandWingTest.DERIVED_FLUTTER_RAD_PER_S, 2 * Math.PI * ss.frequencyHz(),
        0.02 * GolandWingTest.DERIVED_FLUTTER_RAD_PER_S);
    // the first torsion-like branch (index 1 of the frequency-ordered modes) flutters, as in p-k
    assertEquals(1, ss.branch(), "the first torsion branch flutters");
    assertEquals(0, sol.diagnostics().unconvergedRoots());
    assertTrue(sol.diagnostics().minMac() > 0.8);
    // the higher modes at 60 m/s have reduced frequencies far above 1.5: the method must say so
    assertTrue(sol.warnings().stream().anyMatch(w -> w.contains("above the fitted range")), sol.warnings().toString());
  }

  /** Eigenvalues of a real matrix by Commons Math (an independent eigen-solver), sorted. */
  private static List<Complex> eigenvalues(DMatrixRMaj a) {
    List<Complex> out = ReferenceEigenvalues.of(a);
    out.sort(Comparator.comparingDouble(Complex::getReal).thenComparingDouble(Complex::getImaginary));
    return out;
  }

  @Test
  void atZeroDensityTheRootsAreTheInVacuoRootsAndTheLagRoots() {
    // Closed form. Typical section in vacuo (Hodges & Pierce, ch. 5, two-degree-of-freedom
    // free vibration): (m I - S^2) w^4 - (m k_alpha + I k_h) w^2 + k_h k_alpha = 0 with
    // S = m x_alpha b, I = m r_alpha^2 b^2, k_h = m w_h^2, k_alpha = I w_alpha^2 (unit span);
    // modal viscous damping zeta on both modes gives s = -zeta w +/- i w sqrt(1 - zeta^2). The lag
    // states decouple at q = 0: r_l' = xi' - (V/b) beta_l r_l gives s = -(V/b) beta_l, n times.
    double zeta = 0.02;
    TypicalSection ts = new TypicalSection(0.6, 40.0, -0.3, 0.2, 0.3, 3.0, 8.0, 2 * Math.PI, 1.0, zeta);
    AeroelasticSystem sys = ValidationCases.system(ts);
    RationalFit fit = RogerApproximation.fit(sys.aero(), 1.5, 3);
    double v = 120.0;
    List<Complex> got = eigenvalues(StateSpaceMethod.stateMatrix(sys, fit, 0.0, v));
    double m = 40.0;
    double b = 0.6;
    double s = m * 0.2 * b;
    double inertia = m * 0.3 * b * b;
    double kh = m * Math.pow(2 * Math.PI * 3.0, 2);
    double ka = inertia * Math.pow(2 * Math.PI * 8.0, 2);
    double qa = m * inertia - s * s;
    double qb = m * ka + inertia * kh;
    double qc = kh * ka;
    double disc = Math.sqrt(qb * qb - 4 * qa * qc);
    List<Complex> expected = new ArrayList<>();
    for (double w2 : new double[] {(qb - disc) / (2 * qa), (qb + disc) / (2 * qa)}) {
      double w = Math.sqrt(w2);
      expected.add(new Complex(-zeta * w, w * Math.sqrt(1 - zeta * zeta)));
      expected.add(new Complex(-zeta * w, -w * Math.sqrt(1 - zeta * zeta)));
    }
    for (int l = 0; l < fit.lagCount(); l++) {
      for (int rep = 0; rep < 2; rep++) {
        expected.add(new Complex(-v / b * fit.lagRoot(l), 0));
      }
    }
    expected.sort(Comparator.comparingDouble(Complex::getReal).thenComparingDouble(Complex::getImaginary));
    assertEquals(expected.size(), got.size());
    double radius = expected.stream().mapToDouble(Complex::abs).max().orElseThrow();
    for (int i = 0; i < expected.size(); i++) {
      // 1e-9 of the spectral radius: the eigen-solver and the modal solution are accurate to
      // rounding (~1e-13); the repeated lag roots are semisimple (diagonal block)
      assertEquals(expected.get(i).getReal(), got.get(i).getReal(), 1e-9 * radius, "root " + i);
      assertEquals(expected.get(i).getImaginary(), got.get(i).getImaginary(), 1e-9 * radius, "root " + i);
    }
  }

  @Test
  void stateSpaceRootsSolveTheLaplaceDomainFlutterEquation() {
    // Consistency of the derivation (signs included): every eigenvalue s of the state matrix that
    // is not a lag pole makes F(s) = M s^2 + C s + K - q Q_fit(s b / V) singular, where Q_fit is the
    // fit continued off the imaginary axis (checked against its generating form in
    // RogerApproximationTest). Measure |det F| / ||F||_F^2 ~ sigma_min / sigma_max for 2 x 2;
    // tolerance 1e-9 (rounding of a 2 x 2 determinant of entries up to ~1e6 and of the eigenvalues).
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    RationalFit fit = RogerApproximation.fit(sys.aero(), 1.5, 4);
    double rho = ValidationCases.RHO_SEA_LEVEL;
    double v = 6.0 * ValidationCases.LPW_OMEGA_ALPHA;
    double q = 0.5 * rho * v * v;
    double b = fit.referenceSemichordM();
    double[][] mm = sys.structure().massKg();
    double[][] cc = sys.structure().dampingNsPerM();
    double[][] kk = sys.structure().stiffnessNPerM();
    ZMatrixRMaj qf = new ZMatrixRMaj(2, 2);
    int checked = 0;
    int onPoles = 0;
    for (Complex s : eigenvalues(StateSpaceMethod.stateMatrix(sys, fit, rho, v))) {
      Complex p = s.multiply(b / v);
      boolean nearPole = false;
      for (int l = 0; l < fit.lagCount(); l++) {
        nearPole |= p.add(fit.lagRoot(l)).abs() < 1e-6 * fit.lagRoot(l);
      }
      if (nearPole) {
        onPoles++;
        continue;
      }
      fit.evaluateLaplace(p.getReal(), p.getImaginary(), qf);
      Complex[][] f = new Complex[2][2];
      double frob = 0;
      for (int i = 0; i < 2; i++) {
        for (int j = 0; j < 2; j++) {
          f[i][j] = s.multiply(s).multiply(mm[i][j]).add(s.multiply(cc[i][j])).add(kk[i][j])
              .subtract(new Complex(qf.getReal(i, j), qf.getImag(i, j)).multiply(q));
          frob += f[i][j].abs() * f[i][j].abs();
        }
      }
      double det = f[0][0].multiply(f[1][1]).subtract(f[0][1].multiply(f[1][0])).abs();
      assertTrue(det / frob < 1e-9, "s = " + s + ": " + det / frob);
      checked++;
    }
    // One eigenvalue per lag root stays exactly on its pole -(V/b) beta_l: one strip's
    // circulatory forces depend on the motion only through the single downwash W (Theodorsen),
    // so every lag matrix A_{l+2} has rank 1 and n - 1 = 1 lag state per root is uncoupled (the
    // redundancy that Karpel's minimum-state form removes; docs/validation.md §6).
    assertEquals(fit.lagCount(), onPoles);
    assertEquals(2 * (2 + fit.lagCount()) - fit.lagCount(), checked);
  }

  @Test
  void divergenceIsARealRootCrossingZero() {
    // formulation.md §4: "p = 0 is an exact root of the flutter determinant at V_D, and the
    // state-space (RFA) model shows a real root crossing zero there". The fit holds A0 = Re Q(0)
    // exactly, so det(sI - A) at s = 0 is proportional to det(K - q A0): the crossing must match
    // the static divergence pressure (DivergenceSolver; itself checked against the closed form
    // q_D = K_alpha / (S a0 e) in DivergenceValidationTest) to rounding and root-finder tolerance.
    TypicalSection ts = new TypicalSection(0.5, 20.0, -0.2, 0.1, 0.3, 2.0, 6.0, 5.8, 2.0, 0.0);
    AeroelasticSystem sys = ValidationCases.system(ts);
    double qd = new DivergenceSolver().solve(sys).dynamicPressurePa();
    RationalFit fit = RogerApproximation.fit(sys.aero(), 1.5, 4);
    double rho = ValidationCases.RHO_SEA_LEVEL;
    java.util.function.DoubleUnaryOperator nearestRealRoot = q -> {
      double best = Double.NaN;
      for (Complex s : eigenvalues(StateSpaceMethod.stateMatrix(sys, fit, rho, Math.sqrt(2 * q / rho)))) {
        if (Math.abs(s.getImaginary()) <= 1e-9 * Math.max(1, s.abs())
            && (Double.isNaN(best) || Math.abs(s.getReal()) < Math.abs(best))) {
          best = s.getReal();
        }
      }
      return best;
    };
    double below = nearestRealRoot.applyAsDouble(qd * (1 - 1e-4));
    double above = nearestRealRoot.applyAsDouble(qd * (1 + 1e-4));
    assertTrue(below < 0 && above > 0, "below " + below + ", above " + above);
    double qCross = new BrentSolver(1e-15, 1e-10 * qd).solve(100, nearestRealRoot::applyAsDouble,
        qd * (1 - 1e-4), qd * (1 + 1e-4));
    // 1e-8 relative: the Brent tolerance is 1e-10 q_D; rounding of the eigenvalue near 0 adds
    // ~1e-15 ||A|| / (d lambda / dq) ~ 1e-12 relative
    assertEquals(qd, qCross, 1e-8 * qd);

    // The method finds the same crossing along a sweep, refined by itself, and says so; the
    // section flutters first (at about 49 m/s): state space and p-k agree within 1 % there
    // (fit error ~0.7 %; measured 49.37 vs 49.26 m/s).
    double vd = Math.sqrt(2 * qd / rho);
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 0.3 * vd, 1.3 * vd, 21));
    FlutterSolution sol = new StateSpaceMethod(fit).solve(sys, path, AnalysisOptions.defaults());
    String expected = String.format(java.util.Locale.ROOT, "q = %.6g Pa", qd);
    assertTrue(sol.warnings().stream().anyMatch(w -> w.contains("static divergence begins") && w.contains(expected)),
        expected + " not in " + sol.warnings());
    FlutterCrossing pk = firstOnset(new PkMethod().solve(sys, path, AnalysisOptions.defaults()));
    assertEquals(pk.condition().speedTasMps(), firstOnset(sol).condition().speedTasMps(),
        0.01 * pk.condition().speedTasMps());
  }

  @Test
  void fitWarningsReachTheSolution() {
    AeroelasticSystem sys = ValidationCases.system(ValidationCases.lpwSection());
    RationalFit strict = RogerApproximation.fit(sys.aero(), RogerApproximation.defaultReducedFrequencies(1.5, 31),
        RogerApproximation.defaultLagRoots(1.5, 2), 1e-4);
    FlutterSolution sol = new StateSpaceMethod(strict).solve(sys, ValidationCases.lpwPath(2.0, 8.0, 13),
        AnalysisOptions.defaults());
    assertTrue(sol.warnings().stream().anyMatch(w -> w.startsWith("rational fit: ")), sol.warnings().toString());
    assertFalse(sol.warnings().stream().anyMatch(w -> w.contains("unstable")), sol.warnings().toString());
  }
}
