package org.flexmargin.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SplinePoint;
import org.junit.jupiter.api.Test;

/** The Ritz plate against closed forms (docs/validation.md, section 21). */
class TrapezoidalPlateRitzTest {
  // an aluminium-like plate; the values only set the scale of the closed forms
  static final double E = 70e9, RHO = 2700, T = 0.002;
  // roots of cos x cosh x + 1 = 0 (Blevins, Formulas for Natural Frequency and Mode Shape, 1979,
  // Table 8-1; docs/validation.md 3.1)
  static final double BETA1 = 1.87510407, BETA2 = 4.69409113, BETA3 = 7.85475744;

  static TrapezoidalPlateRitz rectangle(double span, double chord, OrthotropicLamina material, int nx, int ny) {
    return new TrapezoidalPlateRitz(new PlatePlanform(0, chord, 0, chord, span), material,
        new PlateThickness.Uniform(T), nx, ny);
  }

  /** Euler-Bernoulli cantilever: f = beta^2 / (2 pi L^2) sqrt(E t^2 / (12 rho)) (EI = E c t^3 / 12, m = rho t c). */
  static double beamHz(double beta, double span, double modulus) {
    return beta * beta / (2 * Math.PI * span * span) * Math.sqrt(modulus * T * T / (12 * RHO));
  }

  @Test
  void zeroPoissonPlateBendsExactlyAsTheCantileverBeam() {
    // with nu = 0 the beam mode w(y) satisfies the plate equation and every free-edge condition
    // (M_x = -D (w_xx + nu w_yy) = 0, V_x = -D (w_xxx + (2 - nu) w_xyy) = 0, w_xy = 0), so the
    // first three bending modes of the plate are the beam's at any aspect ratio (derived). Ritz
    // truncation with 12 spanwise terms and rounding of the Cholesky reduction: measured 1.4e-9;
    // tolerance 1e-7 relative
    TrapezoidalPlateRitz r = rectangle(1.0, 0.1, OrthotropicLamina.isotropic(E, 0, RHO), 3, 12);
    double[] f = r.frequenciesHz();
    assertEquals(beamHz(BETA1, 1.0, E), f[0], 1e-7 * f[0]);
    assertEquals(beamHz(BETA2, 1.0, E), f[1], 1e-7 * f[1]);
    assertEquals(beamHz(BETA3, 1.0, E), f[2], 1e-7 * f[2]);
  }

  @Test
  void orthotropicAxisAlongTheSpanOrTheChordSetsTheBendingModulus() {
    // nu12 = 0 keeps the beam mode exact (D12 = 0); axis 1 along y bends with E1, turned a
    // quarter turn with E2 (derived)
    double e1 = 12e9, e2 = 1.5e9, g12 = 0.8e9;
    TrapezoidalPlateRitz along = rectangle(1.0, 0.1, new OrthotropicLamina(e1, e2, g12, 0, 500, 0), 2, 12);
    TrapezoidalPlateRitz across =
        rectangle(1.0, 0.1, new OrthotropicLamina(e1, e2, g12, 0, 500, Math.PI / 2), 2, 12);
    double scale = Math.sqrt(RHO / 500);
    assertEquals(beamHz(BETA1, 1.0, e1) * scale, along.frequenciesHz()[0], 1e-7 * along.frequenciesHz()[0]);
    assertEquals(beamHz(BETA1, 1.0, e2) * scale, across.frequenciesHz()[0], 1e-7 * across.frequenciesHz()[0]);
  }

