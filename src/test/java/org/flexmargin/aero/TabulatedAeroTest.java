package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.junit.jupiter.api.Test;

/** Tests of {@link TabulatedAero}: interpolation properties and a smooth physical table. */
class TabulatedAeroTest {
  private static final List<String> NAMES = List.of("bend", "torsion");

  /** Samples an aerodynamic source at the given reduced frequencies into a table. */
  static GafTable sample(AeroSource source, double[] ks) {
    int n = source.size();
    double[][][] re = new double[ks.length][n][n];
    double[][][] im = new double[ks.length][n][n];
    ZMatrixRMaj q = new ZMatrixRMaj(n, n);
    for (int i = 0; i < ks.length; i++) {
      source.forces(ks[i], q);
      for (int r = 0; r < n; r++) {
        for (int c = 0; c < n; c++) {
          re[i][r][c] = q.getReal(r, c);
          im[i][r][c] = q.getImag(r, c);
        }
      }
    }
    return new GafTable(source.referenceSemichordM(), 0.3, NAMES, ks, re, im);
  }

  /** A table whose every element is f(k) times a distinct constant (real) and g(k) (imaginary). */
  static GafTable table(double[] ks, DoubleUnaryOperator f) {
    double[][][] re = new double[ks.length][2][2];
    double[][][] im = new double[ks.length][2][2];
    for (int i = 0; i < ks.length; i++) {
      for (int r = 0; r < 2; r++) {
        for (int c = 0; c < 2; c++) {
          re[i][r][c] = (1 + r + 2 * c) * f.applyAsDouble(ks[i]);
          im[i][r][c] = -(3 - r - c) * f.applyAsDouble(ks[i]) + 0.5;
        }
      }
    }
    return new GafTable(0.5, 0.0, NAMES, ks, re, im);
  }

  static StripTheoryAero wing() {
    Strip inner = new Strip("inner", 1.2, 0.9, -0.2, 5.8);
    Strip outer = new Strip("outer", 0.7, 0.6, -0.4, 5.1);
    return new StripTheoryAero(
        new StripTheorySpec(0.75, List.of(inner, outer)), StripTheoryAeroTest.bendingTorsion());
  }

  /**
   * An interpolant passes through its nodes: interior nodes exactly (the spline's constant term
   * there is the tabulated value), the last node to rounding of the cubic (1e-14 relative).
   */
  @Test
  void reproducesTabulatedValuesAtNodes() {
    double[] ks = {0.0, 0.1, 0.25, 0.5, 1.0, 2.0};
    GafTable gaf = sample(wing(), ks);
    TabulatedAero aero = new TabulatedAero(gaf);
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    for (int i = 0; i < ks.length; i++) {
      aero.forces(ks[i], q);
      double tolerance = i == ks.length - 1 ? 1e-14 * StripTheoryAeroTest.maxAbs(q) : 0.0;
      for (int r = 0; r < 2; r++) {
        for (int c = 0; c < 2; c++) {
          assertEquals(gaf.realAt(i, r, c), q.getReal(r, c), tolerance, "real at node " + i);
          assertEquals(gaf.imagAt(i, r, c), q.getImag(r, c), tolerance, "imag at node " + i);
        }
      }
    }
  }

  /**
   * A smooth physical table: strip theory (Theodorsen) sampled on a typical unevenly spaced grid,
   * interpolated at every interval midpoint and compared with strip theory evaluated directly. The
   * spline error bound (5/384) h^4 max|f''''| (de Boor, A Practical Guide to Splines, ch. IV) is
   * small where Q is smooth (k &gt;= 0.1: measured 6e-5 of the largest element of Q(2), asserted
   * 2e-4); in the first intervals Q behaves like k ln k, which no polynomial follows well (measured
   * 1.0e-3, asserted 2e-3). The assertion would fail with natural end conditions (5.6e-3 measured
   * in the last interval).
   */
  @Test
  void interpolatesStripTheoryTableAccurately() {
    double[] ks = {0, 0.02, 0.05, 0.1, 0.15, 0.2, 0.3, 0.4, 0.5, 0.6, 0.8, 1.0, 1.2, 1.5, 2.0};
    StripTheoryAero exact = wing();
    TabulatedAero aero = new TabulatedAero(sample(exact, ks));
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    ZMatrixRMaj reference = new ZMatrixRMaj(2, 2);
    exact.forces(2.0, reference);
    double scale = StripTheoryAeroTest.maxAbs(reference);
    for (int i = 0; i < ks.length - 1; i++) {
      double k = 0.5 * (ks[i] + ks[i + 1]);
      aero.forces(k, q);
      exact.forces(k, reference);
      double worst = 0;
      for (int e = 0; e < 8; e++) {
        worst = Math.max(worst, Math.abs(q.data[e] - reference.data[e]));
      }
      double allowed = (k >= 0.1 ? 2e-4 : 2e-3) * scale;
      assertTrue(worst < allowed, "interpolation error " + worst + " at k = " + k);
    }
  }

