package org.flexmargin.aero;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The fit-error record: validation, defensive copies and the location of the worst element. */
class FitErrorTest {

  @Test
  void worstElementIsTheFirstLargestInRowOrder() {
    // (0, 1) and (1, 0) tie at 0.3; scanning row by row the first one found is kept, and a later
    // equal value does not replace it
    FitError e = FitError.of(new double[][] {{0.1, 0.3}, {0.3, 0.2}}, new double[][] {{1, 2}, {3, 4}});
    assertEquals(0.3, e.worstRelativeError(), 0.0);
    assertEquals(0, e.worstRow());
    assertEquals(1, e.worstColumn());
    // a unique maximum anywhere, here the last element
    FitError last = FitError.of(new double[][] {{0.1, 0.2}, {0.3, 0.4}}, new double[][] {{0, 0}, {0, 0}});
    assertEquals(0.4, last.worstRelativeError(), 0.0);
    assertEquals(1, last.worstRow());
    assertEquals(1, last.worstColumn());
    // all zero: the worst is the first element
    FitError zero = FitError.of(new double[][] {{0, 0}, {0, 0}}, new double[][] {{0, 0}, {0, 0}});
    assertEquals(0.0, zero.worstRelativeError(), 0.0);
    assertEquals(0, zero.worstRow());
    assertEquals(0, zero.worstColumn());
    // a unique maximum in the first column of the second row
    FitError below = FitError.of(new double[][] {{0.1, 0.2}, {0.5, 0.4}}, new double[][] {{0, 0}, {0, 0}});
    assertEquals(1, below.worstRow());
    assertEquals(0, below.worstColumn());
  }

  @Test
  void arraysAreCopiedInAndOut() {
    double[][] rel = {{0.1, 0.2}, {0.3, 0.4}};
    double[][] abs = {{1, 2}, {3, 4}};
    FitError e = FitError.of(rel, abs);
    rel[1][0] = 9;
    abs[1][0] = 9;
    assertEquals(0.3, e.relativeAt(1, 0), 0.0);
    assertEquals(0.2, e.relativeAt(0, 1), 0.0);
    assertEquals(3, e.absoluteError()[1][0], 0.0);
    e.relativeError()[1][0] = 7;
    e.absoluteError()[1][0] = 7;
    assertEquals(0.3, e.relativeError()[1][0], 0.0);
    assertEquals(3, e.absoluteError()[1][0], 0.0);
    assertEquals(4, e.absoluteError()[1][1], 0.0);
  }

  @Test
  void invalidRecordsAreRejected() {
    double[][] one = {{0.1}};
    double[][] two = {{0.1, 0.2}, {0.3, 0.4}};
    assertThrows(IllegalArgumentException.class, () -> new FitError(null, one, 0.1, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(new double[0][], one, 0.1, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(one, null, 0.1, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(new double[][] {{0.1, 0.2}}, one, 0.1, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(new double[][] {null}, one, 0.1, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(one, two, 0.1, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(one, one, -0.1, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(one, one, Double.NaN, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(two, two, 0.4, -1, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(two, two, 0.4, 2, 0));
    assertThrows(IllegalArgumentException.class, () -> new FitError(two, two, 0.4, 0, -1));
    assertThrows(IllegalArgumentException.class, () -> new FitError(two, two, 0.4, 0, 2));
    // the edges of the valid ranges are accepted
    FitError edge = new FitError(two, two, 0.0, 1, 1);
    assertEquals(1, edge.worstRow());
    assertEquals(1, edge.worstColumn());
    assertEquals(0.0, new FitError(one, one, 0.0, 0, 0).worstRelativeError(), 0.0);
  }
}