  /**
   * First torsion frequency (Hz) of a cantilever with warping restrained at the root and free at
   * the tip (Vlasov): EG theta'''' - GJ theta'' = Ip omega^2 theta, theta = A cosh py + B sinh py +
   * C cos qy + D sin qy with p^2, -q^2 the roots of EG r^2 - GJ r - Ip omega^2 = 0; root
   * theta = theta' = 0, tip theta'' = 0 and GJ theta' - EG theta''' = 0. With C = -A and
   * D = -p B / q the tip conditions are a 2 x 2 system whose determinant vanishes at omega.
   */
  static double vlasovHz(double span, double gj, double eg, double ip) {
    java.util.function.DoubleUnaryOperator det = w -> {
      double root = Math.sqrt(gj * gj + 4 * eg * ip * w * w);
      double p = Math.sqrt((gj + root) / (2 * eg)), q = Math.sqrt((root - gj) / (2 * eg));
      double ch = Math.cosh(p * span), sh = Math.sinh(p * span);
      double co = Math.cos(q * span), si = Math.sin(q * span);
      double a11 = p * p * ch + q * q * co, a12 = p * p * sh + p * q * si;
      double a21 = gj * (p * sh + q * si) - eg * (p * p * p * sh - q * q * q * si);
      double a22 = gj * p * (ch - co) - eg * (p * p * p * ch + p * q * q * co);
      return (a11 * a22 - a12 * a21) / (ch * ch);
    };
    double stVenant = Math.PI / (2 * span) * Math.sqrt(gj / ip);
    double lo = stVenant, step = 0.01 * stVenant;
    while (Math.signum(det.applyAsDouble(lo)) == Math.signum(det.applyAsDouble(lo + step))) {
      lo += step;
    }
    double w = new BrentSolver(1e-12, 1e-12).solve(200, det::applyAsDouble, lo, lo + step);
    return w / (2 * Math.PI);
  }

  /** Lowest mode whose leading and trailing edges move in opposite directions at the tip. */
  static int firstTorsion(TrapezoidalPlateRitz r) {
    PlatePlanform p = r.planform();
    for (int m = 0; ; m++) {
      double le = r.deflection(m, p.xM(0, 1), p.semispanM())[0];
      double te = r.deflection(m, p.xM(1, 1), p.semispanM())[0];
      if (le * te < 0) {
        return m;
      }
    }
  }

  @Test
  void rigidChordTorsionIsTheWarpingRestrainedShaft() {
    // two chordwise terms: w = g(y) + (2 x / c - 1) h(y), a rigid chord twisting about mid-chord.
    // For w = x' theta (x' from mid-chord, nu = 0) the plate energy is 1/2 int (D c^3/12 theta''^2
    // + 4 D66 c theta'^2) dy, D = E t^3 / 12, D66 = G t^3 / 12, kinetic 1/2 int rho t c^3/12
    // theta'^2: Vlasov's shaft with EG = E t^3 c^3 / 144, GJ = G c t^3 / 3 (the St-Venant value of
    // a thin rectangle) and Ip = rho t c^3 / 12 (derived). L / c = 4: the root boundary layer
    // (width L / (L sqrt(GJ / EG)) ~ 5 % of the span) is resolved by 14 spanwise terms; tolerance
    // 1e-5 (Ritz truncation, measured 3e-8 at 14 terms, 6e-8 at 12 terms)
    double span = 1.0, chord = 0.25, g = E / 2;
    TrapezoidalPlateRitz r = rectangle(span, chord, OrthotropicLamina.isotropic(E, 0, RHO), 2, 14);
    double expected = vlasovHz(span, g * chord * T * T * T / 3, E * T * T * T * chord * chord * chord / 144,
        RHO * T * chord * chord * chord / 12);
    int m = firstTorsion(r);
    assertEquals(expected, r.frequenciesHz()[m], 1e-5 * expected);
    // more chordwise terms can only lower it (nested bases), and the St-Venant shaft without warping
    // restraint, pi / (2 L) sqrt(GJ / Ip), lies below both (the restraint stiffens)
    TrapezoidalPlateRitz full = rectangle(span, chord, OrthotropicLamina.isotropic(E, 0, RHO), 5, 14);
    double plate = full.frequenciesHz()[firstTorsion(full)];
    double stVenant = Math.PI / (2 * span) * Math.sqrt(g * chord * T * T * T / 3 / (RHO * T * chord * chord * chord / 12))
        / (2 * Math.PI);
    assertTrue(plate <= expected * (1 + 1e-9) && plate > stVenant, plate + " " + expected + " " + stVenant);
  }

