package org.flexmargin.spline;

/**
 * A linear interpolation from values at structural points to values at target points, stored as a
 * dense row-major matrix (targets x sources): target value t = sum_j g[t][j] source_j.
 *
 * <p>Immutable.
 */
public final class SplineMatrix {
  private final int rows;
  private final int cols;
  private final double[] g;

  SplineMatrix(int rows, int cols, double[] g) {
    this.rows = rows;
    this.cols = cols;
    this.g = g;
  }

  /** @return number of target values */
  public int rows() {
    return rows;
  }

  /** @return number of source values */
  public int cols() {
    return cols;
  }

  /** @return one coefficient */
  public double get(int row, int col) {
    return g[row * cols + col];
  }

  /**
   * @param source values at the source points (length cols)
   * @return the interpolated target values (length rows)
   */
  public double[] apply(double[] source) {
    if (source.length != cols) {
      throw new IllegalArgumentException("expected " + cols + " source values, got " + source.length);
    }
    double[] out = new double[rows];
    for (int r = 0; r < rows; r++) {
      double s = 0;
      int o = r * cols;
      for (int c = 0; c < cols; c++) {
        s += g[o + c] * source[c];
      }
      out[r] = s;
    }
    return out;
  }
}
