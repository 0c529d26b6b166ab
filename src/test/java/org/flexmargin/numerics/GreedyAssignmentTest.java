package org.flexmargin.numerics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import org.junit.jupiter.api.Test;

/** Greedy assignment on small matrices whose answer is evident. */
class GreedyAssignmentTest {
  @Test
  void permutationWithClearMinimaIsRecovered() {
    double[][] cost = {{5, 0.1, 9}, {0.2, 7, 8}, {6, 5, 0.3}};
    assertArrayEquals(new int[] {1, 0, 2}, GreedyAssignment.minimumCost(cost));
  }

  @Test
  void cheapestPairIsTakenFirst() {
    // row 0 prefers column 0 (1.0) but row 1 has the cheapest pair (0.5) in column 0
    double[][] cost = {{1.0, 2.0}, {0.5, 3.0}};
    assertArrayEquals(new int[] {1, 0}, GreedyAssignment.minimumCost(cost));
  }
}