  @Test
  void stiffnessOfAnIsotropicMaterialDoesNotDependOnTheAxis() {
    // Kirchhoff plate: energy D/2 (w_xx^2 + w_yy^2 + 2 nu w_xx w_yy + 2 (1 - nu) w_xy^2),
    // D = E t^3 / (12 (1 - nu^2)) (Timoshenko and Woinowsky-Krieger, Theory of Plates and Shells,
    // ch. 10); in our (w_xx, w_yy, w_xy) form the w_xy diagonal is 2 (1 - nu) D (derived).
    // Rounding 1e-12 relative
    double nu = 0.3, d = E * T * T * T / (12 * (1 - nu * nu));
    double[][] expected = {{d, nu * d, 0}, {nu * d, d, 0}, {0, 0, 2 * (1 - nu) * d}};
    for (double angle : new double[] {0, 0.3, 1.1, -2.0}) {
      OrthotropicLamina iso = new OrthotropicLamina(E, E, E / (2 * (1 + nu)), nu, RHO, angle);
      double[][] actual = iso.bendingStiffness(T);
      for (int i = 0; i < 3; i++) {
        for (int j = 0; j < 3; j++) {
          assertEquals(expected[i][j], actual[i][j], 1e-12 * d, "angle " + angle + " entry " + i + j);
        }
      }
    }
  }

  @Test
  void turnedOrthotropicStiffnessFollowsTheLaminaTransformation() {
    // transformed reduced stiffness Qbar of a lamina at angle theta from the x axis, m = cos, n = sin
    // (R. M. Jones, Mechanics of Composite Materials, eq. 2.85, from memory):
    // Qbar11 = Q11 m^4 + 2 (Q12 + 2 Q66) m^2 n^2 + Q22 n^4, Qbar22 = Q11 n^4 + 2 (...) m^2 n^2 + Q22 m^4,
    // Qbar12 = (Q11 + Q22 - 4 Q66) m^2 n^2 + Q12 (m^4 + n^4),
    // Qbar66 = (Q11 + Q22 - 2 Q12 - 2 Q66) m^2 n^2 + Q66 (m^4 + n^4),
    // Qbar16 = (Q11 - Q12 - 2 Q66) m^3 n + (Q12 - Q22 + 2 Q66) m n^3,
    // Qbar26 = (Q11 - Q12 - 2 Q66) m n^3 + (Q12 - Q22 + 2 Q66) m^3 n.
    // Our axis angle a is measured from y towards x, so theta = pi/2 - a; our third curvature is
    // w_xy (not 2 w_xy), so D13 = 2 Qbar16 t^3/12, D23 = 2 Qbar26 t^3/12, D33 = 4 Qbar66 t^3/12.
    double e1 = 3.1511e9, e2 = 0.4162e9, g12 = 0.4392e9, nu12 = 0.31;
    double nu21 = nu12 * e2 / e1, den = 1 - nu12 * nu21;
    double q11 = e1 / den, q22 = e2 / den, q12 = nu12 * e2 / den, q66 = g12;
    double s = T * T * T / 12;
    for (double a : new double[] {0.2, Math.toRadians(43.16), 1.4}) {
      double th = Math.PI / 2 - a, m = Math.cos(th), n = Math.sin(th);
      double m2 = m * m, n2 = n * n;
      double b11 = q11 * m2 * m2 + 2 * (q12 + 2 * q66) * m2 * n2 + q22 * n2 * n2;
      double b22 = q11 * n2 * n2 + 2 * (q12 + 2 * q66) * m2 * n2 + q22 * m2 * m2;
      double b12 = (q11 + q22 - 4 * q66) * m2 * n2 + q12 * (m2 * m2 + n2 * n2);
      double b66 = (q11 + q22 - 2 * q12 - 2 * q66) * m2 * n2 + q66 * (m2 * m2 + n2 * n2);
      double b16 = (q11 - q12 - 2 * q66) * m2 * m * n + (q12 - q22 + 2 * q66) * m * n2 * n;
      double b26 = (q11 - q12 - 2 * q66) * m * n2 * n + (q12 - q22 + 2 * q66) * m2 * m * n;
      double[][] expected = {{b11, b12, 2 * b16}, {b12, b22, 2 * b26}, {2 * b16, 2 * b26, 4 * b66}};
      double[][] actual = new OrthotropicLamina(e1, e2, g12, nu12, 380, a).bendingStiffness(T);
      for (int i = 0; i < 3; i++) {
        for (int j = 0; j < 3; j++) {
          assertEquals(s * expected[i][j], actual[i][j], 1e-12 * s * q11, "angle " + a + " entry " + i + j);
        }
      }
    }
  }

