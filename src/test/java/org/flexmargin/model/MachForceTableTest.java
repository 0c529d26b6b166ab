package org.flexmargin.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class MachForceTableTest {
  /** A 1 x 2 table (one mode, one control) whose entries follow Prandtl-Glauert: Q = Q0 / beta. */
  static MachForceTable prandtlGlauert(double[] machs, double q0) {
    double[][][][] re = new double[machs.length][2][1][2];
    double[][][][] im = new double[machs.length][2][1][2];
    for (int m = 0; m < machs.length; m++) {
      double beta = Math.sqrt(1 - machs[m] * machs[m]);
      for (int k = 0; k < 2; k++) {
        re[m][k][0][0] = q0 / beta;
        re[m][k][0][1] = 2 * q0 / beta;
        im[m][k][0][0] = k * q0 / beta;
      }
    }
    return new MachForceTable(0.5, machs, new double[] {0, 0.5}, List.of("a"), List.of("a", "flap"), re, im);
  }

  @Test
  void betaWeightedInterpolationIsExactForPrandtlGlauertData() {
    // closed form: Q(M) = Q0 / sqrt(1 - M^2); the interpolation of beta Q is exact for it, so
    // only rounding remains (1e-12 relative)
    MachForceTable t = prandtlGlauert(new double[] {0.3, 0.8}, 4.0);
    for (double m : new double[] {0.3, 0.45, 0.6, 0.75, 0.8}) {
      double exact = 4.0 / Math.sqrt(1 - m * m);
      assertEquals(exact, t.atMach(m).realAt(0, 0, 0), 1e-12 * exact, "M " + m);
      assertEquals(exact, t.atMach(m).imagAt(1, 0, 0), 1e-12 * exact, "M " + m);
      assertEquals(2 * exact, t.realColumn(1, m, 0)[0], 2e-12 * exact, "column, M " + m);
    }
    // outside the table: the end table, and covers() says so
    assertEquals(4.0 / Math.sqrt(1 - 0.64), t.atMach(0.9).realAt(0, 0, 0), 1e-12);
    assertEquals(0.8, t.atMach(0.9).machNumber(), 0.0);
    assertTrue(t.covers(0.82, 0.05));
    assertTrue(!t.covers(0.9, 0.05));
    assertTrue(!t.covers(0.2, 0.05));
  }

  @Test
  void rejectsBadShapesAndOrder() {
    assertThrows(InvalidInputException.class, () -> prandtlGlauert(new double[] {0.5, 0.3}, 1));
    assertThrows(InvalidInputException.class,
        () -> new MachForceTable(0.5, new double[] {0.3}, new double[] {0, 1}, List.of("a"), List.of("flap", "a"),
            new double[1][2][1][2], new double[1][2][1][2]));
    assertThrows(InvalidInputException.class,
        () -> new MachForceTable(0.5, new double[] {0.3}, new double[] {0, 1}, List.of("a"), List.of("a"),
            new double[1][2][1][2], new double[1][2][1][1]));
  }
}
