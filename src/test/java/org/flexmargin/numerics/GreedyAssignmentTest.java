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

  @Test
  void greedyAssignmentNeverReusesARowAndBreaksTiesInReadingOrder() {
    // Row 0 owns the two cheapest entries; once it is assigned, its second entry must not be
    // taken again: the answer is the identity, not row 0 twice.
    assertArrayEquals(new int[] {0, 1}, GreedyAssignment.minimumCost(new double[][] {{0.1, 0.2}, {5, 6}}));
    // Ties: the first cheapest pair in reading order wins (reproducible tracking).
    assertArrayEquals(new int[] {0, 1}, GreedyAssignment.minimumCost(new double[][] {{1, 1}, {1, 9}}));
  }
}