  @Test
  void curvaturesOfTheMappedBasisMatchFiniteDifferencesInPhysicalAxes() {
    // swept, tapered planform; each basis function as a function of (x, y) through the inverse
    // map, differentiated by central differences of step h = 2e-4 m: truncation h^2 / 12 times a
    // fourth derivative (measured to fall fourfold per halving of h, at most 1e-6 of the
    // curvature at this step), rounding eps |w| / h^2 ~ 1e-8; tolerance 1e-5 of the largest
    // curvature of each function
    PlatePlanform p = new PlatePlanform(0.1, 0.6, 0.9, 0.3, 1.2);
    TrapezoidalPlateRitz r = new TrapezoidalPlateRitz(p, OrthotropicLamina.isotropic(E, 0.3, RHO),
        new PlateThickness.Uniform(T), 4, 4);
    int n = 16;
    double h = 2e-4;
    for (double[] pt : new double[][] {{0.3, 0.4}, {0.8, 0.9}, {0.5, 0.15}}) {
      double x = p.xM(pt[0], pt[1]), y = p.yM(pt[1]);
      double[] v = new double[n], slope = new double[n];
      double[][] curv = new double[n][3];
      r.basis(pt[0], pt[1], v, curv, slope);
      for (int f = 0; f < n; f++) {
        int ff = f;
        java.util.function.DoubleBinaryOperator w = (xx, yy) -> physical(r, p, xx, yy, ff);
        double wxx = (w.applyAsDouble(x + h, y) - 2 * w.applyAsDouble(x, y) + w.applyAsDouble(x - h, y)) / (h * h);
        double wyy = (w.applyAsDouble(x, y + h) - 2 * w.applyAsDouble(x, y) + w.applyAsDouble(x, y - h)) / (h * h);
        double wxy = (w.applyAsDouble(x + h, y + h) - w.applyAsDouble(x + h, y - h)
            - w.applyAsDouble(x - h, y + h) + w.applyAsDouble(x - h, y - h)) / (4 * h * h);
        double wx = (w.applyAsDouble(x + h, y) - w.applyAsDouble(x - h, y)) / (2 * h);
        double scale = Math.max(1, Math.max(Math.abs(curv[f][0]), Math.max(Math.abs(curv[f][1]), Math.abs(curv[f][2]))));
        assertEquals(wxx, curv[f][0], 1e-5 * scale, "w_xx of " + f);
        assertEquals(wyy, curv[f][1], 1e-5 * scale, "w_yy of " + f);
        assertEquals(wxy, curv[f][2], 1e-5 * scale, "w_xy of " + f);
        assertEquals(wx, slope[f], 1e-5 * scale, "w_x of " + f);
        assertEquals(physical(r, p, x, y, f), v[f], 1e-14 * scale, "w of " + f);
      }
    }
  }

  private static double physical(TrapezoidalPlateRitz r, PlatePlanform p, double x, double y, int f) {
    double eta = y / p.semispanM();
    double xi = (x - p.leadingEdgeXM(eta)) / p.chordM(eta);
    double[] v = new double[16];
    r.basis(xi, eta, v, null, null);
    return v[f];
  }

  @Test
  void massIsTheIntegralOfTheSectionArea() {
    // four-digit law: section area 10 tau c^2 (0.2969 (2/3) - 0.1260/2 - 0.3516/3 + 0.2843/4
    // - 0.1015/5) = 0.685083 tau c^2, and int c^2 dy = s (cr^2 + cr ct + ct^2) / 3 for a linear
    // chord (derived). The u = sqrt(xi) quadrature is exact for it: rounding, 1e-12
    PlatePlanform p = new PlatePlanform(0, 0.5578, 0.8094, 0.3682, 0.762);
    OrthotropicLamina wood = new OrthotropicLamina(3.1511e9, 0.4162e9, 0.4392e9, 0.31, 381.98, 0.75);
    TrapezoidalPlateRitz r = new TrapezoidalPlateRitz(p, wood, new PlateThickness.FourDigitSection(0.04), 2, 2);
    double bracket = 10 * (0.2969 * 2 / 3 - 0.1260 / 2 - 0.3516 / 3 + 0.2843 / 4 - 0.1015 / 5);
    double c2 = 0.762 * (0.5578 * 0.5578 + 0.5578 * 0.3682 + 0.3682 * 0.3682) / 3;
    assertEquals(381.98 * 0.04 * bracket * c2, r.massKg(), 1e-12 * r.massKg());
    TrapezoidalPlateRitz flat = new TrapezoidalPlateRitz(p, wood, new PlateThickness.Uniform(0.003), 2, 2);
    assertEquals(381.98 * 0.003 * p.areaM2(), flat.massKg(), 1e-12 * flat.massKg());
    // the law itself: t/c = tau near 30 % chord, 0.0021 tau/0.1 at the trailing edge
    assertEquals(0.1, new PlateThickness.FourDigitSection(0.1).thicknessM(0.3, 1), 1e-3);
    assertEquals(0.00105, new PlateThickness.FourDigitSection(0.1).thicknessM(1, 1) / 2, 1e-5);
  }

