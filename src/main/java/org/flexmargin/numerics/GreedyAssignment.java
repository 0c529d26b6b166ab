package org.flexmargin.numerics;

/**
 * Greedy one-to-one assignment of rows to columns of a square cost matrix: repeatedly take the
 * cheapest remaining pair (the first in row-major order among equally cheap ones). Used to follow
 * eigenvalues or mode shapes from one solution point to the next, where the true matches are far
 * cheaper than any alternative; not an optimal (Hungarian) assignment in general.
 *
 * <p>Each row keeps its cheapest free column; a step takes the row whose cheapest pair is
 * cheapest, and only the rows whose cheapest column was just taken look for a new one. That is
 * O(n^2) when few rows compete for a column (the usual case here) and O(n^3) at worst, and it
 * takes the same pairs as scanning all free pairs at every step. A matrix with a NaN cost is
 * assigned by that plain scan.
 */
public final class GreedyAssignment {
  private GreedyAssignment() {}

  /**
   * @param cost square matrix, cost[row][column]. Not modified.
   * @return column assigned to each row
   */
  public static int[] minimumCost(double[][] cost) {
    int n = cost.length;
    for (double[] row : cost) {
      for (int c = 0; c < n; c++) {
        if (Double.isNaN(row[c])) {
          return byScan(cost);
        }
      }
    }
    int[] out = new int[n];
    boolean[] rowDone = new boolean[n];
    boolean[] colDone = new boolean[n];
    int[] cheapest = new int[n];
    for (int j = 0; j < n; j++) {
      cheapest[j] = cheapestFree(cost[j], colDone);
    }
    for (int step = 0; step < n; step++) {
      int bj = -1;
      for (int j = 0; j < n; j++) {
        if (!rowDone[j] && (bj < 0 || cost[j][cheapest[j]] < cost[bj][cheapest[bj]])) {
          bj = j;
        }
      }
      int bc = cheapest[bj];
      out[bj] = bc;
      rowDone[bj] = true;
      colDone[bc] = true;
      if (step + 1 < n) {
        for (int j = 0; j < n; j++) {
          if (!rowDone[j] && cheapest[j] == bc) {
            cheapest[j] = cheapestFree(cost[j], colDone);
          }
        }
      }
    }
    return out;
  }

  /** @return the first free column of the row with the least cost (-1 if none is free) */
  private static int cheapestFree(double[] row, boolean[] colDone) {
    int best = -1;
    for (int c = 0; c < colDone.length; c++) {
      if (!colDone[c] && (best < 0 || row[c] < row[best])) {
        best = c;
      }
    }
    return best;
  }

  /** Scans every free pair at every step, O(n^3): the reference order, kept for NaN costs. */
  static int[] byScan(double[][] cost) {
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
