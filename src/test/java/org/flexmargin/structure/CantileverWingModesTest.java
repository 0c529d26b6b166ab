package org.flexmargin.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InertiaAxis;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.model.UniformCantileverWing;
import org.junit.jupiter.api.Test;

class CantileverWingModesTest {

  // Goland wing data (Goland, J. Appl. Mech. 12(4) 1945; docs/validation.md section 3.3;
  // numbers from memory): semi-span 6.096 m, chord 1.8288 m, EA 33 %, CG 43 %, 35.71 kg/m,
  // 8.64 kg m, EI 9.77e6 N m^2, GJ 0.987e6 N m^2.
  private static UniformCantileverWing goland(InertiaAxis axis, int nb, int nt, int strips) {
    return new UniformCantileverWing(
        6.096, 1.8288, 0.33, 0.43, 35.71, 8.64, axis, 9.77e6, 0.987e6, 2 * Math.PI, nb, nt, strips,
        0.02);
  }

  private static double[] omegas(CantileverWingModes modes) {
    double[] w = new double[modes.count()];
    for (int i = 0; i < w.length; i++) {
      w[i] = modes.omegaRadPerS(i);
    }
    return w;
  }

  @Test
  void uncoupledWingHasTheClosedFormBeamAndShaftFrequencies() {
    // Centre of mass on the elastic axis: bending and torsion decouple and the Ritz functions are
    // the exact modes, so the frequencies are the closed forms
    //   bending omega_n = (beta_n L)^2 sqrt(EI / (m L^4)), beta_1 L = 1.87510407,
    //   beta_2 L = 4.69409113, beta_3 L = 7.85475744 (Blevins, Formulas for Natural Frequency and
    //   Mode Shape, table 8-1; values from memory),
    //   torsion omega_j = (2j - 1) pi / (2L) sqrt(GJ / I) (closed form, clamped-free shaft).
    // Tolerance 1e-6 relative: the 9-digit beta L values contribute ~1e-8, quadrature ~1e-13.
    double length = 4.0;
    double m = 20.0;
    double inertia = 1.5;
    double ei = 2.0e6;
    double gj = 4.0e5;
    UniformCantileverWing wing =
        new UniformCantileverWing(
            length, 1.2, 0.4, 0.4, m, inertia, InertiaAxis.ELASTIC_AXIS, ei, gj, 6.0, 3, 3, 8, 0.01);
    double[] betaL = {1.87510407, 4.69409113, 7.85475744};
    double[] expected = new double[6];
    for (int n = 0; n < 3; n++) {
      expected[n] = betaL[n] * betaL[n] * Math.sqrt(ei / (m * Math.pow(length, 4)));
      expected[3 + n] = (2 * n + 1) * Math.PI / (2 * length) * Math.sqrt(gj / inertia);
    }
    Arrays.sort(expected);
    double[] actual = omegas(CantileverWingModes.solve(wing));
    for (int i = 0; i < 6; i++) {
      assertEquals(expected[i], actual[i], 1e-6 * expected[i], "mode " + (i + 1));
    }
  }

  @Test
  void golandWingInVacuoFrequenciesInertiaAboutElasticAxis() {
    // derived reproduction, docs/validation.md section 3.3 (4+4 Ritz functions); from memory for the
    // published Goland values: 48.15, 95.70, 243.7 rad/s. Tolerance 0.5 %: the reference values
    // are quoted to 4 significant figures from an independent derivation.
    double[] w = omegas(CantileverWingModes.solve(goland(InertiaAxis.ELASTIC_AXIS, 4, 4, 10)));
    assertEquals(48.15, w[0], 0.005 * 48.15);
    assertEquals(95.70, w[1], 0.005 * 95.70);
    assertEquals(243.7, w[2], 0.005 * 243.7);
  }

  @Test
  void golandWingInVacuoFrequenciesInertiaAboutCentreOfMass() {
    // derived reproduction, docs/validation.md section 5.3: 8.64 kg m about the CG -> 9.834 kg m about
    // the EA; 48.08, 89.08, 233.1 rad/s with 4+4 functions. Tolerance 0.5 % as above.
    UniformCantileverWing wing = goland(InertiaAxis.CENTRE_OF_MASS, 4, 4, 10);
    assertEquals(9.834, wing.pitchInertiaAboutElasticAxisKgM(), 0.001);
    double[] w = omegas(CantileverWingModes.solve(wing));
    assertEquals(48.08, w[0], 0.005 * 48.08);
    assertEquals(89.08, w[1], 0.005 * 89.08);
    assertEquals(233.1, w[2], 0.005 * 233.1);
  }