  static TrapezoidalPlateRitz agard(int nx, int ny) {
    return AgardWeakenedWing.plate(nx, ny);
  }

  @Test
  void frequenciesFallAsTermsAreAddedAndSettle() {
    // nested bases: Rayleigh-Ritz frequencies never rise as terms are added (upper bounds); the
    // quadrature is not exact for a tapered planform, so allow 1e-9 relative
    int[][] orders = {{3, 4}, {4, 6}, {5, 7}, {6, 8}, {7, 10}};
    double[] previous = null;
    double[] last = null;
    for (int[] o : orders) {
      double[] f = agard(o[0], o[1]).frequenciesHz();
      if (previous != null) {
        for (int m = 0; m < 5; m++) {
          assertTrue(f[m] <= previous[m] * (1 + 1e-9), "mode " + m + " at " + o[0] + "x" + o[1]);
        }
      }
      previous = last = f;
    }
    // 6 x 8 (the flutter model) within 0.1 % of 7 x 10 for the five lowest (measured 0.05 %)
    double[] used = agard(6, 8).frequenciesHz();
    for (int m = 0; m < 5; m++) {
      assertEquals(last[m], used[m], 1e-3 * last[m], "mode " + m);
    }
  }

  @Test
  void agardWingFrequenciesAgainstTheMeasuredFive() {
    // measured in vacuo, weakened model: 9.5992, 38.1650, 48.3482, 91.5448, 118.1132 Hz (Yates,
    // AGARD Report 765, 1987; from memory). The Ritz plate with the laminate constants of later
    // finite-element studies (from memory) gives -2.6, +0.2, -0.2, -0.7, -1.3 %. Band 5 %: a
    // Kirchhoff plate with an assumed thickness law (four-digit instead of the 65A004 ordinates)
    // and wood constants is commonly a few per cent off (common practice)
    double[] measured = AgardWeakenedWing.MEASURED_HZ;
    double[] f = agard(6, 8).frequenciesHz();
    for (int m = 0; m < 5; m++) {
      assertEquals(measured[m], f[m], 0.05 * measured[m], "mode " + (m + 1));
    }
    // mode 1 is bending (leading and trailing edges up together at the tip), mode 2 torsion
    TrapezoidalPlateRitz r = agard(6, 8);
    assertTrue(firstTorsion(r) == 1, "first torsion is mode 2");
  }

