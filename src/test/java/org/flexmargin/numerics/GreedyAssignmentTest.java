package org.flexmargin.numerics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.Random;
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

  @Test
  void aRowWhoseCheapestColumnIsTakenLooksForItsNextCheapest() {
    // step 1: (1, 0) at 0.1; row 0 and row 2 both wanted column 0 and move on: row 0 to column 2
    // (0.3), row 2 to column 1 (0.4); step 2 takes row 0's 0.3, step 3 row 2's 0.4 -> {2, 0, 1}
    double[][] cost = {{0.2, 0.9, 0.3}, {0.1, 5, 5}, {0.25, 0.4, 0.8}};
    assertArrayEquals(new int[] {2, 0, 1}, GreedyAssignment.minimumCost(cost));
  }

  @Test
  void infiniteCostsAreAssignedInReadingOrder() {
    double inf = Double.POSITIVE_INFINITY;
    // row 1's 0.5 first; the rest are all infinite: row 0 takes the first free column (1)
    assertArrayEquals(new int[] {1, 0}, GreedyAssignment.minimumCost(new double[][] {{inf, inf}, {0.5, inf}}));
    assertArrayEquals(new int[] {0, 1, 2},
        GreedyAssignment.minimumCost(new double[][] {{inf, inf, inf}, {inf, inf, inf}, {inf, inf, inf}}));
  }

  @Test
  void aNanCostFallsBackToThePlainScan() {
    double nan = Double.NaN;
    // the scan starts from the first free pair, (0, 0) at NaN, and no cost compares below NaN:
    // it keeps that pair, then row 1 takes column 1
    assertArrayEquals(new int[] {0, 1}, GreedyAssignment.minimumCost(new double[][] {{nan, 0.1}, {0.2, 0.3}}));
    // a NaN later in reading order never wins: (1, 0) at 0.2 first, then row 0 takes column 1
    assertArrayEquals(new int[] {1, 0}, GreedyAssignment.minimumCost(new double[][] {{0.5, nan}, {0.2, 0.3}}));
    // a NaN first in its row does not hide the row's cheaper pairs: the scan passes (1, 0) and
    // takes (1, 1) at 0.1, then row 0 column 0 (a cheapest-per-row search would stop at the NaN
    // and give row 0 its 0.4 first: {1, 0})
    assertArrayEquals(new int[] {0, 1}, GreedyAssignment.minimumCost(new double[][] {{0.5, 0.4}, {nan, 0.1}}));
  }

  @Test
  void takesTheSamePairsAsScanningEveryFreePairAtEveryStep() {
    // the definition, scanned in full at every step, against the row-minimum bookkeeping, on
    // matrices with many ties (costs from a few values) and with distinct costs
    Random r = new Random(7);
    for (int trial = 0; trial < 400; trial++) {
      int n = 1 + r.nextInt(12);
      int levels = trial % 2 == 0 ? 3 : 1_000_000;
      double[][] cost = new double[n][n];
      for (double[] row : cost) {
        for (int c = 0; c < n; c++) {
          row[c] = r.nextInt(levels);
        }
      }
      assertArrayEquals(GreedyAssignment.byScan(cost), GreedyAssignment.minimumCost(cost), "trial " + trial);
    }
  }
}
