package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.function.DoubleUnaryOperator;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.GafTable;
import org.junit.jupiter.api.Test;

/**
 * End conditions of the force-table spline on tables that do not start at k = 0 and have uneven
 * steps. Closed forms (de Boor, A Practical Guide to Splines, ch. IV): the not-a-knot cubic spline
 * reproduces every cubic exactly, with three knots the interpolating parabola, with two the
 * straight line. Tolerance 1e-12 of the element size: rounding of the spline solve.
 */
class TabulatedSplineEndsTest {

  private static void assertReproduces(double[] ks, DoubleUnaryOperator f, double[] probes) {
    GafTable table = TabulatedAeroTest.table(ks, f);
    TabulatedAero aero = new TabulatedAero(table);
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    for (double k : probes) {
      aero.forces(k, q);
      double v = f.applyAsDouble(k);
      for (int r = 0; r < 2; r++) {
        for (int c = 0; c < 2; c++) {
          assertEquals((1 + r + 2 * c) * v, q.getReal(r, c), 1e-12 * (1 + Math.abs(v)) * 4,
              "Re at k=" + k);
          assertEquals(-(3 - r - c) * v + 0.5, q.getImag(r, c), 1e-12 * (1 + Math.abs(v)) * 4,
              "Im at k=" + k);
        }
      }
    }
  }

  @Test
  void cubicOnUnevenKnotsStartingAboveZeroIsReproduced() {
    DoubleUnaryOperator cubic = k -> 1 - 2 * k + 0.7 * k * k - 0.4 * k * k * k;
    double[] ks = {0.05, 0.2, 0.3, 0.55, 0.9, 1.4};
    // probes in the first and last intervals, where only the end conditions act
    assertReproduces(ks, cubic, new double[] {0.05, 0.07, 0.13, 0.25, 0.7, 1.0, 1.3, 1.4});
    double[] four = {0.3, 0.45, 0.8, 1.2};
    assertReproduces(four, cubic, new double[] {0.31, 0.4, 0.6, 1.0, 1.19});
  }

  @Test
  void threeKnotsGiveTheParabolaAndTwoTheLine() {
    DoubleUnaryOperator parabola = k -> 0.3 + 1.5 * k - 2.0 * k * k;
    assertReproduces(new double[] {0.1, 0.25, 0.7}, parabola, new double[] {0.12, 0.2, 0.5, 0.69});
    DoubleUnaryOperator line = k -> 0.3 - 0.8 * k;
    assertReproduces(new double[] {0.2, 0.9}, line, new double[] {0.2, 0.5, 0.9});
  }

  @Test
  void valuesOutsideTheTableAreClampedToTheEnds() {
    DoubleUnaryOperator cubic = k -> 1 - 2 * k + 0.7 * k * k - 0.4 * k * k * k;
    double[] ks = {0.05, 0.2, 0.3, 0.55, 0.9, 1.4};
    TabulatedAero aero = new TabulatedAero(TabulatedAeroTest.table(ks, cubic));
    ZMatrixRMaj below = new ZMatrixRMaj(2, 2);
    ZMatrixRMaj first = new ZMatrixRMaj(2, 2);
    aero.forces(0.0, below);
    aero.forces(0.05, first);
    ZMatrixRMaj above = new ZMatrixRMaj(2, 2);
    ZMatrixRMaj lastKnot = new ZMatrixRMaj(2, 2);
    aero.forces(3.0, above);
    aero.forces(1.4, lastKnot);
    for (int i = 0; i < 8; i++) {
      assertEquals(first.data[i], below.data[i], 0.0);
      assertEquals(lastKnot.data[i], above.data[i], 0.0);
    }
    assertEquals(0.05, aero.minReducedFrequency(), 0.0);
    assertEquals(1.4, aero.maxReducedFrequency(), 0.0);
    assertThrows(IllegalArgumentException.class, () -> aero.forces(Double.NaN, below));
  }
}
