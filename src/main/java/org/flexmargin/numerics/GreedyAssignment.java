package org.flexmargin.numerics;

/**
 * Greedy one-to-one assignment of rows to columns of a square cost matrix: repeatedly take the
 * cheapest remaining pair. Used to follow eigenvalues or mode shapes from one solution point to
 * the next, where the true matches are far cheaper than any alternative; not an optimal
 * (Hungarian) assignment in general. O(n^3).
 */
public final class GreedyAssignment {
  private GreedyAssignment() {}

  /**
   * @param cost square matrix, cost[row][column]. Not modified.
   * @return column assigned to each row
   */
  public static int[] minimumCost(double[][] cost) {
    int n = cost.length;
    int[] out = new int[n];
    boolean[] rowDone = new boolean[n];
    boolean[] colDone = new boolean[n];
    for (int step = 0; step < n; step++) {
      double best = Double.POSITIVE_INFINITY;
      int bj = -1;
      int bc = -1;
      for (int j = 0; j < n; j++) {
        if (rowDone[j]) {
          continue;
        }
        for (int c = 0; c < n; c++) {
          if (!colDone[c] && (bj < 0 || cost[j][c] < best)) {
            best = cost[j][c];
            bj = j;
            bc = c;
          }
        }
      }
      out[bj] = bc;
      rowDone[bj] = true;
      colDone[bc] = true;
    }
    return out;
  }
}
