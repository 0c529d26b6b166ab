package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.junit.jupiter.api.Test;

/** Validation of {@link StripTheoryAero}. */
class StripTheoryAeroTest {
  /** Strip semichord b (m). */
  private static final double B = 0.8;
  /** Elastic axis aft of mid-chord (semichords). */
  private static final double A = -0.3;
  /** Strip width (m). */
  private static final double WIDTH = 1.5;

  /** A mode with the given shapes; frequency, damping and mass do not enter the aerodynamics. */
  static ElasticMode mode(String name, Map<String, ShapeValue> shapes) {
    return new ElasticMode(name, 1.0, 0.0, 1.0, shapes);
  }

  /**
   * The typical section as two coordinates: "heave" (w = 1 m, positive up) and "pitch" (theta = 1
   * rad, nose up) at the given stations.
   */
  static ModeTable heavePitch(String... stations) {
    Map<String, ShapeValue> heave = new LinkedHashMap<>();
    Map<String, ShapeValue> pitch = new LinkedHashMap<>();
    for (String s : stations) {
      heave.put(s, new ShapeValue(1.0, 0.0));
      pitch.put(s, new ShapeValue(0.0, 1.0));
    }
    return new ModeTable("section", List.of(mode("heave", heave), mode("pitch", pitch)));
  }

  static StripTheoryAero section(double liftSlope, double width) {
    StripTheorySpec spec =
        new StripTheorySpec(B, List.of(new Strip("root", width, B, A, liftSlope)));
    return new StripTheoryAero(spec, heavePitch("root"));
  }

  static ZMatrixRMaj q(AeroSource aero, double k) {
    ZMatrixRMaj out = new ZMatrixRMaj(aero.size(), aero.size());
    aero.forces(k, out);
    return out;
  }