  /**
   * Property of the not-a-knot cubic spline (de Boor, A Practical Guide to Splines, ch. IV): data
   * from any cubic polynomial are reproduced exactly, up to the ends, on an uneven grid. Rounding
   * only: 1e-12 relative to values of order 10.
   */
  @Test
  void reproducesCubicDataExactly() {
    DoubleUnaryOperator cubic = k -> 1.5 - 0.8 * k + 2.1 * k * k - 0.9 * k * k * k;
    double[] ks = {0.0, 0.1, 0.35, 0.4, 0.9, 1.6, 2.0};
    TabulatedAero aero = new TabulatedAero(table(ks, cubic));
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    for (double k = 0.0; k <= 2.0; k += 0.0173) {
      aero.forces(k, q);
      double f = cubic.applyAsDouble(k);
      for (int r = 0; r < 2; r++) {
        for (int c = 0; c < 2; c++) {
          assertEquals((1 + r + 2 * c) * f, q.getReal(r, c), 1e-12 * 10, "real at k = " + k);
          assertEquals(-(3 - r - c) * f + 0.5, q.getImag(r, c), 1e-12 * 10, "imag at k = " + k);
        }
      }
    }
  }

  /**
   * With three nodes the spline is the interpolating parabola, so quadratic data are reproduced
   * (closed form; rounding only, 1e-13).
   */
  @Test
  void threeNodesGiveTheParabola() {
    DoubleUnaryOperator parabola = k -> 0.2 + 1.1 * k - 0.6 * k * k;
    TabulatedAero aero = new TabulatedAero(table(new double[] {0.1, 0.7, 1.0}, parabola));
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    for (double k = 0.1; k <= 1.0; k += 0.05) {
      aero.forces(k, q);
      assertEquals(parabola.applyAsDouble(k), q.getReal(0, 0), 1e-13, "at k = " + k);
    }
  }

  /**
   * Data from a straight line are reproduced exactly, also with only two nodes, where the
   * interpolant is that line (closed form; rounding only: 1e-13).
   */
  @Test
  void reproducesLinearDataExactly() {
    DoubleUnaryOperator line = k -> 0.7 - 2.3 * k;
    for (double[] ks : new double[][] {{0.0, 0.3, 0.35, 1.1, 2.5}, {0.1, 1.4}}) {
      TabulatedAero aero = new TabulatedAero(table(ks, line));
      ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
      for (double k = ks[0]; k <= ks[ks.length - 1]; k += 0.0137) {
        aero.forces(k, q);
        for (int r = 0; r < 2; r++) {
          for (int c = 0; c < 2; c++) {
            double f = line.applyAsDouble(k);
            assertEquals((1 + r + 2 * c) * f, q.getReal(r, c), 1e-13);
            assertEquals(-(3 - r - c) * f + 0.5, q.getImag(r, c), 1e-13);
          }
        }
      }
    }
  }

  /**
   * Convergence order: for a smooth function the interior error of a cubic spline falls as h^4
   * (de Boor, A Practical Guide to Splines, ch. IV). Halving h must cut the error near the middle
   * of the range by more than 10 (16 expected).
   */
  @Test
  void interiorErrorIsFourthOrder() {
    DoubleUnaryOperator f = Math::sin;
    double[] errors = new double[2];
    for (int level = 0; level < 2; level++) {
      int intervals = 16 << level;
      double[] ks = new double[intervals + 1];
      for (int i = 0; i <= intervals; i++) {
        ks[i] = 4.0 * i / intervals;
      }
      TabulatedAero aero = new TabulatedAero(table(ks, f));
      ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
      double worst = 0;
      for (double x = 1.75; x <= 2.25; x += 0.01) {
        aero.forces(x, q);
        worst = Math.max(worst, Math.abs(q.getReal(0, 0) - f.applyAsDouble(x)));
      }
      errors[level] = worst;
    }
    assertTrue(errors[0] > 0, "the coarse spline is not exact for sin");
    assertTrue(errors[0] / errors[1] > 10, "error ratio " + errors[0] / errors[1]);
  }

  /** Outside the table the end values are returned (documented clamping). */
  @Test
  void clampsOutsideTheTable() {
    double[] ks = {0.05, 0.2, 0.6, 1.5};
    TabulatedAero aero = new TabulatedAero(sample(wing(), ks));
    assertEquals(0.05, aero.minReducedFrequency());
    assertEquals(1.5, aero.maxReducedFrequency());
    ZMatrixRMaj atMin = new ZMatrixRMaj(2, 2);
    ZMatrixRMaj atMax = new ZMatrixRMaj(2, 2);
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    aero.forces(0.05, atMin);
    aero.forces(1.5, atMax);
    aero.forces(0.0, q);
    assertArrayEquals8(atMin, q);
    aero.forces(7.0, q);
    assertArrayEquals8(atMax, q);
    aero.forces(Double.POSITIVE_INFINITY, q);
    assertArrayEquals8(atMax, q);
    assertThrows(IllegalArgumentException.class, () -> aero.forces(Double.NaN, q));
  }

  @Test
  void describesItself() {
    TabulatedAero aero = new TabulatedAero(sample(wing(), new double[] {0.0, 0.5, 1.0}));
    assertEquals(2, aero.size());
    assertEquals(0.75, aero.referenceSemichordM());
    assertTrue(aero.description().contains("3 reduced frequencies"), aero.description());
  }

  private static void assertArrayEquals8(ZMatrixRMaj expected, ZMatrixRMaj actual) {
    for (int e = 0; e < 8; e++) {
      assertEquals(expected.data[e], actual.data[e], 0.0);
    }
  }

  /** Mode tables used by the factory test. */
  static ModeTable modes() {
    return StripTheoryAeroTest.bendingTorsion();
  }
}
