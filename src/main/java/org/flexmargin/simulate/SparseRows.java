package org.flexmargin.simulate;

import org.ejml.data.DMatrixRMaj;

/**
 * A matrix kept as its nonzero entries row by row (compressed sparse rows), for the products of
 * a time-domain run: an assembled aircraft-and-loop state matrix is mostly zeros (block
 * structure), so skipping them saves most of the work. Each row's nonzeros keep their column
 * order, so a row product adds the same terms in the same order as the dense loop (a skipped
 * term is an exact zero, whose addition changes no finite sum). Immutable.
 */
final class SparseRows {
  private final int rows;
  private final int cols;
  private final int[] rowStart;
  private final int[] column;
  private final double[] value;

  private SparseRows(int rows, int cols, int[] rowStart, int[] column, double[] value) {
    this.rows = rows;
    this.cols = cols;
    this.rowStart = rowStart;
    this.column = column;
    this.value = value;
  }

  /**
   * @param m a dense matrix (not kept)
   * @return its nonzero entries
   */
  static SparseRows of(DMatrixRMaj m) {
    int count = 0;
    for (int i = 0; i < m.getNumElements(); i++) {
      if (m.data[i] != 0) {
        count++;
      }
    }
    int[] start = new int[m.numRows + 1];
    int[] col = new int[count];
    double[] val = new double[count];
    int k = 0;
    for (int i = 0; i < m.numRows; i++) {
      start[i] = k;
      for (int j = 0; j < m.numCols; j++) {
        double v = m.data[i * m.numCols + j];
        if (v != 0) {
          col[k] = j;
          val[k] = v;
          k++;
        }
      }
    }
    start[m.numRows] = k;
    return new SparseRows(m.numRows, m.numCols, start, col, val);
  }

  /** @return number of rows */
  int rows() {
    return rows;
  }

  /** @return number of columns */
  int cols() {
    return cols;
  }

  /** @return number of nonzero entries */
  int nonzeros() {
    return value.length;
  }

  /**
   * @param row a row index
   * @param x a vector of {@link #cols()} entries
   * @param sum the value to add the products to
   * @return sum + (row of this matrix) . x, the terms added in column order
   */
  double rowTimes(int row, double[] x, double sum) {
    double s = sum;
    for (int k = rowStart[row]; k < rowStart[row + 1]; k++) {
      s += value[k] * x[column[k]];
    }
    return s;
  }
}