  @Test
  void firstFrequencyDecreasesAsFunctionsAreAdded() {
    // Rayleigh-Ritz: nested trial spaces give monotonically non-increasing eigenvalues (upper
    // bounds; Rayleigh's principle / Courant-Fischer min-max theorem). 1e-12 relative allows for
    // rounding once the value has converged; the overall drop must be real (coupled Goland case).
    double previous = Double.POSITIVE_INFINITY;
    double first = 0;
    for (int n = 1; n <= 6; n++) {
      double w = CantileverWingModes.solve(goland(InertiaAxis.ELASTIC_AXIS, n, n, 4)).omegaRadPerS(0);
      assertTrue(w <= previous * (1 + 1e-12), "n=" + n + ": " + w + " > " + previous);
      if (n == 1) {
        first = w;
      }
      previous = w;
    }
    assertTrue(previous < first * (1 - 1e-4), "no convergence visible: " + first + " -> " + previous);
    // adding bending functions alone is also a nested space
    double b1 = CantileverWingModes.solve(goland(InertiaAxis.ELASTIC_AXIS, 1, 3, 4)).omegaRadPerS(0);
    double b4 = CantileverWingModes.solve(goland(InertiaAxis.ELASTIC_AXIS, 4, 3, 4)).omegaRadPerS(0);
    assertTrue(b4 <= b1 * (1 + 1e-12));
  }