  /**
   * (a) Steady limit. Quasi-steady strip theory (closed form; e.g. Hodges &amp; Pierce, Introduction
   * to Structural Dynamics and Aeroelasticity, ch. 5): lift per unit span q c a0 theta at the
   * quarter chord, moment about the elastic axis e L with e = b (a + 1/2); plunge displacement
   * produces nothing. Exact arithmetic apart from rounding: tolerance 1e-14 relative.
   */
  @Test
  void steadyLimitIsQuasiSteadyLiftAndMoment() {
    double a0 = 5.7;
    ZMatrixRMaj q = q(section(a0, WIDTH), 0.0);
    double c = 2 * B;
    double e = B * (A + 0.5);
    double lift = WIDTH * c * a0; // per unit q per unit theta
    assertEquals(lift, q.getReal(0, 1), 1e-14 * lift);
    assertEquals(e * lift, q.getReal(1, 1), 1e-14 * lift);
    assertEquals(0.0, q.getReal(0, 0));
    assertEquals(0.0, q.getReal(1, 0));
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        assertEquals(0.0, q.getImag(i, j), "imaginary part at k = 0");
      }
    }
  }

  /**
   * (b) Typical-section divergence, closed form q_D = K_alpha / (c a0 e span) (Hodges &amp; Pierce,
   * Introduction to Structural Dynamics and Aeroelasticity, ch. 5, divergence of the typical
   * section). The static problem (K - q Q(0)) x = 0 is solved independently as the largest real
   * eigenvalue 1/q of K^-1 Q(0) with Commons Math. Tolerance 1e-12 relative (a 2x2 eigenproblem).
   */
  @Test
  void typicalSectionDivergenceMatchesClosedForm() {
    double a0 = 2 * Math.PI;
    double span = 2.0;
    double kHeave = 2.0e5; // N/m
    double kPitch = 5.0e4; // N m/rad
    ZMatrixRMaj q = q(section(a0, span), 0.0);
    RealMatrix q0 = new Array2DRowRealMatrix(2, 2);
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        q0.setEntry(i, j, q.getReal(i, j));
      }
    }
    RealMatrix kInverse = MatrixUtils.createRealDiagonalMatrix(new double[] {1 / kHeave, 1 / kPitch});
    EigenDecomposition eig = new EigenDecomposition(kInverse.multiply(q0));
    double largest = 0.0;
    for (int i = 0; i < 2; i++) {
      if (eig.getImagEigenvalue(i) == 0.0) {
        largest = Math.max(largest, eig.getRealEigenvalue(i));
      }
    }
    double qDivergence = 1.0 / largest;
    double expected = kPitch / (2 * B * a0 * B * (A + 0.5) * span);
    assertEquals(expected, qDivergence, 1e-12 * expected);
  }

  /**
   * (c) Element-by-element comparison with the classical arrangement of Bisplinghoff, Ashley &amp;
   * Halfman, Aeroelasticity (1955), ch. 5 (coefficients recalled from memory):
   *
   * <pre>
   *   L = -pi rho b^3 w^2 { L_h h/b + [L_a - L_h (1/2 + a)] alpha }
   *   M =  pi rho b^4 w^2 { [M_h - L_h (1/2 + a)] h/b
   *                         + [M_a - (M_h + L_a)(1/2 + a) + L_h (1/2 + a)^2] alpha }
   *   L_h = 1 - 2iC/k, L_a = 1/2 - i(1 + 2C)/k - 2C/k^2, M_h = 1/2, M_a = 3/8 - i/k
   * </pre>
   *
   * with h down, L up, M nose up (the overall signs of L and M set to these conventions). Divided by
   * q = rho V^2/2: rho b^3 w^2 / q = 2 b k^2. Flat plate a0 = 2 pi. The same algebra in a different
   * arrangement: tolerance 1e-12 relative to the largest element.
   */
  @Test
  void matchesBisplinghoffAshleyHalfmanCoefficients() {
    StripTheoryAero aero = section(2 * Math.PI, WIDTH);
    double s = 0.5 + A;
    for (double k : new double[] {0.01, 0.1, 0.3, 0.75, 1.5, 4.0}) {
      Complex c = Theodorsen.value(k);
      Complex i = Complex.I;
      Complex lh = Complex.ONE.subtract(i.multiply(c).multiply(2 / k));
      Complex la =
          new Complex(0.5)
              .subtract(i.multiply(c.multiply(2).add(1)).divide(k))
              .subtract(c.multiply(2 / (k * k)));
      Complex mh = new Complex(0.5);
      Complex ma = new Complex(0.375, -1 / k);
      Complex liftPerHb = lh.multiply(-2 * Math.PI * B * k * k);
      Complex liftPerAlpha = la.subtract(lh.multiply(s)).multiply(-2 * Math.PI * B * k * k);
      Complex momentPerHb = mh.subtract(lh.multiply(s)).multiply(2 * Math.PI * B * B * k * k);
      Complex momentPerAlpha =
          ma.subtract(mh.add(la).multiply(s))
              .add(lh.multiply(s * s))
              .multiply(2 * Math.PI * B * B * k * k);
      // unit w means h = -1 m, i.e. h/b = -1/b
      Complex[][] expected = {
        {liftPerHb.multiply(-WIDTH / B), liftPerAlpha.multiply(WIDTH)},
        {momentPerHb.multiply(-WIDTH / B), momentPerAlpha.multiply(WIDTH)},
      };
      ZMatrixRMaj q = q(aero, k);
      double scale = 0.0;
      for (Complex[] row : expected) {
        for (Complex e : row) {
          scale = Math.max(scale, e.abs());
        }
      }
      for (int r = 0; r < 2; r++) {
        for (int col = 0; col < 2; col++) {
          String where = "Q[" + r + "][" + col + "] at k = " + k;
          assertEquals(expected[r][col].getReal(), q.getReal(r, col), 1e-12 * scale, where);
          assertEquals(expected[r][col].getImaginary(), q.getImag(r, col), 1e-12 * scale, where);
        }
      }
    }
  }

  /**
   * (d) Individual terms in closed form. As k grows, Q/k^2 tends to the apparent-mass matrix of the
   * section (noncirculatory terms of Theodorsen, NACA Report 496):
   *
   * <pre>
   *   2 pi dy [[1, a b], [a b, b^2 (1/8 + a^2)]]
   * </pre>
   *
   * symmetric, positive real (pi rho b^2 times minus the acceleration -omega^2, over q). The
   * circulatory part adds O(1/k^2) relative: at k = 1e4, tolerance 1e-7 relative. The pitch damping
   * with a0 = 2 pi tends to Im Q_theta,theta / k = -2 pi b^2 dy (1/2 - a)^2 (derived from the same
   * terms with C = 1/2), also to 1e-7.
   */
  @Test
  void highFrequencyTermsMatchClosedForms() {
    double k = 1e4;
    ZMatrixRMaj q = q(section(2 * Math.PI, WIDTH), k);
    double f = 2 * Math.PI * WIDTH;
    double[][] apparent = {{f, f * A * B}, {f * A * B, f * B * B * (0.125 + A * A)}};
    for (int r = 0; r < 2; r++) {
      for (int c = 0; c < 2; c++) {
        assertEquals(apparent[r][c], q.getReal(r, c) / (k * k), 1e-7 * f, "apparent mass " + r + c);
      }
    }
    double pitchDamping = -2 * Math.PI * B * B * WIDTH * (0.5 - A) * (0.5 - A);
    assertEquals(pitchDamping, q.getImag(1, 1) / k, 1e-7 * Math.abs(pitchDamping));
  }

  /**
   * Pure plunge is always damped by the air (Theodorsen, NACA Report 496; Bisplinghoff, Ashley
   * &amp; Halfman ch. 5: the plunge work per cycle is negative since F &gt; 0): Im Q_ww = -2 a0 k F dy
   * &lt; 0 for every k &gt; 0 (exact closed form, tolerance 1e-13 relative).
   */
  @Test
  void plungeIsAerodynamicallyDamped() {
    double a0 = 5.9;
    StripTheoryAero aero = section(a0, WIDTH);
    for (double k : new double[] {0.001, 0.05, 0.4, 2.0, 20.0}) {
      double expected = -2 * a0 * k * Theodorsen.value(k).getReal() * WIDTH;
      double actual = q(aero, k).getImag(0, 0);
      assertTrue(actual < 0);
      assertEquals(expected, actual, 1e-13 * Math.abs(expected));
    }
  }

  /**
   * (e) Q is linear in the strip width and additive over strips (strip theory, virtual work); the
   * circulatory part is affine in the lift slope. Rounding only: 1e-13 relative.
   */
  @Test
  void addsOverStripsAndScalesWithWidthAndLiftSlope() {
    Strip inner = new Strip("inner", 1.2, 0.9, -0.2, 5.8);
    Strip outer = new Strip("outer", 0.7, 0.6, -0.4, 5.1);
    ModeTable modes = bendingTorsion();
    StripTheoryAero both = new StripTheoryAero(new StripTheorySpec(0.75, List.of(inner, outer)), modes);
    StripTheoryAero innerOnly = new StripTheoryAero(new StripTheorySpec(0.75, List.of(inner)), modes);
    StripTheoryAero outerOnly = new StripTheoryAero(new StripTheorySpec(0.75, List.of(outer)), modes);
    Strip wideInner = new Strip("inner", 3 * 1.2, 0.9, -0.2, 5.8);
    StripTheoryAero wide = new StripTheoryAero(new StripTheorySpec(0.75, List.of(wideInner)), modes);
    for (double k : new double[] {0.0, 0.2, 1.3}) {
      ZMatrixRMaj sum = q(both, k);
      ZMatrixRMaj q1 = q(innerOnly, k);
      ZMatrixRMaj q2 = q(outerOnly, k);
      ZMatrixRMaj q3 = q(wide, k);
      double scale = maxAbs(sum);
      for (int e = 0; e < sum.data.length; e++) {
        assertEquals(q1.data[e] + q2.data[e], sum.data[e], 1e-13 * scale, "sum at k = " + k);
        assertEquals(3 * q1.data[e], q3.data[e], 1e-13 * scale, "width at k = " + k);
      }
    }
    // affine in the lift slope: Q(a0) = Q(a1) + (a0 - a1)/(a2 - a1) (Q(a2) - Q(a1))
    double k = 0.37;
    ZMatrixRMaj q1 = q(section(3.0, WIDTH), k);
    ZMatrixRMaj q2 = q(section(6.0, WIDTH), k);
    ZMatrixRMaj q3 = q(section(4.0, WIDTH), k);
    double scale = maxAbs(q2);
    for (int e = 0; e < q1.data.length; e++) {
      double expected = q1.data[e] + (4.0 - 3.0) / (6.0 - 3.0) * (q2.data[e] - q1.data[e]);
      assertEquals(expected, q3.data[e], 1e-13 * scale);
    }
  }

  /**
   * Generalized forces transform by congruence: with T the matrix of modal heave and twist at a
   * single strip, Q_modal = T^T Q_heave-pitch T (virtual work). Tolerance 1e-13 relative.
   */
  @Test
  void modalForcesAreCongruentToSectionForces() {
    double[][] t = {{0.8, -0.3}, {0.05, 0.9}}; // rows: heave, twist; columns: modes
    Map<String, ShapeValue> m1 = Map.of("root", new ShapeValue(t[0][0], t[1][0]));
    Map<String, ShapeValue> m2 = Map.of("root", new ShapeValue(t[0][1], t[1][1]));
    ModeTable modes = new ModeTable("wing", List.of(mode("bend", m1), mode("twist", m2)));
    StripTheorySpec spec = new StripTheorySpec(B, List.of(new Strip("root", WIDTH, B, A, 5.5)));
    StripTheoryAero modal = new StripTheoryAero(spec, modes);
    StripTheoryAero sectionAero = section(5.5, WIDTH);
    double k = 0.6;
    ZMatrixRMaj qm = q(modal, k);
    ZMatrixRMaj qs = q(sectionAero, k);
    double scale = maxAbs(qs);
    for (int i = 0; i < 2; i++) {
      for (int j = 0; j < 2; j++) {
        double re = 0;
        double im = 0;
        for (int p = 0; p < 2; p++) {
          for (int r = 0; r < 2; r++) {
            re += t[p][i] * qs.getReal(p, r) * t[r][j];
            im += t[p][i] * qs.getImag(p, r) * t[r][j];
          }
        }
        assertEquals(re, qm.getReal(i, j), 1e-13 * scale);
        assertEquals(im, qm.getImag(i, j), 1e-13 * scale);
      }
    }
  }

  /**
   * Each strip uses its local reduced frequency k b / b_ref: halving b_ref at half the k gives the
   * same forces (definition, rounding only).
   */
  @Test
  void usesLocalReducedFrequency() {
    Strip strip = new Strip("root", WIDTH, B, A, 6.0);
    StripTheoryAero own = new StripTheoryAero(new StripTheorySpec(B, List.of(strip)), heavePitch("root"));
    StripTheoryAero half =
        new StripTheoryAero(new StripTheorySpec(B / 2, List.of(strip)), heavePitch("root"));
    ZMatrixRMaj q1 = q(own, 0.8);
    ZMatrixRMaj q2 = q(half, 0.4);
    double scale = maxAbs(q1);
    for (int e = 0; e < q1.data.length; e++) {
      assertEquals(q1.data[e], q2.data[e], 1e-14 * scale);
    }
  }

  @Test
  void reportsMissingStationWithFieldPath() {
    List<Strip> strips = new ArrayList<>();
    strips.add(new Strip("root", 1.0, B, A, 6.0));
    strips.add(new Strip("tip", 1.0, B, A, 6.0));
    StripTheorySpec spec = new StripTheorySpec(B, strips);
    InvalidInputException e =
        assertThrows(InvalidInputException.class, () -> new StripTheoryAero(spec, heavePitch("root")));
    assertEquals("aero.strips[1].station", e.fieldPath());
    assertTrue(e.getMessage().contains("\"tip\""), e.getMessage());
    assertTrue(e.getMessage().contains("\"heave\""), e.getMessage());
  }

  @Test
  void describesItselfAndRejectsBadFrequencies() {
    StripTheoryAero aero = section(6.0, WIDTH);
    assertEquals(2, aero.size());
    assertEquals(B, aero.referenceSemichordM());
    assertEquals(0.0, aero.minReducedFrequency());
    assertEquals(Double.POSITIVE_INFINITY, aero.maxReducedFrequency());
    assertTrue(aero.description().contains("1 strip"));
    ZMatrixRMaj out = new ZMatrixRMaj(1, 1); // reshaped by forces
    aero.forces(0.1, out);
    assertEquals(2, out.numRows);
    assertThrows(IllegalArgumentException.class, () -> aero.forces(-0.1, out));
    assertThrows(IllegalArgumentException.class, () -> aero.forces(Double.NaN, out));
    assertThrows(IllegalArgumentException.class, () -> aero.forces(Double.POSITIVE_INFINITY, out));
  }

  /** Two modes with heave and twist at stations "inner" and "outer". */
  static ModeTable bendingTorsion() {
    Map<String, ShapeValue> bend = new LinkedHashMap<>();
    bend.put("inner", new ShapeValue(0.3, 0.02));
    bend.put("outer", new ShapeValue(1.0, 0.05));
    Map<String, ShapeValue> torsion = new LinkedHashMap<>();
    torsion.put("inner", new ShapeValue(-0.05, 0.4));
    torsion.put("outer", new ShapeValue(-0.1, 1.0));
    return new ModeTable("wing", List.of(mode("bend", bend), mode("torsion", torsion)));
  }

  static double maxAbs(ZMatrixRMaj m) {
    double max = 0;
    for (int e = 0; e < 2 * m.numRows * m.numCols; e++) {
      max = Math.max(max, Math.abs(m.data[e]));
    }
    return max;
  }
}
