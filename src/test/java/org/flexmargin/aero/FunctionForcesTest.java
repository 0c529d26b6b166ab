package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/** The test fixture for hand-made forces: the matrix it hands to a fill, and its checks. */
class FunctionForcesTest {

  @Test
  void theFillGetsAZeroedMatrixOfTheSourceSize() {
    FunctionForces f = new FunctionForces(2, 0.5, 0, 2, (k, out) -> out.set(1, 0, k, -k), "one entry");
    ZMatrixRMaj q = new ZMatrixRMaj(3, 3);
    for (int e = 0; e < q.data.length; e++) {
      q.data[e] = 7.0;
    }
    f.forces(0.25, q);
    assertEquals(2, q.numRows);
    assertEquals(2, q.numCols);
    // exact: the fixture writes zeros and the fill copies k; no arithmetic
    assertEquals(0.25, q.getReal(1, 0), 0.0);
    assertEquals(-0.25, q.getImag(1, 0), 0.0);
    assertEquals(0.0, q.getReal(0, 0), 0.0);
    assertEquals(0.0, q.getImag(0, 1), 0.0);
    assertEquals(0.0, q.getReal(1, 1), 0.0);
  }

  @Test
  void sizesAndRangesOutsideTheirDomainAreRefused() {
    assertThrows(IllegalArgumentException.class, () -> forces(0, 0.5, 0, 1));
    assertThrows(IllegalArgumentException.class, () -> forces(1, 0, 0, 1));
    assertThrows(IllegalArgumentException.class, () -> forces(1, Double.POSITIVE_INFINITY, 0, 1));
    assertThrows(IllegalArgumentException.class, () -> forces(1, 0.5, -0.1, 1));
    assertThrows(IllegalArgumentException.class, () -> forces(1, 0.5, Double.NaN, 1));
    assertThrows(IllegalArgumentException.class, () -> forces(1, 0.5, 1, 0.5));
    assertThrows(IllegalArgumentException.class,
        () -> forces(1, 0.5, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY));
    assertEquals(Double.POSITIVE_INFINITY, forces(1, 0.5, 0, Double.POSITIVE_INFINITY).maxReducedFrequency());
    assertThrows(NullPointerException.class, () -> new FunctionForces(1, 0.5, 0, 1, null, "x"));
    assertThrows(NullPointerException.class, () -> new FunctionForces(1, 0.5, 0, 1, FunctionForces.NONE, null));
  }

  private static FunctionForces forces(int size, double semichord, double kMin, double kMax) {
    return new FunctionForces(size, semichord, kMin, kMax, FunctionForces.NONE, "none");
  }
}
