package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * The interpolant at the edges of its range and of its checks: which k are interpolated and which
 * are passed to the exact source (counted), the last interval's check, element-wise checks of a
 * matrix source, and the ranges it accepts.
 */
class ReducedFrequencyInterpolantEdgesTest {

  /** A 2 x 2 source, element (i, j) = f(i, j, k), real; counts its evaluations. */
  private static final class Counting implements AeroSource {
    interface F {
      double at(int i, int j, double k);
    }

    final F f;
    final double kMin;
    final double kMax;
    int calls;

    Counting(double kMin, double kMax, F f) {
      this.kMin = kMin;
      this.kMax = kMax;
      this.f = f;
    }

    @Override
    public int size() {
      return 2;
    }

    @Override
    public double referenceSemichordM() {
      return 0.7;
    }

    @Override
    public double minReducedFrequency() {
      return kMin;
    }

    @Override
    public double maxReducedFrequency() {
      return kMax;
    }

    @Override
    public void forces(double k, ZMatrixRMaj out) {
      calls++;
      out.reshape(2, 2);
      for (int i = 0; i < 2; i++) {
        for (int j = 0; j < 2; j++) {
          out.set(i, j, f.at(i, j, k), 0);
        }
      }
    }

    @Override
    public String description() {
      return "counted";
    }
  }

  private static double element(AeroSource s, double k, int i, int j) {
    ZMatrixRMaj q = new ZMatrixRMaj(2, 2);
    s.forces(k, q);
    return q.getReal(i, j);
  }

  @Test
  void delegatesItsDescriptionAndRange() {
    Counting src = new Counting(0.01, 5, (i, j, k) -> 1 + i + j + k);
    ReducedFrequencyInterpolant q = new ReducedFrequencyInterpolant(src, 0.1, 2, 0.05, 1e-6);
    assertEquals(2, q.size());
    assertEquals(0.7, q.referenceSemichordM(), 0.0);
    assertEquals(0.01, q.minReducedFrequency(), 0.0);
    assertEquals(5, q.maxReducedFrequency(), 0.0);
    assertArrayEquals(new double[] {0.1, 2}, q.range(), 0.0);
    assertEquals("counted", q.description());
  }

  @Test
  void theEndsOfTheRangeAreInterpolatedAndBeyondThemTheSourceAnswers() {
    // Q = k (= e^u): smooth, every interval passes; ln(e / 1) / 0.5 = 2 intervals exactly, so kHigh
    // lies on the node that closes the last interval
    Counting src = new Counting(0, 10, (i, j, k) -> k);
    double kHigh = Math.exp(1.0);
    ReducedFrequencyInterpolant q = new ReducedFrequencyInterpolant(src, 1.0, kHigh, 0.5, 1e-2);
    assertEquals(0, q.exactIntervals());
    int built = src.calls;
    // at both ends: interpolated (no call); the value at a node is the node's, within rounding of
    // exp(ln k) (1e-15 relative)
    assertEquals(1.0, element(q, 1.0, 0, 0), 1e-14);
    assertEquals(kHigh, element(q, kHigh, 1, 1), 1e-14 * kHigh);
    assertEquals(built, src.calls, "no exact evaluation inside [kLow, kHigh]");
    // just outside: the exact source, bit for bit
    assertEquals(Math.nextDown(1.0), element(q, Math.nextDown(1.0), 0, 0), 0.0);
    assertEquals(built + 1, src.calls);
    assertEquals(Math.nextUp(kHigh), element(q, Math.nextUp(kHigh), 0, 0), 0.0);
    assertEquals(built + 2, src.calls);
    // the output is reshaped to n x n
    ZMatrixRMaj big = new ZMatrixRMaj(3, 3);
    q.forces(1.5, big);
    assertEquals(2, big.numRows);
    assertEquals(2, big.numCols);
  }

  @Test
  void theLastIntervalAndEveryElementAreChecked() {
    // a kink in element (1, 1) only, inside the last interval [e^0.5, e^1] of a three-node grid:
    // that interval fails its midpoint check and is evaluated exactly there
    double kink = Math.exp(0.75);
    Counting src = new Counting(0, 10, (i, j, k) -> i == 1 && j == 1 ? Math.abs(k - kink) : 1 + k);
    ReducedFrequencyInterpolant q = new ReducedFrequencyInterpolant(src, 1.0, Math.exp(1.0), 0.5, 1e-9);
    assertTrue(q.exactIntervals() >= 1, "kinked interval kept");
    assertEquals(Math.abs(2.5 - kink), element(q, 2.5, 1, 1), 0.0);
    // a source that is zero everywhere: error 0 of scale 0 counts as error 0
    ReducedFrequencyInterpolant zero = new ReducedFrequencyInterpolant(new Counting(0, 10, (i, j, k) -> 0), 0.1, 1,
        0.1, 1e-9);
    assertEquals(0.0, zero.worstRelativeError(), 0.0);
    assertEquals(0, zero.exactIntervals());
  }

  @Test
  void acceptedRanges() {
    Counting src = new Counting(0.1, 2, (i, j, k) -> k);
    // the source's own range and the coarsest step are accepted
    assertArrayEquals(new double[] {0.1, 2}, new ReducedFrequencyInterpolant(src, 0.1, 2, 0.5, 1e-2).range(), 0.0);
    assertThrows(IllegalArgumentException.class, () -> new ReducedFrequencyInterpolant(src, 0.099, 2, 0.1, 1e-2));
    assertThrows(IllegalArgumentException.class, () -> new ReducedFrequencyInterpolant(src, 0.1, 2.001, 0.1, 1e-2));
    assertThrows(IllegalArgumentException.class, () -> new ReducedFrequencyInterpolant(src, 0.5, 0.5, 0.1, 1e-2));
    assertThrows(IllegalArgumentException.class, () -> new ReducedFrequencyInterpolant(src, 0.2, 1, 0.5001, 1e-2));
    assertThrows(IllegalArgumentException.class,
        () -> new ReducedFrequencyInterpolant(src, 0.2, 1, 0.1, Double.NaN));
    Counting open = new Counting(0, Double.POSITIVE_INFINITY, (i, j, k) -> k);
    assertThrows(IllegalArgumentException.class,
        () -> new ReducedFrequencyInterpolant(open, 0.1, Double.POSITIVE_INFINITY, 0.1, 1e-2));
  }
}