  @Test
  void modesAreMassNormalisedAndOrthogonalUnderAnIndependentQuadrature() {
    // int rho t w_i w_j dA = delta_ij by a midpoint rule on (u = sqrt(xi), eta), 300 x 150 cells,
    // independent of the Gauss rule of the assembly: its O(h^2) error, measured 5e-5 on this grid
    // (the largest entry), sets the tolerance 1e-4
    TrapezoidalPlateRitz r = agard(4, 5);
    PlatePlanform p = r.planform();
    PlateThickness th = new PlateThickness.FourDigitSection(0.04);
    int nu = 300, ne = 150;
    double[][] gram = new double[3][3];
    for (int a = 0; a < ne; a++) {
      double eta = (a + 0.5) / ne;
      double c = p.chordM(eta);
      for (int b = 0; b < nu; b++) {
        double u = (b + 0.5) / nu, xi = u * u;
        double wgt = 381.98 * th.thicknessM(xi, c) * c * p.semispanM() * 2 * u / (nu * ne);
        double[] w = new double[3];
        for (int m = 0; m < 3; m++) {
          w[m] = r.deflection(m, p.xM(xi, eta), p.yM(eta))[0];
        }
        for (int i = 0; i < 3; i++) {
          for (int j = 0; j < 3; j++) {
            gram[i][j] += wgt * w[i] * w[j];
          }
        }
      }
    }
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        assertEquals(i == j ? 1 : 0, gram[i][j], 1e-4, "entry " + i + j);
      }
    }
  }

  @Test
  void modeTableIsScaledToUnitLargestDisplacementWithPitchMinusTheSlope() {
    TrapezoidalPlateRitz r = agard(4, 5);
    List<SplinePoint> pts = r.gridPoints(4, 5, "g");
    assertEquals(20, pts.size());
    assertEquals(0.8094 + 0.3682, pts.get(19).xM(), 1e-4, "trailing edge of the tip");
    assertEquals(0.762, pts.get(19).yM(), 1e-12);
    ModeTable table = r.modeTable("agard", 3, pts, 0.01);
    assertEquals(3, table.size());
    for (int m = 0; m < 3; m++) {
      ElasticMode mode = table.modes().get(m);
      assertEquals(r.frequenciesHz()[m], mode.frequencyHz(), 0);
      assertEquals(0.01, mode.dampingRatio(), 0);
      double largest = 0, signedLargest = 0;
      for (SplinePoint sp : pts) {
        double w = r.deflection(m, sp.xM(), sp.yM())[0];
        if (Math.abs(w) > largest) {
          largest = Math.abs(w);
          signedLargest = w;
        }
      }
      // a mass-normalised mode scaled by 1 / w_max has generalized mass 1 / w_max^2
      assertEquals(1 / (largest * largest), mode.generalizedMassKg(), 1e-12 / (largest * largest));
      double top = 0;
      for (SplinePoint sp : pts) {
        ShapeValue v = mode.shapes().get(sp.station());
        top = Math.max(top, v.displacementM());
        assertTrue(Math.abs(v.displacementM()) <= 1 + 1e-12);
        // pitch nose up = -dw/dx, by a central difference (step 1e-6 m, truncation ~1e-12)
        double h = 1e-6;
        double dw = (r.deflection(m, sp.xM() + h, sp.yM())[0] - r.deflection(m, sp.xM() - h, sp.yM())[0]) / (2 * h);
        assertEquals(-dw / signedLargest, v.rotationRad(), 1e-6 * (1 + Math.abs(v.rotationRad())));
      }
      assertEquals(1, top, 1e-12, "largest displacement is +1 m");
    }
    // the root row does not move (clamped)
    assertEquals(0, table.modes().get(0).shapes().get("g2_0").displacementM(), 1e-15);
  }

  @Test
  void quarterChordFactoryAndIsotropicFactoryFollowTheirDefinitions() {
    PlatePlanform p = PlatePlanform.fromQuarterChordSweep(1.0, 0.4, 2.0, Math.toRadians(30));
    assertEquals(Math.toRadians(30), p.sweepRad(0.25), 1e-14);
    assertEquals(0, p.rootLeadingEdgeXM(), 0);
    assertEquals(1.4, p.areaM2(), 1e-15); // 2.0 (1.0 + 0.4) / 2
    // G = E / (2 (1 + nu))
    assertEquals(new OrthotropicLamina(E, E, E / 2.6, 0.3, RHO, 0), OrthotropicLamina.isotropic(E, 0.3, RHO));
  }

  @Test
  void inputsOutsideTheirDomainAreRefused() {
    assertThrows(IllegalArgumentException.class, () -> new PlatePlanform(0, 0, 0, 1, 1));
    assertThrows(IllegalArgumentException.class, () -> new PlatePlanform(0, 1, 0, -1, 1));
    assertThrows(IllegalArgumentException.class, () -> new PlatePlanform(0, 1, 0, 1, 0));
    assertThrows(IllegalArgumentException.class, () -> new PlatePlanform(0, 1, 0, 1, Double.POSITIVE_INFINITY));
    assertThrows(IllegalArgumentException.class, () -> new PlatePlanform(Double.NaN, 1, 0, 1, 1));
    assertThrows(IllegalArgumentException.class, () -> new PlatePlanform(0, 1, Double.POSITIVE_INFINITY, 1, 1));
    assertEquals("lamina E1 (Pa) must be positive and finite; got 0.0",
        assertThrows(IllegalArgumentException.class, () -> new OrthotropicLamina(0, 1, 1, 0.3, 1, 0)).getMessage());
    assertThrows(IllegalArgumentException.class, () -> new OrthotropicLamina(1, 0, 1, 0.3, 1, 0));
    assertThrows(IllegalArgumentException.class, () -> new OrthotropicLamina(1, 1, 0, 0.3, 1, 0));
    assertThrows(IllegalArgumentException.class, () -> new OrthotropicLamina(1, 1, 1, 0.3, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new OrthotropicLamina(1, 1, 1, 1.0, 1, 0));
    assertThrows(IllegalArgumentException.class, () -> new OrthotropicLamina(1, 1, 1, 0.3, 1, Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> new OrthotropicLamina(1, 1, 1, Double.NaN, 1, 0));
    // nu12^2 E2 / E1 = 4.41 x 2 / 8 = 1.1025: no positive-definite stiffness; 1.9 gives 0.9025
    assertThrows(IllegalArgumentException.class, () -> new OrthotropicLamina(8e9, 2e9, 1e9, 2.1, 1, 0));
    assertEquals(1.9, new OrthotropicLamina(8e9, 2e9, 1e9, 1.9, 1, 0).nu12());
    assertThrows(IllegalArgumentException.class, () -> new PlateThickness.Uniform(0));
    assertThrows(IllegalArgumentException.class, () -> new PlateThickness.Uniform(Double.POSITIVE_INFINITY));
    assertThrows(IllegalArgumentException.class, () -> new PlateThickness.FourDigitSection(0));
    assertThrows(IllegalArgumentException.class, () -> new PlateThickness.FourDigitSection(0.31));
    assertEquals(0.3, new PlateThickness.FourDigitSection(0.3).thicknessRatio());
    PlatePlanform p = new PlatePlanform(0, 1, 0, 1, 2);
    OrthotropicLamina iso = OrthotropicLamina.isotropic(E, 0.3, RHO);
    PlateThickness t = new PlateThickness.Uniform(T);
    assertThrows(IllegalArgumentException.class, () -> new TrapezoidalPlateRitz(p, iso, t, 0, 3));
    assertThrows(IllegalArgumentException.class, () -> new TrapezoidalPlateRitz(p, iso, t, 3, 0));
    assertThrows(IllegalArgumentException.class, () -> new TrapezoidalPlateRitz(p, iso, t, 17, 3));
    assertThrows(IllegalArgumentException.class, () -> new TrapezoidalPlateRitz(p, iso, t, 3, 17));
    // the limits themselves are accepted
    assertEquals(16, new TrapezoidalPlateRitz(p, iso, t, 1, 16).frequenciesHz().length);
    assertEquals(16, new TrapezoidalPlateRitz(p, iso, t, 16, 1).frequenciesHz().length);
    TrapezoidalPlateRitz r = new TrapezoidalPlateRitz(p, iso, t, 2, 3);
    assertEquals("a plate grid needs at least 2 x 2 points",
        assertThrows(IllegalArgumentException.class, () -> r.gridPoints(1, 3, "g")).getMessage());
    assertEquals("a plate grid needs at least 2 x 2 points",
        assertThrows(IllegalArgumentException.class, () -> r.gridPoints(3, 1, "g")).getMessage());
    assertEquals(4, r.gridPoints(2, 2, "g").size());
    assertEquals("mode count 7 outside 1..6",
        assertThrows(IllegalArgumentException.class, () -> r.modeTable("x", 7, r.gridPoints(2, 2, "g"), 0)).getMessage());
    assertEquals("mode count 0 outside 1..6",
        assertThrows(IllegalArgumentException.class, () -> r.modeTable("x", 0, r.gridPoints(2, 2, "g"), 0)).getMessage());
    ModeTable all = r.modeTable("x", 6, r.gridPoints(3, 3, "g"), 0);
    assertEquals(List.of("mode_1", "mode_2", "mode_3", "mode_4", "mode_5", "mode_6"), all.modeNames());
    IllegalArgumentException still = assertThrows(IllegalArgumentException.class,
        () -> r.modeTable("x", 1, List.of(new SplinePoint("root", 0.5, 0)), 0));
    assertEquals("mode 1 vanishes at every given point", still.getMessage());
  }
}