  @Test
  void modesAreOrthogonalUnderAnIndependentIntegration() {
    // Definition of normal modes: the generalized mass and stiffness matrices, integrated here
    // from the continuous mode shapes with Commons Math's adaptive Gauss-Legendre integrator
    // (independent of the main code's fixed composite rule and of its Ritz matrices),
    //   M_ij = int m w_i w_j - m x_cg (w_i theta_j + theta_i w_j) + I_EA theta_i theta_j dy,
    //   K_ij = int EI w_i'' w_j'' + GJ theta_i' theta_j' dy,
    // are diagonal, M_ii is the reported generalized mass and K_ii = omega_i^2 M_ii.
    // Tolerance 1e-10 relative to sqrt(M_ii M_jj) (resp. K): integrator asked for 1e-12.
    UniformCantileverWing wing = goland(InertiaAxis.ELASTIC_AXIS, 4, 4, 10);
    CantileverWingModes modes = CantileverWingModes.solve(wing);
    double m = wing.massPerLengthKgPerM();
    double xcg = (0.43 - 0.33) * 1.8288;
    double iea = 8.64;
    int n = modes.count();
    double[][] mass = new double[n][n];
    double[][] stiff = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = i; j < n; j++) {
        final int a = i;
        final int b = j;
        UnivariateFunction fm =
            y -> {
              double wi = modes.displacementM(a, y);
              double wj = modes.displacementM(b, y);
              double ti = modes.rotationRad(a, y);
              double tj = modes.rotationRad(b, y);
              return m * wi * wj - m * xcg * (wi * tj + ti * wj) + iea * ti * tj;
            };
        UnivariateFunction fk =
            y ->
                wing.bendingStiffnessNm2() * modes.curvaturePerM(a, y) * modes.curvaturePerM(b, y)
                    + wing.torsionStiffnessNm2()
                        * modes.twistRatePerM(a, y)
                        * modes.twistRatePerM(b, y);
        // absolute accuracy 1e-12 of the entry's natural scale sqrt(M_ii M_jj), sqrt(K_ii K_jj)
        double massScale = Math.sqrt(modes.generalizedMassKg(i) * modes.generalizedMassKg(j));
        double stiffScale = massScale * modes.omegaRadPerS(i) * modes.omegaRadPerS(j);
        mass[i][j] = integrate(fm, massScale);
        stiff[i][j] = integrate(fk, stiffScale);
      }
    }
    for (int i = 0; i < n; i++) {
      double wi = modes.omegaRadPerS(i);
      assertEquals(modes.generalizedMassKg(i), mass[i][i], 1e-10 * mass[i][i], "M_ii " + i);
      assertEquals(wi * wi * mass[i][i], stiff[i][i], 1e-10 * stiff[i][i], "K_ii " + i);
      for (int j = i + 1; j < n; j++) {
        assertEquals(0.0, mass[i][j], 1e-10 * Math.sqrt(mass[i][i] * mass[j][j]), "M_" + i + j);
        assertEquals(0.0, stiff[i][j], 1e-10 * Math.sqrt(stiff[i][i] * stiff[j][j]), "K_" + i + j);
      }
    }
  }

  private static double integrate(UnivariateFunction f, double scale) {
    IterativeLegendreGaussIntegrator integrator =
        new IterativeLegendreGaussIntegrator(10, 1e-12, 1e-12 * scale);
    return integrator.integrate(10_000_000, f, 0.0, 6.096);
  }

  @Test
  void oneByOneRitzModelMatchesTheClosedForm2x2Problem() {
    // With one bending and one torsion function the problem is 2x2:
    //   M = [m L, -m x_cg J; -m x_cg J, I L/2], K = diag(EI beta_1^4 L, GJ g^2 L/2),
    // g = pi/(2L), using the closed-form integrals int phi_1^2 = L, int phi_1''^2 = beta_1^4 L
    // (Blevins table 8-1 normalisation), int sin^2 = L/2, int (g cos)^2 = g^2 L/2, and
    // J = int phi_1 psi_1 from Commons Math's integrator. The sign of the coupling follows from
    // the kinematics w - x theta (a point x aft of the EA moves down when the nose goes up).
    // det(K - lambda M) = 0:
    //   lambda^2 (M11 M22 - M12^2) - lambda (M11 K22 + M22 K11) + K11 K22 = 0  (closed form).
    // Tolerance 1e-9 relative: the integrals are accurate to ~1e-12.
    UniformCantileverWing wing = goland(InertiaAxis.ELASTIC_AXIS, 1, 1, 3);
    double length = wing.semiSpanM();
    // Brent root, checked against Blevins table 8-1 in ClampedFreeBeamFunctionsTest
    double beta = ClampedFreeBeamFunctions.rootBetaL(1) / length;
    ClampedFreeBeamFunctions f = new ClampedFreeBeamFunctions(length, 1);
    double g = Math.PI / (2 * length);
    double j =
        new IterativeLegendreGaussIntegrator(10, 1e-14, 1e-14)
            .integrate(1_000_000, y -> f.value(0, y) * Math.sin(g * y), 0, length);
    double m = wing.massPerLengthKgPerM();
    double xcg = 0.1 * wing.chordM();
    double m11 = m * length;
    double m12 = -m * xcg * j;
    double m22 = 8.64 * length / 2;
    double k11 = wing.bendingStiffnessNm2() * Math.pow(beta, 4) * length;
    double k22 = wing.torsionStiffnessNm2() * g * g * length / 2;
    double qa = m11 * m22 - m12 * m12;
    double qb = -(m11 * k22 + m22 * k11);
    double qc = k11 * k22;
    double disc = Math.sqrt(qb * qb - 4 * qa * qc);
    double lambda1 = (-qb - disc) / (2 * qa);
    double lambda2 = (-qb + disc) / (2 * qa);
    CantileverWingModes modes = CantileverWingModes.solve(wing);
    assertEquals(Math.sqrt(lambda1), modes.omegaRadPerS(0), 1e-9 * Math.sqrt(lambda1));
    assertEquals(Math.sqrt(lambda2), modes.omegaRadPerS(1), 1e-9 * Math.sqrt(lambda2));
    // shape: row 1 of (K - lambda M) v = 0 gives p/q = (k11 - lambda m11) / (lambda m12)
    for (int mode = 0; mode < 2; mode++) {
      double lambda = mode == 0 ? lambda1 : lambda2;
      double[] v = modes.ritzVector(mode);
      double ratio = (k11 - lambda * m11) / (lambda * m12);
      assertEquals(ratio, v[1] / v[0], 1e-8 * Math.abs(ratio), "twist/bend ratio mode " + mode);
    }
  }

  @Test
  void modeTableAndStripsFollowTheConventions() {
    UniformCantileverWing wing = goland(InertiaAxis.ELASTIC_AXIS, 3, 3, 12);
    CantileverWingModes modes = CantileverWingModes.solve(wing);
    ModeTable table = modes.modeTable();
    assertEquals(6, table.size());
    assertEquals("uniform_cantilever_wing", table.name());
    double previous = 0;
    for (int i = 0; i < 6; i++) {
      ElasticMode mode = table.modes().get(i);
      assertEquals("mode_" + (i + 1), mode.name());
      assertEquals(modes.omegaRadPerS(i) / (2 * Math.PI), mode.frequencyHz(), 1e-12 * mode.frequencyHz());
      assertTrue(mode.frequencyHz() > previous);
      previous = mode.frequencyHz();
      assertEquals(0.02, mode.dampingRatio());
      assertEquals(modes.generalizedMassKg(i), mode.generalizedMassKg());
      assertEquals(12, mode.shapes().size());
      for (int s = 0; s < 12; s++) {
        String station = String.format("strip_%02d", s + 1);
        double y = (s + 0.5) * 6.096 / 12;
        ShapeValue v = mode.shapes().get(station);
        assertEquals(modes.displacementM(i, y), v.displacementM(), 0.0);
        assertEquals(modes.rotationRad(i, y), v.rotationRad(), 0.0);
        // amplitude normalisation: nothing exceeds 1 m (midpoints lie inside the sampled span)
        assertTrue(Math.abs(v.displacementM()) <= 1 + 1e-9);
        assertTrue(Math.abs(v.rotationRad()) * 0.9144 <= 1 + 1e-9);
      }
      // documented normalisation: over 201 equally spaced stations root to tip the largest of
      // |w| and b |theta| is exactly 1 m, and that extreme value is positive
      double largest = 0;
      for (int k = 0; k <= 200; k++) {
        double y = 6.096 * k / 200;
        for (double a : new double[] {modes.displacementM(i, y), 0.9144 * modes.rotationRad(i, y)}) {
          if (Math.abs(a) > Math.abs(largest)) {
            largest = a;
          }
        }
      }
      assertEquals(1.0, largest, 1e-12, "normalised amplitude mode " + (i + 1));
    }
    // first mode is bending-dominated: tip deflection +1 m
    assertEquals(1.0, modes.displacementM(0, 6.096), 1e-12);

    StripTheorySpec aero = modes.stripTheory();
    assertEquals(0.9144, aero.referenceSemichordM(), 1e-15);
    assertEquals(12, aero.strips().size());
    Strip first = aero.strips().get(0);
    assertEquals("strip_01", first.station());
    assertEquals(6.096 / 12, first.widthM(), 1e-15);
    assertEquals(0.9144, first.semichordM(), 1e-15);
    assertEquals(2 * 0.33 - 1, first.elasticAxisA(), 1e-15); // -0.34 semichords
    assertEquals(2 * Math.PI, first.liftSlopePerRad());
    assertEquals("strip_12", aero.strips().get(11).station());
  }

  @Test
  void stationNamesPadToTheStripCount() {
    CantileverWingModes few = CantileverWingModes.solve(goland(InertiaAxis.ELASTIC_AXIS, 1, 1, 5));
    assertEquals("strip_01", few.stationName(0));
    CantileverWingModes many = CantileverWingModes.solve(goland(InertiaAxis.ELASTIC_AXIS, 1, 1, 120));
    assertEquals("strip_001", many.stationName(0));
    assertEquals("strip_120", many.stationName(119));
  }

  @Test
  void elasticAxisAtTheLeadingEdgeIsRejectedForStrips() {
    UniformCantileverWing wing =
        new UniformCantileverWing(
            6.0, 1.8, 0.0, 0.1, 35.0, 8.0, InertiaAxis.ELASTIC_AXIS, 1e7, 1e6, 6.0, 2, 2, 4, 0.0);
    InvalidInputException e =
        assertThrows(InvalidInputException.class, () -> BuiltInStructures.build(wing));
    assertEquals("elastic_axis_chord_fraction", e.fieldPath());
  }
}
